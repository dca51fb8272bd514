import { displacementAreaMm2, type LegAirGeometry } from "./air";
import { ATMOSPHERE_MPA } from "./units";
import { firstCrossing, type SagSolution } from "./solve";
import { springSteelVolumeMm3 } from "./spring-geometry";
import { SPRING_STEEL_SHEAR_MODULUS_MPA, TYPICAL_FORK_SPRING } from "./defaults";

/**
 * Coil fork (lib/sizing/README.md, "Fork"): F(s) = n_s·k·(p_f + s) + ΣF_air(s), k per sprung leg, air
 * above the oil in both legs whatever the number of springs. The fitted spring's steel takes volume
 * from the air in its leg, and a stiffer spring has more steel, so the air force depends a little on k.
 */
export interface CoilFork {
  sprungLegs: number;
  travelMm: number;
  air: Omit<LegAirGeometry, "oilLevelMm" | "springVolumeMm3">;
  /** Displacement area A_d = π/4·D_d², precomputed: the editor evaluates this on every keystroke. */
  ad: number;
  /** Steel volume of one spring of rate k (N/mm): c·√k, see forkSpringVolumeScale. */
  springVolumeScale: number;
}

export interface SpringGeometry {
  wireDiameterMm: number;
  meanCoilDiameterMm: number;
  totalCoils: number;
}

/**
 * c in V_spring(k) = c·√k. Same coil diameter D and coil count, another rate: the wire follows
 * k = G·d⁴/(8·D³·n_a) (Shigley eq. 10-9), so d ∝ k^¼ and the steel volume π²d²DN_t/4 ∝ √k.
 * From the catalog's stock spring when given, else a typical fork spring (defaults).
 */
export function forkSpringVolumeScale(
  displacementDiameterMm: number,
  stock?: { geometry: SpringGeometry; rateNmm: number },
): number {
  if (stock) return springSteelVolumeMm3(stock.geometry) / Math.sqrt(stock.rateNmm);
  const D = TYPICAL_FORK_SPRING.meanDiameterOfDisplacement * displacementDiameterMm;
  const na = TYPICAL_FORK_SPRING.activeCoils;
  // d² = √(8·D³·n_a·k/G): the √k is left out to give the scale.
  const d2PerRootK = Math.sqrt((8 * D ** 3 * na) / SPRING_STEEL_SHEAR_MODULUS_MPA);
  return (Math.PI * Math.PI * d2PerRootK * D * (na + TYPICAL_FORK_SPRING.endCoils)) / 4;
}

export function makeCoilFork(
  sprungLegs: number,
  travelMm: number,
  air: Omit<LegAirGeometry, "oilLevelMm" | "springVolumeMm3">,
  springVolumeScale = 0,
): CoilFork {
  return { sprungLegs, travelMm, air, ad: displacementAreaMm2(air.displacementDiameterMm), springVolumeScale };
}

export function springVolumeMm3(f: CoilFork, rateNmm: number): number {
  return f.springVolumeScale * Math.sqrt(Math.max(rateNmm, 0));
}

/** Air volume above the oil of one leg at full compression. */
export function legBottomVolume(f: CoilFork, oilLevelMm: number, springMm3: number): number {
  return f.air.freeAreaMm2 * oilLevelMm + f.air.capVolumeMm3 - springMm3;
}

/** Same law as air.ts legAirForce, with plain numbers (no allocation): V₀ = V_b + A_d·T. */
function legAir(f: CoilFork, oilLevelMm: number, springMm3: number, sMm: number, n: number): number {
  const v0 = legBottomVolume(f, oilLevelMm, springMm3) + f.ad * f.air.forkTravelMm;
  const r = v0 / (v0 - f.ad * sMm);
  return ATMOSPHERE_MPA * ((n === 1 ? r : Math.pow(r, n)) - 1) * f.ad;
}

