// How the bike rides after the first rides on an approved setup: the rider's complaints per end and
// words, against the version fitted, with the clicker changes the engine proposed from it
// (lib/sizing proposeClickerChanges) and, once the tuner sent them, the version that carries them.
import { integer, jsonb, pgTable, text, timestamp, uuid, index } from "drizzle-orm/pg-core";
import type { ClickerProposal, Complaint } from "@/lib/sizing";
import { recommendationVersions, setupRequests } from "./requests";

export const rideFeedback = pgTable(
  "ride_feedback",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    requestId: uuid("request_id")
      .notNull()
      .references(() => setupRequests.id, { onDelete: "cascade" }),
    versionId: uuid("version_id")
      .notNull()
      .references(() => recommendationVersions.id, { onDelete: "cascade" }),
    version: integer("version").notNull(),
    front: jsonb("front").$type<Complaint[]>().notNull(),
    rear: jsonb("rear").$type<Complaint[]>().notNull(),
    notes: text("notes"),
    proposal: jsonb("proposal").$type<ClickerProposal>().notNull(),
    /** The revised version the tuner sent with these changes; null until then. */
    revisedVersion: integer("revised_version"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("ride_feedback_request_idx").on(t.requestId, t.createdAt)],
);
