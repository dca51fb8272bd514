import { and, asc, count, desc, eq, gte, inArray, isNull, like, lt, or, sql, type SQL } from "drizzle-orm";
import { getDb } from "@/db/client";
import { containsPattern } from "./like";
import { REQUEST_STATUSES, requestStatusCounts, setupRequests, user, type RequestStatus } from "@/db/schema";
import type { QueueQuery } from "@/lib/validations/queue";

/** Requests per status, from the counts the database keeps as rows change (request_status_counts). */
export async function countRequestsByStatus(): Promise<Record<RequestStatus, number>> {
  const db = await getDb();
  const rows = await db.select().from(requestStatusCounts);
  const counts = Object.fromEntries(REQUEST_STATUSES.map((s) => [s, 0])) as Record<RequestStatus, number>;
  for (const row of rows) if (row.status in counts) counts[row.status] = row.n;
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

/** Every request made with this e-mail: the rider's "my requests" after an e-mail-link sign-in. */
export async function listRequestsForRiderEmail(email: string) {
  const db = await getDb();
  return db
    .select(summaryColumns)
    .from(setupRequests)
    .where(eq(setupRequests.riderEmail, email.toLowerCase()))
    .orderBy(desc(setupRequests.createdAt));
}

// Status sorts by the workflow (REQUEST_STATUSES' order: submitted → in review → waiting for the
// rider → approved → declined), not alphabetically.
const statusRank = sql`array_position(array[${sql.join(
  REQUEST_STATUSES.map((s) => sql`${s}`),
  sql`, `,
)}]::text[], ${setupRequests.status})`;

const QUEUE_ORDER = {
  newest: [desc(setupRequests.createdAt)],
  oldest: [asc(setupRequests.createdAt)],
  number: [desc(setupRequests.number)],
  number_asc: [asc(setupRequests.number)],
  rider: [asc(sql`lower(${setupRequests.riderName})`), desc(setupRequests.createdAt)],
  rider_desc: [desc(sql`lower(${setupRequests.riderName})`), desc(setupRequests.createdAt)],
  status: [asc(statusRank), desc(setupRequests.createdAt)],
  status_desc: [desc(statusRank), desc(setupRequests.createdAt)],
} as const satisfies Record<QueueQuery["sort"], unknown[]>;

const DAY_MS = 86_400_000;

/** The WHERE of the queue; each filter hits an index (status/discipline/bike class/tuner + created). */
function queueConditions(query: QueueQuery, callerId?: string): SQL | undefined {
  const conditions: SQL[] = [];
  if (query.status) conditions.push(eq(setupRequests.status, query.status));
  if (query.discipline) conditions.push(eq(setupRequests.discipline, query.discipline));
  if (query.bikeClass) conditions.push(eq(setupRequests.bikeClass, query.bikeClass));
  if (query.tuner === "unassigned") conditions.push(isNull(setupRequests.assignedTunerId));
  else if (query.tuner === "me" && callerId) conditions.push(eq(setupRequests.assignedTunerId, callerId));
  else if (query.tuner && query.tuner !== "me") conditions.push(eq(setupRequests.assignedTunerId, query.tuner));
  // Dates are whole UTC days; "to" includes its whole day.
  if (query.from) conditions.push(gte(setupRequests.createdAt, new Date(`${query.from}T00:00:00Z`)));
  if (query.to) conditions.push(lt(setupRequests.createdAt, new Date(Date.parse(`${query.to}T00:00:00Z`) + DAY_MS)));
  if (query.q) {
    // search_text is lower-cased and trigram-indexed; LIKE wildcards typed by the user are literal.
    const pattern = containsPattern(query.q.toLowerCase());
    // Every e-mail says "request 13": "13", "#13" or "request 13" finds that request by number too.
    const number = /^(?:request\s*|no\.?\s*|#)?(\d{1,15})$/i.exec(query.q.trim())?.[1];
    conditions.push(
      number
        ? or(eq(setupRequests.number, Number(number)), like(setupRequests.searchText, pattern))!
        : like(setupRequests.searchText, pattern),
    );
  }
  return conditions.length ? and(...conditions) : undefined;
}

/**
 * How many requests match the queue's filters. The whole queue and one status come from the counts
 * kept by the database (request_status_counts), so a deep queue costs no more to total than a short
 * one; any other filter counts its matching rows through its index.
 */
async function queueTotal(query: QueueQuery, where: SQL | undefined, callerId?: string): Promise<number> {
  const db = await getDb();
  if (queueConditions({ ...query, status: undefined }, callerId)) {
    const [row] = await db.select({ n: count() }).from(setupRequests).where(where);
    return Number(row?.n ?? 0);
  }
  const rows = await db
    .select({ n: requestStatusCounts.n })
    .from(requestStatusCounts)
    .where(query.status ? eq(requestStatusCounts.status, query.status) : undefined);
  return rows.reduce((sum, row) => sum + row.n, 0);
}

/**
 * One page of the staff queue with the total matching rows. The tuner's name comes from a join
 * (one query for the page, one for the total: no per-row lookups).
 */
export async function listQueue(query: QueueQuery, callerId?: string) {
  const db = await getDb();
  const where = queueConditions(query, callerId);
  const order = QUEUE_ORDER[query.sort];
  // The page's rows are chosen first (an index walk, even past a deep offset), and only those
  // 25-odd rows are joined to their tuner: a join before the offset would run for every skipped row.
  const pageIds = db
    .select({ id: setupRequests.id })
    .from(setupRequests)
    .where(where)
    .orderBy(...order)
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  const [items, total] = await Promise.all([
    db
      .select({
        ...summaryColumns,
        riderEmail: setupRequests.riderEmail,
        skill: setupRequests.skill,
        bikeClass: setupRequests.bikeClass,
        assignedTunerId: setupRequests.assignedTunerId,
        assignedTunerName: user.name,
        updatedAt: setupRequests.updatedAt,
      })
      .from(setupRequests)
      .leftJoin(user, eq(user.id, setupRequests.assignedTunerId))
      .where(inArray(setupRequests.id, pageIds))
      .orderBy(...order),
    queueTotal(query, where, callerId),
  ]);
  return { items, total };
}

export type QueueItem = Awaited<ReturnType<typeof listQueue>>["items"][number];
