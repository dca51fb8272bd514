import type { BikeSpec } from "./bike-schema";
import type { FrontResult } from "./output-schema";
import type { SetupOverrides } from "./overrides";
import { sprungLegsOf } from "./bike-schema";
import {
  forkBottomPressureMpa,
  forkForce,
  forkPreloadForSag,
  forkRate,
  forkSpringVolumeScale,
  idealForkSpring,
  legBottomVolume,
  makeCoilFork,
  solveForkSag,
  springVolumeMm3,
  type CoilFork,
} from "./fork";
import type { EndModel } from "./selection";
import { chooseByBasis } from "./basis-choice";
import {
  airSpringChargeForLoad,
  airSpringForce,
  airSpringPositivePressure,
  airSpringRate,
  type AirSpring,
} from "./air";
import { firstCrossing } from "./solve";
import { naturalFrequencyOf } from "./frequency";
import { matchForkFrequency } from "./rate-basis";
import { ATMOSPHERE_MPA, STANDARD_GRAVITY, pressureTriple, rateTriple } from "./units";
import { AIR_EQUALIZE_FRACTION_OF_TRAVEL, AIR_NEGATIVE_VOLUME_FRACTION, OIL_LEVEL_STEP_MM } from "./defaults";
import {
  CURVE_POINTS,
  basisReasons,
  describeSource,
  limitNotes,
  preloadLimitWarning,
  sagWarnings,
  type EndContext,
} from "./rear";
import { SizingInputError } from "./errors";
import { fmt } from "./format";

const FAST = 1.4; // γ for air: a fast stroke to the bottom is close to adiabatic (lib/sizing/README.md)

export interface FrontContext extends EndContext {
  bottomingFactor: number;
  ov: SetupOverrides["front"];
}

