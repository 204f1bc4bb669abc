// @ts-nocheck
// The model states its own range on every operating point. Bounds are the author's, stated in
// calc/range.ts and calc/README.md; the checks are that each bound trips exactly past it.
import { describe, expect, it } from "vitest";
import {
  BLOWER_OVERSPEED_MARGIN,
  CHARGE_TEMPERATURE_BOUND,
  MODEL_MAX_PRESSURE_RATIO,
  RANGE_REASONS,
  boostCurve,
  exampleCombination,
  exampleTwinScrewCombination,
  pulleySweep,
  rangeReasonsOf,
  solvePoint,
  type Combination,
} from "@/calc";
import { withPulley } from "./support/arbitraries";

describe("withinRange and rangeReasons", () => {
  it("the codes are the four the UI explains", () => {
    expect([...RANGE_REASONS]).toEqual(["pressure-ratio-above-range", "charge-temperature-above-bound", "blower-overspeed-margin", "no-balance"]);
  });

  it("the demo combinations are within range at every speed", () => {
    const rpms = Array.from({ length: 12 }, (_, i) => 1000 + i * 500);
    for (const c of [exampleCombination(), exampleTwinScrewCombination()]) {
      for (const p of boostCurve(c, rpms)) {
        expect(p.withinRange).toBe(true);
        expect(p.rangeReasons).toEqual([]);
      }
    }
  });

  it("each bound trips just past it, and only there", () => {
    expect(rangeReasonsOf(MODEL_MAX_PRESSURE_RATIO, CHARGE_TEMPERATURE_BOUND, 10_000 * (1 + BLOWER_OVERSPEED_MARGIN), 10_000)).toEqual([]);
    expect(rangeReasonsOf(MODEL_MAX_PRESSURE_RATIO + 1e-9, 300, 5000, 10_000)).toEqual(["pressure-ratio-above-range"]);
    expect(rangeReasonsOf(1.5, CHARGE_TEMPERATURE_BOUND + 1e-9, 5000, 10_000)).toEqual(["charge-temperature-above-bound"]);
    expect(rangeReasonsOf(1.5, 300, 11_001, 10_000)).toEqual(["blower-overspeed-margin"]);
  });

  it("a far too small pulley is flagged with its reasons instead of passing as a figure", () => {
    const c = withPulley(exampleCombination(), 0.035);
    const p = solvePoint(c, 6500);
    expect(p.withinRange).toBe(false);
    expect(p.rangeReasons).toContain("pressure-ratio-above-range");
    expect(p.rangeReasons).toContain("blower-overspeed-margin");
    expect(p.rangeReasons.every((r) => (RANGE_REASONS as readonly string[]).includes(r))).toBe(true);
  });

  it("a hot charge past the bound is flagged", () => {
    const c0 = exampleCombination();
    const hot: Combination = { ...withPulley(c0, 0.045), blower: { ...c0.blower, internalEfficiency: 0.5, maxRpm: 40_000 } };
    const p = solvePoint(hot, 5000);
    expect(p.manifoldTemperature).toBeGreaterThan(CHARGE_TEMPERATURE_BOUND);
    expect(p.rangeReasons).toContain("charge-temperature-above-bound");
  });

  it("no balance: solvePoint throws; the ladder's row says no-balance", () => {
    const c = exampleCombination();
    const plain = { ...c, engine: { ...c.engine, chargeTemperatureExponent: 1 } };
    expect(() => solvePoint(withPulley(plain, 0.03), 5000)).toThrow(/balance/);
    const [row] = pulleySweep(plain, 5000, [0.03]);
    expect(row).toMatchObject({ point: null, withinRange: false, rangeReasons: ["no-balance"] });
  });
});
