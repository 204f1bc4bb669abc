// @ts-nocheck
// The belt drive: drive ratio, overdrive and blower speed (calc/README.md).
import { combinationSchema, parseOrThrow, positiveSchema, rpmSchema, type Combination, type CombinationInput } from "./schema";

/** Drive ratio r = crank pulley diameter / blower pulley diameter (dimensionless). */
export function driveRatioUnchecked(crankDiameter: number, blowerPulleyDiameter: number): number {
  return crankDiameter / blowerPulleyDiameter;
}

/** Drive ratio r = Dc/Db from the crank and blower pulley diameters (both m; dimensionless result). */
export function driveRatio(crankDiameter: number, blowerPulleyDiameter: number): number {
  const dc = parseOrThrow(positiveSchema("Crank pulley diameter", "m"), crankDiameter, "crankDiameter");
  const db = parseOrThrow(positiveSchema("Blower pulley diameter", "m"), blowerPulleyDiameter, "blowerPulleyDiameter");
  return driveRatioUnchecked(dc, db);
}

/** Overdrive as the trade quotes it, (r − 1) as a fraction (0.5 = 50 % overdrive). */
export function overdrive(ratio: number): number {
  return ratio - 1;
}

/** Blower pulley-shaft speed Nb = N·r·(1 − s) of a validated combination (rev/min). */
export function blowerSpeedUnchecked(c: Combination, rpm: number): number {
  return rpm * driveRatioUnchecked(c.drive.crankPulleyDiameter, c.drive.blowerPulleyDiameter) * (1 - c.drive.beltSlip);
}

/** Blower pulley-shaft speed at an engine speed (rpm in, rev/min out), belt slip included. */
export function blowerSpeed(combination: CombinationInput, rpm: number): number {
  const c = parseOrThrow(combinationSchema, combination);
  return blowerSpeedUnchecked(c, parseOrThrow(rpmSchema, rpm, "rpm"));
}
