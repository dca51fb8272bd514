"use client";

// One row of setup targets (discipline × skill): sag targets as % of travel with mm for a reference
// bike, rider rear share, rate and bottoming factors; save, reset to the engine's defaults, preview.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { NumInput } from "@/components/catalog/num-input";
import { callApi, getIn, issuesByPath, setIn } from "@/components/catalog/form-utils";
import type { TargetRowValues } from "@/lib/requests/sizing-input";
import type { Discipline, SkillLevel } from "@/lib/sizing";
import { targetRowValuesSchema } from "@/lib/validations/targets";
import { TargetPreview, type PreviewBike } from "./target-preview";

const SAG_FIELDS: [key: keyof TargetRowValues["sag"], label: string, end: "rear" | "fork"][] = [
  ["rearRace", "Rear race sag", "rear"],
  ["rearStaticMin", "Rear static sag, least", "rear"],
  ["rearStaticMax", "Rear static sag, most", "rear"],
  ["forkRace", "Fork race sag", "fork"],
  ["forkStaticMin", "Fork static sag, least", "fork"],
  ["forkStaticMax", "Fork static sag, most", "fork"],
];

const pct = (f: number | undefined) => (f === undefined ? undefined : Math.round(f * 10000) / 100);

export function TargetEditor({ discipline, skill, saved, bikes }: { discipline: Discipline; skill: SkillLevel; saved: TargetRowValues; bikes: PreviewBike[] }) {
  const router = useRouter();
  const [values, setValues] = useState<TargetRowValues>(saved);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<string | null>(null);
  const [bikeId, setBikeId] = useState(bikes[0]?.id ?? "");
  const bike = bikes.find((b) => b.id === bikeId);
  const set = (path: string, v: number | undefined) => setValues((cur) => setIn(cur, path, v));

  async function save() {
    const parsed = targetRowValuesSchema.safeParse(values);
    if (!parsed.success) {
      setErrors(issuesByPath(parsed.error));
      return setMessage("Some values need attention.");
    }
    const result = await callApi("/api/shop/targets", "PUT", { discipline, skill, values });
    if (!result.ok) {
      setErrors(Object.fromEntries(Object.entries(result.fields).map(([k, m]) => [k.replace(/^values\./, ""), m])));
      return setMessage(result.error);
    }
    setErrors({});
    setMessage("Saved.");
    router.refresh();
  }

  async function reset() {
    const result = await callApi<{ values: TargetRowValues }>("/api/shop/targets/reset", "POST", { discipline, skill });
    if (result.ok) {
      setValues(result.data.values);
      setErrors({});
      setMessage("Back to the engine's defaults.");
      router.refresh();
    }
  }

  return (
    <section aria-labelledby="target-editor" className="flex flex-col gap-4 rounded-xl border border-stone-200 bg-white p-4">
      <h2 id="target-editor" className="font-semibold capitalize">{discipline}, {skill}</h2>
      <label className="flex max-w-md flex-col gap-1 text-sm font-medium">
        Reference bike (for mm and the preview)
        <select className="min-h-11 rounded-lg border border-stone-300 bg-white px-2" value={bikeId} onChange={(e) => setBikeId(e.target.value)}>
          {bikes.map((b) => <option key={b.id} value={b.id}>{b.name}</option>)}
        </select>
      </label>
      <div className="grid gap-4 sm:grid-cols-3">
        {SAG_FIELDS.map(([key, label, end]) => {
          const f = getIn(values, `sag.${key}`) as number | undefined;
          const travel = end === "rear" ? bike?.rearTravelMm : bike?.forkTravelMm;
          return (
            <NumInput
              key={key}
              id={`sag-${key}`}
              label={`${label} (% of travel)`}
              value={pct(f)}
              onChange={(v) => set(`sag.${key}`, v === undefined ? undefined : v / 100)}
              hint={f !== undefined && travel ? `${(f * travel).toFixed(0)} mm on ${travel} mm of ${end} travel` : undefined}
              error={errors[`sag.${key}`]}
            />
          );
        })}
        <NumInput id="riderRearShare" label="Rider weight on the rear wheel (0–1)" value={values.riderRearShare} onChange={(v) => set("riderRearShare", v)} error={errors.riderRearShare} />
        <NumInput id="rateFactor" label="Rate factor (× the sag rate)" value={values.rateFactor} onChange={(v) => set("rateFactor", v)} error={errors.rateFactor} />
        <NumInput id="bottomingFactor" label="Bottoming factor (× stock)" value={values.bottomingFactor} onChange={(v) => set("bottomingFactor", v)} error={errors.bottomingFactor} />
      </div>
      <div className="flex flex-wrap gap-2">
        <Button onClick={save}>Save row</Button>
        <Button variant="secondary" onClick={reset}>Reset to defaults</Button>
      </div>
      {message ? <p role="status" className="text-sm">{message}</p> : null}
      {bike ? <TargetPreview discipline={discipline} skill={skill} values={values} bike={bike} /> : null}
    </section>
  );
}
