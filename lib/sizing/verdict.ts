import { z } from "zod";
import type { Recommendation } from "./output-schema";
import type { SizingInput, SizingInputParsed } from "./input-schema";
import { sizingInputSchema } from "./input-schema";
import { SizingInputError } from "./errors";
import { prepareLinkage, preloadForSag, solveSag, twoSagRate, wheelForceAt } from "./linkage";
import { forkForce, forkPreloadForSag, idealForkSpring, solveForkSag } from "./fork";
import { airSpringChargeForLoad, airSpringForce } from "./air";
import { firstCrossing } from "./solve";
import { airSpringOf, coilForkOf } from "./front";
import { idealToOrder, type EndModel, type Limits } from "./selection";
import { ATMOSPHERE_MPA } from "./units";
import { parseOrThrow } from "./evaluate";
import { fmt, rateText } from "./format";

export const measuredSagSchema = z.object({
  staticSagMm: z.number().min(0).max(400),
  raceSagMm: z.number().positive().max(400),
});

/** Measured loads this far from the model's mean a mismeasurement or another bike: from memory. */
export const IMPLIED_LOAD_TOLERANCE = 0.25;
/** Corrections below these are inside what a rider can set or measure: "leave it". Common practice. */
export const LEAVE_IT = { preloadMm: 0.5, collarTurns: 0.25, pressureKpa: 5 } as const;

export interface SagVerdict {
  end: "front" | "rear";
  /** "recheck": the measurements do not fit this bike and spring; measure again before changing anything. */
  verdict: "too-soft" | "right" | "too-stiff" | "recheck";
  /** What to do: nothing, set preload or pressure, change the spring, or measure again. */
  action?: "leave-it" | "adjust-preload" | "adjust-pressure" | "change-spring" | "recheck";
  /** How far static sag, once race sag is reset to target by preload, falls outside the window (mm). */
  byMm: number;
  raceSagErrorMm: number;
  /** Coil ends: preload to add (+) or remove (−) to put race sag on target; 0 when too small to set. */
  preloadChangeMm: number | null;
  newPreloadMm: number | null;
  collarTurnsChange: number | null;
  /** Air forks: gauge pressure that puts race sag on target. */
  airPressureKpaGauge: number | null;
  predictedStaticSagMm: number;
  /** Rate the measured loads ask for (per leg at the front), and the nearest stocked rate. */
  suggestedRateNmm: number | null;
  nearestStockRateNmm: number | null;
  /** Loads the measured sags imply on the fitted spring, against the model's. */
  impliedLoads?: {
    staticN: number | null;
    raceN: number;
    modelStaticN: number;
    modelRaceN: number;
    plausible: boolean;
  };
  message: string;
}

interface EndLaw {
  force: (s: number) => number;
  /** Coil ends: preload for race sag on target under a load, and the sag a preload gives. */
  preloadFor?: (loadN: number) => number;
  sagWith?: (preloadMm: number, loadN: number) => number;
  limits?: Limits;
  preloadMm?: number;
  collarPitchMm?: number;
  /** Rate the measured loads ask for, kept fittable (race sag with preload inside the limits). */
  suggest?: (staticN: number, raceN: number) => number | null;
}

