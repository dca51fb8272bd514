/**
 * Bracketed root finding for "where does force reach load". Force curves here are continuous but
 * need not be monotonic (a rising leverage ratio can make wheel force dip), so we walk the given
 * breakpoints to find the FIRST interval where force crosses the load, then refine inside it with
 * the Illinois variant of regula falsi (Dowell & Jarratt, BIT 11, 1971), which keeps the bracket.
 */
export type SagState = "ok" | "topped-out" | "bottomed";

export interface SagSolution {
  sagMm: number;
  state: SagState;
}

export function firstCrossing(
  force: (y: number) => number,
  loadN: number,
  travelMm: number,
  breakpoints: readonly number[],
): SagSolution {
  let a = 0;
  let ga = force(0) - loadN;
  // Preload alone holds the load: the end stays topped out (trade: "no sag, too much preload").
  if (ga >= 0) return { sagMm: 0, state: "topped-out" };
  const stops: number[] = [];
  for (const b of breakpoints) if (b > 0 && b < travelMm) stops.push(b);
  stops.push(travelMm);
  for (const b of stops) {
    const gb = force(b) - loadN;
    if (gb >= 0) return { sagMm: refine(force, loadN, a, b, ga, gb), state: "ok" };
    a = b;
    ga = gb;
  }
  return { sagMm: travelMm, state: "bottomed" };
}

function refine(force: (y: number) => number, loadN: number, a: number, b: number, ga: number, gb: number): number {
  if (gb === 0) return b;
  let side = 0;
  for (let i = 0; i < 100; i++) {
    const c = (a * gb - b * ga) / (gb - ga);
    const gc = force(c) - loadN;
    if (Math.abs(gc) < 1e-9 * Math.max(1, loadN) || b - a < 1e-10) return c;
    if (gc * gb > 0) {
      b = c;
      gb = gc;
      if (side === 1) ga /= 2;
      side = 1;
    } else {
      a = c;
      ga = gc;
      if (side === -1) gb /= 2;
      side = -1;
    }
  }
  return (a + b) / 2;
}

/**
 * x in [lo, hi] where an increasing fn(x) reaches target; the bracket is widened geometrically (×4,
 * at most 30 times) when the target lies outside it. null when no x > 0 gets there.
 */
export function solveIncreasing(fn: (x: number) => number, target: number, lo: number, hi: number): number | null {
  let a = lo;
  let b = hi;
  let ga = fn(a) - target;
  let gb = fn(b) - target;
  for (let i = 0; i < 30 && ga > 0; i++) {
    b = a;
    gb = ga;
    a /= 4;
    ga = fn(a) - target;
  }
  for (let i = 0; i < 30 && gb < 0; i++) {
    a = b;
    ga = gb;
    b *= 4;
    gb = fn(b) - target;
  }
  if (!(ga <= 0 && gb >= 0)) return null;
  if (ga === 0) return a;
  return refine(fn, target, a, b, ga, gb);
}
