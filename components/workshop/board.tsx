// The workshop board: one column per stage, cards with rider, bike, tuner and due dates; an overdue
// order or a part overdue at a finisher is marked in words as well as colour. On a phone the columns
// scroll sideways inside their own box.
import Link from "next/link";
import type { BoardOrder } from "@/db/queries/orders";
import { formatDay } from "@/lib/format";
import { ORDER_STAGES, PAYMENT_STATUS_LABELS, SERVICE_TYPE_LABELS, STAGE_LABELS } from "@/lib/orders/stages";
import { cn } from "@/components/ui/cn";
import { MoveStage } from "./move-stage";

export function isOverdue(order: Pick<BoardOrder, "stage" | "dueOn" | "finisherDueOn">, today: string) {
  const late = (date: string | null) => date !== null && date < today;
  return {
    order: order.stage !== "shipped" && order.stage !== "closed" && late(order.dueOn),
    finisher: late(order.finisherDueOn),
  };
}

export function WorkshopBoard({ orders, today }: { orders: BoardOrder[]; today: string }) {
  return (
    <div
      role="region"
      aria-label="Workshop board"
      tabIndex={0}
      className="relative max-w-full overflow-x-auto rounded-xl border border-stone-200 bg-stone-50 p-2"
    >
      <div className="flex gap-3">
        {ORDER_STAGES.map((stage) => {
          const cards = orders.filter((o) => o.stage === stage);
          return (
            <section
              key={stage}
              aria-labelledby={`col-${stage}`}
              data-stage={stage}
              className="flex w-64 shrink-0 flex-col gap-2"
            >
              <h2 id={`col-${stage}`} className="px-1 text-sm font-bold text-stone-800">
                {STAGE_LABELS[stage]} <span className="font-normal text-stone-600">({cards.length})</span>
              </h2>
              <ul className="flex flex-col gap-2">
                {cards.map((o) => {
                  const overdue = isOverdue(o, today);
                  return (
                    <li
                      key={o.id}
                      aria-label={`Order ${o.number}`}
                      className={cn(
                        "flex flex-col gap-1 rounded-lg border bg-white p-2 text-sm",
                        overdue.order || overdue.finisher ? "border-red-400" : "border-stone-200",
                      )}
                    >
                      <Link href={`/shop/workshop/${o.id}`} className="font-semibold text-pine-700 underline">
                        Order {o.number}
                      </Link>
                      <span>
                        {o.riderName} · {o.bikeLabel}
                      </span>
                      <span className="text-stone-600">
                        {SERVICE_TYPE_LABELS[o.serviceType]} · {PAYMENT_STATUS_LABELS[o.paymentStatus]}
                      </span>
                      <span className="text-stone-600">Tuner: {o.tunerName ?? "nobody yet"}</span>
                      {o.dueOn ? (
                        <span className={cn(overdue.order && "font-semibold text-red-800")}>
                          Due {formatDay(o.dueOn)}
                          {overdue.order ? " · overdue" : ""}
                        </span>
                      ) : null}
                      {o.openFinisherJobs ? (
                        <span className={cn(overdue.finisher && "font-semibold text-red-800")}>
                          {o.openFinisherJobs} part{o.openFinisherJobs > 1 ? "s" : ""} out, back by{" "}
                          {o.finisherDueOn ? formatDay(o.finisherDueOn) : "?"}
                          {overdue.finisher ? " · part overdue" : ""}
                        </span>
                      ) : null}
                      <MoveStage orderId={o.id} orderNumber={o.number} stage={o.stage} serviceType={o.serviceType} />
                    </li>
                  );
                })}
              </ul>
            </section>
          );
        })}
      </div>
    </div>
  );
}
