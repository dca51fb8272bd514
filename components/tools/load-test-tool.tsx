"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { Field } from "@/components/ui/field";
import { toNumber } from "@/components/forms/apply-server-errors";
import { loadTestSchema } from "@/lib/validations/tools";
import { CalcCard, Result } from "./calc-card";
import { loadTestRate } from "./spring-math";

type Schema = typeof loadTestSchema;
type NumKey = Exclude<keyof z.input<Schema>, "forceUnit">;
// The two-point checks land on the second length and second force: re-check them on any change.
const DEPS: Record<NumKey, NumKey[]> = {
  length1Mm: ["length2Mm", "force2"],
  force1: ["force2"],
  length2Mm: ["force2"],
  force2: [],
};

export function LoadTestTool() {
  const { register, control, formState } = useForm<z.input<Schema>, unknown, z.output<Schema>>({
    resolver: zodResolver(loadTestSchema),
    mode: "onChange",
    defaultValues: { forceUnit: "N" },
  });
  const parsed = loadTestSchema.safeParse(useWatch({ control }));
  const rate = parsed.success ? loadTestRate(parsed.data) : null;
  const n = (k: NumKey, label: string) => (
    <Field
      id={`lt-${k}`}
      label={label}
      inputMode="decimal"
      error={formState.errors[k]?.message}
      {...register(k, { setValueAs: toNumber(), deps: DEPS[k] })}
    />
  );
  return (
    <CalcCard
      id="load-test-tool"
      title="Rate from a two-point load test"
      formula={
        <>
          k = (F₂ − F₁) / (L₁ − L₂), the slope between two points on the spring tester, lengths shortening as force
          rises.
        </>
      }
      source="Hooke's law for a linear spring (Shigley, Mechanical Engineering Design, §10-2); points taken well clear of coil bind and of the first few mm, common practice."
    >
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
        {n("length1Mm", "First length L₁ (mm)")}
        {n("force1", "Force at L₁")}
        {n("length2Mm", "Second length L₂ (mm)")}
        {n("force2", "Force at L₂")}
        <label className="flex flex-col gap-1 text-sm font-medium">
          Force unit
          <select className="min-h-11 rounded-lg border border-stone-300 bg-white px-2" {...register("forceUnit")}>
            <option value="N">N</option>
            <option value="kgf">kgf</option>
            <option value="lbf">lbf</option>
          </select>
        </label>
      </div>
      {rate ? (
        <dl aria-label="Load test result">
          <Result
            label="Spring rate"
            value={`${rate.nMm.toFixed(2)} N/mm · ${rate.kgfMm.toFixed(3)} kgf/mm · ${rate.lbfIn.toFixed(0)} lbf/in`}
          />
        </dl>
      ) : (
        <p className="text-sm text-stone-600">Enter two lengths and their forces.</p>
      )}
    </CalcCard>
  );
}
