import { z } from "zod";
import type { Recommendation } from "./output-schema";
import type { SizingInput } from "./input-schema";
import { sizingInputSchema } from "./input-schema";
import { SizingInputError } from "./errors";
import { idealSpringOn, prepareLinkage, preloadForSag, solveSag, wheelForceAt } from "./linkage";
import { forkForce, forkPreloadForSag, idealForkSpring, solveForkSag } from "./fork";
import { airAbsMpaForSag, airChamberForce } from "./air";
import { firstCrossing } from "./solve";
import { coilForkOf } from "./front";
import { ATMOSPHERE_MPA } from "./units";
import { parseOrThrow } from "./evaluate";
import { fmt } from "./format";

export const measuredSagSchema = z.object({
  staticSagMm: z.number().min(0).max(400),
  raceSagMm: z.number().positive().max(400),
});

export interface SagVerdict {
  end: "front" | "rear";
  verdict: "too-soft" | "right" | "too-stiff";
  /** How far static sag, once race sag is reset to target by preload, falls outside the window (mm). */
  byMm: number;
  raceSagErrorMm: number;
  /** Coil ends: preload to add (+) or remove (−) to put race sag on target. */
  preloadChangeMm: number | null;
  newPreloadMm: number | null;
  collarTurnsChange: number | null;
  /** Air forks: gauge pressure that puts race sag on target. */
  airPressureKpaGauge: number | null;
  predictedStaticSagMm: number;
  /** Rate the measured loads ask for (per leg at the front), and the nearest stocked rate. */
  suggestedRateNmm: number | null;
  nearestStockRateNmm: number | null;
  message: string;
}

/**
 * Follow-up on measured sag (sizing-model.md, common practice, no source): the measured sags give the
 * loads the fitted spring really carries (F at the measured travel); reset race sag to target by
 * preload; if static sag then falls below the window the spring is too soft, above it too stiff.
 */
