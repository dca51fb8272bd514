import { describe, expect, it } from "vitest";
import {
  ATMOSPHERE_KPA,
  KGF_N,
  STANDARD_GRAVITY,
  airForkPressureKpaGauge,
  evaluateSetup,
  forkAirForceN,
  recommend,
  sagVerdict,
  sizingDefaults,
  solveRearSagMm,
  springSteelVolumeMm3,
  type SizingInput,
} from "../../../lib/sizing";
import { airSpringForce } from "../../../lib/sizing/air";
import { classInput } from "./fixtures";

// Model 2 (lib/sizing/README.md): ride-frequency rate basis, static sag as a check, negative air
// chamber, spring steel in the fork's air volume, sanity limits and the follow-up verdict.

const kgfStep = { rear: 0.2 * KGF_N, front: 0.02 * KGF_N }; // the typical shelf's steps (defaults.ts)

function referenceInput(id: string, extra: Partial<SizingInput> = {}): SizingInput {
  const c = sizingDefaults.GENERIC_BIKE_CLASSES.find((b) => b.id === id)!;
  return classInput(id, "medium", {
    rider: { massKg: c.spec.referenceRiderMassKg, gearIncluded: true, skill: "intermediate", style: "moderate" },
    ...extra,
  });
}

describe("every generic class is self-consistent", () => {
  for (const c of sizingDefaults.GENERIC_BIKE_CLASSES)
    it(`${c.id}: its reference rider gets the stock springs back, static sag in the window, preload in range`, () => {
      const r = recommend(referenceInput(c.id));
      // Within one shelf step of stock (the enduro discipline factor may move it one step).
      expect(Math.abs(r.rear.chosenRate.nMm - c.spec.rear.stockRateNmm)).toBeLessThanOrEqual(kgfStep.rear + 1e-9);
      expect(Math.abs(r.front.chosenRate!.nMm - c.spec.fork.stockRateNmm!)).toBeLessThanOrEqual(kgfStep.front + 1e-9);
      for (const end of [r.rear, r.front]) {
        const t = end.sagTargets;
        expect(end.predicted.staticSagMm).toBeGreaterThanOrEqual(t.staticSagMinMm - 2);
        expect(end.predicted.staticSagMm).toBeLessThanOrEqual(t.staticSagMaxMm + 2);
      }
      expect(r.rear.preloadMm).toBeGreaterThanOrEqual(c.spec.rear.preloadMinMm);
      expect(r.rear.preloadMm).toBeLessThanOrEqual(c.spec.rear.preloadMaxMm);
      expect(r.front.preloadMm!).toBeGreaterThanOrEqual(c.spec.fork.preloadMinMm ?? 0);
      expect(r.front.preloadMm!).toBeLessThanOrEqual(c.spec.fork.preloadMaxMm ?? 0);
      expect(r.warnings.map((w) => w.code)).not.toContain("REAR_PRELOAD_AT_LIMIT");
      expect(r.warnings.map((w) => w.code)).not.toContain("FRONT_PRELOAD_AT_LIMIT");
    });
});

