"use client";

import { useState } from "react";
import { NumInput } from "@/components/catalog/num-input";
import { issuesByPath } from "@/components/catalog/form-utils";
import { loadTestSchema } from "@/lib/validations/tools";
import { CalcCard, Result } from "./calc-card";
import { loadTestRate } from "./spring-math";

export function LoadTestTool() {
  const [v, setV] = useState<Record<string, unknown>>({ forceUnit: "N" });
  const parsed = loadTestSchema.safeParse(v);
  const errors = parsed.success ? {} : issuesByPath(parsed.error);
  const rate = parsed.success ? loadTestRate(parsed.data) : null;
  const n = (k: string, label: string) => (
    <NumInput id={`lt-${k}`} label={label} value={v[k] as number | undefined} onChange={(x) => setV((o) => ({ ...o, [k]: x }))} error={v[k] !== undefined ? errors[k] : undefined} />
  );
  return (
    <CalcCard id="load-test-tool" title="Rate from a two-point load test" formula={<>k = (F₂ − F₁) / (L₁ − L₂), the slope between two points on the spring tester, lengths shortening as force rises.</>} source="Hooke's law for a linear spring (Shigley, Mechanical Engineering Design, §10-2); points taken well clear of coil bind and of the first few mm, common practice.">
      <div className="grid gap-3 sm:grid-cols-2">
        {n("length1Mm", "First length L₁ (mm)")}
        {n("force1", "Force at L₁")}
        {n("length2Mm", "Second length L₂ (mm)")}
        {n("force2", "Force at L₂")}
        <label className="flex flex-col gap-1 text-sm font-medium">
          Force unit
          <select className="min-h-11 rounded-lg border border-stone-300 bg-white px-2" value={v.forceUnit as string} onChange={(e) => setV((o) => ({ ...o, forceUnit: e.target.value }))}>
            <option value="N">N</option>
            <option value="kgf">kgf</option>
            <option value="lbf">lbf</option>
          </select>
        </label>
      </div>
      {rate ? (
        <dl aria-label="Load test result">
          <Result label="Spring rate" value={`${rate.nMm.toFixed(2)} N/mm · ${rate.kgfMm.toFixed(3)} kgf/mm · ${rate.lbfIn.toFixed(0)} lbf/in`} />
        </dl>
      ) : <p className="text-sm text-stone-600">Enter two lengths and their forces.</p>}
    </CalcCard>
  );
}
