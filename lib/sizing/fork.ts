import { displacementAreaMm2, type LegAirGeometry } from "./air";
import { ATMOSPHERE_MPA } from "./units";
import { firstCrossing, type SagSolution } from "./solve";

/**
 * Coil fork (sizing-model.md): F(s) = n_s·k·(p_f + s) + 2·F_air(s), k per sprung leg, air above
 * the oil in both legs whatever the number of springs.
 */
export interface CoilFork {
  sprungLegs: number;
  travelMm: number;
  air: Omit<LegAirGeometry, "oilLevelMm">;
  /** Displacement area A_d = π/4·D_d², precomputed: the editor evaluates this on every keystroke. */
  ad: number;
}

export function makeCoilFork(sprungLegs: number, travelMm: number, air: Omit<LegAirGeometry, "oilLevelMm">): CoilFork {
  return { sprungLegs, travelMm, air, ad: displacementAreaMm2(air.displacementDiameterMm) };
}

/** Same law as air.ts legAirForce, with plain numbers (no allocation): V₀ = A_free·h + V_cap + A_d·T. */
function legAir(f: CoilFork, oilLevelMm: number, sMm: number, n: number): number {
  const v0 = f.air.freeAreaMm2 * oilLevelMm + f.air.capVolumeMm3 + f.ad * f.air.forkTravelMm;
  const r = v0 / (v0 - f.ad * sMm);
  return ATMOSPHERE_MPA * ((n === 1 ? r : Math.pow(r, n)) - 1) * f.ad;
}

export function forkForce(f: CoilFork, rateNmm: number, preloadMm: number, oilLevelMm: number, sMm: number, n: number): number {
  return f.sprungLegs * rateNmm * (preloadMm + sMm) + 2 * legAir(f, oilLevelMm, sMm, n);
}

/** Preload that puts sag exactly at s: p = (W − 2·F_air(s)) / (n_s·k) − s, isothermal air. */
export function forkPreloadForSag(f: CoilFork, rateNmm: number, oilLevelMm: number, loadN: number, sMm: number): number {
  return (loadN - 2 * legAir(f, oilLevelMm, sMm, 1)) / (f.sprungLegs * rateNmm) - sMm;
}

/**
 * Ideal rate per leg from two sag targets, air force taken out of each load:
 * n_s·k·(s_r − s_s) = (W_fr − 2F_air(s_r)) − (W_fs − 2F_air(s_s)).
 */
export function idealForkSpring(
  f: CoilFork,
  oilLevelMm: number,
  staticLoadN: number,
  raceLoadN: number,
  staticSagMm: number,
  raceSagMm: number,
): { rateNmm: number; preloadMm: number } {
  const netRace = raceLoadN - 2 * legAir(f, oilLevelMm, raceSagMm, 1);
  const netStatic = staticLoadN - 2 * legAir(f, oilLevelMm, staticSagMm, 1);
  const rateNmm = (netRace - netStatic) / (f.sprungLegs * (raceSagMm - staticSagMm));
  return { rateNmm, preloadMm: netRace / (f.sprungLegs * rateNmm) - raceSagMm };
}

export function solveForkSag(f: CoilFork, rateNmm: number, preloadMm: number, oilLevelMm: number, loadN: number): SagSolution {
  return firstCrossing((s) => forkForce(f, rateNmm, preloadMm, oilLevelMm, s, 1), loadN, f.travelMm, []);
}

/** Axial rate dF/ds = n_s·k + 2·dF_air/ds, with dF_air/ds = n·P·A_d²/(V₀ − A_d·s) (from P·Vⁿ = C). */
export function forkRate(f: CoilFork, rateNmm: number, oilLevelMm: number, sMm: number, n: number): number {
  const v0 = f.air.freeAreaMm2 * oilLevelMm + f.air.capVolumeMm3 + f.ad * f.air.forkTravelMm;
  const v = v0 - f.ad * sMm;
  const pAbs = ATMOSPHERE_MPA * Math.pow(v0 / v, n);
  return f.sprungLegs * rateNmm + (2 * n * pAbs * f.ad * f.ad) / v;
}
