// How figures are written on the setup sheet. Precision per figure is fixed here so the sheet, its
// tests and anyone reading it agree on what "the same figure" means.
import { INCH_MM, convertRate, type RateUnit } from "@/lib/sizing";

export function fixed(value: number, digits: number): string {
  if (!Number.isFinite(value)) return "–";
  // toFixed can print "-0.0" for tiny negatives; a sheet never shows a signed zero.
  const text = value.toFixed(digits);
  return /^-0(\.0+)?$/.test(text) ? text.slice(1) : text;
}

/** Decimals per rate unit: shock springs are tens of N/mm, fork springs a few N/mm per leg. */
export const RATE_DIGITS: Record<"fork" | "shock", Record<RateUnit, number>> = {
  shock: { "N/mm": 1, "kgf/mm": 2, "lbf/in": 0 },
  fork: { "N/mm": 2, "kgf/mm": 3, "lbf/in": 1 },
};

export interface RateParts {
  nMm: string;
  kgfMm: string;
  lbfIn: string;
}

/** A rate in N/mm, kgf/mm and lbf/in; every unit converted from N/mm with the exact NIST factors. */
export function rateParts(rateNmm: number, end: "fork" | "shock"): RateParts {
  const d = RATE_DIGITS[end];
  return {
    nMm: `${fixed(rateNmm, d["N/mm"])} N/mm`,
    kgfMm: `${fixed(convertRate(rateNmm, "N/mm", "kgf/mm"), d["kgf/mm"])} kgf/mm`,
    lbfIn: `${fixed(convertRate(rateNmm, "N/mm", "lbf/in"), d["lbf/in"])} lbf/in`,
  };
}

/** Millimetres, with inches beside them for shops that work in imperial units (1 in = 25.4 mm). */
export function length(mm: number, digits: number, imperial: boolean): string {
  const metric = `${fixed(mm, digits)} mm`;
  return imperial ? `${metric} (${fixed(mm / INCH_MM, 2)} in)` : metric;
}

export function turns(value: number): string {
  return `${fixed(value, 1)} ${Math.abs(value - 1) < 0.05 ? "turn" : "turns"}`;
}

/** Clicker counts as the adjuster is read: whole clicks, turns to the quarter. */
export function clickerCount(value: number, unit: "clicks" | "turns"): string {
  if (unit === "clicks") {
    const n = Math.round(value);
    return `${n} ${n === 1 ? "click" : "clicks"}`;
  }
  const text = fixed(value, 2).replace(/\.?0+$/, "");
  return `${text} ${text === "1" ? "turn" : "turns"}`;
}

const MONTHS = [
  "January",
  "February",
  "March",
  "April",
  "May",
  "June",
  "July",
  "August",
  "September",
  "October",
  "November",
  "December",
];

/** "2 December 2026", in UTC so the same instant prints the same day on every server. */
export function sheetDate(date: Date): string {
  return `${date.getUTCDate()} ${MONTHS[date.getUTCMonth()]} ${date.getUTCFullYear()}`;
}

/** Capitalises a phrase; codes get their words from lib/labels.ts instead. */
export function capitalise(text: string): string {
  return text ? text[0]!.toUpperCase() + text.slice(1).replace(/-/g, " ") : text;
}
