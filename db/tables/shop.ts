// What makes a shop's Sagwise its own: settings, bike catalog, springs on the shelf, setup targets
// and clicker rules. Engine-shaped data (bike spec, target values) is jsonb validated by the engine's
// zod schemas; the columns beside it are the ones the pages list, search and sort by.
import { sql } from "drizzle-orm";
import type { TargetRowValues } from "@/lib/requests/sizing-input";
import type { BikeSpecInput, ClickerRule } from "@/lib/sizing";
import {
  boolean,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  smallint,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";

export const shopSettings = pgTable("shop_settings", {
  // A single row: one installation serves one shop.
  id: smallint("id").primaryKey().default(1),
  name: text("name").notNull(),
  email: text("email").notNull(),
  phone: text("phone"),
  address: text("address"),
  website: text("website"),
  // "metric" | "imperial": what forms and sheets show first.
  units: text("units").notNull().default("metric"),
  // "A4" | "LETTER"
  paperSize: text("paper_size").notNull().default("A4"),
  sheetFooter: text("sheet_footer"),
  gearMassKg: doublePrecision("gear_mass_kg").notNull().default(8),
  // Window for the front/rear natural-frequency ratio (engine default: lib/sizing/defaults.ts).
  frequencyRatioMin: doublePrecision("frequency_ratio_min").notNull().default(0.8),
  frequencyRatioMax: doublePrecision("frequency_ratio_max").notNull().default(1.8),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});

export const bikeModels = pgTable(
  "bike_models",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    slug: text("slug").notNull(),
    name: text("name").notNull(),
    // Generic class, e.g. "mx-450-4t"; used by the queue's bike-class filter.
    bikeClass: text("bike_class").notNull(),
    yearFrom: integer("year_from"),
    yearTo: integer("year_to"),
    // True for the catalog's generic classes shipped with typical (not maker) values.
    isTypical: boolean("is_typical").notNull().default(false),
    forkKind: text("fork_kind").notNull(),
    rearWheelTravelMm: doublePrecision("rear_wheel_travel_mm").notNull(),
    // The whole engine-facing description (masses, leverage-ratio points, fork data, clickers),
    // validated by lib/sizing's bikeSpecSchema on every write.
    spec: jsonb("spec").$type<BikeSpecInput>().notNull(),
    notes: text("notes"),
    // What the rider needs in the garage, printed on the sheet where known: the fork oil's type as
    // the shop names it, and the volume in each leg (ml). Not engine data.
    forkOilType: text("fork_oil_type"),
    forkOilVolumeMl: doublePrecision("fork_oil_volume_ml"),
    // The workshop's own build notes for this model (printed on an order's build sheet).
    buildNotes: text("build_notes"),
    retiredAt: timestamp("retired_at", { withTimezone: true }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("bike_models_slug_idx").on(t.slug),
    index("bike_models_name_idx").on(sql`lower(${t.name})`),
    index("bike_models_class_idx").on(t.bikeClass),
  ],
);

export const springStock = pgTable(
  "spring_stock",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    // "fork" | "shock"
    end: text("end").notNull(),
    rateNmm: doublePrecision("rate_n_mm").notNull(),
    quantity: integer("quantity").notNull().default(0),
    freeLengthMm: doublePrecision("free_length_mm"),
    innerDiameterMm: doublePrecision("inner_diameter_mm"),
    fitNotes: text("fit_notes"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("spring_stock_end_rate_idx").on(t.end, t.rateNmm)],
);

export const setupTargets = pgTable(
  "setup_targets",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    discipline: text("discipline").notNull(),
    skill: text("skill").notNull(),
    // Sag targets, rear share, rate and bottoming factors, shaped by lib/sizing's targets schema.
    values: jsonb("values").$type<TargetRowValues>().notNull(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("setup_targets_discipline_skill_idx").on(t.discipline, t.skill)],
);

export const clickerRules = pgTable(
  "clicker_rules",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    // Trigger (complaint, terrain or rate change), clicker, change and reason: lib/sizing's
    // clickerRuleSchema, validated on every write.
    rule: jsonb("rule").$type<ClickerRule>().notNull(),
    sortOrder: integer("sort_order").notNull().default(0),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("clicker_rules_order_idx").on(t.sortOrder)],
);

// One row: a random token the database replaces on every write to the shop-wide tables above and
// bike_calibrations (statement triggers, migration 0006_shop_data_epoch). A process that keeps a copy
// of those tables reads this one row to know whether its copy is still current, whichever process or
// script made the change (db/queries/shop-data-cache.ts).
export const shopDataEpoch = pgTable("shop_data_epoch", {
  id: smallint("id").primaryKey().default(1),
  epoch: uuid("epoch").notNull().defaultRandom(),
});
