import type { BikeSpec } from "./bike-schema";
import type { Loads } from "./loads";
import type { RearResult, SizingWarning } from "./output-schema";
import type { SetupOverrides } from "./overrides";
import {
  twoSagRate,
  prepareLinkage,
  preloadForSag,
  solveSag,
  wheelForceAt,
  wheelRateAt,
  type Linkage,
} from "./linkage";
import type { EndModel, IdealToOrder, Limits, SagTargetsMm } from "./selection";
import { chooseByBasis, type BasisChoice } from "./basis-choice";
import { matchRearFrequency, type FrequencyMatch } from "./rate-basis";
import type { RateBasis } from "./vocab";
import { naturalFrequencyOf } from "./frequency";
import { rateTriple, STANDARD_GRAVITY } from "./units";
import { fmt, rateText } from "./format";

export const CURVE_POINTS = 31;

export function rearModel(L: Linkage, travelMm: number): EndModel {
  return {
    preloadForSag: (k, W, y) => preloadForSag(L, k, W, y),
    solveSag: (k, p, W) => solveSag(L, k, p, W, travelMm),
  };
}

export interface EndContext {
  bike: BikeSpec;
  loads: Loads;
  /** Loads for the bike's reference rider: the stock setup is measured there. */
  referenceLoads: Loads;
  targets: SagTargetsMm;
  rateFactor: number;
  basis: RateBasis;
  stockRatesNmm: readonly number[];
  warnings: SizingWarning[];
  reasons: string[];
}

export function evaluateRear(c: EndContext, ov: SetupOverrides["rear"]): RearResult {
  const { bike, loads, targets, rateFactor, warnings, reasons } = c;
  const r = bike.rear;
  const L = prepareLinkage(r.leverageCurve, "bike.rear.leverageCurve");
  const m = rearModel(L, r.wheelTravelMm);
  const W = { staticN: loads.rearStaticN, raceN: loads.rearRaceN };
  const mid = (targets.staticSagMinMm + targets.staticSagMaxMm) / 2;
  const limits = { minMm: r.preloadMinMm, maxMm: r.preloadMaxMm };

  // Both bases, always: the one used sizes the spring, the other is shown beside it.
  const sagOnlyRateNmm = twoSagRate(L, W.staticN, W.raceN, mid, targets.raceSagMm);
  const freq = matchRearFrequency(
    L,
    r.stockRateNmm,
    c.referenceLoads.rearRaceN,
    W.raceN,
    targets.raceSagMm,
    rateFactor,
  );
  const choice = chooseByBasis({
    m,
    loads: W,
    targets,
    limits,
    rateFactor,
    sagOnlyRateNmm,
    // With a rate factor of 1 and no limit this is the window's middle; otherwise where the ideal puts it.
    preferStaticFor: (wi) =>
      rateFactor === 1 && !wi.limitedBy
        ? mid
        : solveSag(L, wi.rateNmm, preloadForSag(L, wi.rateNmm, W.raceN, targets.raceSagMm), W.staticN, r.wheelTravelMm)
            .sagMm,
    freq,
    basis: c.basis,
    stockRatesNmm: c.stockRatesNmm,
    overrideRateNmm: ov?.rateNmm,
  });
  const { basis, ideal, sel } = choice;
  const idealRateNmm = ideal.rateNmm;
  const idealPreloadMm = preloadForSag(L, idealRateNmm, W.raceN, targets.raceSagMm);
  const k = sel.chosen.rateNmm;
  reasons.push(
    `Rear: rider and bike put ${fmt(W.raceN, 0)} N on the rear wheel at race sag, ${fmt(W.staticN, 0)} N with the bike alone.`,
  );
  basisReasons("rear", choice, freq, sagOnlyRateNmm, targets, mid, rateFactor, bike.referenceRiderMassKg, reasons);
  limitNotes(
    "REAR",
    "rear",
    ideal,
    basis === "ride-frequency" ? (freq.rateNmm ?? 0) : sagOnlyRateNmm * rateFactor,
    idealPreloadMm,
    targets,
    mid,
    warnings,
    reasons,
    basis,
  );
  describeSource("REAR", "shock spring", sel.source, k, idealRateNmm, warnings, reasons);

  let preloadMm = sel.chosen.preloadMm;
  if (ov?.preloadMm !== undefined) {
    preloadMm = ov.preloadMm;
    if (preloadMm < r.preloadMinMm || preloadMm > r.preloadMaxMm)
      warnings.push({
        code: "REAR_PRELOAD_OUTSIDE_LIMITS",
        severity: "critical",
        message: `Preload ${fmt(preloadMm, 1)} mm is outside the shock's ${r.preloadMinMm}–${r.preloadMaxMm} mm.`,
        field: "rear.preloadMm",
      });
  } else if (!sel.chosen.preloadOk)
    warnings.push(preloadLimitWarning("REAR", "rear", sel.chosen.preloadNeededMm, limits, "collar"));
  const race = solveSag(L, k, preloadMm, W.raceN, r.wheelTravelMm);
  const stat = solveSag(L, k, preloadMm, W.staticN, r.wheelTravelMm);
  const clamped = ov?.preloadMm === undefined && !sel.chosen.preloadOk;
  sagWarnings("REAR", "rear", race, stat, targets, warnings, {
    clamped,
    chosenNmm: k,
    idealNmm: idealRateNmm,
    windowPickNmm: basis === "sag-window" ? null : choice.windowSel.chosen.rateNmm,
  });

  const forceCurve = [];
  for (let i = 0; i < CURVE_POINTS; i++) {
    const y = (r.wheelTravelMm * i) / (CURVE_POINTS - 1);
    forceCurve.push({ wheelTravelMm: y, wheelForceN: wheelForceAt(L, k, preloadMm, y) });
  }
  const bottomN = wheelForceAt(L, k, preloadMm, r.wheelTravelMm);
  const wheelRate = wheelRateAt(L, k, preloadMm, race.sagMm);
  const sprungMassKg = W.raceN / STANDARD_GRAVITY;
  return {
    idealRate: rateTriple(idealRateNmm),
    sagOnlyIdealRateNmm: sagOnlyRateNmm,
    idealPreloadMm,
    chosenRate: rateTriple(k),
    stockRate: rateTriple(r.stockRateNmm),
    source: sel.source,
    preloadMm,
    preloadCollarTurns: preloadMm / r.collarPitchMm,
    sagTargets: targets,
    predicted: { raceSagMm: race.sagMm, staticSagMm: stat.sagMm, raceState: race.state, staticState: stat.state },
    bottoming: { forceN: bottomN, ratio: bottomN / W.raceN },
    forceCurve,
    wheelRateAtSagNmm: wheelRate,
    sprungMassKg,
    naturalFrequencyHz: naturalFrequencyOf(wheelRate, sprungMassKg),
    rateBasis: choice.result,
  };
}

