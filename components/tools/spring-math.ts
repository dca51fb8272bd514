// The workshop tools' arithmetic, on top of the engine's spring functions (lib/sizing). Pure.
import {
  coilStressVerdict,
  type SpringSteel,
  type StressVerdict,
  KGF_N,
  LBF_N,
  rateFromLoadTest,
  rateTriple,
  shearStressMpa,
  springRateFromGeometry,
  wahlFactor,
} from "@/lib/sizing";
import { activeCoils, type EndType } from "@/lib/validations/tools";

export interface CoilReport {
  meanDiameterMm: number;
  springIndex: number;
  activeCoils: number;
  rate: ReturnType<typeof rateTriple>;
  wahlFactor: number;
  shearStressMpa: number;
  /** Against the wire's allowable stress; null without a load to check. */
  verdict: StressVerdict | null;
}

/** Rate, index, Wahl factor and corrected shear stress of a helical compression spring (Shigley ch. 10). */
export function coilReport(g: {
  wireDiameterMm: number;
  outerDiameterMm: number;
  totalCoils: number;
  endType: EndType;
  shearModulusMpa: number;
  loadN: number;
  steel?: SpringSteel;
}): CoilReport {
  const D = g.outerDiameterMm - g.wireDiameterMm; // mean diameter = OD − d
  const na = activeCoils(g.totalCoils, g.endType); // Shigley table 10-1
  const k = springRateFromGeometry({
    wireDiameterMm: g.wireDiameterMm,
    meanCoilDiameterMm: D,
    activeCoils: na,
    shearModulusMpa: g.shearModulusMpa,
  });
  const C = D / g.wireDiameterMm;
  const tau = shearStressMpa({ forceN: g.loadN, wireDiameterMm: g.wireDiameterMm, meanCoilDiameterMm: D });
  return {
    meanDiameterMm: D,
    springIndex: C,
    activeCoils: na,
    rate: rateTriple(k),
    wahlFactor: wahlFactor(C),
    shearStressMpa: tau,
    verdict:
      g.loadN > 0
        ? coilStressVerdict({
            steel: g.steel ?? "chrome-silicon",
            wireDiameterMm: g.wireDiameterMm,
            shearStressMpa: tau,
          })
        : null,
  };
}

export const FORCE_N: Record<"N" | "kgf" | "lbf", number> = { N: 1, kgf: KGF_N, lbf: LBF_N };

/** Rate from two points of a load test, forces in any unit: k = (F₂ − F₁)/(L₁ − L₂). */
export function loadTestRate(t: {
  length1Mm: number;
  force1: number;
  length2Mm: number;
  force2: number;
  forceUnit: "N" | "kgf" | "lbf";
}) {
  const f = FORCE_N[t.forceUnit];
  return rateTriple(rateFromLoadTest({ lengthsMm: [t.length1Mm, t.length2Mm], forcesN: [t.force1 * f, t.force2 * f] }));
}
