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
  /** Steel of the spring fitted in this leg (the oil level is set with the spring out). Default 0. */
  springVolumeMm3?: number;
}

/** Air volume above the oil at full compression: V_b = A_free·h + V_cap − V_spring (h from top of outer tube). */
export function bottomVolumeMm3(g: LegAirGeometry): number {
  return g.freeAreaMm2 * g.oilLevelMm + g.capVolumeMm3 - (g.springVolumeMm3 ?? 0);
}

export function displacementAreaMm2(diameterMm: number): number {
  return (Math.PI / 4) * diameterMm * diameterMm;
}

/**
 * One leg's gauge air force (lib/sizing/README.md): V₀ = V_b + A_d·T_f, sealed at atmospheric pressure at
 * top-out; P(s) = P_atm·(V₀/(V₀ − A_d·s))ⁿ; F = (P − P_atm)·A_d.
 */
export function legAirForce(g: LegAirGeometry, travelMm: number, n: number): number {
  const ad = displacementAreaMm2(g.displacementDiameterMm);
  const v0 = bottomVolumeMm3(g) + ad * g.forkTravelMm;
  return (polytropicPressure(ATMOSPHERE_MPA, v0, v0 - ad * travelMm, n) - ATMOSPHERE_MPA) * ad;
}

export function forkAirForceN(a: LegAirGeometry & { travelMm: number; polytropicIndex: number }): number {
  if (a.springVolumeMm3 !== undefined) requireNumbers(a, { springVolumeMm3: "nonnegative" });
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
  if (!(bottomVolumeMm3(a) > 0))
    throw new SizingInputError([
      { path: "springVolumeMm3", message: "The spring leaves no air above the oil at full compression" },
    ]);
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
  /** With a negative chamber (volume at top-out, equalising at equalizeAtMm); without, the piston's
   *  underside is at atmospheric pressure. */
  negativeChamberVolumeMm3?: number;
  equalizeAtMm?: number;
}): number {
  requireNumbers(a, {
    pistonAreaMm2: "positive",
    chamberVolumeMm3: "positive",
    loadN: "positive",
    sagMm: "nonnegative",
  });
  if (a.pistonAreaMm2 * a.sagMm >= a.chamberVolumeMm3)
    throw new SizingInputError([{ path: "sagMm", message: "Sag sweeps the whole air chamber volume" }]);
  if (a.negativeChamberVolumeMm3 === undefined)
    return airAbsMpaForSag(a.pistonAreaMm2, a.chamberVolumeMm3, a.loadN, a.sagMm) * 1000 - ATMOSPHERE_MPA * 1000;
  requireNumbers(a, { negativeChamberVolumeMm3: "positive", equalizeAtMm: "nonnegative" });
  const spring: AirSpring = {
    areaMm2: a.pistonAreaMm2,
    positiveVolumeMm3: a.chamberVolumeMm3,
    negativeVolumeMm3: a.negativeChamberVolumeMm3,
    equalizeAtMm: a.equalizeAtMm ?? 0,
  };
  if (!(a.sagMm > spring.equalizeAtMm))
    throw new SizingInputError([
      { path: "sagMm", message: "Sag must lie beyond the position where the chambers equalise" },
    ]);
  return (airSpringChargeForLoad(spring, a.loadN, a.sagMm) - ATMOSPHERE_MPA) * 1000;
}

export function airAbsMpaForSag(areaMm2: number, volumeMm3: number, loadN: number, sagMm: number): number {
  return ((loadN / areaMm2 + ATMOSPHERE_MPA) * (volumeMm3 - areaMm2 * sagMm)) / volumeMm3;
}

/** Gauge force of an air-spring chamber charged to p0Abs (MPa) at top-out, after s mm. */
export function airChamberForce(areaMm2: number, volumeMm3: number, p0AbsMpa: number, sMm: number, n: number): number {
  return (polytropicPressure(p0AbsMpa, volumeMm3, volumeMm3 - areaMm2 * sMm, n) - ATMOSPHERE_MPA) * areaMm2;
}