/** Say how the ideal came about under the basis used, and what the other basis asks for. */
export function basisReasons(
  end: "rear" | "front",
  choice: BasisChoice,
  freq: FrequencyMatch,
  sagOnlyNmm: number,
  t: SagTargetsMm,
  staticMidMm: number,
  rateFactor: number,
  referenceRiderKg: number,
  reasons: string[],
): void {
  const End = end === "rear" ? "Rear" : "Front";
  const { basis } = choice;
  const freqIdealNmm = choice.result.rideFrequency?.idealRateNmm ?? null;
  const windowIdealNmm = choice.windowIdeal.rateNmm;
  const factor = rateFactor !== 1 ? ` × ${fmt(rateFactor, 3)} for skill, style, discipline and jumps` : "";
  const freqText =
    freqIdealNmm !== null
      ? `ride frequency: the stock spring gives the ${fmt(referenceRiderKg, 0)} kg reference rider ${fmt(freq.referenceFrequencyHz, 2)} Hz at race sag${factor}; ${rateText(freqIdealNmm, end)} gives this rider ${fmt(freq.targetFrequencyHz, 2)} Hz`
      : "ride frequency: no rate reaches the stock setup's frequency for this rider";
  const windowText =
    sagOnlyNmm > 0
      ? `sag window: ${rateText(windowIdealNmm, end)} meets ${fmt(t.raceSagMm, 0)} mm race sag with ${fmt(staticMidMm, 0)} mm static sag${factor}`
      : "sag window: no spring meets both sag targets";
  reasons.push(
    basis === "ride-frequency"
      ? `${End} sized by ${freqText}. Beside it, ${windowText}.`
      : `${End} sized by ${windowText}. Beside it, ${freqText}.`,
  );
}

/** Race sag on target needs preload past the adjuster: the spring's direction follows from that. */
export function preloadLimitWarning(
  code: "REAR" | "FRONT",
  end: "rear" | "front",
  neededMm: number,
  limits: Limits,
  adjuster: string,
): SizingWarning {
  const soft = neededMm > limits.maxMm;
  return {
    code: `${code}_PRELOAD_AT_LIMIT`,
    severity: "caution",
    message: `Race sag on target needs ${fmt(neededMm, 1)} mm preload; the ${adjuster} allows ${limits.minMm}–${limits.maxMm} mm, so this spring is too ${soft ? "soft" : "stiff"} for the rider and race sag will sit ${soft ? "deeper" : "higher"} than the target.`,
    field: `${end}.preloadMm`,
  };
}

