import type { BikeSpec } from "./bike-schema";
import type { Loads } from "./loads";
import type { RearResult, SizingWarning } from "./output-schema";
import type { SetupOverrides } from "./overrides";
import { twoSagRate, prepareLinkage, preloadForSag, solveSag, wheelForceAt, wheelRateAt, type Linkage } from "./linkage";
import { evaluateCandidate, idealToOrder, selectRate, type EndModel, type IdealToOrder, type SagTargetsMm } from "./selection";
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

export function evaluateRear(
  bike: BikeSpec,
  loads: Loads,
  targets: SagTargetsMm,
  rateFactor: number,
  stockRatesNmm: readonly number[],
  ov: SetupOverrides["rear"],
  warnings: SizingWarning[],
  reasons: string[],
): RearResult {
  const r = bike.rear;
  const L = prepareLinkage(r.leverageCurve, "bike.rear.leverageCurve");
  const m = rearModel(L, r.wheelTravelMm);
  const W = { staticN: loads.rearStaticN, raceN: loads.rearRaceN };
  const mid = (targets.staticSagMinMm + targets.staticSagMaxMm) / 2;
  const limits = { minMm: r.preloadMinMm, maxMm: r.preloadMaxMm };
  const sagOnlyRateNmm = twoSagRate(L, W.staticN, W.raceN, mid, targets.raceSagMm);
  const ideal = idealToOrder(sagOnlyRateNmm * rateFactor, m, W.raceN, targets.raceSagMm, limits);
  const idealRateNmm = ideal.rateNmm;
  const idealPreloadMm = preloadForSag(L, idealRateNmm, W.raceN, targets.raceSagMm);
  // With a rate factor of 1 and no limit this is the window's middle; otherwise where the ideal puts it.
  const preferStaticMm =
    rateFactor === 1 && !ideal.limitedBy ? mid : solveSag(L, idealRateNmm, idealPreloadMm, W.staticN, r.wheelTravelMm).sagMm;

  const sel =
    ov?.rateNmm !== undefined
      ? { chosen: evaluateCandidate(m, ov.rateNmm, W, targets, limits), source: "override" as const }
      : selectRate(m, stockRatesNmm, idealRateNmm, W, targets, limits, preferStaticMm);
  const k = sel.chosen.rateNmm;
  reasons.push(
    `Rear: rider and bike put ${fmt(W.raceN, 0)} N on the rear wheel at race sag, ${fmt(W.staticN, 0)} N with the bike alone` +
      (sagOnlyRateNmm > 0 ? `; ${rateText(sagOnlyRateNmm, "rear")} meets ${fmt(targets.raceSagMm, 0)} mm race sag with ${fmt(mid, 0)} mm static sag` : "") +
      (rateFactor !== 1 ? `, times ${fmt(rateFactor, 3)} for skill and style.` : "."),
  );
  limitNotes("REAR", "rear", ideal, sagOnlyRateNmm * rateFactor, idealPreloadMm, targets, mid, warnings, reasons);
  describeSource("REAR", "shock spring", sel.source, k, idealRateNmm, warnings, reasons);

  let preloadMm = sel.chosen.preloadMm;
  if (ov?.preloadMm !== undefined) {
    preloadMm = ov.preloadMm;
    if (preloadMm < r.preloadMinMm || preloadMm > r.preloadMaxMm)
      warnings.push({ code: "REAR_PRELOAD_OUTSIDE_LIMITS", severity: "critical", message: `Preload ${fmt(preloadMm, 1)} mm is outside the shock's ${r.preloadMinMm}–${r.preloadMaxMm} mm.`, field: "rear.preloadMm" });
  } else if (!sel.chosen.preloadOk)
    warnings.push({
      code: "REAR_PRELOAD_AT_LIMIT",
      severity: "caution",
      message: `Race sag on target needs ${fmt(sel.chosen.preloadNeededMm, 1)} mm preload; the collar allows ${r.preloadMinMm}–${r.preloadMaxMm} mm.`,
      field: "rear.preloadMm",
    });
  const race = solveSag(L, k, preloadMm, W.raceN, r.wheelTravelMm);
  const stat = solveSag(L, k, preloadMm, W.staticN, r.wheelTravelMm);
  sagWarnings("REAR", "rear", race, stat, targets, warnings);

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
  if (source === "stock") reasons.push(`${end}: stocked ${what} ${rate(k)} meets the preload limits and the static sag window.`);
  else if (source === "stock-nearest")
    warnings.push({
      code: `${code}_NO_STOCK_FIT`,
      severity: "caution",
      message: `No stocked ${what} meets both the preload limits and the static sag window; nearest stocked ${rate(k)} shown. Order ${rate(idealNmm)}.`,
      field: `${code === "REAR" ? "rear" : "front"}.chosenRate`,
    });
  else if (source === "order")
    warnings.push({ code: `${code}_TO_ORDER`, severity: "info", message: `No ${what}s in stock: order ${rate(k)}.`, field: "stock" });
  else reasons.push(`${end}: ${what} rate ${rate(k)} set by the tuner.`);
}

export function sagWarnings(
  code: "REAR" | "FRONT",
  field: "rear" | "front",
  race: { sagMm: number; state: string },
  stat: { sagMm: number; state: string },
  t: SagTargetsMm,
  warnings: SizingWarning[],
): void {
  if (race.state !== "ok")
    warnings.push({
      code: `${code}_RACE_SAG_UNREACHABLE`,
      severity: "critical",
      message: race.state === "topped-out" ? "With this preload the rider's weight does not compress the spring at all." : "The spring bottoms under the rider's weight alone.",
      field: `${field}.predicted.raceSagMm`,
    });
  else if (Math.abs(race.sagMm - t.raceSagMm) > 2)
    warnings.push({ code: `${code}_RACE_SAG_OFF_TARGET`, severity: "caution", message: `Race sag ${fmt(race.sagMm, 0)} mm against a target of ${fmt(t.raceSagMm, 0)} mm.`, field: `${field}.predicted.raceSagMm` });
  if (stat.sagMm < t.staticSagMinMm - 1e-6 || stat.sagMm > t.staticSagMaxMm + 1e-6)
    warnings.push({
      code: `${code}_STATIC_SAG_OUTSIDE_WINDOW`,
      severity: "caution",
      message: `Static sag ${fmt(stat.sagMm, 0)} mm is outside ${fmt(t.staticSagMinMm, 0)}–${fmt(t.staticSagMaxMm, 0)} mm: the spring is ${stat.sagMm < t.staticSagMinMm ? "soft" : "stiff"} for this rider.`,
      field: `${field}.predicted.staticSagMm`,
    });
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
      message: `The sag targets ask for ${rateText(sagIdealNmm, end)}, which needs preload outside the adjuster's limits; the ${ideal.limitedBy === "soft" ? "softest" : "stiffest"} fittable rate is ${rateText(ideal.rateNmm, end)} at ${fmt(preloadMm, 1)} mm.`,
      field: `${end}.idealRate`,
    });
  else reasons.push(`${code === "REAR" ? "Rear" : "Front"}: ideal ${rateText(ideal.rateNmm, end)} at ${fmt(preloadMm, 1)} mm preload.`);
}
