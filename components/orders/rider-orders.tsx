"use client";

// The rider's orders on the status page: ask for a quote from the approved sheet, accept it, pay on
// the payment service's page, and follow the stages. Loaded from the API with the status token.
import { useSearchParams } from "next/navigation";
import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Providers } from "@/components/providers";
import { Button } from "@/components/ui/button";
import { callApi, getJson } from "@/lib/api-client";
import { formatMoney } from "@/lib/format";
import { PAYMENT_STATUS_LABELS, SERVICE_TYPE_LABELS, SERVICE_TYPES, type ServiceType } from "@/lib/orders/stages";
import type { OrderView } from "@/lib/orders/types";
import { OrderTimeline } from "./order-timeline";
import { QuoteTable } from "./quote-table";

const box = "flex flex-col gap-3 rounded-xl border border-stone-200 bg-white p-4";

const SERVICE_HELP: Record<ServiceType, string> = {
  "send-in": "You send us the fork and shock; we rebuild them to your sheet and send them back.",
  kit: "We build the parts for your sheet and send them; you or your mechanic fit them.",
  "springs-only": "Just the springs your sheet names, sent to you.",
};

interface Props {
  requestId: string;
  token?: string;
  canOrder: boolean;
}

export function RiderOrders(props: Props) {
  return (
    <Providers>
      <RiderOrdersInner {...props} />
    </Providers>
  );
}

function RiderOrdersInner({ requestId, token, canOrder }: Props) {
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [serviceType, setServiceType] = useState<ServiceType>("send-in");
  const query = token ? `?token=${encodeURIComponent(token)}` : "";
  const outcome = useSearchParams().get("payment");
  const paymentNote =
    outcome === "done"
      ? "Thank you: your payment is being confirmed. This page shows it once it is."
      : outcome === "cancelled"
        ? "Payment cancelled: nothing was charged."
        : null;

  const client = useQueryClient();
  const key = ["rider-orders", requestId];
  const loaded = useQuery({
    queryKey: key,
    queryFn: () => getJson<{ orders: OrderView[] }>(`/api/requests/${requestId}/order${query}`),
  });
  const load = () => client.invalidateQueries({ queryKey: key });

  async function act(url: string, body: object, then?: (data: Record<string, unknown>) => void) {
    setBusy(true);
    setProblem(null);
    const result = await callApi<Record<string, unknown>>(
      url,
      "POST",
      { ...body, ...(token ? { token } : {}) },
      {
        offline: "No connection: nothing was sent. Try again when you have signal.",
      },
    );
    setBusy(false);
    if (!result.ok) {
      setProblem(result.error);
      return;
    }
    if (then) then(result.data);
    else await load();
  }

  const orders = loaded.data?.orders;
  if (!orders)
    return loaded.error ? (
      <p role="alert" className="text-sm text-red-700">
        Your orders could not be loaded: {loaded.error.message}
      </p>
    ) : null;
  if (!orders.length && !canOrder) return null;

  return (
    <section className={box} aria-labelledby="orders-heading">
      <h2 id="orders-heading" className="text-lg font-semibold">
        {orders.length ? "Your order" : "Order the work"}
      </h2>
      {paymentNote ? (
        <p role="status" className="rounded-lg bg-emerald-50 p-3 text-emerald-900">
          {paymentNote}
        </p>
      ) : null}
      {problem ? (
        <p role="alert" className="text-sm font-medium text-red-700">
          {problem}
        </p>
      ) : null}

      {orders.map((order) => (
        <article
          key={order.id}
          className="flex flex-col gap-3 border-t border-stone-200 pt-3 first:border-0 first:pt-0"
        >
          <h3 className="font-semibold">
            Order {order.number} · {SERVICE_TYPE_LABELS[order.serviceType]}
          </h3>
          <QuoteTable order={order} />
          {!order.acceptedAt ? (
            order.totalMinor > 0 ? (
              <Button disabled={busy} onClick={() => act(`/api/orders/${order.id}/accept`, {})}>
                Accept the quote ({formatMoney(order.totalMinor, order.currency)})
              </Button>
            ) : (
              <p className="text-stone-700">The shop is pricing your quote; you can accept it here once it is ready.</p>
            )
          ) : (
            <p>
              Quote accepted. Payment: <strong>{PAYMENT_STATUS_LABELS[order.paymentStatus]}</strong>
              {order.paidMinor > 0 ? ` (${formatMoney(order.paidMinor - order.refundedMinor, order.currency)})` : ""}
            </p>
          )}
          {order.acceptedAt && order.amountDueMinor > 0 && order.paymentStatus !== "refunded" ? (
            <Button
              disabled={busy}
              onClick={() =>
                act(`/api/orders/${order.id}/checkout`, {}, (data) => window.location.assign(String(data.url)))
              }
            >
              {order.paymentMode === "deposit" && order.paidMinor === 0 ? "Pay the deposit" : "Pay"}{" "}
              {formatMoney(order.amountDueMinor, order.currency)}
            </Button>
          ) : null}

          {order.sendIn && order.stage === "awaiting_parts" ? (
            <div className="flex flex-col gap-2 rounded-lg bg-stone-50 p-3">
              <h4 className="font-semibold">Sending your parts in</h4>
              <p className="whitespace-pre-line">{order.sendIn.packingInstructions}</p>
              <p>
                Send to: <strong>{order.sendIn.shopName}</strong>
                {order.sendIn.shopAddress ? `, ${order.sendIn.shopAddress}` : " (the shop will e-mail its address)"}
              </p>
              <p className="text-sm text-stone-700">
                Remove the fork and shock following the manufacturer&apos;s service manual, or have a qualified mechanic
                do it. Never open a gas-charged shock yourself.
              </p>
            </div>
          ) : null}

          <OrderTimeline stage={order.stage} serviceType={order.serviceType} timeline={order.timeline} />
          {order.shipping.trackingNumber ? (
            <p>
              Shipped with {order.shipping.carrier}, tracking number <strong>{order.shipping.trackingNumber}</strong>
            </p>
          ) : null}
        </article>
      ))}

      {canOrder && !orders.some((o) => o.stage !== "closed") ? (
        <fieldset className="flex flex-col gap-2">
          <legend className="mb-1 font-medium">What would you like?</legend>
          {SERVICE_TYPES.map((type) => (
            <label key={type} className="flex min-h-11 items-start gap-2 rounded-lg border border-stone-200 p-2">
              <input
                type="radio"
                name="service-type"
                value={type}
                checked={serviceType === type}
                onChange={() => setServiceType(type)}
                className="mt-1"
              />
              <span>
                <span className="font-semibold">{SERVICE_TYPE_LABELS[type]}</span>
                <span className="block text-sm text-stone-600">{SERVICE_HELP[type]}</span>
              </span>
            </label>
          ))}
          <Button disabled={busy} onClick={() => act(`/api/requests/${requestId}/order`, { serviceType })}>
            Ask for a quote
          </Button>
        </fieldset>
      ) : null}
    </section>
  );
}
