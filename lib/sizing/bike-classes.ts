import type { BikeSpecInput } from "./bike-schema";

// Generic bike classes for the seed catalog. TYPICAL VALUES for the class, rounded, from memory:
// not any maker's data. Shops add their real models themselves. Each curve is progressive (ratio
// falling with travel), as off-road linkages are (common practice); each shock stroke is the
// curve's integral over the wheel travel, rounded to 0.5 mm. Each class is calibrated so that its
// stock springs, for its reference rider, meet the default sag targets with preload inside the range
// (lib/sizing/README.md, "Calibration"): the class is self-consistent, and a test holds it to that.

export interface GenericBikeClass {
  id: string;
  name: string;
  spec: BikeSpecInput;
  /** Rider body masses (kg, without gear) used as light / medium / heavy in end-to-end checks. */
  riderBodyMassKg: { light: number; medium: number; heavy: number };
}

const clickers = (hscTurns: number) => ({
  forkCompression: { min: 0, max: 22, stock: 12 },
  forkRebound: { min: 0, max: 22, stock: 12 },
  shockLowSpeedCompression: { min: 0, max: 20, stock: 12 },
  shockHighSpeedCompression: { min: 0, max: 3, stock: hscTurns },
  shockRebound: { min: 0, max: 20, stock: 12 },
});

const curve = (pts: [number, number][]) => pts.map(([wheelTravelMm, ratio]) => ({ wheelTravelMm, ratio }));
const kgf = (v: number) => Math.round(v * 9.80665 * 1000) / 1000;

const fork48 = { displacementDiameterMm: 48, freeAreaMm2: 1250, capVolumeMm3: 25_000 };

