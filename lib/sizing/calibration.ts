import { z } from "zod";
import type { BikeSpec } from "./bike-schema";
import { bikeSpecSchema, calibrationParametersSchema, type CalibrationParameters } from "./bike-schema";
import { prepareLinkage, solveSag, wheelForceAt } from "./linkage";
import { forkForce, solveForkSag } from "./fork";
import { airSpringForce } from "./air";
import { firstCrossing } from "./solve";
import { airSpringOf, coilForkOf } from "./front";
import { computeLoads } from "./loads";
import { ATMOSPHERE_MPA, STANDARD_GRAVITY as g } from "./units";
import { DEFAULT_RIDER_REAR_SHARE } from "./defaults";
import { parseOrThrow } from "./evaluate";

// Calibration from the shop's own sag reports (lib/sizing/README.md, "Calibration from sag reports").
// Each report is a measurement on a known spring and preload: the force law turns each measured sag
// into the load that end really carried. With M_r, M_f the sprung masses on each end (bike alone) and
// φ the rider's rear share, every load is linear in (M_r, M_f, φ):
//   rear static M_r = W_rs/g;  rear race M_r + m·φ = W_rr/g;
//   front static M_f = W_fs/(g·cos θ);  front race M_f − m·φ = W_fr/(g·cos θ) − m,
// so ordinary least squares over all the equations (normal equations AᵀA·x = Aᵀb; e.g. Strang,
// "Introduction to Linear Algebra", §4.3) gives the fit in closed form.

export const MIN_CALIBRATION_REPORTS = 3;
/** Reports that disagree with the fitted loads by more than this (RMS, relative) are refused: from memory. */
export const MAX_CALIBRATION_SCATTER = 0.12;

const sag = z.number().min(0).max(400);
export const calibrationReportSchema = z.object({
  /** Rider mass with gear. */
  riderMassKg: z.number().min(15).max(250),
  rear: z
    .object({ rateNmm: z.number().positive(), preloadMm: z.number(), staticSagMm: sag, raceSagMm: sag })
    .optional(),
  /** Coil forks: rate per leg, preload, oil level; air forks: the gauge pressure set. */
  front: z
    .object({
      rateNmm: z.number().positive().optional(),
      preloadMm: z.number().optional(),
      oilLevelMm: z.number().positive().optional(),
      airPressureKpaGauge: z.number().min(0).optional(),
      staticSagMm: sag,
      raceSagMm: sag,
    })
    .optional(),
});
export type CalibrationReport = z.input<typeof calibrationReportSchema>;

/** What the catalog says: sprung masses from the bike's weight split, the default rider share. */
export function catalogParameters(
  bikeInput: unknown,
  riderRearShare = DEFAULT_RIDER_REAR_SHARE,
): CalibrationParameters {
  const bike = parseOrThrow(bikeSpecSchema, bikeInput, "bike.");
  const loads = computeLoads({ ...bike, calibration: undefined }, 0, riderRearShare);
  return {
    rearSprungKg: loads.rearStaticN / g,
    frontSprungKg: loads.frontStaticN / (g * loads.cosRake),
    riderRearShare,
  };
}

export type CalibrationFit =
  | {
      ok: true;
      parameters: CalibrationParameters;
      residualsMm: number[];
      rmsBeforeMm: number;
      rmsAfterMm: number;
      scatter: number;
      reports: number;
    }
  | { ok: false; reason: string; reports: number };

interface Equation {
  row: [number, number, number];
  rhs: number;
  /** The measured load in kg: the scale of this equation's residual. */
  loadKg: number;
  /** Predicted sag under given parameters, and the measured sag, for the residuals in mm. */
  predict: (p: CalibrationParameters) => number;
  measuredMm: number;
}

export function fitCalibration(
  bikeInput: unknown,
  reportsInput: readonly CalibrationReport[],
  riderRearShare = DEFAULT_RIDER_REAR_SHARE,
): CalibrationFit {
  const bike = parseOrThrow(bikeSpecSchema, bikeInput, "bike.");
  const reports = reportsInput.map((r, i) => parseOrThrow(calibrationReportSchema, r, `reports.${i}.`));
  const n = reports.length;
  if (n < MIN_CALIBRATION_REPORTS)
    return {
      ok: false,
      reports: n,
      reason: `${n} sag report${n === 1 ? "" : "s"} so far: the fit needs at least ${MIN_CALIBRATION_REPORTS}.`,
    };
  const eqs = reports.flatMap((r) => equationsOf(bike, r));
  if (!eqs.some((e) => e.row[0] !== 0) || !eqs.some((e) => e.row[1] !== 0) || !eqs.some((e) => e.row[2] !== 0))
    return {
      ok: false,
      reports: n,
      reason: "The reports need both ends' readings (rider on and off) to fit the masses and the rider's share.",
    };
  const x = solveNormal(eqs);
  if (!x)
    return { ok: false, reports: n, reason: "The reports do not pin the masses down (all riders the same weight?)." };
  const parameters = { rearSprungKg: x[0], frontSprungKg: x[1], riderRearShare: x[2] };
  const rel = eqs.map((e) => (e.row[0] * x[0] + e.row[1] * x[1] + e.row[2] * x[2] - e.rhs) / Math.max(e.loadKg, 1));
  const scatter = Math.sqrt(rel.reduce((s, v) => s + v * v, 0) / rel.length);
  if (scatter > MAX_CALIBRATION_SCATTER || !calibrationParametersSchema.safeParse(parameters).success)
    return {
      ok: false,
      reports: n,
      reason: `The reports contradict each other: the loads they imply scatter by ${(scatter * 100).toFixed(0)} % around any single bike (more than ${MAX_CALIBRATION_SCATTER * 100} %), so a fit would mean nothing. Look for a mismeasured report or a different bike.`,
    };
  const catalog = catalogParameters(bike, riderRearShare);
  const residualsMm = eqs.map((e) => e.predict(parameters) - e.measuredMm);
  const rms = (v: number[]) => Math.sqrt(v.reduce((s, d) => s + d * d, 0) / v.length);
  return {
    ok: true,
    parameters,
    residualsMm,
    rmsBeforeMm: rms(eqs.map((e) => e.predict(catalog) - e.measuredMm)),
    rmsAfterMm: rms(residualsMm),
    scatter,
    reports: n,
  };
}

