import { z } from "zod";
import { clickerIdSchema, forkKindSchema, rateBasisSchema, severitySchema } from "./vocab";
import { sizingInputSchema } from "./input-schema";

const num = z.number().refine(Number.isFinite, { message: "Must be finite" });

export const rateTripleSchema = z.object({ nMm: num, kgfMm: num, lbfIn: num });
export const pressureTripleSchema = z.object({ kpaGauge: num, barGauge: num, psiGauge: num });
export const rateSourceSchema = z.enum(["stock", "stock-nearest", "order", "override"]);
export const sagTargetsMmSchema = z.object({ raceSagMm: num, staticSagMinMm: num, staticSagMaxMm: num });
export const predictedSagSchema = z.object({
  raceSagMm: num,
  staticSagMm: num,
  /** "topped-out": preload alone holds the load; "bottomed": the load exceeds the force at full travel. */
  raceState: z.enum(["ok", "topped-out", "bottomed"]),
  staticState: z.enum(["ok", "topped-out", "bottomed"]),
});

export const warningSchema = z.object({
  code: z.string(),
  severity: severitySchema,
  message: z.string(),
  /** Input or output field the warning is about, dotted ("rear.preloadMm"). */
  field: z.string().optional(),
  /** A sanity limit: a figure is probably mistyped; approval waits until the tuner acknowledges it. */
  requiresAcknowledgement: z.boolean().optional(),
});
export type SizingWarning = z.output<typeof warningSchema>;

/** Both rate bases side by side; `used` sized this end. Recommendations from engine 1.x have none. */
export const rateBasisResultSchema = z.object({
  used: rateBasisSchema,
  rideFrequency: z
    .object({ idealRateNmm: num, chosenRateNmm: num, referenceFrequencyHz: num, targetFrequencyHz: num })
    .nullable(),
  sagWindow: z.object({ idealRateNmm: num, chosenRateNmm: num }).nullable(),
});
export type RateBasisResult = z.output<typeof rateBasisResultSchema>;

const rearPointSchema = z.object({ wheelTravelMm: num, wheelForceN: num });
const forkPointSchema = z.object({ forkTravelMm: num, forceN: num });

export const rearResultSchema = z.object({
  /** What to order when nothing stocked fits: the sag ideal times the rate factor, limited to rates
   *  that reach race sag with preload inside the adjuster's limits. */
  idealRate: rateTripleSchema,
  /** Before the rate factor and limits: the rate that meets both sag targets exactly (≤ 0 when no
   *  spring can, with a *_SAG_TARGETS_UNREACHABLE warning). */
  sagOnlyIdealRateNmm: num,
  idealPreloadMm: num,
  chosenRate: rateTripleSchema,
  stockRate: rateTripleSchema,
  source: rateSourceSchema,
  preloadMm: num,
  preloadCollarTurns: num,
  sagTargets: sagTargetsMmSchema,
  predicted: predictedSagSchema,
  bottoming: z.object({ forceN: num, ratio: num }),
  /** Wheel force against vertical wheel travel, 31 points, 0 to full travel. */
  forceCurve: z.array(rearPointSchema),
  wheelRateAtSagNmm: num,
  sprungMassKg: num,
  naturalFrequencyHz: num,
  rateBasis: rateBasisResultSchema.optional(),
});

export const oilLevelCurveSchema = z.object({
  oilLevelMm: num,
  bottomingRatio: num,
  points: z.array(forkPointSchema),
});

export const frontResultSchema = z.object({
  kind: forkKindSchema,
  sprungLegs: z.number().int(),
  /** Coil forks only (null for air): per sprung leg. */
  idealRate: rateTripleSchema.nullable(),
  sagOnlyIdealRateNmm: num.nullable(),
  idealPreloadMm: num.nullable(),
  chosenRate: rateTripleSchema.nullable(),
  stockRate: rateTripleSchema.nullable(),
  source: rateSourceSchema.nullable(),
  preloadMm: num.nullable(),
  /** Coil forks: mm from the top of the outer tube, fork fully compressed, spring out. */
  oilLevelMm: num.nullable(),
  stockOilLevelMm: num,
  /** Air forks: gauge pressure at top-out. */
  airPressure: pressureTripleSchema.nullable(),
  sagTargets: sagTargetsMmSchema,
  predicted: predictedSagSchema,
  bottoming: z.object({ forceN: num, ratio: num, targetRatio: num.nullable() }),
  /** Polytropic index of the air in forceCurve (1.4: a fast stroke). */
  forceCurvePolytropicIndex: num,
  /** Axial fork force against fork travel, 31 points, 0 to full travel. */
  forceCurve: z.array(forkPointSchema),
  /** The chosen oil level and its 5 mm neighbours within the bike's range (coil forks). */
  oilLevelCurves: z.array(oilLevelCurveSchema),
  wheelRateAtSagNmm: num,
  sprungMassKg: num,
  naturalFrequencyHz: num,
  /** Coil forks; null for air-spring forks (sized by pressure). */
  rateBasis: rateBasisResultSchema.nullable().optional(),
  /** Steel of one fitted spring, taken from the air above the oil in its leg (coil forks). */
  springVolumeMm3: num.nullable().optional(),
  /** Absolute pressure at full travel, fast stroke: air above the oil, or the positive chamber. */
  bottomPressureMpaAbs: num.optional(),
  /** Air-spring forks: the negative chamber used (from the catalog or typical). */
  negativeChamber: z.object({ volumeMm3: num, equalizeAtMm: num, typical: z.boolean() }).nullable().optional(),
});

export const clickerMoveSchema = z.object({ change: num, reason: z.string() });
export const clickerSettingSchema = z.object({
  id: clickerIdSchema,
  unit: z.enum(["clicks", "turns"]),
  min: num,
  max: num,
  stock: num,
  /** Counted out from fully closed. */
  position: num,
  moves: z.array(clickerMoveSchema),
});

export const recommendationSchema = z.object({
  engineVersion: z.string(),
  input: sizingInputSchema,
  resolved: z.object({
    riderMassWithGearKg: num,
    riderRearShare: num,
    rateFactor: num,
    bottomingFactor: num,
    rateBasis: rateBasisSchema.optional(),
    loads: z.object({ rearStaticN: num, rearRaceN: num, frontStaticN: num, frontRaceN: num }),
    frequencyRatioWindow: z.object({ min: num, max: num }),
  }),
  rear: rearResultSchema,
  front: frontResultSchema,
  /** Front over rear natural frequency. */
  frequencyRatio: num,
  clickers: z.array(clickerSettingSchema),
  warnings: z.array(warningSchema),
  reasons: z.array(z.string()),
});

export type Recommendation = z.output<typeof recommendationSchema>;
export type RearResult = z.output<typeof rearResultSchema>;
export type FrontResult = z.output<typeof frontResultSchema>;
export type ClickerSetting = z.output<typeof clickerSettingSchema>;
export type RateSource = z.output<typeof rateSourceSchema>;
