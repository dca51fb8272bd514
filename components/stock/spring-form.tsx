"use client";

import { Form } from "@/components/ui/form";

// Add or edit one spring line. The rate can be typed in any unit; the server stores N/mm.
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { applyServerErrors, toNumber } from "@/components/forms/apply-server-errors";
import { callApi } from "@/lib/api-client";
import { RATE_UNITS, type RateUnit } from "@/lib/sizing";
import { springStockSchema } from "@/lib/validations/stock";

type Schema = typeof springStockSchema;

export interface SpringDraft {
  end: "fork" | "shock";
  rate?: number;
  rateUnit: RateUnit;
  quantity?: number;
  freeLengthMm?: number | null;
  innerDiameterMm?: number | null;
  fitNotes?: string | null;
}

const number = { setValueAs: toNumber() };
const nullableNumber = { setValueAs: toNumber(null) };

export function SpringForm({
  id,
  initial,
  onDone,
  label,
}: {
  id?: string;
  initial: SpringDraft;
  onDone: () => void;
  label: string;
}) {
  const [message, setMessage] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<z.input<Schema>, unknown, z.output<Schema>>({
    resolver: zodResolver(springStockSchema),
    defaultValues: initial,
  });
  const errors = formState.errors;
  const prefix = id ?? "new";

  const submit = handleSubmit(async (values) => {
    const result = await callApi(id ? `/api/shop/stock/${id}` : "/api/shop/stock", id ? "PUT" : "POST", values);
    if (!result.ok) return setMessage([result.error, ...applyServerErrors(setError, result.fields)].join(" "));
    setMessage(null);
    onDone();
  });

  const num = (name: "rate" | "quantity", fid: string, text: string) => (
    <Field
      id={`${prefix}-${fid}`}
      label={text}
      inputMode="decimal"
      error={errors[name]?.message}
      {...register(name, number)}
    />
  );
  const mm = (name: "freeLengthMm" | "innerDiameterMm", fid: string, text: string) => (
    <Field
      id={`${prefix}-${fid}`}
      label={text}
      inputMode="decimal"
      error={errors[name]?.message}
      {...register(name, nullableNumber)}
    />
  );

  return (
    <Form
      onSubmit={submit}
      noValidate
      aria-label={label}
      className="grid grid-cols-1 items-end gap-3 sm:grid-cols-4 lg:grid-cols-8"
    >
      <label className="flex flex-col gap-1 text-sm font-medium">
        End
        <select
          className="min-h-11 rounded-lg border border-stone-300 bg-white px-2"
          {...register("end", { deps: ["rate"] })}
        >
          <option value="fork">Fork</option>
          <option value="shock">Shock</option>
        </select>
      </label>
      {num("rate", "rate", "Rate")}
      <label className="flex flex-col gap-1 text-sm font-medium">
        Rate unit
        <select
          className="min-h-11 rounded-lg border border-stone-300 bg-white px-2"
          {...register("rateUnit", { deps: ["rate"] })}
        >
          {RATE_UNITS.map((u) => (
            <option key={u} value={u}>
              {u}
            </option>
          ))}
        </select>
      </label>
      {num("quantity", "qty", "Quantity")}
      {mm("freeLengthMm", "len", "Free length (mm)")}
      {mm("innerDiameterMm", "id", "Inner diameter (mm)")}
      <label className="flex flex-col gap-1 text-sm font-medium">
        Fit notes
        <input className="min-h-11 rounded-lg border border-stone-300 px-2" {...register("fitNotes")} />
        {errors.fitNotes ? <span className="text-red-700">{errors.fitNotes.message}</span> : null}
      </label>
      <Button type="submit" disabled={formState.isSubmitting}>
        {id ? "Save" : "Add spring"}
      </Button>
      {message ? (
        <p role="alert" className="text-sm text-red-800 sm:col-span-4 lg:col-span-8">
          {message}
        </p>
      ) : null}
    </Form>
  );
}
