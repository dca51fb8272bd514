import type { BikeSpec } from "./bike-schema";
import { STANDARD_GRAVITY as g } from "./units";

export interface Loads {
  /** Vertical at the rear axle, sprung part only (N). */
  rearStaticN: number;
  rearRaceN: number;
  /** Along the fork axis (N). */
  frontStaticN: number;
  frontRaceN: number;
  cosRake: number;
  riderRearShare: number;
}

/**
 * Static axle loads (lib/sizing/README.md, "Model"), from the bike's weight split and the rider's share:
 * W_rs = (m_b(1−φ_b) − m_ur)·g;  W_rr = W_rs + m_r·φ_rr·g;
 * W_fs = (m_b·φ_b − m_uf)·g·cos θ;  W_fr = W_fs + m_r(1−φ_rr)·g·cos θ.
 * The fork carries only the component of the front load along its axis, hence cos θ (rake).
 */
export function computeLoads(bike: BikeSpec, riderMassKg: number, riderRearShareTarget: number): Loads {
  const cosRake = Math.cos((bike.rakeDeg * Math.PI) / 180);
  // A calibration fitted from the shop's own sag reports (calibration.ts) replaces the weight split.
  const cal = bike.calibration;
  const riderRearShare = cal?.riderRearShare ?? riderRearShareTarget;
  const rearStaticN = cal ? cal.rearSprungKg * g : (bike.massKg * (1 - bike.frontFraction) - bike.unsprungRearKg) * g;
  const frontStaticN = cal
    ? cal.frontSprungKg * g * cosRake
    : (bike.massKg * bike.frontFraction - bike.unsprungFrontKg) * g * cosRake;
  return {
    rearStaticN,
    rearRaceN: rearStaticN + riderMassKg * riderRearShare * g,
    frontStaticN,
    frontRaceN: frontStaticN + riderMassKg * (1 - riderRearShare) * g * cosRake,
    cosRake,
    riderRearShare,
  };
}
