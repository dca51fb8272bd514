import type { BikeSpec } from "./bike-schema";
import type { Loads } from "./loads";
import type { FrontResult, SizingWarning } from "./output-schema";
import type { SetupOverrides } from "./overrides";
import { sprungLegsOf } from "./bike-schema";
import { forkForce, forkPreloadForSag, forkRate, idealForkSpring, makeCoilFork, solveForkSag, type CoilFork } from "./fork";
import { evaluateCandidate, idealToOrder, selectRate, type EndModel, type SagTargetsMm } from "./selection";
import { airAbsMpaForSag, airChamberForce } from "./air";
import { firstCrossing } from "./solve";
import { naturalFrequencyOf } from "./frequency";
import { ATMOSPHERE_MPA, STANDARD_GRAVITY, pressureTriple, rateTriple } from "./units";
import { OIL_LEVEL_STEP_MM } from "./defaults";
import { CURVE_POINTS, describeSource, limitNotes, sagWarnings } from "./rear";
import { SizingInputError } from "./errors";
import { fmt, rateText } from "./format";

const FAST = 1.4; // γ for air: a fast stroke to the bottom is close to adiabatic (sizing-model.md)

export interface FrontContext {
  bike: BikeSpec;
  loads: Loads;
  /** Loads for the bike's reference rider: the stock setup's bottoming resistance is measured there. */
  referenceLoads: Loads;
  targets: SagTargetsMm;
  rateFactor: number;
  bottomingFactor: number;
  stockRatesNmm: readonly number[];
  ov: SetupOverrides["front"];
  warnings: SizingWarning[];
  reasons: string[];
}

export function coilForkOf(bike: BikeSpec): CoilFork {
  const f = bike.fork;
  return makeCoilFork(sprungLegsOf(f.kind), f.travelMm, {
    displacementDiameterMm: f.displacementDiameterMm,
    freeAreaMm2: f.freeAreaMm2,
    capVolumeMm3: f.capVolumeMm3,
    forkTravelMm: f.travelMm,
  });
}

/** Allowed oil levels: the stock level ± whole 5 mm steps, inside the catalog's range. */
export function oilLevelGrid(f: BikeSpec["fork"]): number[] {
  const out: number[] = [];
  const lo = Math.ceil((f.oilLevelMinMm - f.stockOilLevelMm) / OIL_LEVEL_STEP_MM - 1e-9);
  const hi = Math.floor((f.oilLevelMaxMm - f.stockOilLevelMm) / OIL_LEVEL_STEP_MM + 1e-9);
  for (let i = lo; i <= hi; i++) out.push(f.stockOilLevelMm + i * OIL_LEVEL_STEP_MM);
  return out;
}

function forkCurve(fk: CoilFork, k: number, p: number, h: number) {
  const pts = [];
  for (let i = 0; i < CURVE_POINTS; i++) {
    const s = (fk.travelMm * i) / (CURVE_POINTS - 1);
    pts.push({ forkTravelMm: s, forceN: forkForce(fk, k, p, h, s, FAST) });
  }
  return pts;
}

export function evaluateFront(c: FrontContext): FrontResult {
  return c.bike.fork.kind === "air" ? evaluateAirFork(c) : evaluateCoilFork(c);
}

