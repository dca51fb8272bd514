import type { Metadata } from "next";
import { RequestForm } from "@/components/request-form/request-form";
import { getBikeModel } from "@/db/queries/bikes";
import { getShopSettings } from "@/db/queries/settings";
import { isUuid } from "@/lib/validations/id";

export const metadata: Metadata = { title: "Ask for a setup" };
export const dynamic = "force-dynamic";

export default async function RequestPage({ searchParams }: { searchParams: Promise<{ bike?: string | string[] }> }) {
  // ?bike=<catalog id> chooses the bike (a service reminder's link); an unknown or retired one is ignored.
  const { bike: wanted } = await searchParams;
  const model = typeof wanted === "string" && isUuid(wanted) ? await getBikeModel(wanted.toLowerCase()) : null;
  const bike = model && !model.retiredAt ? { id: model.id, name: model.name } : undefined;
  // The shop's preferred units are the form's starting units; the rider can switch any field.
  const settings = await getShopSettings();
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-bold">Ask for a suspension setup</h1>
      <p className="text-stone-700">
        Five short steps, about five minutes. Your answers are kept on this phone as you go, so you can stop and come
        back.
      </p>
      <RequestForm metric={(settings?.units ?? "metric") !== "imperial"} prefill={{ bike }} />
    </div>
  );
}
