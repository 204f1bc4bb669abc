// @ts-nocheck
// Public surface of the computational core. Pure TypeScript: imports only itself and zod.
export * from "./constants";
export * from "./errors";
export {
  altitudeSchema,
  ambientSchema,
  calibrationRunSchema,
  calibrationRunsSchema,
  inletRestrictionSchema,
  REFINEMENT_DEFAULTS,
  blowerKindSchema,
  blowerSchema,
  cautionOptionsSchema,
  combinationSchema,
  driveSchema,
  engineSchema,
  fuelSchema,
  intercoolerSchema,
  measuredListSchema,
  measuredPointSchema,
  parseOrThrow,
  pulleyDiameterListSchema,
  pulleyDiameterSchema,
  rpmListSchema,
  rpmSchema,
  targetBoostSchema,
  veCurveSchema,
  vePointSchema,
  type BlowerKind,
  type CalibrationRun,
  type CautionOptions,
  type Combination,
  type CombinationInput,
  type Intercooler,
  type MeasuredPoint,
  type VePoint,
} from "./schema";
export * from "./units";
export { standardAtmosphere, type AtmosphereState } from "./atmosphere";
export { driveRatio, blowerSpeed, overdrive } from "./drive";
export { engineAirflow, veAt } from "./engine";
export {
  adiabaticEfficiency,
  builtInPressureRatio,
  compressionWorkPerVolume,
  deadHeadPressureRatio,
  dischargeTemperature,
  idealCycleEfficiency,
  isentropicTemperature,
  isentropicWorkPerVolume,
  slipCoefficient,
  slipFlow,
} from "./blower";
export { solvePoint, boostCurve, idealRatioRuleManifoldPressure, evaporativeCooling, type OperatingPoint } from "./solve";
export { explainChange, type ChangeDriver, type ChangeDriverCode, type ChangeExplanation } from "./explain";
export {
  RANGE_REASONS,
  MODEL_MAX_PRESSURE_RATIO,
  CHARGE_TEMPERATURE_BOUND,
  BLOWER_OVERSPEED_MARGIN,
  rangeReasonsOf,
  type RangeReason,
} from "./range";
export { trySolvePoint, trySolveCurve } from "./try-solve";
export {
  pulleySweep,
  pulleyForBoost,
  PULLEY_FINDER_MAX_DIAMETER,
  PULLEY_FINDER_MIN_DIAMETER,
  type PulleyForBoostResult,
  type PulleySweepRow,
  type StockedPulley,
} from "./pulleys";
export { calibrateVe, type CalibrationResidual, type CalibrationResult } from "./calibrate";
export {
  calibrate,
  CALIBRATION_SLIP_PRIOR_SIGMA,
  CALIBRATION_VE_SIGMA,
  type FittedParameter,
  type RunResidual,
  type RunsCalibrationResult,
} from "./calibrate-runs";
export {
  cautions,
  SAFETY_NOTICE,
  DEFAULT_BELT_MINIMUM_DIAMETER,
  DEFAULT_CHARGE_TEMPERATURE_LIMIT,
  DEFAULT_MAX_MODEL_PRESSURE_RATIO,
  VE_MAX_SLOPE_PER_1000_RPM,
  VE_PLAUSIBLE_MAX,
  VE_PLAUSIBLE_MIN,
  type Caution,
  type CautionCode,
  type CautionPoint,
  type CautionSeverity,
} from "./cautions";
export * from "./defaults";
