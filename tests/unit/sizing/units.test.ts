import { describe, expect, it } from "vitest";
import * as math from "mathjs";
import fc from "fast-check";
import {
  KGF_N,
  LBF_N,
  INCH_MM,
  POUND_KG,
  PSI_KPA,
  STANDARD_GRAVITY,
  SizingInputError,
  convertRate,
  kgToPounds,
  poundsToKg,
  pressureTriple,
  rateTriple,
  RATE_UNITS,
} from "../../../lib/sizing";

describe("unit factors", () => {
  it("are the exact NIST SP 811 values", () => {
    // Source: NIST SP 811 (2008), Appendix B.8/B.9: 1 lbf = 4.448 221 615 260 5 N; 1 kgf = 9.806 65 N;
    // 1 in = 2.54 cm; 1 lb (avoirdupois) = 0.453 592 37 kg; standard gravity 9.806 65 m/s².
    expect(LBF_N).toBe(4.4482216152605);
    expect(KGF_N).toBe(9.80665);
    expect(INCH_MM).toBe(25.4);
    expect(POUND_KG).toBe(0.45359237);
    expect(STANDARD_GRAVITY).toBe(9.80665);
    // NIST SP 811 B.8: 1 psi = 6.894 757 kPa.
    expect(PSI_KPA).toBeCloseTo(6.894757, 6);
  });

  it("agree with mathjs, an independent unit library", () => {
    // Source: mathjs 15 unit definitions (independent of our constants). mathjs's `psi` is slightly
    // off, so psi is checked as lbf/inch^2 (stack-notes.md).
    expect(convertRate(1, "lbf/in", "N/mm")).toBeCloseTo(math.unit(1, "lbf/inch").toNumber("N/mm"), 12);
    expect(convertRate(1, "kgf/mm", "N/mm")).toBeCloseTo(math.unit(1, "kgf/mm").toNumber("N/mm"), 12);
    expect(PSI_KPA).toBeCloseTo(math.unit(1, "lbf/inch^2").toNumber("kPa"), 10);
    expect(poundsToKg(1)).toBeCloseTo(math.unit(1, "lb").toNumber("kg"), 12);
    expect(pressureTriple(100).barGauge).toBeCloseTo(math.unit(100, "kPa").toNumber("bar"), 12);
  });

  it("convert every pair of rate units as mathjs does, over random values", () => {
    // Source: mathjs unit conversion as the oracle.
    const mathUnit = { "N/mm": "N/mm", "kgf/mm": "kgf/mm", "lbf/in": "lbf/inch" } as const;
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 1000, noNaN: true }),
        fc.constantFrom(...RATE_UNITS),
        fc.constantFrom(...RATE_UNITS),
        (v, a, b) => {
          const oracle = math.unit(v, mathUnit[a]).toNumber(mathUnit[b]);
          expect(convertRate(v, a, b)).toBeCloseTo(oracle, 9);
        },
      ),
      { numRuns: 200 },
    );
  });

  it("give the textbook spring-rate figures", () => {
    // Source: NIST SP 811 factors by hand: 1 kgf/mm = 9.80665 N/mm; 1 lbf/in = 4.4482216152605/25.4 =
    // 0.1751268352 N/mm; hence 1 kgf/mm = 55.99741 lbf/in.
    const t = rateTriple(KGF_N);
    expect(t.kgfMm).toBeCloseTo(1, 14);
    expect(t.lbfIn).toBeCloseTo(55.99741, 5);
    expect(convertRate(1, "lbf/in", "N/mm")).toBeCloseTo(0.1751268352, 10);
    expect(kgToPounds(poundsToKg(180))).toBeCloseTo(180, 12);
  });

  it("refuses a non-finite value or an unknown unit, naming the argument", () => {
    expect(() => convertRate(Number.NaN, "N/mm", "kgf/mm")).toThrow(SizingInputError);
    try {
      convertRate(1, "N/mm", "lb/in" as never);
      expect.unreachable();
    } catch (e) {
      expect((e as SizingInputError).issues[0]?.path).toBe("to");
    }
  });
});
