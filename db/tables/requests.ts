// A rider's setup request and everything that hangs off it: recommendation versions, messages,
// uploads, sag reports, audit events and outbound e-mails.
import { sql } from "drizzle-orm";
import {
  bigint,
  bigserial,
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
// The status list lives beside its words, so validations need no database import (relative path:
// drizzle-kit loads this file without the "@/" alias).
import { REQUEST_STATUSES, type RequestStatus } from "../../lib/requests/status";
import type { Recommendation, SagVerdict, SetupOverrides, SizingInput } from "@/lib/sizing";
import type { RequestAnswers } from "@/lib/validations/request";
import type { SagReport } from "@/lib/validations/status";

type End = "front" | "rear";

/** A sag report as stored: the readings as the rider gave them, and per end in mm. */
export interface SagMeasured {
  asGiven: Omit<SagReport, "token">;
  mm: Partial<Record<End, { freeMm: number | null; staticMm: number; raceMm: number }>>;
}

export { REQUEST_STATUSES, type RequestStatus };

export const setupRequests = pgTable(
  "setup_requests",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    // Short number for people ("request 1042"); ids stay unguessable.
    number: bigserial("number", { mode: "number" }).notNull(),
    status: text("status").$type<RequestStatus>().notNull().default("submitted"),
    riderName: text("rider_name").notNull(),
    // Stored lower-cased: "my requests" and the magic-link sign-in match on it.
    riderEmail: text("rider_email").notNull(),
    riderPhone: text("rider_phone"),
    riderUserId: text("rider_user_id").references(() => user.id, { onDelete: "set null" }),
    discipline: text("discipline").notNull(),
    skill: text("skill").notNull(),
    bikeModelId: uuid("bike_model_id").references(() => bikeModels.id, { onDelete: "restrict" }),
    bikeClass: text("bike_class"),
    // Human label for lists and search: catalog name, or what the rider typed when not listed.
    bikeLabel: text("bike_label").notNull(),
    bikeYear: integer("bike_year"),
    riderMassKg: doublePrecision("rider_mass_kg").notNull(),
    // Everything the rider answered, exactly as given (original units included).
    // As the rider sent them (lib/validations/request.ts); rows made by hand may hold less.
    answers: jsonb("answers").$type<Partial<RequestAnswers>>().notNull(),
    assignedTunerId: text("assigned_tuner_id").references(() => user.id, { onDelete: "set null" }),
    declineReason: text("decline_reason"),
    // Lower-cased rider name, e-mail and bike for the queue's search; a trigram index serves
    // "contains" searches without scanning the table.
    searchText: text("search_text").generatedAlwaysAs(
      sql`lower(rider_name || ' ' || rider_email || ' ' || bike_label)`,
    ),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("setup_requests_number_idx").on(t.number),
    // Queue: filter by status, newest first; and the plain newest-first listing. The queue picks a
    // page's ids before reading its rows (db/queries/requests.ts), and the id as the last column
    // lets that walk, past a deep offset too, read the index alone (an index-only scan).
    index("setup_requests_status_created_idx").on(t.status, t.createdAt, t.id),
    index("setup_requests_created_idx").on(t.createdAt, t.id),
    index("setup_requests_email_idx").on(t.riderEmail),
    index("setup_requests_tuner_idx").on(t.assignedTunerId, t.createdAt, t.id),
    index("setup_requests_discipline_idx").on(t.discipline, t.createdAt, t.id),
    index("setup_requests_bike_class_idx").on(t.bikeClass, t.createdAt, t.id),
    // Discipline and class together, the queue's usual pair of filters, newest first.
    index("setup_requests_discipline_class_idx").on(t.discipline, t.bikeClass, t.createdAt, t.id),
    index("setup_requests_rider_name_idx").on(sql`lower(${t.riderName})`),
    // Without a pending list (GIN's fastupdate): new rows go straight into the index, so a search
    // never scans rows that only VACUUM or autoanalyze would have merged in (PostgreSQL manual, GIN
    // "fast update technique"; PGlite runs no autovacuum at all).
    index("setup_requests_search_idx")
      .using("gin", sql`${t.searchText} gin_trgm_ops`)
      .with({ fastupdate: false }),
  ],
);

/**
 * How many requests are in each status, kept by triggers on setup_requests (migration
 * 0007_request_status_counts) in the writer's own transaction: the queue's totals and its per-status
 * counts read these five rows instead of counting every request (docs/architecture.md, "What a
 * request costs").
 */
export const requestStatusCounts = pgTable("request_status_counts", {
  status: text("status").$type<RequestStatus>().primaryKey(),
  n: bigint("n", { mode: "number" }).notNull().default(0),
});

/**
 * Private status links. Each e-mail to the rider carries a link with a fresh long random token; only
 * its SHA-256 is stored, so a database leak leaks no working link, and every link sent stays valid.
 */
export const statusLinks = pgTable(
  "status_links",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    requestId: uuid("request_id")
      .notNull()
      .references(() => setupRequests.id, { onDelete: "cascade" }),
    tokenHash: text("token_hash").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    lastUsedAt: timestamp("last_used_at", { withTimezone: true }),
  },
  (t) => [uniqueIndex("status_links_token_idx").on(t.tokenHash), index("status_links_request_idx").on(t.requestId)],
);

export const VERSION_STATES = ["draft", "approved", "superseded"] as const;
export type VersionState = (typeof VERSION_STATES)[number];

