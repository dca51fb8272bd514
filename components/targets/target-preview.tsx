"use client";

// Before/after: the engine's recommendation for a reference rider with the saved row and the edit.
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { NumInput } from "@/components/forms/num-input";
import { callApi } from "@/lib/api-client";
import type { TargetRowValues } from "@/lib/requests/sizing-input";
import type { PreviewSummary } from "@/lib/shop/target-preview";
import type { Discipline, SkillLevel } from "@/lib/sizing";
import { ScrollBox } from "@/components/ui/scroll-box";

export interface PreviewBike {
  id: string;
  name: string;
  rearTravelMm: number;
  forkTravelMm: number;
}

const ROWS: [keyof PreviewSummary, string, number][] = [
  ["rearRateNmm", "Shock spring (N/mm)", 1],
  ["rearPreloadMm", "Shock preload (mm)", 1],
  ["rearRaceSagMm", "Rear race sag (mm)", 0],
  ["rearStaticSagMm", "Rear static sag (mm)", 0],
  ["forkRateNmm", "Fork spring per leg (N/mm)", 2],
  ["forkAirKpa", "Fork air (kPa gauge)", 0],
  ["forkRaceSagMm", "Fork race sag (mm)", 0],
  ["oilLevelMm", "Oil level (mm)", 0],
];

export function TargetPreview({
  discipline,
  skill,
  values,
  bike,
}: {
  discipline: Discipline;
  skill: SkillLevel;
  values: TargetRowValues;
  bike: PreviewBike;
}) {
  const [mass, setMass] = useState<number | undefined>(80);
  const [result, setResult] = useState<{ before: PreviewSummary; after: PreviewSummary } | null>(null);
  const [error, setError] = useState<string | null>(null);
  async function run() {
    const r = await callApi<{ before: PreviewSummary; after: PreviewSummary }>("/api/shop/targets/preview", "POST", {
      discipline,
      skill,
      values,
      bikeModelId: bike.id,
      riderMassKg: mass,
    });
    if (!r.ok) return setError(Object.values(r.fields)[0] ?? r.error);
    setError(null);
    setResult(r.data);
  }
  const fmt = (v: unknown, d: number) => (typeof v === "number" ? v.toFixed(d) : "—");
  return (
    <div className="flex flex-col gap-3 border-t border-stone-200 pt-4">
      <h3 className="font-semibold">Preview for a reference rider</h3>
      <div className="flex flex-wrap items-end gap-3">
        <NumInput id="preview-mass" label="Rider mass with gear (kg)" value={mass} onChange={setMass} />
        <Button variant="secondary" onClick={run}>
          Show before and after
        </Button>
      </div>
      {error ? (
        <p role="alert" className="text-sm text-red-800">
          {error}
        </p>
      ) : null}
      {result ? (
        <ScrollBox label="Preview for a reference rider">
          <table className="max-w-xl text-left text-sm tabular-nums">
            <caption className="text-left text-stone-600">
              {bike.name}, moderate style, medium jumps, no complaints
            </caption>
            <thead>
              <tr>
                <th scope="col" className="pr-4">
                  Figure
                </th>
                <th scope="col" className="pr-4">
                  Saved row
                </th>
                <th scope="col">This edit</th>
              </tr>
            </thead>
            <tbody>
              {ROWS.map(([k, label, d]) => (
                <tr key={k}>
                  <th scope="row" className="pr-4 font-normal">
                    {label}
                  </th>
                  <td className="pr-4">{fmt(result.before[k], d)}</td>
                  <td className={result.before[k] !== result.after[k] ? "font-semibold" : ""}>
                    {fmt(result.after[k], d)}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </ScrollBox>
      ) : null}
      {result?.after.warnings.length ? (
        <ul className="list-disc pl-5 text-sm text-amber-900">
          {result.after.warnings.map((w) => (
            <li key={w}>{w}</li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
