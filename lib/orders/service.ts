// Orders after the sheet (docs/architecture.md, layers): made from an approved recommendation, quoted
// from the price list (the sheet's springs come in as lines by themselves), edited by staff until the
// rider accepts, then walked through the workshop's stages (lib/orders/stages.ts). Every change is
// in the audit log of the order's request; stage e-mails go out at the stages the shop ticks.
import { recordAudit, type AuditInsert } from "@/db/queries/audit";
import {
  countOpenFinisherJobs,
  findFinisher,
  findPriceItemsByCode,
  findPriceItemsByIds,
  findShelfSpring,
  getOrderSettings,
  insertFinisherJob,
  insertOrder,
  insertOrderEvent,
  listOrderLines,
  lockOrder,
  markFinisherJobBack,
  replaceOrderLines,
  updateOrder,
  type OrderLineInsert,
  type OrderRow,
} from "@/db/queries/orders";
import { findApprovedVersion } from "@/db/queries/status";
import { inTransaction, type Tx } from "@/db/queries/transaction";
import { ConflictError, NotFoundError, ValidationError } from "@/lib/errors";
import { isoDay } from "@/lib/format";
import { kickOutbox } from "@/lib/mail";
import type { CheckInBody, FinisherOutBody, PatchOrderBody, ReplaceLinesBody } from "@/lib/validations/orders";
import { orderTotals } from "./money";
import { notifyOrderStage, type OrderActor } from "./notify";
import { canMove, STAGE_LABELS, type OrderStage, type ServiceType } from "./stages";

export type { OrderActor };

export const auditOrder = (
  actor: OrderActor,
  order: Pick<OrderRow, "id" | "requestId" | "number">,
  action: string,
  detail: Record<string, unknown> = {},
): AuditInsert => ({
  requestId: order.requestId,
  actorUserId: actor.userId,
  actorLabel: actor.label,
  action,
  detail: { orderId: order.id, orderNumber: order.number, ...detail },
});

/** Price-list codes the app looks for when it builds a quote by itself. */
export const PRICE_CODES = {
  service: (type: ServiceType) => `service-${type}`,
  spring: (end: "fork" | "shock") => `spring-${end}`,
  shipping: "shipping-return",
} as const;

export async function sheetLines(requestId: string, serviceType: ServiceType, tx: Tx) {
  const approved = await findApprovedVersion(requestId, tx);
  if (!approved) throw new ConflictError("An order can be made once the setup sheet is approved.");
  const out = approved.output;
  const items = await findPriceItemsByCode(
    [PRICE_CODES.service(serviceType), PRICE_CODES.spring("fork"), PRICE_CODES.spring("shock"), PRICE_CODES.shipping],
    tx,
  );
  const byCode = new Map(items.map((i) => [i.code, i]));
  const lines: Omit<OrderLineInsert, "orderId">[] = [];
  const service = byCode.get(PRICE_CODES.service(serviceType));
  if (service)
    lines.push({
      priceItemId: service.id,
      source: "price-list",
      description: service.label,
      quantity: 1,
      unitPriceMinor: service.unitPriceMinor,
    });
  const springs: { end: "fork" | "shock"; rateNmm: number | undefined; quantity: number; what: string }[] = [
    { end: "fork", rateNmm: out.front.chosenRate?.nMm, quantity: out.front.sprungLegs ?? 2, what: "Fork spring" },
    { end: "shock", rateNmm: out.rear.chosenRate.nMm, quantity: 1, what: "Shock spring" },
  ];
  for (const spring of springs) {
    if (spring.rateNmm === undefined || spring.quantity < 1) continue;
    const item = byCode.get(PRICE_CODES.spring(spring.end));
    const shelf = await findShelfSpring(spring.end, spring.rateNmm, tx);
    lines.push({
      priceItemId: item?.id ?? null,
      source: "sheet",
      description: `${spring.what} ${spring.rateNmm.toFixed(2)} N/mm`,
      quantity: spring.quantity,
      unitPriceMinor: item?.unitPriceMinor ?? 0,
      spring: { end: spring.end, rateNmm: spring.rateNmm, freeLengthMm: shelf?.freeLengthMm ?? null },
    });
  }
  const shipping = byCode.get(PRICE_CODES.shipping);
  if (shipping)
    lines.push({
      priceItemId: shipping.id,
      source: "price-list",
      description: shipping.label,
      quantity: 1,
      unitPriceMinor: shipping.unitPriceMinor,
    });
  return { versionId: approved.id, lines };
}

