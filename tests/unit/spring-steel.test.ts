// The coil check's verdict (lib/sizing/spring-steel.ts): minimum tensile strength S_ut = A/d^m and
// the allowable torsional stress as a fraction of it, from Budynas & Nisbett, Shigley's Mechanical
// Engineering Design, 10th ed., tables 10-4 and 10-6 (values from memory, as printed there).
import { describe, expect, it } from "vitest";
import { SPRING_STEELS, SPRING_STEEL_IDS, coilStressVerdict, minTensileStrengthMpa } from "@/lib/sizing/spring-steel";

// 1 kpsi = 6.894757 MPa, 1 in = 25.4 mm exactly (NIST SP 811, appendix B).
const KPSI_MPA = 6.894757;
const IN_MM = 25.4;

describe("minimum tensile strength of spring wire", () => {
  it("chrome-silicon, 5 mm wire: 1974 / 5^0.108 = 1659 MPa (hand-computed: 5^0.108 = e^(0.108·ln 5) = 1.18984)", () => {
    expect(minTensileStrengthMpa("chrome-silicon", 5)).toBeCloseTo(1659.0, 0);
  });

  it("the SI constants match table 10-4's kpsi·in^m column (A = 201, 169, 202, 147, 140 kpsi·in^m)", () => {
    // A_SI = A_kpsi · 6.894757 · 25.4^m: the two columns of the same table must agree within their rounding.
    const kpsi = {
      "music-wire": 201,
      "chrome-vanadium": 169,
      "chrome-silicon": 202,
      "oil-tempered": 147,
      "hard-drawn": 140,
    };
    for (const id of SPRING_STEEL_IDS) {
      const { A, m } = SPRING_STEELS[id];
      const fromKpsi = kpsi[id] * KPSI_MPA * IN_MM ** m;
      expect(Math.abs(fromKpsi / A - 1), id).toBeLessThan(0.005);
    }
  });

  it("music wire of 0.037 in (0.94 mm): about 324 kpsi, as Shigley's example 10-1 finds (from memory)", () => {
    const sut = minTensileStrengthMpa("music-wire", 0.037 * IN_MM) / KPSI_MPA;
    expect(sut).toBeGreaterThan(321);
    expect(sut).toBeLessThan(327);
  });
});

describe("pass or fail with the margin", () => {
  it("allows 50 % of S_ut for hardened and tempered alloy wire, 45 % for music wire (table 10-6, before set removed)", () => {
    const v = coilStressVerdict({ steel: "chrome-silicon", wireDiameterMm: 5, shearStressMpa: 700 });
    expect(v.allowableShearMpa).toBeCloseTo(0.5 * 1659.0, 0);
    // 829.5 / 700 − 1 = 0.185: 18.5 % in hand.
    expect(v.margin).toBeCloseTo(829.5 / 700 - 1, 2);
    expect(v.pass).toBe(true);
    const music = coilStressVerdict({ steel: "music-wire", wireDiameterMm: 2, shearStressMpa: 800 });
    expect(music.allowableShearMpa).toBeCloseTo(0.45 * (2211 / 2 ** 0.145), 3);
  });

  it("fails a stress above the allowable, with a negative margin, and flags wire outside the table", () => {
    const v = coilStressVerdict({ steel: "chrome-silicon", wireDiameterMm: 5, shearStressMpa: 900 });
    expect(v.pass).toBe(false);
    expect(v.margin).toBeCloseTo(829.5 / 900 - 1, 2);
    expect(v.outsideTable).toBe(false);
    expect(coilStressVerdict({ steel: "chrome-silicon", wireDiameterMm: 12, shearStressMpa: 100 }).outsideTable).toBe(
      true,
    );
  });
});