describe("ride-frequency basis", () => {
  it("the rate grows with rider weight at a spring chart's slope (450 class, 60 to 100 kg)", () => {
    // From memory, typical shop spring charts: about 0.2–0.35 kgf/mm per 10 kg at the shock and
    // 0.02–0.03 at the fork; the window below allows 0.15–0.42 and 0.012–0.04.
    const at = (massKg: number) =>
      recommend(
        classInput("mx-450-4t", "medium", {
          rider: { massKg, gearIncluded: false, skill: "intermediate", style: "moderate" },
        }),
      );
    const a = at(60);
    const b = at(100);
    const rear = (b.rear.idealRate.kgfMm - a.rear.idealRate.kgfMm) / 4;
    const fork = (b.front.idealRate!.kgfMm - a.front.idealRate!.kgfMm) / 4;
    expect(rear).toBeGreaterThanOrEqual(0.15);
    expect(rear).toBeLessThanOrEqual(0.42);
    expect(fork).toBeGreaterThanOrEqual(0.012);
    expect(fork).toBeLessThanOrEqual(0.04);
  });

  it("constant leverage ratio: k = LR²·m·(2πf)² (single-DOF vibration, Rao eq. 2.19), to 1e-9", () => {
    // Wheel rate = k/LR² when the ratio is constant; f = √(k_wheel/m)/2π solved for k.
    const input = classInput("mx-450-4t", "heavy", { stock: { forkRatesNmm: [], shockRatesNmm: [] } });
    input.bike.rear.leverageCurve = [
      { wheelTravelMm: 0, ratio: 2.5 },
      { wheelTravelMm: 310, ratio: 2.5 },
    ];
    input.bike.rear.shockStrokeMm = 124; // 310 / 2.5
    input.bike.rear.preloadMaxMm = 40;
    const r = recommend(input);
    const f = r.rear.rateBasis!.rideFrequency!.targetFrequencyHz;
    const m = r.resolved.loads.rearRaceN / STANDARD_GRAVITY;
    const expected = (2.5 * 2.5 * m * (2 * Math.PI * f) ** 2) / 1000; // N/m → N/mm
    expect(Math.abs(r.rear.idealRate.nMm / expected - 1)).toBeLessThan(1e-9);
    // The stock spring's frequency for the reference rider, same formula: k_s = LR²·m_ref·(2πf_ref)².
    const ref = recommend({
      ...input,
      rider: { massKg: input.bike.referenceRiderMassKg, gearIncluded: true, skill: "intermediate", style: "moderate" },
    });
    const mRef = ref.resolved.loads.rearRaceN / STANDARD_GRAVITY;
    const fRef = r.rear.rateBasis!.rideFrequency!.referenceFrequencyHz;
    expect(
      Math.abs((2.5 * 2.5 * mRef * (2 * Math.PI * fRef) ** 2) / 1000 / input.bike.rear.stockRateNmm - 1),
    ).toBeLessThan(1e-9);
  });

  it("the ideal setup's frequency equals the target within 0.5 % before snapping, both ends", () => {
    for (const c of sizingDefaults.GENERIC_BIKE_CLASSES)
      for (const size of ["light", "heavy"] as const) {
        const r = recommend(classInput(c.id, size, { stock: { forkRatesNmm: [], shockRatesNmm: [] } }));
        for (const end of [r.rear, r.front]) {
          expect(end.source).toBe("order");
          const target = end.rateBasis!.rideFrequency!.targetFrequencyHz;
          expect(Math.abs(end.naturalFrequencyHz / target - 1)).toBeLessThan(0.005);
        }
      }
  });

  it("the sag-window rate is shown beside it, and the tuner can switch basis per request", () => {
    const input = classInput("mx-450-4t", "light");
    const freq = recommend(input);
    const win = evaluateSetup(input, { rateBasis: "sag-window" });
    expect(freq.rear.rateBasis!.used).toBe("ride-frequency");
    expect(win.rear.rateBasis!.used).toBe("sag-window");
    expect(win.resolved.rateBasis).toBe("sag-window");
    expect(win.rear.idealRate.nMm).toBeCloseTo(freq.rear.rateBasis!.sagWindow!.idealRateNmm, 9);
    expect(freq.rear.idealRate.nMm).toBeCloseTo(win.rear.rateBasis!.rideFrequency!.idealRateNmm, 9);
    // The shop's setup targets choose the default basis.
    expect(recommend({ ...input, targets: { rateBasis: "sag-window" } }).rear.rateBasis!.used).toBe("sag-window");
  });

  it("static sag outside the window is a warning that says which way, by how much, and the sag-window pick", () => {
    const r = recommend(classInput("mx-450-4t", "light"));
    const w = r.warnings.find((x) => x.code === "REAR_STATIC_SAG_OUTSIDE_WINDOW")!;
    const over = r.rear.predicted.staticSagMm - r.rear.sagTargets.staticSagMaxMm;
    expect(over).toBeGreaterThan(0);
    expect(w.message).toContain(`${over.toFixed(0)} mm above`);
    expect(w.message).toContain("stiff side");
    expect(w.message).toContain("Sized to the sag window instead, it would be");
    expect(w.requiresAcknowledgement).toBeUndefined();
  });

  it("with preload clamped, the spring's direction comes from its rate, not the distorted static sag", () => {
    // 30 N/mm on the 450 class needs preload far past the collar: race and static sag both sink.
    const r = evaluateSetup(classInput("mx-450-4t", "medium"), { rear: { rateNmm: 30 } });
    const codes = r.warnings.map((x) => x.code);
    expect(codes).toContain("REAR_PRELOAD_AT_LIMIT");
    for (const w of r.warnings.filter(
      (x) => x.code.startsWith("REAR_PRELOAD_AT_LIMIT") || x.code === "REAR_STATIC_SAG_OUTSIDE_WINDOW",
    )) {
      expect(w.message).toMatch(/soft/);
      expect(w.message).not.toMatch(/stiff/);
    }
  });
});

