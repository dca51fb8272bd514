import type { Discipline, JumpSize, RidingStyle, SkillLevel } from "./vocab";
import type { ClickerRule, SagTargetFractions } from "./input-schema";

// Every default model parameter lives here. Each value says where it comes from:
// "common practice" = a trade habit widely used in suspension shops, no single source;
// "from memory" = the author's recollection of typical figures, to be tuned by each shop.

/** Full off-road kit (helmet, boots, body armour, clothing) is about 7–10 kg: common practice. */
export const DEFAULT_GEAR_MASS_KG = 8;

/** Share of the rider's weight on the rear wheel in the sag stance: from memory (≈ pegs a little
 *  ahead of the mid-wheelbase, rider seated slightly behind them). Shop-editable. */
export const DEFAULT_RIDER_REAR_SHARE = 0.65;

/** Oil level search step, 5 mm: common practice (oil levels are set and quoted in 5 mm steps). */
export const OIL_LEVEL_STEP_MM = 5;

/** Front/rear natural frequency ratio window (shop setting); outside it the engine cautions.
 *  From memory, rough: shops should set their own. */
export const FREQUENCY_RATIO_WINDOW = { min: 0.8, max: 1.8 } as const;

/** A chosen rate this far from stock counts as a large change for clicker rules: common practice. */
export const LARGE_RATE_CHANGE_FRACTION = 0.08;

/**
 * Sag targets as fractions of travel, per discipline. Rear race sag about a third of wheel travel
 * (≈ 100–110 mm on 300–320 mm) and static sag about 10–13 % (≈ 30–40 mm): common practice.
 * Fork figures: from memory (fork race sag a little under a fifth of travel, static about 9–13 %). Faster, jump-heavy disciplines run
 * a little less sag, trail and enduro a little more: common practice.
 */
export const SAG_TARGETS_BY_DISCIPLINE: Record<Discipline, SagTargetFractions> = {
  motocross: {
    rearRace: 0.335,
    rearStaticMin: 0.1,
    rearStaticMax: 0.13,
    forkRace: 0.185,
    forkStaticMin: 0.085,
    forkStaticMax: 0.125,
  },
  supercross: {
    rearRace: 0.32,
    rearStaticMin: 0.095,
    rearStaticMax: 0.125,
    forkRace: 0.175,
    forkStaticMin: 0.08,
    forkStaticMax: 0.12,
  },
  enduro: {
    rearRace: 0.345,
    rearStaticMin: 0.1,
    rearStaticMax: 0.135,
    forkRace: 0.195,
    forkStaticMin: 0.09,
    forkStaticMax: 0.13,
  },
  "cross-country": {
    rearRace: 0.34,
    rearStaticMin: 0.1,
    rearStaticMax: 0.13,
    forkRace: 0.19,
    forkStaticMin: 0.085,
    forkStaticMax: 0.125,
  },
  desert: {
    rearRace: 0.335,
    rearStaticMin: 0.1,
    rearStaticMax: 0.13,
    forkRace: 0.185,
    forkStaticMin: 0.085,
    forkStaticMax: 0.125,
  },
  trail: {
    rearRace: 0.35,
    rearStaticMin: 0.105,
    rearStaticMax: 0.14,
    forkRace: 0.2,
    forkStaticMin: 0.09,
    forkStaticMax: 0.135,
  },
};

/** Added to race sag fractions by skill: newer riders a little lower and calmer. From memory. */
export const SAG_OFFSET_BY_SKILL: Record<SkillLevel, number> = {
  beginner: 0.01,
  novice: 0.005,
  intermediate: 0,
  advanced: 0,
  expert: -0.005,
  pro: -0.01,
};

/** Faster riders run stiffer springs than sag alone asks for: common practice; figures from memory. */
export const RATE_FACTOR_BY_SKILL: Record<SkillLevel, number> = {
  beginner: 0.97,
  novice: 0.985,
  intermediate: 1,
  advanced: 1.01,
  expert: 1.02,
  pro: 1.03,
};
export const RATE_FACTOR_BY_STYLE: Record<RidingStyle, number> = { smooth: 0.985, moderate: 1, aggressive: 1.02 };
/** Discipline and jump size move the rate too: supercross whoops and big jumps want more support,
 *  trail and enduro grip want less. From memory; motocross with medium jumps is the reference (1). */
