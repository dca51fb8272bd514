import { requireNumbers } from "./errors";

/**
 * Undamped natural frequency of a mass on a spring, f = (1/2π)·√(k/m) (any vibrations text, e.g.
 * Rao, "Mechanical Vibrations", eq. 2.19). k in N/mm is ×1000 to N/m.
 */
export function naturalFrequencyOf(rateNmm: number, massKg: number): number {
  return Math.sqrt((Math.max(rateNmm, 0) * 1000) / massKg) / (2 * Math.PI);
}

export function naturalFrequencyHz(a: { rateNmm: number; massKg: number }): number {
  requireNumbers(a, { rateNmm: "nonnegative", massKg: "positive" });
  return naturalFrequencyOf(a.rateNmm, a.massKg);
}
