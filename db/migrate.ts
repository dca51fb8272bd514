// Applies the committed drizzle-kit migrations with the driver's own migrator, and tells which one
// is the latest applied (for /api/health).
import { readFileSync } from "node:fs";
import path from "node:path";
import { sql } from "drizzle-orm";
import type { DatabaseHandle } from "./client";

export const MIGRATIONS_FOLDER = path.join(process.cwd(), "db", "migrations");

interface JournalEntry {
  idx: number;
  when: number;
  tag: string;
}

export function readJournal(folder = MIGRATIONS_FOLDER): JournalEntry[] {
  const raw = readFileSync(path.join(folder, "meta", "_journal.json"), "utf8");
  return (JSON.parse(raw) as { entries: JournalEntry[] }).entries;
}

export async function applyMigrations(handle: DatabaseHandle, folder = MIGRATIONS_FOLDER) {
  if (handle.kind === "pglite") {
    const { migrate } = await import("drizzle-orm/pglite/migrator");
    await migrate(handle.db as never, { migrationsFolder: folder });
  } else {
    const { migrate } = await import("drizzle-orm/node-postgres/migrator");
    await migrate(handle.db as never, { migrationsFolder: folder });
  }
}

/** Tag of the newest migration recorded as applied, or null on an unmigrated database. */
export async function latestAppliedMigration(handle: DatabaseHandle): Promise<string | null> {
  const result = await handle.db.execute(
    sql`select created_at from drizzle.__drizzle_migrations order by created_at desc limit 1`,
  );
  const rows = (result as unknown as { rows: { created_at: string | number }[] }).rows;
  const first = rows[0];
  if (!first) return null;
  const when = Number(first.created_at);
  return readJournal().find((entry) => entry.when === when)?.tag ?? null;
}
