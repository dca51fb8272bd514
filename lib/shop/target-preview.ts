// Targets preview: one reference rider sized with the shop's saved row and with an edited row, through
// the same buildSizingInput + recommend path a real request takes.
import { loadShopSizingContext } from "@/db/queries/sizing-context";
import { buildSizingInput, type TargetRowValues } from "@/lib/requests/sizing-input";
import { recommend, type BikeSpecInput, type Discipline, type Recommendation, type SkillLevel } from "@/lib/sizing";
import type { RequestAnswers } from "@/lib/validations/request";
import { defaultTargetValues } from "./targets";

/** A plain rider for the preview: mass with gear, moderate style, no complaints, medium jumps. */
export function referenceAnswers(a: {
  riderMassKg: number;
  discipline: Discipline;
  skill: SkillLevel;
  bikeModelId: string;
}): RequestAnswers {
  return {
    rider: {
      name: "Reference rider",
      email: "reference@sagwise.invalid",
      weight: { value: a.riderMassKg, unit: "kg" },
      gearIncluded: true,
      skill: a.skill,
      style: "moderate",
    },
    riding: { discipline: a.discipline, terrain: [], jumpSize: "medium" },
    bike: { modelId: a.bikeModelId },
    feel: { complaints: [] },
    review: { consent: true },
  };
}

export interface PreviewSummary {
  rearRateNmm: number;
  rearPreloadMm: number;
  rearRaceSagMm: number;
  rearStaticSagMm: number;
  forkRateNmm: number | null;
  forkAirKpa: number | null;
  forkRaceSagMm: number;
  oilLevelMm: number | null;
  warnings: string[];
}

function summarise(rec: Recommendation): PreviewSummary {
  return {
    rearRateNmm: rec.rear.chosenRate.nMm,
    rearPreloadMm: rec.rear.preloadMm,
    rearRaceSagMm: rec.rear.predicted.raceSagMm,
    rearStaticSagMm: rec.rear.predicted.staticSagMm,
    forkRateNmm: rec.front.chosenRate?.nMm ?? null,
    forkAirKpa: rec.front.airPressure?.kpaGauge ?? null,
    forkRaceSagMm: rec.front.predicted.raceSagMm,
    oilLevelMm: rec.front.oilLevelMm,
    warnings: rec.warnings.map((w) => w.message),
  };
}

export async function previewTargets(a: {
  discipline: Discipline;
  skill: SkillLevel;
  values: TargetRowValues;
  bikeModelId: string;
  bike: BikeSpecInput;
  bikeName: string;
  riderMassKg: number;
}) {
  const context = await loadShopSizingContext(a.bike, a.discipline, a.skill);
  const answers = referenceAnswers(a);
  const before = recommend(
    buildSizingInput(answers, { ...context, targets: context.targets ?? defaultTargetValues(a.discipline, a.skill) }),
  );
  const after = recommend(buildSizingInput(answers, { ...context, targets: a.values }));
  return { bikeName: a.bikeName, riderMassKg: a.riderMassKg, before: summarise(before), after: summarise(after) };
}
