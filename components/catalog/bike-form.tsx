"use client";

// Create or edit a catalog model. Validated live with the same bikeModelSchema the server uses.
import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import type { BikeSpecInput } from "@/lib/sizing";
import { bikeModelSchema } from "@/lib/validations/bike";
import { AIR_FIELDS, CLICKERS, FORK_FIELDS, FORK_KIND_LABELS, MASS_FIELDS, REAR_FIELDS, type NumField } from "./bike-fields";
import { CurveTable } from "./curve-table";
import { callApi, getIn, issuesByPath, setIn } from "./form-utils";
import { LeveragePreview } from "./leverage-preview";
import { NumInput } from "./num-input";

export interface BikeFormValues {
  name: string;
  slug?: string;
  bikeClass: string;
  yearFrom?: number | null;
  yearTo?: number | null;
  notes?: string | null;
  spec: BikeSpecInput;
}

/** Optional groups left fully empty are absent, not half-filled objects the schema would refuse. */
function withoutEmptyOptionals(m: BikeFormValues): BikeFormValues {
  const spec = { ...m.spec, fork: { ...m.spec.fork } };
  const empty = (o: object | undefined) => !o || Object.values(o).every((v) => v === undefined);
  if (empty(spec.riderMassRangeKg)) delete spec.riderMassRangeKg;
  if (empty(spec.fork.air)) delete spec.fork.air;
  return { ...m, spec };
}

const section = "flex flex-col gap-4 rounded-xl border border-stone-200 bg-white p-4";

