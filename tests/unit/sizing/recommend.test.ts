import { describe, expect, it } from "vitest";
import {
  ENGINE_VERSION,
  SizingInputError,
  evaluateSetup,
  recommend,
  recommendationSchema,
  rearWheelForceN,
  sizingDefaults,
  solveRearSagMm,
  type Recommendation,
  type SizingInput,
} from "../../../lib/sizing";
import { classInput, type RiderSize } from "./fixtures";

const sizes: RiderSize[] = ["light", "medium", "heavy"];

function issuesOf(f: () => unknown): string[] {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(SizingInputError);
    return (e as SizingInputError).issues.map((i) => i.path);
  }
  return [];
}

describe("end to end: every generic class × light, medium, heavy rider", () => {
  for (const c of sizingDefaults.GENERIC_BIKE_CLASSES)
    for (const size of sizes)
      it(`${c.id}, ${size} rider`, () => {
        const r = recommend(classInput(c.id, size));
        recommendationSchema.parse(r); // shape, and no NaN/Infinity anywhere
        const range = sizingDefaults.TYPICAL_OUTPUT_RANGES[c.id]!;
        // Typical ranges: defaults.ts, from memory of shop sizing charts (see its comment).
        expect(r.rear.chosenRate.nMm).toBeGreaterThanOrEqual(range.shockRateNmm[0]);
        expect(r.rear.chosenRate.nMm).toBeLessThanOrEqual(range.shockRateNmm[1]);
        expect(r.front.chosenRate!.nMm).toBeGreaterThanOrEqual(range.forkRateNmm[0]);
        expect(r.front.chosenRate!.nMm).toBeLessThanOrEqual(range.forkRateNmm[1]);
        // From the shop's shelf, within the collar's preload range, race sag on target to 0.1 mm
        // (selection rule, lib/sizing/README.md). Static sag is a check: outside the window there is
        // a warning saying so, inside none (light riders often read more on chart springs: common practice).
        expect(r.rear.source).toBe("stock");
        expect(sizingDefaults.TYPICAL_SHOCK_RATES_NMM).toContain(r.rear.chosenRate.nMm);
        expect(r.rear.preloadMm).toBeGreaterThanOrEqual(c.spec.rear.preloadMinMm);
        expect(r.rear.preloadMm).toBeLessThanOrEqual(c.spec.rear.preloadMaxMm);
        expect(Math.abs(r.rear.predicted.raceSagMm - r.rear.sagTargets.raceSagMm)).toBeLessThan(0.1);
        const t = r.rear.sagTargets;
        const outside =
          r.rear.predicted.staticSagMm < t.staticSagMinMm || r.rear.predicted.staticSagMm > t.staticSagMaxMm;
        expect(r.warnings.some((w) => w.code === "REAR_STATIC_SAG_OUTSIDE_WINDOW")).toBe(outside);
        expect(r.rear.rateBasis?.used).toBe("ride-frequency");
        // Rear race sag about a third of travel, static 10–13.5 %: common practice (defaults.ts).
        expect(r.rear.sagTargets.raceSagMm / c.spec.rear.wheelTravelMm).toBeGreaterThan(0.3);
        expect(r.rear.sagTargets.raceSagMm / c.spec.rear.wheelTravelMm).toBeLessThan(0.36);
        // Collar turns from the thread pitch: turns = preload / pitch (screw thread definition).
        expect(r.rear.preloadCollarTurns * c.spec.rear.collarPitchMm).toBeCloseTo(r.rear.preloadMm, 9);
        // Oil level: inside the fork's range, in 5 mm steps from stock (common practice step).
        const oil = r.front.oilLevelMm!;
        expect(oil).toBeGreaterThanOrEqual(c.spec.fork.oilLevelMinMm);
        expect(oil).toBeLessThanOrEqual(c.spec.fork.oilLevelMaxMm);
        expect(
          Math.abs((oil - c.spec.fork.stockOilLevelMm) / 5 - Math.round((oil - c.spec.fork.stockOilLevelMm) / 5)),
        ).toBeLessThan(1e-9);
        // Charts: at least 30 points, from top-out to full travel, force rising (springs only push harder).
        expect(r.rear.forceCurve.length).toBeGreaterThanOrEqual(30);
        expect(r.front.forceCurve.length).toBeGreaterThanOrEqual(30);
        expect(r.rear.forceCurve.at(-1)!.wheelTravelMm).toBe(c.spec.rear.wheelTravelMm);
        expect(r.front.forceCurve.at(-1)!.forkTravelMm).toBe(c.spec.fork.travelMm);
        expect(r.front.oilLevelCurves.map((o) => o.oilLevelMm)).toContain(oil);
        expect(r.front.oilLevelCurves.length).toBeGreaterThanOrEqual(2);
        // Natural frequencies f = √(k/m)/2π from the reported wheel rate and sprung mass (Rao, Mechanical Vibrations).
        expect(r.rear.naturalFrequencyHz).toBeCloseTo(
          Math.sqrt((r.rear.wheelRateAtSagNmm * 1000) / r.rear.sprungMassKg) / (2 * Math.PI),
          9,
        );
        expect(r.frequencyRatio).toBeCloseTo(r.front.naturalFrequencyHz / r.rear.naturalFrequencyHz, 12);
        expect(r.warnings.filter((w) => w.severity === "critical" || w.requiresAcknowledgement)).toEqual([]);
        expect(r.engineVersion).toBe(ENGINE_VERSION);
      });
});

