// The staff's "due soon" list: every service overdue or due within the notice period, soonest first,
// with the rider, the bike and when the shop last e-mailed them.
import { lastEmailTo } from "@/db/queries/service";
import { loadServiceConfig, loadServiceRows } from "./overview";
import type { DueSoonRow } from "./types";

export async function listDueSoon(
  now = new Date(),
): Promise<{ items: DueSoonRow[]; noticeDays: number; timeZone: string }> {
  const [rows, config] = await Promise.all([loadServiceRows(now), loadServiceConfig()]);
  const lastContact = await lastEmailTo([...new Set(rows.map((r) => r.subject.riderEmail))]);
  const items = rows.flatMap(({ subject, overview }) =>
    overview.due
      .filter((d) => d.dueOn && (d.state === "overdue" || d.state === "due-soon"))
      .map((d): DueSoonRow => ({
        requestId: subject.requestId,
        number: subject.number,
        riderName: subject.riderName,
        riderEmail: subject.riderEmail,
        bikeLabel: subject.bikeLabel,
        item: d.item,
        label: d.label,
        dueOn: d.dueOn!,
        state: d.state,
        lastContact: lastContact.get(subject.riderEmail) ?? null,
      })),
  );
  items.sort((a, b) => (a.dueOn < b.dueOn ? -1 : a.dueOn > b.dueOn ? 1 : a.number - b.number));
  return { items, noticeDays: config.noticeDays, timeZone: config.timeZone };
}
