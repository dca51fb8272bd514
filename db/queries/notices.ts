// Staff notices (db/tables/notices.ts): who to tell about a request, the notices themselves, and
// the unseen counts the workspace shows. Data access only; lib/notify-staff.ts decides.
import { and, count, eq, inArray, isNull, sql } from "drizzle-orm";
import { getDb, type Executor } from "@/db/client";
import { prepared } from "@/db/prepared";
import { emailWording, setupRequests, shopSettings, staffNotices, user, type StaffNoticeKind } from "@/db/schema";

/** The request's number and rider, its assigned tuner (when active) and the shop's own address. */
export async function findNoticeRecipient(tx: Executor, requestId: string) {
  // One query: the settings row (there is one, id 1) comes along with the request.
  const [row] = await tx
    .select({
      number: setupRequests.number,
      riderName: setupRequests.riderName,
      bikeLabel: setupRequests.bikeLabel,
      tunerEmail: user.email,
      tunerName: user.name,
      tunerBanned: user.banned,
      shopEmail: shopSettings.email,
      shopName: shopSettings.name,
    })
    .from(setupRequests)
    .leftJoin(user, eq(user.id, setupRequests.assignedTunerId))
    .leftJoin(shopSettings, eq(shopSettings.id, 1))
    .where(eq(setupRequests.id, requestId));
  return row ?? null;
}

/**
 * What a rider's e-mail about the request needs, in one query: the request's number, rider and bike,
 * the shop's name (null before the shop has set one) and the owner's wording for `template` (null
 * when the owner wrote none).
 */
export async function findRiderEmailContext(tx: Executor, requestId: string, template: string) {
  const [row] = await tx
    .select({
      number: setupRequests.number,
      riderName: setupRequests.riderName,
      riderEmail: setupRequests.riderEmail,
      bikeLabel: setupRequests.bikeLabel,
      shopName: shopSettings.name,
      wordingHeading: emailWording.heading,
      wordingIntro: emailWording.intro,
      hasWording: emailWording.template,
    })
    .from(setupRequests)
    .leftJoin(shopSettings, eq(shopSettings.id, 1))
    .leftJoin(emailWording, eq(emailWording.template, template))
    .where(eq(setupRequests.id, requestId));
  if (!row) return null;
  const { wordingHeading, wordingIntro, hasWording, ...request } = row;
  return { ...request, wording: hasWording === null ? null : { heading: wordingHeading, intro: wordingIntro } };
}

export async function insertStaffNotice(tx: Executor, values: typeof staffNotices.$inferInsert) {
  const [row] = await tx.insert(staffNotices).values(values).returning();
  return row!;
}

const unseenCounts = prepared("unseen_notice_counts", (db, name) =>
  db
    .select({ kind: staffNotices.kind, n: count() })
    .from(staffNotices)
    .where(isNull(staffNotices.seenAt))
    .groupBy(staffNotices.kind)
    .prepare(name),
);

/** Unseen notices per kind, for the navigation (on every staff page). */
export async function countUnseenNotices(): Promise<Record<StaffNoticeKind, number> & { total: number }> {
  const rows = await unseenCounts(await getDb()).execute();
  const out = { "new-request": 0, "rider-answered": 0, "sag-reported": 0, "payment-received": 0, total: 0 };
  for (const r of rows) {
    out[r.kind] = r.n;
    out.total += r.n;
  }
  return out;
}

// The page's ids go in as one array parameter (`= any($1)`), so the statement is the same for any
// number of rows and can be prepared.
const unseenKindsOf = prepared("unseen_notice_kinds", (db, name) =>
  db
    .selectDistinct({ requestId: staffNotices.requestId, kind: staffNotices.kind })
    .from(staffNotices)
    .where(and(isNull(staffNotices.seenAt), sql`${staffNotices.requestId} = any(${sql.placeholder("ids")}::uuid[])`))
    .prepare(name),
);

/** The kinds of unseen notice on each of `requestIds`, for the marks in the queue. */
export async function listUnseenNoticeKinds(requestIds: string[]): Promise<Map<string, StaffNoticeKind[]>> {
  const out = new Map<string, StaffNoticeKind[]>();
  if (!requestIds.length) return out;
  const rows = await unseenKindsOf(await getDb()).execute({ ids: requestIds });
  for (const r of rows) out.set(r.requestId, [...(out.get(r.requestId) ?? []), r.kind]);
  return out;
}

/** Marks the request's unseen notices (of `kinds`, or all) seen; returns the kinds that were marked. */
export async function markNoticesSeen(
  tx: Executor,
  requestId: string,
  userId: string,
  kinds?: StaffNoticeKind[],
): Promise<StaffNoticeKind[]> {
  const rows = await tx
    .update(staffNotices)
    .set({ seenAt: new Date(), seenBy: userId })
    .where(
      and(
        eq(staffNotices.requestId, requestId),
        isNull(staffNotices.seenAt),
        kinds ? inArray(staffNotices.kind, kinds) : undefined,
      ),
    )
    .returning({ kind: staffNotices.kind });
  return rows.map((r) => r.kind);
}
