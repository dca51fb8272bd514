// How dates and numbers are written on screen and in files: one module, on Intl. Dates are shown in
// UTC with the zone named, so the shop, the rider and the audit trail read the same time wherever
// the server or the browser runs (and a server-rendered page hydrates without a mismatch).
const DAY = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeZone: "UTC" });
const DAY_TIME = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" });

type DateLike = Date | string | number;

/** "2 Dec 2026" */
export const formatDay = (date: DateLike) => DAY.format(new Date(date));

/** "2 Dec 2026, 13:05 UTC" */
export const formatDateTime = (date: DateLike) => `${DAY_TIME.format(new Date(date))} UTC`;

/** "2026-12-02" (ISO 8601 calendar date, UTC): for file names and machine-read values. */
export const isoDay = (date: DateLike) => new Date(date).toISOString().slice(0, 10);

const numberFormats = new Map<number, Intl.NumberFormat>();

/** A figure with exactly `digits` decimals, a point as separator and no grouping ("1234.50"). */
export function formatNumber(value: number, digits: number): string {
  let format = numberFormats.get(digits);
  if (!format) {
    format = new Intl.NumberFormat("en-GB", {
      minimumFractionDigits: digits,
      maximumFractionDigits: digits,
      useGrouping: false,
    });
    numberFormats.set(digits, format);
  }
  // Intl writes "-0.0" for a tiny negative; a figure never shows a signed zero.
  return format.format(value).replace(/^-(0(\.0+)?)$/, "$1");
}

const moneyFormats = new Map<string, Intl.NumberFormat>();

/** "€1,234.50" from integer minor units (1234 50 cents) of an ISO 4217 currency. */
export function formatMoney(minor: number, currency: string): string {
  let format = moneyFormats.get(currency);
  if (!format) {
    format = new Intl.NumberFormat("en-GB", { style: "currency", currency });
    moneyFormats.set(currency, format);
  }
  const digits = format.resolvedOptions().maximumFractionDigits ?? 2;
  return format.format(minor / 10 ** digits);
}
