// Backups of everything the shop keeps: the database and the uploads folder (DATA_DIR/uploads), in
// one tar.gz. The embedded database is copied with PGlite's own dumpDataDir while this process
// holds the data-folder lock, so the copy is consistent and nothing writes meanwhile: with the app
// running, a backup is refused and says why. PostgreSQL (DATABASE_URL set) is copied with its own
// pg_dump / pg_restore (a consistent snapshot even while the app runs).
import { execFileSync } from "node:child_process";
import {
  cpSync,
  existsSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  renameSync,
  rmSync,
  writeFileSync,
} from "node:fs";
import os from "node:os";
import path from "node:path";
import * as tar from "tar";
import { openPglite } from "@/db/client";
import { acquireDataDirLock } from "@/db/lock";
import { latestAppliedMigration } from "@/db/migrate";
import { getEnv } from "@/lib/env";
import { findPostgresTool, postgresIsEmpty } from "./postgres";

const MANIFEST = "sagwise-backup.json";
const PGLITE_DUMP = "database/pglite.tar.gz";
const POSTGRES_DUMP = "database/postgres.dump";

export interface BackupManifest {
  format: 1;
  kind: "pglite" | "postgres";
  createdAt: string;
  migration: string | null;
  uploads: number;
}

/** Refusals and missing tools, in words for whoever runs the script. */
export class BackupError extends Error {
  override name = "BackupError";
}

function locations() {
  const env = getEnv();
  const dataDir = path.resolve(env.DATA_DIR);
  return { url: env.DATABASE_URL, pgliteDir: path.join(dataDir, "pglite"), uploadsDir: path.join(dataDir, "uploads") };
}

const filesIn = (dir: string) =>
  existsSync(dir) ? readdirSync(dir, { recursive: true, withFileTypes: true }).filter((e) => e.isFile()).length : 0;
const isEmptyDir = (dir: string) => !existsSync(dir) || readdirSync(dir).length === 0;