describe("loads", () => {
  it("follow the axle-load formulas of the model", () => {
    // Source: static equilibrium (lib/sizing/README.md, loads), hand arithmetic for the 450 class, 80 kg + 8 kg gear:
    // W_rs = (111·0.51 − 15)·9.80665 = 41.61·9.80665 = 408.055 N; W_rr = W_rs + 88·0.65·9.80665 = 968.995 N;
    // W_fs = (111·0.49 − 10)·9.80665·cos 27° = 44.39·9.80665·0.891007 = 387.870 N;
    // W_fr = W_fs + 88·0.35·9.80665·0.891007 = 656.994 N.
    const r = recommend(classInput("mx-450-4t", "medium"));
    expect(r.resolved.riderMassWithGearKg).toBe(88);
    expect(r.resolved.loads.rearStaticN).toBeCloseTo(408.055, 2);
    expect(r.resolved.loads.rearRaceN).toBeCloseTo(968.995, 2);
    expect(r.resolved.loads.frontStaticN).toBeCloseTo(387.87, 2);
    expect(r.resolved.loads.frontRaceN).toBeCloseTo(656.994, 2);
  });

  it("a single-spring fork carries the load on one spring: its per-leg rate is about twice", () => {
    // The coil force is n_s·k·(p + s); the air differs only by one spring's steel (lib/sizing/README.md),
    // so the single spring's rate sits between 1.9 and 2.1 times the per-leg rate of two springs.
    const both = recommend(classInput("mx-450-4t", "medium", { targets: { rateBasis: "sag-window" } }));
    const single = classInput("mx-450-4t", "medium", { targets: { rateBasis: "sag-window" } });
    single.bike.fork.kind = "coil-single";
    const r = recommend(single);
    expect(r.front.sprungLegs).toBe(1);
    expect(r.front.idealRate!.nMm / both.front.idealRate!.nMm).toBeGreaterThan(1.9);
    expect(r.front.idealRate!.nMm / both.front.idealRate!.nMm).toBeLessThan(2.1);
  });

  it("when no spring can meet both sag targets it sizes on race sag and says so", () => {
    const r = recommend(
      classInput("mx-450-4t", "light", {
        rider: { massKg: 20, gearIncluded: true, skill: "beginner", style: "smooth" },
        targets: { riderRearShare: 0.95, rateBasis: "sag-window" },
      }),
    );
    const w = r.warnings.find((x) => x.code === "FRONT_SAG_TARGETS_UNREACHABLE");
    expect(w?.field).toBe("front.sagTargets");
    expect(r.front.idealRate!.nMm).toBeGreaterThan(0);
  });

  it("a heavier rider gets a stiffer or equal spring at each end", () => {
    const a = recommend(classInput("mx-250-4t", "light"));
    const b = recommend(classInput("mx-250-4t", "heavy"));
    expect(b.rear.chosenRate.nMm).toBeGreaterThan(a.rear.chosenRate.nMm);
    expect(b.front.chosenRate!.nMm).toBeGreaterThan(a.front.chosenRate!.nMm);
  });
});