describe("air forks: positive and negative chamber (Boyle's law)", () => {
  const spring = { areaMm2: 1000, positiveVolumeMm3: 400_000, negativeVolumeMm3: 40_000, equalizeAtMm: 10 };

  it("the net force is zero where the chambers equalise", () => {
    expect(airSpringForce(spring, 1.2, 10, 1)).toBeCloseTo(0, 12);
    expect(airSpringForce(spring, 1.2, 10, 1.4)).toBeCloseTo(0, 12);
    expect(airSpringForce(spring, 1.2, 5, 1)).toBeLessThan(0); // the negative chamber pulls the fork in
  });

  it("matches a two-chamber Boyle's law case worked by hand", () => {
    // p₀ = 1 MPa abs at top-out. At s_eq: P_eq = 1·400 000/390 000. At s = 60 mm:
    // P_pos = 1·400 000/340 000 = 20/17 MPa; P_neg = P_eq·50 000/100 000 = 20/39 MPa;
    // F = (20/17 − 20/39)·1000 mm² = 663.650 N (Boyle: P·V constant at constant temperature).
    expect(airSpringForce(spring, 1, 60, 1)).toBeCloseTo(663.65008, 4);
  });

  it("airForkPressureKpaGauge keeps its one-chamber answer, and solves two chambers when given", () => {
    // One chamber: (P₀ + P_atm)·V = (W/A + P_atm)·(V − A·s), unchanged.
    const one = airForkPressureKpaGauge({
      pistonAreaMm2: 1000,
      chamberVolumeMm3: 400_000,
      loadN: 663.65008,
      sagMm: 60,
    });
    expect(one).toBeCloseTo((((663.65008 / 1000 + 0.101325) * 340_000) / 400_000) * 1000 - ATMOSPHERE_KPA, 6);
    const two = airForkPressureKpaGauge({
      pistonAreaMm2: 1000,
      chamberVolumeMm3: 400_000,
      loadN: 663.65008,
      sagMm: 60,
      negativeChamberVolumeMm3: 40_000,
      equalizeAtMm: 10,
    });
    expect(two).toBeCloseTo(1000 - ATMOSPHERE_KPA, 3); // the hand case above: 1 MPa abs
  });
});

describe("fork air volume includes the spring's steel", () => {
  it("steel volume π²·d²·D·N_t/4 for a coil worked by hand", () => {
    // d = 4.5 mm, D = 36 mm, N_t = 18: π²·20.25·36·18/4 = 9.8696044·3280.5 = 32 377.24 mm³.
    expect(springSteelVolumeMm3({ wireDiameterMm: 4.5, meanCoilDiameterMm: 36, totalCoils: 18 })).toBeCloseTo(
      32377.237,
      2,
    );
  });

  it("fitting the spring raises the air force at every travel", () => {
    const leg = {
      displacementDiameterMm: 48,
      freeAreaMm2: 1250,
      capVolumeMm3: 25_000,
      oilLevelMm: 110,
      forkTravelMm: 310,
      polytropicIndex: 1.4,
    };
    for (const travelMm of [50, 150, 300]) {
      const without = forkAirForceN({ ...leg, travelMm });
      const withSpring = forkAirForceN({ ...leg, travelMm, springVolumeMm3: 32_377 });
      expect(withSpring).toBeGreaterThan(without);
    }
    // No spring volume passed: today's answer, V₀ = A_free·h + V_cap + A_d·T (isothermal, by hand).
    const ad = (Math.PI / 4) * 48 * 48;
    const v0 = 1250 * 110 + 25_000 + ad * 310;
    expect(forkAirForceN({ ...leg, polytropicIndex: 1, travelMm: 100 })).toBeCloseTo(
      ((0.101325 * v0) / (v0 - ad * 100) - 0.101325) * ad,
      9,
    );
  });
});

describe("sanity limits block approval until acknowledged", () => {
  it("a coil fork with a tiny air gap is flagged instead of reporting meganewtons", () => {
    const input = classInput("mx-450-4t", "medium");
    input.bike.fork.capVolumeMm3 = 0;
    input.bike.fork.freeAreaMm2 = 300;
    input.bike.fork.oilLevelMinMm = 105;
    input.bike.fork.stockOilLevelMm = 110;
    input.bike.fork.oilLevelMaxMm = 115;
    const r = recommend(input);
    const flagged = r.warnings.filter((w) => w.requiresAcknowledgement);
    expect(flagged.map((w) => w.code)).toEqual(expect.arrayContaining(["FRONT_AIR_GAP_TOO_SMALL"]));
    expect(Number.isFinite(r.front.bottoming.forceN)).toBe(true);
  });

  it("a bike held topped out under its own weight is flagged (static sag 0 on a coil end)", () => {
    // k·p/LR(0) = 60·25/3.05 = 492 N exceeds the 408 N static rear load: the preload alone holds it.
    const r = evaluateSetup(classInput("mx-450-4t", "heavy"), { rear: { rateNmm: 60, preloadMm: 25 } });
    expect(r.rear.predicted.staticSagMm).toBe(0);
    expect(r.warnings.find((w) => w.code === "REAR_STATIC_SAG_ZERO")?.requiresAcknowledgement).toBe(true);
  });
});

