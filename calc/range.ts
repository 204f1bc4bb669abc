// The model's own statement of where it may be trusted. A point outside the range is still
// computed (so the UI can say why), but its figures are not to be shown as predictions.

/** Why an operating point lies outside the model's range. */
export const RANGE_REASONS = [
  /** Pressure ratio above MODEL_MAX_PRESSURE_RATIO. */
  "pressure-ratio-above-range",
  /** Manifold (charge) temperature above CHARGE_TEMPERATURE_BOUND. */
  "charge-temperature-above-bound",
  /** Blower faster than its speed limit by more than BLOWER_OVERSPEED_MARGIN. */
  "blower-overspeed-margin",
  /** No stable balance of blower delivery and engine demand (the solver throws; rows carry it). */
  "no-balance",
] as const;

/** Code of one reason a point is outside the model's range. */
export type RangeReason = (typeof RANGE_REASONS)[number];

/**
 * Highest pressure ratio the model is meant for (dimensionless): 2.5, the bound its
 * single-point slip law and lumped heating were written for (an author's bound, as the
 * `pressure-ratio-out-of-range` caution states it).
 */
export const MODEL_MAX_PRESSURE_RATIO = 2.5;

/**
 * Highest charge temperature the model is meant for (K): 200 °C. Beyond it the air-only energy
 * balance (no heat loss to walls, constant cp, no fuel chemistry) and any gasoline charge are
 * both far from anything an engine runs on (an author's bound).
 */
export const CHARGE_TEMPERATURE_BOUND = 473.15;

/**
 * Margin over the blower's own speed limit beyond which the model's slip and heating are not
 * trusted (fraction): 10 % (an author's bound; the overspeed caution warns from 0 %).
 */
export const BLOWER_OVERSPEED_MARGIN = 0.1;

/** Shared empty list for points within range (never mutated). */
export const NO_REASONS: RangeReason[] = [];

/** Reasons a solved point is outside the range, a new list each call (pressure ratio –, manifold temperature K, blower speed and limit rev/min). */
export function rangeReasonsOf(pressureRatio: number, manifoldTemperature: number, blowerRpm: number, blowerMaxRpm: number): RangeReason[] {
  const reasons: RangeReason[] = [];
  if (pressureRatio > MODEL_MAX_PRESSURE_RATIO) reasons.push("pressure-ratio-above-range");
  if (manifoldTemperature > CHARGE_TEMPERATURE_BOUND) reasons.push("charge-temperature-above-bound");
  if (blowerRpm > blowerMaxRpm * (1 + BLOWER_OVERSPEED_MARGIN)) reasons.push("blower-overspeed-margin");
  return reasons;
}
