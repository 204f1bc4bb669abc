// The pulley finder where one end of its 30–500 mm range has no balance (calc/README.md, entry
// points): a blower far too large spins into no balance on the smallest pulley, one far too
// small cannot feed the engine on the largest. The finder must still land on a reachable target,
// pass over stocked sizes with no balance, and name an end with none as "no balance".
import { describe, expect, it } from "vitest";
import {
  CalcTargetUnreachableError,
  PULLEY_FINDER_MAX_DIAMETER,
  PULLEY_FINDER_MIN_DIAMETER,
  exampleCombination,
  pulleyForBoost,
  solvePoint,
  trySolvePoint,
  type Combination,
} from "@/calc";
import { withPulley } from "./support/arbitraries";

const c0 = exampleCombination();
const withBlower = (displacementPerRev: number): Combination => ({ ...c0, blower: { ...c0.blower, displacementPerRev } });
/** 10 L/rev on the 4.6 L example engine: no balance on the smallest pulley at 5000 rpm (measured). */
const huge = withBlower(0.01);
/** 0.2 L/rev: too slow to feed the engine on the largest pulley at 15 000 rpm (measured). */
const slow = withBlower(0.0002);
/** 0.1 L/rev: too slow on the largest pulley at 5000 rpm, and under −50 kPa even on the smallest. */
const tiny = withBlower(0.0001);
const kpa = (pa: number) => `${(pa / 1000).toFixed(1)} kPa`;

function unreachable(c: Combination, rpm: number, target: number): CalcTargetUnreachableError {
  try {
    pulleyForBoost(c, rpm, target);
  } catch (e) {
    if (e instanceof CalcTargetUnreachableError) return e;
    throw e;
  }
  return expect.unreachable("expected a CalcTargetUnreachableError");
}

describe("pulleyForBoost with an end of no balance", () => {
  it("the ends are as described: no balance on the smallest pulley of the huge blower, none on the largest of the slow one", () => {
    expect(trySolvePoint(withPulley(huge, PULLEY_FINDER_MIN_DIAMETER), 5000)).toBeNull();
    expect(trySolvePoint(withPulley(huge, PULLEY_FINDER_MAX_DIAMETER), 5000)).not.toBeNull();
    expect(trySolvePoint(withPulley(slow, PULLEY_FINDER_MAX_DIAMETER), 15_000)).toBeNull();
    expect(trySolvePoint(withPulley(slow, PULLEY_FINDER_MIN_DIAMETER), 15_000)).not.toBeNull();
  });

  it("lands on a target between a finite end and one with no balance (fast side)", () => {
    const r = pulleyForBoost(huge, 5000, 100_000);
    expect(Math.abs(r.point.boostGauge - 100_000)).toBeLessThan(1e-6 * c0.ambient.pressure);
    expect(r.point).toEqual(solvePoint(withPulley(huge, r.diameter), 5000));
    expect(r.diameter).toBeGreaterThan(PULLEY_FINDER_MIN_DIAMETER);
    expect(r.diameter).toBeLessThan(PULLEY_FINDER_MAX_DIAMETER);
  });

  it("lands on a target between a finite end and one too slow (slow side)", () => {
    const r = pulleyForBoost(slow, 15_000, -48_000);
    expect(Math.abs(r.point.boostGauge + 48_000)).toBeLessThan(1e-6 * c0.ambient.pressure);
    expect(r.point).toEqual(solvePoint(withPulley(slow, r.diameter), 15_000));
  });

  it("passes over stocked sizes with no balance: none smaller then, and the nearest larger", () => {
    // On the huge blower at 5000 rpm every pulley under about 35 mm has no balance (measured).
    expect(trySolvePoint(withPulley(huge, 0.033), 5000)).toBeNull();
    const r = pulleyForBoost(huge, 5000, 100_000, [0.031, 0.033, 0.45, 0.3]);
    expect(r.diameter).toBeGreaterThan(0.033);
    expect(r.diameter).toBeLessThan(0.3);
    expect(r.below).toBeNull();
    expect(r.above).toEqual({ diameter: 0.3, point: solvePoint(withPulley(huge, 0.3), 5000) });
  });

  it("reads the nearest stocked sizes from a shelf in any order, repeats and all", () => {
    const c = exampleCombination();
    const target = solvePoint(withPulley(c, 0.08), 4500).boostGauge;
    const r = pulleyForBoost(c, 4500, target, [0.09, 0.07, 0.1, 0.06, 0.07]);
    expect(r.below?.diameter).toBe(0.07);
    expect(r.above?.diameter).toBe(0.09);
    // A smaller blower pulley gives more boost (trade fact, calc/README.md "Checks against the world").
    expect(r.below!.point.boostGauge).toBeGreaterThan(target);
    expect(r.above!.point.boostGauge).toBeLessThan(target);
  });

  it("names an end with no balance in the unreachable message, with a null bound", () => {
    const low = unreachable(huge, 5000, -49_000);
    const largest = solvePoint(withPulley(huge, PULLEY_FINDER_MAX_DIAMETER), 5000).boostGauge;
    expect(low.minimum).toBeCloseTo(largest, 3);
    expect(low.maximum).toBeNull();
    expect(low.message).toBe(`A boost of -49.0 kPa cannot be reached at 5000 rpm with blower pulleys from 30 to 500 mm; the reachable range there is ${kpa(largest)} to no balance.`);
    const high = unreachable(tiny, 5000, 0);
    const smallest = solvePoint(withPulley(tiny, PULLEY_FINDER_MIN_DIAMETER), 5000).boostGauge;
    expect(high.minimum).toBeNull();
    expect(high.maximum).toBeCloseTo(smallest, 3);
    expect(high.message).toBe(`A boost of 0.0 kPa cannot be reached at 5000 rpm with blower pulleys from 30 to 500 mm; the reachable range there is no balance to ${kpa(smallest)}.`);
  });

  it("names the field of a bad target, speed or shelf list", () => {
    const field = (f: () => unknown) => {
      try {
        f();
      } catch (e) {
        return (e as { field?: string }).field;
      }
      return expect.unreachable("expected an input error");
    };
    expect(field(() => pulleyForBoost(c0, 5000, 1e9))).toBe("targetBoostGauge");
    expect(field(() => pulleyForBoost(c0, -5, 50_000))).toBe("rpm");
    expect(field(() => pulleyForBoost(c0, 5000, 50_000, [0.001]))).toMatch(/^stockDiameters/);
  });
});
