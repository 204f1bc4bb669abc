// @ts-nocheck
// The crafted case of the caution tests: no caution raised until a test moves one figure.
import { exampleCombination, type Combination } from "@/calc";
import type { CautionPoint } from "@/calc/cautions";

/** Drive ratio exactly 2, no slip, redline 6500: the blower turns 13 000 rev/min at redline. */
export function cautionBase(): Combination {
  const c = exampleCombination();
  return {
    ...c,
    engine: { ...c.engine, redlineRpm: 6500, veCurve: [{ rpm: 2000, ve: 0.8 }, { rpm: 6000, ve: 0.9 }] },
    blower: { ...c.blower, maxRpm: 13_000 },
    drive: { crankPulleyDiameter: 0.16, blowerPulleyDiameter: 0.08, beltSlip: 0 },
    fuel: { ...c.fuel, maxDuty: 0.85 },
  };
}

/** A point inside every limit, with the figures given replaced. */
export const cautionPoint = (over: Partial<CautionPoint> = {}): CautionPoint => ({ rpm: 4000, pressureRatio: 1.5, manifoldTemperature: 320, injectorDuty: 0.5, ...over });
