// Public API of the Sagwise sizing engine (lib/sizing/README.md). Pure functions, SI-style units in the names.
export { recommend } from "./recommend";
export { evaluateSetup } from "./evaluate";
export { ENGINE_VERSION } from "./version";
export { SizingInputError, type SizingIssue } from "./errors";

export {
  sizingInputSchema,
  targetsSchema,
  sagTargetFractionsSchema,
  clickerRuleSchema,
  clickerTriggerSchema,
  type SizingInput,
  type SizingInputParsed,
  type SizingTargets,
  type SagTargetFractions,
  type ClickerRule,
} from "./input-schema";
export {
  bikeSpecSchema,
  leveragePointSchema,
  clickerRangeSchema,
  type BikeSpec,
  type BikeSpecInput,
} from "./bike-schema";
export {
  recommendationSchema,
  warningSchema,
  rateTripleSchema,
  pressureTripleSchema,
  type Recommendation,
  type RearResult,
  type FrontResult,
  type ClickerSetting,
  type SizingWarning,
  type RateSource,
  rateBasisResultSchema,
  type RateBasisResult,
} from "./output-schema";
export { setupOverridesSchema, type SetupOverrides, type SetupOverridesInput } from "./overrides";
export * from "./vocab";

export { shockTravelAtMm, rearWheelForceN, solveRearSagMm, idealRearSpring, type LeveragePoint } from "./linkage";
export {
  forkAirForceN,
  airForkPressureKpaGauge,
  polytropicPressure,
  airSpringForce,
  airSpringChargeForLoad,
  type AirSpring,
} from "./air";
export {
  springRateFromGeometry,
  wahlFactor,
  rateFromLoadTest,
  shearStressMpa,
  activeCoilsSquaredGround,
  springSteelVolumeMm3,
} from "./spring-geometry";
export {
  SPRING_STEELS,
  SPRING_STEEL_IDS,
  coilStressVerdict,
  minTensileStrengthMpa,
  type SpringSteel,
  type StressVerdict,
} from "./spring-steel";
export {
  convertRate,
  rateTriple,
  pressureTriple,
  poundsToKg,
  kgToPounds,
  STANDARD_GRAVITY,
  KGF_N,
  LBF_N,
  INCH_MM,
  POUND_KG,
  PSI_KPA,
  ATMOSPHERE_KPA,
} from "./units";
export { naturalFrequencyHz } from "./frequency";
export { sagVerdict, measuredSagSchema, type SagVerdict } from "./verdict";
export {
  fitCalibration,
  catalogParameters,
  calibrationReportSchema,
  MIN_CALIBRATION_REPORTS,
  MAX_CALIBRATION_SCATTER,
  type CalibrationReport,
  type CalibrationFit,
} from "./calibration";
export { calibrationParametersSchema, type CalibrationParameters } from "./bike-schema";
export * as sizingDefaults from "./defaults";
export { proposeClickerChanges, type RideFeedback, type ClickerChange, type ClickerProposal } from "./ride-feedback";
