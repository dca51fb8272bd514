import { solveIncreasing, type SagSolution } from "./solve";

/** What selection needs to know about one end, front or rear, whatever its spring. */
export interface EndModel {
  /** Preload (mm) that puts the end's sag exactly at sagMm under loadN with this rate. */
  preloadForSag(rateNmm: number, loadN: number, sagMm: number): number;
  solveSag(rateNmm: number, preloadMm: number, loadN: number): SagSolution;
}

export interface SagTargetsMm {
  raceSagMm: number;
  staticSagMinMm: number;
  staticSagMaxMm: number;
}

export interface Candidate {
  rateNmm: number;
  /** Preload that would put race sag on target, before clamping to the adjuster's limits. */
  preloadNeededMm: number;
  preloadMm: number;
  preloadOk: boolean;
  race: SagSolution;
  static: SagSolution;
  staticOk: boolean;
}

export interface Limits {
  minMm: number;
  maxMm: number;
}

export function evaluateCandidate(
  m: EndModel,
  rateNmm: number,
  loads: { staticN: number; raceN: number },
  t: SagTargetsMm,
  limits: Limits,
): Candidate {
  const preloadNeededMm = m.preloadForSag(rateNmm, loads.raceN, t.raceSagMm);
  const preloadMm = Math.min(limits.maxMm, Math.max(limits.minMm, preloadNeededMm));
  const preloadOk = preloadMm === preloadNeededMm;
  const st = m.solveSag(rateNmm, preloadMm, loads.staticN);
  // Race sag is exactly the target when the preload was not clamped; otherwise solve for it.
  const race: SagSolution = preloadOk
    ? { sagMm: t.raceSagMm, state: "ok" }
    : m.solveSag(rateNmm, preloadMm, loads.raceN);
  const staticOk = st.state === "ok" && st.sagMm >= t.staticSagMinMm - 1e-9 && st.sagMm <= t.staticSagMaxMm + 1e-9;
  return { rateNmm, preloadNeededMm, preloadMm, preloadOk, race, static: st, staticOk };
}

export type RateSource = "stock" | "stock-nearest" | "order" | "override";

export interface Selection {
  chosen: Candidate;
  source: RateSource;
  /** Every stocked rate that was tried, for the reasons and the tuner's view. */
  tried: Candidate[];
}

/**
 * Selection among stocked rates (lib/sizing/README.md): for each, the preload that puts race sag on
 * target and the static sag it then gives; keep those with preload within limits and static sag in
 * the window; prefer static sag nearest `preferStaticMm` (the window's middle unless a rate factor
 * moved it). None passes: the stocked rate nearest the ideal (caller warns and names the rate to
 * order). Nothing stocked: the ideal itself, to order.
 */
export function selectRate(
  m: EndModel,
  stockRatesNmm: readonly number[],
  idealRateNmm: number,
  loads: { staticN: number; raceN: number },
  t: SagTargetsMm,
  limits: Limits,
  preferStaticMm: number,
): Selection {
  const tried = stockRatesNmm.map((k) => evaluateCandidate(m, k, loads, t, limits));
  let best: Candidate | undefined;
  for (const c of tried) {
    if (!c.preloadOk || !c.staticOk) continue;
    if (!best || Math.abs(c.static.sagMm - preferStaticMm) < Math.abs(best.static.sagMm - preferStaticMm)) best = c;
  }
  if (best) return { chosen: best, source: "stock", tried };
  const nearest = nearestByRatio(tried, idealRateNmm);
  if (nearest) return { chosen: nearest, source: "stock-nearest", tried };
  return { chosen: evaluateCandidate(m, idealRateNmm, loads, t, limits), source: "order", tried };
}

/** The candidate whose rate is nearest the ideal by ratio (shelf steps are roughly proportional). */
function nearestByRatio(cs: readonly Candidate[], idealRateNmm: number): Candidate | undefined {
  let best: Candidate | undefined;
  for (const c of cs)
    if (!best || Math.abs(Math.log(c.rateNmm / idealRateNmm)) < Math.abs(Math.log(best.rateNmm / idealRateNmm)))
      best = c;
  return best;
}

export interface IdealToOrder {
  rateNmm: number;
  /** "soft"/"stiff": the sag ideal was moved to the softest/stiffest rate the preload limits allow;
   *  "unreachable": no rate meets both sag targets, so the softest that reaches race sag. */
  limitedBy: "soft" | "stiff" | "unreachable" | null;
}

/**
 * The rate to order must be fittable: race sag on target with preload inside the adjuster's limits.
 * The race-sag preload p(k) falls as k rises (rear: p = W·LR(y_r)/k − x(y_r); fork: (W − ΣF_air)/(n_s·k)
 * − s_r, the air growing slightly with the spring's steel), so the fittable rates are the band between
 * p(k) = p_max and p(k) = p_min, found numerically. Clamping the ideal into that band keeps it
 * monotonic in load and in sag (both bounds move the same way as the ideal).
 */
export function idealToOrder(
  idealNmm: number,
  m: EndModel,
  raceN: number,
  raceSagMm: number,
  limits: Limits,
): IdealToOrder {
  const minusPreload = (k: number) => -m.preloadForSag(k, raceN, raceSagMm);
  const softest = solveIncreasing(minusPreload, -limits.maxMm, 1, 10) ?? 0;
  const stiffest = solveIncreasing(minusPreload, -limits.minMm, 1, 10) ?? Infinity;
  if (!(idealNmm > 0) || !Number.isFinite(idealNmm)) return { rateNmm: softest, limitedBy: "unreachable" };
  if (idealNmm < softest) return { rateNmm: softest, limitedBy: "soft" };
  if (idealNmm > stiffest) return { rateNmm: stiffest, limitedBy: "stiff" };
  return { rateNmm: idealNmm, limitedBy: null };
}

/**
 * Ride-frequency basis: the stocked rate nearest the ideal (by ratio, as shelf steps are) among those
 * whose race-sag preload is inside the limits; static sag is then a check, not a filter. None fits:
 * the nearest stocked rate (caller warns). Nothing stocked: the ideal itself, to order.
 */
export function selectNearest(
  m: EndModel,
  stockRatesNmm: readonly number[],
  idealRateNmm: number,
  loads: { staticN: number; raceN: number },
  t: SagTargetsMm,
  limits: Limits,
): Selection {
  const tried = stockRatesNmm.map((k) => evaluateCandidate(m, k, loads, t, limits));
  const fit = nearestByRatio(
    tried.filter((c) => c.preloadOk),
    idealRateNmm,
  );
  if (fit) return { chosen: fit, source: "stock", tried };
  const nearest = nearestByRatio(tried, idealRateNmm);
  if (nearest) return { chosen: nearest, source: "stock-nearest", tried };
  return { chosen: evaluateCandidate(m, idealRateNmm, loads, t, limits), source: "order", tried };
}
