// Two app instances on one PostgreSQL server, as in the README's deployment: separate processes
// (tests/helpers/instance-server.ts), each with its own pool, limiters and S3 client, sharing the
// database and a bucket on a local S3-compatible fake (s3rver, started here on loopback).
// The rate limit holds across them, a photo uploaded through one is served by the other, and an
// e-mail in the shared outbox is sent once when both instances' senders run at the same moment.
// PostgreSQL only: the embedded database (PGlite) is one process by design.
import { spawn, type ChildProcess } from "node:child_process";
import { mkdtempSync, readdirSync, rmSync, existsSync } from "node:fs";
import { createServer, request as httpRequest, type Server } from "node:http";
import os from "node:os";
import path from "node:path";
import { eq } from "drizzle-orm";
import S3rver from "s3rver";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { uploads } from "@/db/schema";
import { stableUuid } from "@/db/seed-data";
import { setupTestApp } from "../helpers/app";
import { testDatabaseUrl } from "../helpers/db";
import { tinyJpeg } from "../fixtures/images";

const onPostgres = Boolean(process.env.DATABASE_URL);
const REASON = "needs DATABASE_URL (CI's PostgreSQL stage): PGlite allows one process per database";

// Said once in the run's output, not only in a verbose reporter's test names.
if (!onPostgres) console.warn(`[instances.test] skipped: ${REASON}`);

setupTestApp({ seed: true });

const BUCKET = "sagwise-photos";
let s3: S3rver | undefined;
let s3Dir = "";
const instances: { child: ChildProcess; port: number; dataDir: string }[] = [];
// A stand-in for the e-mail API on loopback: records every message it is asked to send.
let mailApi: Server | undefined;
const delivered: { to: string[]; subject: string }[] = [];

function startInstance(env: NodeJS.ProcessEnv): Promise<{ child: ChildProcess; port: number; dataDir: string }> {
  const dataDir = mkdtempSync(path.join(os.tmpdir(), "sagwise-instance-"));
  // Its own process group, so the teardown ends npx, tsx and the server together.
  const child = spawn("npx", ["tsx", "tests/helpers/instance-server.ts"], {
    env: { ...env, DATA_DIR: dataDir },
    stdio: ["ignore", "pipe", "pipe"],
    detached: true,
  });
  return new Promise((resolve, reject) => {
    let out = "";
    const timer = setTimeout(() => reject(new Error(`instance did not start: ${out}`)), 60_000);
    child.stdout!.on("data", (chunk: Buffer) => {
      out += chunk;
      const port = /PORT (\d+)/.exec(out)?.[1];
      if (port) {
        clearTimeout(timer);
        resolve({ child, port: Number(port), dataDir });
      }
    });
    child.stderr!.on("data", (chunk: Buffer) => (out += chunk));
    child.on("exit", (code) => reject(new Error(`instance exited with ${code}: ${out}`)));
  });
}

/** An HTTP request to an instance from a chosen loopback source address (127.0.0.0/8). */
function send(
  port: number,
  method: string,
  url: string,
  options: { headers?: Record<string, string>; body?: Buffer; from?: string } = {},
) {
  return new Promise<{ status: number; body: Buffer; headers: Record<string, string | string[] | undefined> }>(
    (resolve, reject) => {
      const req = httpRequest(
        {
          host: "127.0.0.1",
          port,
          method,
          path: url,
          headers: options.headers,
          localAddress: options.from ?? "127.0.0.1",
        },
        (res) => {
          const chunks: Buffer[] = [];
          res.on("data", (c: Buffer) => chunks.push(c));
          res.on("end", () =>
            resolve({ status: res.statusCode ?? 0, body: Buffer.concat(chunks), headers: res.headers }),
          );
        },
      );
      req.on("error", reject);
      req.setTimeout(30_000, () => req.destroy(new Error("timed out")));
      req.end(options.body);
    },
  );
}

const RIDER_ANSWERS = {
  rider: {
    name: "Two Instance Rider",
    email: "two.instances@example.test",
    weight: { value: 75, unit: "kg" },
    gearIncluded: false,
    skill: "intermediate",
    style: "moderate",
  },
  riding: { discipline: "motocross", terrain: ["loam"], jumpSize: "medium", hoursPerMonth: 6 },
  bike: { modelId: stableUuid("bike:mx-450-4t"), year: 2022 },
  feel: { complaints: ["bottoming"] },
  review: { consent: true },
};

async function multipart(answers: unknown, photo: Uint8Array) {
  const form = new FormData();
  form.set("answers", JSON.stringify(answers));
  form.append("photos", new File([photo as BlobPart], "bike.jpg", { type: "image/jpeg" }));
  const encoded = new Request("http://localhost/", { method: "POST", body: form });
  return { body: Buffer.from(await encoded.arrayBuffer()), type: encoded.headers.get("content-type")! };
}

