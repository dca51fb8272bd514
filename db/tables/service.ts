// Service intervals and reminders (docs/architecture.md, "Data"): the shop's intervals per item and
// discipline, its notice period and time zone, the hours riders log, and each reminder sent. A
// reminder is unique per request, item and due date, so the daily job can run any number of times
// (and on several instances at once) and still e-mail a rider once for each due service.
import {
  date,
  doublePrecision,
  index,
  integer,
  pgTable,
  smallint,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";
import { outboundEmails, setupRequests } from "./requests";
import type { IntervalDiscipline, ServiceItem } from "@/lib/service/items";

export const serviceSettings = pgTable("service_settings", {
  // A single row, like shop_settings.
  id: smallint("id").primaryKey().default(1),
  // Days before a due date the reminder goes out.
  noticeDays: integer("notice_days").notNull().default(14),
  // IANA zone name: due dates are days on the shop's calendar.
  timeZone: text("time_zone").notNull().default("UTC"),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});

export const serviceIntervals = pgTable(
  "service_intervals",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    item: text("item").$type<ServiceItem>().notNull(),
    // A discipline, or "any" for every discipline without its own row.
    discipline: text("discipline").$type<IntervalDiscipline>().notNull(),
    hours: doublePrecision("hours").notNull(),
    months: integer("months"),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("service_intervals_item_discipline_idx").on(t.item, t.discipline)],
);

export const serviceHourLogs = pgTable(
  "service_hour_logs",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    requestId: uuid("request_id")
      .notNull()
      .references(() => setupRequests.id, { onDelete: "cascade" }),
    hours: doublePrecision("hours").notNull(),
    // The day ridden, on the shop's calendar.
    riddenOn: date("ridden_on", { mode: "string" }).notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("service_hour_logs_request_idx").on(t.requestId, t.riddenOn)],
);

export const serviceReminders = pgTable(
  "service_reminders",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    requestId: uuid("request_id")
      .notNull()
      .references(() => setupRequests.id, { onDelete: "cascade" }),
    item: text("item").$type<ServiceItem>().notNull(),
    dueOn: date("due_on", { mode: "string" }).notNull(),
    outboundEmailId: uuid("outbound_email_id").references(() => outboundEmails.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("service_reminders_once_idx").on(t.requestId, t.item, t.dueOn)],
);
