// Shared inputs for the sizing tests and the benchmark: the generic classes from defaults.ts with
// the typical shop shelf. Not check values: the checks name their own outside sources.
import { sizingDefaults, type SizingInput } from "../../../lib/sizing";

export type RiderSize = "light" | "medium" | "heavy";

export function classInput(classId: string, size: RiderSize, extra: Partial<SizingInput> = {}): SizingInput {
  const c = sizingDefaults.GENERIC_BIKE_CLASSES.find((b) => b.id === classId);
  if (!c) throw new Error(`no class ${classId}`);
  return {
    rider: { massKg: c.riderBodyMassKg[size], gearIncluded: false, skill: "intermediate", style: "moderate" },
    riding: { discipline: classId.startsWith("enduro") ? "enduro" : "motocross", terrain: [], jumpSize: "medium" },
    bike: structuredClone(c.spec),
    complaints: [],
    stock: {
      forkRatesNmm: [...sizingDefaults.TYPICAL_FORK_RATES_NMM],
      shockRatesNmm: [...sizingDefaults.TYPICAL_SHOCK_RATES_NMM],
    },
    ...extra,
  };
}
