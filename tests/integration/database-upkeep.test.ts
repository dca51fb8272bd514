// The embedded database's upkeep (db/upkeep.ts): VACUUM (ANALYZE) marks the pages of a table
// all-visible and records its row count for the planner, which PostgreSQL keeps in pg_class
// (relallvisible: "number of pages that are marked all-visible in the table's visibility map",
// reltuples: "-1 indicating that the row count is unknown"; PostgreSQL 16 manual, 53.11 pg_class).
// On a PostgreSQL server the server's own autovacuum does this and the job leaves it alone.
import { sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { getDatabase } from "@/db/client";
import { setupRequests } from "@/db/schema";
import { vacuumEmbeddedDatabase } from "@/db/upkeep";
import { setupTestApp } from "../helpers/app";

setupTestApp({ seed: true, tempDataDir: true });

async function stats(table: string) {
  const { db } = await getDatabase();
  const result = (await db.execute(
    sql`select relallvisible::int as visible, reltuples::float8 as tuples from pg_class where relname = ${table}`,
  )) as unknown as { rows: { visible: number; tuples: number }[] };
  return result.rows[0]!;
}

describe("database upkeep", () => {
  it("vacuums and analyzes the embedded database; leaves a PostgreSQL server to its autovacuum", async () => {
    const handle = await getDatabase();
    // Dead row versions to clear: every request updated once.
    await handle.db.update(setupRequests).set({ updatedAt: new Date() });
    const ran = await vacuumEmbeddedDatabase();
    if (handle.kind !== "pglite") {
      expect(ran).toBe(false);
      return;
    }
    expect(ran).toBe(true);
    const counted = (await handle.db.execute(sql`select count(*)::int as n from setup_requests`)) as unknown as {
      rows: { n: number }[];
    };
    const after = await stats("setup_requests");
    expect(after.visible).toBeGreaterThan(0);
    expect(after.tuples).toBe(counted.rows[0]!.n);
  });
});
