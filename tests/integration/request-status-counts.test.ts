// The per-status request counts the database keeps (request_status_counts, migration
// 0007_request_status_counts): after any mix of inserts, status changes, other updates, deletes,
// a rolled-back write and a truncate, they equal a plain count(*) per status of setup_requests.
// Row triggers run inside the writer's transaction, so a rolled-back write leaves no trace
// (PostgreSQL 16 manual, "Overview of Trigger Behavior"). The migration also counts the requests
// that were already there when it ran.
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { eq, inArray, sql } from "drizzle-orm";
import { drizzle } from "drizzle-orm/pglite";
import { describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { MIGRATIONS_FOLDER } from "@/db/migrate";
import { createPglite } from "@/db/pglite";
import { countRequestsByStatus } from "@/db/queries/requests";
import * as schema from "@/db/schema";
import { requestStatusCounts, setupRequests } from "@/db/schema";
import { setupTestApp } from "../helpers/app";

setupTestApp({ seed: true, tempDataDir: true });

type Db = Awaited<ReturnType<typeof getDb>>;

/** count(*) per status straight from the table: the oracle. */
async function counted(db: Db): Promise<Record<string, number>> {
  const rows = await db
    .select({ status: setupRequests.status, n: sql<number>`count(*)::int` })
    .from(setupRequests)
    .groupBy(setupRequests.status);
  return Object.fromEntries(rows.map((r) => [r.status, r.n]));
}

/** The kept counts, without statuses at zero (the oracle has no row for an empty status). */
async function kept(db: Db): Promise<Record<string, number>> {
  const rows = await db.select().from(requestStatusCounts);
  return Object.fromEntries(rows.filter((r) => r.n !== 0).map((r) => [r.status, r.n]));
}

const bulk = (n: number, status: "submitted" | "in_review" | "approved") =>
  Array.from({ length: n }, (_, i) => ({
    status,
    riderName: `Count ${status} ${i}`,
    riderEmail: `count-${status}-${i}@example.test`,
    discipline: "enduro",
    skill: "intermediate",
    bikeClass: "count-class",
    bikeLabel: "Count class (typical)",
    riderMassKg: 70,
    answers: {},
  }));

describe("request status counts", () => {
  it("follow inserts, status changes, deletes and rollbacks, and match count(*) per status", async () => {
    const db = await getDb();
    expect(await kept(db)).toEqual(await counted(db));

    const added = await db
      .insert(setupRequests)
      .values([...bulk(7, "submitted"), ...bulk(4, "in_review"), ...bulk(3, "approved")])
      .returning({ id: setupRequests.id, status: setupRequests.status });
    expect(await kept(db)).toEqual(await counted(db));

    // Moving statuses both ways, one row at a time and many in one statement.
    const submitted = added.filter((r) => r.status === "submitted").map((r) => r.id);
    await db.update(setupRequests).set({ status: "in_review" }).where(eq(setupRequests.id, submitted[0]!));
    await db
      .update(setupRequests)
      .set({ status: "declined" })
      .where(inArray(setupRequests.id, submitted.slice(1, 4)));
    await db.execute(
      sql`update setup_requests set status = 'submitted' where status = 'approved' and bike_class = 'count-class'`,
    );
    // An update that leaves the status as it was, and one of other columns only.
    await db.update(setupRequests).set({ status: "declined" }).where(eq(setupRequests.id, submitted[1]!));
    await db.update(setupRequests).set({ updatedAt: new Date() });
    expect(await kept(db)).toEqual(await counted(db));

    const before = await kept(db);
    await db
      .transaction(async (tx) => {
        await tx.insert(setupRequests).values(bulk(5, "approved"));
        await tx.update(setupRequests).set({ status: "approved" }).where(eq(setupRequests.bikeClass, "count-class"));
        throw new Error("roll back");
      })
      .catch(() => undefined);
    expect(await kept(db)).toEqual(before);

    await db.delete(setupRequests).where(inArray(setupRequests.id, submitted.slice(4)));
    expect(await kept(db)).toEqual(await counted(db));

    // What the queue reads: every status named, zero where none are left.
    const byStatus = await countRequestsByStatus();
    const oracle = await counted(db);
    for (const [status, n] of Object.entries(byStatus)) expect(n).toBe(oracle[status] ?? 0);
  });

  it("start from zero after a truncate", async () => {
    const db = await getDb();
    await db.execute(sql`truncate setup_requests cascade`);
    expect(await kept(db)).toEqual({});
    await db.insert(setupRequests).values(bulk(2, "in_review"));
    expect(await kept(db)).toEqual({ in_review: 2 });
  });

  it("count the requests already there when the migration runs", async () => {
    // The migrations up to the one before the counts, on a database of their own.
    const folder = mkdtempSync(path.join(os.tmpdir(), "sagwise-migrations-"));
    try {
      cpSync(MIGRATIONS_FOLDER, folder, { recursive: true });
      const journalPath = path.join(folder, "meta", "_journal.json");
      const journal = JSON.parse(readFileSync(journalPath, "utf8")) as { entries: { tag: string }[] };
      const at = journal.entries.findIndex((e) => e.tag === "0007_request_status_counts");
      expect(at).toBeGreaterThan(0);
      writeFileSync(journalPath, JSON.stringify({ ...journal, entries: journal.entries.slice(0, at) }));

      const client = await createPglite();
      const { migrate } = await import("drizzle-orm/pglite/migrator");
      const own = drizzle({ client, schema });
      await migrate(own, { migrationsFolder: folder });
      await own.insert(setupRequests).values([...bulk(3, "submitted"), ...bulk(2, "approved")]);
      await migrate(own, { migrationsFolder: MIGRATIONS_FOLDER });
      const rows = await own.select().from(requestStatusCounts);
      expect(Object.fromEntries(rows.map((r) => [r.status, r.n]))).toEqual({ submitted: 3, approved: 2 });
      await client.close();
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }
  });
});
