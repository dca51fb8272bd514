import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  COMPLAINTS,
  DISCIPLINES,
  JUMP_SIZES,
  RIDING_STYLES,
  SKILL_LEVELS,
  SizingInputError,
  TERRAINS,
  evaluateSetup,
  idealRearSpring,
  recommend,
  recommendationSchema,
  rearWheelForceN,
  sizingDefaults,
  solveRearSagMm,
  type LeveragePoint,
  type SizingInput,
} from "../../../lib/sizing";
import { classInput } from "./fixtures";

// Properties from the physics (lib/sizing/README.md, "What the tests hold it to"); numRuns kept modest.
const RUNS = { numRuns: 60 };

/** Random progressive curve (ratio never rising with travel), as off-road linkages are (common practice). */
const progressiveCurve = fc
  .record({
    start: fc.double({ min: 2, max: 4, noNaN: true }),
    drops: fc.array(fc.double({ min: 0, max: 0.3, noNaN: true }), { minLength: 1, maxLength: 8 }),
    travel: fc.double({ min: 200, max: 340, noNaN: true }),
  })
  .map(({ start, drops, travel }): { curve: LeveragePoint[]; travel: number } => {
    let r = start;
    const curve = [{ wheelTravelMm: 0, ratio: r }];
    drops.forEach((d, i) => {
      r = Math.max(1, r - d);
      curve.push({ wheelTravelMm: (travel * (i + 1)) / drops.length, ratio: r });
    });
    return { curve, travel };
  });

const classIds = sizingDefaults.GENERIC_BIKE_CLASSES.map((c) => c.id);

const validInput = fc
  .record({
    classId: fc.constantFrom(...classIds),
    massFraction: fc.double({ min: 0, max: 1, noNaN: true }),
    gearIncluded: fc.boolean(),
    skill: fc.constantFrom(...SKILL_LEVELS),
    style: fc.constantFrom(...RIDING_STYLES),
    discipline: fc.constantFrom(...DISCIPLINES),
    terrain: fc.subarray([...TERRAINS]),
    complaints: fc.subarray([...COMPLAINTS]),
    jumpSize: fc.constantFrom(...JUMP_SIZES),
    forkStock: fc.subarray(sizingDefaults.TYPICAL_FORK_RATES_NMM),
    shockStock: fc.subarray(sizingDefaults.TYPICAL_SHOCK_RATES_NMM),
    rearShare: fc.double({ min: 0.55, max: 0.75, noNaN: true }),
  })
  .map((v): SizingInput => {
    const c = sizingDefaults.GENERIC_BIKE_CLASSES.find((b) => b.id === v.classId)!;
    const lo = c.riderBodyMassKg.light;
    const hi = c.riderBodyMassKg.heavy;
    return classInput(v.classId, "medium", {
      rider: { massKg: lo + v.massFraction * (hi - lo), gearIncluded: v.gearIncluded, skill: v.skill, style: v.style },
      riding: { discipline: v.discipline, terrain: v.terrain, jumpSize: v.jumpSize },
      complaints: v.complaints,
      stock: { forkRatesNmm: v.forkStock, shockRatesNmm: v.shockStock },
      targets: { riderRearShare: v.rearShare },
    });
  });

function allFinite(x: unknown): boolean {
  if (typeof x === "number") return Number.isFinite(x);
  if (Array.isArray(x)) return x.every(allFinite);
  if (x && typeof x === "object") return Object.values(x).every(allFinite);
  return true;
}

