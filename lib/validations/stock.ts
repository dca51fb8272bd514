// A spring on the shelf: entered in any rate unit, stored in N/mm (convertRate, exact factors).
import { z } from "zod";
import { text } from "./text";
import { convertRate, rateUnitSchema } from "@/lib/sizing";

const optionalMm = (label: string, max: number) =>
  z
    .number()
    .positive(`${label} must be above 0`)
    .max(max, `${label} looks too large (max ${max} mm)`)
    .nullable()
    .optional();

export const springStockSchema = z
  .object({
    end: z.enum(["fork", "shock"], { message: "Choose fork or shock" }),
    rate: z.number({ message: "Enter the rate" }).positive("Rate must be above 0"),
    rateUnit: rateUnitSchema,
    quantity: z.number().int("Quantity is a whole number").min(0, "Quantity cannot be negative").max(999),
    freeLengthMm: optionalMm("Free length", 800),
    innerDiameterMm: optionalMm("Inner diameter", 120),
    fitNotes: text().trim().max(500).nullable().optional(),
  })
  .transform((s) => ({ ...s, rateNmm: convertRate(s.rate, s.rateUnit, "N/mm") }))
  .superRefine((s, ctx) => {
    // Same ceilings as the engine's bike schema: 50 N/mm per fork leg, 400 N/mm for a shock.
    const max = s.end === "fork" ? 50 : 400;
    if (s.rateNmm > max)
      ctx.addIssue({ code: "custom", path: ["rate"], message: `A ${s.end} spring above ${max} N/mm is not plausible` });
  });

export type SpringStockInput = z.input<typeof springStockSchema>;
