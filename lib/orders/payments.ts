// Payment of an order through the hosted payment service (lib/payments/client.ts): a checkout
// session for what is due (a deposit or the rest, per the shop's setting), the signed webhook that
// marks it paid, and refunds by staff. A webhook's event id is recorded once and a charge is paid
// once (db/tables/orders.ts, payments), so a second delivery changes nothing.
import { recordAudit } from "@/db/queries/audit";
import {
  claimPaymentEvent,
  findOrder,
  findPaymentBySession,
  insertPayment,
  listOrderLines,
  listPayments,
  lockOrder,
  markPaymentPaid,
  updateOrder,
  type OrderRow,
} from "@/db/queries/orders";
import { createStatusLink } from "@/db/queries/status-links";
import { inTransaction } from "@/db/queries/transaction";
import { appBaseUrl } from "@/lib/env";
import { ConflictError, NotFoundError, ValidationError } from "@/lib/errors";
import { formatMoney } from "@/lib/format";
import { kickOutbox } from "@/lib/mail";
import { paymentClient, verifyWebhook, type Stripe } from "@/lib/payments/client";
import { statusPath } from "@/lib/requests/token";
import type { RefundBody } from "@/lib/validations/orders";
import { depositMinor, orderTotals } from "./money";
import { notifyPaymentReceived, type OrderActor } from "./notify";
import { auditOrder } from "./service";

const PAYMENT_SERVICE: OrderActor = { userId: null, label: "payment service" };

/** What the rider pays next: the deposit first when the shop takes one, then the rest. */
export function amountDueMinor(
  order: Pick<OrderRow, "paymentMode" | "depositPercent" | "paidMinor">,
  totalMinor: number,
) {
  if (order.paidMinor >= totalMinor) return 0;
  if (order.paymentMode === "deposit" && order.paidMinor === 0) return depositMinor(totalMinor, order.depositPercent);
  return totalMinor - order.paidMinor;
}

function unreachable(error: unknown): never {
  console.error("[payments] the payment service failed", error);
  throw new ConflictError("The payment service could not be reached. Nothing was charged; try again in a minute.");
}

/** A checkout session for what is due; answers the payment page's URL (it ends with the session id). */
export async function startCheckout(orderId: string, actor: OrderActor) {
  const order = await findOrder(orderId);
  if (!order) throw new NotFoundError("No such order.");
  if (!order.acceptedAt) throw new ConflictError("Accept the quote before paying.");
  if (order.paymentStatus === "refunded") throw new ConflictError("This order was refunded.");
  const totals = orderTotals(await listOrderLines(orderId), order.taxRateBp);
  const due = amountDueMinor(order, totals.totalMinor);
  if (due <= 0) throw new ConflictError("This order is paid in full.");
  const deposit = order.paymentMode === "deposit" && order.paidMinor === 0 && due < totals.totalMinor;
  const back = `${appBaseUrl()}${statusPath(await createStatusLink(order.requestId))}`;
  let session: Stripe.Checkout.Session;
  try {
    session = await paymentClient().checkout.sessions.create({
      mode: "payment",
      client_reference_id: order.id,
      metadata: { orderId: order.id, orderNumber: String(order.number) },
      line_items: [
        {
          quantity: 1,
          price_data: {
            currency: order.currency.toLowerCase(),
            unit_amount: due,
            product_data: { name: `Order ${order.number}${deposit ? " (deposit)" : ""}` },
          },
        },
      ],
      success_url: `${back}?payment=done`,
      cancel_url: `${back}?payment=cancelled`,
    });
  } catch (error) {
    unreachable(error);
  }
  if (!session.url) unreachable(new Error("checkout session without url"));
  await inTransaction(async (tx) => {
    await insertPayment(
      {
        orderId,
        kind: "charge",
        status: "open",
        amountMinor: due,
        currency: order.currency,
        providerSessionId: session.id,
      },
      tx,
    );
    await recordAudit(
      auditOrder(actor, order, "order.checkout_started", { sessionId: session.id, amountMinor: due, deposit }),
      tx,
    );
  });
  return { url: session.url, sessionId: session.id, amountMinor: due };
}

