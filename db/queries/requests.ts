import { and, asc, count, desc, eq, like, sql } from "drizzle-orm";
import { getDb } from "@/db/client";
import { REQUEST_STATUSES, setupRequests, type RequestStatus } from "@/db/schema";
import type { QueueQuery } from "@/lib/validations/queue";

export async function countRequestsByStatus(): Promise<Record<RequestStatus, number>> {
  const db = await getDb();
  const rows = await db
    .select({ status: setupRequests.status, n: count() })
    .from(setupRequests)
    .groupBy(setupRequests.status);
  const counts = Object.fromEntries(REQUEST_STATUSES.map((s) => [s, 0])) as Record<
    RequestStatus,
    number
  >;
  for (const row of rows) counts[row.status] = Number(row.n);
  return counts;
}

const summaryColumns = {
  id: setupRequests.id,
  number: setupRequests.number,
  status: setupRequests.status,
  riderName: setupRequests.riderName,
  bikeLabel: setupRequests.bikeLabel,
  discipline: setupRequests.discipline,
  createdAt: setupRequests.createdAt,
};

export async function listRecentRequests(limit: number) {
  const db = await getDb();
  return db
    .select(summaryColumns)
    .from(setupRequests)
    .orderBy(desc(setupRequests.createdAt))
    .limit(limit);
}

/** Every request made with this e-mail: the rider's "my requests" after an e-mail-link sign-in. */
export async function listRequestsForRiderEmail(email: string) {
  const db = await getDb();
  return db
    .select(summaryColumns)
    .from(setupRequests)
    .where(eq(setupRequests.riderEmail, email.toLowerCase()))
    .orderBy(desc(setupRequests.createdAt));
}

const QUEUE_ORDER = {
  newest: [desc(setupRequests.createdAt)],
  oldest: [asc(setupRequests.createdAt)],
  number: [desc(setupRequests.number)],
  rider: [asc(sql`lower(${setupRequests.riderName})`), desc(setupRequests.createdAt)],
  status: [asc(setupRequests.status), desc(setupRequests.createdAt)],
} as const;

/** One page of the staff queue with the total matching rows. */
export async function listQueue(query: QueueQuery) {
  const db = await getDb();
  const conditions = [];
  if (query.status) conditions.push(eq(setupRequests.status, query.status));
  if (query.q) {
    // search_text is lower-cased and trigram-indexed; LIKE wildcards typed by the user are literal.
    const pattern = `%${query.q.toLowerCase().replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    conditions.push(like(setupRequests.searchText, pattern));
  }
  const where = conditions.length ? and(...conditions) : undefined;
  const [items, totals] = await Promise.all([
    db
      .select({ ...summaryColumns, riderEmail: setupRequests.riderEmail, skill: setupRequests.skill })
      .from(setupRequests)
      .where(where)
      .orderBy(...QUEUE_ORDER[query.sort])
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize),
    db.select({ n: count() }).from(setupRequests).where(where),
  ]);
  return { items, total: Number(totals[0]?.n ?? 0) };
}
