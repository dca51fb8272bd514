"use client";

// Moves an order to one of its legal next stages (lib/orders/stages.ts); the server refuses any other
// with 409 and says why. "Out at a finisher" and "shipped" need details: they link to the order page.
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { callApi } from "@/lib/api-client";
import { nextStages, STAGE_LABELS, type OrderStage, type ServiceType } from "@/lib/orders/stages";

export function MoveStage({
  orderId,
  orderNumber,
  stage,
  serviceType,
}: {
  orderId: string;
  orderNumber: number;
  stage: OrderStage;
  serviceType: ServiceType;
}) {
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const options = nextStages(stage, serviceType);
  if (!options.length) return null;

  async function move(to: OrderStage) {
    setBusy(true);
    setProblem(null);
    const result = await callApi(`/api/orders/${orderId}`, "PATCH", { stage: to });
    setBusy(false);
    if (result.ok) router.refresh();
    else setProblem(result.error);
  }

  return (
    <div className="flex flex-col gap-1">
      <div className="flex flex-wrap gap-1">
        {options.map((to) =>
          to === "at_finisher" || to === "shipped" || (to === "received" && serviceType === "send-in") ? (
            <Link
              key={to}
              href={`/shop/workshop/${orderId}#${to === "at_finisher" ? "finisher" : to === "shipped" ? "shipping" : "check-in"}`}
              className="inline-flex min-h-9 items-center rounded-lg border border-stone-300 bg-white px-2 text-sm font-medium hover:bg-stone-100"
              aria-label={`Order ${orderNumber}: ${STAGE_LABELS[to]} (details on the order page)`}
            >
              → {STAGE_LABELS[to]}…
            </Link>
          ) : (
            <Button
              key={to}
              variant="secondary"
              className="min-h-9 px-2 text-sm"
              disabled={busy}
              onClick={() => move(to)}
              aria-label={`Move order ${orderNumber} to ${STAGE_LABELS[to]}`}
            >
              → {STAGE_LABELS[to]}
            </Button>
          ),
        )}
      </div>
      {problem ? (
        <p role="alert" className="text-sm text-red-700">
          {problem}
        </p>
      ) : null}
    </div>
  );
}
