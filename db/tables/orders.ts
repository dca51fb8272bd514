// After the sheet: the order a rider places from an approved recommendation, its quote lines, the
// stages it walks through in the workshop, parts out at outside finishers, payments and refunds,
// and the shop's price list, finishers and order settings. Money is integer minor units of the
// order's currency (cents for EUR), never floats; the rounding rule is in lib/orders/money.ts.
import {
  bigserial,
  boolean,
  date,
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
import { user } from "./auth";
import { recommendationVersions, setupRequests } from "./requests";
// Relative path: drizzle-kit loads this file without the "@/" alias.
import type { OrderStage, PaymentStatus, PriceKind, ServiceType } from "../../lib/orders/stages";

/** Order settings: one row, as shop_settings. */
export const orderSettings = pgTable("order_settings", {
  id: smallint("id").primaryKey().default(1),
  // ISO 4217 code, e.g. "EUR"; amounts are in its minor unit.
  currency: text("currency").notNull().default("EUR"),
  // Tax as a rate in basis points (2000 = 20.00 %), added on top of the net line prices.
  taxRateBp: integer("tax_rate_bp").notNull().default(0),
  // "full": the rider pays the whole total; "deposit": depositPercent of it first.
  paymentMode: text("payment_mode").$type<"full" | "deposit">().notNull().default("full"),
  depositPercent: integer("deposit_percent").notNull().default(30),
  // The stages at which the rider gets an e-mail.
  notifyStages: jsonb("notify_stages").$type<OrderStage[]>().notNull().default(["received", "shipped"]),
  packingInstructions: text("packing_instructions"),
  updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
});

export const priceItems = pgTable(
  "price_items",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    // Stable key for the lines the app adds by itself (e.g. "spring-fork", "service-send-in").
    code: text("code").notNull(),
    label: text("label").notNull(),
    kind: text("kind").$type<PriceKind>().notNull(),
    unitPriceMinor: integer("unit_price_minor").notNull(),
    active: boolean("active").notNull().default(true),
    sortOrder: integer("sort_order").notNull().default(0),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("price_items_code_idx").on(t.code)],
);

export const finishers = pgTable("finishers", {
  id: uuid("id").primaryKey().defaultRandom(),
  name: text("name").notNull(),
  // What they do: "hard anodising of fork tubes", "spring polishing".
  work: text("work").notNull(),
  turnaroundDays: integer("turnaround_days").notNull().default(7),
  active: boolean("active").notNull().default(true),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
});

/** What was checked in: serial numbers and the condition as found. */
export interface CheckIn {
  serials: { part: string; serial: string }[];
  conditionNotes: string;
  checkedInAt: string;
  checkedInBy: string;
}

export const orders = pgTable(
  "orders",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    number: bigserial("number", { mode: "number" }).notNull(),
    requestId: uuid("request_id")
      .notNull()
      .references(() => setupRequests.id, { onDelete: "cascade" }),
    // The approved version the order was made from (its springs and figures).
    versionId: uuid("version_id").references(() => recommendationVersions.id, { onDelete: "set null" }),
    serviceType: text("service_type").$type<ServiceType>().notNull(),
    stage: text("stage").$type<OrderStage>().notNull().default("awaiting_parts"),
    currency: text("currency").notNull(),
    taxRateBp: integer("tax_rate_bp").notNull(),
    // "full" or "deposit" as the settings said when the order was made.
    paymentMode: text("payment_mode").$type<"full" | "deposit">().notNull().default("full"),
    depositPercent: integer("deposit_percent").notNull().default(0),
    acceptedAt: timestamp("accepted_at", { withTimezone: true }),
    paidMinor: integer("paid_minor").notNull().default(0),
    refundedMinor: integer("refunded_minor").notNull().default(0),
    paymentStatus: text("payment_status").$type<PaymentStatus>().notNull().default("unpaid"),
    assignedTunerId: text("assigned_tuner_id").references(() => user.id, { onDelete: "set null" }),
    dueOn: date("due_on", { mode: "string" }),
    inboundTracking: text("inbound_tracking"),
    checkIn: jsonb("check_in").$type<CheckIn>(),
    carrier: text("carrier"),
    trackingNumber: text("tracking_number"),
    shippedAt: timestamp("shipped_at", { withTimezone: true }),
    builtBy: text("built_by"),
    testedBy: text("tested_by"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("orders_number_idx").on(t.number),
    index("orders_request_idx").on(t.requestId, t.createdAt),
    index("orders_stage_idx").on(t.stage, t.dueOn),
  ],
);

