// Bodies of the staff review endpoints (app/api/requests/[id]/**).
import { z } from "zod";
import { text } from "./text";
import { setupOverridesSchema } from "@/lib/sizing";

const notes = (field: string) => text().trim().max(4000, `Keep the ${field} under 4000 characters`).nullish();

export const saveRecommendationSchema = z.object({
  /** The version the tuner was editing; a newer save by someone else answers 409 instead of overwriting. */
  basedOnVersion: z.number().int().min(1, "basedOnVersion starts at 1"),
  overrides: setupOverridesSchema,
  notesForRider: notes("notes for the rider"),
  internalNotes: notes("internal notes"),
});
export type SaveRecommendationBody = z.output<typeof saveRecommendationSchema>;

export const askRiderSchema = z.object({
  question: text()
    .trim()
    .min(5, "Write the question (at least 5 characters)")
    .max(2000, "Keep the question under 2000 characters"),
});

export const declineSchema = z.object({
  reason: text()
    .trim()
    .min(5, "Give the rider a reason (at least 5 characters)")
    .max(2000, "Keep the reason under 2000 characters"),
});

export const assignSchema = z.object({
  /** A staff user id, or null to unassign. */
  tunerId: text().trim().min(1, "Pick a tuner").max(100).nullable(),
});

export const approveSchema = z.object({
  /** Optional: approve only if this is still the current draft (a stale screen answers 409). */
  version: z.number().int().min(1).optional(),
  /** Codes of the sanity warnings the tuner has checked; every one on the version must be here. */
  acknowledgedWarnings: z.array(z.string().max(80, "Not a warning code")).max(50, "At most 50 warnings").optional(),
});

/** "Start review" `{}` or "Take" `{ take: true }`. */
export const startReviewSchema = z.object({
  take: z.boolean({ error: "take is true or false" }).optional(),
});
