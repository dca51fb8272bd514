/** Numbers in messages: fixed decimals, never "NaN" leaking into text shown to riders. */
export function fmt(v: number, digits: number): string {
  return Number.isFinite(v) ? v.toFixed(digits) : "—";
}

/** A rate as shops read it: N/mm with kgf/mm beside it (1 kgf = 9.80665 N, NIST SP 811). */
export function rateText(rateNmm: number, end: "front" | "rear"): string {
  return end === "front"
    ? `${fmt(rateNmm, 2)} N/mm (${fmt(rateNmm / 9.80665, 3)} kgf/mm)`
    : `${fmt(rateNmm, 1)} N/mm (${fmt(rateNmm / 9.80665, 2)} kgf/mm)`;
}
