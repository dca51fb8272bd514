// Each service's next due date, pure: from the day the suspension was last set up (the order's ship
// date where there is one, else the day the sheet was approved), the hours the rider logged since,
// and after the last log the rider's usual hours per month. Whichever of the hour and the month limit
// comes first decides. Month arithmetic: lib/service/civil-date.ts.
import { addDays, addMonths, daysBetween, earlier } from "./civil-date";
import type { ServiceItem } from "./items";

/** Mean Gregorian month: 146 097 days per 400 years / 4 800 months = 30.436875 days. */
export const MEAN_MONTH_DAYS = 146_097 / 4_800;

export interface HourLog {
  hours: number;
  /** The day ridden (the shop's calendar). */
  riddenOn: string;
}

export interface DueInput {
  /** The day the service clock starts (shop's calendar). */
  startedOn: string;
  /** The rider's usual riding, from the request; null or 0 when unknown. */
  hoursPerMonth: number | null | undefined;
  logs: readonly HourLog[];
  intervals: readonly { item: ServiceItem; hours: number; months: number | null }[];
}

export interface DueDate {
  item: ServiceItem;
  /** null: neither an hour estimate nor a month limit gives a date. */
  dueOn: string | null;
  /** Which limit gave the date. */
  by: "hours" | "months" | null;
  /** Hours logged since startedOn. */
  hoursLogged: number;
  intervalHours: number;
}

/** Logs from startedOn on, by day: a log before the start belongs to the previous service. */
function countedLogs(startedOn: string, logs: readonly HourLog[]) {
  return logs.filter((l) => l.riddenOn >= startedOn).sort((a, b) => (a.riddenOn < b.riddenOn ? -1 : 1));
}

/** The day the hours run out: the log that reached them, else projected at hoursPerMonth after the last log. */
function dueByHours(input: DueInput, intervalHours: number): string | null {
  const logs = countedLogs(input.startedOn, input.logs);
  let total = 0;
  for (const log of logs) {
    total += log.hours;
    // Rounded to a hundredth of an hour so 0.1 + 0.2 reaches 0.3.
    if (Math.round(total * 100) >= Math.round(intervalHours * 100)) return log.riddenOn;
  }
  const perMonth = input.hoursPerMonth ?? 0;
  if (!(perMonth > 0)) return null;
  const from = logs.at(-1)?.riddenOn ?? input.startedOn;
  // The first whole day by which the remaining hours are ridden at the usual rate.
  const days = Math.ceil(((intervalHours - total) / perMonth) * MEAN_MONTH_DAYS - 1e-9);
  return addDays(from, days);
}

export function nextDueDates(input: DueInput): DueDate[] {
  const hoursLogged = countedLogs(input.startedOn, input.logs).reduce((sum, l) => sum + l.hours, 0);
  return input.intervals.map(({ item, hours, months }) => {
    const byHours = dueByHours(input, hours);
    const byMonths = months ? addMonths(input.startedOn, months) : null;
    const dueOn = byHours && byMonths ? earlier(byHours, byMonths) : (byHours ?? byMonths);
    const by = dueOn === null ? null : dueOn === byHours ? "hours" : "months";
    return { item, dueOn, by, hoursLogged: Math.round(hoursLogged * 100) / 100, intervalHours: hours };
  });
}

export type DueState = "overdue" | "due-soon" | "later" | "unknown";

/** Where a due date stands today: past, within the notice period, later. */
export function dueState(dueOn: string | null, today: string, noticeDays: number): DueState {
  if (dueOn === null) return "unknown";
  if (dueOn < today) return "overdue";
  return daysBetween(today, dueOn) <= noticeDays ? "due-soon" : "later";
}