export function BikeForm({ initial, id }: { initial: BikeFormValues; id?: string }) {
  const router = useRouter();
  const [model, setModel] = useState<BikeFormValues>(initial);
  const [submitted, setSubmitted] = useState(false);
  const [serverErrors, setServerErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);

  const payload = useMemo(() => withoutEmptyOptionals(model), [model]);
  const parsed = useMemo(() => bikeModelSchema.safeParse(payload), [payload]);
  const clientErrors = submitted && !parsed.success ? issuesByPath(parsed.error) : {};
  const errors = { ...clientErrors, ...serverErrors };
  const update = (path: string, value: unknown) => {
    setModel((m) => setIn(m, path, value));
    setServerErrors((e) => Object.fromEntries(Object.entries(e).filter(([k]) => k !== path)));
  };
  const num = ([path, label, hint]: NumField) => (
    <NumInput key={path} id={path} label={label} hint={hint} value={getIn(model, path) as number | undefined} onChange={(v) => update(path, v)} error={errors[path]} />
  );
  const fork = model.spec.fork;

  async function save(event: React.FormEvent) {
    event.preventDefault();
    setSubmitted(true);
    setMessage(null);
    if (!parsed.success) {
      setMessage("Some fields need attention: see the messages beside them.");
      return;
    }
    setSaving(true);
    const result = await callApi<{ id: string }>(id ? `/api/shop/catalog/${id}` : "/api/shop/catalog", id ? "PUT" : "POST", payload);
    setSaving(false);
    if (!result.ok) {
      setServerErrors(result.fields);
      setMessage(result.error);
      return;
    }
    setMessage("Saved.");
    router.push(`/shop/catalog/${result.data.id}`);
    router.refresh();
  }

  return (
    <form onSubmit={save} noValidate aria-label="Bike model" className="flex flex-col gap-5">
      <section className={section} aria-labelledby="bike-identity">
        <h2 id="bike-identity" className="font-semibold">Model</h2>
        <div className="grid gap-4 sm:grid-cols-2">
          <Field id="name" label="Name" value={model.name} onChange={(e) => update("name", e.target.value)} error={errors.name} />
          <Field id="bikeClass" label="Class" hint="Lower-case with dashes, e.g. mx-450-4t" value={model.bikeClass} onChange={(e) => update("bikeClass", e.target.value)} error={errors.bikeClass} />
          <Field id="slug" label="Slug (optional)" hint="Made from the name when empty" value={model.slug ?? ""} onChange={(e) => update("slug", e.target.value)} error={errors.slug} />
          <div className="grid grid-cols-2 gap-2">
            <NumInput id="yearFrom" label="First year" value={model.yearFrom} onChange={(v) => update("yearFrom", v ?? null)} error={errors.yearFrom} />
            <NumInput id="yearTo" label="Last year" value={model.yearTo} onChange={(v) => update("yearTo", v ?? null)} error={errors.yearTo} />
          </div>
        </div>
        <label className="flex flex-col gap-1 text-sm font-medium text-stone-800">
          Notes
          <textarea className="min-h-20 rounded-lg border border-stone-300 px-3 py-2 text-base font-normal" value={model.notes ?? ""} onChange={(e) => update("notes", e.target.value)} />
        </label>
      </section>

      <section className={section} aria-labelledby="bike-masses">
        <h2 id="bike-masses" className="font-semibold">Masses and geometry</h2>
        <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">{MASS_FIELDS.map(num)}</div>
      </section>

      <section className={section} aria-labelledby="bike-rear">
        <h2 id="bike-rear" className="font-semibold">Rear suspension</h2>
        <div className="grid gap-4 sm:grid-cols-3">{REAR_FIELDS.map(num)}</div>
        <div className="grid gap-4 lg:grid-cols-[minmax(0,22rem)_1fr]">
          <CurveTable curve={model.spec.rear.leverageCurve} onChange={(c) => update("spec.rear.leverageCurve", c)} errors={errors} />
          <LeveragePreview
            curve={model.spec.rear.leverageCurve}
            wheelTravelMm={model.spec.rear.wheelTravelMm}
            shockStrokeMm={model.spec.rear.shockStrokeMm}
            rateNmm={model.spec.rear.stockRateNmm}
            preloadMm={model.spec.rear.preloadMinMm}
          />
        </div>
      </section>

      <section className={section} aria-labelledby="bike-fork">
        <h2 id="bike-fork" className="font-semibold">Fork</h2>
        <label className="flex max-w-sm flex-col gap-1 text-sm font-medium text-stone-800">
          Fork spring
          <select className="min-h-11 rounded-lg border border-stone-300 bg-white px-3 text-base" value={fork.kind} onChange={(e) => update("spec.fork.kind", e.target.value)}>
            {Object.entries(FORK_KIND_LABELS).map(([k, label]) => <option key={k} value={k}>{label}</option>)}
          </select>
        </label>
        <div className="grid gap-4 sm:grid-cols-3">{FORK_FIELDS.filter(([p]) => fork.kind !== "air" || !/stockRate|Preload/.test(p)).map(num)}</div>
        {fork.kind === "air" ? <div className="grid gap-4 sm:grid-cols-3">{AIR_FIELDS.map(num)}</div> : null}
        {errors["spec.fork.air"] ? <p className="text-sm font-medium text-red-700">{errors["spec.fork.air"]}</p> : null}
      </section>

      <section className={section} aria-labelledby="bike-clickers">
        <h2 id="bike-clickers" className="font-semibold">Clickers, counted out from fully closed</h2>
        <div className="grid gap-4 lg:grid-cols-2">
          {CLICKERS.map(([cid, label]) => (
            <fieldset key={cid} className="grid grid-cols-3 gap-2">
              <legend className="mb-1 text-sm font-semibold text-stone-800">{label}</legend>
              {([["min", "Least"], ["max", "Most"], ["stock", "Stock"]] as const).map(([k, word]) => num([`spec.clickers.${cid}.${k}`, word]))}
            </fieldset>
          ))}
        </div>
      </section>

      {message ? <p role="alert" className={`rounded-lg p-3 text-sm font-medium ${message === "Saved." ? "bg-pine-50 text-pine-900" : "bg-red-50 text-red-800"}`}>{message}</p> : null}
      <div className="flex gap-3">
        <Button type="submit" disabled={saving}>{saving ? "Saving…" : id ? "Save changes" : "Add bike"}</Button>
      </div>
    </form>
  );
}
