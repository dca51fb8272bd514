// The daily reminder job: for each approved setup, the services falling due within the shop's notice
// period (or already overdue) that have no reminder yet for that due date get one e-mail, queued in
// the outbox with the reminder rows in one transaction. The unique index on (request, item, due date)
// decides who sends: a second run, or a second instance running at the same time, finds the rows
// taken and queues nothing.
import { inTransaction } from "@/db/queries/transaction";
import { getShopName } from "@/db/queries/settings";
import { claimReminder, setReminderEmail } from "@/db/queries/service";
import { createStatusLink } from "@/db/queries/status-links";
import { appBaseUrl } from "@/lib/env";
import { formatDay } from "@/lib/format";
import { kickOutbox, queueTemplateEmail } from "@/lib/mail";
import { statusPath } from "@/lib/requests/token";
import { loadServiceRows, type ServiceRow } from "./overview";
import { startPeriodic } from "@/lib/periodic";

/** The new-request form with this bike chosen (/request?bike=<catalog id>); plain form when not listed. */
export function bookingUrl(bikeModelId: string | null): string {
  const base = `${appBaseUrl()}/request`;
  return bikeModelId ? `${base}?bike=${encodeURIComponent(bikeModelId)}` : base;
}

/** Only the latest approved setup of a rider's bike is reminded: an older request for it is history. */
function latestPerBike(rows: ServiceRow[]): ServiceRow[] {
  const seen = new Set<string>();
  return [...rows]
    .sort((a, b) => b.subject.approvedAt.getTime() - a.subject.approvedAt.getTime())
    .filter((r) => {
      const key = `${r.subject.riderEmail}|${r.subject.bikeModelId ?? r.subject.bikeLabel}`;
      if (seen.has(key)) return false;
      seen.add(key);
      return true;
    });
}

const civilDay = (day: string) => formatDay(`${day}T00:00:00Z`);

/** Queues the reminders due now; returns how many e-mails were queued. */
export async function queueDueReminders(now = new Date()): Promise<number> {
  const rows = latestPerBike(await loadServiceRows(now));
  let queued = 0;
  for (const { subject, overview } of rows) {
    const due = overview.due.filter((d) => d.dueOn && (d.state === "overdue" || d.state === "due-soon"));
    if (!due.length) continue;
    const sent = await inTransaction(async (tx) => {
      const claimed: { id: string; service: (typeof due)[number] }[] = [];
      for (const service of due) {
        const id = await claimReminder(tx, { requestId: subject.requestId, item: service.item, dueOn: service.dueOn! });
        if (id) claimed.push({ id, service });
      }
      if (!claimed.length) return false;
      const token = await createStatusLink(subject.requestId, tx);
      const mail = await queueTemplateEmail(
        tx,
        "service-reminder",
        {
          shopName: await getShopName(tx),
          riderName: subject.riderName,
          bikeLabel: subject.bikeLabel,
          services: claimed.map(({ service }) => ({
            label: service.label,
            dueDay: civilDay(service.dueOn!),
            overdue: service.state === "overdue",
          })),
          url: bookingUrl(subject.bikeModelId),
          statusUrl: `${appBaseUrl()}${statusPath(token)}`,
        },
        { to: subject.riderEmail, requestId: subject.requestId },
        { audit: { actorUserId: null, actorLabel: "system" } },
      );
      for (const { id } of claimed) await setReminderEmail(tx, id, mail.outboundEmailId);
      return true;
    });
    if (sent) queued += 1;
  }
  if (queued) kickOutbox();
  return queued;
}

const DAY_MS = 86_400_000;

/**
 * Runs the job once a little after the server starts and then every 24 hours, inside the app's own
 * process. Several instances may each run it: the unique reminder rows keep every e-mail single.
 */
export function startReminderScheduler(firstRunMs = 5 * 60_000): void {
  startPeriodic({ name: "service reminders", run: queueDueReminders, firstRunMs, everyMs: DAY_MS });
}
