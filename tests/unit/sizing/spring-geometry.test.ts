import { describe, expect, it } from "vitest";
import {
  SizingInputError,
  activeCoilsSquaredGround,
  rateFromLoadTest,
  shearStressMpa,
  springRateFromGeometry,
  wahlFactor,
} from "../../../lib/sizing";

describe("helical spring rate from geometry", () => {
  it("matches Shigley's worked problem", () => {
    // Source: Shigley, Mechanical Engineering Design, 10th ed., problem 10-3:
    // d = 2.5 mm, D = 28.5 mm, Na = 13, G = 81.0 GPa → k = 1.314 N/mm.
    const k = springRateFromGeometry({
      wireDiameterMm: 2.5,
      meanCoilDiameterMm: 28.5,
      activeCoils: 13,
      shearModulusMpa: 81_000,
    });
    expect(k).toBeCloseTo(1.314, 3);
  });

  it("scales as d⁴ and 1/D³ and 1/Na", () => {
    // Source: Shigley 10th ed., eq. 10-9, k = d⁴G/(8D³N): doubling d gives 16×, doubling D gives 1/8.
    const base = { wireDiameterMm: 10, meanCoilDiameterMm: 70, activeCoils: 8, shearModulusMpa: 79_300 };
    const k = springRateFromGeometry(base);
    expect(springRateFromGeometry({ ...base, wireDiameterMm: 20, meanCoilDiameterMm: 70 * 2 }) / k).toBeCloseTo(2, 10);
    expect(springRateFromGeometry({ ...base, activeCoils: 16 }) / k).toBeCloseTo(0.5, 12);
  });

  it("squared and ground ends remove two coils from the active count", () => {
    // Source: Shigley 10th ed., table 10-1 (squared and ground: Na = Nt − 2).
    expect(activeCoilsSquaredGround(15)).toBe(13);
  });

  it("refuses impossible geometry naming the field", () => {
    expect(() =>
      springRateFromGeometry({
        wireDiameterMm: -1,
        meanCoilDiameterMm: 28.5,
        activeCoils: 13,
        shearModulusMpa: 81_000,
      }),
    ).toThrow(SizingInputError);
    try {
      springRateFromGeometry({
        wireDiameterMm: 30,
        meanCoilDiameterMm: 28.5,
        activeCoils: 13,
        shearModulusMpa: 81_000,
      });
      expect.unreachable();
    } catch (e) {
      expect((e as SizingInputError).issues[0]?.path).toBe("meanCoilDiameterMm");
    }
  });
});

describe("Wahl factor", () => {
  it("equals Shigley's expression at hand-computed points", () => {
    // Source: Shigley 10th ed., Wahl factor K_W = (4C − 1)/(4C − 4) + 0.615/C (eq. 10-4).
    // Hand arithmetic: C = 8 → 31/28 + 0.615/8 = 1.107143 + 0.076875 = 1.184018.
    expect(wahlFactor(8)).toBeCloseTo(1.184018, 6);
    // C = 5 → 19/16 + 0.123 = 1.3105; tabulated Wahl factor for C = 5 is 1.31 (from memory).
    expect(wahlFactor(5)).toBeCloseTo(1.3105, 4);
  });

  it("falls towards 1 as the coil straightens (large spring index)", () => {
    // Source: Wahl's factor corrects for coil curvature and direct shear (Shigley 10th ed., sec. 10-2):
    // K_W decreases with C, and (4C − 1)/(4C − 4) + 0.615/C → 1 as C → ∞. Hand value at C = 10:
    // 39/36 + 0.0615 = 1.144833.
    expect(wahlFactor(10)).toBeCloseTo(1.144833, 6);
    let prev = Infinity;
    for (let C = 3; C <= 20; C += 1) {
      const k = wahlFactor(C);
      expect(k).toBeLessThan(prev);
      expect(k).toBeGreaterThan(1);
      prev = k;
    }
    expect(wahlFactor(1e6)).toBeCloseTo(1, 5);
  });

  it("corrects stress upwards, τ = K_W·8FD/(πd³)", () => {
    // Source: Shigley 10th ed., eq. 10-1 with the Wahl factor; hand arithmetic for F = 100 N,
    // D = 40 mm, d = 5 mm: 8·100·40/(π·125) = 81.487 MPa; × K_W(8) = 96.482 MPa.
    expect(shearStressMpa({ forceN: 100, wireDiameterMm: 5, meanCoilDiameterMm: 40 })).toBeCloseTo(96.482, 2);
  });

  it("refuses an index of 1 or less", () => {
    expect(() => wahlFactor(1)).toThrow(SizingInputError);
    expect(() => wahlFactor(Number.NaN)).toThrow(SizingInputError);
  });
});

describe("rate from a two-point load test", () => {
  it("is the force difference over the length difference", () => {
    // Source: Hooke's law, definition of spring rate k = ΔF/Δx; hand arithmetic: lengths 250 → 240 mm
    // under 500 → 1000 N gives 500 N / 10 mm = 50 N/mm.
    expect(rateFromLoadTest({ lengthsMm: [250, 240], forcesN: [500, 1000] })).toBeCloseTo(50, 12);
    // Either order of the points gives the same rate.
    expect(rateFromLoadTest({ lengthsMm: [240, 250], forcesN: [1000, 500] })).toBeCloseTo(50, 12);
  });

  it("refuses equal lengths and falling force, naming the field", () => {
    const paths = (f: () => unknown) => {
      try {
        f();
      } catch (e) {
        return (e as SizingInputError).issues.map((i) => i.path);
      }
      return [];
    };
    expect(paths(() => rateFromLoadTest({ lengthsMm: [250, 250], forcesN: [500, 1000] }))).toEqual(["lengthsMm"]);
    expect(paths(() => rateFromLoadTest({ lengthsMm: [250, 240], forcesN: [1000, 500] }))).toEqual(["forcesN"]);
    expect(paths(() => rateFromLoadTest({ lengthsMm: [250, -1], forcesN: [500, 1000] }))).toEqual(["lengthsMm.1"]);
  });
});