describe("stock selection and ordering", () => {
  it("with nothing on the shelf the ideal rate is to order (sag-window basis: both targets met)", () => {
    const r = recommend(
      classInput("mx-450-4t", "medium", {
        stock: { forkRatesNmm: [], shockRatesNmm: [] },
        targets: { rateBasis: "sag-window" },
      }),
    );
    expect(r.rear.source).toBe("order");
    expect(r.rear.chosenRate.nMm).toBeCloseTo(r.rear.idealRate.nMm, 9);
    expect(r.warnings.map((w) => w.code)).toContain("REAR_TO_ORDER");
    // The ideal spring meets both targets: race on target and static at the window's middle.
    expect(r.rear.predicted.raceSagMm).toBeCloseTo(r.rear.sagTargets.raceSagMm, 6);
    expect(r.rear.predicted.staticSagMm).toBeCloseTo(
      (r.rear.sagTargets.staticSagMinMm + r.rear.sagTargets.staticSagMaxMm) / 2,
      6,
    );
  });

  it("when nothing stocked fits, the nearest is shown with a warning naming the rate to order", () => {
    const r = recommend(classInput("mx-450-4t", "heavy", { stock: { forkRatesNmm: [4.5], shockRatesNmm: [40] } }));
    expect(r.rear.source).toBe("stock-nearest");
    const w = r.warnings.find((x) => x.code === "REAR_NO_STOCK_FIT");
    expect(w?.severity).toBe("caution");
    expect(w?.message).toContain(r.rear.idealRate.nMm.toFixed(1));
  });

  it("the bike's reference rider on the stock spring keeps the stock oil level", () => {
    // The oil level rule (lib/sizing/README.md) holds bottoming resistance at the stock bike's value for
    // its reference rider: that rider, on the stock spring, must land on the stock level.
    const c = sizingDefaults.GENERIC_BIKE_CLASSES[0]!;
    const input = classInput(c.id, "medium", {
      rider: { massKg: c.spec.referenceRiderMassKg, gearIncluded: true, skill: "intermediate", style: "moderate" },
    });
    const r = evaluateSetup(input, {
      front: { rateNmm: c.spec.fork.stockRateNmm, preloadMm: c.spec.fork.stockPreloadMm },
    });
    expect(r.front.oilLevelMm).toBe(c.spec.fork.stockOilLevelMm);
  });
});

