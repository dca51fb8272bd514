// Data access for orders: rows in and out, in the caller's transaction when given. No business
// rules here (lib/orders decides what a move or a payment means).
import { and, asc, desc, eq, inArray, isNotNull, isNull, sql } from "drizzle-orm";
import { getDb, type Executor } from "@/db/client";
import {
  bikeModels,
  finisherJobs,
  finishers,
  orderEvents,
  orderLines,
  orderPhotos,
  orders,
  orderSettings,
  paymentEvents,
  payments,
  priceItems,
  recommendationVersions,
  setupRequests,
  springStock,
  user,
} from "@/db/schema";
import type { OrderStage } from "@/lib/orders/stages";

export type OrderRow = typeof orders.$inferSelect;
export type OrderLineRow = typeof orderLines.$inferSelect;
export type OrderLineInsert = typeof orderLines.$inferInsert;
export type PaymentRow = typeof payments.$inferSelect;
export type OrderSettingsRow = typeof orderSettings.$inferSelect;
export type PriceItemRow = typeof priceItems.$inferSelect;
export type FinisherRow = typeof finishers.$inferSelect;

const exec = async (executor?: Executor) => executor ?? (await getDb());

/** The settings row, or the defaults the table declares when the shop has saved none. */
export async function getOrderSettings(executor?: Executor): Promise<OrderSettingsRow> {
  const db = await exec(executor);
  const [row] = await db.select().from(orderSettings).where(eq(orderSettings.id, 1)).limit(1);
  if (row) return row;
  const [created] = await db.insert(orderSettings).values({ id: 1 }).onConflictDoNothing().returning();
  return created ?? (await db.select().from(orderSettings).where(eq(orderSettings.id, 1)))[0]!;
}

export type OrderSettingsValues = Omit<typeof orderSettings.$inferInsert, "id" | "updatedAt">;

export async function saveOrderSettings(values: OrderSettingsValues, executor?: Executor) {
  const db = await exec(executor);
  const [row] = await db
    .insert(orderSettings)
    .values({ ...values, id: 1 })
    .onConflictDoUpdate({ target: orderSettings.id, set: { ...values, updatedAt: new Date() } })
    .returning();
  return row!;
}

export async function listPriceItems(options: { activeOnly?: boolean } = {}, executor?: Executor) {
  const db = await exec(executor);
  return db
    .select()
    .from(priceItems)
    .where(options.activeOnly ? eq(priceItems.active, true) : undefined)
    .orderBy(asc(priceItems.sortOrder), asc(priceItems.label));
}

export async function findPriceItemsByCode(codes: string[], executor?: Executor) {
  if (!codes.length) return [];
  const db = await exec(executor);
  return db
    .select()
    .from(priceItems)
    .where(and(inArray(priceItems.code, codes), eq(priceItems.active, true)));
}

export async function findPriceItemsByIds(ids: string[], executor?: Executor) {
  if (!ids.length) return [];
  const db = await exec(executor);
  return db.select().from(priceItems).where(inArray(priceItems.id, ids));
}

export async function upsertPriceItem(values: typeof priceItems.$inferInsert, executor?: Executor) {
  const db = await exec(executor);
  const [row] = await db
    .insert(priceItems)
    .values(values)
    .onConflictDoUpdate({
      target: priceItems.code,
      set: {
        label: values.label,
        kind: values.kind,
        unitPriceMinor: values.unitPriceMinor,
        active: values.active ?? true,
        sortOrder: values.sortOrder ?? 0,
        updatedAt: new Date(),
      },
    })
    .returning();
  return row!;
}

export async function listFinishers(options: { activeOnly?: boolean } = {}, executor?: Executor) {
  const db = await exec(executor);
  return db
    .select()
    .from(finishers)
    .where(options.activeOnly ? eq(finishers.active, true) : undefined)
    .orderBy(asc(finishers.name));
}

export async function findFinisher(id: string, executor?: Executor) {
  const db = await exec(executor);
  const [row] = await db.select().from(finishers).where(eq(finishers.id, id)).limit(1);
  return row ?? null;
}

