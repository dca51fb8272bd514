// The shop's own wording of each rider e-mail (heading and opening paragraph), one row per
// template; no row, or an empty field, means the template's own words (emails/components/wording.ts).
import { pgTable, text, timestamp } from "drizzle-orm/pg-core";

export const emailWording = pgTable("email_wording", {
  template: text("template").primaryKey(),
  heading: text("heading"),
  intro: text("intro"),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  updatedBy: text("updated_by"),
});
