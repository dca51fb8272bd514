// One process per PGlite data folder. PGlite itself opens a folder that another process holds without
// complaint, and one side's writes are then silently lost; an exclusive lock file (O_EXCL) with the
// owner's pid makes the second process fail loudly instead.
import { closeSync, openSync, readFileSync, unlinkSync, writeSync } from "node:fs";

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    // EPERM: the process exists but belongs to someone else.
    return (error as NodeJS.ErrnoException).code === "EPERM";
  }
}

export class DataDirLockedError extends Error {
  constructor(
    readonly dataDir: string,
    readonly ownerPid: number,
  ) {
    super(
      `The data folder ${dataDir} is in use by process ${ownerPid}. ` +
        `PGlite allows one process per data folder: stop that process (the app, the seed or a ` +
        `script) or point DATA_DIR elsewhere.`,
    );
    this.name = "DataDirLockedError";
  }
}

/** Takes the lock for `dataDir` (file `<dataDir>.lock`) and returns the function that releases it. */
export function acquireDataDirLock(dataDir: string): () => void {
  const lockPath = `${dataDir}.lock`;
  for (let attempt = 0; attempt < 2; attempt++) {
    try {
      const fd = openSync(lockPath, "wx");
      writeSync(fd, String(process.pid));
      closeSync(fd);
      let released = false;
      const release = () => {
        if (released) return;
        released = true;
        process.off("exit", release);
        try {
          unlinkSync(lockPath);
        } catch {
          // Already gone: nothing to release.
        }
      };
      process.on("exit", release);
      return release;
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== "EEXIST") throw error;
      const ownerPid = Number.parseInt(readFileSync(lockPath, "utf8").trim(), 10);
      if (Number.isFinite(ownerPid) && ownerPid !== process.pid && isAlive(ownerPid)) {
        throw new DataDirLockedError(dataDir, ownerPid);
      }
      // Left behind by a process that died (or by this one): take it over.
      unlinkSync(lockPath);
    }
  }
  throw new Error(`Could not lock the data folder ${dataDir}`);
}
