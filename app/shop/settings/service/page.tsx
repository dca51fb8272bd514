import type { Metadata } from "next";
import Link from "next/link";
import { ServiceSettingsForm } from "@/components/service/service-settings-form";
import { requireRole } from "@/lib/auth/guard";
import { loadServiceConfig } from "@/lib/service/overview";

export const metadata: Metadata = { title: "Service intervals" };
export const dynamic = "force-dynamic";

export default async function ServiceSettingsPage() {
  await requireRole(["admin"], { page: "/shop/settings/service" });
  const config = await loadServiceConfig();
  return (
    <div className="flex flex-col gap-4">
      <Link href="/shop/settings" className="inline-flex min-h-11 w-fit items-center text-pine-700 underline">
        ← Shop settings
      </Link>
      <h1 className="text-2xl font-bold">Service intervals</h1>
      <p className="max-w-3xl text-stone-700">
        Riders get a reminder when a service falls due within the notice period, from their approved setup, the hours
        they log and their hours per month. The starting figures are common practice, not any maker&apos;s: set your
        own, and tell riders their bike&apos;s service manual comes first.
        {config.defaults ? " (Nothing saved yet: these are the common-practice defaults.)" : ""}
      </p>
      <ServiceSettingsForm
        initial={{ noticeDays: config.noticeDays, timeZone: config.timeZone, intervals: config.intervals }}
      />
    </div>
  );
}
