// What each approved setup is due for: the shop's intervals (or the common-practice defaults when the
// shop has saved none), its notice period and calendar, and per request the next due date of each
// service (lib/service/due-dates.ts) with where it stands today.
import {
  findOrderShipDates,
  getServiceSettings,
  listHourLogs,
  listReminders,
  listServiceIntervals,
  listServiceSubjects,
  type ServiceSubject,
} from "@/db/queries/service";
import { localDateOf } from "./civil-date";
import { dueState, nextDueDates } from "./due-dates";
import type { ServiceHistory, ServiceOverview } from "./types";

export type { DueService, ServiceOverview } from "./types";
import {
  DEFAULT_NOTICE_DAYS,
  DEFAULT_SERVICE_INTERVALS,
  DEFAULT_TIME_ZONE,
  SERVICE_ITEM_LABELS,
  intervalsFor,
  type ServiceInterval,
} from "./items";

export interface ServiceConfig {
  noticeDays: number;
  timeZone: string;
  intervals: ServiceInterval[];
  /** True while the shop runs on the common-practice defaults (nothing saved yet). */
  defaults: boolean;
}

export async function loadServiceConfig(): Promise<ServiceConfig> {
  const [settings, intervals] = await Promise.all([getServiceSettings(), listServiceIntervals()]);
  return {
    noticeDays: settings?.noticeDays ?? DEFAULT_NOTICE_DAYS,
    timeZone: settings?.timeZone ?? DEFAULT_TIME_ZONE,
    intervals: intervals.length ? intervals : [...DEFAULT_SERVICE_INTERVALS],
    defaults: intervals.length === 0,
  };
}

function overviewOf(
  subject: ServiceSubject & { approvedAt: Date },
  shippedAt: Date | undefined,
  logs: { id: string; hours: number; riddenOn: string }[],
  config: ServiceConfig,
  now: Date,
): ServiceOverview {
  // The clock starts when the suspension was last set up: the order's ship date where an order left
  // the workshop after the sheet was approved, else the approval itself (a later revised sheet the
  // rider fits at home restarts it too).
  const fromShipment = shippedAt !== undefined && shippedAt.getTime() > subject.approvedAt.getTime();
  const startedOn = localDateOf(fromShipment ? shippedAt : subject.approvedAt, config.timeZone);
  const today = localDateOf(now, config.timeZone);
  const hoursPerMonth = Number.isFinite(subject.hoursPerMonth) ? subject.hoursPerMonth : null;
  const dates = nextDueDates({
    startedOn,
    hoursPerMonth,
    logs,
    intervals: intervalsFor(subject.discipline, config.intervals),
  });
  return {
    requestId: subject.requestId,
    startedOn,
    startedBy: fromShipment ? "order-shipped" : "sheet-approved",
    today,
    hoursPerMonth,
    hoursLogged: dates[0]?.hoursLogged ?? 0,
    logs,
    due: dates.map((d) => ({
      item: d.item,
      label: SERVICE_ITEM_LABELS[d.item],
      dueOn: d.dueOn,
      by: d.by,
      state: dueState(d.dueOn, today, config.noticeDays),
      intervalHours: d.intervalHours,
    })),
  };
}

export interface ServiceRow {
  subject: ServiceSubject & { approvedAt: Date };
  overview: ServiceOverview;
}

/** Every approved setup (or one) with its due dates. */
export async function loadServiceRows(now = new Date(), requestId?: string): Promise<ServiceRow[]> {
  const subjects = (await listServiceSubjects(requestId)).filter(
    (s): s is ServiceSubject & { approvedAt: Date } => s.approvedAt !== null,
  );
  // No approved sheet (a request still in review): no clock runs, so the shop's intervals are not read.
  if (!subjects.length) return [];
  const config = await loadServiceConfig();
  const ids = subjects.map((s) => s.requestId);
  const [shipped, logs] = await Promise.all([findOrderShipDates(ids), listHourLogs(ids)]);
  return subjects.map((subject) => ({
    subject,
    overview: overviewOf(
      subject,
      shipped.get(subject.requestId),
      logs.filter((l) => l.requestId === subject.requestId).map(({ id, hours, riddenOn }) => ({ id, hours, riddenOn })),
      config,
      now,
    ),
  }));
}

/** One request's due dates, or null while it has no approved sheet. */
export async function loadServiceOverview(requestId: string, now = new Date()): Promise<ServiceOverview | null> {
  const [row] = await loadServiceRows(now, requestId);
  return row?.overview ?? null;
}

/** The request page's service history: hours logged and reminders sent, with the next due dates. */
export async function loadServiceHistory(requestId: string, now = new Date()): Promise<ServiceHistory> {
  const [overview, reminders] = await Promise.all([loadServiceOverview(requestId, now), listReminders([requestId])]);
  return {
    overview,
    reminders: reminders.map((r) => ({ ...r, label: SERVICE_ITEM_LABELS[r.item] ?? r.item })),
  };
}