describe.skipIf(!onPostgres)(
  `two instances on one PostgreSQL (${onPostgres ? "running" : `skipped: ${REASON}`})`,
  () => {
    beforeAll(async () => {
      s3Dir = mkdtempSync(path.join(os.tmpdir(), "sagwise-s3-"));
      s3 = new S3rver({
        address: "127.0.0.1",
        port: 0,
        silent: true,
        directory: s3Dir,
        configureBuckets: [{ name: BUCKET, configs: [] }],
      });
      const { port: s3Port } = await s3.run();
      mailApi = createServer((req, res) => {
        let body = "";
        req.on("data", (c: Buffer) => (body += c));
        req.on("end", () => {
          const message = JSON.parse(body || "{}") as { to?: string | string[]; subject?: string };
          delivered.push({ to: ([] as string[]).concat(message.to ?? []), subject: message.subject ?? "" });
          res
            .writeHead(200, { "content-type": "application/json" })
            .end(JSON.stringify({ id: `msg_${delivered.length}` }));
        });
      });
      await new Promise<void>((resolve) => mailApi!.listen(0, "127.0.0.1", resolve));
      const mailPort = (mailApi.address() as { port: number }).port;
      const env = {
        ...process.env,
        DATABASE_URL: testDatabaseUrl(),
        S3_BUCKET: BUCKET,
        S3_ENDPOINT: `http://127.0.0.1:${s3Port}`,
        S3_REGION: "us-east-1",
        // s3rver's fixed credentials (its README).
        S3_ACCESS_KEY_ID: "S3RVER",
        S3_SECRET_ACCESS_KEY: "S3RVER",
        S3_FORCE_PATH_STYLE: "true",
        TRUST_PROXY_HOPS: "0",
        RESEND_BASE_URL: `http://127.0.0.1:${mailPort}`,
      };
      instances.push(...(await Promise.all([startInstance(env), startInstance(env)])));
    }, 120_000);

    afterAll(async () => {
      for (const { child, dataDir } of instances) {
        if (child.pid) process.kill(-child.pid, "SIGTERM");
        rmSync(dataDir, { recursive: true, force: true });
      }
      await s3?.close();
      await new Promise((resolve) => (mailApi ? mailApi.close(resolve) : resolve(undefined)));
      if (s3Dir) rmSync(s3Dir, { recursive: true, force: true });
    });

    it("a photo uploaded through one instance is served by the other, from the bucket", async () => {
      const [a, b] = instances;
      const photo = tinyJpeg(512);
      const { body, type } = await multipart(
        {
          rider: {
            name: "Two Instance Rider",
            email: "two.instances@example.test",
            weight: { value: 75, unit: "kg" },
            gearIncluded: false,
            skill: "intermediate",
            style: "moderate",
          },
          riding: { discipline: "motocross", terrain: ["loam"], jumpSize: "medium", hoursPerMonth: 6 },
          bike: { modelId: stableUuid("bike:mx-450-4t"), year: 2022 },
          feel: { complaints: ["bottoming"] },
          review: { consent: true },
        },
        photo,
      );
      const created = await send(a!.port, "POST", "/api/requests", {
        headers: { "content-type": type },
        body,
        from: "127.0.0.2",
      });
      expect(created.status, created.body.toString()).toBe(201);
      const { id, statusUrl } = JSON.parse(created.body.toString()) as { id: string; statusUrl: string };
      const token = statusUrl.split("/").pop()!;
      const [row] = await (
        await getDb()
      )
        .select({ id: uploads.id, storageKey: uploads.storageKey })
        .from(uploads)
        .where(eq(uploads.requestId, id));
      expect(row).toBeDefined();
      // Stored in the bucket, not in either instance's data folder.
      expect(
        existsSync(path.join(a!.dataDir, "uploads")) && readdirSync(path.join(a!.dataDir, "uploads")).length > 0,
      ).toBe(false);
      const served = await send(b!.port, "GET", `/api/uploads/${row!.id}?token=${token}`, { from: "127.0.0.2" });
      expect(served.status).toBe(200);
      expect(served.headers["content-type"]).toBe("image/jpeg");
      expect(Buffer.compare(served.body, Buffer.from(photo))).toBe(0);
    });

    it("the submit limit (8 per 15 minutes per address) holds across both instances", async () => {
      const [a, b] = instances;
      const statuses: number[] = [];
      for (let i = 0; i < 10; i++) {
        const target = i % 2 === 0 ? a! : b!;
        // An empty body is refused (400) after the limiter counted it: nothing is stored.
        const response = await send(target.port, "POST", "/api/requests", {
          headers: { "content-type": "application/json", "x-forwarded-for": `198.51.100.${i}` },
          body: Buffer.from("{}"),
          from: "127.0.0.3",
        });
        statuses.push(response.status);
      }
      expect(statuses).toEqual([400, 400, 400, 400, 400, 400, 400, 400, 429, 429]);
    });

    it("an outbox message is sent once when both instances' senders run together", async () => {
      const [a, b] = instances;
      const riders = Array.from({ length: 6 }, (_, i) => `outbox.once.${i}@example.test`);
      for (const [i, email] of riders.entries()) {
        const target = i % 2 === 0 ? a! : b!;
        const response = await send(target.port, "POST", "/api/requests", {
          headers: { "content-type": "application/json" },
          body: Buffer.from(JSON.stringify({ ...RIDER_ANSWERS, rider: { ...RIDER_ANSWERS.rider, email } })),
          from: `127.0.0.${10 + i}`,
        });
        expect(response.status, response.body.toString()).toBe(201);
      }
      // Both senders claim from the same table at once, a few rounds, until nothing is left.
      for (let round = 0; round < 3; round++) {
        await Promise.all([send(a!.port, "POST", "/__drain"), send(b!.port, "POST", "/__drain")]);
      }
      for (const email of riders)
        expect(
          delivered.filter((m) => m.to.includes(email)),
          email,
        ).toHaveLength(1);
    });
  },
);
