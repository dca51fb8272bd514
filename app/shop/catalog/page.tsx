import type { Metadata } from "next";
import Link from "next/link";
import { CatalogTable } from "@/components/catalog/catalog-table";
import { CsvImport } from "@/components/catalog/csv-import";
import { buttonClass } from "@/components/ui/button";
import { listBikeModels } from "@/db/queries/bikes";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { catalogQuerySchema } from "@/lib/validations/bike";

export const metadata: Metadata = { title: "Bike catalog" };
export const dynamic = "force-dynamic";

export default async function CatalogPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  await requireRole(STAFF_ROLES, { page: "/shop/catalog" });
  const raw = await searchParams;
  const parsed = catalogQuerySchema.safeParse({
    q: typeof raw.q === "string" ? raw.q : undefined,
    retired: typeof raw.retired === "string" ? raw.retired : undefined,
  });
  const query = parsed.success ? parsed.data : { retired: "hide" as const };
  const models = await listBikeModels(query);
  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl font-bold">Bike catalog</h1>
        <Link href="/shop/catalog/new" className={buttonClass("primary")}>
          Add a bike
        </Link>
      </div>
      <form role="search" className="flex flex-wrap items-end gap-3" action="/shop/catalog">
        <label className="flex flex-col gap-1 text-sm font-medium">
          Search models
          <input name="q" defaultValue={query.q ?? ""} className="min-h-11 rounded-lg border border-stone-300 px-3" />
        </label>
        <label className="flex flex-col gap-1 text-sm font-medium">
          Retired models
          <select
            name="retired"
            defaultValue={query.retired}
            className="min-h-11 rounded-lg border border-stone-300 bg-white px-3"
          >
            <option value="hide">Hide</option>
            <option value="show">Show too</option>
            <option value="only">Only retired</option>
          </select>
        </label>
        <button type="submit" className={buttonClass("secondary")}>
          Search
        </button>
      </form>
      <CatalogTable
        rows={models.map((m) => ({
          id: m.id,
          name: m.name,
          bikeClass: m.bikeClass,
          forkKind: m.forkKind,
          rearWheelTravelMm: m.rearWheelTravelMm,
          isTypical: m.isTypical,
          retired: Boolean(m.retiredAt),
        }))}
      />
      <CsvImport />
    </div>
  );
}
