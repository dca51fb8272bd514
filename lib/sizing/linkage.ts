import { SizingInputError, requireNumbers, type SizingIssue } from "./errors";
import { firstCrossing, type SagSolution } from "./solve";

/** One catalog point: leverage ratio = wheel travel per shock travel (dy/dx) at that wheel travel. */
export interface LeveragePoint {
  wheelTravelMm: number;
  ratio: number;
}

/** A checked leverage curve with shock travel precomputed at each point, for fast evaluation. */
export interface Linkage {
  y: number[];
  r: number[];
  x: number[];
}

export function checkLeverageCurve(curve: readonly LeveragePoint[], path = "curve"): SizingIssue[] {
  const issues: SizingIssue[] = [];
  if (!Array.isArray(curve) || curve.length < 2) return [{ path, message: "Needs at least 2 points" }];
  curve.forEach((p, i) => {
    if (!p || !Number.isFinite(p.wheelTravelMm) || !Number.isFinite(p.ratio))
      issues.push({ path: `${path}.${i}`, message: "Point needs finite wheelTravelMm and ratio" });
    else if (!(p.ratio > 0)) issues.push({ path: `${path}.${i}.ratio`, message: "Ratio must be greater than 0" });
  });
  if (issues.length) return issues;
  if (curve[0]!.wheelTravelMm !== 0)
    issues.push({ path: `${path}.0.wheelTravelMm`, message: "First point must be at 0 mm wheel travel" });
  for (let i = 1; i < curve.length; i++)
    if (!(curve[i]!.wheelTravelMm > curve[i - 1]!.wheelTravelMm))
      issues.push({ path: `${path}.${i}.wheelTravelMm`, message: "Wheel travel must increase from point to point" });
  return issues;
}

export function prepareLinkage(curve: readonly LeveragePoint[], path = "curve"): Linkage {
  const issues = checkLeverageCurve(curve, path);
  if (issues.length) throw new SizingInputError(issues);
  const y = curve.map((p) => p.wheelTravelMm);
  const r = curve.map((p) => p.ratio);
  const x = [0];
  for (let i = 1; i < y.length; i++)
    x.push(x[i - 1]! + segmentIntegral(r[i - 1]!, slopeOf(y, r, i - 1), y[i]! - y[i - 1]!));
  return { y, r, x };
}

function slopeOf(y: number[], r: number[], i: number): number {
  return (r[i + 1]! - r[i]!) / (y[i + 1]! - y[i]!);
}

/**
 * ∫₀^Δ du / (a + b·u) = ln(1 + bΔ/a) / b, exact for a ratio linear in wheel travel (elementary
 * integral); written with log1p so a nearly constant ratio keeps full precision (→ Δ/a).
 */
function segmentIntegral(a: number, b: number, d: number): number {
  const t = (b * d) / a;
  if (Math.abs(t) < 1e-12) return d / a;
  return ((d / a) * Math.log1p(t)) / t;
}

/** Index of the segment holding y; beyond the last point the last segment's end ratio holds. */
function segmentAt(L: Linkage, yMm: number): number {
  const n = L.y.length;
  if (yMm >= L.y[n - 1]!) return n - 1;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (L.y[mid]! <= yMm) lo = mid;
    else hi = mid;
  }
  return lo;
}

export function leverageAt(L: Linkage, yMm: number): number {
  const i = segmentAt(L, yMm);
  if (i >= L.y.length - 1) return L.r[L.r.length - 1]!;
  return L.r[i]! + slopeOf(L.y, L.r, i) * (yMm - L.y[i]!);
}

/** d(ratio)/dy on the segment holding y (0 past the end, where the ratio is held constant). */
export function leverageSlopeAt(L: Linkage, yMm: number): number {
  const i = segmentAt(L, yMm);
  return i >= L.y.length - 1 ? 0 : slopeOf(L.y, L.r, i);
}

/** Shock travel x(y) = ∫₀ʸ du / LR(u), exact per linear piece. */
export function travelAt(L: Linkage, yMm: number): number {
  const i = segmentAt(L, yMm);
  const last = i >= L.y.length - 1;
  return L.x[i]! + segmentIntegral(L.r[i]!, last ? 0 : slopeOf(L.y, L.r, i), yMm - L.y[i]!);
}

/** Virtual work: F_w·dy = F_s·dx, so F_w = k(p + x(y)) / LR(y). */
export function wheelForceAt(L: Linkage, rateNmm: number, preloadMm: number, yMm: number): number {
  return (rateNmm * (preloadMm + travelAt(L, yMm))) / leverageAt(L, yMm);
}

