// The rider's current springs reach the engine's input in N/mm, converted with the exact unit
// definitions of NIST SP 811 (2008) Appendix B: 1 kgf = 9.80665 N, 1 lbf = 4.4482216152605 N,
// 1 in = 25.4 mm. They are shown beside stock and must not change the sizing.
import { describe, expect, it } from "vitest";
import { buildSizingInput, currentSpringsNmm, type ShopSizingContext } from "@/lib/requests/sizing-input";
import { referenceAnswers } from "@/lib/shop/target-preview";
import { recommend, sizingDefaults } from "@/lib/sizing";
import type { RequestAnswers } from "@/lib/validations/request";

const LBF_IN_NMM = 4.4482216152605 / 25.4;

const context: ShopSizingContext = {
  bike: sizingDefaults.GENERIC_BIKE_CLASSES[0]!.spec,
  targets: null,
  stock: { forkRatesNmm: sizingDefaults.TYPICAL_FORK_RATES_NMM, shockRatesNmm: sizingDefaults.TYPICAL_SHOCK_RATES_NMM },
  clickerRules: undefined,
  gearMassKg: sizingDefaults.DEFAULT_GEAR_MASS_KG,
  frequencyRatioWindow: { ...sizingDefaults.FREQUENCY_RATIO_WINDOW },
};

function answersWith(bike: Partial<RequestAnswers["bike"]>): RequestAnswers {
  const base = referenceAnswers({
    riderMassKg: 80,
    discipline: "enduro",
    skill: "intermediate",
    bikeModelId: "6f1c2a4e-9b3d-4c5e-8f7a-1b2c3d4e5f60",
  });
  return { ...base, bike: { ...base.bike, ...bike } };
}

describe("currentSprings in the engine input", () => {
  it("converts the rider's rates to N/mm (NIST SP 811 factors)", () => {
    const input = buildSizingInput(
      answersWith({
        currentForkSpring: { value: 0.46, unit: "kgf/mm" },
        currentShockSpring: { value: 300, unit: "lbf/in" },
      }),
      context,
    );
    expect(input.currentSprings!.forkRateNmm).toBeCloseTo(0.46 * 9.80665, 9);
    expect(input.currentSprings!.shockRateNmm).toBeCloseTo(300 * LBF_IN_NMM, 9);
  });

  it("is absent when the rider gave no springs, and keeps the one end given", () => {
    expect(buildSizingInput(answersWith({}), context).currentSprings).toBeUndefined();
    expect(currentSpringsNmm(answersWith({ currentShockSpring: { value: 52, unit: "N/mm" } }))).toEqual({
      shockRateNmm: 52,
    });
  });

  it("leaves out a rate outside the engine's range instead of refusing the request", () => {
    // 400 lbf/in is about 70 N/mm: no single fork spring is that stiff (common practice: a fork spring
    // per leg is well under 10 N/mm), most likely both legs added up.
    const given = answersWith({
      currentForkSpring: { value: 400, unit: "lbf/in" },
      currentShockSpring: { value: 5.4, unit: "kgf/mm" },
    });
    const input = buildSizingInput(given, context);
    expect(input.currentSprings).toEqual({ shockRateNmm: 5.4 * 9.80665 });
    expect(() => recommend(input)).not.toThrow();
  });

  it("does not change the recommendation", () => {
    const without = recommend(buildSizingInput(answersWith({}), context));
    const withSprings = recommend(
      buildSizingInput(
        answersWith({
          currentForkSpring: { value: 4.6, unit: "N/mm" },
          currentShockSpring: { value: 54, unit: "N/mm" },
        }),
        context,
      ),
    );
    expect(withSprings.rear.chosenRate).toEqual(without.rear.chosenRate);
    expect(withSprings.front.chosenRate).toEqual(without.front.chosenRate);
    expect(withSprings.rear.preloadMm).toBe(without.rear.preloadMm);
  });
});
