// A shop's setup targets per discipline and skill, with defaults from the engine's defaults module.
import { sizingDefaults, type Discipline, type SkillLevel } from "@/lib/sizing";
import type { TargetRowValues } from "@/lib/requests/sizing-input";

const round = (v: number) => Math.round(v * 10_000) / 10_000;

/** The engine's defaults for one discipline and skill, as a shop-editable row. */
export function defaultTargetValues(discipline: Discipline, skill: SkillLevel): TargetRowValues {
  const base = sizingDefaults.SAG_TARGETS_BY_DISCIPLINE[discipline];
  const offset = sizingDefaults.SAG_OFFSET_BY_SKILL[skill];
  return {
    sag: { ...base, rearRace: round(base.rearRace + offset), forkRace: round(base.forkRace + offset) },
    riderRearShare: sizingDefaults.DEFAULT_RIDER_REAR_SHARE,
    rateFactor: round(
      sizingDefaults.RATE_FACTOR_BY_SKILL[skill] * sizingDefaults.RATE_FACTOR_BY_DISCIPLINE[discipline],
    ),
    bottomingFactor: sizingDefaults.BOTTOMING_FACTOR_BY_DISCIPLINE[discipline],
    rateBasis: sizingDefaults.DEFAULT_RATE_BASIS,
  };
}
