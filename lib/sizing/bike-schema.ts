import { z } from "zod";
import { forkKindSchema } from "./vocab";
import { checkLeverageCurve, prepareLinkage, travelAt } from "./linkage";

/**
 * The shock stroke in the catalog must match ∫ dy/LR over the wheel travel. 1.5 % (or 1 mm, the
 * larger) allows for catalog figures rounded to the millimetre and hand-read curves; a larger miss
 * means the curve or the stroke is wrong and the model is refused (lib/sizing/README.md).
 */
export const STROKE_TOLERANCE_FRACTION = 0.015;
export const STROKE_TOLERANCE_MIN_MM = 1;

const pos = (max: number) => z.number().positive().max(max);

export const leveragePointSchema = z.object({
  wheelTravelMm: z.number().min(0).max(600),
  ratio: z.number().positive().max(10),
});

export const clickerRangeSchema = z
  .object({ min: z.number().min(0).max(100), max: z.number().min(0).max(100), stock: z.number().min(0).max(100) })
  .superRefine((c, ctx) => {
    if (c.max <= c.min) ctx.addIssue({ code: "custom", path: ["max"], message: "Must be above min" });
    else if (c.stock < c.min || c.stock > c.max)
      ctx.addIssue({ code: "custom", path: ["stock"], message: "Stock position must lie within min..max" });
  });

/** Fitted from the shop's sag reports on this model (calibration.ts): sprung masses and rider share. */
export const calibrationParametersSchema = z.object({
  rearSprungKg: z.number().positive().max(300),
  frontSprungKg: z.number().positive().max(300),
  riderRearShare: z.number().min(0.3).max(0.95),
});
export type CalibrationParameters = z.output<typeof calibrationParametersSchema>;