describe("properties of the ideal spring", () => {
  it("a heavier rider never gets a softer ideal spring (rear and front)", () => {
    fc.assert(
      fc.property(
        validInput,
        fc.double({ min: 15, max: 220, noNaN: true }),
        fc.double({ min: 0.5, max: 30, noNaN: true }),
        (input, massKg, extraKg) => {
          input.rider.massKg = massKg; // the whole valid range, not only the class's riders
          const heavier = structuredClone(input);
          heavier.rider.massKg += extraKg;
          const a = recommend(input);
          const b = recommend(heavier);
          expect(b.rear.idealRate.nMm).toBeGreaterThanOrEqual(a.rear.idealRate.nMm);
          expect(b.front.idealRate!.nMm).toBeGreaterThanOrEqual(a.front.idealRate!.nMm);
        },
      ),
      RUNS,
    );
  });

  it("a heavier race load never gives a softer ideal spring on any curve", () => {
    fc.assert(
      fc.property(progressiveCurve, fc.double({ min: 0.05, max: 1, noNaN: true }), ({ curve, travel }, more) => {
        const args = { curve, staticLoadN: 420, raceLoadN: 1000, staticSagMm: 0.11 * travel, raceSagMm: 0.33 * travel };
        const k1 = idealRearSpring(args).rateNmm;
        const k2 = idealRearSpring({ ...args, raceLoadN: 1000 * (1 + more) }).rateNmm;
        expect(k2).toBeGreaterThan(k1);
      }),
      RUNS,
    );
  });

  it("more target race sag never gives a stiffer ideal spring", () => {
    fc.assert(
      fc.property(progressiveCurve, fc.double({ min: 0.01, max: 0.1, noNaN: true }), ({ curve, travel }, more) => {
        const args = { curve, staticLoadN: 420, raceLoadN: 1000, staticSagMm: 0.11 * travel, raceSagMm: 0.3 * travel };
        const k1 = idealRearSpring(args).rateNmm;
        const k2 = idealRearSpring({ ...args, raceSagMm: (0.3 + more) * travel }).rateNmm;
        expect(k2).toBeLessThanOrEqual(k1);
      }),
      RUNS,
    );
  });

  it("more target sag in the shop's table never gives a stiffer recommendation (sag-window basis)", () => {
    // The sag-window basis sizes by the two sag targets, so deeper race sag must mean a softer spring.
    fc.assert(
      fc.property(validInput, fc.double({ min: 0.005, max: 0.04, noNaN: true }), (input, more) => {
        const d = input.riding.discipline;
        const t = sizingDefaults.SAG_TARGETS_BY_DISCIPLINE[d];
        input.targets = { ...input.targets, rateBasis: "sag-window" };
        const deeper = structuredClone(input);
        deeper.targets = {
          ...deeper.targets,
          sagByDiscipline: { [d]: { ...t, rearRace: t.rearRace + more, forkRace: t.forkRace + more } },
        };
        const a = recommend(input);
        const b = recommend(deeper);
        expect(b.rear.idealRate.nMm).toBeLessThanOrEqual(a.rear.idealRate.nMm);
        expect(b.front.idealRate!.nMm).toBeLessThanOrEqual(a.front.idealRate!.nMm);
      }),
      RUNS,
    );
  });
});

describe("the rate to order", () => {
  it("can always be fitted: its race-sag preload lies within the adjuster's limits", () => {
    fc.assert(
      fc.property(validInput, fc.double({ min: 15, max: 250, noNaN: true }), (input, massKg) => {
        input.rider.massKg = massKg;
        const r = recommend(input);
        const b = input.bike;
        expect(r.rear.idealPreloadMm).toBeGreaterThanOrEqual(b.rear.preloadMinMm - 1e-9);
        expect(r.rear.idealPreloadMm).toBeLessThanOrEqual(b.rear.preloadMaxMm + 1e-9);
        expect(r.front.idealPreloadMm!).toBeGreaterThanOrEqual((b.fork.preloadMinMm ?? 0) - 1e-9);
        expect(r.front.idealPreloadMm!).toBeLessThanOrEqual((b.fork.preloadMaxMm ?? 0) + 1e-9);
      }),
      RUNS,
    );
  });
});

describe("sag solver", () => {
  it("lands race sag on target within 0.1 mm", () => {
    fc.assert(
      fc.property(
        progressiveCurve,
        fc.double({ min: 0.05, max: 0.6, noNaN: true }),
        fc.double({ min: 20, max: 90, noNaN: true }),
        fc.double({ min: 300, max: 2000, noNaN: true }),
        ({ curve, travel }, frac, k, W) => {
          const y = frac * travel;
          // Preload that puts the sag at y, from the force law itself at a known point.
          const f0 = rearWheelForceN({ curve, rateNmm: k, preloadMm: 0, wheelTravelMm: y });
          const lr = k / (rearWheelForceN({ curve, rateNmm: k, preloadMm: 1, wheelTravelMm: y }) - f0); // = LR(y)
          const preload = (W - f0) * (lr / k);
          fc.pre(preload >= 0);
          expect(Math.abs(solveRearSagMm({ curve, rateNmm: k, preloadMm: preload, loadN: W }) - y)).toBeLessThan(0.1);
        },
      ),
      RUNS,
    );
  });

  it("recommendations put race sag on target within 0.1 mm whenever the preload was within limits", () => {
    fc.assert(
      fc.property(validInput, (input) => {
        const r = recommend(input);
        if (!r.warnings.some((w) => w.code === "REAR_PRELOAD_AT_LIMIT"))
          expect(Math.abs(r.rear.predicted.raceSagMm - r.rear.sagTargets.raceSagMm)).toBeLessThan(0.1);
        if (!r.warnings.some((w) => w.code === "FRONT_PRELOAD_AT_LIMIT"))
          expect(Math.abs(r.front.predicted.raceSagMm - r.front.sagTargets.raceSagMm)).toBeLessThan(0.1);
      }),
      RUNS,
    );
  });
});