export const GENERIC_BIKE_CLASSES: GenericBikeClass[] = [
  {
    id: "mx-450-4t",
    name: "450 four-stroke motocross (typical values)",
    riderBodyMassKg: { light: 65, medium: 80, heavy: 95 },
    spec: {
      massKg: 111,
      frontFraction: 0.49,
      unsprungFrontKg: 10,
      unsprungRearKg: 15,
      rakeDeg: 27,
      referenceRiderMassKg: 91,
      riderMassRangeKg: { min: 55, max: 125 },
      rear: {
        wheelTravelMm: 310,
        shockStrokeMm: 132,
        leverageCurve: curve([
          [0, 3.05],
          [50, 2.8],
          [100, 2.56],
          [150, 2.36],
          [200, 2.19],
          [250, 2.05],
          [310, 1.92],
        ]),
        preloadMinMm: 2,
        preloadMaxMm: 20,
        collarPitchMm: 1.5,
        stockRateNmm: kgf(5.4),
      },
      fork: {
        kind: "coil-both",
        travelMm: 310,
        preloadMinMm: 0,
        preloadMaxMm: 12,
        stockPreloadMm: 4,
        stockRateNmm: kgf(0.5),
        ...fork48,
        oilLevelMinMm: 80,
        oilLevelMaxMm: 150,
        stockOilLevelMm: 110,
      },
      clickers: clickers(1.5),
    },
  },
  {
    id: "mx-250-4t",
    name: "250 four-stroke motocross (typical values)",
    riderBodyMassKg: { light: 55, medium: 72, heavy: 90 },
    spec: {
      massKg: 105,
      frontFraction: 0.5,
      unsprungFrontKg: 9.5,
      unsprungRearKg: 14,
      rakeDeg: 27,
      referenceRiderMassKg: 86,
      riderMassRangeKg: { min: 50, max: 115 },
      rear: {
        wheelTravelMm: 310,
        shockStrokeMm: 132.5,
        leverageCurve: curve([
          [0, 3.0],
          [50, 2.78],
          [100, 2.55],
          [150, 2.35],
          [200, 2.18],
          [250, 2.04],
          [310, 1.93],
        ]),
        preloadMinMm: 2,
        preloadMaxMm: 20,
        collarPitchMm: 1.5,
        stockRateNmm: kgf(5.2),
      },
      fork: {
        kind: "coil-both",
        travelMm: 310,
        preloadMinMm: 0,
        preloadMaxMm: 12,
        stockPreloadMm: 4,
        stockRateNmm: kgf(0.48),
        ...fork48,
        oilLevelMinMm: 80,
        oilLevelMaxMm: 150,
        stockOilLevelMm: 110,
      },
      clickers: clickers(1.5),
    },
  },
  {
    id: "mx-125-2t",
    name: "125 two-stroke motocross (typical values)",
    riderBodyMassKg: { light: 50, medium: 65, heavy: 85 },
    spec: {
      massKg: 95,
      frontFraction: 0.5,
      unsprungFrontKg: 9,
      unsprungRearKg: 13,
      rakeDeg: 27,
      referenceRiderMassKg: 80,
      riderMassRangeKg: { min: 45, max: 105 },
      rear: {
        wheelTravelMm: 310,
        shockStrokeMm: 133,
        leverageCurve: curve([
          [0, 2.95],
          [50, 2.75],
          [100, 2.53],
          [150, 2.34],
          [200, 2.18],
          [250, 2.05],
          [310, 1.95],
        ]),
        preloadMinMm: 2,
        preloadMaxMm: 20,
        collarPitchMm: 1.5,
        stockRateNmm: kgf(4.8),
      },
      fork: {
        kind: "coil-both",
        travelMm: 300,
        preloadMinMm: 0,
        preloadMaxMm: 12,
        stockPreloadMm: 4,
        stockRateNmm: kgf(0.44),
        ...fork48,
        oilLevelMinMm: 80,
        oilLevelMaxMm: 150,
        stockOilLevelMm: 110,
      },
      clickers: clickers(1.5),
    },
  },
  {
    id: "enduro-300-2t",
    name: "300 two-stroke enduro (typical values)",
    riderBodyMassKg: { light: 60, medium: 80, heavy: 100 },
    spec: {
      massKg: 112,
      frontFraction: 0.47,
      unsprungFrontKg: 10,
      unsprungRearKg: 15,
      rakeDeg: 26.5,
      referenceRiderMassKg: 88,
      riderMassRangeKg: { min: 55, max: 125 },
      rear: {
        wheelTravelMm: 330,
        shockStrokeMm: 138,
        leverageCurve: curve([
          [0, 2.95],
          [55, 2.75],
          [110, 2.55],
          [165, 2.38],
          [220, 2.24],
          [275, 2.12],
          [330, 2.02],
        ]),
        preloadMinMm: 2,
        preloadMaxMm: 20,
        collarPitchMm: 1.5,
        stockRateNmm: kgf(4.8),
      },
      fork: {
        kind: "coil-both",
        travelMm: 300,
        preloadMinMm: 0,
        preloadMaxMm: 12,
        stockPreloadMm: 5,
        stockRateNmm: kgf(0.46),
        ...fork48,
        oilLevelMinMm: 90,
        oilLevelMaxMm: 160,
        stockOilLevelMm: 120,
      },
      clickers: clickers(2),
    },
  },
  {
    id: "youth-85",
    name: "85 cc youth motocross (typical values)",
    riderBodyMassKg: { light: 38, medium: 46, heavy: 55 },
    spec: {
      massKg: 75,
      frontFraction: 0.47,
      unsprungFrontKg: 7,
      unsprungRearKg: 10,
      rakeDeg: 27,
      referenceRiderMassKg: 54,
      riderMassRangeKg: { min: 30, max: 75 },
      rear: {
        wheelTravelMm: 290,
        shockStrokeMm: 128.5,
        leverageCurve: curve([
          [0, 2.75],
          [50, 2.58],
          [100, 2.4],
          [150, 2.24],
          [200, 2.1],
          [250, 1.99],
          [290, 1.92],
        ]),
        preloadMinMm: 2,
        preloadMaxMm: 18,
        collarPitchMm: 1.5,
        stockRateNmm: kgf(3.2),
      },
      fork: {
        kind: "coil-both",
        travelMm: 275,
        preloadMinMm: 0,
        preloadMaxMm: 10,
        stockPreloadMm: 5,
        stockRateNmm: kgf(0.34),
        displacementDiameterMm: 36,
        freeAreaMm2: 700,
        capVolumeMm3: 12_000,
        oilLevelMinMm: 80,
        oilLevelMaxMm: 150,
        stockOilLevelMm: 110,
      },
      clickers: clickers(1.5),
    },
  },
];

/**
 * Typical chosen spring rates for each class from its light to its heavy rider (riderBodyMassKg), in
 * N/mm (shock; fork per leg): what shop spring charts give such riders, one shelf step of margin each
 * side. From memory of typical shop sizing charts. A sanity window for the end-to-end tests, not an answer.
 */
export interface TypicalOutputRange {
  shockRateNmm: [number, number];
  forkRateNmm: [number, number];
}

export const TYPICAL_OUTPUT_RANGES: Record<string, TypicalOutputRange> = {
  "mx-450-4t": { shockRateNmm: [kgf(4.6), kgf(6.2)], forkRateNmm: [kgf(0.42), kgf(0.56)] },
  "mx-250-4t": { shockRateNmm: [kgf(4.2), kgf(5.8)], forkRateNmm: [kgf(0.4), kgf(0.54)] },
  "mx-125-2t": { shockRateNmm: [kgf(3.8), kgf(5.4)], forkRateNmm: [kgf(0.36), kgf(0.5)] },
  "enduro-300-2t": { shockRateNmm: [kgf(3.8), kgf(5.4)], forkRateNmm: [kgf(0.38), kgf(0.5)] },
  "youth-85": { shockRateNmm: [kgf(2.8), kgf(3.8)], forkRateNmm: [kgf(0.3), kgf(0.4)] },
};