/** A new order from the request's approved sheet (a rider may order springs now and a rebuild later). */
export async function createOrder(requestId: string, serviceType: ServiceType, actor: OrderActor) {
  return inTransaction(async (tx) => {
    const { versionId, lines } = await sheetLines(requestId, serviceType, tx);
    const settings = await getOrderSettings(tx);
    const order = await insertOrder(
      {
        requestId,
        versionId,
        serviceType,
        currency: settings.currency,
        taxRateBp: settings.taxRateBp,
        paymentMode: settings.paymentMode,
        depositPercent: settings.paymentMode === "deposit" ? settings.depositPercent : 100,
      },
      tx,
    );
    await replaceOrderLines(
      order.id,
      lines.map((l, i) => ({ ...l, orderId: order.id, sortOrder: i })),
      tx,
    );
    await insertOrderEvent({ orderId: order.id, fromStage: null, toStage: order.stage, actorLabel: actor.label }, tx);
    const totals = orderTotals(lines, order.taxRateBp);
    await recordAudit(auditOrder(actor, order, "order.created", { serviceType, totalMinor: totals.totalMinor }), tx);
    return order;
  });
}

async function lockOrThrow(tx: Tx, orderId: string) {
  const order = await lockOrder(orderId, tx);
  if (!order) throw new NotFoundError("No such order.");
  return order;
}

/** Replaces the quote's lines (staff), until the rider has accepted it. */
export async function replaceLines(orderId: string, body: ReplaceLinesBody, actor: OrderActor) {
  return inTransaction(async (tx) => {
    const order = await lockOrThrow(tx, orderId);
    if (order.acceptedAt) throw new ConflictError("The rider accepted this quote: its lines can no longer change.");
    const before = orderTotals(await listOrderLines(orderId, tx), order.taxRateBp);
    const existing = await listOrderLines(orderId, tx);
    const items = new Map(
      (
        await findPriceItemsByIds(
          body.lines.flatMap((l) => (l.priceItemId ? [l.priceItemId] : [])),
          tx,
        )
      ).map((i) => [i.id, i]),
    );
    const fields: Record<string, string> = {};
    const lines: OrderLineInsert[] = body.lines.map((line, index) => {
      const item = line.priceItemId ? items.get(line.priceItemId) : undefined;
      if (line.priceItemId && !item) fields[`lines.${index}.priceItemId`] = "This item is not on the price list";
      const description = line.description || item?.label || "";
      if (!description) fields[`lines.${index}.description`] = "Describe the line or choose a price-list item";
      const unitPriceMinor = line.unitPriceMinor ?? item?.unitPriceMinor;
      if (unitPriceMinor === undefined) fields[`lines.${index}.unitPriceMinor`] = "Enter the unit price";
      // A spring line from the sheet keeps its spring data while its description still names it.
      const kept = existing.find((e) => e.spring && e.description === description);
      return {
        orderId,
        priceItemId: item?.id ?? null,
        source: kept ? "sheet" : item ? "price-list" : "manual",
        description,
        quantity: line.quantity,
        unitPriceMinor: unitPriceMinor ?? 0,
        spring: kept?.spring ?? null,
        sortOrder: index,
      };
    });
    if (Object.keys(fields).length) throw new ValidationError("Some quote lines need attention.", fields);
    await replaceOrderLines(orderId, lines, tx);
    const after = orderTotals(lines, order.taxRateBp);
    await updateOrder(orderId, {}, tx);
    await recordAudit(
      auditOrder(actor, order, "order.lines_changed", {
        lines: lines.length,
        fromTotalMinor: before.totalMinor,
        toTotalMinor: after.totalMinor,
      }),
      tx,
    );
    return after;
  });
}

