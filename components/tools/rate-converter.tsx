"use client";

import { useState } from "react";
import { NumInput } from "@/components/catalog/num-input";
import { RATE_UNITS, convertRate, type RateUnit } from "@/lib/sizing";
import { rateConvertSchema } from "@/lib/validations/tools";
import { CalcCard, Result } from "./calc-card";

export function RateConverter() {
  const [value, setValue] = useState<number | undefined>();
  const [from, setFrom] = useState<RateUnit>("kgf/mm");
  const parsed = rateConvertSchema.safeParse({ value, from });
  return (
    <CalcCard id="rate-converter" title="Rate unit converter" formula={<>1 kgf/mm = 9.80665 N/mm; 1 lbf/in = 4.4482216152605 N / 25.4 mm = 0.175127 N/mm.</>} source="NIST SP 811 (2008), appendix B.8: exact definitions of the kilogram-force, pound-force and inch.">
      <div className="grid gap-3 sm:grid-cols-2">
        <NumInput id="conv-value" label="Rate" value={value} onChange={setValue} error={value !== undefined && !parsed.success ? parsed.error.issues[0]?.message : undefined} />
        <label className="flex flex-col gap-1 text-sm font-medium">
          From unit
          <select className="min-h-11 rounded-lg border border-stone-300 bg-white px-2" value={from} onChange={(e) => setFrom(e.target.value as RateUnit)}>
            {RATE_UNITS.map((u) => <option key={u} value={u}>{u}</option>)}
          </select>
        </label>
      </div>
      {parsed.success ? (
        <dl aria-label="Converted rate">
          {RATE_UNITS.map((u) => <Result key={u} label={u} value={convertRate(parsed.data.value, from, u).toFixed(u === "lbf/in" ? 1 : 3)} />)}
        </dl>
      ) : null}
    </CalcCard>
  );
}