export const orderLines = pgTable(
  "order_lines",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id, { onDelete: "cascade" }),
    priceItemId: uuid("price_item_id").references(() => priceItems.id, { onDelete: "set null" }),
    // "sheet": a spring the approved sheet chose; "price-list" or "manual": added by staff.
    source: text("source").$type<"sheet" | "price-list" | "manual">().notNull(),
    description: text("description").notNull(),
    quantity: integer("quantity").notNull(),
    unitPriceMinor: integer("unit_price_minor").notNull(),
    // For spring lines: end, rate and free length, so the build sheet can name the part to pick.
    spring: jsonb("spring").$type<{ end: "fork" | "shock"; rateNmm: number; freeLengthMm: number | null }>(),
    sortOrder: integer("sort_order").notNull().default(0),
  },
  (t) => [index("order_lines_order_idx").on(t.orderId, t.sortOrder)],
);

/** Stage history: the timeline the rider and the board read. */
export const orderEvents = pgTable(
  "order_events",
  {
    id: bigserial("id", { mode: "number" }).primaryKey(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id, { onDelete: "cascade" }),
    fromStage: text("from_stage").$type<OrderStage>(),
    toStage: text("to_stage").$type<OrderStage>().notNull(),
    actorLabel: text("actor_label").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("order_events_order_idx").on(t.orderId, t.createdAt)],
);

export const finisherJobs = pgTable(
  "finisher_jobs",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id, { onDelete: "cascade" }),
    finisherId: uuid("finisher_id")
      .notNull()
      .references(() => finishers.id, { onDelete: "restrict" }),
    part: text("part").notNull(),
    sentOn: date("sent_on", { mode: "string" }).notNull(),
    dueOn: date("due_on", { mode: "string" }).notNull(),
    backOn: date("back_on", { mode: "string" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("finisher_jobs_order_idx").on(t.orderId), index("finisher_jobs_due_idx").on(t.backOn, t.dueOn)],
);

/**
 * Money in and out through the payment service. A checkout session is one row (kind "charge"),
 * a refund another (kind "refund"); the provider's ids are unique, so a webhook delivered twice
 * finds its row already paid and changes nothing.
 */
export const payments = pgTable(
  "payments",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id, { onDelete: "cascade" }),
    kind: text("kind").$type<"charge" | "refund">().notNull(),
    // "open" (session created), "paid", "expired", "refunded" (refund done)
    status: text("status").notNull(),
    amountMinor: integer("amount_minor").notNull(),
    currency: text("currency").notNull(),
    providerSessionId: text("provider_session_id"),
    providerPaymentIntentId: text("provider_payment_intent_id"),
    providerRefundId: text("provider_refund_id"),
    reason: text("reason"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    paidAt: timestamp("paid_at", { withTimezone: true }),
  },
  (t) => [
    uniqueIndex("payments_session_idx").on(t.providerSessionId),
    uniqueIndex("payments_refund_idx").on(t.providerRefundId),
    index("payments_order_idx").on(t.orderId),
  ],
);

/** Webhook events already handled, by the provider's event id: a second delivery is a no-op. */
export const paymentEvents = pgTable("payment_events", {
  eventId: text("event_id").primaryKey(),
  type: text("type").notNull(),
  receivedAt: timestamp("received_at", { withTimezone: true }).notNull().defaultNow(),
});

/** Check-in photos; the file is in the photo store (lib/storage) under its storage key. */
export const orderPhotos = pgTable(
  "order_photos",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id, { onDelete: "cascade" }),
    storageKey: text("storage_key").notNull(),
    sha256: text("sha256").notNull(),
    originalName: text("original_name").notNull(),
    contentType: text("content_type").notNull(),
    sizeBytes: integer("size_bytes").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("order_photos_order_idx").on(t.orderId)],
);
