import { z } from "zod";
import { clickerIdSchema, rateBasisSchema } from "./vocab";

const opt = (min: number, max: number) => z.number().min(min).max(max).optional();

const sagOverrides = {
  raceSagMm: opt(1, 400),
  staticSagMinMm: opt(0, 400),
  staticSagMaxMm: opt(0, 400),
};

/** A tuner's edits; every field optional, anything absent keeps the engine's own choice. */
export const setupOverridesSchema = z.object({
  /** The tuner's choice of rate basis for this request; absent: the shop's default. */
  rateBasis: rateBasisSchema.optional(),
  rear: z.object({ rateNmm: opt(1, 400), preloadMm: opt(-20, 80), ...sagOverrides }).optional(),
  front: z
    .object({
      rateNmm: opt(0.1, 50),
      preloadMm: opt(-20, 80),
      oilLevelMm: opt(1, 400),
      airPressureKpaGauge: opt(0, 3000),
      ...sagOverrides,
    })
    .optional(),
  clickers: z.partialRecord(clickerIdSchema, z.number().min(0).max(100)).optional(),
});

export type SetupOverrides = z.output<typeof setupOverridesSchema>;
export type SetupOverridesInput = z.input<typeof setupOverridesSchema>;
