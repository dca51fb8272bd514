// Setup targets per discipline and skill (shape: TargetRowValues of lib/requests/sizing-input.ts) and
// the clicker rules table (the engine's clickerRuleSchema).
import { z } from "zod";
import { text } from "./text";
import {
  clickerRuleSchema,
  disciplineSchema,
  rateBasisSchema,
  sagTargetFractionsSchema,
  skillLevelSchema,
} from "@/lib/sizing";
import type { TargetRowValues } from "@/lib/requests/sizing-input";

// Ranges are the engine's targetsSchema limits, so a saved row never fails sizing later.
export const targetRowValuesSchema = z.object({
  sag: sagTargetFractionsSchema,
  riderRearShare: z.number().min(0.3, "At least 0.30").max(0.95, "At most 0.95"),
  rateFactor: z.number().min(0.7, "At least 0.70").max(1.4, "At most 1.40"),
  bottomingFactor: z.number().min(0.5, "At least 0.50").max(2, "At most 2.00"),
  rateBasis: rateBasisSchema.optional(),
}) satisfies z.ZodType<TargetRowValues>;

export const targetKeySchema = z.object({ discipline: disciplineSchema, skill: skillLevelSchema });

export const saveTargetSchema = targetKeySchema.extend({ values: targetRowValuesSchema });

export const clickerRulesSchema = z.object({ rules: z.array(clickerRuleSchema).max(200) });

export const targetPreviewSchema = targetKeySchema.extend({
  values: targetRowValuesSchema,
  bikeModelId: text().uuid("Choose a bike"),
  riderMassKg: z.number().min(30, "At least 30 kg").max(200, "At most 200 kg"),
});
