"use client";

import type { LeveragePoint } from "@/lib/sizing";
import { Button } from "@/components/ui/button";
import { NumInput } from "./num-input";

/** The leverage-ratio curve as an editable table of points. */
export function CurveTable({ curve, onChange, errors }: { curve: LeveragePoint[]; onChange: (c: LeveragePoint[]) => void; errors: Record<string, string> }) {
  const set = (i: number, key: keyof LeveragePoint, v: number | undefined) =>
    onChange(curve.map((p, j) => (j === i ? { ...p, [key]: v as number } : p)));
  const listError = errors["spec.rear.leverageCurve"];
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="text-sm font-semibold text-stone-800">Leverage-ratio curve (wheel travel per shock travel)</legend>
      <table className="text-sm">
        <thead>
          <tr className="text-left text-stone-600">
            <th scope="col" className="pr-2 font-medium">Point</th>
            <th scope="col" className="pr-2 font-medium">Wheel travel (mm)</th>
            <th scope="col" className="pr-2 font-medium">Ratio</th>
            <th scope="col"><span className="sr-only">Remove</span></th>
          </tr>
        </thead>
        <tbody>
          {curve.map((p, i) => (
            <tr key={i}>
              <td className="pr-2 tabular-nums">{i + 1}</td>
              <td className="pr-2 py-1">
                <NumInput id={`curve-${i}-y`} label={`Point ${i + 1} wheel travel (mm)`} className="[&>label]:sr-only" value={p.wheelTravelMm} onChange={(v) => set(i, "wheelTravelMm", v)} error={errors[`spec.rear.leverageCurve.${i}.wheelTravelMm`]} />
              </td>
              <td className="pr-2 py-1">
                <NumInput id={`curve-${i}-r`} label={`Point ${i + 1} leverage ratio`} className="[&>label]:sr-only" value={p.ratio} onChange={(v) => set(i, "ratio", v)} error={errors[`spec.rear.leverageCurve.${i}.ratio`]} />
              </td>
              <td>
                <Button variant="ghost" aria-label={`Remove point ${i + 1}`} disabled={curve.length <= 2} onClick={() => onChange(curve.filter((_, j) => j !== i))}>
                  Remove
                </Button>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {listError ? <p className="text-sm font-medium text-red-700">{listError}</p> : null}
      <Button
        variant="secondary"
        className="self-start"
        disabled={curve.length >= 64}
        onClick={() => {
          const last = curve[curve.length - 1];
          onChange([...curve, { wheelTravelMm: (last?.wheelTravelMm ?? 0) + 50, ratio: last?.ratio ?? 2 }]);
        }}
      >
        Add point
      </Button>
    </fieldset>
  );
}
