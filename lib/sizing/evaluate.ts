import { z } from "zod";
import { sizingInputSchema, type SizingInput, type SizingInputParsed } from "./input-schema";
import { setupOverridesSchema, type SetupOverrides, type SetupOverridesInput } from "./overrides";
import type { Recommendation, SizingWarning } from "./output-schema";
import { SizingInputError, pathOf } from "./errors";
import { computeLoads } from "./loads";
import { checkSagTargets, resolveTargets } from "./targets";
import { evaluateRear } from "./rear";
import { evaluateFront } from "./front";
import { sanityWarnings } from "./sanity";
import { applyClickerRules } from "./clickers";
import { DEFAULT_CLICKER_RULES } from "./defaults";
import { ENGINE_VERSION } from "./version";
import type { SagTargetsMm } from "./selection";
import { fmt } from "./format";

export function parseOrThrow<S extends z.ZodType>(schema: S, value: unknown, prefix = ""): z.output<S> {
  const r = schema.safeParse(value);
  if (r.success) return r.data;
  throw new SizingInputError(r.error.issues.map((i) => ({ path: prefix + pathOf(i.path), message: i.message })));
}

function withSagOverrides(
  t: SagTargetsMm,
  ov: { raceSagMm?: number; staticSagMinMm?: number; staticSagMaxMm?: number } | undefined,
  travelMm: number,
  path: string,
): SagTargetsMm {
  if (!ov) return t;
  const out = {
    raceSagMm: ov.raceSagMm ?? t.raceSagMm,
    staticSagMinMm: ov.staticSagMinMm ?? t.staticSagMinMm,
    staticSagMaxMm: ov.staticSagMaxMm ?? t.staticSagMaxMm,
  };
  checkSagTargets(out, travelMm, path);
  return out;
}

/**
 * The whole recommendation with a tuner's overrides applied; `recommend` is this with none. Both
 * arguments are validated at run time (types help callers, they are not trusted).
 */
export function evaluateSetup(input: SizingInput, overrides: SetupOverridesInput = {}): Recommendation {
  const inp = parseOrThrow(sizingInputSchema, input);
  const ov = parseOrThrow(setupOverridesSchema, overrides ?? {}, "overrides.");
  return evaluateParsed(inp, ov);
}