export function describeSource(
  code: "REAR" | "FRONT",
  what: string,
  source: RearResult["source"],
  k: number,
  idealNmm: number,
  warnings: SizingWarning[],
  reasons: string[],
): void {
  const end = code === "REAR" ? "Rear" : "Front";
  const rate = (v: number) => rateText(v, code === "REAR" ? "rear" : "front");
  if (source === "stock")
    reasons.push(`${end}: stocked ${what} ${rate(k)} meets the preload limits and the static sag window.`);
  else if (source === "stock-nearest")
    warnings.push({
      code: `${code}_NO_STOCK_FIT`,
      severity: "caution",
      message: `No stocked ${what} meets both the preload limits and the static sag window; nearest stocked ${rate(k)} shown. Order ${rate(idealNmm)}.`,
      field: `${code === "REAR" ? "rear" : "front"}.chosenRate`,
    });
  else if (source === "order")
    warnings.push({
      code: `${code}_TO_ORDER`,
      severity: "info",
      message: `No ${what}s in stock: order ${rate(k)}.`,
      field: "stock",
    });
  else reasons.push(`${end}: ${what} rate ${rate(k)} set by the tuner.`);
}

export interface SpringDirection {
  /** Preload was clamped at a limit: static sag no longer tells the spring's direction. */
  clamped: boolean;
  chosenNmm: number;
  idealNmm: number;
  /** The rate the sag-window basis would pick, named when static sag misses the window. */
  windowPickNmm: number | null;
}

export function sagWarnings(
  code: "REAR" | "FRONT",
  field: "rear" | "front",
  race: { sagMm: number; state: string },
  stat: { sagMm: number; state: string },
  t: SagTargetsMm,
  warnings: SizingWarning[],
  dir?: SpringDirection,
): void {
  if (race.state !== "ok")
    warnings.push({
      code: `${code}_RACE_SAG_UNREACHABLE`,
      severity: "critical",
      message:
        race.state === "topped-out"
          ? "With this preload the rider's weight does not compress the spring at all."
          : "The spring bottoms under the rider's weight alone.",
      field: `${field}.predicted.raceSagMm`,
    });
  else if (Math.abs(race.sagMm - t.raceSagMm) > 2)
    warnings.push({
      code: `${code}_RACE_SAG_OFF_TARGET`,
      severity: "caution",
      message: `Race sag ${fmt(race.sagMm, 0)} mm against a target of ${fmt(t.raceSagMm, 0)} mm.`,
      field: `${field}.predicted.raceSagMm`,
    });
  const below = t.staticSagMinMm - stat.sagMm;
  const above = stat.sagMm - t.staticSagMaxMm;
  if (below > 1e-6 || above > 1e-6) {
    // With preload at a limit the static sag is distorted by the clamp: the rate itself says which way.
    const soft = dir?.clamped ? dir.chosenNmm < dir.idealNmm : below > 0;
    const pick =
      dir?.windowPickNmm != null && Math.abs(dir.windowPickNmm - dir.chosenNmm) > 1e-9
        ? ` Sized to the sag window instead, it would be ${rateText(dir.windowPickNmm, field)}.`
        : "";
    warnings.push({
      code: `${code}_STATIC_SAG_OUTSIDE_WINDOW`,
      severity: "caution",
      message:
        `Static sag ${fmt(stat.sagMm, 0)} mm is ${fmt(Math.max(below, above), 0)} mm ${below > 0 ? "below" : "above"} the ${fmt(t.staticSagMinMm, 0)}–${fmt(t.staticSagMaxMm, 0)} mm window: the spring is on the ${soft ? "soft" : "stiff"} side for this rider.` +
        pick,
      field: `${field}.predicted.staticSagMm`,
    });
  }
}

/** Say when the ideal to order is not the pure sag ideal, and why. */
export function limitNotes(
  code: "REAR" | "FRONT",
  end: "rear" | "front",
  ideal: IdealToOrder,
  sagIdealNmm: number,
  preloadMm: number,
  t: SagTargetsMm,
  staticMidMm: number,
  warnings: SizingWarning[],
  reasons: string[],
  basis: RateBasis = "sag-window",
): void {
  if (ideal.limitedBy === "unreachable")
    warnings.push({
      code: `${code}_SAG_TARGETS_UNREACHABLE`,
      severity: "caution",
      message: `No spring gives both ${fmt(t.raceSagMm, 0)} mm race sag and ${fmt(staticMidMm, 0)} mm static sag for this rider; sized on race sag with the most preload allowed.`,
      field: `${end}.sagTargets`,
    });
  else if (ideal.limitedBy)
    warnings.push({
      code: `${code}_IDEAL_LIMITED_BY_PRELOAD`,
      severity: "info",
      message: `${basis === "ride-frequency" ? "The matched ride frequency asks" : "The sag targets ask"} for ${rateText(sagIdealNmm, end)}, which needs preload outside the adjuster's limits; the ${ideal.limitedBy === "soft" ? "softest" : "stiffest"} fittable rate is ${rateText(ideal.rateNmm, end)} at ${fmt(preloadMm, 1)} mm.`,
      field: `${end}.idealRate`,
    });
  else
    reasons.push(
      `${code === "REAR" ? "Rear" : "Front"}: ideal ${rateText(ideal.rateNmm, end)} at ${fmt(preloadMm, 1)} mm preload.`,
    );
}
