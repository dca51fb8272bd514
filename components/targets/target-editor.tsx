"use client";

// One row of setup targets (discipline × skill): sag targets as % of travel with mm for a reference
// bike, rider rear share, rate and bottoming factors; save, reset to the engine's defaults, preview.
import { DISCIPLINE_LABELS, SKILL_LABELS } from "@/lib/labels";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Controller, useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { applyServerErrors, toNumber } from "@/components/forms/apply-server-errors";
import { NumInput } from "@/components/forms/num-input";
import { callApi } from "@/lib/api-client";
import type { TargetRowValues } from "@/lib/requests/sizing-input";
import type { Discipline, SkillLevel } from "@/lib/sizing";
import { RateBasisOptions } from "@/components/review/rate-basis-input";
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

type Schema = typeof targetRowValuesSchema;
const number = { setValueAs: toNumber() };

export function TargetEditor({
  discipline,
  skill,
  saved,
  bikes,
}: {
  discipline: Discipline;
  skill: SkillLevel;
  saved: TargetRowValues;
  bikes: PreviewBike[];
}) {
  const router = useRouter();
  const { control, register, handleSubmit, setError, reset, formState } = useForm<
    z.input<Schema>,
    unknown,
    z.output<Schema>
  >({
    resolver: zodResolver(targetRowValuesSchema),
    defaultValues: { ...saved, rateBasis: saved.rateBasis ?? "ride-frequency" },
  });
  const values = useWatch({ control }) as TargetRowValues;
  const errors = formState.errors;
  const [message, setMessage] = useState<string | null>(null);
  const [bikeId, setBikeId] = useState(bikes[0]?.id ?? "");
  const bike = bikes.find((b) => b.id === bikeId);

  const save = handleSubmit(
    async (row) => {
      const result = await callApi("/api/shop/targets", "PUT", { discipline, skill, values: row });
      if (!result.ok)
        return setMessage(
          [result.error, ...applyServerErrors(setError, result.fields, { prefix: "values." })].join(" "),
        );
      setMessage("Saved.");
      router.refresh();
    },
    () => setMessage("Some values need attention."),
  );

  async function resetRow() {
    const result = await callApi<{ values: TargetRowValues }>("/api/shop/targets/reset", "POST", { discipline, skill });
    if (!result.ok) return setMessage(result.error);
    reset(result.data.values);
    setMessage("Back to the engine's defaults.");
    router.refresh();
  }

  return (
    <section
      aria-labelledby="target-editor"
      className="flex flex-col gap-4 rounded-xl border border-stone-200 bg-white p-4"
    >
      <h2 id="target-editor" className="font-semibold">
        {DISCIPLINE_LABELS[discipline]}, {SKILL_LABELS[skill].toLowerCase()}
      </h2>
      <label className="flex max-w-md flex-col gap-1 text-sm font-medium">
        Reference bike (for mm and the preview)
        <select
          className="min-h-11 rounded-lg border border-stone-300 bg-white px-2"
          value={bikeId}
          onChange={(e) => setBikeId(e.target.value)}
        >
          {bikes.map((b) => (
            <option key={b.id} value={b.id}>
              {b.name}
            </option>
          ))}
        </select>
      </label>
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-3">
        {SAG_FIELDS.map(([key, label, end]) => (
          // Shown in % of travel, kept as the fraction the schema checks.
          <Controller
            key={key}
            control={control}
            name={`sag.${key}`}
            rules={{ deps: SAG_FIELDS.filter(([k]) => k !== key).map(([k]) => `sag.${k}` as const) }}
            render={({ field, fieldState }) => {
              const travel = end === "rear" ? bike?.rearTravelMm : bike?.forkTravelMm;
              const f = Number.isFinite(field.value) ? field.value : undefined;
              // NaN (text that is no number) goes back as NaN, so NumInput keeps what was typed.
              return (
                <NumInput
                  id={`sag-${key}`}
                  label={`${label} (% of travel)`}
                  value={pct(field.value)}
                  onChange={(v) => field.onChange(v === undefined ? undefined : v / 100)}
                  hint={
                    f !== undefined && travel
                      ? `${(f * travel).toFixed(0)} mm on ${travel} mm of ${end} travel`
                      : undefined
                  }
                  error={fieldState.error?.message}
                />
              );
            }}
          />
        ))}
        <Field
          id="riderRearShare"
          label="Rider weight on the rear wheel (0–1)"
          inputMode="decimal"
          error={errors.riderRearShare?.message}
          {...register("riderRearShare", number)}
        />
        <Field
          id="rateFactor"
          label="Rate factor (× the matched rate)"
          inputMode="decimal"
          error={errors.rateFactor?.message}
          {...register("rateFactor", number)}
        />
        <Field
          id="bottomingFactor"
          label="Bottoming factor (× stock)"
          inputMode="decimal"
          error={errors.bottomingFactor?.message}
          {...register("bottomingFactor", number)}
        />
        <label className="flex flex-col gap-1 text-sm font-medium sm:col-span-3">
          How the spring rate is found
          <select
            id="rateBasis"
            className="min-h-11 rounded-lg border border-stone-300 bg-white px-2"
            {...register("rateBasis", { setValueAs: (v) => v || undefined })}
          >
            <RateBasisOptions />
          </select>
        </label>
      </div>
      <div className="flex flex-wrap gap-2">
        <Button onClick={save} disabled={formState.isSubmitting}>
          Save row
        </Button>
        <Button variant="secondary" onClick={resetRow}>
          Reset to defaults
        </Button>
      </div>
      {message ? (
        <p role="status" className="text-sm">
          {message}
        </p>
      ) : null}
      {bike ? <TargetPreview discipline={discipline} skill={skill} values={values} bike={bike} /> : null}
    </section>
  );
}
