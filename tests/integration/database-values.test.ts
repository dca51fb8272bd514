// Values come back from the database as they went in, through the app's drizzle client, inside and
// outside a transaction: instants (timestamptz), calendar days (date), numbers, jsonb and arrays.
// On PGlite this covers db/pglite.ts, which installs drizzle's text parsers on the client once
// instead of on every query. Reference values: an instant is the same point in time whatever its
// written offset (ISO 8601-1:2019, 4.3.8 and 5.3.4); PostgreSQL prints a date as YYYY-MM-DD
// (PostgreSQL 16 manual, 8.5.2 "Date/Time Output", ISO style).
import { eq, sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { auditEvents, springStock } from "@/db/schema";
import { setupTestApp } from "../helpers/app";

setupTestApp({ seed: true, tempDataDir: true });

// 2026-03-29T01:30:00+02:00 is the instant 2026-03-28T23:30:00Z (ISO 8601: offset subtracted).
const INSTANT = new Date("2026-03-29T01:30:00+02:00");

describe("database values", () => {
  it("reads an instant back as the same instant, in and out of a transaction", async () => {
    const db = await getDb();
    const [row] = await db
      .insert(auditEvents)
      .values({ actorLabel: "values test", action: "test", detail: { n: 1.25 }, createdAt: INSTANT })
      .returning({ id: auditEvents.id });
    const [read] = await db.select().from(auditEvents).where(eq(auditEvents.id, row!.id));
    expect(read!.createdAt).toBeInstanceOf(Date);
    expect(read!.createdAt.toISOString()).toBe("2026-03-28T23:30:00.000Z");
    expect(read!.detail).toEqual({ n: 1.25 });
    const inTx = await db.transaction(async (tx) => {
      const [r] = await tx.select().from(auditEvents).where(eq(auditEvents.id, row!.id));
      return r!;
    });
    expect(inTx.createdAt.getTime()).toBe(INSTANT.getTime());
  });

  it("reads numbers, days and arrays as PostgreSQL gives them", async () => {
    const db = await getDb();
    const result = (await db.execute(
      sql`select 61.5::float8 as rate, 3::int as count, '2026-02-28'::date as day,
                 array[1, 2, 3]::int[] as list, '{"a": [1, 2]}'::jsonb as doc`,
    )) as unknown as { rows: Record<string, unknown>[] };
    const r = result.rows[0]!;
    expect(r.rate).toBe(61.5);
    expect(r.count).toBe(3);
    // drizzle reads days as text and turns them into what the column asks for.
    expect(r.day).toBe("2026-02-28");
    expect(r.list).toEqual([1, 2, 3]);
    expect(r.doc).toEqual({ a: [1, 2] });
    const [stock] = await db.select({ rate: springStock.rateNmm }).from(springStock).limit(1);
    expect(typeof stock!.rate).toBe("number");
  });
});
