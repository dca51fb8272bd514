import type { Metadata } from "next";
import { WorkshopBoard } from "@/components/workshop/board";
import { listBoardOrders, listStaffForBoard } from "@/db/queries/orders";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { isoDay } from "@/lib/format";

export const metadata: Metadata = { title: "Workshop" };
export const dynamic = "force-dynamic";

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

export default async function WorkshopPage({
  searchParams,
}: {
  searchParams: Promise<{ tuner?: string; due?: string; closed?: string }>;
}) {
  await requireRole(STAFF_ROLES, { page: "/shop/workshop" });
  const params = await searchParams;
  const staff = await listStaffForBoard();
  const tunerId = staff.some((s) => s.id === params.tuner) ? params.tuner : undefined;
  const dueBefore = params.due && ISO_DATE.test(params.due) ? params.due : undefined;
  const orders = await listBoardOrders({ tunerId, dueBefore });
  const today = isoDay(new Date());
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-bold">Workshop</h1>
      <form method="get" className="flex flex-wrap items-end gap-3" aria-label="Filter the board">
        <label className="flex flex-col text-sm">
          Tuner
          <select
            name="tuner"
            defaultValue={tunerId ?? ""}
            className="min-h-11 rounded-lg border border-stone-300 px-2"
          >
            <option value="">Everyone</option>
            {staff.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col text-sm">
          Due by
          <input
            type="date"
            name="due"
            defaultValue={dueBefore ?? ""}
            className="min-h-11 rounded-lg border border-stone-300 px-2"
          />
        </label>
        <button type="submit" className="min-h-11 rounded-lg bg-pine-700 px-4 font-semibold text-white">
          Show
        </button>
      </form>
      <WorkshopBoard orders={orders} today={today} />
    </div>
  );
}
