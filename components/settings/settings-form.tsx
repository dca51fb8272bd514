"use client";

import { Form } from "@/components/ui/form";

// Shop settings form, checked with the same schema as the server (react-hook-form + zodResolver).
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { applyServerErrors, toNumber } from "@/components/forms/apply-server-errors";
import { callApi } from "@/lib/api-client";
import { shopSettingsSchema, type ShopSettingsInput } from "@/lib/validations/settings";

type Input = z.input<typeof shopSettingsSchema>;
type Draft = Partial<Record<keyof ShopSettingsInput, unknown>>;
const FIELDS = Object.keys(shopSettingsSchema.shape);
const number = { setValueAs: toNumber() };

export function SettingsForm({ initial }: { initial: Draft }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<Input, unknown, z.output<typeof shopSettingsSchema>>({
    resolver: zodResolver(shopSettingsSchema),
    defaultValues: initial as Partial<Input>,
  });
  const errors = formState.errors;

  const save = handleSubmit(
    async (values) => {
      const r = await callApi("/api/shop/settings", "PUT", values);
      if (!r.ok)
        return setMessage({
          ok: false,
          text: [r.error, ...applyServerErrors(setError, r.fields, { fields: FIELDS })].join(" "),
        });
      setMessage({ ok: true, text: "Settings saved." });
      router.refresh();
    },
    () => setMessage({ ok: false, text: "Some fields need attention." }),
  );

  const select = (k: "units" | "paperSize", label: string, options: [string, string][]) => (
    <label className="flex flex-col gap-1 text-sm font-medium">
      {label}
      <select className="min-h-11 rounded-lg border border-stone-300 bg-white px-2" {...register(k)}>
        {options.map(([v, l]) => (
          <option key={v} value={v}>
            {l}
          </option>
        ))}
      </select>
      {errors[k] ? <span className="text-red-700">{errors[k].message}</span> : null}
    </label>
  );
  const textarea = (k: "address" | "sheetFooter", label: string, height: string) => (
    <label className="flex flex-col gap-1 text-sm font-medium">
      {label}
      <textarea
        className={`${height} rounded-lg border border-stone-300 px-3 py-2 font-normal`}
        aria-invalid={errors[k] ? true : undefined}
        {...register(k)}
      />
      {errors[k] ? <span className="text-red-700">{errors[k].message}</span> : null}
    </label>
  );

  return (
    <Form
      onSubmit={save}
      noValidate
      aria-label="Shop settings"
      className="flex max-w-3xl flex-col gap-4 rounded-xl border border-stone-200 bg-white p-4"
    >
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
        <Field id="name" label="Shop name" error={errors.name?.message} {...register("name")} />
        <Field id="email" label="Contact e-mail" type="email" error={errors.email?.message} {...register("email")} />
        <Field id="phone" label="Phone" error={errors.phone?.message} {...register("phone")} />
        <Field
          id="website"
          label="Website"
          placeholder="https://"
          error={errors.website?.message}
          {...register("website")}
        />
      </div>
      {textarea("address", "Address", "min-h-20")}
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
        {select("units", "Units shown first", [
          ["metric", "Metric (kg, mm, N/mm)"],
          ["imperial", "Imperial (lb, in, lbf/in)"],
        ])}
        {select("paperSize", "Setup sheet paper", [
          ["A4", "A4"],
          ["LETTER", "US Letter"],
        ])}
      </div>
      {textarea("sheetFooter", "Setup sheet footer", "min-h-16")}
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-3">
        <Field
          id="gearMassKg"
          label="Riding gear mass (kg)"
          inputMode="decimal"
          hint="Added when a rider's weight is without gear; full kit is about 7–10 kg"
          error={errors.gearMassKg?.message}
          {...register("gearMassKg", number)}
        />
        <Field
          id="frequencyRatioMin"
          label="Front/rear frequency ratio, least"
          inputMode="decimal"
          error={errors.frequencyRatioMin?.message}
          {...register("frequencyRatioMin", { ...number, deps: ["frequencyRatioMax"] })}
        />
        <Field
          id="frequencyRatioMax"
          label="Front/rear frequency ratio, most"
          inputMode="decimal"
          error={errors.frequencyRatioMax?.message}
          {...register("frequencyRatioMax", number)}
        />
      </div>
      {message ? (
        <p
          role={message.ok ? "status" : "alert"}
          className={`rounded-lg p-3 text-sm ${message.ok ? "bg-pine-50" : "bg-red-50 text-red-800"}`}
        >
          {message.text}
        </p>
      ) : null}
      <Button type="submit" className="self-start" disabled={formState.isSubmitting}>
        Save settings
      </Button>
    </Form>
  );
}