/** Wheel rate dF_w/dy = k(1 − (p + x)·LR') / LR² (derivative of the line above, dx/dy = 1/LR). */
export function wheelRateAt(L: Linkage, rateNmm: number, preloadMm: number, yMm: number): number {
  const lr = leverageAt(L, yMm);
  return (rateNmm * (1 - (preloadMm + travelAt(L, yMm)) * leverageSlopeAt(L, yMm))) / (lr * lr);
}

export function solveSag(L: Linkage, rateNmm: number, preloadMm: number, loadN: number, travelMm: number): SagSolution {
  return firstCrossing((y) => wheelForceAt(L, rateNmm, preloadMm, y), loadN, travelMm, L.y);
}

/** Preload that puts sag exactly at y under load W: from W = k(p + x(y))/LR(y). */
export function preloadForSag(L: Linkage, rateNmm: number, loadN: number, sagMm: number): number {
  return (loadN * leverageAt(L, sagMm)) / rateNmm - travelAt(L, sagMm);
}

/** Full travel per the curve: its last point. */
const curveEnd = (L: Linkage): number => L.y[L.y.length - 1]!;

// ---- public helpers (public API: callers outside the engine rely on these names) ----

export function shockTravelAtMm(curve: readonly LeveragePoint[], wheelTravelMm: number): number {
  requireNumbers({ wheelTravelMm }, { wheelTravelMm: "nonnegative" });
  return travelAt(prepareLinkage(curve), wheelTravelMm);
}

export function rearWheelForceN(a: {
  curve: readonly LeveragePoint[];
  rateNmm: number;
  preloadMm: number;
  wheelTravelMm: number;
}): number {
  requireNumbers(a, { rateNmm: "positive", preloadMm: "finite", wheelTravelMm: "nonnegative" });
  return wheelForceAt(prepareLinkage(a.curve), a.rateNmm, a.preloadMm, a.wheelTravelMm);
}

/** Sag under a load; 0 when preload alone holds it, the curve's last point when it bottoms. */
export function solveRearSagMm(a: {
  curve: readonly LeveragePoint[];
  rateNmm: number;
  preloadMm: number;
  loadN: number;
}): number {
  requireNumbers(a, { rateNmm: "positive", preloadMm: "finite", loadN: "positive" });
  const L = prepareLinkage(a.curve);
  return solveSag(L, a.rateNmm, a.preloadMm, a.loadN, curveEnd(L)).sagMm;
}

/**
 * Ideal spring from race and static sag targets (lib/sizing/README.md):
 * k* = (W_rr·LR(y_r) − W_rs·LR(y_s)) / (x(y_r) − x(y_s)),  p* = W_rr·LR(y_r)/k* − x(y_r).
 * Both equations are W = k(p + x)/LR written at the two sags and subtracted.
 */
export function idealRearSpring(a: {
  curve: readonly LeveragePoint[];
  staticLoadN: number;
  raceLoadN: number;
  staticSagMm: number;
  raceSagMm: number;
}): { rateNmm: number; preloadMm: number } {
  requireNumbers(a, {
    staticLoadN: "positive",
    raceLoadN: "positive",
    staticSagMm: "nonnegative",
    raceSagMm: "positive",
  });
  if (!(a.raceSagMm > a.staticSagMm))
    throw new SizingInputError([{ path: "raceSagMm", message: "Race sag must be larger than static sag" }]);
  if (!(a.raceLoadN > a.staticLoadN))
    throw new SizingInputError([{ path: "raceLoadN", message: "Race load must be larger than static load" }]);
  return idealSpringOn(prepareLinkage(a.curve), a.staticLoadN, a.raceLoadN, a.staticSagMm, a.raceSagMm, "curve");
}

export function idealSpringOn(
  L: Linkage,
  staticLoadN: number,
  raceLoadN: number,
  staticSagMm: number,
  raceSagMm: number,
  path: string,
): { rateNmm: number; preloadMm: number } {
  const rateNmm = twoSagRate(L, staticLoadN, raceLoadN, staticSagMm, raceSagMm);
  if (!(rateNmm > 0) || !Number.isFinite(rateNmm))
    throw new SizingInputError([
      { path, message: "No spring can meet both sag targets on this leverage curve (ratio rises too fast)" },
    ]);
  return { rateNmm, preloadMm: preloadForSag(L, rateNmm, raceLoadN, raceSagMm) };
}

/** k* = (W_rr·LR(y_r) − W_rs·LR(y_s)) / (x(y_r) − x(y_s)); may be ≤ 0 when the targets are impossible. */
export function twoSagRate(
  L: Linkage,
  staticLoadN: number,
  raceLoadN: number,
  staticSagMm: number,
  raceSagMm: number,
): number {
  const num = raceLoadN * leverageAt(L, raceSagMm) - staticLoadN * leverageAt(L, staticSagMm);
  return num / (travelAt(L, raceSagMm) - travelAt(L, staticSagMm));
}