/** The signed webhook: a bad or stale signature is refused (400) before anything is read or written. */
export async function handlePaymentWebhook(payload: string, signature: string | null) {
  let event: Stripe.Event;
  try {
    if (!signature) throw new Error("no signature");
    event = verifyWebhook(payload, signature);
  } catch {
    throw new ValidationError("The event's signature does not match, or it is too old.", {
      "stripe-signature": "Not a valid signature for this endpoint",
    });
  }
  const outcome = await inTransaction(async (tx) => {
    if (!(await claimPaymentEvent(event.id, event.type, tx))) return "duplicate" as const;
    if (event.type !== "checkout.session.completed") return "ignored" as const;
    const session = event.data.object;
    if (session.payment_status !== "paid") return "ignored" as const;
    const payment = await findPaymentBySession(session.id, tx);
    if (!payment) return "unknown-session" as const;
    if (session.amount_total !== payment.amountMinor) {
      console.error("[payments] amount mismatch", { session: session.id, expected: payment.amountMinor });
      return "mismatch" as const;
    }
    const intent =
      typeof session.payment_intent === "string" ? session.payment_intent : (session.payment_intent?.id ?? null);
    const paid = await markPaymentPaid(payment.id, intent, tx);
    if (!paid) return "already-paid" as const;
    const order = (await lockOrder(payment.orderId, tx))!;
    const totals = orderTotals(await listOrderLines(order.id, tx), order.taxRateBp);
    const paidMinor = order.paidMinor + payment.amountMinor;
    const updated = (await updateOrder(
      order.id,
      { paidMinor, paymentStatus: paidMinor >= totals.totalMinor ? "paid" : "deposit" },
      tx,
    ))!;
    await recordAudit(
      auditOrder(PAYMENT_SERVICE, order, "order.payment_received", {
        amountMinor: payment.amountMinor,
        paidMinor,
        sessionId: session.id,
        eventId: event.id,
      }),
      tx,
    );
    await notifyPaymentReceived(
      tx,
      updated,
      payment.amountMinor,
      Math.max(0, totals.totalMinor - paidMinor),
      PAYMENT_SERVICE,
    );
    return "paid" as const;
  });
  kickOutbox();
  return { received: true, outcome };
}

/** Staff refund what was paid (all of it, or `amountMinor`), spread over the charges newest first. */
export async function refundOrder(orderId: string, body: RefundBody, actor: OrderActor) {
  const result = await inTransaction(async (tx) => {
    const order = await lockOrder(orderId, tx);
    if (!order) throw new NotFoundError("No such order.");
    const refundable = order.paidMinor - order.refundedMinor;
    if (refundable <= 0) throw new ConflictError("Nothing paid is left to refund.");
    const amount = body.amountMinor ?? refundable;
    if (amount > refundable)
      throw new ValidationError(`At most ${formatMoney(refundable, order.currency)} can be refunded.`, {
        amountMinor: `At most ${formatMoney(refundable, order.currency)}`,
      });
    const rows = await listPayments(orderId, tx);
    const refundedPer = new Map<string, number>();
    for (const r of rows)
      if (r.kind === "refund" && r.providerPaymentIntentId)
        refundedPer.set(r.providerPaymentIntentId, (refundedPer.get(r.providerPaymentIntentId) ?? 0) + r.amountMinor);
    const charges = rows
      .filter((r) => r.kind === "charge" && r.status === "paid" && r.providerPaymentIntentId)
      .reverse();
    let left = amount;
    const refunds: { intent: string; amount: number; id: string }[] = [];
    for (const charge of charges) {
      if (left <= 0) break;
      const intent = charge.providerPaymentIntentId!;
      const part = Math.min(left, charge.amountMinor - (refundedPer.get(intent) ?? 0));
      if (part <= 0) continue;
      let refund: Stripe.Refund;
      try {
        refund = await paymentClient().refunds.create(
          { payment_intent: intent, amount: part, metadata: { orderId } },
          { idempotencyKey: `sagwise-refund-${orderId}-${order.refundedMinor + amount - left}-${part}` },
        );
      } catch (error) {
        unreachable(error);
      }
      refunds.push({ intent, amount: part, id: refund.id });
      left -= part;
    }
    if (left > 0) throw new ConflictError("The payments on record do not cover this refund.");
    for (const r of refunds)
      await insertPayment(
        {
          orderId,
          kind: "refund",
          status: "refunded",
          amountMinor: r.amount,
          currency: order.currency,
          providerPaymentIntentId: r.intent,
          providerRefundId: r.id,
          reason: body.reason,
          paidAt: new Date(),
        },
        tx,
      );
    const refundedMinor = order.refundedMinor + amount;
    const updated = (await updateOrder(
      orderId,
      refundedMinor >= order.paidMinor ? { refundedMinor, paymentStatus: "refunded" } : { refundedMinor },
      tx,
    ))!;
    await recordAudit(
      auditOrder(actor, order, "order.refunded", { amountMinor: amount, refundedMinor, reason: body.reason }),
      tx,
    );
    return updated;
  });
  return result;
}
