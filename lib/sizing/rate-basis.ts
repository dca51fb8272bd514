import type { Linkage } from "./linkage";
import { leverageAt, leverageSlopeAt, preloadForSag, wheelRateAt } from "./linkage";
import { forkRate, type CoilFork } from "./fork";
import { naturalFrequencyOf } from "./frequency";
import { solveIncreasing } from "./solve";
import { STANDARD_GRAVITY } from "./units";

// Rate basis "ride frequency" (lib/sizing/README.md): the maker chose the stock spring for the
// catalog's reference rider; the natural frequency f = (1/2π)·√(k_wheel/m) that it gives at race sag
// is matched for the rider in hand, times the shop's factors. Because the bike's own sprung mass is in
// m, the rate grows with rider weight more slowly than the load does, as spring charts do.

export interface FrequencyMatch {
  referenceFrequencyHz: number;
  /** f_ref·√factor: the factor scales the wheel rate the rider feels. */
  targetFrequencyHz: number;
  /** Rate (per sprung leg at the front) that gives the target at race sag; null when none can. */
  rateNmm: number | null;
}

/** Rear end's frequency at race sag y_r with rate k and the preload that puts race sag there. */
export function rearFrequencyAt(L: Linkage, rateNmm: number, raceLoadN: number, raceSagMm: number): number {
  const p = preloadForSag(L, rateNmm, raceLoadN, raceSagMm);
  return naturalFrequencyOf(wheelRateAt(L, rateNmm, p, raceSagMm), raceLoadN / STANDARD_GRAVITY);
}

/**
 * At race sag the spring force is W·LR, so the wheel rate k(1 − (p + x)·LR′)/LR² becomes
 * k/LR² − W·LR′/LR. Setting it to m·ω² (ω = 2πf, m = W/g, N/mm = kg·s⁻²/1000) gives
 * k = LR²·m·ω²/1000 + W·LR·LR′ — with a constant ratio the familiar k = LR²·m·ω².
 */
export function matchRearFrequency(
  L: Linkage,
  stockRateNmm: number,
  referenceRaceLoadN: number,
  raceLoadN: number,
  raceSagMm: number,
  rateFactor: number,
): FrequencyMatch {
  const referenceFrequencyHz = rearFrequencyAt(L, stockRateNmm, referenceRaceLoadN, raceSagMm);
  const targetFrequencyHz = referenceFrequencyHz * Math.sqrt(rateFactor);
  const omega = 2 * Math.PI * targetFrequencyHz;
  const lr = leverageAt(L, raceSagMm);
  const k =
    (lr * lr * (raceLoadN / STANDARD_GRAVITY) * omega * omega) / 1000 + raceLoadN * lr * leverageSlopeAt(L, raceSagMm);
  return { referenceFrequencyHz, targetFrequencyHz, rateNmm: k > 0 ? k : null };
}

/** Fork's frequency at race sag: axial rate over cos²θ (the axle moves along the fork), m = W/(g·cos θ). */
export function forkFrequencyAt(
  fk: CoilFork,
  rateNmm: number,
  oilLevelMm: number,
  raceLoadN: number,
  raceSagMm: number,
  cosRake: number,
): number {
  const wheelRate = forkRate(fk, rateNmm, oilLevelMm, raceSagMm, 1) / (cosRake * cosRake);
  return naturalFrequencyOf(wheelRate, raceLoadN / (STANDARD_GRAVITY * cosRake));
}

/** The fork's air rate depends a little on k (the spring's steel), so k is found numerically. */
export function matchForkFrequency(
  fk: CoilFork,
  oilLevelMm: number,
  stockRateNmm: number,
  referenceRaceLoadN: number,
  raceLoadN: number,
  raceSagMm: number,
  cosRake: number,
  rateFactor: number,
): FrequencyMatch {
  const referenceFrequencyHz = forkFrequencyAt(fk, stockRateNmm, oilLevelMm, referenceRaceLoadN, raceSagMm, cosRake);
  const targetFrequencyHz = referenceFrequencyHz * Math.sqrt(rateFactor);
  const rateNmm = solveIncreasing(
    (k) => forkFrequencyAt(fk, k, oilLevelMm, raceLoadN, raceSagMm, cosRake),
    targetFrequencyHz,
    0.5,
    20,
  );
  return { referenceFrequencyHz, targetFrequencyHz, rateNmm: rateNmm !== null && rateNmm > 0 ? rateNmm : null };
}
