import type { Metadata } from "next";
import Link from "next/link";
import { OrderSettingsLink } from "@/components/order-settings/order-settings-link";
import { SettingsForm } from "@/components/settings/settings-form";
import { getShopSettings } from "@/db/queries/settings";
import { requireRole } from "@/lib/auth/guard";
import { sizingDefaults } from "@/lib/sizing";

export const metadata: Metadata = { title: "Shop settings" };
export const dynamic = "force-dynamic";

export default async function SettingsPage() {
  await requireRole(["admin"], { page: "/shop/settings" });
  const s = await getShopSettings();
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-bold">Shop settings</h1>
      <Link href="/shop/settings/service" className="inline-flex min-h-11 w-fit items-center text-pine-700 underline">
        Service intervals and reminders
      </Link>
      <OrderSettingsLink />
      <SettingsForm
        initial={{
          name: s?.name ?? "",
          email: s?.email ?? "",
          phone: s?.phone ?? "",
          address: s?.address ?? "",
          website: s?.website ?? "",
          units: s?.units ?? "metric",
          paperSize: s?.paperSize ?? "A4",
          sheetFooter: s?.sheetFooter ?? "",
          gearMassKg: s?.gearMassKg ?? sizingDefaults.DEFAULT_GEAR_MASS_KG,
          frequencyRatioMin: s?.frequencyRatioMin ?? sizingDefaults.FREQUENCY_RATIO_WINDOW.min,
          frequencyRatioMax: s?.frequencyRatioMax ?? sizingDefaults.FREQUENCY_RATIO_WINDOW.max,
        }}
      />
    </div>
  );
}
