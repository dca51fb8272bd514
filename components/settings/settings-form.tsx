"use client";

// Shop settings form, checked with the same schema as the server.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { NumInput } from "@/components/catalog/num-input";
import { callApi, issuesByPath } from "@/components/catalog/form-utils";
import { shopSettingsSchema, type ShopSettingsInput } from "@/lib/validations/settings";

type Draft = Partial<Record<keyof ShopSettingsInput, unknown>>;

export function SettingsForm({ initial }: { initial: Draft }) {
  const router = useRouter();
  const [draft, setDraft] = useState<Draft>(initial);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const set = (k: keyof ShopSettingsInput, v: unknown) => setDraft((d) => ({ ...d, [k]: v }));
  const text = (k: keyof ShopSettingsInput) => (typeof draft[k] === "string" ? (draft[k] as string) : "");

  async function save(e: React.FormEvent) {
    e.preventDefault();
    const parsed = shopSettingsSchema.safeParse(draft);
    if (!parsed.success) return (setErrors(issuesByPath(parsed.error)), setMessage({ ok: false, text: "Some fields need attention." }));
    const r = await callApi("/api/shop/settings", "PUT", draft);
    if (!r.ok) return (setErrors(r.fields), setMessage({ ok: false, text: r.error }));
    setErrors({});
    setMessage({ ok: true, text: "Settings saved." });
    router.refresh();
  }

  const select = (k: "units" | "paperSize", label: string, options: [string, string][]) => (
    <label className="flex flex-col gap-1 text-sm font-medium">
      {label}
      <select className="min-h-11 rounded-lg border border-stone-300 bg-white px-2" value={text(k)} onChange={(e) => set(k, e.target.value)}>
        {options.map(([v, l]) => <option key={v} value={v}>{l}</option>)}
      </select>
      {errors[k] ? <span className="text-red-700">{errors[k]}</span> : null}
    </label>
  );

  return (
    <form onSubmit={save} noValidate aria-label="Shop settings" className="flex max-w-3xl flex-col gap-4 rounded-xl border border-stone-200 bg-white p-4">
      <div className="grid gap-4 sm:grid-cols-2">
        <Field id="name" label="Shop name" value={text("name")} onChange={(e) => set("name", e.target.value)} error={errors.name} />
        <Field id="email" label="Contact e-mail" type="email" value={text("email")} onChange={(e) => set("email", e.target.value)} error={errors.email} />
        <Field id="phone" label="Phone" value={text("phone")} onChange={(e) => set("phone", e.target.value)} error={errors.phone} />
        <Field id="website" label="Website" placeholder="https://" value={text("website")} onChange={(e) => set("website", e.target.value)} error={errors.website} />
      </div>
      <label className="flex flex-col gap-1 text-sm font-medium">
        Address
        <textarea className="min-h-20 rounded-lg border border-stone-300 px-3 py-2 font-normal" value={text("address")} onChange={(e) => set("address", e.target.value)} />
      </label>
      <div className="grid gap-4 sm:grid-cols-2">
        {select("units", "Units shown first", [["metric", "Metric (kg, mm, N/mm)"], ["imperial", "Imperial (lb, in, lbf/in)"]])}
        {select("paperSize", "Setup sheet paper", [["A4", "A4"], ["LETTER", "US Letter"]])}
      </div>
      <label className="flex flex-col gap-1 text-sm font-medium">
        Setup sheet footer
        <textarea className="min-h-16 rounded-lg border border-stone-300 px-3 py-2 font-normal" value={text("sheetFooter")} onChange={(e) => set("sheetFooter", e.target.value)} />
      </label>
      <div className="grid gap-4 sm:grid-cols-3">
        <NumInput id="gearMassKg" label="Riding gear mass (kg)" hint="Added when a rider's weight is without gear; full kit is about 7–10 kg" value={draft.gearMassKg as number | undefined} onChange={(v) => set("gearMassKg", v)} error={errors.gearMassKg} />
        <NumInput id="frequencyRatioMin" label="Front/rear frequency ratio, least" value={draft.frequencyRatioMin as number | undefined} onChange={(v) => set("frequencyRatioMin", v)} error={errors.frequencyRatioMin} />
        <NumInput id="frequencyRatioMax" label="Front/rear frequency ratio, most" value={draft.frequencyRatioMax as number | undefined} onChange={(v) => set("frequencyRatioMax", v)} error={errors.frequencyRatioMax} />
      </div>
      {message ? <p role={message.ok ? "status" : "alert"} className={`rounded-lg p-3 text-sm ${message.ok ? "bg-pine-50" : "bg-red-50 text-red-800"}`}>{message.text}</p> : null}
      <Button type="submit" className="self-start">Save settings</Button>
    </form>
  );
}
