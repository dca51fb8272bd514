"use client";

// Live check and charts of the leverage curve being edited: the shock travel the curve gives over the
// wheel travel (the engine's shockTravelAtMm) against the stroke, and the wheel force for a reference
// spring (rearWheelForceN: spring force divided by the leverage ratio, by virtual work).
import { forceChartGeometry } from "@/lib/charts/force-curve";
import { rearWheelForceN, shockTravelAtMm, type LeveragePoint } from "@/lib/sizing";
import { STROKE_TOLERANCE_FRACTION, STROKE_TOLERANCE_MIN_MM } from "@/lib/validations/bike";
import { LineChart } from "@/components/charts/line-chart";

interface Props {
  curve: LeveragePoint[];
  wheelTravelMm?: number;
  shockStrokeMm?: number;
  rateNmm?: number;
  preloadMm?: number;
}

function safe<T>(fn: () => T): T | null {
  try {
    return fn();
  } catch {
    return null;
  }
}

export function LeveragePreview({ curve, wheelTravelMm, shockStrokeMm, rateNmm, preloadMm = 0 }: Props) {
  const travel = wheelTravelMm && wheelTravelMm > 0 ? wheelTravelMm : null;
  const clean = curve.filter((p) => Number.isFinite(p.wheelTravelMm) && Number.isFinite(p.ratio));
  const stroke = travel ? safe(() => shockTravelAtMm(clean, travel)) : null;
  const tol = shockStrokeMm ? Math.max(STROKE_TOLERANCE_MIN_MM, STROKE_TOLERANCE_FRACTION * shockStrokeMm) : null;
  const fits =
    stroke !== null && shockStrokeMm !== undefined && tol !== null && Math.abs(stroke - shockStrokeMm) <= tol;
  const last = clean[clean.length - 1]?.wheelTravelMm ?? 0;
  const ys = Array.from({ length: 31 }, (_, i) => (last * i) / 30);
  const force =
    rateNmm && rateNmm > 0
      ? safe(() =>
          ys.map((y) => ({ x: y, y: rearWheelForceN({ curve: clean, rateNmm, preloadMm, wheelTravelMm: y }) })),
        )
      : null;

  const ratioChart =
    clean.length >= 2
      ? forceChartGeometry({
          series: [
            {
              id: "ratio",
              label: "Leverage ratio",
              emphasis: "main",
              points: clean.map((p) => ({ x: p.wheelTravelMm, y: p.ratio })),
            },
          ],
          xLabel: "Wheel travel (mm)",
          yLabel: "Leverage ratio",
          width: 420,
          height: 220,
        })
      : null;
  const forceChart = force
    ? forceChartGeometry({
        series: [{ id: "force", label: "Wheel force", emphasis: "main", points: force }],
        xLabel: "Wheel travel (mm)",
        yLabel: "Wheel force (N)",
        width: 420,
        height: 220,
      })
    : null;

  return (
    <div className="flex flex-col gap-3">
      <p
        role="status"
        className={`rounded-lg p-3 text-sm ${stroke === null ? "bg-stone-100 text-stone-700" : fits ? "bg-pine-50 text-pine-900" : "bg-red-50 text-red-900"}`}
      >
        {stroke === null
          ? "Enter at least two points, from 0 mm to the full wheel travel, to check the curve against the stroke."
          : `${fits ? "Curve matches the stroke" : "Curve does not match the stroke"}: it gives ${stroke.toFixed(1)} mm of shock travel over ${travel} mm of wheel travel; stroke ${shockStrokeMm ?? "?"} mm, tolerance ±${tol?.toFixed(1) ?? "?"} mm (1.5 % of the stroke, at least 1 mm).`}
      </p>
      <div className="grid grid-cols-1 gap-3 lg:grid-cols-2">
        {ratioChart ? (
          <LineChart
            geometry={ratioChart}
            title="Leverage ratio"
            description="Wheel travel per shock travel at each point of the wheel travel; falling means progressive."
          />
        ) : null}
        {forceChart ? (
          <LineChart
            geometry={forceChart}
            title="Wheel force, stock shock spring"
            description={`Stock spring ${rateNmm} N/mm with ${preloadMm} mm preload: spring force divided by the leverage ratio.`}
          />
        ) : null}
      </div>
    </div>
  );
}
