import type { Metadata } from "next";
import { StockManager } from "@/components/stock/stock-manager";
import { listSpringStock } from "@/db/queries/stock";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";

export const metadata: Metadata = { title: "Spring stock" };
export const dynamic = "force-dynamic";

export default async function StockPage() {
  await requireRole(STAFF_ROLES, { page: "/shop/stock" });
  const rows = await listSpringStock();
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-bold">Spring stock</h1>
      <p className="max-w-3xl text-sm text-stone-700">
        The engine chooses among the springs with at least one on the shelf (a quantity of 0 keeps a line listed but not
        offered). Rates are stored in N/mm (1 kgf = 9.80665 N, 1 lbf = 4.4482216152605 N, 1 in = 25.4 mm exactly).
      </p>
      <StockManager rows={rows.map((r) => ({ ...r, end: r.end === "fork" ? "fork" : "shock" }))} />
    </div>
  );
}
