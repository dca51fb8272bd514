import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  STANDARD_GRAVITY as g,
  catalogParameters,
  fitCalibration,
  recommend,
  sizingDefaults,
  type CalibrationParameters,
  type CalibrationReport,
} from "../../../lib/sizing";
import { prepareLinkage, solveSag } from "../../../lib/sizing/linkage";
import { solveForkSag } from "../../../lib/sizing/fork";
import { coilForkOf } from "../../../lib/sizing/front";
import { classInput } from "./fixtures";

// Calibration from sag reports (lib/sizing/README.md): synthetic reports made with the engine's own
// force law from known masses, plus measuring noise, must give those masses back (least squares).

type Spec = (typeof sizingDefaults.GENERIC_BIKE_CLASSES)[number]["spec"];

/** What a rider of massKg would measure on the setup the engine gives them, on a bike whose real loads are `truth`. */
function measure(
  classId: string,
  spec: Spec,
  truth: CalibrationParameters,
  massKg: number,
  noise: [number, number, number, number],
): CalibrationReport {
  const input = classInput(classId, "medium", {
    rider: { massKg, gearIncluded: true, skill: "intermediate", style: "moderate" },
  });
  input.bike = structuredClone(spec);
  const rec = recommend(input);
  const L = prepareLinkage(spec.rear.leverageCurve);
  const c = Math.cos((spec.rakeDeg * Math.PI) / 180);
  const r = rec.rear;
  const f = rec.front;
  const fk = coilForkOf(rec.input.bike);
  const rearSag = (W: number) => solveSag(L, r.chosenRate.nMm, r.preloadMm, W, spec.rear.wheelTravelMm).sagMm;
  const forkSag = (W: number) => solveForkSag(fk, f.chosenRate!.nMm, f.preloadMm!, f.oilLevelMm!, W).sagMm;
  const round = (v: number) => Math.max(0, v); // a reading is never negative
  return {
    riderMassKg: massKg,
    rear: {
      rateNmm: r.chosenRate.nMm,
      preloadMm: r.preloadMm,
      staticSagMm: round(rearSag(truth.rearSprungKg * g) + noise[0]),
      raceSagMm: round(rearSag((truth.rearSprungKg + massKg * truth.riderRearShare) * g) + noise[1]),
    },
    front: {
      rateNmm: f.chosenRate!.nMm,
      preloadMm: f.preloadMm!,
      oilLevelMm: f.oilLevelMm!,
      staticSagMm: round(forkSag(truth.frontSprungKg * g * c) + noise[2]),
      raceSagMm: round(forkSag((truth.frontSprungKg + massKg * (1 - truth.riderRearShare)) * g * c) + noise[3]),
    },
  };
}

const classIds = sizingDefaults.GENERIC_BIKE_CLASSES.map((c) => c.id);
const specOf = (id: string) => sizingDefaults.GENERIC_BIKE_CLASSES.find((c) => c.id === id)!.spec;

