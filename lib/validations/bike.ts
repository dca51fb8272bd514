// A catalog bike model: the engine's own bikeSpecSchema for the physics (it refuses a leverage curve
// whose integral misses the shock stroke, naming rear.shockStrokeMm), plus the columns the pages list.
import { z } from "zod";
import { text } from "./text";
import { typedNumber } from "./number";
import { bikeSpecSchema } from "@/lib/sizing";
export { STROKE_TOLERANCE_FRACTION, STROKE_TOLERANCE_MIN_MM } from "@/lib/sizing/bike-schema";

const slugPattern = /^[a-z0-9]+(?:-[a-z0-9]+)*$/;

/** "450 Trail Special 2024" → "450-trail-special-2024". */
export function slugify(text: string): string {
  return text
    .toLowerCase()
    .normalize("NFKD")
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 80);
}

const optionalYear = z
  .number()
  .int("Year must be a whole number")
  .min(1970, "Year looks too early")
  .max(2100, "Year looks too late")
  .nullable()
  .optional();

export const bikeModelSchema = z
  .object({
    name: text().trim().min(2, "Name the model (at least 2 characters)").max(120),
    slug: z
      .string()
      .trim()
      .max(80)
      .regex(slugPattern, "Use lower-case letters, digits and single dashes")
      .optional()
      .or(z.literal("").transform(() => undefined)),
    bikeClass: z
      .string()
      .trim()
      .min(2, "Choose the class, or name one of your own")
      .max(40, "Keep the class under 40 characters")
      .regex(slugPattern, "Use lower-case letters, digits and single dashes"),
    yearFrom: optionalYear,
    yearTo: optionalYear,
    notes: text().trim().max(2000).nullable().optional(),
    forkOilType: text().trim().max(80, "Keep the oil type under 80 characters").nullable().optional(),
    forkOilVolumeMl: typedNumber(
      z
        .number({ message: "Enter the oil volume per leg in ml, as a number" })
        .min(50, "Oil volume per leg looks too small (at least 50 ml)")
        .max(2000, "Oil volume per leg looks too large (at most 2000 ml)")
        .nullable()
        .optional(),
    ),
    spec: bikeSpecSchema,
  })
  .superRefine((b, ctx) => {
    if (b.yearFrom && b.yearTo && b.yearTo < b.yearFrom)
      ctx.addIssue({ code: "custom", path: ["yearTo"], message: "Must not be before the first year" });
  })
  .transform((b) => ({ ...b, slug: b.slug ?? slugify(b.name) }));

export type BikeModelInput = z.input<typeof bikeModelSchema>;
export type BikeModelValues = z.output<typeof bikeModelSchema>;

export const catalogQuerySchema = z.object({
  q: text().trim().max(100).optional(),
  retired: z.enum(["hide", "show", "only"]).default("hide"),
});

export const retireSchema = z.object({ retired: z.boolean() });
