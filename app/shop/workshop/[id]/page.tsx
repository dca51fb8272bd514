import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { OrderTimeline } from "@/components/orders/order-timeline";
import { QuoteTable } from "@/components/orders/quote-table";
import { MoveStage } from "@/components/workshop/move-stage";
import { CheckInForm, FinisherForms, RefundForm, ShippingForm } from "@/components/workshop/order-forms";
import { QuoteEditor } from "@/components/workshop/quote-editor";
import { listFinishers, listPriceItems } from "@/db/queries/orders";
import { findSheetRequest } from "@/db/queries/sheet";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { formatMoney } from "@/lib/format";
import { PAYMENT_STATUS_LABELS, SERVICE_TYPE_LABELS, STAGE_LABELS } from "@/lib/orders/stages";
import { loadOrderView } from "@/lib/orders/view";
import { isUuid } from "@/lib/validations/id";
import { NotFoundError } from "@/lib/errors";

export const metadata: Metadata = { title: "Order" };
export const dynamic = "force-dynamic";

const box = "flex flex-col gap-3 rounded-xl border border-stone-200 bg-white p-4";

export default async function OrderPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  await requireRole(STAFF_ROLES, { page: `/shop/workshop/${id}` });
  if (!isUuid(id)) notFound();
  const order = await loadOrderView(id.toLowerCase(), { staff: true }).catch((error: unknown) => {
    if (error instanceof NotFoundError) notFound();
    throw error;
  });
  const [request, finishers, priceList] = await Promise.all([
    findSheetRequest(order.requestId),
    listFinishers({ activeOnly: true }),
    listPriceItems({ activeOnly: true }),
  ]);
  return (
    <div className="flex flex-col gap-4">
      <Link href="/shop/workshop" className="text-sm text-pine-700 underline">
        ← Workshop board
      </Link>
      <header className="flex flex-col gap-1">
        <h1 className="text-2xl font-bold">
          Order {order.number} · {SERVICE_TYPE_LABELS[order.serviceType]}
        </h1>
        <p className="text-stone-700">
          {request?.riderName} · {request?.bikeLabel} ·{" "}
          <Link href={`/shop/requests/${order.requestId}`} className="text-pine-700 underline">
            request {request?.number}
          </Link>{" "}
          ·{" "}
          <a href={`/shop/workshop/${order.id}/build-sheet`} className="text-pine-700 underline">
            build sheet
          </a>
        </p>
        <p>
          Stage: <strong>{STAGE_LABELS[order.stage]}</strong> · Payment:{" "}
          <strong>{PAYMENT_STATUS_LABELS[order.paymentStatus]}</strong> (
          {formatMoney(order.paidMinor - order.refundedMinor, order.currency)} of{" "}
          {formatMoney(order.totalMinor, order.currency)})
        </p>
        <MoveStage orderId={order.id} orderNumber={order.number} stage={order.stage} serviceType={order.serviceType} />
      </header>

      <div className="grid grid-cols-1 gap-4 lg:grid-cols-2">
        <section className={box} aria-labelledby="quote-heading">
          <h2 id="quote-heading" className="text-lg font-semibold">
            Quote {order.acceptedAt ? "(accepted)" : "(not accepted yet)"}
          </h2>
          {order.acceptedAt ? <QuoteTable order={order} /> : <QuoteEditor order={order} priceList={priceList} />}
          {!order.acceptedAt ? <QuoteTable order={order} /> : null}
        </section>
        <section className={box} aria-labelledby="progress-heading">
          <h2 id="progress-heading" className="text-lg font-semibold">
            Progress
          </h2>
          <OrderTimeline stage={order.stage} serviceType={order.serviceType} timeline={order.timeline} />
        </section>
        {order.serviceType === "send-in" ? <CheckInForm order={order} /> : null}
        <FinisherForms order={order} finishers={finishers} />
        <ShippingForm order={order} />
        <RefundForm order={order} />
      </div>
    </div>
  );
}
