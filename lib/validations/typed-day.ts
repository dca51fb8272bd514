// A calendar day as people type it into a filter: "2026-11-25", "25.11.2026", "25/11/26",
// "11/25/2026", "25 Nov 2026", "Nov 25, 2026", or digits alone ("25112026", "11252026", "20261125").
// Day first, as the app writes dates (lib/format.ts, en-GB), unless only month first makes a real
// date. Answers the ISO day (YYYY-MM-DD) the queue's API takes, or null when it is no real date.

const MONTHS = ["jan", "feb", "mar", "apr", "may", "jun", "jul", "aug", "sep", "oct", "nov", "dec"];

function iso(y: number, m: number, d: number): string | null {
  if (y < 100) y += 2000;
  if (y < 1900 || y > 2999 || m < 1 || m > 12 || d < 1) return null;
  const date = new Date(Date.UTC(y, m - 1, d));
  if (date.getUTCMonth() !== m - 1 || date.getUTCDate() !== d) return null;
  return date.toISOString().slice(0, 10);
}

/** Day first, else month first (11/25/2026), whichever is a real date. */
const dayOrMonthFirst = (a: number, b: number, y: number) => iso(y, b, a) ?? iso(y, a, b);

export function parseTypedDay(text: string): string | null {
  const t = text.trim().toLowerCase().replace(/,/g, " ").replace(/\s+/g, " ");
  if (!t) return null;
  let m = /^(\d{4})[-./ ](\d{1,2})[-./ ](\d{1,2})$/.exec(t);
  if (m) return iso(+m[1]!, +m[2]!, +m[3]!);
  m = /^(\d{1,2})[-./ ](\d{1,2})[-./ ](\d{2}|\d{4})$/.exec(t);
  if (m) return dayOrMonthFirst(+m[1]!, +m[2]!, +m[3]!);
  m = /^(\d{8})$/.exec(t);
  if (m) {
    const s = m[1]!;
    const [a, b, y] = [+s.slice(0, 2), +s.slice(2, 4), +s.slice(4)];
    const yearFirst = /^(19|20)/.test(s) ? iso(+s.slice(0, 4), +s.slice(4, 6), +s.slice(6)) : null;
    return yearFirst ?? dayOrMonthFirst(a, b, y);
  }
  const month = (word: string) => {
    const i = MONTHS.indexOf(word.slice(0, 3));
    return i < 0 ? null : i + 1;
  };
  m = /^(\d{1,2}) ([a-z]+)\.? (\d{2}|\d{4})$/.exec(t);
  if (m && month(m[2]!)) return iso(+m[3]!, month(m[2]!)!, +m[1]!);
  m = /^([a-z]+)\.? (\d{1,2}) (\d{2}|\d{4})$/.exec(t);
  if (m && month(m[1]!)) return iso(+m[3]!, month(m[1]!)!, +m[2]!);
  return null;
}
