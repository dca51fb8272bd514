import { describe, expect, it } from "vitest";
import { SizingInputError, recommend, sagVerdict, solveRearSagMm, STANDARD_GRAVITY } from "../../../lib/sizing";
import { forkForce } from "../../../lib/sizing/fork";
import { coilForkOf } from "../../../lib/sizing/front";
import { firstCrossing } from "../../../lib/sizing/solve";
import { classInput } from "./fixtures";

// The follow-up rule (lib/sizing/README.md, common practice, no published source): with race sag reset
// to target by preload, static sag below the window means the spring is too soft, above it too stiff.
// Each test "measures" sag on a rider whose real mass differs from what was entered, using the force
// law, and checks the verdict's direction and its arithmetic.

const input = classInput("mx-450-4t", "medium");
const rec = recommend(input);
const curve = input.bike.rear.leverageCurve;

function measuredRear(extraKg: number) {
  const { rearStaticN, rearRaceN } = rec.resolved.loads;
  const k = rec.rear.chosenRate.nMm;
  const p = rec.rear.preloadMm;
  const raceN = rearRaceN + extraKg * rec.resolved.riderRearShare * STANDARD_GRAVITY;
  return {
    staticSagMm: solveRearSagMm({ curve, rateNmm: k, preloadMm: p, loadN: rearStaticN }),
    raceSagMm: solveRearSagMm({ curve, rateNmm: k, preloadMm: p, loadN: raceN }),
  };
}

describe("sag verdict, rear", () => {
  it("the rider the spring was chosen for: right, no preload change", () => {
    const v = sagVerdict({ input, recommendation: rec, end: "rear", measured: measuredRear(0) });
    expect(v.verdict).toBe("right");
    expect(Math.abs(v.preloadChangeMm!)).toBeLessThan(0.01);
    expect(v.byMm).toBe(0);
  });

  it("a much heavier rider: too soft, add preload, a stiffer rate suggested", () => {
    const v = sagVerdict({ input, recommendation: rec, end: "rear", measured: measuredRear(25) });
    expect(v.verdict).toBe("too-soft");
    expect(v.raceSagErrorMm).toBeGreaterThan(0);
    expect(v.preloadChangeMm!).toBeGreaterThan(0);
    // Collar turns = preload change / thread pitch (screw thread definition).
    expect(v.collarTurnsChange! * input.bike.rear.collarPitchMm).toBeCloseTo(v.preloadChangeMm!, 9);
    expect(v.suggestedRateNmm!).toBeGreaterThan(rec.rear.chosenRate.nMm);
    expect(v.byMm).toBeCloseTo(rec.rear.sagTargets.staticSagMinMm - v.predictedStaticSagMm, 9);
    expect(v.message).toMatch(/too soft/);
  });

  it("a much lighter rider: too stiff, remove preload, a softer rate suggested", () => {
    const v = sagVerdict({ input, recommendation: rec, end: "rear", measured: measuredRear(-25) });
    expect(v.verdict).toBe("too-stiff");
    expect(v.preloadChangeMm!).toBeLessThan(0);
    expect(v.suggestedRateNmm!).toBeLessThan(rec.rear.chosenRate.nMm);
    expect(v.nearestStockRateNmm).not.toBeNull();
  });

  it("refuses race sag smaller than static sag, naming the field", () => {
    try {
      sagVerdict({ input, recommendation: rec, end: "rear", measured: { staticSagMm: 40, raceSagMm: 30 } });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(SizingInputError);
      expect((e as SizingInputError).issues[0]?.path).toBe("measured.raceSagMm");
    }
  });
});

describe("sag verdict, front", () => {
  it("a much heavier rider compresses the fork more: too soft, add preload", () => {
    const fk = coilForkOf(rec.input.bike);
    const k = rec.front.chosenRate!.nMm;
    const p = rec.front.preloadMm!;
    const h = rec.front.oilLevelMm!;
    const F = (s: number) => forkForce(fk, k, p, h, s, 1);
    const heavierN =
      rec.resolved.loads.frontRaceN +
      50 * (1 - rec.resolved.riderRearShare) * STANDARD_GRAVITY * Math.cos((27 * Math.PI) / 180);
    const measured = {
      staticSagMm: firstCrossing(F, rec.resolved.loads.frontStaticN, fk.travelMm, []).sagMm,
      raceSagMm: firstCrossing(F, heavierN, fk.travelMm, []).sagMm,
    };
    const right = sagVerdict({
      input,
      recommendation: rec,
      end: "front",
      measured: { staticSagMm: rec.front.predicted.staticSagMm, raceSagMm: rec.front.predicted.raceSagMm },
    });
    expect(right.verdict).toBe("right");
    const v = sagVerdict({ input, recommendation: rec, end: "front", measured });
    expect(v.verdict).toBe("too-soft");
    expect(v.preloadChangeMm!).toBeGreaterThan(0);
    expect(v.suggestedRateNmm!).toBeGreaterThan(k);
    expect(v.collarTurnsChange).toBeNull();
  });
});
