"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { Field } from "@/components/ui/field";
import { toNumber } from "@/components/forms/apply-server-errors";
import { RATE_UNITS, convertRate } from "@/lib/sizing";
import { rateConvertSchema } from "@/lib/validations/tools";
import { CalcCard, Result } from "./calc-card";

type Schema = typeof rateConvertSchema;

export function RateConverter() {
  const { register, control, formState } = useForm<z.input<Schema>, unknown, z.output<Schema>>({
    resolver: zodResolver(rateConvertSchema),
    mode: "onChange",
    defaultValues: { from: "kgf/mm" },
  });
  const parsed = rateConvertSchema.safeParse(useWatch({ control }));
  return (
    <CalcCard
      id="rate-converter"
      title="Rate unit converter"
      formula={<>1 kgf/mm = 9.80665 N/mm; 1 lbf/in = 4.4482216152605 N / 25.4 mm = 0.175127 N/mm.</>}
      source="NIST SP 811 (2008), appendix B.8: exact definitions of the kilogram-force, pound-force and inch."
    >
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
        <Field
          id="conv-value"
          label="Rate"
          inputMode="decimal"
          error={formState.errors.value?.message}
          {...register("value", { setValueAs: toNumber() })}
        />
        <label className="flex flex-col gap-1 text-sm font-medium">
          From unit
          <select className="min-h-11 rounded-lg border border-stone-300 bg-white px-2" {...register("from")}>
            {RATE_UNITS.map((u) => (
              <option key={u} value={u}>
                {u}
              </option>
            ))}
          </select>
        </label>
      </div>
      {parsed.success ? (
        <dl aria-label="Converted rate">
          {RATE_UNITS.map((u) => (
            <Result
              key={u}
              label={u}
              value={convertRate(parsed.data.value, parsed.data.from, u).toFixed(u === "lbf/in" ? 1 : 3)}
            />
          ))}
        </dl>
      ) : null}
    </CalcCard>
  );
}
