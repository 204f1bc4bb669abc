// @ts-nocheck
// What the pulley finder tells a person when a target cannot be met, and the reachable range it
// states: the ends of that range are the boosts of the finder's largest and smallest pulleys.
import { describe, expect, it } from "vitest";
import { CalcTargetUnreachableError, PULLEY_FINDER_MAX_DIAMETER, PULLEY_FINDER_MIN_DIAMETER, exampleCombination, pulleyForBoost, trySolvePoint, type Combination } from "@/calc";

function unreachable(c: Combination, rpm: number, target: number): CalcTargetUnreachableError {
  try {
    pulleyForBoost(c, rpm, target);
  } catch (e) {
    if (e instanceof CalcTargetUnreachableError) return e;
    throw e;
  }
  return expect.unreachable("expected a CalcTargetUnreachableError");
}
const kpa = (pa: number) => `${(pa / 1000).toFixed(1)} kPa`;
const withPulley = (c: Combination, d: number): Combination => ({ ...c, drive: { ...c.drive, blowerPulleyDiameter: d } });

describe("pulley finder, target out of reach", () => {
  it("too much boost asked: the message gives the target, the speed, the finder's 30–500 mm and the boosts at both ends", () => {
    const c = exampleCombination();
    const e = unreachable(c, 1000.4, 300_000);
    const smallest = trySolvePoint(withPulley(c, PULLEY_FINDER_MIN_DIAMETER), 1000.4);
    const largest = trySolvePoint(withPulley(c, PULLEY_FINDER_MAX_DIAMETER), 1000.4)!.boostGauge;
    expect(e.field).toBe("targetBoostGauge");
    expect(e.minimum).toBeCloseTo(largest, 3);
    const top = smallest === null ? "no balance" : kpa(smallest.boostGauge);
    expect(e.message).toBe(`A boost of 300.0 kPa cannot be reached at 1000 rpm with blower pulleys from 30 to 500 mm; the reachable range there is ${kpa(largest)} to ${top}.`);
    if (smallest) expect(e.maximum).toBeCloseTo(smallest.boostGauge, 3);
    else expect(e.maximum).toBeNull();
  });

  it("too little boost asked: the same message, the largest pulley's boost being above the target", () => {
    const c = exampleCombination();
    const e = unreachable(c, 1000, -20_000);
    const largest = trySolvePoint(withPulley(c, PULLEY_FINDER_MAX_DIAMETER), 1000)!.boostGauge;
    expect(largest).toBeGreaterThan(-20_000);
    expect(e.message).toMatch(new RegExp(`^A boost of -20\\.0 kPa cannot be reached at 1000 rpm with blower pulleys from 30 to 500 mm; the reachable range there is ${kpa(largest)} to `));
  });

  it("a reachable target lands on it, and stocked sizes either side bracket it", () => {
    const c = exampleCombination();
    const r = pulleyForBoost(c, 4000, 50_000, [0.06, 0.07, 0.08, 0.09, 0.1]);
    expect(r.point.boostGauge).toBeCloseTo(50_000, 0);
    expect(r.below!.diameter).toBeLessThanOrEqual(r.diameter);
    expect(r.above!.diameter).toBeGreaterThanOrEqual(r.diameter);
    expect(r.above!.diameter - r.below!.diameter).toBeCloseTo(0.01, 12);
    expect(r.below!.point.boostGauge).toBeGreaterThan(r.above!.point.boostGauge);
  });
});