describe("air fork", () => {
  const air = (): SizingInput => {
    const input = classInput("mx-450-4t", "medium");
    input.bike.fork = {
      ...input.bike.fork,
      kind: "air",
      stockRateNmm: undefined,
      air: { pistonAreaMm2: 900, chamberVolumeMm3: 400_000 },
    };
    return input;
  };
  it("gives a pressure that puts race sag on target, in kPa, bar and psi", () => {
    const r = recommend(air());
    recommendationSchema.parse(r);
    expect(r.front.chosenRate).toBeNull();
    expect(r.front.oilLevelMm).toBeNull();
    const p = r.front.airPressure!;
    // Boyle's law, two chambers (lib/sizing/README.md): charge p₀ at top-out, equalised at s_eq, so at
    // race sag s: F = p₀·V_p·A·(1/(V_p − A·s) − (V_n + A·s_eq)/((V_p − A·s_eq)(V_n + A·s))) = W_fr.
    const s = r.front.sagTargets.raceSagMm;
    const { volumeMm3: Vn, equalizeAtMm: se, typical } = r.front.negativeChamber!;
    expect(typical).toBe(true);
    const p0 = p.kpaGauge / 1000 + 0.101325;
    const F =
      p0 * 400_000 * 900 * (1 / (400_000 - 900 * s) - (Vn + 900 * se) / ((400_000 - 900 * se) * (Vn + 900 * s)));
    expect(F).toBeCloseTo(r.resolved.loads.frontRaceN, 6);
    expect(r.front.predicted.raceSagMm).toBeCloseTo(s, 3);
    expect(p.barGauge).toBeCloseTo(p.kpaGauge / 100, 12); // 1 bar = 100 kPa (definition)
  });
  it("a typical air fork's static sag comes out of the same force law, inside its window", () => {
    // Negative chamber volume and port position typical (defaults, from memory); window: defaults.
    const r = recommend(air());
    expect(r.front.predicted.staticState).toBe("ok");
    expect(r.front.predicted.staticSagMm).toBeGreaterThanOrEqual(r.front.sagTargets.staticSagMinMm);
    expect(r.front.predicted.staticSagMm).toBeLessThanOrEqual(r.front.sagTargets.staticSagMaxMm);
    expect(r.warnings.map((w) => w.code)).not.toContain("FRONT_STATIC_SAG_OUTSIDE_WINDOW");
  });
  it("an overridden pressure moves race sag the way Boyle's law says, and coil-only overrides are flagged", () => {
    const r = evaluateSetup(air(), { front: { airPressureKpaGauge: 400, rateNmm: 4.5 } });
    expect(r.front.airPressure!.kpaGauge).toBe(400);
    // At the predicted sag the two-chamber force above equals the load.
    const s = r.front.predicted.raceSagMm;
    const { volumeMm3: Vn, equalizeAtMm: se } = r.front.negativeChamber!;
    const p0 = 0.4 + 0.101325;
    const F =
      p0 * 400_000 * 900 * (1 / (400_000 - 900 * s) - (Vn + 900 * se) / ((400_000 - 900 * se) * (Vn + 900 * s)));
    expect(F).toBeCloseTo(r.resolved.loads.frontRaceN, 4);
    expect(s).toBeGreaterThan(r.front.sagTargets.raceSagMm); // less pressure than needed: deeper sag
    expect(r.warnings.find((w) => w.code === "OVERRIDE_NOT_APPLICABLE")?.field).toBe("overrides.front.rateNmm");
  });
  it("refuses an air fork without chamber data, naming the field", () => {
    const input = air();
    delete input.bike.fork.air;
    expect(issuesOf(() => recommend(input))).toEqual(["bike.fork.air"]);
  });
});

describe("tuner overrides (evaluateSetup)", () => {
  const base = classInput("mx-450-4t", "medium");
  it("recomputes sag from an overridden rate and preload", () => {
    const r = evaluateSetup(base, { rear: { rateNmm: 48, preloadMm: 14 } });
    expect(r.rear.source).toBe("override");
    expect(r.rear.chosenRate.nMm).toBe(48);
    expect(r.rear.preloadMm).toBe(14);
    const curve = base.bike.rear.leverageCurve;
    expect(r.rear.predicted.raceSagMm).toBeCloseTo(
      solveRearSagMm({ curve, rateNmm: 48, preloadMm: 14, loadN: r.resolved.loads.rearRaceN }),
      9,
    );
    expect(r.rear.bottoming.forceN).toBeCloseTo(
      rearWheelForceN({ curve, rateNmm: 48, preloadMm: 14, wheelTravelMm: 310 }),
      9,
    );
  });
  it("applies oil level, sag targets and clicker positions, and warns outside the limits", () => {
    const r = evaluateSetup(base, {
      front: { oilLevelMm: 160, raceSagMm: 60 },
      rear: { raceSagMm: 100, staticSagMinMm: 30, staticSagMaxMm: 40 },
      clickers: { forkCompression: 5 },
    });
    expect(r.front.oilLevelMm).toBe(160);
    expect(r.front.sagTargets.raceSagMm).toBe(60);
    expect(r.rear.sagTargets).toEqual({ raceSagMm: 100, staticSagMinMm: 30, staticSagMaxMm: 40 });
    expect(r.rear.predicted.raceSagMm).toBeCloseTo(100, 1);
    expect(r.clickers.find((c) => c.id === "forkCompression")!.position).toBe(5);
    expect(r.warnings.map((w) => w.code)).toContain("FRONT_OIL_LEVEL_OUTSIDE_RANGE");
  });
  it("refuses nonsense overrides with the override's path", () => {
    expect(issuesOf(() => evaluateSetup(base, { rear: { rateNmm: -3 } }))).toEqual(["overrides.rear.rateNmm"]);
    expect(issuesOf(() => evaluateSetup(base, { rear: { raceSagMm: 20, staticSagMinMm: 30 } }))).toEqual([
      "overrides.rear",
    ]);
  });
  it("is deterministic: same input and overrides, same output", () => {
    expect(evaluateSetup(base, { front: { preloadMm: 6 } })).toEqual(evaluateSetup(base, { front: { preloadMm: 6 } }));
  });
});

