import { describe, expect, it } from "vitest";
import {
  SizingInputError,
  idealRearSpring,
  rearWheelForceN,
  shockTravelAtMm,
  solveRearSagMm,
  sizingDefaults,
} from "../../../lib/sizing";

const constant = (ratio: number, travel = 300) => [
  { wheelTravelMm: 0, ratio },
  { wheelTravelMm: travel, ratio },
];

describe("constant leverage ratio closed forms", () => {
  // Source: virtual work for a rigid linkage, F_wheel·dy = F_shock·dx with dy/dx = LR; with a
  // constant ratio x = y/LR and wheel rate = k/LR² ("wheel rate = spring rate × motion ratio²",
  // Milliken & Milliken, Race Car Vehicle Dynamics, ch. 16, from memory).
  const LR = 2.5;
  it("shock travel is y/LR and wheel force k(p + y/LR)/LR", () => {
    expect(shockTravelAtMm(constant(LR), 100)).toBeCloseTo(40, 12);
    expect(rearWheelForceN({ curve: constant(LR), rateNmm: 50, preloadMm: 10, wheelTravelMm: 100 })).toBeCloseTo(
      (50 * (10 + 40)) / 2.5,
      9,
    );
  });

  it("the ideal spring reduces to k = LR²·ΔW/Δsag", () => {
    const Ws = 420;
    const Wr = 960;
    const { rateNmm, preloadMm } = idealRearSpring({
      curve: constant(LR),
      staticLoadN: Ws,
      raceLoadN: Wr,
      staticSagMm: 35,
      raceSagMm: 105,
    });
    expect(rateNmm).toBeCloseTo((LR * LR * (Wr - Ws)) / (105 - 35), 9);
    // and the preload puts the static sag where asked: W_s = k(p + y_s/LR)/LR.
    expect((rateNmm * (preloadMm + 35 / LR)) / LR).toBeCloseTo(Ws, 9);
  });
});

describe("linear leverage ratio", () => {
  it("shock travel is the logarithmic integral", () => {
    // Source: elementary integral ∫₀ʸ du/(a + b·u) = ln((a + b·y)/a)/b. a = 3, b = −1/300:
    // x(300) = −300·ln(2/3) = 121.6395 mm (hand/calculator).
    const curve = [
      { wheelTravelMm: 0, ratio: 3 },
      { wheelTravelMm: 300, ratio: 2 },
    ];
    expect(shockTravelAtMm(curve, 300)).toBeCloseTo(-300 * Math.log(2 / 3), 9);
    expect(shockTravelAtMm(curve, 300)).toBeCloseTo(121.6395, 4);
  });
});

describe("conservation of work", () => {
  it("work at the wheel over full travel equals work at the shock, for every generic class", () => {
    // Source: principle of virtual work / energy conservation for a frictionless linkage:
    // ∫F_w dy = ∫F_s dx = k(p·X + X²/2). Wheel side integrated numerically (Simpson), tolerance 0.1 %.
    for (const c of sizingDefaults.GENERIC_BIKE_CLASSES) {
      const curve = c.spec.rear.leverageCurve;
      const T = c.spec.rear.wheelTravelMm;
      const k = 50;
      const p = 8;
      const n = 3000;
      const h = T / n;
      let sum = 0;
      for (let i = 0; i <= n; i++) {
        const w = i === 0 || i === n ? 1 : i % 2 ? 4 : 2;
        sum += w * rearWheelForceN({ curve, rateNmm: k, preloadMm: p, wheelTravelMm: i * h });
      }
      const wheelWork = (sum * h) / 3;
      const X = shockTravelAtMm(curve, T);
      const shockWork = k * (p * X + (X * X) / 2);
      expect(Math.abs(wheelWork - shockWork) / shockWork).toBeLessThan(0.001);
    }
  });
});

describe("sag solver", () => {
  const curve = sizingDefaults.GENERIC_BIKE_CLASSES[0]!.spec.rear.leverageCurve;
  it("inverts the force law within 0.1 mm", () => {
    // Source: definition of sag as the travel where wheel force equals the load (lib/sizing/README.md).
    for (const y of [5, 35, 104, 200, 300]) {
      const W = rearWheelForceN({ curve, rateNmm: 52, preloadMm: 10, wheelTravelMm: y });
      expect(Math.abs(solveRearSagMm({ curve, rateNmm: 52, preloadMm: 10, loadN: W }) - y)).toBeLessThan(0.1);
    }
  });
  it("stays at 0 when the preload alone holds the load, and at full travel when it bottoms", () => {
    // F_w(0) = k·p/LR(0) (virtual work at top-out).
    const topOut = (52 * 10) / 3.05;
    expect(solveRearSagMm({ curve, rateNmm: 52, preloadMm: 10, loadN: topOut * 0.9 })).toBe(0);
    expect(solveRearSagMm({ curve, rateNmm: 1, preloadMm: 0, loadN: 1e5 })).toBe(310);
  });
  it("refuses broken curves naming the point", () => {
    const bad = (c: { wheelTravelMm: number; ratio: number }[]) => {
      try {
        shockTravelAtMm(c, 10);
      } catch (e) {
        expect(e).toBeInstanceOf(SizingInputError);
        return (e as SizingInputError).issues.map((i) => i.path);
      }
      return [];
    };
    expect(bad([{ wheelTravelMm: 0, ratio: 3 }])).toEqual(["curve"]);
    expect(
      bad([
        { wheelTravelMm: 0, ratio: 3 },
        { wheelTravelMm: 100, ratio: -1 },
      ]),
    ).toEqual(["curve.1.ratio"]);
    expect(
      bad([
        { wheelTravelMm: 0, ratio: 3 },
        { wheelTravelMm: 0, ratio: 2 },
      ]),
    ).toEqual(["curve.1.wheelTravelMm"]);
    expect(
      bad([
        { wheelTravelMm: 5, ratio: 3 },
        { wheelTravelMm: 100, ratio: 2 },
      ]),
    ).toEqual(["curve.0.wheelTravelMm"]);
  });
});
