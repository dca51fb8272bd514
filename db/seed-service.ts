// Demo service intervals and riding hours (invented): the shop starts on the common-practice
// intervals (lib/service/items.ts) and logs a few rides, so the due-soon list has riders whose
// services are due, overdue and far off. With the seeded requests (db/seed-data.ts):
// - r11 (supercross, 40 h a month, approved 14 days ago): fork oil overdue, shock service due soon;
// - r09 (motocross, 18 h a month): 12 h logged three days ago, so its fork oil falls due within days;
// - r10 (enduro, 14 h a month, approved 11 days ago): everything weeks away;
// - the 125 class riders (approved 40 to 75 days ago at 10 h a month): fork oil due or overdue, but
//   c04, whose springs shipped two days ago (db/seed-orders.ts), starts again from the ship date.
import { getDb } from "@/db/client";
import { insertServiceDefaults } from "@/db/queries/service";
import { serviceHourLogs } from "@/db/schema";
import { DEFAULT_NOTICE_DAYS, DEFAULT_SERVICE_INTERVALS, DEFAULT_TIME_ZONE } from "@/lib/service/items";
import { stableUuid } from "./seed-data";

const DEMO_LOGS = [
  { key: "r09", n: 1, hours: 12, daysAgo: 3 },
  { key: "r11", n: 1, hours: 4, daysAgo: 10 },
  { key: "r11", n: 2, hours: 5.5, daysAgo: 6 },
];

const dayAgo = (days: number) => new Date(Date.now() - days * 86_400_000).toISOString().slice(0, 10);

export async function seedService(): Promise<void> {
  await insertServiceDefaults({
    noticeDays: DEFAULT_NOTICE_DAYS,
    timeZone: DEFAULT_TIME_ZONE,
    intervals: DEFAULT_SERVICE_INTERVALS,
  });
  const db = await getDb();
  await db
    .insert(serviceHourLogs)
    .values(
      DEMO_LOGS.map((l) => ({
        id: stableUuid(`hours:${l.key}:${l.n}`),
        requestId: stableUuid(`request:${l.key}`),
        hours: l.hours,
        riddenOn: dayAgo(l.daysAgo),
      })),
    )
    .onConflictDoNothing();
}