describe("robustness", () => {
  it("never produces NaN or Infinity over random valid inputs", () => {
    fc.assert(
      fc.property(validInput, (input) => {
        const r = recommend(input);
        expect(allFinite({ ...r, input: null })).toBe(true);
        expect(recommendationSchema.safeParse(r).success).toBe(true);
      }),
      RUNS,
    );
  });

  it("stays finite at the edges of the valid range, with random tuner overrides", () => {
    const opt = (min: number, max: number) => fc.option(fc.double({ min, max, noNaN: true }), { nil: undefined });
    fc.assert(
      fc.property(
        fc.constantFrom(...classIds),
        fc.double({ min: 15, max: 250, noNaN: true }),
        fc.double({ min: 0.3, max: 0.95, noNaN: true }),
        fc.record({ rateNmm: opt(1, 400), preloadMm: opt(-20, 80) }),
        fc.record({ rateNmm: opt(0.1, 50), preloadMm: opt(-20, 80), oilLevelMm: opt(1, 400) }),
        (id, massKg, share, rear, front) => {
          const input = classInput(id, "medium", {
            rider: { massKg, gearIncluded: true, skill: "pro", style: "aggressive" },
            targets: { riderRearShare: share },
          });
          // An oil level that leaves no air above the fitted spring's steel is refused, naming the
          // override (a stiff spring's steel fills the air space above about 60 mm of oil level).
          let r;
          try {
            r = evaluateSetup(input, { rear, front });
          } catch (e) {
            expect(e).toBeInstanceOf(SizingInputError);
            expect((e as SizingInputError).issues.map((i) => i.path)).toEqual(["overrides.front.oilLevelMm"]);
            expect((e as SizingInputError).message).toMatch(/fills the air space above the oil/);
            return;
          }
          expect(allFinite({ ...r, input: null })).toBe(true);
        },
      ),
      { numRuns: 150 },
    );
  });

  const corruptions: [string, unknown][] = [
    ["rider.massKg", -1],
    ["rider.massKg", Number.NaN],
    ["rider.massKg", "80"],
    ["rider.massKg", 900],
    ["rider.skill", "legend"],
    ["riding.discipline", "rally"],
    ["riding.terrain", ["ice"]],
    ["complaints", ["squeaks"]],
    ["bike.massKg", 0],
    ["bike.frontFraction", 1.2],
    ["bike.rakeDeg", Number.POSITIVE_INFINITY],
    ["bike.rear.wheelTravelMm", -10],
    ["bike.rear.shockStrokeMm", 60],
    ["bike.rear.leverageCurve", []],
    ["bike.rear.collarPitchMm", 0],
    ["bike.fork.kind", "spring"],
    ["bike.fork.travelMm", 5000],
    ["bike.fork.stockOilLevelMm", 400],
    ["stock.forkRatesNmm", [-4]],
    ["stock.shockRatesNmm", "lots"],
    ["shop.gearMassKg", -3],
    ["targets.riderRearShare", 2],
  ];

  it("refuses invalid inputs with SizingInputError naming the field", () => {
    fc.assert(
      fc.property(validInput, fc.constantFrom(...corruptions), (input, [path, bad]) => {
        const obj = structuredClone(input) as unknown as Record<string, unknown>;
        const keys = path.split(".");
        let cur = obj;
        for (const k of keys.slice(0, -1)) {
          cur[k] ??= {};
          cur = cur[k] as Record<string, unknown>;
        }
        cur[keys.at(-1)!] = bad;
        try {
          recommend(obj as unknown as SizingInput);
          expect.unreachable(`accepted ${path} = ${String(bad)}`);
        } catch (e) {
          expect(e).toBeInstanceOf(SizingInputError);
          const paths = (e as SizingInputError).issues.map((i) => i.path);
          expect(paths.some((p) => p === path || p.startsWith(path + "."))).toBe(true);
        }
      }),
      { numRuns: 80 },
    );
  });
});