function evaluateCoilFork(c: FrontContext): FrontResult {
  const { bike, loads, targets: t, ov, warnings, reasons } = c;
  const f = bike.fork;
  const fk = coilForkOf(bike);
  const stockRate = f.stockRateNmm ?? 0; // schema guarantees it for coil forks
  const W = { staticN: loads.frontStaticN, raceN: loads.frontRaceN };
  const limits = { minMm: f.preloadMinMm, maxMm: f.preloadMaxMm };
  const h0 = f.stockOilLevelMm;
  const mid = (t.staticSagMinMm + t.staticSagMaxMm) / 2;
  const sagOnlyRateNmm = idealForkSpring(fk, h0, W.staticN, W.raceN, mid, t.raceSagMm).rateNmm;
  if (!(forkPreloadForSag(fk, 1, h0, W.raceN, t.raceSagMm) + t.raceSagMm > 0))
    throw new SizingInputError([{ path: "bike.fork", message: "The air above the oil alone carries the rider at race sag: no coil spring fits" }]);
  const modelAt = (h: number): EndModel => ({
    preloadForSag: (k, load, s) => forkPreloadForSag(fk, k, h, load, s),
    solveSag: (k, p, load) => solveForkSag(fk, k, p, h, load),
  });
  const m0 = modelAt(h0);
  const ideal = idealToOrder(sagOnlyRateNmm * c.rateFactor, m0, W.raceN, t.raceSagMm, limits);
  const idealRateNmm = ideal.rateNmm;
  const idealPreloadMm = forkPreloadForSag(fk, idealRateNmm, h0, W.raceN, t.raceSagMm);
  const preferStaticMm = c.rateFactor === 1 && !ideal.limitedBy ? mid : m0.solveSag(idealRateNmm, idealPreloadMm, W.staticN).sagMm;
  const sel =
    ov?.rateNmm !== undefined
      ? { chosen: evaluateCandidate(m0, ov.rateNmm, W, t, limits), source: "override" as const }
      : selectRate(m0, c.stockRatesNmm, idealRateNmm, W, t, limits, preferStaticMm);
  const k = sel.chosen.rateNmm;
  reasons.push(
    `Front: ${fmt(W.raceN, 0)} N along the fork at race sag, ${fmt(W.staticN, 0)} N with the bike alone` +
      (sagOnlyRateNmm > 0
        ? `; ${rateText(sagOnlyRateNmm, "front")} per leg (${fk.sprungLegs} sprung) meets ${fmt(t.raceSagMm, 0)} mm race and ${fmt(mid, 0)} mm static sag`
        : "") +
      (c.rateFactor !== 1 ? `, times ${fmt(c.rateFactor, 3)} for skill and style.` : "."),
  );
  limitNotes("FRONT", "front", ideal, sagOnlyRateNmm * c.rateFactor, idealPreloadMm, t, mid, warnings, reasons);
  describeSource("FRONT", "fork spring", sel.source, k, idealRateNmm, warnings, reasons);

  const clampP = (p: number) => Math.min(limits.maxMm, Math.max(limits.minMm, p));
  const preloadAt = (h: number) => ov?.preloadMm ?? clampP(forkPreloadForSag(fk, k, h, W.raceN, t.raceSagMm));
  // Bottoming resistance F(T)/W_fr of the stock setup for its reference rider, times the factor.
  const stockRatio = forkForce(fk, stockRate, f.stockPreloadMm, h0, f.travelMm, FAST) / c.referenceLoads.frontRaceN;
  const targetRatio = stockRatio * c.bottomingFactor;
  const ratioAt = (h: number) => forkForce(fk, k, preloadAt(h), h, f.travelMm, FAST) / W.raceN;
  const grid = oilLevelGrid(f);
  let h = h0;
  if (ov?.oilLevelMm !== undefined) {
    h = ov.oilLevelMm;
    if (h < f.oilLevelMinMm || h > f.oilLevelMaxMm)
      warnings.push({ code: "FRONT_OIL_LEVEL_OUTSIDE_RANGE", severity: "critical", message: `Oil level ${fmt(h, 0)} mm is outside the fork's ${f.oilLevelMinMm}–${f.oilLevelMaxMm} mm.`, field: "front.oilLevelMm" });
  } else {
    // Levels where race sag stays reachable within the preload limits come first (the air volume
    // changes the preload needed); among them the nearest bottoming ratio; ties go to the level nearer stock.
    const reachable = (g: number) => {
      const p = forkPreloadForSag(fk, k, g, W.raceN, t.raceSagMm);
      return ov?.preloadMm !== undefined || (p >= limits.minMm && p <= limits.maxMm);
    };
    let best = [Infinity, Infinity, Infinity];
    for (const g of grid) {
      const score = [reachable(g) ? 0 : 1, Math.abs(ratioAt(g) - targetRatio), Math.abs(g - h0)];
      if (score[0]! < best[0]! || (score[0] === best[0] && (score[1]! < best[1]! - 1e-12 || (Math.abs(score[1]! - best[1]!) <= 1e-12 && score[2]! < best[2]!)))) {
        best = score;
        h = g;
      }
    }
    const edge = h === grid[0] || h === grid[grid.length - 1];
    if (edge && Math.abs(ratioAt(h) - targetRatio) / targetRatio > 0.03)
      warnings.push({ code: "FRONT_OIL_LEVEL_AT_LIMIT", severity: "caution", message: `Oil level ${fmt(h, 0)} mm is at the end of the fork's range and still misses the bottoming target (${fmt(ratioAt(h), 2)} against ${fmt(targetRatio, 2)} × load).`, field: "front.oilLevelMm" });
    reasons.push(`Front: oil level ${fmt(h, 0)} mm keeps bottoming force at ${fmt(ratioAt(h), 2)} × load (stock setup ${fmt(stockRatio, 2)} × its reference rider's, factor ${fmt(c.bottomingFactor, 3)}).`);
  }
  const preloadMm = preloadAt(h);
  if (ov?.preloadMm !== undefined && (preloadMm < limits.minMm || preloadMm > limits.maxMm))
    warnings.push({ code: "FRONT_PRELOAD_OUTSIDE_LIMITS", severity: "critical", message: `Fork preload ${fmt(preloadMm, 1)} mm is outside ${limits.minMm}–${limits.maxMm} mm.`, field: "front.preloadMm" });
  else if (ov?.preloadMm === undefined && preloadMm !== forkPreloadForSag(fk, k, h, W.raceN, t.raceSagMm))
    warnings.push({ code: "FRONT_PRELOAD_AT_LIMIT", severity: "caution", message: `Race sag on target needs fork preload outside ${limits.minMm}–${limits.maxMm} mm.`, field: "front.preloadMm" });
  const race = solveForkSag(fk, k, preloadMm, h, W.raceN);
  const stat = solveForkSag(fk, k, preloadMm, h, W.staticN);
  sagWarnings("FRONT", "front", race, stat, t, warnings);

  const neighbours = [h - OIL_LEVEL_STEP_MM, h, h + OIL_LEVEL_STEP_MM].filter((x) => x >= f.oilLevelMinMm && x <= f.oilLevelMaxMm);
  if (!neighbours.includes(h)) neighbours.splice(0, 0, h);
  const oilLevelCurves = neighbours.map((lvl) => {
    const p = lvl === h ? preloadMm : preloadAt(lvl);
    return { oilLevelMm: lvl, bottomingRatio: forkForce(fk, k, p, lvl, f.travelMm, FAST) / W.raceN, points: forkCurve(fk, k, p, lvl) };
  });
  const bottomN = forkForce(fk, k, preloadMm, h, f.travelMm, FAST);
  // Vertical wheel rate = axial rate / cos²θ (axle moves along the fork; load resolved along it).
  const wheelRate = forkRate(fk, k, h, race.sagMm, 1) / (loads.cosRake * loads.cosRake);
  const sprungMassKg = W.raceN / (STANDARD_GRAVITY * loads.cosRake);
  return {
    kind: f.kind,
    sprungLegs: fk.sprungLegs,
    idealRate: rateTriple(idealRateNmm),
    sagOnlyIdealRateNmm: sagOnlyRateNmm,
    idealPreloadMm,
    chosenRate: rateTriple(k),
    stockRate: rateTriple(stockRate),
    source: sel.source,
    preloadMm,
    oilLevelMm: h,
    stockOilLevelMm: h0,
    airPressure: null,
    sagTargets: t,
    predicted: { raceSagMm: race.sagMm, staticSagMm: stat.sagMm, raceState: race.state, staticState: stat.state },
    bottoming: { forceN: bottomN, ratio: bottomN / W.raceN, targetRatio: ov?.oilLevelMm === undefined ? targetRatio : null },
    forceCurvePolytropicIndex: FAST,
    forceCurve: oilLevelCurves.find((o) => o.oilLevelMm === h)!.points,
    oilLevelCurves,
    wheelRateAtSagNmm: wheelRate,
    sprungMassKg,
    naturalFrequencyHz: naturalFrequencyOf(wheelRate, sprungMassKg),
  };
}

