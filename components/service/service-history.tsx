// The request page's service part: the next due dates, the hours the rider logged, and every
// reminder e-mailed (what, for which due date, when, and how the e-mail went).
import { formatDateTime, formatDay, formatNumber } from "@/lib/format";
import type { ServiceHistory as History } from "@/lib/service/types";
import { DueList } from "./service-due-panel";

const civilDay = (day: string) => formatDay(`${day}T00:00:00Z`);

export function ServiceHistory({ history }: { history: History }) {
  const { overview, reminders } = history;
  return (
    <section aria-labelledby="service-history-heading" className="rounded-xl border border-stone-200 bg-white p-4">
      <h2 id="service-history-heading" className="mb-2 text-lg font-semibold">
        Service record
      </h2>
      {!overview ? (
        <p className="text-sm text-stone-600">Service dates start once a setup sheet is approved.</p>
      ) : (
        <div className="flex flex-col gap-3 text-sm">
          <p className="text-stone-700">
            Started {civilDay(overview.startedOn)} (
            {overview.startedBy === "order-shipped" ? "order shipped" : "sheet approved"}) ·{" "}
            {overview.hoursPerMonth ? `${overview.hoursPerMonth} h a month given` : "no hours per month given"} ·{" "}
            {formatNumber(overview.hoursLogged, 1)} h logged
          </p>
          <DueList due={overview.due} />
          <h3 className="font-semibold">Hours logged by the rider</h3>
          {overview.logs.length ? (
            <ul className="flex flex-col gap-1">
              {[...overview.logs].reverse().map((log) => (
                <li key={log.id}>
                  {civilDay(log.riddenOn)}: {formatNumber(log.hours, 1)} h
                </li>
              ))}
            </ul>
          ) : (
            <p className="text-stone-600">None yet.</p>
          )}
        </div>
      )}
      <h3 className="mt-3 mb-1 text-sm font-semibold">Reminders e-mailed</h3>
      {reminders.length ? (
        <ul className="flex flex-col gap-1 text-sm">
          {reminders.map((r) => (
            <li key={r.id}>
              {r.label}, due {civilDay(r.dueOn)}: queued {formatDateTime(r.createdAt)}
              {r.emailStatus ? ` · ${r.emailStatus}` : ""}
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-sm text-stone-600">No reminder sent yet.</p>
      )}
    </section>
  );
}
