"use client";

// Add or edit one spring line. The rate can be typed in any unit; the server stores N/mm.
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { NumInput } from "@/components/catalog/num-input";
import { callApi, issuesByPath } from "@/components/catalog/form-utils";
import { RATE_UNITS, type RateUnit } from "@/lib/sizing";
import { springStockSchema } from "@/lib/validations/stock";

export interface SpringDraft {
  end: "fork" | "shock";
  rate?: number;
  rateUnit: RateUnit;
  quantity?: number;
  freeLengthMm?: number | null;
  innerDiameterMm?: number | null;
  fitNotes?: string | null;
}

export function SpringForm({ id, initial, onDone, label }: { id?: string; initial: SpringDraft; onDone: () => void; label: string }) {
  const [draft, setDraft] = useState<SpringDraft>(initial);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<string | null>(null);
  const prefix = id ?? "new";
  const set = (patch: Partial<SpringDraft>) => setDraft((d) => ({ ...d, ...patch }));

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    const parsed = springStockSchema.safeParse(draft);
    if (!parsed.success) return setErrors(issuesByPath(parsed.error));
    const result = await callApi(id ? `/api/shop/stock/${id}` : "/api/shop/stock", id ? "PUT" : "POST", draft);
    if (!result.ok) {
      setErrors(result.fields);
      return setMessage(result.error);
    }
    setErrors({});
    setMessage(null);
    onDone();
  }

  return (
    <form onSubmit={submit} noValidate aria-label={label} className="grid items-end gap-3 sm:grid-cols-4 lg:grid-cols-8">
      <label className="flex flex-col gap-1 text-sm font-medium">
        End
        <select className="min-h-11 rounded-lg border border-stone-300 bg-white px-2" value={draft.end} onChange={(e) => set({ end: e.target.value as "fork" | "shock" })}>
          <option value="fork">Fork</option>
          <option value="shock">Shock</option>
        </select>
      </label>
      <NumInput id={`${prefix}-rate`} label="Rate" value={draft.rate} onChange={(v) => set({ rate: v })} error={errors.rate} />
      <label className="flex flex-col gap-1 text-sm font-medium">
        Rate unit
        <select className="min-h-11 rounded-lg border border-stone-300 bg-white px-2" value={draft.rateUnit} onChange={(e) => set({ rateUnit: e.target.value as RateUnit })}>
          {RATE_UNITS.map((u) => <option key={u} value={u}>{u}</option>)}
        </select>
      </label>
      <NumInput id={`${prefix}-qty`} label="Quantity" value={draft.quantity} onChange={(v) => set({ quantity: v })} error={errors.quantity} />
      <NumInput id={`${prefix}-len`} label="Free length (mm)" value={draft.freeLengthMm} onChange={(v) => set({ freeLengthMm: v ?? null })} error={errors.freeLengthMm} />
      <NumInput id={`${prefix}-id`} label="Inner diameter (mm)" value={draft.innerDiameterMm} onChange={(v) => set({ innerDiameterMm: v ?? null })} error={errors.innerDiameterMm} />
      <label className="flex flex-col gap-1 text-sm font-medium">
        Fit notes
        <input className="min-h-11 rounded-lg border border-stone-300 px-2" value={draft.fitNotes ?? ""} onChange={(e) => set({ fitNotes: e.target.value })} />
      </label>
      <Button type="submit">{id ? "Save" : "Add spring"}</Button>
      {message ? <p role="alert" className="text-sm text-red-800 sm:col-span-4 lg:col-span-8">{message}</p> : null}
    </form>
  );
}
