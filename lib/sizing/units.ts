import convert from "convert-units";
import type { RateUnit } from "./vocab";
import { SizingInputError } from "./errors";

// Exact factors, NIST SP 811 (2008), Appendix B. convert-units is not used for rates: its inch is
// 25.3999992 mm and it has no force unit.
export const STANDARD_GRAVITY = 9.80665; // m/s², exact by definition (CGPM 1901)
export const KGF_N = 9.80665; // 1 kgf = 9.80665 N exactly
export const LBF_N = 4.4482216152605; // 1 lbf = 4.4482216152605 N exactly
export const INCH_MM = 25.4; // 1 in = 25.4 mm exactly
export const POUND_KG = 0.45359237; // 1 lb = 0.45359237 kg exactly
/** Standard atmosphere, 101.325 kPa exactly (NIST SP 811 B.8); absolute. */
export const ATMOSPHERE_KPA = 101.325;
/** Same, in N/mm² (MPa), the unit that pairs with mm and N. */
export const ATMOSPHERE_MPA = ATMOSPHERE_KPA / 1000;
/** 1 psi = 1 lbf/in² = 4.4482216152605 N / 645.16 mm² = 6.894757293168361 kPa. */
export const PSI_KPA = (LBF_N / (INCH_MM * INCH_MM)) * 1000;

const N_MM_PER: Record<RateUnit, number> = {
  "N/mm": 1,
  "kgf/mm": KGF_N,
  "lbf/in": LBF_N / INCH_MM,
};

/** Convert a spring rate between N/mm, kgf/mm and lbf/in with the exact factors above. */
export function convertRate(value: number, from: RateUnit, to: RateUnit): number {
  if (!Number.isFinite(value)) throw new SizingInputError([{ path: "value", message: "Rate must be a finite number" }]);
  const f = N_MM_PER[from];
  const t = N_MM_PER[to];
  if (f === undefined) throw new SizingInputError([{ path: "from", message: `Unknown rate unit "${String(from)}"` }]);
  if (t === undefined) throw new SizingInputError([{ path: "to", message: `Unknown rate unit "${String(to)}"` }]);
  return (value * f) / t;
}

export interface RateTriple {
  nMm: number;
  kgfMm: number;
  lbfIn: number;
}

export function rateTriple(rateNmm: number): RateTriple {
  return { nMm: rateNmm, kgfMm: rateNmm / KGF_N, lbfIn: rateNmm / N_MM_PER["lbf/in"] };
}

export interface PressureTriple {
  kpaGauge: number;
  barGauge: number;
  psiGauge: number;
}

/** kPa to bar via convert-units (factor 100, exact); psi from the exact lbf and inch. */
export function pressureTriple(kpaGauge: number): PressureTriple {
  return { kpaGauge, barGauge: convert(kpaGauge).from("kPa").to("bar"), psiGauge: kpaGauge / PSI_KPA };
}

export const poundsToKg = (lb: number): number => lb * POUND_KG;
export const kgToPounds = (kg: number): number => kg / POUND_KG;
