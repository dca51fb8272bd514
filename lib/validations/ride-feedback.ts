// After the first rides: how the bike rides now, per end (the request form's complaint list) and in
// the rider's words; and the tuner's one-step revision from it.
import { z } from "zod";
import { complaintSchema } from "@/lib/sizing/vocab";
import { statusTokenSchema } from "./status";
import { text } from "./text";

export const rideFeedbackSchema = z
  .object({
    token: statusTokenSchema,
    front: z.array(complaintSchema).max(8).default([]),
    rear: z.array(complaintSchema).max(8).default([]),
    notes: text().trim().max(2000, "Keep the notes under 2000 characters").optional(),
  })
  .superRefine((v, ctx) => {
    if (!v.front.length && !v.rear.length && !v.notes)
      ctx.addIssue({
        code: "custom",
        path: ["notes"],
        message: "Tick what you feel at either end, or tell us in your words",
      });
  });

export const rideRevisionSchema = z.object({
  feedbackId: z.uuid({ message: "Choose the rider's feedback to answer" }),
});

export type RideFeedbackInput = z.input<typeof rideFeedbackSchema>;
