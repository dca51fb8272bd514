import { z } from "zod";
import {
  clickerIdSchema,
  complaintSchema,
  disciplineSchema,
  jumpSizeSchema,
  ridingStyleSchema,
  skillLevelSchema,
  suspensionEndSchema,
  terrainSchema,
} from "./vocab";
import { bikeSpecSchema } from "./bike-schema";
import { rateBasisSchema } from "./vocab";
import { DEFAULT_GEAR_MASS_KG, FREQUENCY_RATIO_WINDOW } from "./defaults";

/** Sag targets as fractions of the end's travel, so one table serves every bike size. */
// Fractions of travel, entered and read by people as percentages: the messages say "%".
const fractionOfTravel = (minPct: number, maxPct: number) =>
  z
    .number({ message: "Enter a percentage of travel" })
    .min(minPct / 100, `At least ${minPct} % of travel`)
    .max(maxPct / 100, `At most ${maxPct} % of travel`);

export const sagTargetFractionsSchema = z
  .object({
    rearRace: fractionOfTravel(5, 60),
    rearStaticMin: fractionOfTravel(0, 50),
    rearStaticMax: fractionOfTravel(0, 50),
    forkRace: fractionOfTravel(5, 60),
    forkStaticMin: fractionOfTravel(0, 50),
    forkStaticMax: fractionOfTravel(0, 50),
  })
  .superRefine((t, ctx) => {
    const bad = (k: string, m: string) => ctx.addIssue({ code: "custom", path: [k], message: m });
    if (t.rearStaticMax < t.rearStaticMin) bad("rearStaticMax", "Must be at least the lowest static sag");
    if (t.rearRace <= t.rearStaticMax) bad("rearRace", "Race sag must exceed the static sag window");
    if (t.forkStaticMax < t.forkStaticMin) bad("forkStaticMax", "Must be at least the lowest static sag");
    if (t.forkRace <= t.forkStaticMax) bad("forkRace", "Race sag must exceed the static sag window");
  });
export type SagTargetFractions = z.output<typeof sagTargetFractionsSchema>;

/** Shop's setup targets; every field falls back to defaults.ts when absent. */
export const targetsSchema = z.object({
  sagByDiscipline: z.partialRecord(disciplineSchema, sagTargetFractionsSchema).optional(),
  /** Added to the race sag fraction (both ends) per skill level. */
  sagOffsetBySkill: z.partialRecord(skillLevelSchema, z.number().min(-0.1).max(0.1)).optional(),
  riderRearShare: z.number().min(0.3).max(0.95).optional(),
  rateFactorBySkill: z.partialRecord(skillLevelSchema, z.number().min(0.7).max(1.4)).optional(),
  rateFactorByStyle: z.partialRecord(ridingStyleSchema, z.number().min(0.7).max(1.4)).optional(),
  rateFactorByDiscipline: z.partialRecord(disciplineSchema, z.number().min(0.7).max(1.4)).optional(),
  rateFactorByJump: z.partialRecord(jumpSizeSchema, z.number().min(0.7).max(1.4)).optional(),
  /** Replaces skill × style × discipline × jump when given. */
  rateFactor: z.number().min(0.7).max(1.4).optional(),
  /** How the ideal rate is found: matched ride frequency (default) or the two sag targets. */
  rateBasis: rateBasisSchema.optional(),
  bottomingFactorByDiscipline: z.partialRecord(disciplineSchema, z.number().min(0.5).max(2)).optional(),
  bottomingFactorByJump: z.partialRecord(jumpSizeSchema, z.number().min(0.5).max(2)).optional(),
  /** Replaces discipline × jump when given. */
  bottomingFactor: z.number().min(0.5).max(2).optional(),
});
export type SizingTargets = z.output<typeof targetsSchema>;

export const clickerTriggerSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("complaint"), complaint: complaintSchema }),
  z.object({ kind: z.literal("terrain"), terrain: terrainSchema }),
  z.object({
    kind: z.literal("rate-change"),
    end: suspensionEndSchema,
    direction: z.enum(["stiffer", "softer"]),
    /** Fires when |chosen/stock − 1| reaches this. */
    minChangeFraction: z.number().min(0).max(1),
  }),
]);

/** One shop rule: `change` is in clicks (turns for shock high-speed); + is out (less damping). */
export const clickerRuleSchema = z.object({
  trigger: clickerTriggerSchema,
  clicker: clickerIdSchema,
  change: z.number().min(-20).max(20),
  reason: z.string().min(1).max(300),
});
export type ClickerRule = z.output<typeof clickerRuleSchema>;

const sag = z.number().min(0).max(400).optional();

export const sizingInputSchema = z.object({
  rider: z.object({
    massKg: z.number().min(15).max(250),
    /** True when massKg already includes riding gear. */
    gearIncluded: z.boolean(),
    skill: skillLevelSchema,
    style: ridingStyleSchema,
    heightCm: z.number().min(90).max(230).optional(),
  }),
  riding: z.object({
    discipline: disciplineSchema,
    terrain: z.array(terrainSchema).max(6).default([]),
    jumpSize: jumpSizeSchema.default("medium"),
    hoursPerMonth: z.number().min(0).max(400).optional(),
  }),
  bike: bikeSpecSchema,
  complaints: z.array(complaintSchema).max(8).default([]),
  /** Springs the rider has fitted now (N/mm; fork per leg), shown beside stock; not used for sizing. */
  currentSprings: z
    .object({
      forkRateNmm: z.number().positive().max(50).optional(),
      shockRateNmm: z.number().positive().max(400).optional(),
    })
    .optional(),
  measuredSag: z
    .object({ rearStaticSagMm: sag, rearRaceSagMm: sag, forkStaticSagMm: sag, forkRaceSagMm: sag })
    .optional(),
  targets: targetsSchema.default({}),
  shop: z
    .object({
      gearMassKg: z.number().min(0).max(30).default(DEFAULT_GEAR_MASS_KG),
      frequencyRatioWindow: z
        .object({ min: z.number().positive().max(5), max: z.number().positive().max(5) })
        .refine((w) => w.max > w.min, { message: "max must exceed min", path: ["max"] })
        .default({ ...FREQUENCY_RATIO_WINDOW }),
    })
    .default({ gearMassKg: DEFAULT_GEAR_MASS_KG, frequencyRatioWindow: { ...FREQUENCY_RATIO_WINDOW } }),
  stock: z.object({
    forkRatesNmm: z.array(z.number().positive().max(50)).max(200),
    shockRatesNmm: z.array(z.number().positive().max(400)).max(200),
  }),
  clickerRules: z.array(clickerRuleSchema).max(200).optional(),
});

export type SizingInput = z.input<typeof sizingInputSchema>;
export type SizingInputParsed = z.output<typeof sizingInputSchema>;