export function sagVerdict(a: {
  input: SizingInput;
  recommendation: Recommendation;
  end: "front" | "rear";
  measured: { staticSagMm: number; raceSagMm: number };
}): SagVerdict {
  const inp = parseOrThrow(sizingInputSchema, a.input, "input.");
  const meas = parseOrThrow(measuredSagSchema, a.measured, "measured.");
  if (meas.raceSagMm <= meas.staticSagMm)
    throw new SizingInputError([{ path: "measured.raceSagMm", message: "Race sag must be larger than static sag" }]);
  const rec = a.recommendation;
  const end = a.end === "front" ? rec.front : rec.rear;
  const t = end.sagTargets;
  const mid = (t.staticSagMinMm + t.staticSagMaxMm) / 2;
  const stock = a.end === "front" ? inp.stock.forkRatesNmm : inp.stock.shockRatesNmm;
  let force: (s: number) => number;
  let staticAfter: number;
  let preloadChangeMm: number | null = null;
  let newPreloadMm: number | null = null;
  let collarTurnsChange: number | null = null;
  let air: number | null = null;
  let suggested: number | null = null;
  const travel = a.end === "front" ? inp.bike.fork.travelMm : inp.bike.rear.wheelTravelMm;
  if (meas.raceSagMm >= travel) throw new SizingInputError([{ path: "measured.raceSagMm", message: "Race sag must be less than the travel" }]);

  if (a.end === "rear") {
    const L = prepareLinkage(inp.bike.rear.leverageCurve, "input.bike.rear.leverageCurve");
    const k = rec.rear.chosenRate.nMm;
    force = (y) => wheelForceAt(L, k, rec.rear.preloadMm, y);
    const Ws = meas.staticSagMm > 0 ? force(meas.staticSagMm) : rec.resolved.loads.rearStaticN;
    const Wr = force(meas.raceSagMm);
    newPreloadMm = preloadForSag(L, k, Wr, t.raceSagMm);
    staticAfter = solveSag(L, k, newPreloadMm, Ws, travel).sagMm;
    suggested = Wr > Ws ? safeRate(() => idealSpringOn(L, Ws, Wr, mid, t.raceSagMm, "measured").rateNmm) : null;
    preloadChangeMm = newPreloadMm - rec.rear.preloadMm;
    collarTurnsChange = preloadChangeMm / inp.bike.rear.collarPitchMm;
  } else if (rec.front.kind !== "air" && rec.front.chosenRate && rec.front.preloadMm !== null && rec.front.oilLevelMm !== null) {
    const fk = coilForkOf(inp.bike);
    const k = rec.front.chosenRate.nMm;
    const h = rec.front.oilLevelMm;
    const p = rec.front.preloadMm;
    force = (s) => forkForce(fk, k, p, h, s, 1);
    const Ws = meas.staticSagMm > 0 ? force(meas.staticSagMm) : rec.resolved.loads.frontStaticN;
    const Wr = force(meas.raceSagMm);
    newPreloadMm = forkPreloadForSag(fk, k, h, Wr, t.raceSagMm);
    staticAfter = solveForkSag(fk, k, newPreloadMm, h, Ws).sagMm;
    suggested = Wr > Ws ? safeRate(() => idealForkSpring(fk, h, Ws, Wr, mid, t.raceSagMm).rateNmm) : null;
    preloadChangeMm = newPreloadMm - p;
  } else {
    const spec = inp.bike.fork.air!;
    const p0 = (rec.front.airPressure?.kpaGauge ?? 0) / 1000 + ATMOSPHERE_MPA;
    force = (s) => airChamberForce(spec.pistonAreaMm2, spec.chamberVolumeMm3, p0, s, 1);
    const Ws = meas.staticSagMm > 0 ? force(meas.staticSagMm) : rec.resolved.loads.frontStaticN;
    const Wr = force(meas.raceSagMm);
    const p1 = airAbsMpaForSag(spec.pistonAreaMm2, spec.chamberVolumeMm3, Wr, t.raceSagMm);
    air = (p1 - ATMOSPHERE_MPA) * 1000;
    staticAfter = firstCrossing((s) => airChamberForce(spec.pistonAreaMm2, spec.chamberVolumeMm3, p1, s, 1), Ws, travel, []).sagMm;
  }

  const below = t.staticSagMinMm - staticAfter;
  const above = staticAfter - t.staticSagMaxMm;
  const verdict = below > 0 ? "too-soft" : above > 0 ? "too-stiff" : "right";
  const byMm = Math.max(0, below, above);
  let nearest: number | null = null;
  if (suggested !== null)
    for (const r of stock) if (nearest === null || Math.abs(Math.log(r / suggested)) < Math.abs(Math.log(nearest / suggested))) nearest = r;
  const fix =
    air !== null
      ? `set ${fmt(air, 0)} kPa (${fmt(air / 100, 2)} bar)`
      : `${preloadChangeMm! >= 0 ? "add" : "remove"} ${fmt(Math.abs(preloadChangeMm!), 1)} mm preload` +
        (collarTurnsChange !== null ? ` (${fmt(Math.abs(collarTurnsChange), 1)} collar turns)` : "");
  const message =
    verdict === "right"
      ? `Spring is right: ${fix} to bring race sag to ${fmt(t.raceSagMm, 0)} mm; static sag will be ${fmt(staticAfter, 0)} mm.`
      : `Spring is ${verdict === "too-soft" ? "too soft" : "too stiff"}: with race sag at ${fmt(t.raceSagMm, 0)} mm, static sag would be ${fmt(staticAfter, 0)} mm, ${fmt(byMm, 0)} mm ${verdict === "too-soft" ? "below" : "above"} the window.` +
        (suggested !== null ? ` Fit about ${fmt(suggested, a.end === "front" ? 2 : 1)} N/mm${nearest !== null ? ` (nearest stocked ${fmt(nearest, a.end === "front" ? 2 : 1)} N/mm)` : ""}.` : "") +
        ` Meanwhile ${fix}.`;
  return {
    end: a.end,
    verdict,
    byMm,
    raceSagErrorMm: meas.raceSagMm - t.raceSagMm,
    preloadChangeMm,
    newPreloadMm,
    collarTurnsChange,
    airPressureKpaGauge: air,
    predictedStaticSagMm: staticAfter,
    suggestedRateNmm: suggested,
    nearestStockRateNmm: nearest,
    message,
  };
}

function safeRate(f: () => number): number | null {
  try {
    const v = f();
    return Number.isFinite(v) && v > 0 ? v : null;
  } catch {
    return null;
  }
}
