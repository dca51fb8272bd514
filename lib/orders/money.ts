// Order money in integer minor units (cents for EUR, yen for JPY), never floats.
//
// Prices on the price list and on quote lines are net; tax is added once on the order's subtotal:
//   tax = round(subtotal × rate)            with the rate in basis points (1 bp = 0.01 %)
//   total = subtotal + tax
//   deposit = round(total × depositPercent / 100)
// Rounding rule: half away from zero on minor units (a result exactly halfway between two cents
// goes to the one farther from zero), the "commercial rounding" most tax administrations accept for
// totals (e.g. the EU VAT Directive 2006/112/EC leaves the method to member states; the UK HMRC VAT
// Guide, Notice 700 §17.5, allows rounding to the nearest penny on invoice totals). Done in BigInt
// so no intermediate product is ever a float.

/** round(numerator / denominator), half away from zero, for integers. */
export function divRoundHalfAwayFromZero(numerator: bigint, denominator: bigint): bigint {
  if (denominator <= 0n) throw new RangeError("denominator must be positive");
  const negative = numerator < 0n;
  const n = negative ? -numerator : numerator;
  const quotient = n / denominator;
  const remainder = n % denominator;
  const rounded = remainder * 2n >= denominator ? quotient + 1n : quotient;
  return negative ? -rounded : rounded;
}

export interface LineAmount {
  quantity: number;
  unitPriceMinor: number;
}

export interface OrderTotals {
  subtotalMinor: number;
  taxMinor: number;
  totalMinor: number;
}

function safe(value: bigint, what: string): number {
  if (value > BigInt(Number.MAX_SAFE_INTEGER) || value < BigInt(Number.MIN_SAFE_INTEGER))
    throw new RangeError(`${what} is too large`);
  return Number(value);
}

export function lineTotalMinor(line: LineAmount): number {
  return safe(BigInt(line.quantity) * BigInt(line.unitPriceMinor), "line total");
}

export function orderTotals(lines: readonly LineAmount[], taxRateBp: number): OrderTotals {
  const subtotal = lines.reduce((sum, l) => sum + BigInt(l.quantity) * BigInt(l.unitPriceMinor), 0n);
  const tax = divRoundHalfAwayFromZero(subtotal * BigInt(taxRateBp), 10_000n);
  return {
    subtotalMinor: safe(subtotal, "subtotal"),
    taxMinor: safe(tax, "tax"),
    totalMinor: safe(subtotal + tax, "total"),
  };
}

export function depositMinor(totalMinor: number, depositPercent: number): number {
  return safe(divRoundHalfAwayFromZero(BigInt(totalMinor) * BigInt(depositPercent), 100n), "deposit");
}

/** Digits after the decimal point of a currency (2 for EUR, 0 for JPY), from the runtime's ISO 4217 data. */
export function currencyDigits(currency: string): number {
  return new Intl.NumberFormat("en", { style: "currency", currency }).resolvedOptions().maximumFractionDigits ?? 2;
}

/** "12,50" or "12.50" typed by a person → 1250 minor units; null when it is not an amount. */
export function parseMajorToMinor(text: string, currency: string): number | null {
  const digits = currencyDigits(currency);
  const cleaned = text.trim().replace(",", ".");
  const pattern = digits === 0 ? /^\d+$/ : new RegExp(`^\\d+(\\.\\d{1,${digits}})?$`);
  if (!pattern.test(cleaned)) return null;
  const [whole, frac = ""] = cleaned.split(".");
  return Number(whole) * 10 ** digits + Number(frac.padEnd(digits, "0") || "0");
}
