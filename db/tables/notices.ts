// What the shop has been told (lib/notify-staff.ts): one row per event staff should see (a new
// request, a rider's answer, a sag report, a payment), written in the event's own transaction with
// the e-mail it queues. Unseen rows are the counts on the workspace navigation and the marks in the
// queue; a staff member marks a request's notices seen with an action (a GET never writes).
import { index, jsonb, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { user } from "./auth";
import { setupRequests } from "./requests";

export const STAFF_NOTICE_KINDS = ["new-request", "rider-answered", "sag-reported", "payment-received"] as const;
export type StaffNoticeKind = (typeof STAFF_NOTICE_KINDS)[number];

export const staffNotices = pgTable(
  "staff_notices",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    requestId: uuid("request_id")
      .notNull()
      .references(() => setupRequests.id, { onDelete: "cascade" }),
    kind: text("kind").$type<StaffNoticeKind>().notNull(),
    // The address the e-mail went to: the assigned tuner's, or the shop's when nobody is assigned.
    toAddress: text("to_address").notNull(),
    // Small facts for the e-mail and the queue (e.g. the payment's amount in minor units).
    detail: jsonb("detail").$type<Record<string, string | number | null>>().notNull().default({}),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    seenAt: timestamp("seen_at", { withTimezone: true }),
    seenBy: text("seen_by").references(() => user.id, { onDelete: "set null" }),
  },
  (t) => [index("staff_notices_unseen_idx").on(t.seenAt, t.kind), index("staff_notices_request_idx").on(t.requestId)],
);
