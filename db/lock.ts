// One process per PGlite data folder. PGlite itself opens a folder that another process holds
// without complaint, and one side's writes are then silently lost. The lock is proper-lockfile's:
// an atomically created lock folder (`<dataDir>.lock`) whose mtime the holder refreshes every
// second. A holder that dies, even by SIGKILL, stops refreshing, so its lock goes stale after
// LOCK_STALE_MS and the next process takes it; no pid is trusted (a pid can be reused). Next to it,
// `<dataDir>.lock-owner` says who holds it, for the error message only. The refresh runs on the
// event loop: a holder that blocks it for longer than the stale time loses the lock and stops.
import { hostname } from "node:os";
import { lstatSync, readFileSync, rmSync, unlinkSync, writeFileSync } from "node:fs";
import lockfile from "proper-lockfile";

/** A lock not refreshed for this long belongs to a dead process. */
export const LOCK_STALE_MS = 6_000;
const REFRESH_MS = 1_000;
const RETRY_MS = 250;

interface LockOwner {
  pid: number;
  host: string;
  since: string;
  command: string;
}

function describeOwner(owner: LockOwner | null): string {
  if (!owner) return "another process";
  return `process ${owner.pid} on ${owner.host} (${owner.command}, since ${owner.since})`;
}

export class DataDirLockedError extends Error {
  constructor(
    readonly dataDir: string,
    readonly owner: LockOwner | null,
  ) {
    super(
      `The data folder ${dataDir} is in use by ${describeOwner(owner)}. PGlite allows one process per ` +
        `data folder. Stop that process (the app, the seed or a backup) and start again, or point ` +
        `DATA_DIR elsewhere. If it was killed, its lock goes stale within ${LOCK_STALE_MS / 1000} s: just ` +
        `start again. Only if you are sure no process uses the folder (on any machine sharing the disk), ` +
        `delete ${dataDir}.lock.`,
    );
    this.name = "DataDirLockedError";
  }
}

function readOwner(ownerPath: string): LockOwner | null {
  try {
    return JSON.parse(readFileSync(ownerPath, "utf8")) as LockOwner;
  } catch {
    return null;
  }
}

// Earlier versions wrote a plain lock file at the same path, naming a pid.
function removeLegacyLockFile(lockPath: string): void {
  try {
    if (lstatSync(lockPath).isFile()) unlinkSync(lockPath);
  } catch {
    // Nothing there.
  }
}

export interface LockOptions {
  /** How long to wait for a lock that may be a killed process's (default: a little over the stale time). */
  waitMs?: number;
}

/** Takes the lock for `dataDir` and returns the function that releases it. */
export async function acquireDataDirLock(dataDir: string, options: LockOptions = {}): Promise<() => Promise<void>> {
  const lockPath = `${dataDir}.lock`;
  const ownerPath = `${dataDir}.lock-owner`;
  removeLegacyLockFile(lockPath);
  const deadline = Date.now() + (options.waitMs ?? LOCK_STALE_MS + 2_000);
  let told = false;
  for (;;) {
    try {
      const release = await lockfile.lock(dataDir, {
        realpath: false,
        lockfilePath: lockPath,
        stale: LOCK_STALE_MS,
        update: REFRESH_MS,
        retries: 0,
        // Someone took the folder over (our refresh failed for longer than the stale time): stop
        // at once rather than write over their data.
        onCompromised: (error) => {
          console.error(`[sagwise] lost the lock on the data folder ${dataDir} (${error.message}); stopping.`);
          process.exit(1);
        },
      });
      const owner: LockOwner = {
        pid: process.pid,
        host: hostname(),
        since: new Date().toISOString(),
        command: process.argv.slice(1).join(" ").slice(0, 120) || "node",
      };
      writeFileSync(ownerPath, JSON.stringify(owner));
      return async () => {
        rmSync(ownerPath, { force: true });
        await release().catch(() => undefined);
      };
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== "ELOCKED") throw error;
      if (Date.now() >= deadline) throw new DataDirLockedError(dataDir, readOwner(ownerPath));
      if (!told) {
        told = true;
        console.warn(
          `[sagwise] the data folder ${dataDir} is locked by ${describeOwner(readOwner(ownerPath))}; ` +
            `waiting up to ${Math.ceil((deadline - Date.now()) / 1000)} s in case that process was just stopped or killed.`,
        );
      }
      await new Promise((resolve) => setTimeout(resolve, RETRY_MS));
    }
  }
}