/** The rider (or staff on the rider's word) accepts the quote as it stands. */
export async function acceptQuote(orderId: string, actor: OrderActor) {
  return inTransaction(async (tx) => {
    const order = await lockOrThrow(tx, orderId);
    if (order.acceptedAt) throw new ConflictError("This quote is already accepted.");
    const lines = await listOrderLines(orderId, tx);
    const totals = orderTotals(lines, order.taxRateBp);
    if (!lines.length || totals.totalMinor <= 0)
      throw new ConflictError("The quote has nothing to accept yet: the shop is still pricing it.");
    const updated = await updateOrder(orderId, { acceptedAt: new Date() }, tx);
    await recordAudit(auditOrder(actor, order, "order.quote_accepted", { totalMinor: totals.totalMinor }), tx);
    return updated!;
  });
}

function assertMove(order: OrderRow, to: OrderStage) {
  if (!canMove(order.stage, to, order.serviceType))
    throw new ConflictError(`An order cannot go from “${STAGE_LABELS[order.stage]}” to “${STAGE_LABELS[to]}”.`);
  if (order.stage === "awaiting_parts" && !order.acceptedAt)
    throw new ConflictError("The rider has not accepted the quote yet.");
}

async function moveTo(tx: Tx, order: OrderRow, to: OrderStage, actor: OrderActor, extra: Partial<OrderRow> = {}) {
  assertMove(order, to);
  const updated = (await updateOrder(order.id, { ...extra, stage: to }, tx))!;
  await insertOrderEvent({ orderId: order.id, fromStage: order.stage, toStage: to, actorLabel: actor.label }, tx);
  const settings = await getOrderSettings(tx);
  if (settings.notifyStages.includes(to)) await notifyOrderStage(tx, updated, to, actor);
  return { updated, audit: auditOrder(actor, order, "order.stage_changed", { from: order.stage, to }) };
}

/** Staff change an order: its stage (legal moves only, 409 otherwise) and its workshop details. */
export async function patchOrder(orderId: string, body: PatchOrderBody, actor: OrderActor) {
  const result = await inTransaction(async (tx) => {
    let order = await lockOrThrow(tx, orderId);
    const audits: AuditInsert[] = [];
    const details: Partial<OrderRow> = {};
    for (const key of ["inboundTracking", "dueOn", "assignedTunerId", "builtBy", "testedBy"] as const)
      if (body[key] !== undefined && body[key] !== order[key]) (details as Record<string, unknown>)[key] = body[key];
    if (Object.keys(details).length) {
      order = (await updateOrder(orderId, details, tx))!;
      audits.push(auditOrder(actor, order, "order.details_changed", { fields: Object.keys(details) }));
    }
    if (body.stage && body.stage !== order.stage) {
      assertMove(order, body.stage);
      const extra: Partial<OrderRow> = {};
      if (body.stage === "shipped") {
        const carrier = body.carrier ?? order.carrier;
        const trackingNumber = body.trackingNumber ?? order.trackingNumber;
        const fields: Record<string, string> = {};
        if (!carrier) fields.carrier = "Enter the carrier";
        if (!trackingNumber) fields.trackingNumber = "Enter the tracking number";
        if (Object.keys(fields).length)
          throw new ValidationError("Say how it ships before marking it shipped.", fields);
        Object.assign(extra, { carrier, trackingNumber, shippedAt: new Date() });
      }
      if (body.stage === "at_finisher")
        throw new ConflictError("Send a part out from the order page: say which part goes to which finisher.");
      if (order.stage === "at_finisher" && (await countOpenFinisherJobs(orderId, tx)) > 0)
        throw new ConflictError("A part is still out at a finisher: mark it back first.");
      const moved = await moveTo(tx, order, body.stage, actor, extra);
      order = moved.updated;
      audits.push(moved.audit);
    } else if (body.stage === order.stage && body.stage !== undefined) {
      // Same stage: nothing moves (a double click), nothing is recorded.
    }
    if (audits.length) await recordAudit(audits, tx);
    return order;
  });
  kickOutbox();
  return result;
}