function equationsOf(bike: BikeSpec, r: z.output<typeof calibrationReportSchema>): Equation[] {
  const out: Equation[] = [];
  const m = r.riderMassKg;
  if (r.rear) {
    const L = prepareLinkage(bike.rear.leverageCurve, "bike.rear.leverageCurve");
    const { rateNmm: k, preloadMm: p } = r.rear;
    const T = bike.rear.wheelTravelMm;
    const sagAt = (loadN: number) => solveSag(L, k, p, loadN, T).sagMm;
    // A static sag of 0 says only that the preload holds the bike: no equation from it.
    if (r.rear.staticSagMm > 0)
      out.push({
        row: [1, 0, 0],
        rhs: wheelForceAt(L, k, p, r.rear.staticSagMm) / g,
        loadKg: wheelForceAt(L, k, p, r.rear.staticSagMm) / g,
        predict: (q) => sagAt(q.rearSprungKg * g),
        measuredMm: r.rear.staticSagMm,
      });
    out.push({
      row: [1, 0, m],
      rhs: wheelForceAt(L, k, p, r.rear.raceSagMm) / g,
      loadKg: wheelForceAt(L, k, p, r.rear.raceSagMm) / g,
      predict: (q) => sagAt((q.rearSprungKg + m * q.riderRearShare) * g),
      measuredMm: r.rear.raceSagMm,
    });
  }
  if (r.front) {
    const f = r.front;
    const c = Math.cos((bike.rakeDeg * Math.PI) / 180);
    let force: (s: number) => number;
    let sagAt: (loadN: number) => number;
    if (bike.fork.kind === "air") {
      const { spring } = airSpringOf(bike);
      const p0 = (f.airPressureKpaGauge ?? bike.fork.air?.stockPressureKpaGauge ?? 0) / 1000 + ATMOSPHERE_MPA;
      force = (s) => airSpringForce(spring, p0, s, 1);
      sagAt = (W) => firstCrossing(force, W, bike.fork.travelMm, [spring.equalizeAtMm]).sagMm;
    } else {
      const fk = coilForkOf(bike);
      const k = f.rateNmm ?? bike.fork.stockRateNmm ?? 0;
      const p = f.preloadMm ?? bike.fork.stockPreloadMm;
      const h = f.oilLevelMm ?? bike.fork.stockOilLevelMm;
      force = (s) => forkForce(fk, k, p, h, s, 1);
      sagAt = (W) => solveForkSag(fk, k, p, h, W).sagMm;
    }
    if (f.staticSagMm > 0)
      out.push({
        row: [0, 1, 0],
        rhs: force(f.staticSagMm) / (g * c),
        loadKg: force(f.staticSagMm) / (g * c),
        predict: (q) => sagAt(q.frontSprungKg * g * c),
        measuredMm: f.staticSagMm,
      });
    out.push({
      row: [0, 1, -m],
      rhs: force(f.raceSagMm) / (g * c) - m,
      loadKg: force(f.raceSagMm) / (g * c),
      predict: (q) => sagAt((q.frontSprungKg + m * (1 - q.riderRearShare)) * g * c),
      measuredMm: f.raceSagMm,
    });
  }
  return out;
}

/** AᵀA·x = Aᵀb for three unknowns, by Gaussian elimination with partial pivoting; null when singular. */
function solveNormal(eqs: Equation[]): [number, number, number] | null {
  const M = [0, 1, 2].map((i) => [0, 1, 2].map((j) => eqs.reduce((s, e) => s + e.row[i]! * e.row[j]!, 0)));
  const v = [0, 1, 2].map((i) => eqs.reduce((s, e) => s + e.row[i]! * e.rhs, 0));
  const scale = Math.max(...M.flat().map(Math.abs), 1);
  for (let col = 0; col < 3; col++) {
    let piv = col;
    for (let r = col + 1; r < 3; r++) if (Math.abs(M[r]![col]!) > Math.abs(M[piv]![col]!)) piv = r;
    if (Math.abs(M[piv]![col]!) < 1e-9 * scale) return null;
    [M[col], M[piv]] = [M[piv]!, M[col]!];
    [v[col], v[piv]] = [v[piv]!, v[col]!];
    for (let r = 0; r < 3; r++) {
      if (r === col) continue;
      const f = M[r]![col]! / M[col]![col]!;
      for (let k = col; k < 3; k++) M[r]![k]! -= f * M[col]![k]!;
      v[r]! -= f * v[col]!;
    }
  }
  return [v[0]! / M[0]![0]!, v[1]! / M[1]![1]!, v[2]! / M[2]![2]!];
}