/**
 * Follow-up on measured sag (lib/sizing/README.md, "Follow-up verdict"; common practice, no source):
 * the measured sags give the loads the fitted spring really carries; when they are more than 25 % off
 * the model's, measure again. Static sag 0 mm means the preload holds the bike topped out: too soft.
 * Otherwise reset race sag to target by preload; past the adjuster's range it is a spring change, and
 * inside it static sag below the window is too soft, above it too stiff. Tiny corrections: leave it.
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
  const travel = a.end === "front" ? inp.bike.fork.travelMm : inp.bike.rear.wheelTravelMm;
  if (meas.raceSagMm >= travel)
    throw new SizingInputError([{ path: "measured.raceSagMm", message: "Race sag must be less than the travel" }]);
  const model = rec.resolved.loads;
  const modelStaticN = a.end === "front" ? model.frontStaticN : model.rearStaticN;
  const modelRaceN = a.end === "front" ? model.frontRaceN : model.rearRaceN;
  const isAir = a.end === "front" && rec.front.kind === "air";
  const law = isAir ? airLaw(inp, rec) : coilLaw(inp, rec, a.end, t.raceSagMm, mid);

  const raceN = law.force(meas.raceSagMm);
  const staticN = meas.staticSagMm > 0 ? law.force(meas.staticSagMm) : null;
  const off = (v: number, m: number) => Math.abs(v / m - 1) > IMPLIED_LOAD_TOLERANCE;
  const plausible = !off(raceN, modelRaceN) && (staticN === null || !off(staticN, modelStaticN));
  const impliedLoads = { staticN, raceN, modelStaticN, modelRaceN, plausible };
  const base = { end: a.end, raceSagErrorMm: meas.raceSagMm - t.raceSagMm, impliedLoads };
  const endName = a.end === "front" ? "fork" : "shock";
  if (!plausible)
    return {
      ...base,
      verdict: "recheck",
      action: "recheck",
      byMm: 0,
      preloadChangeMm: null,
      newPreloadMm: null,
      collarTurnsChange: null,
      airPressureKpaGauge: null,
      predictedStaticSagMm: meas.staticSagMm,
      suggestedRateNmm: null,
      nearestStockRateNmm: null,
      message:
        `These readings mean ${fmt(raceN, 0)} N at race sag${staticN !== null ? ` and ${fmt(staticN, 0)} N with the bike alone` : ""} on the fitted ${endName} spring, ` +
        `but rider and bike should put about ${fmt(modelRaceN, 0)} N${staticN !== null ? ` and ${fmt(modelStaticN, 0)} N` : ""} there: more than ${fmt(IMPLIED_LOAD_TOLERANCE * 100, 0)} % apart. ` +
        `A reading is probably off, or the ${endName} is not set up as on the sheet. Measure again, following the guide, before changing anything.`,
    };
  const Ws = staticN ?? modelStaticN;

  if (isAir) return airVerdict(inp, rec, base, meas, Ws, raceN, t);

  const limits = law.limits!;
  const current = law.preloadMm!;
  const needed = law.preloadFor!(raceN);
  const suggested = law.suggest!(Ws, raceN);
  const nearest = nearestStocked(stock, suggested);
  const rate = (v: number) => rateText(v, a.end);
  const springNote =
    suggested === null
      ? ""
      : ` Fit about ${rate(suggested)}${nearest ? `; nearest stocked ${rate(nearest.rateNmm)}${nearest.stepsAway > 1 ? ` is more than one shelf step away: order ${rate(suggested)}` : ""}` : ""}.`;
  const clampP = (p: number) => Math.min(limits.maxMm, Math.max(limits.minMm, p));
  const turns = (mm: number) => (law.collarPitchMm ? mm / law.collarPitchMm : null);

  if (meas.staticSagMm === 0 || needed > limits.maxMm || needed < limits.minMm) {
    const soft = meas.staticSagMm === 0 || needed > limits.maxMm;
    const p = clampP(needed);
    const staticAfter = law.sagWith!(p, Ws);
    const why =
      meas.staticSagMm === 0
        ? `Static sag 0 mm: the preload holds the bike topped out under its own weight, so the spring is too soft.`
        : `Race sag on target needs ${fmt(needed, 1)} mm preload, beyond the ${limits.minMm}–${limits.maxMm} mm the adjuster allows: the spring is too ${soft ? "soft" : "stiff"}.`;
    const meanwhile = Math.abs(p - current) >= LEAVE_IT.preloadMm ? ` Until then, set ${fmt(p, 1)} mm preload.` : "";
    return {
      ...base,
      verdict: soft ? "too-soft" : "too-stiff",
      action: "change-spring",
      byMm: Math.max(0, t.staticSagMinMm - staticAfter, staticAfter - t.staticSagMaxMm),
      preloadChangeMm: p - current,
      newPreloadMm: p,
      collarTurnsChange: turns(p - current),
      airPressureKpaGauge: null,
      predictedStaticSagMm: staticAfter,
      suggestedRateNmm: suggested,
      nearestStockRateNmm: nearest?.rateNmm ?? null,
      message: why + springNote + meanwhile,
    };
  }

  const staticAfter = law.sagWith!(needed, Ws);
  const below = t.staticSagMinMm - staticAfter;
  const above = staticAfter - t.staticSagMaxMm;
  const verdict = below > 0 ? "too-soft" : above > 0 ? "too-stiff" : "right";
  const change = needed - current;
  const tc = turns(change);
  const tiny = Math.abs(change) < LEAVE_IT.preloadMm || (tc !== null && Math.abs(tc) < LEAVE_IT.collarTurns);
  const fix = tiny
    ? "leave the preload as it is"
    : `${change >= 0 ? "add" : "remove"} ${fmt(Math.abs(change), 1)} mm preload` +
      (tc !== null ? ` (${fmt(Math.abs(tc), 2)} collar turns)` : "");
  const message =
    verdict === "right"
      ? `Spring is right: ${fix}${tiny ? "" : ` to bring race sag to ${fmt(t.raceSagMm, 0)} mm`}; static sag will be ${fmt(staticAfter, 0)} mm.`
      : `Spring is ${verdict === "too-soft" ? "too soft" : "too stiff"}: with race sag at ${fmt(t.raceSagMm, 0)} mm, static sag would be ${fmt(staticAfter, 0)} mm, ${fmt(Math.max(below, above), 0)} mm ${below > 0 ? "below" : "above"} the window.` +
        springNote +
        ` Meanwhile ${fix}.`;
  return {
    ...base,
    verdict,
    action: verdict !== "right" ? "change-spring" : tiny ? "leave-it" : "adjust-preload",
    byMm: Math.max(0, below, above),
    preloadChangeMm: tiny ? 0 : change,
    newPreloadMm: tiny ? current : needed,
    collarTurnsChange: tc === null ? null : tiny ? 0 : tc,
    airPressureKpaGauge: null,
    predictedStaticSagMm: staticAfter,
    suggestedRateNmm: verdict === "right" ? null : suggested,
    nearestStockRateNmm: verdict === "right" ? null : (nearest?.rateNmm ?? null),
    message,
  };
}

function coilLaw(
  inp: SizingInputParsed,
  rec: Recommendation,
  end: "front" | "rear",
  raceTargetMm: number,
  staticMidMm: number,
): EndLaw {
  if (end === "rear") {
    const r = inp.bike.rear;
    const L = prepareLinkage(r.leverageCurve, "input.bike.rear.leverageCurve");
    const k = rec.rear.chosenRate.nMm;
    const limits = { minMm: r.preloadMinMm, maxMm: r.preloadMaxMm };
    const m: EndModel = {
      preloadForSag: (kk, W, y) => preloadForSag(L, kk, W, y),
      solveSag: (kk, p, W) => solveSag(L, kk, p, W, r.wheelTravelMm),
    };
    return {
      force: (y) => wheelForceAt(L, k, rec.rear.preloadMm, y),
      preloadFor: (W) => preloadForSag(L, k, W, raceTargetMm),
      sagWith: (p, W) => solveSag(L, k, p, W, r.wheelTravelMm).sagMm,
      limits,
      preloadMm: rec.rear.preloadMm,
      collarPitchMm: r.collarPitchMm,
      suggest: (Ws, Wr) => fittable(twoSagRate(L, Ws, Wr, staticMidMm, raceTargetMm), m, Wr, raceTargetMm, limits),
    };
  }
  const f = inp.bike.fork;
  const fk = coilForkOf(inp.bike);
  const k = rec.front.chosenRate?.nMm ?? 0;
  const h = rec.front.oilLevelMm ?? f.stockOilLevelMm;
  const p0 = rec.front.preloadMm ?? 0;
  const limits = { minMm: f.preloadMinMm, maxMm: f.preloadMaxMm };
  const m: EndModel = {
    preloadForSag: (kk, W, s) => forkPreloadForSag(fk, kk, h, W, s),
    solveSag: (kk, p, W) => solveForkSag(fk, kk, p, h, W),
  };
  return {
    force: (s) => forkForce(fk, k, p0, h, s, 1),
    preloadFor: (W) => forkPreloadForSag(fk, k, h, W, raceTargetMm),
    sagWith: (p, W) => solveForkSag(fk, k, p, h, W).sagMm,
    limits,
    preloadMm: p0,
    suggest: (Ws, Wr) =>
      fittable(idealForkSpring(fk, h, Ws, Wr, staticMidMm, raceTargetMm).rateNmm, m, Wr, raceTargetMm, limits),
  };
}

/** The sag-window rate from the measured loads, moved into the rates that reach race sag with preload in range. */
function fittable(rateNmm: number, m: EndModel, raceN: number, raceTargetMm: number, limits: Limits): number | null {
  const r = idealToOrder(rateNmm, m, raceN, raceTargetMm, limits).rateNmm;
  return Number.isFinite(r) && r > 0 ? r : null;
}