/** Check-in of a send-in order's parts: serial numbers and condition; moves it to "received". */
export async function checkIn(orderId: string, body: CheckInBody, actor: OrderActor) {
  const result = await inTransaction(async (tx) => {
    const order = await lockOrThrow(tx, orderId);
    if (order.serviceType !== "send-in") throw new ConflictError("Only send-in orders have parts to check in.");
    const checkInRecord = {
      serials: body.serials,
      conditionNotes: body.conditionNotes,
      checkedInAt: new Date().toISOString(),
      checkedInBy: actor.label,
    };
    const audits = [auditOrder(actor, order, "order.checked_in", { serials: body.serials.length })];
    let updated: OrderRow;
    if (order.stage === "awaiting_parts") {
      const moved = await moveTo(tx, order, "received", actor, { checkIn: checkInRecord });
      updated = moved.updated;
      audits.push(moved.audit);
    } else if (order.stage === "received") {
      updated = (await updateOrder(orderId, { checkIn: checkInRecord }, tx))!;
    } else throw new ConflictError("Check-in is done when the parts arrive, before work starts.");
    await recordAudit(audits, tx);
    return updated;
  });
  kickOutbox();
  return result;
}

const addDays = (isoDate: string, days: number) => isoDay(Date.parse(`${isoDate}T00:00:00Z`) + days * 86_400_000);

/** A part goes out to a finisher: which part, which finisher, sent and due dates. */
export async function sendToFinisher(orderId: string, body: FinisherOutBody, actor: OrderActor) {
  const result = await inTransaction(async (tx) => {
    const order = await lockOrThrow(tx, orderId);
    if (order.stage !== "in_work" && order.stage !== "at_finisher")
      throw new ConflictError("Parts go out to a finisher while the order is on the bench.");
    const finisher = await findFinisher(body.finisherId, tx);
    if (!finisher || !finisher.active)
      throw new ValidationError("Choose one of the shop's finishers.", {
        finisherId: "Not one of the shop's finishers",
      });
    const dueOn = body.dueOn ?? addDays(body.sentOn, finisher.turnaroundDays);
    if (dueOn < body.sentOn)
      throw new ValidationError("The due date is before the date sent.", {
        dueOn: "Must be on or after the date sent",
      });
    const job = await insertFinisherJob(
      { orderId, finisherId: finisher.id, part: body.part, sentOn: body.sentOn, dueOn },
      tx,
    );
    const audits = [
      auditOrder(actor, order, "order.finisher_out", {
        jobId: job.id,
        part: body.part,
        finisher: finisher.name,
        dueOn,
      }),
    ];
    if (order.stage === "in_work") audits.push((await moveTo(tx, order, "at_finisher", actor)).audit);
    await recordAudit(audits, tx);
    return job;
  });
  kickOutbox();
  return result;
}

/** A part is back from its finisher; with nothing else out, the order goes back on the bench. */
export async function finisherBack(orderId: string, jobId: string, backOn: string | undefined, actor: OrderActor) {
  const result = await inTransaction(async (tx) => {
    const order = await lockOrThrow(tx, orderId);
    const job = await markFinisherJobBack(orderId, jobId, backOn ?? isoDay(new Date()), tx);
    if (!job) throw new ConflictError("This part is not out at a finisher.");
    const audits = [auditOrder(actor, order, "order.finisher_back", { jobId, part: job.part })];
    if (order.stage === "at_finisher" && (await countOpenFinisherJobs(orderId, tx)) === 0)
      audits.push((await moveTo(tx, order, "in_work", actor)).audit);
    await recordAudit(audits, tx);
    return job;
  });
  kickOutbox();
  return result;
}
