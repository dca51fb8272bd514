// npm run db:backup / db:restore, run as the scripts they are (real child processes, loopback only):
// the demo scenario plus an uploaded photo is backed up and restored into a fresh DATA_DIR, and
// every request, recommendation version, upload (row and bytes) and audit row comes back equal.
// The database is the one the suite runs on: the embedded PGlite, or PostgreSQL (pg_dump and
// pg_restore) when DATABASE_URL is set. A restore over existing data, and a backup of a data
// folder another process holds, are refused with the reason.
import { spawn, spawnSync } from "node:child_process";
import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { asc } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDatabase, installTestDatabase, openPglite, openPostgres, type DatabaseHandle } from "@/db/client";
import { applyMigrations } from "@/db/migrate";
import { auditEvents, recommendationVersions, setupRequests, uploads } from "@/db/schema";
import { seedDemo } from "@/db/seed-demo";

const root = mkdtempSync(path.join(os.tmpdir(), "sagwise-backup-test-"));
const dataA = path.join(root, "a");
const dataB = path.join(root, "b");
const archive = path.join(root, "backups", "sagwise.tar.gz");
const photo = randomBytes(4096);
const pgUrl = process.env.DATABASE_URL;
let urlA: string | undefined;
let urlB: string | undefined;
let saved: Awaited<ReturnType<typeof snapshot>>;

/** A fresh PostgreSQL database next to the suite's (dropped with the suite's cleanup). */
async function freshPostgres(): Promise<string> {
  const pg = (await import("pg")).default;
  const name = `sagwise_t${randomBytes(4).toString("hex")}_backup_${process.pid}`;
  const admin = new pg.Client({ connectionString: pgUrl });
  await admin.connect();
  await admin.query(`create database ${name}`);
  await admin.end();
  const url = new URL(pgUrl!);
  url.pathname = `/${name}`;
  return url.toString();
}

async function open(dataDir: string, url: string | undefined): Promise<DatabaseHandle> {
  return url ? openPostgres(url) : openPglite(path.join(dataDir, "pglite"));
}

async function snapshot(handle: DatabaseHandle) {
  const { db } = handle;
  return {
    requests: await db.select().from(setupRequests).orderBy(asc(setupRequests.id)),
    versions: await db.select().from(recommendationVersions).orderBy(asc(recommendationVersions.id)),
    uploads: await db.select().from(uploads).orderBy(asc(uploads.id)),
    audit: await db.select().from(auditEvents).orderBy(asc(auditEvents.id)),
  };
}

function envFor(dataDir: string, url: string | undefined): NodeJS.ProcessEnv {
  const env: NodeJS.ProcessEnv = { ...process.env, DATA_DIR: dataDir };
  if (url) env.DATABASE_URL = url;
  else delete env.DATABASE_URL;
  return env;
}

function run(script: "backup" | "restore", dataDir: string, url: string | undefined, ...args: string[]) {
  return spawnSync("npx", ["tsx", `scripts/${script}.ts`, ...args], {
    encoding: "utf8",
    env: envFor(dataDir, url),
    timeout: 120_000,
  });
}

/** The same without blocking this process (which must keep refreshing a lock it holds meanwhile). */
function runAsync(
  script: "backup" | "restore",
  dataDir: string,
  ...args: string[]
): Promise<{ status: number | null; stderr: string }> {
  const child = spawn("npx", ["tsx", `scripts/${script}.ts`, ...args], {
    env: envFor(dataDir, undefined),
    stdio: ["ignore", "ignore", "pipe"],
  });
  let stderr = "";
  child.stderr.on("data", (c: Buffer) => (stderr += c.toString()));
  const timer = setTimeout(() => child.kill("SIGKILL"), 120_000);
  return new Promise((resolve) =>
    child.on("exit", (status) => {
      clearTimeout(timer);
      resolve({ status, stderr });
    }),
  );
}

beforeAll(async () => {
  if (pgUrl) [urlA, urlB] = [await freshPostgres(), await freshPostgres()];
  const handle = await open(dataA, urlA);
  await applyMigrations(handle);
  installTestDatabase(handle);
  await seedDemo();
  // One photo on a seeded request, in the uploads folder and its row.
  const [request] = await handle.db.select({ id: setupRequests.id }).from(setupRequests).limit(1);
  mkdirSync(path.join(dataA, "uploads"), { recursive: true });
  writeFileSync(path.join(dataA, "uploads", "backup-photo.jpg"), photo);
  await handle.db.insert(uploads).values({
    requestId: request!.id,
    storageKey: "backup-photo.jpg",
    sha256: "0".repeat(64),
    originalName: "fork.jpg",
    contentType: "image/jpeg",
    sizeBytes: photo.length,
  });
  saved = await snapshot(handle);
  await closeDatabase();
}, 120_000);
afterAll(() => rmSync(root, { recursive: true, force: true }));

describe("db:backup and db:restore", () => {
  it("restores into a fresh folder: every request, version, upload and audit row equal, the photo's bytes too", async () => {
    const backup = run("backup", dataA, urlA, archive);
    expect(backup.stderr).toBe("");
    expect(backup.status).toBe(0);
    expect(existsSync(archive)).toBe(true);

    const restore = run("restore", dataB, urlB, archive);
    expect(restore.stderr).toBe("");
    expect(restore.status).toBe(0);
    const handle = await open(dataB, urlB);
    try {
      const restored = await snapshot(handle);
      expect(saved.requests.length).toBeGreaterThan(5);
      expect(saved.audit.length).toBeGreaterThan(5);
      expect(restored).toEqual(saved);
    } finally {
      await handle.close();
    }
    expect(readFileSync(path.join(dataB, "uploads", "backup-photo.jpg")).equals(photo)).toBe(true);
  }, 180_000);

  it("refuses to restore over a database that holds data unless --force, and keeps what was there", async () => {
    const refused = run("restore", dataB, urlB, archive);
    expect(refused.status).toBe(1);
    expect(refused.stderr).toContain("Restore refused");
    expect(refused.stderr).toContain("--force");
    const handle = await open(dataB, urlB);
    try {
      expect((await snapshot(handle)).requests).toEqual(saved.requests);
    } finally {
      await handle.close();
    }
    const forced = run("restore", dataB, urlB, archive, "--force");
    expect(forced.stderr).toBe("");
    expect(forced.status).toBe(0);
  }, 180_000);

  it("refuses a file that is not a backup, naming it", () => {
    const bogus = path.join(root, "not-a-backup.tar.gz");
    writeFileSync(bogus, "plain text");
    const refused = run("restore", path.join(root, "c"), urlB, bogus);
    expect(refused.status).toBe(1);
    expect(refused.stderr).toContain(`${bogus} is not a Sagwise backup`);
  }, 60_000);

  it("refuses to back up the embedded database while another process holds it, saying why", async () => {
    const dataD = path.join(root, "d");
    const holder = await openPglite(path.join(dataD, "pglite"));
    try {
      const refused = await runAsync("backup", dataD, path.join(root, "while-running.tar.gz"));
      expect(refused.status).toBe(1);
      expect(refused.stderr).toContain("Backup refused");
      expect(refused.stderr).toContain(`in use by process ${process.pid}`);
      expect(refused.stderr).toContain("stop the app first");
      expect(existsSync(path.join(root, "while-running.tar.gz"))).toBe(false);
    } finally {
      await holder.close();
    }
  }, 60_000);
});
