// The two charts of a recommendation (shock at the rear wheel, fork), as chart specs.
import type { Recommendation } from "@/lib/sizing";
import type { ChartSpec } from "./force-curve";

export function rearForceChart(rec: Recommendation): ChartSpec {
  return {
    series: [
      {
        id: "rear",
        label: `${rec.rear.chosenRate.nMm.toFixed(1)} N/mm, ${rec.rear.preloadMm.toFixed(1)} mm preload`,
        emphasis: "main",
        points: rec.rear.forceCurve.map((p) => ({ x: p.wheelTravelMm, y: p.wheelForceN })),
      },
    ],
    markers: [
      { label: "static sag", x: rec.rear.predicted.staticSagMm },
      { label: "race sag", x: rec.rear.predicted.raceSagMm },
    ],
    xLabel: "Rear wheel travel (mm)",
    yLabel: "Wheel force (N)",
  };
}

export function forkForceChart(rec: Recommendation): ChartSpec {
  const main = rec.front.oilLevelMm;
  const neighbours = rec.front.oilLevelCurves.filter((c) => c.oilLevelMm !== main);
  return {
    series: [
      {
        id: "fork",
        label: rec.front.kind === "air" ? "Air spring" : `Oil level ${main ?? "–"} mm`,
        emphasis: "main",
        points: rec.front.forceCurve.map((p) => ({ x: p.forkTravelMm, y: p.forceN })),
      },
      ...neighbours.map((c) => ({
        id: `oil-${c.oilLevelMm}`,
        label: `Oil level ${c.oilLevelMm} mm`,
        emphasis: "secondary" as const,
        points: c.points.map((p) => ({ x: p.forkTravelMm, y: p.forceN })),
      })),
    ],
    markers: [
      { label: "static sag", x: rec.front.predicted.staticSagMm },
      { label: "race sag", x: rec.front.predicted.raceSagMm },
    ],
    xLabel: "Fork travel (mm)",
    yLabel: "Fork force (N)",
  };
}
