"use client";

import { Form } from "@/components/ui/form";

// Create or edit a catalog model: react-hook-form checked with the same bikeModelSchema the server uses.
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch, type Path, type Resolver } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { ErrorText, Field } from "@/components/ui/field";
import { BIKE_CLASS_LABELS } from "@/lib/labels";
import { applyServerErrors, errorAt, toNumber } from "@/components/forms/apply-server-errors";
import { bikeModelSchema, type BikeModelInput, type BikeModelValues } from "@/lib/validations/bike";
import {
  AIR_FIELDS,
  CLICKERS,
  FORK_FIELDS,
  FORK_KIND_LABELS,
  FORK_SPRING_FIELDS,
  MASS_FIELDS,
  REAR_FIELDS,
  type NumField,
} from "./bike-fields";
import { CurveTable } from "./curve-table";
import { callApi } from "@/lib/api-client";
import { LeveragePreview } from "./leverage-preview";

export type BikeFormValues = BikeModelInput;

/** Optional groups left fully empty are absent, not half-filled objects the schema would refuse. */
export function withoutEmptyOptionals(m: BikeFormValues): BikeFormValues {
  const spec = { ...m.spec, fork: { ...m.spec.fork } };
  const empty = (o: object | undefined) => !o || Object.values(o).every((v) => v === undefined);
  if (empty(spec.riderMassRangeKg)) delete spec.riderMassRangeKg;
  if (empty(spec.fork.air)) delete spec.fork.air;
  if (empty(spec.fork.stockSpring)) delete spec.fork.stockSpring;
  return { ...m, spec };
}

// The browser-side variant of the shared schema: the same bikeModelSchema, after dropping empty groups.
const schemaResolver = zodResolver(bikeModelSchema);
const bikeResolver: Resolver<BikeModelInput, unknown, BikeModelValues> = (values, context, options) =>
  schemaResolver(withoutEmptyOptionals(values), context, options);

// Fields whose change moves a cross-field check shown on another field.
const DEPS: Record<string, Path<BikeModelInput>[]> = {
  "spec.rear.wheelTravelMm": ["spec.rear.shockStrokeMm"],
  yearFrom: ["yearTo"],
};
const SERVER_FIELDS = [
  "name",
  "slug",
  "bikeClass",
  "yearFrom",
  "yearTo",
  "notes",
  "forkOilType",
  "forkOilVolumeMl",
  "spec",
];

/** The class select's value for "a class of the shop's own" (never a class code: those have no "*"). */
const OWN_CLASS = "*own";

const section = "flex flex-col gap-4 rounded-xl border border-stone-200 bg-white p-4";

