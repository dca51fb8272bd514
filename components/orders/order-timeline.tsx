// The stages of an order as a list the rider (or staff) can read: done, current and to come, in the
// rider's words (lib/orders/stages.ts). Colour always comes with the words "done" / "now".
import { formatDay } from "@/lib/format";
import { ORDER_STAGES, RIDER_STAGE_WORDS, type OrderStage, type ServiceType } from "@/lib/orders/stages";
import { cn } from "@/components/ui/cn";

export function OrderTimeline({
  stage,
  serviceType,
  timeline,
}: {
  stage: OrderStage;
  serviceType: ServiceType;
  timeline: { stage: OrderStage; at: string }[];
}) {
  // Kits and springs have nothing to check in; a finisher visit shows only when one happened.
  const stages = ORDER_STAGES.filter(
    (s) =>
      (serviceType === "send-in" || s !== "received") &&
      (s !== "at_finisher" || timeline.some((t) => t.stage === "at_finisher")),
  );
  const current = stages.indexOf(stage);
  const reachedAt = (s: OrderStage) => timeline.findLast((t) => t.stage === s)?.at;
  return (
    <ol className="flex flex-col gap-2" aria-label="Order progress">
      {stages.map((s, i) => {
        const done = i < current || stage === "closed";
        const now = i === current && stage !== "closed";
        const at = reachedAt(s);
        return (
          <li key={s} className="flex items-start gap-3">
            <span
              aria-hidden
              className={cn(
                "mt-1 size-3 shrink-0 rounded-full",
                done ? "bg-pine-700" : now ? "bg-amber-500 ring-4 ring-amber-100" : "bg-stone-300",
              )}
            />
            <span className={cn(!done && !now && "text-stone-600")}>
              {RIDER_STAGE_WORDS[s]}
              {done ? <span className="text-sm text-stone-600"> · done{at ? ` ${formatDay(at)}` : ""}</span> : null}
              {now ? (
                <span className="text-sm font-semibold"> · now{at ? ` (since ${formatDay(at)})` : ""}</span>
              ) : null}
            </span>
          </li>
        );
      })}
    </ol>
  );
}
