// Kill -9 during concurrent submits: the real route handler on a real data folder (the harness in
// tests/helpers/crash-harness.ts) gets a stream of valid requests from several clients at once, is
// SIGKILLed while requests are in flight, and is started again at once (the data-folder lock goes
// stale within seconds). Every request that was acknowledged with 201 must be there, with its
// recommendation version 1 and its queued confirmation e-mail. Loopback only, bounded.
import { spawn, type ChildProcess } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { eq, inArray } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { openPglite } from "@/db/client";
import { outboundEmails, recommendationVersions, setupRequests } from "@/db/schema";
import { stableUuid } from "@/db/seed-data";

const dataDir = mkdtempSync(path.join(os.tmpdir(), "sagwise-crash-"));
const children: ChildProcess[] = [];
afterAll(() => {
  for (const child of children) if (child.exitCode === null) child.kill("SIGKILL");
  rmSync(dataDir, { recursive: true, force: true });
});

/** Starts the harness with node itself (so the pid killed is the server's) and waits for its port. */
function startHarness(...args: string[]): Promise<{ child: ChildProcess; port: number }> {
  const env: NodeJS.ProcessEnv = { ...process.env, DATA_DIR: dataDir, NODE_ENV: "test" };
  delete env.DATABASE_URL;
  const child = spawn(process.execPath, ["--import", "tsx", "tests/helpers/crash-harness.ts", ...args], {
    env,
    stdio: ["ignore", "pipe", "pipe"],
  });
  children.push(child);
  let stderr = "";
  child.stderr!.on("data", (c: Buffer) => (stderr += c.toString()));
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`the harness did not start within 90 s: ${stderr}`)), 90_000);
    child.stdout!.on("data", (chunk: Buffer) => {
      const port = /listening (\d+)/.exec(chunk.toString())?.[1];
      if (port) {
        clearTimeout(timer);
        resolve({ child, port: Number(port) });
      }
    });
    child.on("exit", (code) => reject(new Error(`the harness exited with ${code}: ${stderr}`)));
  });
}

// A valid request (the same shape as tests/integration/requests-intake.test.ts uses).
const body = (n: number) =>
  JSON.stringify({
    rider: {
      name: `Crash Rider ${n}`,
      email: `crash.${n}@example.test`,
      weight: { value: 80, unit: "kg" },
      gearIncluded: false,
      skill: "intermediate",
      style: "moderate",
    },
    riding: { discipline: "motocross", terrain: ["loam"], jumpSize: "medium", hoursPerMonth: 10 },
    bike: { modelId: stableUuid("bike:mx-450-4t"), year: 2023 },
    feel: { complaints: ["bottoming"], notes: "Bottoms on the big table." },
    review: { consent: true },
  });

describe("SIGKILL during concurrent submits", () => {
  it("keeps every acknowledged request, and the app starts again at once", async () => {
    const first = await startHarness("--seed");
    const acknowledged: string[] = [];
    let sent = 0;
    let killed = false;
    // 4 clients submit one after another until the server dies; it is killed once 12 requests
    // were acknowledged, while the others are still in flight.
    const client = async (c: number) => {
      while (!killed) {
        const n = ++sent;
        try {
          const res = await fetch(`http://127.0.0.1:${first.port}/api/requests`, {
            method: "POST",
            headers: { "content-type": "application/json", "x-test-client": `192.0.2.${(n % 200) + 1}` },
            body: body(n),
          });
          if (res.status === 201) acknowledged.push(((await res.json()) as { id: string }).id);
          else throw new Error(`submit ${n} from client ${c} answered ${res.status}: ${await res.text()}`);
        } catch (error) {
          if (!killed) throw error;
        }
        if (acknowledged.length >= 12 && !killed) {
          killed = true;
          first.child.kill("SIGKILL");
        }
      }
    };
    const exited = new Promise((resolve) => first.child.once("exit", resolve));
    await Promise.all([0, 1, 2, 3].map(client));
    await exited;
    expect(acknowledged.length).toBeGreaterThanOrEqual(12);
    expect(sent).toBeGreaterThan(acknowledged.length);

    // Started again straight away: it takes the folder over (the killed holder's lock goes stale).
    const second = await startHarness();
    const stopped = new Promise((resolve) => second.child.once("exit", resolve));
    second.child.kill("SIGTERM");
    await stopped;

    const handle = await openPglite(path.join(dataDir, "pglite"));
    try {
      const rows = await handle.db
        .select({ id: setupRequests.id })
        .from(setupRequests)
        .where(inArray(setupRequests.id, acknowledged));
      expect(rows.map((r) => r.id).sort()).toEqual([...acknowledged].sort());
      const versions = await handle.db
        .select({ id: recommendationVersions.requestId })
        .from(recommendationVersions)
        .where(inArray(recommendationVersions.requestId, acknowledged));
      expect(versions).toHaveLength(acknowledged.length);
      const mails = await handle.db
        .select({ id: outboundEmails.requestId })
        .from(outboundEmails)
        .where(eq(outboundEmails.template, "request-received"));
      expect(mails.map((m) => m.id)).toEqual(expect.arrayContaining(acknowledged));
    } finally {
      await handle.close();
    }
  }, 240_000);
});
