// Calibrations of a catalog model fitted from the shop's own sag reports (lib/sizing's
// fitCalibration) and applied by the admin. History is kept: undoing or replacing one sets
// undone_at; at most one row per model is active (undone_at null), and only that one feeds new
// recommendations. Old recommendations keep the loads they were made with in their stored input.
import { sql } from "drizzle-orm";
import {
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";
import { user } from "./auth";
import { bikeModels } from "./shop";

export const bikeCalibrations = pgTable(
  "bike_calibrations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    bikeModelId: uuid("bike_model_id")
      .notNull()
      .references(() => bikeModels.id, { onDelete: "cascade" }),
    // Fitted parameters: sprung masses per end with the bike alone, and the rider's rear share.
    rearSprungKg: doublePrecision("rear_sprung_kg").notNull(),
    frontSprungKg: doublePrecision("front_sprung_kg").notNull(),
    riderRearShare: doublePrecision("rider_rear_share").notNull(),
    reports: integer("reports").notNull(),
    // The sag reports the fit used, so a later reader can see what it rested on.
    sagReportIds: jsonb("sag_report_ids").$type<string[]>().notNull().default([]),
    rmsBeforeMm: doublePrecision("rms_before_mm").notNull(),
    rmsAfterMm: doublePrecision("rms_after_mm").notNull(),
    appliedById: text("applied_by_id").references(() => user.id, { onDelete: "set null" }),
    // The admin's name at the time, kept when the account goes.
    appliedByLabel: text("applied_by_label").notNull(),
    appliedAt: timestamp("applied_at", { withTimezone: true }).notNull().defaultNow(),
    undoneById: text("undone_by_id").references(() => user.id, { onDelete: "set null" }),
    undoneByLabel: text("undone_by_label"),
    undoneAt: timestamp("undone_at", { withTimezone: true }),
  },
  (t) => [
    index("bike_calibrations_model_idx").on(t.bikeModelId, t.appliedAt),
    uniqueIndex("bike_calibrations_one_active_idx")
      .on(t.bikeModelId)
      .where(sql`${t.undoneAt} is null`),
  ],
);
