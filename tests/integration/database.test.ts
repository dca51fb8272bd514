import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openPglite, type DatabaseHandle } from "@/db/client";
import { applyMigrations, latestAppliedMigration, readJournal } from "@/db/migrate";
import { shopSettings } from "@/db/schema";
import { closeTestDatabase, createTestDatabase } from "../helpers/db";

describe("migrations", () => {
  let handle: DatabaseHandle;
  beforeAll(async () => {
    handle = await createTestDatabase();
  });
  afterAll(closeTestDatabase);

  it("create every table of the data model", async () => {
    const result = await handle.db.execute(
      sql`select table_name from information_schema.tables where table_schema = 'public'`,
    );
    const names = (result as unknown as { rows: { table_name: string }[] }).rows.map((r) => r.table_name);
    for (const table of [
      "user",
      "session",
      "account",
      "verification",
      "shop_settings",
      "bike_models",
      "spring_stock",
      "setup_targets",
      "clicker_rules",
      "setup_requests",
      "recommendation_versions",
      "request_messages",
      "uploads",
      "sag_reports",
      "audit_events",
      "outbound_emails",
    ]) {
      expect(names).toContain(table);
    }
  });

  it("record the newest migration of the journal as applied", async () => {
    const journal = readJournal();
    expect(await latestAppliedMigration(handle)).toBe(journal[journal.length - 1]?.tag);
  });
});

describe("PGlite on disk", () => {
  const dir = mkdtempSync(path.join(os.tmpdir(), "sagwise-disk-"));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it("applies migrations to an empty folder, and keeps data across close and reopen", async () => {
    const dataDir = path.join(dir, "pglite");
    const first = await openPglite(dataDir);
    await applyMigrations(first);
    await first.db.insert(shopSettings).values({ name: "Reopen test", email: "a@b.test" });
    await first.close();

    const second = await openPglite(dataDir);
    const rows = await second.db.select().from(shopSettings).where(eq(shopSettings.id, 1));
    expect(rows[0]?.name).toBe("Reopen test");
    await second.close();
  }, 60_000);
});