export async function insertFinisher(values: typeof finishers.$inferInsert, executor?: Executor) {
  const db = await exec(executor);
  const [row] = await db.insert(finishers).values(values).returning();
  return row!;
}

export async function updateFinisher(id: string, values: Partial<typeof finishers.$inferInsert>, executor?: Executor) {
  const db = await exec(executor);
  const [row] = await db.update(finishers).set(values).where(eq(finishers.id, id)).returning();
  return row ?? null;
}

export async function insertOrder(values: typeof orders.$inferInsert, executor?: Executor) {
  const db = await exec(executor);
  const [row] = await db.insert(orders).values(values).returning();
  return row!;
}

export async function findOrder(id: string, executor?: Executor): Promise<OrderRow | null> {
  const db = await exec(executor);
  const [row] = await db.select().from(orders).where(eq(orders.id, id)).limit(1);
  return row ?? null;
}

/** The order row locked for the rest of the caller's transaction (one change at a time). */
export async function lockOrder(id: string, executor: Executor): Promise<OrderRow | null> {
  const [row] = await executor.select().from(orders).where(eq(orders.id, id)).for("update").limit(1);
  return row ?? null;
}

export async function updateOrder(id: string, values: Partial<typeof orders.$inferInsert>, executor?: Executor) {
  const db = await exec(executor);
  const [row] = await db
    .update(orders)
    .set({ ...values, updatedAt: new Date() })
    .where(eq(orders.id, id))
    .returning();
  return row ?? null;
}

/** Orders of a request, newest first (the status page shows them). */
export async function listOrdersForRequest(requestId: string, executor?: Executor) {
  const db = await exec(executor);
  return db.select().from(orders).where(eq(orders.requestId, requestId)).orderBy(desc(orders.createdAt));
}

/**
 * The newest order of a request that has shipped (shippedAt set): when the rebuilt suspension or
 * the springs left the shop, the start of the service intervals.
 */
export async function findLatestShippedOrderForRequest(requestId: string, executor?: Executor) {
  const db = await exec(executor);
  const [row] = await db
    .select({ id: orders.id, number: orders.number, serviceType: orders.serviceType, shippedAt: orders.shippedAt })
    .from(orders)
    .where(and(eq(orders.requestId, requestId), isNotNull(orders.shippedAt)))
    .orderBy(desc(orders.shippedAt))
    .limit(1);
  return row ? { ...row, shippedAt: row.shippedAt! } : null;
}

export async function listOrderLines(orderId: string, executor?: Executor) {
  const db = await exec(executor);
  return db
    .select()
    .from(orderLines)
    .where(eq(orderLines.orderId, orderId))
    .orderBy(asc(orderLines.sortOrder), asc(orderLines.id));
}

export async function replaceOrderLines(orderId: string, lines: OrderLineInsert[], executor: Executor) {
  await executor.delete(orderLines).where(eq(orderLines.orderId, orderId));
  if (lines.length) await executor.insert(orderLines).values(lines);
}

export async function insertOrderEvent(values: typeof orderEvents.$inferInsert, executor?: Executor) {
  const db = await exec(executor);
  await db.insert(orderEvents).values(values);
}

export async function listOrderEvents(orderId: string, executor?: Executor) {
  const db = await exec(executor);
  return db
    .select()
    .from(orderEvents)
    .where(eq(orderEvents.orderId, orderId))
    .orderBy(asc(orderEvents.createdAt), asc(orderEvents.id));
}

export async function listFinisherJobs(orderId: string, executor?: Executor) {
  const db = await exec(executor);
  return db
    .select({
      id: finisherJobs.id,
      part: finisherJobs.part,
      sentOn: finisherJobs.sentOn,
      dueOn: finisherJobs.dueOn,
      backOn: finisherJobs.backOn,
      finisherId: finisherJobs.finisherId,
      finisherName: finishers.name,
    })
    .from(finisherJobs)
    .innerJoin(finishers, eq(finishers.id, finisherJobs.finisherId))
    .where(eq(finisherJobs.orderId, orderId))
    .orderBy(asc(finisherJobs.sentOn), asc(finisherJobs.createdAt));
}

