import { z } from "zod";
import { text } from "./text";

/** Query of GET /api/requests/[id]/sheet. */
export const sheetQuerySchema = z.object({
  version: z
    .string({ error: "Give the version number" })
    .regex(/^[1-9]\d{0,5}$/, "Must be a whole number from 1")
    .transform(Number),
  token: text().min(1, "Must not be empty").max(200, "Is too long").optional(),
  preview: z
    .enum(["0", "1"], { error: "Must be 1 or 0" })
    .optional()
    .transform((v) => v === "1"),
});