describe("follow-up verdict, model 2", () => {
  const input = classInput("mx-450-4t", "medium");
  const rec = recommend(input);
  const curve = input.bike.rear.leverageCurve;
  const k = rec.rear.chosenRate.nMm;

  it("a measured static sag of 0 mm is too soft (the preload holds the bike topped out)", () => {
    const v = sagVerdict({
      input,
      recommendation: rec,
      end: "rear",
      measured: { staticSagMm: 0, raceSagMm: rec.rear.sagTargets.raceSagMm },
    });
    expect(v.verdict).toBe("too-soft");
    expect(v.action).toBe("change-spring");
    expect(v.suggestedRateNmm!).toBeGreaterThan(k);
  });

  it("never advises preload outside the range: past it, the verdict is a spring change", () => {
    // A fork whose race sag needs more preload than the 12 mm the adjuster has: much deeper race sag.
    const fork = recommend(input);
    const deep = fork.front.sagTargets.raceSagMm + 12;
    const v = sagVerdict({
      input,
      recommendation: fork,
      end: "front",
      measured: { staticSagMm: fork.front.predicted.staticSagMm + 4, raceSagMm: deep },
    });
    expect(v.verdict).toBe("too-soft");
    expect(v.action).toBe("change-spring");
    expect(v.newPreloadMm!).toBeLessThanOrEqual(input.bike.fork.preloadMaxMm! + 1e-9);
    expect(v.suggestedRateNmm!).toBeGreaterThan(fork.front.chosenRate!.nMm);
    expect(v.nearestStockRateNmm).not.toBeNull();
    expect(v.message).not.toMatch(/add \d+(\.\d)? mm preload/);
  });

  it("names an order when the nearest stocked rate is more than one shelf step away", () => {
    const sparse = classInput("mx-450-4t", "medium", {
      stock: { forkRatesNmm: [4.9], shockRatesNmm: [52.956, 53.937, 54.917, 80] },
    });
    const r = recommend(sparse);
    const measured = {
      staticSagMm: solveRearSagMm({
        curve,
        rateNmm: r.rear.chosenRate.nMm,
        preloadMm: r.rear.preloadMm,
        loadN: r.resolved.loads.rearStaticN,
      }),
      raceSagMm: solveRearSagMm({
        curve,
        rateNmm: r.rear.chosenRate.nMm,
        preloadMm: r.rear.preloadMm,
        loadN: r.resolved.loads.rearRaceN * 1.2,
      }),
    };
    const v = sagVerdict({ input: sparse, recommendation: r, end: "rear", measured });
    expect(v.verdict).toBe("too-soft");
    expect(v.message).toMatch(/more than one shelf step away: order/);
  });

  it("readings that imply loads more than 25 % off the model's: measure again, no spring prescribed", () => {
    const v = sagVerdict({ input, recommendation: rec, end: "rear", measured: { staticSagMm: 10, raceSagMm: 150 } });
    expect(v.verdict).toBe("recheck");
    expect(v.impliedLoads!.plausible).toBe(false);
    expect(v.suggestedRateNmm).toBeNull();
    expect(v.preloadChangeMm).toBeNull();
    expect(v.message).toMatch(/Measure again/);
  });

  it("tiny corrections are rounded to leave it (under 0.5 mm or a quarter collar turn)", () => {
    const p = rec.rear.preloadMm;
    const W = rec.resolved.loads;
    // What the rider would read on the recommended setup with 0.3 kg more on the rear.
    const measured = {
      staticSagMm: solveRearSagMm({ curve, rateNmm: k, preloadMm: p, loadN: W.rearStaticN }),
      raceSagMm: solveRearSagMm({ curve, rateNmm: k, preloadMm: p, loadN: W.rearRaceN + 0.3 * STANDARD_GRAVITY }),
    };
    const v = sagVerdict({ input, recommendation: rec, end: "rear", measured });
    expect(v.verdict).toBe("right");
    expect(v.action).toBe("leave-it");
    expect(v.preloadChangeMm).toBe(0);
    expect(v.message).toContain("leave the preload as it is");
  });
});
