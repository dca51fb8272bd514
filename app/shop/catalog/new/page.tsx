import type { Metadata } from "next";
import { BikeForm } from "@/components/catalog/bike-form";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { sizingDefaults } from "@/lib/sizing";

export const metadata: Metadata = { title: "Add a bike" };
// Signed-in pages render per request (the guard reads the session cookie).
export const dynamic = "force-dynamic";

export default async function NewBikePage() {
  await requireRole(STAFF_ROLES, { page: "/shop/catalog/new" });
  const template = sizingDefaults.GENERIC_BIKE_CLASSES[0]!;
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-bold">Add a bike</h1>
      <p className="rounded-lg bg-amber-soft p-3 text-sm text-stone-800">
        The form starts from the typical values of the “{template.name}” class, not any maker&apos;s data: replace every
        figure with your model&apos;s own (service manual or your measurements).
      </p>
      <BikeForm initial={{ name: "", bikeClass: template.id, spec: structuredClone(template.spec) }} />
    </div>
  );
}
