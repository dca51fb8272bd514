import type { RateBasisResult } from "./output-schema";
import type { FrequencyMatch } from "./rate-basis";
import type { RateBasis } from "./vocab";
import {
  evaluateCandidate,
  idealToOrder,
  selectNearest,
  selectRate,
  type EndModel,
  type IdealToOrder,
  type Limits,
  type SagTargetsMm,
  type Selection,
} from "./selection";

/**
 * Both rate bases for one end (lib/sizing/README.md, "Model 2"): the sag-window ideal and its stock
 * pick, the ride-frequency ideal and its stock pick; the basis in use sizes the spring (a tuner's
 * rate replaces the pick), the other is reported beside it.
 */
export interface BasisChoice {
  basis: RateBasis;
  ideal: IdealToOrder;
  windowIdeal: IdealToOrder;
  windowSel: Selection;
  sel: Pick<Selection, "chosen" | "source">;
  result: RateBasisResult;
}

export function chooseByBasis(a: {
  m: EndModel;
  loads: { staticN: number; raceN: number };
  targets: SagTargetsMm;
  limits: Limits;
  rateFactor: number;
  /** Rate that meets both sag targets exactly, before the factor. */
  sagOnlyRateNmm: number;
  /** Static sag the sag-window pick aims at, given its ideal. */
  preferStaticFor: (windowIdeal: IdealToOrder) => number;
  freq: FrequencyMatch;
  basis: RateBasis;
  stockRatesNmm: readonly number[];
  overrideRateNmm: number | undefined;
}): BasisChoice {
  const { m, loads: W, targets: t, limits } = a;
  const windowIdeal = idealToOrder(a.sagOnlyRateNmm * a.rateFactor, m, W.raceN, t.raceSagMm, limits);
  const windowSel = selectRate(m, a.stockRatesNmm, windowIdeal.rateNmm, W, t, limits, a.preferStaticFor(windowIdeal));
  const freqIdeal = a.freq.rateNmm !== null ? idealToOrder(a.freq.rateNmm, m, W.raceN, t.raceSagMm, limits) : null;
  const freqSel = freqIdeal ? selectNearest(m, a.stockRatesNmm, freqIdeal.rateNmm, W, t, limits) : null;
  // No rate reaches the stock setup's frequency (an odd catalog entry): fall back to the sag window.
  const basis = freqIdeal && freqSel ? a.basis : "sag-window";
  const pick = basis === "ride-frequency" && freqSel ? freqSel : windowSel;
  const sel =
    a.overrideRateNmm !== undefined
      ? { chosen: evaluateCandidate(m, a.overrideRateNmm, W, t, limits), source: "override" as const }
      : pick;
  return {
    basis,
    ideal: basis === "ride-frequency" && freqIdeal ? freqIdeal : windowIdeal,
    windowIdeal,
    windowSel,
    sel,
    result: {
      used: basis,
      rideFrequency:
        freqIdeal && freqSel
          ? {
              idealRateNmm: freqIdeal.rateNmm,
              chosenRateNmm: freqSel.chosen.rateNmm,
              referenceFrequencyHz: a.freq.referenceFrequencyHz,
              targetFrequencyHz: a.freq.targetFrequencyHz,
            }
          : null,
      sagWindow: { idealRateNmm: windowIdeal.rateNmm, chosenRateNmm: windowSel.chosen.rateNmm },
    },
  };
}
