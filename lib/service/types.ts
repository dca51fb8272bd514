// What pages and components show of a request's service dates (lib/service/overview.ts builds it).
import type { DueState } from "./due-dates";
import type { ServiceItem } from "./items";

export interface DueService {
  item: ServiceItem;
  label: string;
  dueOn: string | null;
  by: "hours" | "months" | null;
  state: DueState;
  intervalHours: number;
}

export interface ServiceOverview {
  requestId: string;
  /** The day the service clock started (shop's calendar) and from what. */
  startedOn: string;
  startedBy: "order-shipped" | "sheet-approved";
  today: string;
  hoursPerMonth: number | null;
  hoursLogged: number;
  logs: { id: string; hours: number; riddenOn: string }[];
  due: DueService[];
}

/** A line of the staff's due-soon list. */
export interface DueSoonRow {
  requestId: string;
  number: number;
  riderName: string;
  riderEmail: string;
  bikeLabel: string;
  item: ServiceItem;
  label: string;
  dueOn: string;
  state: DueState;
  lastContact: Date | null;
}

/** The request page's service history: the due dates, the hours logged and the reminders sent. */
export interface ServiceHistory {
  overview: ServiceOverview | null;
  reminders: {
    id: string;
    item: ServiceItem;
    label: string;
    dueOn: string;
    createdAt: Date;
    emailStatus: "queued" | "sent" | "failed" | null;
  }[];
}
