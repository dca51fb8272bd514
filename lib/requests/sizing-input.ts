// From a rider's answers (as given, any units) and the shop's data to the engine's SI input.
// Pure: callers load the bike, targets, stock, rules and settings and pass them in.
import {
  INCH_MM,
  POUND_KG,
  convertRate,
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

export const toKg = (v: { value: number; unit: "kg" | "lb" }) =>
  v.unit === "kg" ? v.value : v.value * POUND_KG;
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
  };
}

/** The rider's current springs in N/mm, for the sheet's comparison with the stock rate. */
export function currentSpringsNmm(answers: RequestAnswers) {
  const rate = (r?: { value: number; unit: "N/mm" | "kgf/mm" | "lbf/in" }) =>
    r ? convertRate(r.value, r.unit, "N/mm") : undefined;
  return { fork: rate(answers.bike.currentForkSpring), shock: rate(answers.bike.currentShockSpring) };
}
