// The bike form's number fields by section: engine field path, label (with unit), hint.
export type NumField = [path: string, label: string, hint?: string];

export const MASS_FIELDS: NumField[] = [
  ["spec.massKg", "Bike mass, ready to ride (kg)", "Fluids and fuel in"],
  ["spec.frontFraction", "Share of bike weight on the front wheel (0–1)", "Without rider, e.g. 0.48"],
  ["spec.unsprungFrontKg", "Unsprung mass, front (kg)"],
  ["spec.unsprungRearKg", "Unsprung mass, rear (kg)"],
  ["spec.rakeDeg", "Rake (degrees)"],
  ["spec.referenceRiderMassKg", "Rider mass the stock setup suits, with gear (kg)"],
  ["spec.riderMassRangeKg.min", "Rider mass range, lowest (kg)", "Optional; outside it the engine warns"],
  ["spec.riderMassRangeKg.max", "Rider mass range, highest (kg)"],
];

export const REAR_FIELDS: NumField[] = [
  ["spec.rear.wheelTravelMm", "Rear wheel travel (mm)"],
  ["spec.rear.shockStrokeMm", "Shock stroke (mm)", "Must match the curve's integral"],
  ["spec.rear.preloadMinMm", "Shock preload, least (mm)"],
  ["spec.rear.preloadMaxMm", "Shock preload, most (mm)"],
  ["spec.rear.collarPitchMm", "Preload collar thread pitch (mm per turn)"],
  ["spec.rear.stockRateNmm", "Stock shock spring (N/mm)"],
];

export const FORK_FIELDS: NumField[] = [
  ["spec.fork.travelMm", "Fork travel (mm)"],
  ["spec.fork.stockRateNmm", "Stock fork spring per leg (N/mm)", "Coil forks"],
  ["spec.fork.preloadMinMm", "Fork preload, least (mm)"],
  ["spec.fork.preloadMaxMm", "Fork preload, most (mm)"],
  ["spec.fork.stockPreloadMm", "Fork preload, stock (mm)"],
  [
    "spec.fork.displacementDiameterMm",
    "Displacing diameter (mm)",
    "Inner tube or cartridge rod that pushes into the air",
  ],
  ["spec.fork.freeAreaMm2", "Free oil surface area (mm²)"],
  ["spec.fork.capVolumeMm3", "Air volume in the cap (mm³)"],
  ["spec.fork.oilLevelMinMm", "Oil level, least (mm from top)"],
  ["spec.fork.oilLevelMaxMm", "Oil level, most (mm from top)"],
  ["spec.fork.stockOilLevelMm", "Oil level, stock (mm from top)"],
];

export const AIR_FIELDS: NumField[] = [
  ["spec.fork.air.pistonAreaMm2", "Air piston area (mm²)"],
  ["spec.fork.air.chamberVolumeMm3", "Air chamber volume at top-out (mm³)"],
  ["spec.fork.air.stockPressureKpaGauge", "Stock air pressure (kPa, gauge)"],
  [
    "spec.fork.air.negativeChamberVolumeMm3",
    "Negative chamber volume at top-out (mm³)",
    "Optional; empty: a typical tenth of the main chamber",
  ],
  ["spec.fork.air.equalizeAtMm", "Chambers equalise at (mm of fork travel)", "Optional; empty: 3 % of travel, typical"],
];

/** The stock fork spring's geometry: its steel takes air volume above the oil (coil forks, optional). */
export const FORK_SPRING_FIELDS: NumField[] = [
  [
    "spec.fork.stockSpring.wireDiameterMm",
    "Stock spring wire diameter (mm)",
    "Optional; empty: a typical spring for the rate",
  ],
  ["spec.fork.stockSpring.meanCoilDiameterMm", "Stock spring mean coil diameter (mm)"],
  ["spec.fork.stockSpring.totalCoils", "Stock spring total coils"],
];

export const CLICKERS: [id: string, label: string][] = [
  ["forkCompression", "Fork compression (clicks)"],
  ["forkRebound", "Fork rebound (clicks)"],
  ["shockLowSpeedCompression", "Shock low-speed compression (clicks)"],
  ["shockHighSpeedCompression", "Shock high-speed compression (turns)"],
  ["shockRebound", "Shock rebound (clicks)"],
];

export const FORK_KIND_LABELS = {
  "coil-both": "Coil springs in both legs",
  "coil-single": "Coil spring in one leg",
  air: "Air spring",
} as const;
