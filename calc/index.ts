// Public surface of the computational core. Pure TypeScript: imports only itself and zod.
export * from "./constants";
export * from "./errors";
export {
  altitudeSchema,
  ambientSchema,
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
export { solvePoint, boostCurve, idealRatioRuleManifoldPressure, type OperatingPoint } from "./solve";
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
