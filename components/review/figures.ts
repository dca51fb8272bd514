// The figures a tuner compares: what the engine proposed against what this version says.
import type { Recommendation } from "@/lib/sizing";
import { CLICKER_LABELS } from "@/lib/labels";

export interface Figure {
  key: string;
  label: string;
  unit: string;
  digits: number;
  value: (r: Recommendation) => number | null;
}

export { CLICKER_LABELS } from "@/lib/labels";

export const REAR_FIGURES: Figure[] = [
  { key: "rear.rate", label: "Shock spring rate", unit: "N/mm", digits: 1, value: (r) => r.rear.chosenRate.nMm },
  { key: "rear.rateKgf", label: "Shock spring rate", unit: "kgf/mm", digits: 2, value: (r) => r.rear.chosenRate.kgfMm },
  {
    key: "rear.idealFreq",
    label: "Ideal by ride frequency",
    unit: "N/mm",
    digits: 1,
    value: (r) => r.rear.rateBasis?.rideFrequency?.idealRateNmm ?? null,
  },
  {
    key: "rear.idealWindow",
    label: "Ideal by sag window",
    unit: "N/mm",
    digits: 1,
    value: (r) => r.rear.rateBasis?.sagWindow?.idealRateNmm ?? null,
  },
  { key: "rear.preload", label: "Shock preload", unit: "mm", digits: 1, value: (r) => r.rear.preloadMm },
  { key: "rear.turns", label: "Preload collar", unit: "turns", digits: 1, value: (r) => r.rear.preloadCollarTurns },
  { key: "rear.race", label: "Rear race sag", unit: "mm", digits: 1, value: (r) => r.rear.predicted.raceSagMm },
  { key: "rear.static", label: "Rear static sag", unit: "mm", digits: 1, value: (r) => r.rear.predicted.staticSagMm },
  {
    key: "rear.raceTarget",
    label: "Rear race sag target",
    unit: "mm",
    digits: 0,
    value: (r) => r.rear.sagTargets.raceSagMm,
  },
  {
    key: "rear.bottoming",
    label: "Rear force at full travel",
    unit: "N",
    digits: 0,
    value: (r) => r.rear.bottoming.forceN,
  },
  {
    key: "rear.wheelRate",
    label: "Rear wheel rate at sag",
    unit: "N/mm",
    digits: 1,
    value: (r) => r.rear.wheelRateAtSagNmm,
  },
  { key: "rear.freq", label: "Rear natural frequency", unit: "Hz", digits: 2, value: (r) => r.rear.naturalFrequencyHz },
];

export const FRONT_FIGURES: Figure[] = [
  {
    key: "front.rate",
    label: "Fork spring rate (per spring)",
    unit: "N/mm",
    digits: 2,
    value: (r) => r.front.chosenRate?.nMm ?? null,
  },
  {
    key: "front.rateKgf",
    label: "Fork spring rate (per spring)",
    unit: "kgf/mm",
    digits: 3,
    value: (r) => r.front.chosenRate?.kgfMm ?? null,
  },
  {
    key: "front.idealFreq",
    label: "Ideal by ride frequency (per spring)",
    unit: "N/mm",
    digits: 2,
    value: (r) => r.front.rateBasis?.rideFrequency?.idealRateNmm ?? null,
  },
  {
    key: "front.idealWindow",
    label: "Ideal by sag window (per spring)",
    unit: "N/mm",
    digits: 2,
    value: (r) => r.front.rateBasis?.sagWindow?.idealRateNmm ?? null,
  },
  { key: "front.preload", label: "Fork preload", unit: "mm", digits: 1, value: (r) => r.front.preloadMm },
  { key: "front.oil", label: "Fork oil level (from top)", unit: "mm", digits: 0, value: (r) => r.front.oilLevelMm },
  {
    key: "front.air",
    label: "Fork air pressure",
    unit: "kPa",
    digits: 0,
    value: (r) => r.front.airPressure?.kpaGauge ?? null,
  },
  {
    key: "front.airPsi",
    label: "Fork air pressure",
    unit: "psi",
    digits: 1,
    value: (r) => r.front.airPressure?.psiGauge ?? null,
  },
  { key: "front.race", label: "Fork race sag", unit: "mm", digits: 1, value: (r) => r.front.predicted.raceSagMm },
  { key: "front.static", label: "Fork static sag", unit: "mm", digits: 1, value: (r) => r.front.predicted.staticSagMm },
  {
    key: "front.raceTarget",
    label: "Fork race sag target",
    unit: "mm",
    digits: 0,
    value: (r) => r.front.sagTargets.raceSagMm,
  },
  {
    key: "front.bottoming",
    label: "Fork force at full travel",
    unit: "N",
    digits: 0,
    value: (r) => r.front.bottoming.forceN,
  },
  {
    key: "front.freq",
    label: "Front natural frequency",
    unit: "Hz",
    digits: 2,
    value: (r) => r.front.naturalFrequencyHz,
  },
];

export const BALANCE_FIGURES: Figure[] = [
  { key: "ratio", label: "Front / rear frequency ratio", unit: "", digits: 2, value: (r) => r.frequencyRatio },
];

export function clickerFigures(r: Recommendation): Figure[] {
  return r.clickers.map((c) => ({
    key: `clicker.${c.id}`,
    label: CLICKER_LABELS[c.id],
    unit: `${c.unit} out`,
    digits: c.unit === "turns" ? 2 : 0,
    value: (rec: Recommendation) => rec.clickers.find((x) => x.id === c.id)?.position ?? null,
  }));
}

export function formatFigure(v: number | null, digits: number): string {
  return v === null || !Number.isFinite(v) ? "—" : v.toFixed(digits);
}
