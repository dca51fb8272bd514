import type { SizingInputParsed } from "./input-schema";
import type { SagTargetsMm } from "./selection";
import { SizingInputError } from "./errors";
import type { RateBasis } from "./vocab";
import {
  BOTTOMING_FACTOR_BY_DISCIPLINE,
  BOTTOMING_FACTOR_BY_JUMP,
  DEFAULT_RATE_BASIS,
  DEFAULT_RIDER_REAR_SHARE,
  RATE_FACTOR_BY_DISCIPLINE,
  RATE_FACTOR_BY_JUMP,
  RATE_FACTOR_BY_SKILL,
  RATE_FACTOR_BY_STYLE,
  SAG_OFFSET_BY_SKILL,
  SAG_TARGETS_BY_DISCIPLINE,
} from "./defaults";

export interface ResolvedTargets {
  riderMassWithGearKg: number;
  riderRearShare: number;
  /** Stiffness asked for beyond the matched rate: skill × style × discipline × jump size. */
  rateFactor: number;
  bottomingFactor: number;
  rateBasis: RateBasis;
  rear: SagTargetsMm;
  front: SagTargetsMm;
}

/** Shop targets over the defaults, turned into millimetres for this bike and rider. */
export function resolveTargets(input: SizingInputParsed): ResolvedTargets {
  const t = input.targets;
  const { discipline, jumpSize } = input.riding;
  const { skill, style } = input.rider;
  const sag = t.sagByDiscipline?.[discipline] ?? SAG_TARGETS_BY_DISCIPLINE[discipline];
  const offset = t.sagOffsetBySkill?.[skill] ?? SAG_OFFSET_BY_SKILL[skill];
  const rearT = input.bike.rear.wheelTravelMm;
  const forkT = input.bike.fork.travelMm;
  const rear = {
    raceSagMm: (sag.rearRace + offset) * rearT,
    staticSagMinMm: sag.rearStaticMin * rearT,
    staticSagMaxMm: sag.rearStaticMax * rearT,
  };
  const front = {
    raceSagMm: (sag.forkRace + offset) * forkT,
    staticSagMinMm: sag.forkStaticMin * forkT,
    staticSagMaxMm: sag.forkStaticMax * forkT,
  };
  const path =
    t.sagOffsetBySkill?.[skill] !== undefined
      ? `targets.sagOffsetBySkill.${skill}`
      : `targets.sagByDiscipline.${discipline}`;
  checkSagTargets(rear, rearT, path);
  checkSagTargets(front, forkT, path);
  const rateFactor =
    t.rateFactor ??
    (t.rateFactorBySkill?.[skill] ?? RATE_FACTOR_BY_SKILL[skill]) *
      (t.rateFactorByStyle?.[style] ?? RATE_FACTOR_BY_STYLE[style]) *
      (t.rateFactorByDiscipline?.[discipline] ?? RATE_FACTOR_BY_DISCIPLINE[discipline]) *
      (t.rateFactorByJump?.[jumpSize] ?? RATE_FACTOR_BY_JUMP[jumpSize]);
  const bottomingFactor =
    t.bottomingFactor ??
    (t.bottomingFactorByDiscipline?.[discipline] ?? BOTTOMING_FACTOR_BY_DISCIPLINE[discipline]) *
      (t.bottomingFactorByJump?.[jumpSize] ?? BOTTOMING_FACTOR_BY_JUMP[jumpSize]);
  return {
    riderMassWithGearKg: input.rider.massKg + (input.rider.gearIncluded ? 0 : input.shop.gearMassKg),
    riderRearShare: t.riderRearShare ?? DEFAULT_RIDER_REAR_SHARE,
    rateFactor,
    bottomingFactor,
    rateBasis: t.rateBasis ?? DEFAULT_RATE_BASIS,
    rear,
    front,
  };
}

export function checkSagTargets(t: SagTargetsMm, travelMm: number, path: string): void {
  if (!(
    t.staticSagMinMm >= 0 &&
    t.staticSagMaxMm >= t.staticSagMinMm &&
    t.raceSagMm > t.staticSagMaxMm &&
    t.raceSagMm < travelMm
  ))
    throw new SizingInputError([
      { path, message: `Sag targets must satisfy 0 ≤ static min ≤ static max < race sag < travel (${travelMm} mm)` },
    ]);
}
