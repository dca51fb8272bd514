// One database handle per process: PGlite in DATA_DIR by default, PostgreSQL when DATABASE_URL is set.
// Same schema, same migrations. Opened lazily (so `next build` never touches the data folder) and
// kept on globalThis (Next bundles route handlers and pages into separate module graphs).
import { mkdirSync } from "node:fs";
import path from "node:path";
import type { PgDatabase, PgQueryResultHKT } from "drizzle-orm/pg-core";
import { getEnv } from "@/lib/env";
import * as schema from "./schema";
import { acquireDataDirLock, type LockOptions } from "./lock";
import { applyMigrations } from "./migrate";

export type AppDb = PgDatabase<PgQueryResultHKT, typeof schema>;
export type DatabaseKind = "pglite" | "postgres";
/** A drizzle transaction, as handed to the callback of `db.transaction`. */
export type Tx = Parameters<Parameters<AppDb["transaction"]>[0]>[0];
/** Where a query runs: the database itself or the caller's open transaction. */
export type Executor = AppDb | Tx;

export interface DatabaseHandle {
  db: AppDb;
  kind: DatabaseKind;
  /** The PGlite instance (embedded database only): backups dump its data folder. */
  client?: import("@electric-sql/pglite").PGlite;
  close(): Promise<void>;
}

const holder = globalThis as unknown as { __sagwiseDb?: Promise<DatabaseHandle> };

export async function openPglite(dataDir: string, lockOptions?: LockOptions): Promise<DatabaseHandle> {
  const { createPglite } = await import("./pglite");
  const { drizzle } = await import("drizzle-orm/pglite");
  const absolute = path.resolve(dataDir);
  // PGlite creates only the last folder of its path.
  mkdirSync(path.dirname(absolute), { recursive: true });
  // PGlite has no lock of its own: a second process on the same folder would silently lose writes.
  const release = await acquireDataDirLock(absolute, lockOptions);
  try {
    const client = await createPglite({ dataDir: absolute });
    const db = drizzle({ client, schema }) as unknown as AppDb;
    return {
      db,
      kind: "pglite",
      client,
      async close() {
        await client.close();
        await release();
      },
    };
  } catch (error) {
    await release();
    throw error;
  }
}

export async function openPostgres(url: string): Promise<DatabaseHandle> {
  const { Pool } = await import("pg");
  const { drizzle } = await import("drizzle-orm/node-postgres");
  const pool = new Pool({ connectionString: url, max: 10 });
  const db = drizzle({ client: pool, schema }) as unknown as AppDb;
  return { db, kind: "postgres", close: () => pool.end() };
}

async function openConfigured(): Promise<DatabaseHandle> {
  const env = getEnv();
  const handle = env.DATABASE_URL
    ? await openPostgres(env.DATABASE_URL)
    : await openPglite(path.join(env.DATA_DIR, "pglite"));
  // Migrations are applied before anything reads or writes.
  await applyMigrations(handle);
  return handle;
}

/** The process's database, opened and migrated on first use. */
export function getDatabase(): Promise<DatabaseHandle> {
  if (!holder.__sagwiseDb) {
    holder.__sagwiseDb = openConfigured().catch((error: unknown) => {
      holder.__sagwiseDb = undefined;
      throw error;
    });
  }
  return holder.__sagwiseDb;
}

export async function getDb(): Promise<AppDb> {
  return (await getDatabase()).db;
}

export async function closeDatabase(): Promise<void> {
  const pending = holder.__sagwiseDb;
  holder.__sagwiseDb = undefined;
  if (pending) await (await pending).close();
}

/** Tests hand the app a database of their own (a migrated clone per test file). */
export function installTestDatabase(handle: DatabaseHandle): void {
  holder.__sagwiseDb = Promise.resolve(handle);
}
