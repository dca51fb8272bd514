import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { BikeActions } from "@/components/catalog/bike-actions";
import { BikeForm } from "@/components/catalog/bike-form";
import { getBikeModel } from "@/db/queries/bikes";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { formatDay } from "@/lib/format";
import { isUuid } from "@/lib/validations/id";

export const metadata: Metadata = { title: "Bike model" };
export const dynamic = "force-dynamic";

export default async function BikePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requireRole(STAFF_ROLES, { page: `/shop/catalog/${id}` });
  if (!isUuid(id)) notFound();
  const model = await getBikeModel(id);
  if (!model) notFound();
  return (
    <div className="flex flex-col gap-4">
      <Link href="/shop/catalog" className="inline-flex min-h-11 items-center text-sm text-pine-700 underline">
        ← Bike catalog
      </Link>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl font-bold">{model.name}</h1>
        <BikeActions id={model.id} retired={Boolean(model.retiredAt)} />
      </div>
      {user.role === "admin" ? (
        <Link
          href={`/shop/catalog/${model.id}/calibration`}
          className="inline-flex min-h-11 w-fit items-center text-pine-700 underline"
        >
          Calibration from sag reports
        </Link>
      ) : null}
      {model.retiredAt ? (
        <p className="rounded-lg bg-stone-100 p-3 text-sm">
          Retired on {formatDay(model.retiredAt)}: riders no longer see it in the picker; requests that used it still
          show it.
        </p>
      ) : null}
      {model.isTypical ? (
        <p className="rounded-lg bg-amber-soft p-3 text-sm">
          Generic class with typical values, not any maker&apos;s data.
        </p>
      ) : null}
      <BikeForm
        key={model.updatedAt.toISOString()}
        id={model.id}
        initial={{
          name: model.name,
          slug: model.slug,
          bikeClass: model.bikeClass,
          yearFrom: model.yearFrom,
          yearTo: model.yearTo,
          notes: model.notes,
          forkOilType: model.forkOilType,
          forkOilVolumeMl: model.forkOilVolumeMl,
          spec: model.spec,
        }}
      />
    </div>
  );
}
