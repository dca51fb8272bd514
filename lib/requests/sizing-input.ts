// From a rider's answers (as given, any units) and the shop's data to the engine's SI input.
// Pure: callers load the bike, targets, stock, rules and settings and pass them in.
import {
  INCH_MM,
  POUND_KG,
  convertRate,
  sizingInputSchema,
  type BikeSpecInput,
  type ClickerRule,
  type RateBasis,
  type SizingInput,
} from "@/lib/sizing";
import type { RequestAnswers } from "@/lib/validations/request";

/** A shop's setup-target row for one discipline and skill (db: setup_targets.values). */
export interface TargetRowValues {
  sag: {
    rearRace: number;
    rearStaticMin: number;
    rearStaticMax: number;
    forkRace: number;
    forkStaticMin: number;
    forkStaticMax: number;
  };
  riderRearShare: number;
  /** Skill and discipline together: the row is per discipline × skill. */
  rateFactor: number;
  bottomingFactor: number;
  /** Rows saved before the choice existed have none: the engine's default basis. */
  rateBasis?: RateBasis;
}

export interface ShopSizingContext {
  bike: BikeSpecInput;
  targets: TargetRowValues | null;
  stock: { forkRatesNmm: number[]; shockRatesNmm: number[] };
  clickerRules: ClickerRule[] | undefined;
  gearMassKg: number;
  frequencyRatioWindow: { min: number; max: number };
}

export const toKg = (v: { value: number; unit: "kg" | "lb" }) => (v.unit === "kg" ? v.value : v.value * POUND_KG);
export const toMm = (v: number, unit: "mm" | "in") => (unit === "mm" ? v : v * INCH_MM);

export function buildSizingInput(answers: RequestAnswers, shop: ShopSizingContext): SizingInput {
  const { rider, riding, feel } = answers;
  const sag = feel.currentSag;
  const sagMm = (v: number | undefined) => (v === undefined || !sag ? undefined : toMm(v, sag.unit));
  const { discipline } = riding;
  const t = shop.targets;
  return {
    rider: {
      massKg: toKg(rider.weight),
      gearIncluded: rider.gearIncluded,
      skill: rider.skill,
      style: rider.style,
      heightCm: rider.height
        ? rider.height.unit === "cm"
          ? rider.height.value
          : (rider.height.value * INCH_MM) / 10
        : undefined,
    },
    riding: {
      discipline,
      terrain: riding.terrain,
      jumpSize: riding.jumpSize,
      hoursPerMonth: riding.hoursPerMonth,
    },
    bike: shop.bike,
    complaints: feel.complaints,
    measuredSag: sag
      ? {
          rearStaticSagMm: sagMm(sag.rearStatic),
          rearRaceSagMm: sagMm(sag.rearRace),
          forkStaticSagMm: sagMm(sag.forkStatic),
          forkRaceSagMm: sagMm(sag.forkRace),
        }
      : undefined,
    // The shop's row for this discipline and skill already holds the skill's sag offset; style and
    // jump size still act through the engine's own factors.
    targets: t
      ? {
          sagByDiscipline: { [discipline]: t.sag },
          sagOffsetBySkill: { [rider.skill]: 0 },
          riderRearShare: t.riderRearShare,
          rateFactorBySkill: { [rider.skill]: t.rateFactor },
          rateFactorByDiscipline: { [discipline]: 1 },
          bottomingFactorByDiscipline: { [discipline]: t.bottomingFactor },
          rateBasis: t.rateBasis,
        }
      : {},
    shop: { gearMassKg: shop.gearMassKg, frequencyRatioWindow: shop.frequencyRatioWindow },
    stock: shop.stock,
    clickerRules: shop.clickerRules,
    currentSprings: currentSpringsNmm(answers),
  };
}

const currentSpringsSchema = sizingInputSchema.shape.currentSprings.unwrap();

/**
 * The springs the rider has fitted now, in N/mm, as the engine takes them (shown beside the shelf's
 * stock; they do not change the sizing). A rate outside the engine's range (for example a fork
 * figure given for both legs together) is left out rather than refusing the whole request; the
 * rider's own figure stays in the answers.
 */
export function currentSpringsNmm(answers: RequestAnswers): SizingInput["currentSprings"] {
  const rate = (
    r: { value: number; unit: "N/mm" | "kgf/mm" | "lbf/in" } | undefined,
    key: "forkRateNmm" | "shockRateNmm",
  ) => {
    if (!r) return undefined;
    const nMm = convertRate(r.value, r.unit, "N/mm");
    return currentSpringsSchema.shape[key].safeParse(nMm).success ? nMm : undefined;
  };
  const forkRateNmm = rate(answers.bike.currentForkSpring, "forkRateNmm");
  const shockRateNmm = rate(answers.bike.currentShockSpring, "shockRateNmm");
  if (forkRateNmm === undefined && shockRateNmm === undefined) return undefined;
  return {
    ...(forkRateNmm !== undefined ? { forkRateNmm } : {}),
    ...(shockRateNmm !== undefined ? { shockRateNmm } : {}),
  };
}