export function BikeForm({ initial, id }: { initial: BikeFormValues; id?: string }) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const { control, register, handleSubmit, getValues, setError, setValue, formState } = useForm<
    BikeModelInput,
    unknown,
    BikeModelValues
  >({
    resolver: bikeResolver,
    defaultValues: initial,
  });
  const errors = formState.errors;
  // The generic classes are chosen by their names; a class of the shop's own is typed.
  const [classChoice, setClassChoice] = useState(() =>
    Object.hasOwn(BIKE_CLASS_LABELS, initial.bikeClass ?? "") ? (initial.bikeClass as string) : OWN_CLASS,
  );
  const [forkKind, curve, wheelTravelMm, shockStrokeMm, rateNmm, preloadMm] = useWatch({
    control,
    name: [
      "spec.fork.kind",
      "spec.rear.leverageCurve",
      "spec.rear.wheelTravelMm",
      "spec.rear.shockStrokeMm",
      "spec.rear.stockRateNmm",
      "spec.rear.preloadMinMm",
    ],
  });
  const num = ([path, label, hint]: NumField) => (
    <Field
      key={path}
      id={path}
      label={label}
      hint={hint}
      inputMode="decimal"
      error={errorAt(errors, path)}
      {...register(path as Path<BikeModelInput>, { setValueAs: toNumber(), deps: DEPS[path] })}
    />
  );

  const save = handleSubmit(
    async () => {
      setMessage(null);
      // The values as typed (minus empty groups), as before: the server parses them with the same schema.
      const payload = withoutEmptyOptionals(getValues());
      const result = await callApi<{ id: string }>(
        id ? `/api/shop/catalog/${id}` : "/api/shop/catalog",
        id ? "PUT" : "POST",
        payload,
      );
      if (!result.ok)
        return setMessage(
          [result.error, ...applyServerErrors(setError, result.fields, { fields: SERVER_FIELDS })].join(" "),
        );
      setMessage("Saved.");
      router.push(`/shop/catalog/${result.data.id}`);
      router.refresh();
    },
    () => setMessage("Some fields need attention: see the messages beside them."),
  );

  return (
    <Form onSubmit={save} noValidate aria-label="Bike model" className="flex flex-col gap-5">
      <section className={section} aria-labelledby="bike-identity">
        <h2 id="bike-identity" className="font-semibold">
          Model
        </h2>
        <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
          <Field id="name" label="Name" error={errors.name?.message} {...register("name")} />
          <div className="flex flex-col gap-1">
            <label htmlFor="bikeClassChoice" className="text-sm font-medium text-stone-800">
              Class
            </label>
            <select
              id="bikeClassChoice"
              className="min-h-11 rounded-lg border border-stone-300 bg-white px-3 text-base"
              aria-invalid={classChoice !== OWN_CLASS && errors.bikeClass ? true : undefined}
              aria-describedby={classChoice !== OWN_CLASS && errors.bikeClass ? "bikeClass-error" : undefined}
              value={classChoice}
              onChange={(e) => {
                setClassChoice(e.target.value);
                setValue("bikeClass", e.target.value === OWN_CLASS ? "" : e.target.value, {
                  shouldValidate: formState.isSubmitted,
                });
              }}
            >
              {Object.entries(BIKE_CLASS_LABELS).map(([code, label]) => (
                <option key={code} value={code}>
                  {label}
                </option>
              ))}
              <option value={OWN_CLASS}>A class of the shop&apos;s own</option>
            </select>
            {classChoice === OWN_CLASS ? null : <ErrorText id="bikeClass-error" message={errors.bikeClass?.message} />}
          </div>
          {classChoice === OWN_CLASS ? (
            <Field
              id="bikeClass"
              label="Own class name"
              hint="Lower-case letters, digits and dashes: it groups models in the catalog and the queue"
              error={errors.bikeClass?.message}
              {...register("bikeClass")}
            />
          ) : null}
          <Field
            id="slug"
            label="Slug (optional)"
            hint="Made from the name when empty"
            error={errors.slug?.message}
            {...register("slug")}
          />
          <div className="grid grid-cols-2 gap-2">
            <Field
              id="yearFrom"
              label="First year"
              inputMode="numeric"
              error={errors.yearFrom?.message}
              {...register("yearFrom", { setValueAs: toNumber(null), deps: ["yearTo"] })}
            />
            <Field
              id="yearTo"
              label="Last year"
              inputMode="numeric"
              error={errors.yearTo?.message}
              {...register("yearTo", { setValueAs: toNumber(null) })}
            />
          </div>
        </div>
        <label className="flex flex-col gap-1 text-sm font-medium text-stone-800">
          Notes
          <textarea
            className="min-h-20 rounded-lg border border-stone-300 px-3 py-2 text-base font-normal"
            aria-invalid={errors.notes ? true : undefined}
            {...register("notes")}
          />
          {errors.notes ? <span className="text-red-700">{errors.notes.message}</span> : null}
        </label>
      </section>

      <section className={section} aria-labelledby="bike-masses">
        <h2 id="bike-masses" className="font-semibold">
          Masses and geometry
        </h2>
        <div className="grid grid-cols-1 gap-4 sm:grid-cols-2 lg:grid-cols-4">{MASS_FIELDS.map(num)}</div>
      </section>

      <section className={section} aria-labelledby="bike-rear">
        <h2 id="bike-rear" className="font-semibold">
          Rear suspension
        </h2>
        <div className="grid grid-cols-1 gap-4 sm:grid-cols-3">{REAR_FIELDS.map(num)}</div>
        <div className="grid grid-cols-1 gap-4 lg:grid-cols-[minmax(0,22rem)_1fr]">
          <CurveTable control={control} register={register} getValues={getValues} errors={errors} />
          <LeveragePreview
            curve={curve}
            wheelTravelMm={wheelTravelMm}
            shockStrokeMm={shockStrokeMm}
            rateNmm={rateNmm}
            preloadMm={preloadMm}
          />
        </div>
      </section>

      <section className={section} aria-labelledby="bike-fork">
        <h2 id="bike-fork" className="font-semibold">
          Fork
        </h2>
        <label className="flex max-w-sm flex-col gap-1 text-sm font-medium text-stone-800">
          Fork spring
          <select
            className="min-h-11 rounded-lg border border-stone-300 bg-white px-3 text-base"
            {...register("spec.fork.kind", { deps: ["spec.fork.air"] as Path<BikeModelInput>[] })}
          >
            {Object.entries(FORK_KIND_LABELS).map(([k, label]) => (
              <option key={k} value={k}>
                {label}
              </option>
            ))}
          </select>
        </label>
        <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
          <Field
            id="forkOilType"
            label="Fork oil type (optional)"
            hint="As your shop names it; printed on the rider's sheet"
            error={errors.forkOilType?.message}
            {...register("forkOilType", { setValueAs: (v: unknown) => (String(v ?? "").trim() === "" ? null : v) })}
          />
          <Field
            id="forkOilVolumeMl"
            label="Fork oil volume per leg, ml (optional)"
            inputMode="decimal"
            error={errors.forkOilVolumeMl?.message}
            {...register("forkOilVolumeMl", { setValueAs: toNumber(null) })}
          />
        </div>
        <div className="grid grid-cols-1 gap-4 sm:grid-cols-3">
          {FORK_FIELDS.filter(([p]) => forkKind !== "air" || !/stockRate|Preload/.test(p)).map(num)}
        </div>
        {forkKind === "air" ? (
          <div className="grid grid-cols-1 gap-4 sm:grid-cols-3">{AIR_FIELDS.map(num)}</div>
        ) : (
          <div className="grid grid-cols-1 gap-4 sm:grid-cols-3">{FORK_SPRING_FIELDS.map(num)}</div>
        )}
        {errorAt(errors, "spec.fork.air") ? (
          <p className="text-sm font-medium text-red-700">{errorAt(errors, "spec.fork.air")}</p>
        ) : null}
      </section>

      <section className={section} aria-labelledby="bike-clickers">
        <h2 id="bike-clickers" className="font-semibold">
          Clickers, counted out from fully closed
        </h2>
        <div className="grid grid-cols-1 gap-4 lg:grid-cols-2">
          {CLICKERS.map(([cid, label]) => (
            <fieldset key={cid} className="grid grid-cols-3 gap-2">
              <legend className="mb-1 text-sm font-semibold text-stone-800">{label}</legend>
              {(
                [
                  ["min", "Least"],
                  ["max", "Most"],
                  ["stock", "Stock"],
                ] as const
              ).map(([k, word]) => num([`spec.clickers.${cid}.${k}`, word]))}
            </fieldset>
          ))}
        </div>
      </section>

      {message ? (
        <p
          role="alert"
          className={`rounded-lg p-3 text-sm font-medium ${message === "Saved." ? "bg-pine-50 text-pine-900" : "bg-red-50 text-red-800"}`}
        >
          {message}
        </p>
      ) : null}
      <div className="flex gap-3">
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Saving…" : id ? "Save changes" : "Add bike"}
        </Button>
      </div>
    </Form>
  );
}
