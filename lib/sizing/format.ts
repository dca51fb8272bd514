/** Numbers in messages: fixed decimals, never "NaN" leaking into text shown to riders. */
export function fmt(v: number, digits: number): string {
  return Number.isFinite(v) ? v.toFixed(digits) : "—";
}
