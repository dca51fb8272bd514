import { SizingInputError, requireNumbers } from "./errors";

// Helical compression springs: Shigley's Mechanical Engineering Design, 10th ed., ch. 10.

/** k = G·d⁴ / (8·D³·n_a) (Shigley eq. 10-9). With G in MPa (N/mm²) and mm, k is in N/mm. */
export function springRateFromGeometry(a: {
  wireDiameterMm: number;
  meanCoilDiameterMm: number;
  activeCoils: number;
  shearModulusMpa: number;
}): number {
  requireNumbers(a, {
    wireDiameterMm: "positive",
    meanCoilDiameterMm: "positive",
    activeCoils: "positive",
    shearModulusMpa: "positive",
  });
  if (a.meanCoilDiameterMm <= a.wireDiameterMm)
    throw new SizingInputError([
      { path: "meanCoilDiameterMm", message: "Mean coil diameter must exceed the wire diameter" },
    ]);
  return (a.shearModulusMpa * a.wireDiameterMm ** 4) / (8 * a.meanCoilDiameterMm ** 3 * a.activeCoils);
}

/** Wahl factor K_W = (4C − 1)/(4C − 4) + 0.615/C, C = D/d the spring index (Shigley eq. 10-4). */
export function wahlFactor(springIndex: number): number {
  requireNumbers({ springIndex }, { springIndex: "positive" });
  if (springIndex <= 1) throw new SizingInputError([{ path: "springIndex", message: "Spring index must exceed 1" }]);
  return (4 * springIndex - 1) / (4 * springIndex - 4) + 0.615 / springIndex;
}

/** Corrected shear stress τ = K_W·8·F·D/(π·d³) (Shigley eqs. 10-1, 10-4), MPa. */
export function shearStressMpa(a: { forceN: number; wireDiameterMm: number; meanCoilDiameterMm: number }): number {
  requireNumbers(a, { forceN: "nonnegative", wireDiameterMm: "positive", meanCoilDiameterMm: "positive" });
  const kw = wahlFactor(a.meanCoilDiameterMm / a.wireDiameterMm);
  return (kw * 8 * a.forceN * a.meanCoilDiameterMm) / (Math.PI * a.wireDiameterMm ** 3);
}

/** Squared-and-ground ends: n_a = N_t − 2 (Shigley table 10-1). */
export function activeCoilsSquaredGround(totalCoils: number): number {
  requireNumbers({ totalCoils }, { totalCoils: "positive" });
  if (totalCoils <= 2) throw new SizingInputError([{ path: "totalCoils", message: "Needs more than 2 total coils" }]);
  return totalCoils - 2;
}

/** Two-point load test on a spring tester: k = (F₂ − F₁)/(L₁ − L₂), lengths shortening as force rises. */
export function rateFromLoadTest(a: { lengthsMm: [number, number]; forcesN: [number, number] }): number {
  const [l1, l2] = a.lengthsMm ?? [];
  const [f1, f2] = a.forcesN ?? [];
  requireNumbers(
    { "lengthsMm.0": l1, "lengthsMm.1": l2, "forcesN.0": f1, "forcesN.1": f2 },
    {
      "lengthsMm.0": "positive",
      "lengthsMm.1": "positive",
      "forcesN.0": "nonnegative",
      "forcesN.1": "nonnegative",
    },
  );
  if (l1 === l2) throw new SizingInputError([{ path: "lengthsMm", message: "The two lengths must differ" }]);
  const k = (f2! - f1!) / (l1! - l2!);
  if (!(k > 0)) throw new SizingInputError([{ path: "forcesN", message: "Force must rise as the spring shortens" }]);
  return k;
}

/**
 * Steel volume of a helical spring: wire length π·D·N_t times wire section π·d²/4, so
 * V = π²·d²·D·N_t/4 (N_t total coils, ends included; the small pitch angle is neglected).
 */
export function springSteelVolumeMm3(a: {
  wireDiameterMm: number;
  meanCoilDiameterMm: number;
  totalCoils: number;
}): number {
  requireNumbers(a, { wireDiameterMm: "positive", meanCoilDiameterMm: "positive", totalCoils: "positive" });
  return (Math.PI * Math.PI * a.wireDiameterMm ** 2 * a.meanCoilDiameterMm * a.totalCoils) / 4;
}
