import type { Metadata } from "next";
import Link from "next/link";
import { OrderSettingsEditor } from "@/components/order-settings/order-settings-editor";
import { getOrderSettings, listFinishers, listPriceItems } from "@/db/queries/orders";
import { requireRole } from "@/lib/auth/guard";

export const metadata: Metadata = { title: "Orders and payment" };
export const dynamic = "force-dynamic";

export default async function OrderSettingsPage() {
  await requireRole(["admin"], { page: "/shop/settings/orders" });
  const [settings, priceList, finishers] = await Promise.all([getOrderSettings(), listPriceItems(), listFinishers()]);
  return (
    <div className="flex flex-col gap-4">
      <Link href="/shop/settings" className="text-sm text-pine-700 underline">
        ← Shop settings
      </Link>
      <h1 className="text-2xl font-bold">Orders and payment</h1>
      <OrderSettingsEditor
        settings={{
          currency: settings.currency,
          taxRateBp: settings.taxRateBp,
          paymentMode: settings.paymentMode,
          depositPercent: settings.depositPercent,
          notifyStages: settings.notifyStages,
          packingInstructions: settings.packingInstructions,
        }}
        priceList={priceList.map((p) => ({
          code: p.code,
          label: p.label,
          kind: p.kind,
          unitPriceMinor: p.unitPriceMinor,
          active: p.active,
          sortOrder: p.sortOrder,
        }))}
        finishers={finishers.map((f) => ({
          id: f.id,
          name: f.name,
          work: f.work,
          turnaroundDays: f.turnaroundDays,
          active: f.active,
        }))}
      />
    </div>
  );
}
