// E-mails to the rider about an order, queued in the caller's transaction (lib/mail's outbox), with a
// fresh private status link as every rider e-mail has (lib/notify.ts does the same for requests).
import { eq } from "drizzle-orm";
import type { Executor } from "@/db/client";
import { getShopName } from "@/db/queries/settings";
import { createStatusLink } from "@/db/queries/status-links";
import type { OrderRow } from "@/db/queries/orders";
import { setupRequests } from "@/db/schema";
import { appBaseUrl } from "@/lib/env";
import { formatMoney } from "@/lib/format";
import { queueTemplateEmail } from "@/lib/mail";
import { notifyStaff } from "@/lib/notify-staff";
import { statusPath } from "@/lib/requests/token";
import { RIDER_STAGE_WORDS, type OrderStage } from "./stages";

export interface OrderActor {
  userId: string | null;
  label: string;
}

async function riderOf(tx: Executor, requestId: string) {
  const [row] = await tx
    .select({ riderName: setupRequests.riderName, riderEmail: setupRequests.riderEmail })
    .from(setupRequests)
    .where(eq(setupRequests.id, requestId));
  if (!row) throw new Error(`order e-mail: no request ${requestId}`);
  return row;
}

async function common(tx: Executor, order: OrderRow) {
  const rider = await riderOf(tx, order.requestId);
  const token = await createStatusLink(order.requestId, tx);
  return {
    rider,
    props: {
      shopName: await getShopName(tx),
      riderName: rider.riderName,
      orderNumber: order.number,
      statusUrl: `${appBaseUrl()}${statusPath(token)}`,
    },
  };
}

const auditOf = (actor: OrderActor) => ({ audit: { actorUserId: actor.userId, actorLabel: actor.label } });

export async function notifyOrderStage(tx: Executor, order: OrderRow, stage: OrderStage, actor: OrderActor) {
  const { rider, props } = await common(tx, order);
  const tracking =
    stage === "shipped" && order.carrier && order.trackingNumber
      ? `${order.carrier}, tracking ${order.trackingNumber}`
      : null;
  return queueTemplateEmail(
    tx,
    "order-stage",
    { ...props, stageWords: RIDER_STAGE_WORDS[stage], tracking },
    { to: rider.riderEmail, requestId: order.requestId },
    auditOf(actor),
  );
}

export async function notifyPaymentReceived(
  tx: Executor,
  order: OrderRow,
  amountMinor: number,
  remainingMinor: number,
  actor: OrderActor,
) {
  const { rider, props } = await common(tx, order);
  // The shop hears of it too: the assigned tuner, or the shop's address (lib/notify-staff.ts).
  await notifyStaff(tx, {
    kind: "payment-received",
    requestId: order.requestId,
    summary: `${formatMoney(amountMinor, order.currency)} paid for order ${order.number}`,
    amountMinor,
    currency: order.currency,
  });
  return queueTemplateEmail(
    tx,
    "payment-received",
    {
      ...props,
      amount: formatMoney(amountMinor, order.currency),
      remaining: remainingMinor > 0 ? formatMoney(remainingMinor, order.currency) : null,
    },
    { to: rider.riderEmail, requestId: order.requestId },
    auditOf(actor),
  );
}
