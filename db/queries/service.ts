// Service intervals and reminders (db/tables/service.ts): the shop's settings and intervals, the
// hours riders log, what each due date starts from, and the reminders already queued.
import { and, asc, desc, eq, inArray, isNotNull, max, sql } from "drizzle-orm";
import { getDb, type Executor } from "@/db/client";
import {
  orders,
  outboundEmails,
  recommendationVersions,
  serviceHourLogs,
  serviceIntervals,
  serviceReminders,
  serviceSettings,
  setupRequests,
} from "@/db/schema";
import type { ServiceInterval, ServiceItem } from "@/lib/service/items";

export async function getServiceSettings(executor?: Executor) {
  const db = executor ?? (await getDb());
  const [row] = await db.select().from(serviceSettings).where(eq(serviceSettings.id, 1)).limit(1);
  return row ?? null;
}

export async function listServiceIntervals(executor?: Executor): Promise<ServiceInterval[]> {
  const db = executor ?? (await getDb());
  return db
    .select({
      item: serviceIntervals.item,
      discipline: serviceIntervals.discipline,
      hours: serviceIntervals.hours,
      months: serviceIntervals.months,
    })
    .from(serviceIntervals)
    .orderBy(asc(serviceIntervals.discipline), asc(serviceIntervals.item));
}

/** Replaces the settings row and the whole interval table at once. */
export async function saveServiceSettings(values: {
  noticeDays: number;
  timeZone: string;
  intervals: readonly ServiceInterval[];
}) {
  const db = await getDb();
  await db.transaction(async (tx) => {
    const settings = { noticeDays: values.noticeDays, timeZone: values.timeZone, updatedAt: new Date() };
    await tx
      .insert(serviceSettings)
      .values({ id: 1, ...settings })
      .onConflictDoUpdate({ target: serviceSettings.id, set: settings });
    await tx.delete(serviceIntervals);
    if (values.intervals.length) await tx.insert(serviceIntervals).values(values.intervals.map((i) => ({ ...i })));
  });
}

/** Inserts settings and intervals only where none exist yet (the seed). */
export async function insertServiceDefaults(values: {
  noticeDays: number;
  timeZone: string;
  intervals: readonly ServiceInterval[];
}) {
  const db = await getDb();
  await db
    .insert(serviceSettings)
    .values({ id: 1, noticeDays: values.noticeDays, timeZone: values.timeZone })
    .onConflictDoNothing();
  await db
    .insert(serviceIntervals)
    .values(values.intervals.map((i) => ({ ...i })))
    .onConflictDoNothing();
}

export async function insertHourLog(values: { requestId: string; hours: number; riddenOn: string }) {
  const db = await getDb();
  const [row] = await db.insert(serviceHourLogs).values(values).returning();
  return row!;
}

export async function listHourLogs(requestIds: readonly string[]) {
  if (!requestIds.length) return [];
  const db = await getDb();
  return db
    .select({
      id: serviceHourLogs.id,
      requestId: serviceHourLogs.requestId,
      hours: serviceHourLogs.hours,
      riddenOn: serviceHourLogs.riddenOn,
      createdAt: serviceHourLogs.createdAt,
    })
    .from(serviceHourLogs)
    .where(inArray(serviceHourLogs.requestId, [...requestIds]))
    .orderBy(asc(serviceHourLogs.riddenOn), asc(serviceHourLogs.createdAt));
}

/**
 * Requests whose setup the shop approved, with what their service dates start from: the latest
 * approval. `requestId` narrows to one request.
 */
export async function listServiceSubjects(requestId?: string) {
  const db = await getDb();
  const approvedAt = max(recommendationVersions.approvedAt);
  const rows = await db
    .select({
      requestId: setupRequests.id,
      number: setupRequests.number,
      riderName: setupRequests.riderName,
      riderEmail: setupRequests.riderEmail,
      bikeLabel: setupRequests.bikeLabel,
      bikeModelId: setupRequests.bikeModelId,
      discipline: setupRequests.discipline,
      hoursPerMonth: sql<number | null>`(${setupRequests.answers} -> 'riding' ->> 'hoursPerMonth')::double precision`,
      createdAt: setupRequests.createdAt,
      approvedAt,
    })
    .from(setupRequests)
    .innerJoin(recommendationVersions, eq(recommendationVersions.requestId, setupRequests.id))
    .where(
      and(
        inArray(recommendationVersions.state, ["approved", "superseded"]),
        isNotNull(recommendationVersions.approvedAt),
        requestId ? eq(setupRequests.id, requestId) : undefined,
      ),
    )
    .groupBy(setupRequests.id)
    .orderBy(desc(setupRequests.createdAt));
  return rows.map((r) => ({ ...r, approvedAt: r.approvedAt ? new Date(r.approvedAt) : null }));
}
export type ServiceSubject = Awaited<ReturnType<typeof listServiceSubjects>>[number];

/**
 * Each request's latest ship date among its orders: when the suspension left the workshop, where
 * the service clock starts (lib/service/overview.ts decides between this and the approval).
 */
export async function findOrderShipDates(requestIds: readonly string[]): Promise<Map<string, Date>> {
  if (requestIds.length === 0) return new Map();
  const db = await getDb();
  const rows = await db
    .select({ requestId: orders.requestId, shippedAt: max(orders.shippedAt) })
    .from(orders)
    .where(and(inArray(orders.requestId, [...requestIds]), isNotNull(orders.shippedAt)))
    .groupBy(orders.requestId);
  return new Map(rows.filter((r) => r.shippedAt !== null).map((r) => [r.requestId, new Date(r.shippedAt!)]));
}

/** Records a reminder unless one exists for this request, item and due date; the new row's id, or null. */
export async function claimReminder(
  executor: Executor,
  values: { requestId: string; item: ServiceItem; dueOn: string },
) {
  const [row] = await executor
    .insert(serviceReminders)
    .values(values)
    .onConflictDoNothing({ target: [serviceReminders.requestId, serviceReminders.item, serviceReminders.dueOn] })
    .returning({ id: serviceReminders.id });
  return row?.id ?? null;
}

export async function setReminderEmail(executor: Executor, reminderId: string, outboundEmailId: string) {
  await executor.update(serviceReminders).set({ outboundEmailId }).where(eq(serviceReminders.id, reminderId));
}

export async function listReminders(requestIds: readonly string[]) {
  if (!requestIds.length) return [];
  const db = await getDb();
  return db
    .select({
      id: serviceReminders.id,
      requestId: serviceReminders.requestId,
      item: serviceReminders.item,
      dueOn: serviceReminders.dueOn,
      createdAt: serviceReminders.createdAt,
      emailStatus: outboundEmails.status,
    })
    .from(serviceReminders)
    .leftJoin(outboundEmails, eq(outboundEmails.id, serviceReminders.outboundEmailId))
    .where(inArray(serviceReminders.requestId, [...requestIds]))
    .orderBy(desc(serviceReminders.createdAt));
}

/** The last e-mail to each address (sent or queued): "last contact" on the due-soon list. */
export async function lastEmailTo(addresses: readonly string[]): Promise<Map<string, Date>> {
  if (!addresses.length) return new Map();
  const db = await getDb();
  const rows = await db
    .select({ to: outboundEmails.toAddress, at: max(outboundEmails.createdAt) })
    .from(outboundEmails)
    .where(inArray(outboundEmails.toAddress, [...addresses]))
    .groupBy(outboundEmails.toAddress);
  return new Map(rows.flatMap((r) => (r.at ? [[r.to, new Date(r.at)] as const] : [])));
}