export async function insertFinisherJob(values: typeof finisherJobs.$inferInsert, executor?: Executor) {
  const db = await exec(executor);
  const [row] = await db.insert(finisherJobs).values(values).returning();
  return row!;
}

/** Marks a part back from its finisher; null when the job is not this order's or is already back. */
export async function markFinisherJobBack(orderId: string, jobId: string, backOn: string, executor: Executor) {
  const [row] = await executor
    .update(finisherJobs)
    .set({ backOn })
    .where(and(eq(finisherJobs.id, jobId), eq(finisherJobs.orderId, orderId), isNull(finisherJobs.backOn)))
    .returning();
  return row ?? null;
}

export async function countOpenFinisherJobs(orderId: string, executor: Executor): Promise<number> {
  const [row] = await executor
    .select({ n: sql<number>`count(*)::int` })
    .from(finisherJobs)
    .where(and(eq(finisherJobs.orderId, orderId), isNull(finisherJobs.backOn)));
  return row?.n ?? 0;
}

/** Parts out at a finisher past their due date (as of `today`, an ISO date), oldest due first. */
export async function listOverdueFinisherJobs(today: string, executor?: Executor) {
  const db = await exec(executor);
  return db
    .select({
      jobId: finisherJobs.id,
      orderId: finisherJobs.orderId,
      part: finisherJobs.part,
      dueOn: finisherJobs.dueOn,
      finisherName: finishers.name,
    })
    .from(finisherJobs)
    .innerJoin(finishers, eq(finishers.id, finisherJobs.finisherId))
    .where(and(isNull(finisherJobs.backOn), sql`${finisherJobs.dueOn} < ${today}`))
    .orderBy(asc(finisherJobs.dueOn));
}

export async function insertPayment(values: typeof payments.$inferInsert, executor?: Executor) {
  const db = await exec(executor);
  const [row] = await db.insert(payments).values(values).returning();
  return row!;
}

export async function listPayments(orderId: string, executor?: Executor) {
  const db = await exec(executor);
  return db.select().from(payments).where(eq(payments.orderId, orderId)).orderBy(asc(payments.createdAt));
}

export async function findPaymentBySession(sessionId: string, executor: Executor) {
  const [row] = await executor
    .select()
    .from(payments)
    .where(eq(payments.providerSessionId, sessionId))
    .for("update")
    .limit(1);
  return row ?? null;
}

/** Marks an open charge paid; null when it was paid already (a second delivery changes nothing). */
export async function markPaymentPaid(id: string, paymentIntentId: string | null, executor: Executor) {
  const [row] = await executor
    .update(payments)
    .set({ status: "paid", paidAt: new Date(), providerPaymentIntentId: paymentIntentId })
    .where(and(eq(payments.id, id), eq(payments.status, "open")))
    .returning();
  return row ?? null;
}

/** Records a webhook event id; false when it was recorded before (a redelivery). */
export async function claimPaymentEvent(eventId: string, type: string, executor: Executor): Promise<boolean> {
  const rows = await executor
    .insert(paymentEvents)
    .values({ eventId, type })
    .onConflictDoNothing()
    .returning({ id: paymentEvents.eventId });
  return rows.length === 1;
}

export async function insertOrderPhoto(values: typeof orderPhotos.$inferInsert, executor?: Executor) {
  const db = await exec(executor);
  const [row] = await db.insert(orderPhotos).values(values).returning();
  return row!;
}

export async function listOrderPhotos(orderId: string, executor?: Executor) {
  const db = await exec(executor);
  return db.select().from(orderPhotos).where(eq(orderPhotos.orderId, orderId)).orderBy(asc(orderPhotos.createdAt));
}

export async function findOrderPhoto(orderId: string, photoId: string) {
  const db = await getDb();
  const [row] = await db
    .select()
    .from(orderPhotos)
    .where(and(eq(orderPhotos.id, photoId), eq(orderPhotos.orderId, orderId)))
    .limit(1);
  return row ?? null;
}

