// An order as the API and the pages show it: lines with their totals, money (lib/orders/money.ts),
// payment state, the timeline of stages, finisher jobs, shipping, and for send-in orders the packing
// instructions and the shop's address. Riders get the same minus the workshop's internal notes.
import {
  findOrder,
  getOrderSettings,
  listFinisherJobs,
  listOrderEvents,
  listOrderLines,
  listOrderPhotos,
  listPayments,
} from "@/db/queries/orders";
import { getShopSettings } from "@/db/queries/settings";
import { NotFoundError } from "@/lib/errors";
import { lineTotalMinor, orderTotals } from "./money";
import { amountDueMinor } from "./payments";

export const DEFAULT_PACKING =
  "Drain nothing and take nothing apart: send the fork legs and the shock as they came off the bike, each wrapped in bubble wrap in a sturdy box with padding all round. Put a note with your name and order number in the box. A gas-charged shock stays charged: do not try to release the gas yourself.";

export async function loadOrderView(orderId: string, options: { staff: boolean }) {
  const order = await findOrder(orderId);
  if (!order) throw new NotFoundError("No such order.");
  const [lines, events, jobs, payments, photos, settings, shop] = await Promise.all([
    listOrderLines(orderId),
    listOrderEvents(orderId),
    listFinisherJobs(orderId),
    listPayments(orderId),
    options.staff ? listOrderPhotos(orderId) : Promise.resolve([]),
    getOrderSettings(),
    getShopSettings(),
  ]);
  const totals = orderTotals(lines, order.taxRateBp);
  const sendIn = order.serviceType === "send-in";
  return {
    id: order.id,
    number: order.number,
    requestId: order.requestId,
    serviceType: order.serviceType,
    stage: order.stage,
    currency: order.currency,
    taxRateBp: order.taxRateBp,
    lines: lines.map((l) => ({
      id: l.id,
      priceItemId: l.priceItemId,
      source: l.source,
      description: l.description,
      quantity: l.quantity,
      unitPriceMinor: l.unitPriceMinor,
      totalMinor: lineTotalMinor(l),
      spring: l.spring,
    })),
    ...totals,
    acceptedAt: order.acceptedAt?.toISOString() ?? null,
    paymentMode: order.paymentMode,
    depositPercent: order.depositPercent,
    paymentStatus: order.paymentStatus,
    paidMinor: order.paidMinor,
    refundedMinor: order.refundedMinor,
    amountDueMinor: order.acceptedAt ? amountDueMinor(order, totals.totalMinor) : 0,
    timeline: events.map((e) => ({ stage: e.toStage, at: e.createdAt.toISOString() })),
    finisherJobs: jobs.map((j) => ({
      id: j.id,
      part: j.part,
      finisherName: j.finisherName,
      sentOn: j.sentOn,
      dueOn: j.dueOn,
      backOn: j.backOn,
    })),
    shipping: {
      carrier: order.carrier,
      trackingNumber: order.trackingNumber,
      shippedAt: order.shippedAt?.toISOString() ?? null,
    },
    sendIn: sendIn
      ? {
          packingInstructions: settings.packingInstructions || DEFAULT_PACKING,
          shopName: shop?.name ?? "the shop",
          shopAddress: shop?.address ?? null,
          inboundTracking: order.inboundTracking,
        }
      : null,
    ...(options.staff
      ? {
          workshop: {
            dueOn: order.dueOn,
            assignedTunerId: order.assignedTunerId,
            checkIn: order.checkIn,
            builtBy: order.builtBy,
            testedBy: order.testedBy,
            photos: photos.map((p) => ({ id: p.id, name: p.originalName })),
            payments: payments.map((p) => ({
              id: p.id,
              kind: p.kind,
              status: p.status,
              amountMinor: p.amountMinor,
              reason: p.reason,
              createdAt: p.createdAt.toISOString(),
            })),
          },
        }
      : {}),
  };
}

export type OrderView = Awaited<ReturnType<typeof loadOrderView>>;
