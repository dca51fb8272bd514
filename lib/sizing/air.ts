import { ATMOSPHERE_MPA } from "./units";
import { SizingInputError, requireNumbers } from "./errors";

// Ideal-gas polytropic compression P·Vⁿ = const (any thermodynamics text, e.g. Çengel & Boles,
// "Thermodynamics: An Engineering Approach", ch. 4): n = 1 isothermal (slow: sag), n = γ = 1.4
// adiabatic for air (fast stroke to the bottom). Pressures in N/mm² (MPa) so that P·A is in N.

/** P₁ = P₀·(V₀/V₁)ⁿ, absolute pressures. */
export function polytropicPressure(p0Abs: number, v0: number, v1: number, n: number): number {
  return p0Abs * Math.pow(v0 / v1, n);
}

export interface LegAirGeometry {
  displacementDiameterMm: number;
  freeAreaMm2: number;
  capVolumeMm3: number;
  oilLevelMm: number;
  forkTravelMm: number;
}

/** Air volume above the oil at full compression: V_b = A_free·h + V_cap (h from top of outer tube). */
export function bottomVolumeMm3(g: LegAirGeometry): number {
  return g.freeAreaMm2 * g.oilLevelMm + g.capVolumeMm3;
}

export function displacementAreaMm2(diameterMm: number): number {
  return (Math.PI / 4) * diameterMm * diameterMm;
}

/**
 * One leg's gauge air force (sizing-model.md): V₀ = V_b + A_d·T_f, sealed at atmospheric pressure at
 * top-out; P(s) = P_atm·(V₀/(V₀ − A_d·s))ⁿ; F = (P − P_atm)·A_d.
 */
export function legAirForce(g: LegAirGeometry, travelMm: number, n: number): number {
  const ad = displacementAreaMm2(g.displacementDiameterMm);
  const v0 = bottomVolumeMm3(g) + ad * g.forkTravelMm;
  return (polytropicPressure(ATMOSPHERE_MPA, v0, v0 - ad * travelMm, n) - ATMOSPHERE_MPA) * ad;
}

export function forkAirForceN(a: LegAirGeometry & { travelMm: number; polytropicIndex: number }): number {
  requireNumbers(a, {
    displacementDiameterMm: "positive",
    freeAreaMm2: "positive",
    capVolumeMm3: "nonnegative",
    oilLevelMm: "positive",
    forkTravelMm: "positive",
    travelMm: "nonnegative",
    polytropicIndex: "positive",
  });
  if (a.travelMm > a.forkTravelMm)
    throw new SizingInputError([{ path: "travelMm", message: "Travel cannot exceed fork travel" }]);
  return legAirForce(a, a.travelMm, a.polytropicIndex);
}

/**
 * Air-spring fork, gauge pressure at top-out so that the chamber carries the load at race sag,
 * isothermal (n = 1, Boyle's law): P_abs0 = (W/A + P_atm)·(V₀ − A·s)/V₀. Returned in kPa gauge.
 */
export function airForkPressureKpaGauge(a: {
  pistonAreaMm2: number;
  chamberVolumeMm3: number;
  loadN: number;
  sagMm: number;
}): number {
  requireNumbers(a, { pistonAreaMm2: "positive", chamberVolumeMm3: "positive", loadN: "positive", sagMm: "nonnegative" });
  if (a.pistonAreaMm2 * a.sagMm >= a.chamberVolumeMm3)
    throw new SizingInputError([{ path: "sagMm", message: "Sag sweeps the whole air chamber volume" }]);
  return airAbsMpaForSag(a.pistonAreaMm2, a.chamberVolumeMm3, a.loadN, a.sagMm) * 1000 - ATMOSPHERE_MPA * 1000;
}

export function airAbsMpaForSag(areaMm2: number, volumeMm3: number, loadN: number, sagMm: number): number {
  return ((loadN / areaMm2 + ATMOSPHERE_MPA) * (volumeMm3 - areaMm2 * sagMm)) / volumeMm3;
}

/** Gauge force of an air-spring chamber charged to p0Abs (MPa) at top-out, after s mm. */
export function airChamberForce(areaMm2: number, volumeMm3: number, p0AbsMpa: number, sMm: number, n: number): number {
  return (polytropicPressure(p0AbsMpa, volumeMm3, volumeMm3 - areaMm2 * sMm, n) - ATMOSPHERE_MPA) * areaMm2;
}