export const recommendationVersions = pgTable(
  "recommendation_versions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    requestId: uuid("request_id")
      .notNull()
      .references(() => setupRequests.id, { onDelete: "cascade" }),
    version: integer("version").notNull(),
    state: text("state").$type<VersionState>().notNull().default("draft"),
    engineVersion: text("engine_version").notNull(),
    // The engine's full input (SI) and output, so a version can be reproduced and explained.
    input: jsonb("input").$type<SizingInput>().notNull(),
    output: jsonb("output").$type<Recommendation>().notNull(),
    // What the tuner changed against the engine's proposal.
    overrides: jsonb("overrides").$type<SetupOverrides>().notNull().default({}),
    notesForRider: text("notes_for_rider"),
    internalNotes: text("internal_notes"),
    createdById: text("created_by_id").references(() => user.id, { onDelete: "set null" }),
    approvedById: text("approved_by_id").references(() => user.id, { onDelete: "set null" }),
    approvedAt: timestamp("approved_at", { withTimezone: true }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("recommendation_versions_request_version_idx").on(t.requestId, t.version)],
);

export const requestMessages = pgTable(
  "request_messages",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    requestId: uuid("request_id")
      .notNull()
      .references(() => setupRequests.id, { onDelete: "cascade" }),
    // "tuner" asks, "rider" answers.
    author: text("author").notNull(),
    authorUserId: text("author_user_id").references(() => user.id, { onDelete: "set null" }),
    body: text("body").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("request_messages_request_idx").on(t.requestId, t.createdAt)],
);

export const uploads = pgTable(
  "uploads",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    requestId: uuid("request_id")
      .notNull()
      .references(() => setupRequests.id, { onDelete: "cascade" }),
    storageKey: text("storage_key").notNull(),
    sha256: text("sha256").notNull(),
    // Kept only as text for display; never used to build a path or a content type.
    originalName: text("original_name").notNull(),
    contentType: text("content_type").notNull(),
    sizeBytes: integer("size_bytes").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("uploads_request_idx").on(t.requestId)],
);

export const sagReports = pgTable(
  "sag_reports",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    requestId: uuid("request_id")
      .notNull()
      .references(() => setupRequests.id, { onDelete: "cascade" }),
    versionId: uuid("version_id").references(() => recommendationVersions.id, {
      onDelete: "set null",
    }),
    // Measurements as the rider gave them (values and unit) and in mm.
    measured: jsonb("measured").$type<SagMeasured>().notNull(),
    verdict: jsonb("verdict").$type<Partial<Record<End, SagVerdict>>>().notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("sag_reports_request_idx").on(t.requestId, t.createdAt)],
);

export const auditEvents = pgTable(
  "audit_events",
  {
    id: bigserial("id", { mode: "number" }).primaryKey(),
    requestId: uuid("request_id").references(() => setupRequests.id, { onDelete: "cascade" }),
    actorUserId: text("actor_user_id").references(() => user.id, { onDelete: "set null" }),
    // "rider", "system", or the staff member's name at the time.
    actorLabel: text("actor_label").notNull(),
    action: text("action").notNull(),
    detail: jsonb("detail").$type<Record<string, unknown>>().notNull().default({}),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("audit_events_request_idx").on(t.requestId, t.createdAt),
    index("audit_events_created_idx").on(t.createdAt),
  ],
);

export const EMAIL_STATUSES = ["queued", "sent", "failed"] as const;
export type EmailStatus = (typeof EMAIL_STATUSES)[number];

/** An attachment as the outbox keeps it until the message is sent (content in base64). */
export interface StoredAttachment {
  filename: string;
  contentBase64: string;
  contentType?: string;
}

/** Who caused a rider e-mail: the worker writes the email.sent / email.failed audit event in their name. */
export interface EmailAuditActor {
  actorUserId: string | null;
  actorLabel: string;
}

// The e-mail outbox and the record of every message: a row is written in the same transaction as
// the change it reports ('queued'), and a worker sends it after the commit (lib/mail/outbox.ts):
// 'sent' with the provider's id, or 'failed' after the last attempt. The body is kept only until
// then. claimed_until is the lease of the worker sending it, so a crashed worker's rows are retried.
export const outboundEmails = pgTable(
  "outbound_emails",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    requestId: uuid("request_id").references(() => setupRequests.id, { onDelete: "set null" }),
    template: text("template").notNull(),
    toAddress: text("to_address").notNull(),
    subject: text("subject").notNull(),
    status: text("status").$type<EmailStatus>().notNull().default("queued"),
    providerMessageId: text("provider_message_id"),
    attempts: integer("attempts").notNull().default(0),
    lastError: text("last_error"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    sentAt: timestamp("sent_at", { withTimezone: true }),
    html: text("html"),
    textBody: text("text_body"),
    replyTo: text("reply_to"),
    attachments: jsonb("attachments").$type<StoredAttachment[]>(),
    // Sent with every attempt: a retry after a lost answer is not delivered twice by the provider.
    idempotencyKey: text("idempotency_key")
      .notNull()
      .default(sql`('sagwise-outbound-' || gen_random_uuid()::text)`),
    nextAttemptAt: timestamp("next_attempt_at", { withTimezone: true }).notNull().defaultNow(),
    claimedUntil: timestamp("claimed_until", { withTimezone: true }),
    claimedBy: text("claimed_by"),
    audit: jsonb("audit").$type<EmailAuditActor>(),
  },
  (t) => [
    index("outbound_emails_request_idx").on(t.requestId, t.createdAt),
    index("outbound_emails_due_idx").on(t.status, t.nextAttemptAt),
    uniqueIndex("outbound_emails_idempotency_key_idx").on(t.idempotencyKey),
  ],
);
