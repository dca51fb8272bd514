// Allowable shear stress of helical compression spring wire, for the workshop's coil check.
//
// Minimum tensile strength of the wire: S_ut = A / d^m (d in mm, S_ut in MPa), with A and m per
// material from Budynas & Nisbett, Shigley's Mechanical Engineering Design, 10th ed., table 10-4
// ("Constants A and m for estimating minimum tensile strength of common spring wires"; the
// constants are those of the ASTM wire specifications named beside each material). Allowable
// torsional stress for static service as a fraction of S_ut, from the same book, table 10-6
// ("Maximum allowable torsional stresses for helical compression springs in static applications"),
// "before set removed" (the stress includes the Wahl or Bergsträsser curvature correction, as
// shearStressMpa does). A spring whose set has been removed allows more; the column used here is
// the cautious one, since a shop cannot tell from a used spring whether it was preset.
// Table values are as printed in the 10th edition (from memory, checked by hand-computed cases in
// tests/unit/spring-steel.test.ts).

export const SPRING_STEELS = {
  "chrome-silicon": {
    label: "Chrome-silicon (ASTM A401)",
    A: 1974,
    m: 0.108,
    diameterMm: [1.6, 9.5],
    allowableFraction: 0.5,
  },
  "chrome-vanadium": {
    label: "Chrome-vanadium (ASTM A231/A232)",
    A: 2005,
    m: 0.168,
    diameterMm: [0.8, 11.1],
    allowableFraction: 0.5,
  },
  "oil-tempered": {
    label: "Oil-tempered carbon steel (ASTM A229)",
    A: 1855,
    m: 0.187,
    diameterMm: [0.5, 12.7],
    allowableFraction: 0.5,
  },
  "music-wire": { label: "Music wire (ASTM A228)", A: 2211, m: 0.145, diameterMm: [0.1, 6.5], allowableFraction: 0.45 },
  "hard-drawn": {
    label: "Hard-drawn carbon steel (ASTM A227)",
    A: 1783,
    m: 0.19,
    diameterMm: [0.7, 12.7],
    allowableFraction: 0.45,
  },
} as const satisfies Record<
  string,
  { label: string; A: number; m: number; diameterMm: readonly [number, number]; allowableFraction: number }
>;

export type SpringSteel = keyof typeof SPRING_STEELS;
export const SPRING_STEEL_IDS = Object.keys(SPRING_STEELS) as SpringSteel[];

/** S_ut = A / d^m (MPa), Shigley 10th ed. eq. 10-14 with table 10-4. */
export function minTensileStrengthMpa(steel: SpringSteel, wireDiameterMm: number): number {
  const { A, m } = SPRING_STEELS[steel];
  return A / wireDiameterMm ** m;
}

export interface StressVerdict {
  steel: SpringSteel;
  minTensileStrengthMpa: number;
  allowableShearMpa: number;
  shearStressMpa: number;
  /** allowable / actual − 1: 0.2 is 20 % in hand, −0.1 is 10 % over. */
  margin: number;
  pass: boolean;
  /** The wire is outside the diameters the table covers: the strength is an extrapolation. */
  outsideTable: boolean;
}

/** Compares the corrected shear stress with the allowable for the wire (tables 10-4 and 10-6). */
export function coilStressVerdict(a: {
  steel: SpringSteel;
  wireDiameterMm: number;
  shearStressMpa: number;
}): StressVerdict {
  const spec = SPRING_STEELS[a.steel];
  const sut = minTensileStrengthMpa(a.steel, a.wireDiameterMm);
  const allowable = spec.allowableFraction * sut;
  const margin = a.shearStressMpa > 0 ? allowable / a.shearStressMpa - 1 : Infinity;
  return {
    steel: a.steel,
    minTensileStrengthMpa: sut,
    allowableShearMpa: allowable,
    shearStressMpa: a.shearStressMpa,
    margin,
    pass: a.shearStressMpa <= allowable,
    outsideTable: a.wireDiameterMm < spec.diameterMm[0] || a.wireDiameterMm > spec.diameterMm[1],
  };
}
