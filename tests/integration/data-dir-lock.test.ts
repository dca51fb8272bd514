// The data-folder lock (db/lock.ts, proper-lockfile): a second process is refused with a message
// that says who holds the folder and how to recover; a holder killed with SIGKILL does not keep the
// folder (the next process opens it within the stale time); a pid, reused or not, fools nothing.
// Real child processes (tsx), loopback only, each bounded by a timeout.
import { spawn } from "node:child_process";
import { mkdtempSync, rmSync, utimesSync, writeFileSync, mkdirSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { openPglite } from "@/db/client";
import { DataDirLockedError, LOCK_STALE_MS, acquireDataDirLock } from "@/db/lock";

const dir = mkdtempSync(path.join(os.tmpdir(), "sagwise-lock-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** Starts a process that takes the lock, prints "locked" and then waits to be killed. */
function holdInChild(dataDir: string) {
  const script = `import("./db/lock.ts").then(m => m.acquireDataDirLock(${JSON.stringify(dataDir)}))
    .then(() => { console.log("locked by " + process.pid); setInterval(() => {}, 1000); })
    .catch((e) => { console.error(e.message); process.exit(3); });`;
  const child = spawn("npx", ["tsx", "--eval", script], { stdio: ["ignore", "pipe", "pipe"] });
  // The pid of the node process itself (npx runs it as its own child).
  const ready = new Promise<number>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error("the child did not take the lock within 60 s")), 60_000);
    child.stdout.on("data", (chunk: Buffer) => {
      const pid = /locked by (\d+)/.exec(chunk.toString())?.[1];
      if (pid) {
        clearTimeout(timer);
        resolve(Number(pid));
      }
    });
    child.on("exit", (code) => reject(new Error(`the child exited with ${code}`)));
  });
  return { child, ready };
}

describe("data-folder lock", () => {
  it("refuses a second process while the first holds the folder, naming it and how to recover", async () => {
    const dataDir = path.join(dir, "held");
    const first = await openPglite(dataDir);
    try {
      // A real second process (the seed, another server) trying the same folder.
      const script = `import("./db/client.ts").then(m => m.openPglite(${JSON.stringify(dataDir)}, { waitMs: 500 }))
        .then(() => { console.log("opened"); process.exit(0); })
        .catch((e) => { console.error(e.message); process.exit(3); });`;
      // Spawned without blocking: this process must keep refreshing its lock meanwhile.
      const child = spawn("npx", ["tsx", "--eval", script], { stdio: ["ignore", "ignore", "pipe"] });
      let stderr = "";
      child.stderr.on("data", (c: Buffer) => (stderr += c.toString()));
      const timer = setTimeout(() => child.kill("SIGKILL"), 60_000);
      const status = await new Promise((resolve) => child.on("exit", resolve));
      clearTimeout(timer);
      expect(status).toBe(3);
      expect(stderr).toContain(`in use by process ${process.pid} on ${os.hostname()}`);
      expect(stderr).toContain("Stop that process");
      expect(stderr).toContain(`delete ${dataDir}.lock`);
    } finally {
      await first.close();
    }
    // Once released, the folder opens again at once.
    const again = await openPglite(dataDir, { waitMs: 0 });
    await again.close();
  }, 90_000);

  it("opens right after the holder was killed with SIGKILL (within the stale time)", async () => {
    const dataDir = path.join(dir, "killed");
    mkdirSync(dataDir, { recursive: true });
    const { child, ready } = holdInChild(dataDir);
    const holder = await ready;
    await expect(acquireDataDirLock(dataDir, { waitMs: 0 })).rejects.toBeInstanceOf(DataDirLockedError);
    const gone = new Promise((resolve) => child.once("exit", resolve));
    process.kill(holder, "SIGKILL");
    await gone;
    // The default wait covers the stale time: started again at once, it gets the folder.
    const release = await acquireDataDirLock(dataDir);
    await release();
  }, 90_000);

  it("trusts no pid: a fresh lock naming a dead pid holds, a stale one naming a live pid does not", async () => {
    const dataDir = path.join(dir, "pids");
    // pid_max on Linux is at most 4194304, so this pid cannot be alive; the lock is fresh all the same.
    mkdirSync(`${dataDir}.lock`);
    writeFileSync(
      `${dataDir}.lock-owner`,
      JSON.stringify({ pid: 4194399, host: os.hostname(), since: "2026-01-01T00:00:00Z", command: "gone" }),
    );
    const refused = await acquireDataDirLock(dataDir, { waitMs: 0 }).catch((e: unknown) => e);
    expect(refused).toBeInstanceOf(DataDirLockedError);
    expect((refused as Error).message).toContain("process 4194399");
    // Not refreshed for longer than the stale time, while naming a live process (our parent): taken over.
    writeFileSync(
      `${dataDir}.lock-owner`,
      JSON.stringify({ pid: process.ppid, host: os.hostname(), since: "2026-01-01T00:00:00Z", command: "reused pid" }),
    );
    const old = new Date(Date.now() - LOCK_STALE_MS - 5_000);
    utimesSync(`${dataDir}.lock`, old, old);
    const release = await acquireDataDirLock(dataDir, { waitMs: 0 });
    await release();
  });

  it("replaces a lock file left by an earlier version", async () => {
    const dataDir = path.join(dir, "legacy");
    writeFileSync(`${dataDir}.lock`, String(process.ppid));
    const release = await acquireDataDirLock(dataDir, { waitMs: 0 });
    await release();
  });
});