function evaluateAirFork(c: FrontContext): FrontResult {
  const { bike, loads, targets: t, ov, warnings, reasons } = c;
  const f = bike.fork;
  const air = f.air!; // schema guarantees it for air forks
  const A = air.pistonAreaMm2;
  const V = air.chamberVolumeMm3;
  const p0 = ov?.airPressureKpaGauge !== undefined ? ov.airPressureKpaGauge / 1000 + ATMOSPHERE_MPA : airAbsMpaForSag(A, V, loads.frontRaceN, t.raceSagMm);
  const gaugeKpa = (p0 - ATMOSPHERE_MPA) * 1000;
  if (gaugeKpa < 0) throw new SizingInputError([{ path: "bike.fork.air", message: "The sag target needs less than atmospheric pressure: chamber too small for this load" }]);
  reasons.push(
    ov?.airPressureKpaGauge !== undefined
      ? `Front: air pressure ${fmt(gaugeKpa, 0)} kPa set by the tuner.`
      : `Front: ${fmt(gaugeKpa, 0)} kPa gauge puts race sag at ${fmt(t.raceSagMm, 0)} mm under ${fmt(loads.frontRaceN, 0)} N (isothermal); fine-tune by measuring sag.`,
  );
  const force = (s: number, n: number) => airChamberForce(A, V, p0, s, n);
  const race = firstCrossing((s) => force(s, 1), loads.frontRaceN, f.travelMm, []);
  const stat = firstCrossing((s) => force(s, 1), loads.frontStaticN, f.travelMm, []);
  sagWarnings("FRONT", "front", race, stat, t, warnings);
  const points = [];
  for (let i = 0; i < CURVE_POINTS; i++) {
    const s = (f.travelMm * i) / (CURVE_POINTS - 1);
    points.push({ forkTravelMm: s, forceN: force(s, FAST) });
  }
  const bottomN = force(f.travelMm, FAST);
  // dF/ds = n·P(s)·A²/(V − A·s), from P·Vⁿ = const; n = 1 at sag.
  const v = V - A * race.sagMm;
  const wheelRate = ((p0 * (V / v) * A * A) / v) / (loads.cosRake * loads.cosRake);
  const sprungMassKg = loads.frontRaceN / (STANDARD_GRAVITY * loads.cosRake);
  return {
    kind: "air",
    sprungLegs: 0,
    idealRate: null,
    sagOnlyIdealRateNmm: null,
    idealPreloadMm: null,
    chosenRate: null,
    stockRate: null,
    source: null,
    preloadMm: null,
    oilLevelMm: null,
    stockOilLevelMm: f.stockOilLevelMm,
    airPressure: pressureTriple(gaugeKpa),
    sagTargets: t,
    predicted: { raceSagMm: race.sagMm, staticSagMm: stat.sagMm, raceState: race.state, staticState: stat.state },
    bottoming: { forceN: bottomN, ratio: bottomN / loads.frontRaceN, targetRatio: null },
    forceCurvePolytropicIndex: FAST,
    forceCurve: points,
    oilLevelCurves: [],
    wheelRateAtSagNmm: wheelRate,
    sprungMassKg,
    naturalFrequencyHz: naturalFrequencyOf(wheelRate, sprungMassKg),
  };
}
