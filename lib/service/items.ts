// The services the shop reminds riders of, and the shop's starting intervals. The hour and month
// figures are common practice for off-road forks and shocks (from memory, not from any standard or
// maker's manual): racing wears oil faster than trail riding, so motocross and supercross get
// shorter intervals. Each shop sets its own on /shop/settings/service; the rider's own manual wins.
import type { Discipline } from "@/lib/sizing";

export const SERVICE_ITEMS = ["fork-oil", "shock-service", "full-rebuild"] as const;
export type ServiceItem = (typeof SERVICE_ITEMS)[number];

export const SERVICE_ITEM_LABELS: Record<ServiceItem, string> = {
  "fork-oil": "Fork oil change",
  "shock-service": "Shock service (oil and gas)",
  "full-rebuild": "Full fork and shock rebuild",
};

/** "any" is the interval for every discipline without its own row. */
export type IntervalDiscipline = Discipline | "any";

export interface ServiceInterval {
  item: ServiceItem;
  discipline: IntervalDiscipline;
  /** Engine hours between services. */
  hours: number;
  /** Calendar months between services whatever the hours (oil ages in the bike too); null: hours only. */
  months: number | null;
}

// Common practice (from memory), not from a standard: see the note at the top of this file.
export const DEFAULT_SERVICE_INTERVALS: readonly ServiceInterval[] = [
  { item: "fork-oil", discipline: "any", hours: 30, months: 12 },
  { item: "shock-service", discipline: "any", hours: 50, months: 12 },
  { item: "full-rebuild", discipline: "any", hours: 100, months: 24 },
  { item: "fork-oil", discipline: "motocross", hours: 15, months: 12 },
  { item: "shock-service", discipline: "motocross", hours: 25, months: 12 },
  { item: "full-rebuild", discipline: "motocross", hours: 50, months: 24 },
  { item: "fork-oil", discipline: "supercross", hours: 10, months: 12 },
  { item: "shock-service", discipline: "supercross", hours: 20, months: 12 },
  { item: "full-rebuild", discipline: "supercross", hours: 40, months: 24 },
];

/** Days before a due date the reminder goes out (common practice: two weeks to book a bench slot). */
export const DEFAULT_NOTICE_DAYS = 14;
export const DEFAULT_TIME_ZONE = "UTC";

/** Each item's interval for a discipline: its own row, else the "any" row. */
export function intervalsFor(
  discipline: string,
  intervals: readonly ServiceInterval[],
): { item: ServiceItem; hours: number; months: number | null }[] {
  return SERVICE_ITEMS.flatMap((item) => {
    const own = intervals.find((i) => i.item === item && i.discipline === discipline);
    const any = intervals.find((i) => i.item === item && i.discipline === "any");
    const chosen = own ?? any;
    return chosen ? [{ item, hours: chosen.hours, months: chosen.months }] : [];
  });
}