describe("fitting sprung masses and the rider's share from sag reports", () => {
  it("recovers the masses within 2 % over random bikes, riders and measuring noise (property)", () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...classIds),
        fc.double({ min: -0.1, max: 0.1, noNaN: true }),
        fc.double({ min: -0.1, max: 0.1, noNaN: true }),
        fc.double({ min: 0.55, max: 0.75, noNaN: true }),
        fc.array(
          fc.tuple(
            fc.double({ min: 0.8, max: 1.25, noNaN: true }),
            fc.tuple(...Array.from({ length: 4 }, () => fc.double({ min: -1, max: 1, noNaN: true }))),
          ),
          { minLength: 6, maxLength: 10 },
        ),
        (id, dRear, dFront, share, riders) => {
          const spec = specOf(id);
          const catalog = catalogParameters(spec);
          const truth = {
            rearSprungKg: catalog.rearSprungKg * (1 + dRear),
            frontSprungKg: catalog.frontSprungKg * (1 + dFront),
            riderRearShare: share,
          };
          const reports = riders.map(([scale, noise]) =>
            measure(id, spec, truth, spec.referenceRiderMassKg * scale, noise as [number, number, number, number]),
          );
          const fit = fitCalibration(spec, reports);
          expect(fit.ok).toBe(true);
          if (!fit.ok) return;
          expect(Math.abs(fit.parameters.rearSprungKg / truth.rearSprungKg - 1)).toBeLessThan(0.02);
          expect(Math.abs(fit.parameters.frontSprungKg / truth.frontSprungKg - 1)).toBeLessThan(0.02);
          expect(Math.abs(fit.parameters.riderRearShare - truth.riderRearShare)).toBeLessThan(0.03);
          expect(fit.rmsAfterMm).toBeLessThanOrEqual(fit.rmsBeforeMm + 1e-9);
          expect(fit.residualsMm.length).toBeGreaterThanOrEqual(reports.length * 2);
        },
      ),
      { numRuns: 40 },
    );
  });

  it("exact readings give the masses back exactly (least squares with zero residual)", () => {
    const spec = specOf("mx-450-4t");
    const truth = { rearSprungKg: 45, frontSprungKg: 47, riderRearShare: 0.68 };
    const reports = [70, 85, 100].map((m) => measure("mx-450-4t", spec, truth, m, [0, 0, 0, 0]));
    const fit = fitCalibration(spec, reports);
    expect(fit.ok).toBe(true);
    if (!fit.ok) return;
    expect(fit.parameters.rearSprungKg).toBeCloseTo(45, 6);
    expect(fit.parameters.frontSprungKg).toBeCloseTo(47, 6);
    expect(fit.parameters.riderRearShare).toBeCloseTo(0.68, 6);
    expect(fit.rmsAfterMm).toBeLessThan(1e-6);
  });

  it("refuses fewer than 3 reports, and reports that contradict each other, saying why", () => {
    const spec = specOf("mx-250-4t");
    const catalog = catalogParameters(spec);
    const two = [70, 90].map((m) => measure("mx-250-4t", spec, catalog, m, [0, 0, 0, 0]));
    const few = fitCalibration(spec, two);
    expect(few).toMatchObject({ ok: false, reports: 2 });
    if (!few.ok) expect(few.reason).toMatch(/at least 3/);
    const heavy = { ...catalog, rearSprungKg: catalog.rearSprungKg * 1.6, frontSprungKg: catalog.frontSprungKg * 0.6 };
    const mixed = [
      ...[65, 80, 95].map((m) => measure("mx-250-4t", spec, catalog, m, [0, 0, 0, 0])),
      ...[70, 85, 100].map((m) => measure("mx-250-4t", spec, heavy, m, [0, 0, 0, 0])),
    ];
    const contradictory = fitCalibration(spec, mixed);
    expect(contradictory.ok).toBe(false);
    if (!contradictory.ok) expect(contradictory.reason).toMatch(/contradict/);
  });

  it("an applied calibration moves the next recommendation's loads and says so", () => {
    const input = classInput("mx-450-4t", "medium");
    const before = recommend(input);
    const calibrated = structuredClone(input);
    calibrated.bike.calibration = { rearSprungKg: 46, frontSprungKg: 48, riderRearShare: 0.66, reports: 5 };
    const after = recommend(calibrated);
    // Static equilibrium: W_rs = M_r·g; W_rr = W_rs + m·φ·g (lib/sizing/README.md, loads).
    expect(after.resolved.loads.rearStaticN).toBeCloseTo(46 * g, 9);
    expect(after.resolved.loads.rearRaceN).toBeCloseTo((46 + 88 * 0.66) * g, 9);
    expect(after.resolved.calibration).toEqual({ reports: 5 });
    expect(after.rear.preloadMm).not.toBeCloseTo(before.rear.preloadMm, 3);
    expect(after.reasons.join(" ")).toMatch(/calibrated from 5 sag reports/);
  });
});