export function evaluateParsed(inp: SizingInputParsed, ov: SetupOverrides): Recommendation {
  const warnings: SizingWarning[] = [];
  const reasons: string[] = [];
  const rt = resolveTargets(inp);
  const bike = inp.bike;
  const rearT = withSagOverrides(rt.rear, ov.rear, bike.rear.wheelTravelMm, "overrides.rear");
  const frontT = withSagOverrides(rt.front, ov.front, bike.fork.travelMm, "overrides.front");
  const loads = computeLoads(bike, rt.riderMassWithGearKg, rt.riderRearShare);
  const referenceLoads = computeLoads(bike, bike.referenceRiderMassKg, rt.riderRearShare);

  const range = bike.riderMassRangeKg;
  if (range && (rt.riderMassWithGearKg < range.min || rt.riderMassWithGearKg > range.max))
    warnings.push({
      code: "RIDER_OUTSIDE_BIKE_RANGE",
      severity: "caution",
      message: `Rider with gear ${fmt(rt.riderMassWithGearKg, 0)} kg is outside the ${range.min}–${range.max} kg this bike is meant for; check every figure by measuring sag.`,
      field: "rider.massKg",
    });
  reasons.push(
    `Rider ${fmt(rt.riderMassWithGearKg, 1)} kg with gear${inp.rider.gearIncluded ? " (as given)" : ` (${inp.rider.massKg} kg + ${inp.shop.gearMassKg} kg gear)`}, ${fmt(loads.riderRearShare * 100, 0)} % on the rear in the sag stance.`,
  );
  if (bike.calibration)
    reasons.push(
      `Loads calibrated from ${bike.calibration.reports} sag report${bike.calibration.reports === 1 ? "" : "s"} on this model: ${fmt(bike.calibration.rearSprungKg, 1)} kg sprung at the rear and ${fmt(bike.calibration.frontSprungKg, 1)} kg at the front with the bike alone.`,
    );

  const basis = ov.rateBasis ?? rt.rateBasis;
  const common = { bike, loads, referenceLoads, rateFactor: rt.rateFactor, basis, warnings, reasons };
  const rear = evaluateRear({ ...common, targets: rearT, stockRatesNmm: inp.stock.shockRatesNmm }, ov.rear);
  const front = evaluateFront({
    ...common,
    targets: frontT,
    bottomingFactor: rt.bottomingFactor,
    stockRatesNmm: inp.stock.forkRatesNmm,
    ov: ov.front,
  });

  // A zero rear frequency (no wheel rate at sag) would make the ratio infinite: report 0 and warn below.
  const frequencyRatio = rear.naturalFrequencyHz > 0 ? front.naturalFrequencyHz / rear.naturalFrequencyHz : 0;
  const win = inp.shop.frequencyRatioWindow;
  if (!(frequencyRatio >= win.min && frequencyRatio <= win.max))
    warnings.push({
      code: "FREQUENCY_RATIO_OUTSIDE_WINDOW",
      severity: "caution",
      message: `Front/rear natural frequency ratio ${fmt(frequencyRatio, 2)} is outside the shop's ${win.min}–${win.max}: the ends are unbalanced.`,
      field: "frequencyRatio",
      requiresAcknowledgement: true,
    });
  sanityWarnings(bike, rear, front, warnings);

  const rateChange = {
    rear: rear.chosenRate.nMm / rear.stockRate.nMm - 1,
    front: front.chosenRate && front.stockRate ? front.chosenRate.nMm / front.stockRate.nMm - 1 : null,
  };
  const clickers = applyClickerRules(
    bike.clickers,
    inp.clickerRules ?? DEFAULT_CLICKER_RULES,
    { complaints: inp.complaints, terrain: inp.riding.terrain, rateChange },
    ov.clickers,
    warnings,
  );
  complaintNotes(inp, rear.predicted.raceSagMm, front.predicted.raceSagMm, warnings);
  const air = bike.fork.kind === "air";
  const ignored = air
    ? (["rateNmm", "preloadMm", "oilLevelMm"] as const).filter((k) => ov.front?.[k] !== undefined)
    : ov.front?.airPressureKpaGauge !== undefined
      ? (["airPressureKpaGauge"] as const)
      : [];
  for (const k of ignored)
    warnings.push({
      code: "OVERRIDE_NOT_APPLICABLE",
      severity: "info",
      message: `front.${k} does not apply to ${air ? "an air-spring" : "a coil-spring"} fork and was ignored.`,
      field: `overrides.front.${k}`,
    });

  return {
    engineVersion: ENGINE_VERSION,
    input: inp,
    resolved: {
      riderMassWithGearKg: rt.riderMassWithGearKg,
      riderRearShare: loads.riderRearShare,
      calibration: bike.calibration ? { reports: bike.calibration.reports } : undefined,
      rateFactor: rt.rateFactor,
      bottomingFactor: rt.bottomingFactor,
      rateBasis: basis,
      loads: {
        rearStaticN: loads.rearStaticN,
        rearRaceN: loads.rearRaceN,
        frontStaticN: loads.frontStaticN,
        frontRaceN: loads.frontRaceN,
      },
      frequencyRatioWindow: { min: win.min, max: win.max },
    },
    rear,
    front,
    frequencyRatio,
    clickers,
    warnings,
    reasons,
  };
}

function complaintNotes(
  inp: SizingInputParsed,
  rearRaceSagMm: number,
  forkRaceSagMm: number,
  warnings: SizingWarning[],
): void {
  const m = inp.measuredSag;
  const ends = [
    ["rear", m?.rearRaceSagMm, rearRaceSagMm],
    ["fork", m?.forkRaceSagMm, forkRaceSagMm],
  ] as const;
  for (const [end, measured, predicted] of ends)
    if (measured !== undefined && Math.abs(measured - predicted) > 5)
      warnings.push({
        code: "MEASURED_SAG_DIFFERS",
        severity: "info",
        message: `Measured ${end} race sag now is ${fmt(measured, 0)} mm; the new setup aims at ${fmt(predicted, 0)} mm.`,
        field: `measuredSag.${end}RaceSagMm`,
      });
  for (const c of ["rides-low", "rides-high"] as const)
    if (inp.complaints.includes(c))
      warnings.push({
        code: c === "rides-low" ? "COMPLAINT_RIDES_LOW" : "COMPLAINT_RIDES_HIGH",
        severity: "info",
        message: `Rider reports the bike ${c === "rides-low" ? "rides low" : "rides high"}: a spring and sag question, answered by the rates and preload above; confirm by measuring sag after fitting.`,
        field: "complaints",
      });
}