export const RATE_FACTOR_BY_DISCIPLINE: Record<Discipline, number> = {
  motocross: 1,
  supercross: 1.06,
  enduro: 0.96,
  "cross-country": 0.97,
  desert: 1.02,
  trail: 0.94,
};
export const RATE_FACTOR_BY_JUMP: Record<JumpSize, number> = { none: 0.98, small: 0.99, medium: 1, large: 1.02 };

/** Which rate basis sizes the springs unless the shop or the tuner picks the other (lib/sizing/README.md). */
export const DEFAULT_RATE_BASIS = "ride-frequency" as const;

/**
 * Sanity limits (lib/sizing/README.md, "Sanity limits"). Outside them a figure is almost surely
 * mistyped, so the engine asks the tuner to acknowledge before approval. From memory.
 */
export const SANITY_LIMITS = {
  /** Force at full travel over the race-sag load. */
  bottomingRatio: { min: 2, max: 12 },
  /** Absolute pressure of the air above the oil of a coil fork at full travel (fast stroke), MPa. */
  forkAirPressureMaxMpa: 3,
  /** Positive chamber of an air fork: volume at top-out over volume at full travel. */
  airChamberCompressionRatioMax: 6,
  /** Natural frequency of either end at race sag, Hz. */
  naturalFrequencyHz: { min: 1, max: 3.5 },
} as const;

/** Air-spring forks without a negative chamber in the catalog: a typical single-pressure fork's
 *  negative chamber is about a tenth of the positive volume at top-out and equalises a few percent
 *  into the travel (transfer port). From memory. */
export const AIR_NEGATIVE_VOLUME_FRACTION = 0.1;
export const AIR_EQUALIZE_FRACTION_OF_TRAVEL = 0.03;

/**
 * Fork springs whose geometry the catalog does not give: mean coil diameter about three quarters of
 * the displacement (inner tube) diameter and 16 active coils with squared ends (18 in all); the wire
 * then follows from the rate (k = G·d⁴/(8·D³·n_a), Shigley eq. 10-9). From memory.
 */
export const TYPICAL_FORK_SPRING = { meanDiameterOfDisplacement: 0.75, activeCoils: 16, endCoils: 2 } as const;
/** Shear modulus of chrome-silicon spring wire, 77.2 GPa (Shigley, 10th ed., table 10-5), in MPa. */
export const SPRING_STEEL_SHEAR_MODULUS_MPA = 77_200;

/** Bottoming resistance relative to the stock bike's, per discipline and jump size. From memory. */
export const BOTTOMING_FACTOR_BY_DISCIPLINE: Record<Discipline, number> = {
  motocross: 1,
  supercross: 1.1,
  enduro: 0.92,
  "cross-country": 0.95,
  desert: 1.05,
  trail: 0.9,
};
export const BOTTOMING_FACTOR_BY_JUMP: Record<JumpSize, number> = { none: 0.95, small: 0.98, medium: 1, large: 1.05 };

const out = (n: number) => n; // + = clicks out (softer), − = clicks in (firmer)