/**
 * An air-spring fork's main piston between two chambers. The rider charges the positive chamber to
 * p0 (absolute) at top-out; at equalizeAtMm a transfer port joins it to the negative chamber, so both
 * hold P_eq = p0·V_p/(V_p − A·s_eq) there (Boyle's law). Beyond it each chamber compresses or expands
 * on its own: P_pos = P_eq·((V_p − A·s_eq)/(V_p − A·s))ⁿ, P_neg = P_eq·((V_n + A·s_eq)/(V_n + A·s))ⁿ,
 * and the net force is F = (P_pos − P_neg)·A — zero at s_eq, negative before it (the negative chamber
 * pulls the fork into its travel). negativeVolumeMm3 null: the underside is at atmospheric pressure.
 */
export interface AirSpring {
  areaMm2: number;
  /** Positive chamber volume at top-out. */
  positiveVolumeMm3: number;
  negativeVolumeMm3: number | null;
  equalizeAtMm: number;
}

function equalised(a: AirSpring, p0AbsMpa: number): number {
  return (p0AbsMpa * a.positiveVolumeMm3) / (a.positiveVolumeMm3 - a.areaMm2 * a.equalizeAtMm);
}

/** Absolute pressure in the positive chamber after s mm. */
export function airSpringPositivePressure(a: AirSpring, p0AbsMpa: number, sMm: number, n: number): number {
  if (a.negativeVolumeMm3 === null)
    return polytropicPressure(p0AbsMpa, a.positiveVolumeMm3, a.positiveVolumeMm3 - a.areaMm2 * sMm, n);
  const vEq = a.positiveVolumeMm3 - a.areaMm2 * a.equalizeAtMm;
  return polytropicPressure(equalised(a, p0AbsMpa), vEq, a.positiveVolumeMm3 - a.areaMm2 * sMm, n);
}

/** Net force of the air spring after s mm, N. */
export function airSpringForce(a: AirSpring, p0AbsMpa: number, sMm: number, n: number): number {
  const pos = airSpringPositivePressure(a, p0AbsMpa, sMm, n);
  if (a.negativeVolumeMm3 === null) return (pos - ATMOSPHERE_MPA) * a.areaMm2;
  const vnEq = a.negativeVolumeMm3 + a.areaMm2 * a.equalizeAtMm;
  const neg = polytropicPressure(equalised(a, p0AbsMpa), vnEq, a.negativeVolumeMm3 + a.areaMm2 * sMm, n);
  return (pos - neg) * a.areaMm2;
}

/** dF/ds: from P·Vⁿ = C, dP/ds = n·P·A/V for the shrinking chamber and −n·P·A/V for the growing one. */
export function airSpringRate(a: AirSpring, p0AbsMpa: number, sMm: number, n: number): number {
  const A = a.areaMm2;
  const rate = (n * airSpringPositivePressure(a, p0AbsMpa, sMm, n) * A * A) / (a.positiveVolumeMm3 - A * sMm);
  if (a.negativeVolumeMm3 === null) return rate;
  const vn = a.negativeVolumeMm3 + A * sMm;
  const neg = polytropicPressure(equalised(a, p0AbsMpa), a.negativeVolumeMm3 + A * a.equalizeAtMm, vn, n);
  return rate + (n * neg * A * A) / vn;
}

/**
 * The top-out charge (absolute, MPa) that carries loadN at sMm, isothermal. The force is linear in the
 * charge (both chambers scale with it; the atmospheric term only without a negative chamber), so it is
 * exact: p0 = W / F₁(s) with F₁ the net force per MPa of charge.
 */
export function airSpringChargeForLoad(a: AirSpring, loadN: number, sMm: number): number {
  if (a.negativeVolumeMm3 === null) return airAbsMpaForSag(a.areaMm2, a.positiveVolumeMm3, loadN, sMm);
  return loadN / airSpringForce(a, 1, sMm, 1);
}
