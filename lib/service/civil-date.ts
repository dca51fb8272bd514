// Calendar dates ("2026-03-29", ISO 8601) in the shop's time zone. A service falls due on a day, not
// at an instant: an instant is turned into the shop's local date once (Intl, IANA zone names), and all
// arithmetic after that is on calendar days, so a daylight-saving change (a 23 or 25 hour day) never
// moves a due date. Day numbers come from Date.UTC, which has no daylight saving.

const ISO_DAY = /^(\d{4})-(\d{2})-(\d{2})$/;
const MS_PER_DAY = 86_400_000;

/** True for a real calendar day written YYYY-MM-DD (rejects 2026-02-30). */
export function isCivilDate(value: string): boolean {
  const m = ISO_DAY.exec(value);
  if (!m) return false;
  const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
  const date = new Date(Date.UTC(y, mo - 1, d));
  return date.getUTCFullYear() === y && date.getUTCMonth() === mo - 1 && date.getUTCDate() === d;
}

/** True when the runtime knows this IANA time zone ("Europe/Berlin", "UTC"). */
export function isTimeZone(zone: string): boolean {
  try {
    new Intl.DateTimeFormat("en-US", { timeZone: zone });
    return zone.trim() !== "";
  } catch {
    return false;
  }
}

const formats = new Map<string, Intl.DateTimeFormat>();

/** The calendar date an instant falls on in `timeZone`. */
export function localDateOf(instant: Date, timeZone: string): string {
  let format = formats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat("en-US", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" });
    formats.set(timeZone, format);
  }
  const part = (type: string) => format.formatToParts(instant).find((p) => p.type === type)?.value ?? "";
  return `${part("year")}-${part("month")}-${part("day")}`;
}

function toDayNumber(day: string): number {
  const m = ISO_DAY.exec(day);
  if (!m) throw new RangeError(`Not a calendar date: ${day}`);
  return Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3])) / MS_PER_DAY;
}

function fromDayNumber(n: number): string {
  return new Date(n * MS_PER_DAY).toISOString().slice(0, 10);
}

export function addDays(day: string, days: number): string {
  return fromDayNumber(toDayNumber(day) + days);
}

/** Whole days from `from` to `to` (negative when `to` is earlier). */
export function daysBetween(from: string, to: string): number {
  return toDayNumber(to) - toDayNumber(from);
}

/**
 * Calendar months later, kept to the last day of a shorter month: 31 Jan + 1 month = 28 Feb (29 in a
 * leap year), 29 Feb 2028 + 12 months = 28 Feb 2029 (the usual "end of month" rule, as in
 * java.time's LocalDate.plusMonths).
 */
export function addMonths(day: string, months: number): string {
  const m = ISO_DAY.exec(day);
  if (!m) throw new RangeError(`Not a calendar date: ${day}`);
  const total = Number(m[1]) * 12 + Number(m[2]) - 1 + months;
  const year = Math.floor(total / 12);
  const month = total - year * 12;
  const lastDay = new Date(Date.UTC(year, month + 1, 0)).getUTCDate();
  return fromDayNumber(Date.UTC(year, month, Math.min(Number(m[3]), lastDay)) / MS_PER_DAY);
}

export const earlier = (a: string, b: string) => (a <= b ? a : b);