/** Default clicker rules: common practice (the usual first move for each complaint or ground). */
export const DEFAULT_CLICKER_RULES: ClickerRule[] = [
  {
    trigger: { kind: "complaint", complaint: "bottoming" },
    clicker: "forkCompression",
    change: out(-2),
    reason: "Bottoming: firm fork compression 2 clicks",
  },
  {
    trigger: { kind: "complaint", complaint: "bottoming" },
    clicker: "shockHighSpeedCompression",
    change: out(-0.25),
    reason: "Bottoming: firm shock high-speed compression a quarter turn",
  },
  {
    trigger: { kind: "complaint", complaint: "harsh-small-bumps" },
    clicker: "forkCompression",
    change: out(2),
    reason: "Harsh on small bumps: soften fork compression 2 clicks",
  },
  {
    trigger: { kind: "complaint", complaint: "harsh-small-bumps" },
    clicker: "shockLowSpeedCompression",
    change: out(2),
    reason: "Harsh on small bumps: soften shock low-speed compression 2 clicks",
  },
  {
    trigger: { kind: "complaint", complaint: "dives-braking" },
    clicker: "forkCompression",
    change: out(-2),
    reason: "Dives under braking: firm fork compression 2 clicks",
  },
  {
    trigger: { kind: "complaint", complaint: "wallows" },
    clicker: "shockLowSpeedCompression",
    change: out(-2),
    reason: "Wallows: firm shock low-speed compression 2 clicks",
  },
  {
    trigger: { kind: "complaint", complaint: "wallows" },
    clicker: "forkRebound",
    change: out(-1),
    reason: "Wallows: slow fork rebound 1 click",
  },
  {
    trigger: { kind: "complaint", complaint: "kicks" },
    clicker: "shockRebound",
    change: out(-2),
    reason: "Rear kicks: slow shock rebound 2 clicks",
  },
  {
    trigger: { kind: "complaint", complaint: "headshake" },
    clicker: "forkRebound",
    change: out(-2),
    reason: "Headshake: slow fork rebound 2 clicks",
  },
  {
    trigger: { kind: "terrain", terrain: "sand" },
    clicker: "forkCompression",
    change: out(-2),
    reason: "Sand: firm fork compression 2 clicks for support",
  },
  {
    trigger: { kind: "terrain", terrain: "sand" },
    clicker: "shockLowSpeedCompression",
    change: out(-2),
    reason: "Sand: firm shock low-speed compression 2 clicks for support",
  },
  {
    trigger: { kind: "terrain", terrain: "rocky" },
    clicker: "forkCompression",
    change: out(2),
    reason: "Rocky ground: soften fork compression 2 clicks for sharp hits",
  },
  {
    trigger: { kind: "terrain", terrain: "roots" },
    clicker: "shockLowSpeedCompression",
    change: out(1),
    reason: "Roots: soften shock low-speed compression 1 click for grip",
  },
  {
    trigger: { kind: "terrain", terrain: "hardpack" },
    clicker: "forkRebound",
    change: out(1),
    reason: "Hardpack: quicken fork rebound 1 click to keep the wheel tracking",
  },
  {
    trigger: { kind: "rate-change", end: "rear", direction: "stiffer", minChangeFraction: LARGE_RATE_CHANGE_FRACTION },
    clicker: "shockRebound",
    change: out(-2),
    reason: "Stiffer shock spring: slow rebound 2 clicks to control the extra stored energy",
  },
  {
    trigger: { kind: "rate-change", end: "rear", direction: "softer", minChangeFraction: LARGE_RATE_CHANGE_FRACTION },
    clicker: "shockRebound",
    change: out(2),
    reason: "Softer shock spring: quicken rebound 2 clicks",
  },
  {
    trigger: { kind: "rate-change", end: "front", direction: "stiffer", minChangeFraction: LARGE_RATE_CHANGE_FRACTION },
    clicker: "forkRebound",
    change: out(-2),
    reason: "Stiffer fork springs: slow rebound 2 clicks",
  },
  {
    trigger: { kind: "rate-change", end: "front", direction: "softer", minChangeFraction: LARGE_RATE_CHANGE_FRACTION },
    clicker: "forkRebound",
    change: out(2),
    reason: "Softer fork springs: quicken rebound 2 clicks",
  },
];

const kgf = (v: number) => Math.round(v * 9.80665 * 1000) / 1000;
const range = (from: number, to: number, step: number) =>
  Array.from({ length: Math.round((to - from) / step) + 1 }, (_, i) => from + i * step);

/** A typical shop shelf: shock springs 2.4–6.6 kgf/mm in 0.2 steps, fork springs 0.24–0.60 kgf/mm
 *  in 0.02 steps (the usual sizing steps: common practice), stored in N/mm. */
export const TYPICAL_SHOCK_RATES_NMM: number[] = range(2.4, 6.6, 0.2).map(kgf);
export const TYPICAL_FORK_RATES_NMM: number[] = range(0.24, 0.6, 0.02).map(kgf);

export {
  GENERIC_BIKE_CLASSES,
  TYPICAL_OUTPUT_RANGES,
  type GenericBikeClass,
  type TypicalOutputRange,
} from "./bike-classes";