/** The board: every order not closed long ago, with its request and tuner, by stage. */
export async function listBoardOrders(filters: { tunerId?: string; dueBefore?: string; stages?: OrderStage[] } = {}) {
  const db = await getDb();
  const where = [];
  if (filters.tunerId) where.push(eq(orders.assignedTunerId, filters.tunerId));
  if (filters.dueBefore) where.push(sql`${orders.dueOn} <= ${filters.dueBefore}`);
  if (filters.stages?.length) where.push(inArray(orders.stage, filters.stages));
  const openJobs = db
    .select({
      orderId: finisherJobs.orderId,
      earliestDue: sql<string | null>`min(${finisherJobs.dueOn})`.as("earliest_due"),
      open: sql<number>`count(*)::int`.as("open"),
    })
    .from(finisherJobs)
    .where(isNull(finisherJobs.backOn))
    .groupBy(finisherJobs.orderId)
    .as("open_jobs");
  return db
    .select({
      id: orders.id,
      number: orders.number,
      stage: orders.stage,
      serviceType: orders.serviceType,
      dueOn: orders.dueOn,
      paymentStatus: orders.paymentStatus,
      acceptedAt: orders.acceptedAt,
      requestId: orders.requestId,
      requestNumber: setupRequests.number,
      riderName: setupRequests.riderName,
      bikeLabel: setupRequests.bikeLabel,
      tunerId: orders.assignedTunerId,
      tunerName: user.name,
      finisherDueOn: openJobs.earliestDue,
      openFinisherJobs: openJobs.open,
      updatedAt: orders.updatedAt,
    })
    .from(orders)
    .innerJoin(setupRequests, eq(setupRequests.id, orders.requestId))
    .leftJoin(user, eq(user.id, orders.assignedTunerId))
    .leftJoin(openJobs, eq(openJobs.orderId, orders.id))
    .where(where.length ? and(...where) : undefined)
    .orderBy(asc(orders.dueOn), asc(orders.number));
}

export type BoardOrder = Awaited<ReturnType<typeof listBoardOrders>>[number];

/** A spring on the shelf of this end and rate (to 0.01 N/mm), for its free length on the build sheet. */
export async function findShelfSpring(end: "fork" | "shock", rateNmm: number, executor?: Executor) {
  const db = await exec(executor);
  const [row] = await db
    .select({ freeLengthMm: springStock.freeLengthMm })
    .from(springStock)
    .where(and(eq(springStock.end, end), sql`abs(${springStock.rateNmm} - ${rateNmm}) < 0.01`))
    .limit(1);
  return row ?? null;
}

/** Staff who may be assigned an order (tuners and the admin), for the board's filter. */
export async function listStaffForBoard() {
  const db = await getDb();
  return db
    .select({ id: user.id, name: user.name })
    .from(user)
    .where(inArray(user.role, ["admin", "tuner"]))
    .orderBy(asc(user.name));
}

/** What the build sheet prints beside the order: the request, its bike model's build notes, the version's figures. */
export async function findBuildSheetContext(orderId: string) {
  const db = await getDb();
  const [row] = await db
    .select({
      requestNumber: setupRequests.number,
      riderName: setupRequests.riderName,
      bikeLabel: setupRequests.bikeLabel,
      bikeYear: setupRequests.bikeYear,
      bikeModelId: setupRequests.bikeModelId,
      bikeModelName: bikeModels.name,
      buildNotes: bikeModels.buildNotes,
      version: recommendationVersions.version,
      output: recommendationVersions.output,
    })
    .from(orders)
    .innerJoin(setupRequests, eq(setupRequests.id, orders.requestId))
    .leftJoin(bikeModels, eq(bikeModels.id, setupRequests.bikeModelId))
    .leftJoin(recommendationVersions, eq(recommendationVersions.id, orders.versionId))
    .where(eq(orders.id, orderId))
    .limit(1);
  return row ?? null;
}

/** The workshop's build notes of a catalog model; false when there is no such model. */
export async function saveBuildNotes(bikeModelId: string, buildNotes: string | null): Promise<boolean> {
  const db = await getDb();
  const rows = await db
    .update(bikeModels)
    .set({ buildNotes, updatedAt: new Date() })
    .where(eq(bikeModels.id, bikeModelId))
    .returning({ id: bikeModels.id });
  return rows.length === 1;
}