async function withStaging<T>(run: (dir: string) => Promise<T>): Promise<T> {
  const dir = mkdtempSync(path.join(os.tmpdir(), "sagwise-backup-"));
  try {
    return await run(dir);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Writes the backup archive to `file` (replaced only once complete). */
export async function backupTo(file: string): Promise<BackupManifest> {
  const { url, pgliteDir, uploadsDir } = locations();
  const target = path.resolve(file);
  return withStaging(async (staging) => {
    mkdirSync(path.join(staging, "database"));
    let manifest: BackupManifest;
    if (url) {
      const pgDump = findPostgresTool("pg_dump");
      execFileSync(
        pgDump,
        ["--format=custom", "--no-owner", "--no-privileges", `--file=${path.join(staging, POSTGRES_DUMP)}`, url],
        { stdio: ["ignore", "ignore", "pipe"] },
      );
      manifest = await copyUploadsAndDescribe(staging, uploadsDir, "postgres", null);
    } else {
      if (!existsSync(pgliteDir)) throw new BackupError(`There is no database to back up in ${pgliteDir} (DATA_DIR).`);
      let handle;
      try {
        handle = await openPglite(pgliteDir);
      } catch (error) {
        throw new BackupError(
          `Backup refused: ${(error as Error).message} A backup of the embedded database needs it to itself: stop the app first.`,
        );
      }
      try {
        const dump = await handle.client!.dumpDataDir("gzip");
        writeFileSync(path.join(staging, PGLITE_DUMP), Buffer.from(await dump.arrayBuffer()));
        // Copied while the lock is held: the app, which writes uploads, is not running.
        manifest = await copyUploadsAndDescribe(
          staging,
          uploadsDir,
          "pglite",
          await latestAppliedMigration(handle).catch(() => null),
        );
      } finally {
        await handle.close();
      }
    }
    mkdirSync(path.dirname(target), { recursive: true });
    const partial = `${target}.partial`;
    await tar.c({ gzip: true, file: partial, cwd: staging, portable: true }, readdirSync(staging));
    renameSync(partial, target);
    return manifest;
  });
}

async function copyUploadsAndDescribe(
  staging: string,
  uploadsDir: string,
  kind: BackupManifest["kind"],
  migration: string | null,
) {
  mkdirSync(path.join(staging, "uploads"));
  if (existsSync(uploadsDir)) cpSync(uploadsDir, path.join(staging, "uploads"), { recursive: true });
  const manifest: BackupManifest = {
    format: 1,
    kind,
    createdAt: new Date().toISOString(),
    migration,
    uploads: filesIn(uploadsDir),
  };
  writeFileSync(path.join(staging, MANIFEST), JSON.stringify(manifest, null, 2));
  return manifest;
}

/**
 * Restores `file` into the configured database and DATA_DIR/uploads. Refuses to replace a database
 * or uploads that hold anything unless `force`; with `force`, the embedded database and uploads
 * found are moved aside (`*.before-restore-<time>`), never deleted.
 */
export async function restoreFrom(file: string, options: { force?: boolean } = {}): Promise<BackupManifest> {
  const { url, pgliteDir, uploadsDir } = locations();
  if (!existsSync(file)) throw new BackupError(`There is no backup file ${file}.`);
  return withStaging(async (staging) => {
    try {
      await tar.x({ file, cwd: staging, strict: true });
    } catch (error) {
      throw new BackupError(`${file} is not a Sagwise backup (it could not be unpacked: ${(error as Error).message}).`);
    }
    const manifestPath = path.join(staging, MANIFEST);
    if (!existsSync(manifestPath)) throw new BackupError(`${file} is not a Sagwise backup (it has no ${MANIFEST}).`);
    const manifest = JSON.parse(readFileSync(manifestPath, "utf8")) as BackupManifest;
    const kind = url ? "postgres" : "pglite";
    if (manifest.format !== 1)
      throw new BackupError(`${file} was written by a newer Sagwise (backup format ${manifest.format}).`);
    if (manifest.kind !== kind)
      throw new BackupError(
        `${file} holds a ${manifest.kind === "pglite" ? "embedded (PGlite)" : "PostgreSQL"} database, but this installation uses ${kind === "pglite" ? "the embedded database" : "PostgreSQL (DATABASE_URL)"}.`,
      );
    const stamp = new Date().toISOString().replace(/[:.]/g, "-");
    const uploadsHaveFiles = !isEmptyDir(uploadsDir);
    if (url) {
      const empty = await postgresIsEmpty(url);
      if ((!empty || uploadsHaveFiles) && !options.force)
        throw new BackupError(
          `Restore refused: ${!empty ? "the PostgreSQL database in DATABASE_URL already holds tables" : `${uploadsDir} already holds files`}. ` +
            "Restoring replaces them: back them up first, then run the restore again with --force.",
        );
      const pgRestore = findPostgresTool("pg_restore");
      const args = [
        "--no-owner",
        "--no-privileges",
        "--single-transaction",
        "--exit-on-error",
        ...(empty ? [] : ["--clean", "--if-exists"]),
        `--dbname=${url}`,
        path.join(staging, POSTGRES_DUMP),
      ];
      execFileSync(pgRestore, args, { stdio: ["ignore", "ignore", "pipe"] });
      if (uploadsHaveFiles) renameSync(uploadsDir, `${uploadsDir}.before-restore-${stamp}`);
      cpSync(path.join(staging, "uploads"), uploadsDir, { recursive: true });
      return manifest;
    }
    mkdirSync(path.dirname(pgliteDir), { recursive: true });
    let release;
    try {
      release = await acquireDataDirLock(pgliteDir);
    } catch (error) {
      throw new BackupError(`Restore refused: ${(error as Error).message}`);
    }
    try {
      const occupied = !isEmptyDir(pgliteDir);
      if ((occupied || uploadsHaveFiles) && !options.force)
        throw new BackupError(
          `Restore refused: ${occupied ? `${pgliteDir} already holds a database` : `${uploadsDir} already holds files`}. ` +
            "Restoring replaces it: back it up first (npm run db:backup -- FILE), then run the restore again with --force.",
        );
      if (occupied) renameSync(pgliteDir, `${pgliteDir}.before-restore-${stamp}`);
      if (uploadsHaveFiles) renameSync(uploadsDir, `${uploadsDir}.before-restore-${stamp}`);
      const { createPglite } = await import("@/db/pglite");
      const dump = readFileSync(path.join(staging, PGLITE_DUMP));
      const client = await createPglite({ dataDir: pgliteDir, loadDataDir: new Blob([dump]) });
      await client.close();
      cpSync(path.join(staging, "uploads"), uploadsDir, { recursive: true });
    } finally {
      await release();
    }
    return manifest;
  });
}