describe("clickers", () => {
  it("start from stock, move per rule with a reason each, and clamp to the adjuster", () => {
    const input = classInput("mx-450-4t", "medium", {
      complaints: ["bottoming", "kicks"],
      riding: { discipline: "motocross", terrain: ["sand"], jumpSize: "large" },
    });
    const r: Recommendation = recommend(input);
    const byId = Object.fromEntries(r.clickers.map((c) => [c.id, c]));
    // Defaults (common practice): bottoming −2 and sand −2 on fork compression from stock 12.
    expect(byId.forkCompression!.position).toBe(8);
    expect(byId.forkCompression!.moves.map((m) => m.reason)).toHaveLength(2);
    expect(byId.shockHighSpeedCompression!.position).toBe(1.25);
    expect(byId.shockHighSpeedCompression!.unit).toBe("turns");
    const clamped = evaluateSetup(input, { clickers: { shockRebound: 40 } });
    expect(clamped.clickers.find((c) => c.id === "shockRebound")!.position).toBe(20);
    expect(clamped.warnings.map((w) => w.code)).toContain("CLICKER_CLAMPED");
  });
  it("shop rules replace the defaults", () => {
    const input = classInput("mx-450-4t", "medium", {
      complaints: ["wallows"],
      clickerRules: [
        {
          trigger: { kind: "complaint", complaint: "wallows" },
          clicker: "shockRebound",
          change: -3,
          reason: "Our rule",
        },
      ],
    });
    const r = recommend(input);
    const reb = r.clickers.find((c) => c.id === "shockRebound")!;
    expect(reb.position).toBe(9);
    expect(reb.moves).toEqual([{ change: -3, reason: "Our rule" }]);
    expect(r.clickers.find((c) => c.id === "shockLowSpeedCompression")!.position).toBe(12);
  });
});

describe("refused input names each bad field", () => {
  it("rider mass, discipline and stock", () => {
    const input = classInput("mx-450-4t", "medium") as unknown as Record<string, Record<string, unknown>>;
    input.rider!.massKg = -5;
    input.riding!.discipline = "rally";
    input.stock!.shockRatesNmm = [50, Number.NaN];
    expect(issuesOf(() => recommend(input as unknown as SizingInput)).sort()).toEqual([
      "rider.massKg",
      "riding.discipline",
      "stock.shockRatesNmm.1",
    ]);
  });
  it("a leverage curve that does not integrate to the shock stroke", () => {
    const input = classInput("mx-450-4t", "medium");
    input.bike.rear.shockStrokeMm = 120;
    const paths = issuesOf(() => recommend(input));
    expect(paths).toEqual(["bike.rear.shockStrokeMm"]);
  });
  it("a curve that stops short of the wheel travel, and unsprung mass above the axle load", () => {
    const input = classInput("mx-450-4t", "medium");
    input.bike.rear.wheelTravelMm = 330;
    input.bike.unsprungFrontKg = 55;
    expect(issuesOf(() => recommend(input)).sort()).toEqual(["bike.rear.leverageCurve", "bike.unsprungFrontKg"]);
  });
  it("a measured sag far from the new target is noted", () => {
    const r = recommend(classInput("mx-450-4t", "medium", { measuredSag: { rearRaceSagMm: 125 } }));
    expect(r.warnings.find((w) => w.code === "MEASURED_SAG_DIFFERS")?.field).toBe("measuredSag.rearRaceSagMm");
  });
  it("a rider outside the bike's range is a caution, not a silent answer", () => {
    const r = recommend(
      classInput("youth-85", "medium", {
        rider: { massKg: 110, gearIncluded: false, skill: "novice", style: "smooth" },
      }),
    );
    expect(r.warnings.find((w) => w.code === "RIDER_OUTSIDE_BIKE_RANGE")?.field).toBe("rider.massKg");
  });
});