export function coilForkOf(bike: BikeSpec): CoilFork {
  const f = bike.fork;
  const stock = f.stockSpring && f.stockRateNmm ? { geometry: f.stockSpring, rateNmm: f.stockRateNmm } : undefined;
  return makeCoilFork(
    sprungLegsOf(f.kind),
    f.travelMm,
    {
      displacementDiameterMm: f.displacementDiameterMm,
      freeAreaMm2: f.freeAreaMm2,
      capVolumeMm3: f.capVolumeMm3,
      forkTravelMm: f.travelMm,
    },
    forkSpringVolumeScale(f.displacementDiameterMm, stock),
  );
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

/** The spring's steel must leave air above the oil, or the force law has no meaning. */
function requireAirGap(fk: CoilFork, k: number, h: number, path: string): void {
  if (!(legBottomVolume(fk, h, springVolumeMm3(fk, k)) > 0))
    throw new SizingInputError([
      {
        path,
        message: `At ${fmt(h, 0)} mm oil level the fork spring's steel fills the air space above the oil: check the oil level, free area and cap volume`,
      },
    ]);
}

function evaluateCoilFork(c: FrontContext): FrontResult {
  const { bike, loads, targets: t, ov, warnings, reasons } = c;
  const f = bike.fork;
  const fk = coilForkOf(bike);
  const stockRate = f.stockRateNmm ?? 0; // schema guarantees it for coil forks
  const W = { staticN: loads.frontStaticN, raceN: loads.frontRaceN };
  const limits = { minMm: f.preloadMinMm, maxMm: f.preloadMaxMm };
  const h0 = f.stockOilLevelMm;
  requireAirGap(fk, stockRate, h0, "bike.fork.stockOilLevelMm");
  const mid = (t.staticSagMinMm + t.staticSagMaxMm) / 2;
  if (!(forkPreloadForSag(fk, 1, h0, W.raceN, t.raceSagMm) + t.raceSagMm > 0))
    throw new SizingInputError([
      { path: "bike.fork", message: "The air above the oil alone carries the rider at race sag: no coil spring fits" },
    ]);
  const modelAt = (h: number): EndModel => ({
    preloadForSag: (k, load, s) => forkPreloadForSag(fk, k, h, load, s),
    solveSag: (k, p, load) => solveForkSag(fk, k, p, h, load),
  });
  const m0 = modelAt(h0);

  const sagOnlyRateNmm = idealForkSpring(fk, h0, W.staticN, W.raceN, mid, t.raceSagMm).rateNmm;
  const freq = matchForkFrequency(
    fk,
    h0,
    stockRate,
    c.referenceLoads.frontRaceN,
    W.raceN,
    t.raceSagMm,
    loads.cosRake,
    c.rateFactor,
  );
  const choice = chooseByBasis({
    m: m0,
    loads: W,
    targets: t,
    limits,
    rateFactor: c.rateFactor,
    sagOnlyRateNmm,
    preferStaticFor: (wi) =>
      c.rateFactor === 1 && !wi.limitedBy
        ? mid
        : m0.solveSag(wi.rateNmm, forkPreloadForSag(fk, wi.rateNmm, h0, W.raceN, t.raceSagMm), W.staticN).sagMm,
    freq,
    basis: c.basis,
    stockRatesNmm: c.stockRatesNmm,
    overrideRateNmm: ov?.rateNmm,
  });
  const { basis, ideal, sel } = choice;
  const idealRateNmm = ideal.rateNmm;
  const idealPreloadMm = forkPreloadForSag(fk, idealRateNmm, h0, W.raceN, t.raceSagMm);
  const k = sel.chosen.rateNmm;
  reasons.push(
    `Front: ${fmt(W.raceN, 0)} N along the fork at race sag, ${fmt(W.staticN, 0)} N with the bike alone; rates are per leg, ${fk.sprungLegs} sprung.`,
  );
  basisReasons("front", choice, freq, sagOnlyRateNmm, t, mid, c.rateFactor, bike.referenceRiderMassKg, reasons);
  limitNotes(
    "FRONT",
    "front",
    ideal,
    basis === "ride-frequency" ? (freq.rateNmm ?? 0) : sagOnlyRateNmm * c.rateFactor,
    idealPreloadMm,
    t,
    mid,
    warnings,
    reasons,
    basis,
  );
  describeSource("FRONT", "fork spring", sel.source, k, idealRateNmm, warnings, reasons);

  const clampP = (p: number) => Math.min(limits.maxMm, Math.max(limits.minMm, p));
  const preloadAt = (h: number) => ov?.preloadMm ?? clampP(forkPreloadForSag(fk, k, h, W.raceN, t.raceSagMm));
  // Bottoming resistance F(T)/W_fr of the stock setup for its reference rider, times the factor.
  const stockRatio = forkForce(fk, stockRate, f.stockPreloadMm, h0, f.travelMm, FAST) / c.referenceLoads.frontRaceN;
  const targetRatio = stockRatio * c.bottomingFactor;
  const ratioAt = (h: number) => forkForce(fk, k, preloadAt(h), h, f.travelMm, FAST) / W.raceN;
  const hasAir = (g: number) => legBottomVolume(fk, g, springVolumeMm3(fk, k)) > 0;
  const grid = oilLevelGrid(f).filter(hasAir);
  let h = h0;
  if (ov?.oilLevelMm !== undefined) {
    h = ov.oilLevelMm;
    requireAirGap(fk, k, h, "overrides.front.oilLevelMm");
    if (h < f.oilLevelMinMm || h > f.oilLevelMaxMm)
      warnings.push({
        code: "FRONT_OIL_LEVEL_OUTSIDE_RANGE",
        severity: "critical",
        message: `Oil level ${fmt(h, 0)} mm is outside the fork's ${f.oilLevelMinMm}–${f.oilLevelMaxMm} mm.`,
        field: "front.oilLevelMm",
      });
  } else {
    if (!grid.length) requireAirGap(fk, k, f.oilLevelMaxMm, "bike.fork.oilLevelMaxMm");
    // Bottoming target first: the level whose bottoming ratio is nearest the target, ties to the level
    // nearer stock. Preload follows; if it cannot reach race sag there, that is warned, not traded.
    let best = [Infinity, Infinity];
    for (const g of grid) {
      const score = [Math.abs(ratioAt(g) - targetRatio), Math.abs(g - h0)];
      if (score[0]! < best[0]! - 1e-12 || (Math.abs(score[0]! - best[0]!) <= 1e-12 && score[1]! < best[1]!)) {
        best = score;
        h = g;
      }
    }
    const edge = h === grid[0] || h === grid[grid.length - 1];
    if (edge && Math.abs(ratioAt(h) - targetRatio) / targetRatio > 0.03)
      warnings.push({
        code: "FRONT_OIL_LEVEL_AT_LIMIT",
        severity: "caution",
        message: `Oil level ${fmt(h, 0)} mm is at the end of the fork's range and still misses the bottoming target (${fmt(ratioAt(h), 2)} against ${fmt(targetRatio, 2)} × load).`,
        field: "front.oilLevelMm",
      });
    reasons.push(
      `Front: oil level ${fmt(h, 0)} mm keeps bottoming force at ${fmt(ratioAt(h), 2)} × load (stock setup ${fmt(stockRatio, 2)} × its reference rider's, factor ${fmt(c.bottomingFactor, 3)}).`,
    );
  }
  const preloadMm = preloadAt(h);
  const neededMm = forkPreloadForSag(fk, k, h, W.raceN, t.raceSagMm);
  if (ov?.preloadMm !== undefined && (preloadMm < limits.minMm || preloadMm > limits.maxMm))
    warnings.push({
      code: "FRONT_PRELOAD_OUTSIDE_LIMITS",
      severity: "critical",
      message: `Fork preload ${fmt(preloadMm, 1)} mm is outside ${limits.minMm}–${limits.maxMm} mm.`,
      field: "front.preloadMm",
    });
  else if (ov?.preloadMm === undefined && preloadMm !== neededMm)
    warnings.push(preloadLimitWarning("FRONT", "front", neededMm, limits, "fork's adjuster"));
  const race = solveForkSag(fk, k, preloadMm, h, W.raceN);
  const stat = solveForkSag(fk, k, preloadMm, h, W.staticN);
  const clamped = ov?.preloadMm === undefined && preloadMm !== neededMm;
  sagWarnings("FRONT", "front", race, stat, t, warnings, {
    clamped,
    chosenNmm: k,
    idealNmm: idealRateNmm,
    windowPickNmm: basis === "sag-window" ? null : choice.windowSel.chosen.rateNmm,
  });

  const neighbours = [h - OIL_LEVEL_STEP_MM, h, h + OIL_LEVEL_STEP_MM].filter(
    (x) => x >= f.oilLevelMinMm && x <= f.oilLevelMaxMm && hasAir(x),
  );
  if (!neighbours.includes(h)) neighbours.splice(0, 0, h);
  const oilLevelCurves = neighbours.map((lvl) => {
    const p = lvl === h ? preloadMm : preloadAt(lvl);
    return {
      oilLevelMm: lvl,
      bottomingRatio: forkForce(fk, k, p, lvl, f.travelMm, FAST) / W.raceN,
      points: forkCurve(fk, k, p, lvl),
    };
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
    bottoming: {
      forceN: bottomN,
      ratio: bottomN / W.raceN,
      targetRatio: ov?.oilLevelMm === undefined ? targetRatio : null,
    },
    forceCurvePolytropicIndex: FAST,
    forceCurve: oilLevelCurves.find((o) => o.oilLevelMm === h)!.points,
    oilLevelCurves,
    wheelRateAtSagNmm: wheelRate,
    sprungMassKg,
    naturalFrequencyHz: naturalFrequencyOf(wheelRate, sprungMassKg),
    rateBasis: choice.result,
    springVolumeMm3: springVolumeMm3(fk, k),
    bottomPressureMpaAbs: forkBottomPressureMpa(fk, k, h, FAST),
    negativeChamber: null,
  };
}

/** The catalog's air spring with its negative chamber, typical where the catalog gives none. */
export function airSpringOf(bike: BikeSpec): { spring: AirSpring; typical: boolean } {
  const f = bike.fork;
  const air = f.air!; // schema guarantees it for air forks
  return {
    spring: {
      areaMm2: air.pistonAreaMm2,
      positiveVolumeMm3: air.chamberVolumeMm3,
      negativeVolumeMm3: air.negativeChamberVolumeMm3 ?? AIR_NEGATIVE_VOLUME_FRACTION * air.chamberVolumeMm3,
      equalizeAtMm: air.equalizeAtMm ?? AIR_EQUALIZE_FRACTION_OF_TRAVEL * f.travelMm,
    },
    typical: air.negativeChamberVolumeMm3 === undefined || air.equalizeAtMm === undefined,
  };
}

function evaluateAirFork(c: FrontContext): FrontResult {
  const { bike, loads, targets: t, ov, warnings, reasons } = c;
  const f = bike.fork;
  const { spring, typical } = airSpringOf(bike);
  if (!(t.raceSagMm > spring.equalizeAtMm))
    throw new SizingInputError([
      { path: "bike.fork.air.equalizeAtMm", message: "The chambers must equalise before race sag" },
    ]);
  const p0 =
    ov?.airPressureKpaGauge !== undefined
      ? ov.airPressureKpaGauge / 1000 + ATMOSPHERE_MPA
      : airSpringChargeForLoad(spring, loads.frontRaceN, t.raceSagMm);
  const gaugeKpa = (p0 - ATMOSPHERE_MPA) * 1000;
  if (gaugeKpa < 0)
    throw new SizingInputError([
      {
        path: "bike.fork.air",
        message: "The sag target needs less than atmospheric pressure: chamber too small for this load",
      },
    ]);
  reasons.push(
    ov?.airPressureKpaGauge !== undefined
      ? `Front: air pressure ${fmt(gaugeKpa, 0)} kPa set by the tuner.`
      : `Front: ${fmt(gaugeKpa, 0)} kPa gauge at top-out puts race sag at ${fmt(t.raceSagMm, 0)} mm under ${fmt(loads.frontRaceN, 0)} N (isothermal, negative chamber equalised at ${fmt(spring.equalizeAtMm, 0)} mm${typical ? ", typical volumes" : ""}); fine-tune by measuring sag.`,
  );
  const force = (s: number, n: number) => airSpringForce(spring, p0, s, n);
  const race = firstCrossing((s) => force(s, 1), loads.frontRaceN, f.travelMm, [spring.equalizeAtMm]);
  const stat = firstCrossing((s) => force(s, 1), loads.frontStaticN, f.travelMm, [spring.equalizeAtMm]);
  sagWarnings("FRONT", "front", race, stat, t, warnings);
  const points = [];
  for (let i = 0; i < CURVE_POINTS; i++) {
    const s = (f.travelMm * i) / (CURVE_POINTS - 1);
    points.push({ forkTravelMm: s, forceN: force(s, FAST) });
  }
  const bottomN = force(f.travelMm, FAST);
  const wheelRate = airSpringRate(spring, p0, race.sagMm, 1) / (loads.cosRake * loads.cosRake);
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
    rateBasis: null,
    springVolumeMm3: null,
    bottomPressureMpaAbs: airSpringPositivePressure(spring, p0, f.travelMm, FAST),
    negativeChamber: { volumeMm3: spring.negativeVolumeMm3!, equalizeAtMm: spring.equalizeAtMm, typical },
  };
}