/** Air force of both legs: sprung legs hold a spring's steel, the others none. */
export function forkAirForce(f: CoilFork, rateNmm: number, oilLevelMm: number, sMm: number, n: number): number {
  const sprung = f.sprungLegs > 0 ? legAir(f, oilLevelMm, springVolumeMm3(f, rateNmm), sMm, n) : 0;
  const bare = f.sprungLegs < 2 ? legAir(f, oilLevelMm, 0, sMm, n) : 0;
  return f.sprungLegs * sprung + (2 - f.sprungLegs) * bare;
}

/** Absolute air pressure at full travel in the leg with the least air (a spring in it), MPa. */
export function forkBottomPressureMpa(f: CoilFork, rateNmm: number, oilLevelMm: number, n: number): number {
  const vb = legBottomVolume(f, oilLevelMm, springVolumeMm3(f, rateNmm));
  return ATMOSPHERE_MPA * Math.pow((vb + f.ad * f.air.forkTravelMm) / vb, n);
}

export function forkForce(
  f: CoilFork,
  rateNmm: number,
  preloadMm: number,
  oilLevelMm: number,
  sMm: number,
  n: number,
): number {
  return f.sprungLegs * rateNmm * (preloadMm + sMm) + forkAirForce(f, rateNmm, oilLevelMm, sMm, n);
}

/** Preload that puts sag exactly at s: p = (W − ΣF_air(s)) / (n_s·k) − s, isothermal air. */
export function forkPreloadForSag(
  f: CoilFork,
  rateNmm: number,
  oilLevelMm: number,
  loadN: number,
  sMm: number,
): number {
  return (loadN - forkAirForce(f, rateNmm, oilLevelMm, sMm, 1)) / (f.sprungLegs * rateNmm) - sMm;
}

/**
 * Ideal rate per leg from two sag targets, air force taken out of each load:
 * n_s·k·(s_r − s_s) = (W_fr − ΣF_air(s_r)) − (W_fs − ΣF_air(s_s)). The air depends weakly on k through
 * the spring's steel (∝ √k), so a few fixed-point steps settle it (each changes k by well under 1 %).
 */
export function idealForkSpring(
  f: CoilFork,
  oilLevelMm: number,
  staticLoadN: number,
  raceLoadN: number,
  staticSagMm: number,
  raceSagMm: number,
): { rateNmm: number; preloadMm: number } {
  let k = 0;
  for (let i = 0; i < 6; i++) {
    const netRace = raceLoadN - forkAirForce(f, k, oilLevelMm, raceSagMm, 1);
    const netStatic = staticLoadN - forkAirForce(f, k, oilLevelMm, staticSagMm, 1);
    const next = (netRace - netStatic) / (f.sprungLegs * (raceSagMm - staticSagMm));
    if (!(next > 0) || Math.abs(next - k) <= 1e-12 * Math.abs(next)) {
      k = next;
      break;
    }
    k = next;
  }
  return { rateNmm: k, preloadMm: forkPreloadForSag(f, k, oilLevelMm, raceLoadN, raceSagMm) };
}

export function solveForkSag(
  f: CoilFork,
  rateNmm: number,
  preloadMm: number,
  oilLevelMm: number,
  loadN: number,
): SagSolution {
  return firstCrossing((s) => forkForce(f, rateNmm, preloadMm, oilLevelMm, s, 1), loadN, f.travelMm, []);
}

/** Axial rate dF/ds = n_s·k + Σ dF_air/ds, with dF_air/ds = n·P·A_d²/(V₀ − A_d·s) (from P·Vⁿ = C). */
export function forkRate(f: CoilFork, rateNmm: number, oilLevelMm: number, sMm: number, n: number): number {
  const vs = springVolumeMm3(f, rateNmm);
  const legRate = (spring: number) => {
    const v0 = legBottomVolume(f, oilLevelMm, spring) + f.ad * f.air.forkTravelMm;
    const v = v0 - f.ad * sMm;
    return (n * ATMOSPHERE_MPA * Math.pow(v0 / v, n) * f.ad * f.ad) / v;
  };
  const air =
    (f.sprungLegs > 0 ? f.sprungLegs * legRate(vs) : 0) + (f.sprungLegs < 2 ? (2 - f.sprungLegs) * legRate(0) : 0);
  return f.sprungLegs * rateNmm + air;
}
