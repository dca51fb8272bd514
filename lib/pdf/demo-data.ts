// An invented sheet for the benchmark and for checks that need no database: a generic bike class
// (typical values, not any maker's data) and an invented rider and shop.
import { recommend, sizingDefaults, type SizingInput } from "@/lib/sizing";
import type { SheetData } from "./sheet-data";

export function demoSizingInput(options: { airFork?: boolean } = {}): SizingInput {
  const bike = sizingDefaults.GENERIC_BIKE_CLASSES.find((c) => c.id === "mx-450-4t")!;
  const spec = structuredClone(bike.spec);
  if (options.airFork) {
    spec.fork = {
      ...spec.fork,
      kind: "air",
      stockRateNmm: undefined,
      air: { pistonAreaMm2: 900, chamberVolumeMm3: 400_000 },
    };
  }
  return {
    rider: { massKg: 84, gearIncluded: false, skill: "advanced", style: "moderate" },
    riding: { discipline: "motocross", terrain: ["loam", "hardpack"], jumpSize: "large" },
    bike: spec,
    complaints: ["bottoming"],
    stock: {
      forkRatesNmm: sizingDefaults.TYPICAL_FORK_RATES_NMM,
      shockRatesNmm: sizingDefaults.TYPICAL_SHOCK_RATES_NMM,
    },
  };
}

export function demoSheetData(
  options: { airFork?: boolean; draft?: boolean; paperSize?: "A4" | "LETTER"; imperial?: boolean } = {},
): SheetData {
  const approvedAt = new Date("2026-03-14T09:30:00Z");
  return {
    shop: {
      name: "Cinderline Suspension (demo)",
      email: "workshop@cinderline.test",
      phone: "+1 555 0100",
      address: "14 Gravel Pit Road, Demo Valley",
      website: "https://cinderline.test",
      imperial: options.imperial ?? false,
      paperSize: options.paperSize ?? "A4",
      footer: "Demo shop: every figure on this sheet comes from an invented scenario.",
    },
    request: {
      number: 1042,
      riderName: "Dario Lindqvist",
      bikeLabel: "450 four-stroke motocross (typical values)",
      bikeYear: 2024,
      discipline: "motocross",
      skill: "advanced",
      riderWeight: { value: 84, unit: "kg" },
      gearIncluded: false,
      forkOil: { type: null, volumeMlPerLeg: null },
    },
    version: {
      number: 1,
      state: options.draft ? "draft" : "approved",
      approvedAt: options.draft ? null : approvedAt,
      approverName: options.draft ? null : "Teo Brambleton",
      notesForRider: "Set race sag first, then check static sag.",
      updatedAt: approvedAt,
    },
    recommendation: recommend(demoSizingInput(options)),
    reportUrl: options.draft ? null : "http://localhost:3000/status/demo-token-demo-token-demo-token-0000",
    draft: options.draft ?? false,
  };
}