export const bikeSpecSchema = z
  .object({
    /** Ready-to-ride mass, fluids and fuel in. */
    massKg: z.number().min(30).max(300),
    /** Static share of the bike's weight on the front wheel, without rider. */
    frontFraction: z.number().min(0.3).max(0.7),
    unsprungFrontKg: pos(60),
    unsprungRearKg: pos(60),
    rakeDeg: z.number().min(10).max(45),
    /** Rider mass with gear that the stock springs and oil level suit. */
    referenceRiderMassKg: z.number().min(15).max(250),
    /** Rider mass with gear the bike's class is meant for; outside it the engine warns. */
    riderMassRangeKg: z.object({ min: z.number().min(0), max: z.number().positive() }).optional(),
    rear: z.object({
      wheelTravelMm: z.number().min(50).max(500),
      shockStrokeMm: z.number().min(20).max(250),
      leverageCurve: z.array(leveragePointSchema).min(2).max(64),
      preloadMinMm: z.number().min(0).max(60),
      preloadMaxMm: z.number().min(0).max(60),
      /** Thread pitch of the preload collar, mm per turn. */
      collarPitchMm: pos(5),
      stockRateNmm: pos(400),
    }),
    fork: z.object({
      kind: forkKindSchema,
      travelMm: z.number().min(50).max(400),
      preloadMinMm: z.number().min(0).max(60).default(0),
      preloadMaxMm: z.number().min(0).max(60).default(0),
      stockPreloadMm: z.number().min(0).max(60).default(0),
      /** Per sprung leg; required for coil forks. */
      stockRateNmm: pos(50).optional(),
      displacementDiameterMm: z.number().min(15).max(80),
      freeAreaMm2: z.number().min(50).max(6000),
      capVolumeMm3: z.number().min(0).max(500_000),
      /** Geometry of the stock spring (coil forks): its steel takes air volume above the oil.
       *  Absent: a typical spring for the rate (lib/sizing/README.md, "Fork air"). */
      stockSpring: z
        .object({
          wireDiameterMm: z.number().min(1).max(15),
          meanCoilDiameterMm: z.number().min(5).max(80),
          totalCoils: z.number().min(2).max(80),
        })
        .optional(),
      oilLevelMinMm: z.number().positive().max(400),
      oilLevelMaxMm: z.number().positive().max(400),
      stockOilLevelMm: z.number().positive().max(400),
      air: z
        .object({
          pistonAreaMm2: z.number().min(50).max(5000),
          chamberVolumeMm3: z.number().positive().max(2_000_000),
          stockPressureKpaGauge: z.number().min(0).max(3000).optional(),
          /** Negative chamber volume at top-out; absent: a typical fraction of the positive chamber. */
          negativeChamberVolumeMm3: z.number().positive().max(2_000_000).optional(),
          /** Fork travel where the transfer port equalises the two chambers; absent: typical. */
          equalizeAtMm: z.number().min(0).max(100).optional(),
        })
        .optional(),
    }),
    /** Applied by the admin from the shop's sag reports; replaces the weight-split loads. */
    calibration: calibrationParametersSchema.extend({ reports: z.number().int().min(1).max(100_000) }).optional(),
    clickers: z.object({
      forkCompression: clickerRangeSchema,
      forkRebound: clickerRangeSchema,
      shockLowSpeedCompression: clickerRangeSchema,
      /** In turns, not clicks. */
      shockHighSpeedCompression: clickerRangeSchema,
      shockRebound: clickerRangeSchema,
    }),
  })
  .superRefine((b, ctx) => {
    const bad = (path: (string | number)[], message: string) => ctx.addIssue({ code: "custom", path, message });
    if (b.massKg * b.frontFraction - b.unsprungFrontKg <= 0)
      bad(["unsprungFrontKg"], "Front unsprung mass must be less than the bike's front axle mass");
    if (b.massKg * (1 - b.frontFraction) - b.unsprungRearKg <= 0)
      bad(["unsprungRearKg"], "Rear unsprung mass must be less than the bike's rear axle mass");
    if (b.riderMassRangeKg && b.riderMassRangeKg.max <= b.riderMassRangeKg.min)
      bad(["riderMassRangeKg", "max"], "Must be above min");
    const r = b.rear;
    if (r.preloadMaxMm < r.preloadMinMm) bad(["rear", "preloadMaxMm"], "Must be at least preloadMinMm");
    const curveIssues = checkLeverageCurve(r.leverageCurve, "rear.leverageCurve");
    for (const i of curveIssues) bad(i.path.split("."), i.message);
    if (!curveIssues.length) {
      const last = r.leverageCurve[r.leverageCurve.length - 1]!;
      if (last.wheelTravelMm < r.wheelTravelMm)
        bad(
          ["rear", "leverageCurve"],
          `Curve ends at ${last.wheelTravelMm} mm, before the wheel travel ${r.wheelTravelMm} mm`,
        );
      else {
        const stroke = travelAt(prepareLinkage(r.leverageCurve), r.wheelTravelMm);
        const tol = Math.max(STROKE_TOLERANCE_MIN_MM, STROKE_TOLERANCE_FRACTION * r.shockStrokeMm);
        if (Math.abs(stroke - r.shockStrokeMm) > tol)
          bad(
            ["rear", "shockStrokeMm"],
            `Leverage curve gives ${stroke.toFixed(1)} mm of shock travel over the wheel travel, but the stroke is ${r.shockStrokeMm} mm (tolerance ${tol.toFixed(1)} mm)`,
          );
      }
    }
    const f = b.fork;
    if (f.preloadMaxMm < f.preloadMinMm) bad(["fork", "preloadMaxMm"], "Must be at least preloadMinMm");
    else if (f.kind !== "air" && (f.stockPreloadMm < f.preloadMinMm || f.stockPreloadMm > f.preloadMaxMm))
      bad(["fork", "stockPreloadMm"], "Must lie within the preload limits");
    if (f.oilLevelMaxMm < f.oilLevelMinMm) bad(["fork", "oilLevelMaxMm"], "Must be at least oilLevelMinMm");
    else if (f.stockOilLevelMm < f.oilLevelMinMm || f.stockOilLevelMm > f.oilLevelMaxMm)
      bad(["fork", "stockOilLevelMm"], "Must lie within the oil level range");
    if (f.kind === "air") {
      if (!f.air) bad(["fork", "air"], "Air forks need pistonAreaMm2 and chamberVolumeMm3");
      else if (f.air.pistonAreaMm2 * f.travelMm >= f.air.chamberVolumeMm3)
        bad(["fork", "air", "chamberVolumeMm3"], "Chamber volume must exceed piston area × fork travel");
      else if (f.air.equalizeAtMm !== undefined && f.air.equalizeAtMm >= f.travelMm / 2)
        bad(["fork", "air", "equalizeAtMm"], "The chambers equalise near top-out: less than half the fork travel");
    } else if (f.stockRateNmm === undefined) bad(["fork", "stockRateNmm"], "Coil forks need the stock rate per leg");
    if (f.stockSpring && f.stockSpring.meanCoilDiameterMm <= f.stockSpring.wireDiameterMm)
      bad(["fork", "stockSpring", "meanCoilDiameterMm"], "Mean coil diameter must exceed the wire diameter");
  });

export type BikeSpec = z.output<typeof bikeSpecSchema>;
export type BikeSpecInput = z.input<typeof bikeSpecSchema>;

export function sprungLegsOf(kind: BikeSpec["fork"]["kind"]): number {
  return kind === "coil-both" ? 2 : kind === "coil-single" ? 1 : 0;
}
