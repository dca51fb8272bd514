import { z } from "zod";
import { clickerIdSchema, rateBasisSchema } from "./vocab";

// Every limit says itself in the shop's words (a person reads these in the editor).
const opt = (min: number, max: number, unit: string) =>
  z
    .number({ message: "Enter a number, or leave empty for the engine's choice" })
    .min(min, `At least ${min} ${unit}`)
    .max(max, `At most ${max} ${unit}`)
    .optional();

const sagOverrides = {
  raceSagMm: opt(1, 400, "mm"),
  staticSagMinMm: opt(0, 400, "mm"),
  staticSagMaxMm: opt(0, 400, "mm"),
};

/** A tuner's edits; every field optional, anything absent keeps the engine's own choice. */
export const setupOverridesSchema = z.object({
  /** The tuner's choice of rate basis for this request; absent: the shop's default. */
  rateBasis: rateBasisSchema.optional(),
  rear: z.object({ rateNmm: opt(1, 400, "N/mm"), preloadMm: opt(-20, 80, "mm"), ...sagOverrides }).optional(),
  front: z
    .object({
      rateNmm: opt(0.1, 50, "N/mm"),
      preloadMm: opt(-20, 80, "mm"),
      oilLevelMm: opt(1, 400, "mm"),
      airPressureKpaGauge: opt(0, 3000, "kPa"),
      ...sagOverrides,
    })
    .optional(),
  clickers: z
    .partialRecord(
      clickerIdSchema,
      z
        .number({ message: "Enter a number of clicks" })
        .min(0, "Clickers count out from 0 (fully closed)")
        .max(100, "At most 100"),
    )
    .optional(),
});

export type SetupOverrides = z.output<typeof setupOverridesSchema>;
export type SetupOverridesInput = z.input<typeof setupOverridesSchema>;