function airLaw(inp: SizingInputParsed, rec: Recommendation): EndLaw {
  const { spring } = airSpringOf(inp.bike);
  const p0 = (rec.front.airPressure?.kpaGauge ?? 0) / 1000 + ATMOSPHERE_MPA;
  return { force: (s) => airSpringForce(spring, p0, s, 1) };
}

function airVerdict(
  inp: SizingInputParsed,
  rec: Recommendation,
  base: Pick<SagVerdict, "end" | "raceSagErrorMm" | "impliedLoads">,
  meas: { staticSagMm: number; raceSagMm: number },
  Ws: number,
  Wr: number,
  t: { raceSagMm: number; staticSagMinMm: number; staticSagMaxMm: number },
): SagVerdict {
  const { spring } = airSpringOf(inp.bike);
  const now = rec.front.airPressure?.kpaGauge ?? 0;
  const p1 = airSpringChargeForLoad(spring, Wr, t.raceSagMm);
  const kpa = (p1 - ATMOSPHERE_MPA) * 1000;
  const staticAfter = firstCrossing((s) => airSpringForce(spring, p1, s, 1), Ws, inp.bike.fork.travelMm, [
    spring.equalizeAtMm,
  ]).sagMm;
  const below = t.staticSagMinMm - staticAfter;
  const above = staticAfter - t.staticSagMaxMm;
  const verdict = meas.staticSagMm === 0 || below > 0 ? "too-soft" : above > 0 ? "too-stiff" : "right";
  const tiny = Math.abs(kpa - now) < LEAVE_IT.pressureKpa;
  const fix = tiny ? "leave the pressure as it is" : `set ${fmt(kpa, 0)} kPa (${fmt(kpa / 100, 2)} bar)`;
  const message =
    verdict === "right"
      ? `Air pressure is right: ${fix}${tiny ? "" : ` to bring race sag to ${fmt(t.raceSagMm, 0)} mm`}; static sag will be ${fmt(staticAfter, 0)} mm.`
      : `With race sag at ${fmt(t.raceSagMm, 0)} mm, static sag would be ${fmt(staticAfter, 0)} mm, outside ${fmt(t.staticSagMinMm, 0)}–${fmt(t.staticSagMaxMm, 0)} mm: ask the shop about the negative chamber or volume spacers. Meanwhile ${fix}.`;
  return {
    ...base,
    verdict,
    action: verdict !== "right" ? "adjust-pressure" : tiny ? "leave-it" : "adjust-pressure",
    byMm: Math.max(0, below, above),
    preloadChangeMm: null,
    newPreloadMm: null,
    collarTurnsChange: null,
    airPressureKpaGauge: tiny ? now : kpa,
    predictedStaticSagMm: staticAfter,
    suggestedRateNmm: null,
    nearestStockRateNmm: null,
    message,
  };
}

/** Nearest stocked rate by ratio, and how many shelf steps (the stock's median spacing) away it is. */
function nearestStocked(
  stock: readonly number[],
  rateNmm: number | null,
): { rateNmm: number; stepsAway: number } | null {
  if (rateNmm === null || !stock.length) return null;
  let best = stock[0]!;
  for (const r of stock) if (Math.abs(Math.log(r / rateNmm)) < Math.abs(Math.log(best / rateNmm))) best = r;
  const sorted = [...new Set(stock)].sort((x, y) => x - y);
  const gaps = sorted
    .slice(1)
    .map((v, i) => v - sorted[i]!)
    .sort((x, y) => x - y);
  const step = gaps.length ? gaps[Math.floor(gaps.length / 2)]! : Math.abs(best - rateNmm);
  return { rateNmm: best, stepsAway: step > 0 ? Math.abs(best - rateNmm) / step : 0 };
}
