import { describe, expect, it } from "vitest";
import {
  ATMOSPHERE_KPA,
  SizingInputError,
  airForkPressureKpaGauge,
  forkAirForceN,
  polytropicPressure,
  pressureTriple,
} from "../../../lib/sizing";
import { forkForce, idealForkSpring, makeCoilFork } from "../../../lib/sizing/fork";

const atmMpa = ATMOSPHERE_KPA / 1000;
const leg = { displacementDiameterMm: 48, freeAreaMm2: 1250, capVolumeMm3: 25_000, oilLevelMm: 110, forkTravelMm: 310 };
const Ad = (Math.PI / 4) * 48 * 48;
const V0 = 1250 * 110 + 25_000 + Ad * 310;

describe("ideal-gas compression", () => {
  it("halving the volume doubles the pressure isothermally and multiplies it by 2^1.4 adiabatically", () => {
    // Source: ideal-gas law P·V = const at constant temperature (Boyle) and P·V^γ = const for a
    // reversible adiabatic process, γ = 1.4 for air (Çengel & Boles, Thermodynamics, ch. 4 and 7).
    // 2^1.4 = 2.6390158 (hand/calculator).
    expect(polytropicPressure(ATMOSPHERE_KPA, 2, 1, 1)).toBeCloseTo(202.65, 10);
    expect(polytropicPressure(ATMOSPHERE_KPA, 2, 1, 1.4)).toBeCloseTo(101.325 * 2.6390158, 4);
  });

  it("the fork's air force obeys P·Vⁿ = const along the stroke", () => {
    // Source: ideal-gas law as above; the leg is sealed at atmospheric pressure at top-out.
    for (const n of [1, 1.4]) {
      for (const s of [0, 50, 150, 250, 310]) {
        const F = forkAirForceN({ ...leg, travelMm: s, polytropicIndex: n });
        const pAbs = F / Ad + atmMpa; // gauge force back to absolute pressure
        const V = V0 - Ad * s;
        expect(pAbs * V ** n).toBeCloseTo(atmMpa * V0 ** n, 6);
      }
    }
  });

  it("at full travel the air is squeezed into A_free·h + V_cap", () => {
    // Source: Boyle's law between top-out (V₀, P_atm) and bottom (V_b): P_b = P_atm·V₀/V_b.
    const F = forkAirForceN({ ...leg, travelMm: 310, polytropicIndex: 1 });
    const Vb = 1250 * 110 + 25_000;
    expect(F).toBeCloseTo(((atmMpa * V0) / Vb - atmMpa) * Ad, 8);
  });

  it("adiabatic beats isothermal, and more oil (smaller level number) stiffens the end of the stroke", () => {
    // Source: for V₀/V > 1, (V₀/V)^1.4 > V₀/V (γ > 1); a smaller air volume compresses more (Boyle).
    const iso = forkAirForceN({ ...leg, travelMm: 300, polytropicIndex: 1 });
    const adi = forkAirForceN({ ...leg, travelMm: 300, polytropicIndex: 1.4 });
    expect(adi).toBeGreaterThan(iso);
    expect(forkAirForceN({ ...leg, oilLevelMm: 90, travelMm: 300, polytropicIndex: 1.4 })).toBeGreaterThan(adi);
    expect(forkAirForceN({ ...leg, travelMm: 0, polytropicIndex: 1.4 })).toBe(0);
  });

  it("refuses travel beyond the fork's and names the field", () => {
    try {
      forkAirForceN({ ...leg, travelMm: 311, polytropicIndex: 1 });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(SizingInputError);
      expect((e as SizingInputError).issues[0]?.path).toBe("travelMm");
    }
  });
});

describe("air-spring fork pressure", () => {
  it("matches a hand Boyle's-law calculation", () => {
    // Source: Boyle's law. A = 1000 mm², V = 200 000 mm³, W = 800 N at s = 60 mm:
    // P_s = 800/1000 + 0.101325 = 0.901325 MPa abs; P₀ = P_s·(200 000 − 60 000)/200 000 = 0.6309275 MPa;
    // gauge 0.5296025 MPa = 529.6025 kPa.
    expect(
      airForkPressureKpaGauge({ pistonAreaMm2: 1000, chamberVolumeMm3: 200_000, loadN: 800, sagMm: 60 }),
    ).toBeCloseTo(529.6025, 6);
  });

  it("reports bar and psi from kPa", () => {
    // Source: 1 bar = 100 kPa (definition); 1 psi = 6.894757 kPa (NIST SP 811 B.8).
    const p = pressureTriple(1000);
    expect(p.barGauge).toBeCloseTo(10, 12);
    expect(p.psiGauge).toBeCloseTo(1000 / 6.894757, 3);
  });

  it("refuses a sag that sweeps the whole chamber", () => {
    expect(() =>
      airForkPressureKpaGauge({ pistonAreaMm2: 1000, chamberVolumeMm3: 50_000, loadN: 800, sagMm: 60 }),
    ).toThrow(SizingInputError);
  });
});

describe("coil fork closed form without air", () => {
  // An enormous cap volume leaves the air force negligible: the fork must reduce to a linear spring
  // (Hooke's law, F = n_s·k·(p + s)), and the ideal rate to k = ΔW/(n_s·Δs) (lib/sizing/README.md, closed forms).
  const fork = makeCoilFork(2, 300, {
    displacementDiameterMm: 48,
    freeAreaMm2: 1250,
    capVolumeMm3: 1e15,
    forkTravelMm: 300,
  });
  it("force is n_s·k·(p + s)", () => {
    for (const s of [0, 75, 150, 300]) expect(forkForce(fork, 4.5, 5, 110, s, 1.4)).toBeCloseTo(2 * 4.5 * (5 + s), 4);
  });
  it("the fork's fast path and the public forkAirForceN give the same air force", () => {
    const f = makeCoilFork(2, 310, {
      displacementDiameterMm: 48,
      freeAreaMm2: 1250,
      capVolumeMm3: 25_000,
      forkTravelMm: 310,
    });
    for (const s of [0, 100, 310])
      for (const n of [1, 1.4])
        expect(forkForce(f, 0, 0, 110, s, n)).toBeCloseTo(
          2 * forkAirForceN({ ...leg, travelMm: s, polytropicIndex: n }),
          9,
        );
  });
  it("ideal rate is ΔW/(n_s·Δs) and preload W/(n_s·k) − s", () => {
    const { rateNmm, preloadMm } = idealForkSpring(fork, 110, 380, 650, 35, 60);
    expect(rateNmm).toBeCloseTo((650 - 380) / (2 * 25), 6);
    expect(preloadMm).toBeCloseTo(650 / (2 * rateNmm) - 60, 4);
  });
});
