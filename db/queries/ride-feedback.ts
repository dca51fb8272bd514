// The rider's word on how the bike rides after the first rides, and the tuner's revision from it.
import { and, desc, eq, isNull, sql } from "drizzle-orm";
import { getDb, type Executor } from "@/db/client";
import { prepared } from "@/db/prepared";
import { rideFeedback } from "@/db/schema";

export type RideFeedbackRow = typeof rideFeedback.$inferSelect;

export async function insertRideFeedback(values: typeof rideFeedback.$inferInsert): Promise<RideFeedbackRow> {
  const db = await getDb();
  const [row] = await db.insert(rideFeedback).values(values).returning();
  return row!;
}

const requestFeedback = prepared("request_ride_feedback", (db, name) =>
  db
    .select()
    .from(rideFeedback)
    .where(eq(rideFeedback.requestId, sql.placeholder("id")))
    .orderBy(desc(rideFeedback.createdAt))
    .prepare(name),
);

export async function listRideFeedback(requestId: string): Promise<RideFeedbackRow[]> {
  return requestFeedback(await getDb()).execute({ id: requestId });
}

export async function findRideFeedback(requestId: string, id: string, executor?: Executor) {
  const db = executor ?? (await getDb());
  const [row] = await db
    .select()
    .from(rideFeedback)
    .where(and(eq(rideFeedback.requestId, requestId), eq(rideFeedback.id, id)));
  return row ?? null;
}

/** Marks the feedback as answered by `version`; false when it was answered meanwhile. */
export async function markRideFeedbackRevised(id: string, version: number, executor?: Executor): Promise<boolean> {
  const db = executor ?? (await getDb());
  const rows = await db
    .update(rideFeedback)
    .set({ revisedVersion: version })
    .where(and(eq(rideFeedback.id, id), isNull(rideFeedback.revisedVersion)))
    .returning({ id: rideFeedback.id });
  return rows.length === 1;
}
