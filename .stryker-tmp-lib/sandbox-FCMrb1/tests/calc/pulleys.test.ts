// @ts-nocheck
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  CalcTargetUnreachableError,
  exampleCombination,
  pulleyForBoost,
  pulleySweep,
  solvePoint,
  type Combination,
} from "@/calc";
import { combinationArb, relDiff, rpmArb, withPulley } from "./support/arbitraries";

describe("pulleyForBoost", () => {
  describe("inverts solvePoint", () => {
    it("finds the pulley that produced a boost, to 1e-8 relative", () => {
      fc.assert(
        fc.property(combinationArb, rpmArb, (c, rpm) => {
          const boost = solvePoint(c, rpm).boostGauge;
          fc.pre(boost > -50_000 && boost < 400_000);
          const found = pulleyForBoost(c, rpm, boost);
          expect(relDiff(found.diameter, c.drive.blowerPulleyDiameter)).toBeLessThan(1e-8);
          expect(Math.abs(found.point.boostGauge - boost)).toBeLessThan(1e-6 * c.ambient.pressure);
          expect(found.below).toBeNull();
          expect(found.above).toBeNull();
        }),
        { numRuns: 150 },
      );
    });
  });

  describe("stocked sizes", () => {
    it("brackets the exact diameter with the nearest stocked sizes and their boost", () => {
      const c = exampleCombination();
      const shelf = [0.06, 0.065, 0.07, 0.075, 0.08, 0.085, 0.09, 0.1];
      fc.assert(
        fc.property(fc.double({ min: 0.062, max: 0.098, noNaN: true }), (d) => {
          const target = solvePoint(withPulley(c, d), 4500).boostGauge;
          const r = pulleyForBoost(c, 4500, target, shelf);
          expect(r.below).not.toBeNull();
          expect(r.above).not.toBeNull();
          const below = r.below!;
          const above = r.above!;
          expect(below.diameter).toBeLessThanOrEqual(r.diameter);
          expect(above.diameter).toBeGreaterThanOrEqual(r.diameter);
          expect(shelf.some((s) => s > below.diameter && s < above.diameter && s !== r.diameter)).toBe(false);
          // A smaller pulley spins the blower faster: at least the target boost; a larger one at most.
          expect(below.point.boostGauge).toBeGreaterThanOrEqual(target - 1e-6);
          expect(above.point.boostGauge).toBeLessThanOrEqual(target + 1e-6);
        }),
        { numRuns: 60 },
      );
    });

    it("gives null on a side with no stocked size", () => {
      const c = exampleCombination();
      const target = solvePoint(withPulley(c, 0.08), 4500).boostGauge;
      const r = pulleyForBoost(c, 4500, target, [0.09, 0.1]);
      expect(r.below).toBeNull();
      expect(r.above?.diameter).toBe(0.09);
    });
  });

  describe("unreachable targets", () => {
    it("throws a typed error naming the target when even the largest pulley gives more boost", () => {
      const c = exampleCombination();
      const big: Combination = {
        ...c,
        blower: { ...c.blower, displacementPerRev: 0.005 },
        drive: { ...c.drive, crankPulleyDiameter: 0.5 },
      };
      let caught: unknown;
      try {
        pulleyForBoost(big, 4000, 0);
      } catch (e) {
        caught = e;
      }
      expect(caught).toBeInstanceOf(CalcTargetUnreachableError);
      const e = caught as CalcTargetUnreachableError;
      expect(e.field).toBe("targetBoostGauge");
      expect(e.minimum).not.toBeNull();
      expect(e.minimum!).toBeGreaterThan(0);
    });
  });
});

describe("pulleySweep", () => {
  const c = exampleCombination();
  const ladder = Array.from({ length: 30 }, (_, i) => 0.05 + i * 0.003);

  it("gives one row per size, boost falling as the pulley grows", () => {
    const rows = pulleySweep(c, 5000, ladder);
    expect(rows.map((r) => r.diameter)).toEqual(ladder);
    const boosts = rows.map((r) => r.point?.boostGauge ?? Number.NaN);
    for (let i = 1; i < boosts.length; i++) expect(boosts[i]).toBeLessThan(boosts[i - 1]);
    for (const r of rows) {
      expect(relDiff(r.driveRatio, c.drive.crankPulleyDiameter / r.diameter)).toBeLessThan(1e-12);
      expect(r.overdrive).toBeCloseTo(r.driveRatio - 1, 12);
    }
  });

  it("flags overspeed at redline and pulleys below the belt minimum", () => {
    const rows = pulleySweep(c, 5000, [0.05, 0.1]);
    // Blower speed at redline = 6500 × 0.16/0.05 × 0.98 ≈ 20 400 rpm, over the 13 000 rpm demo limit.
    expect(rows[0].overspeed).toBe(true);
    expect(rows[0].belowBeltMinimum).toBe(true);
    expect(rows[1].overspeed).toBe(false);
    expect(rows[1].belowBeltMinimum).toBe(false);
    expect(pulleySweep(c, 5000, [0.06], { beltMinimumDiameter: 0.05 })[0].belowBeltMinimum).toBe(false);
  });

  it("reports a size with no balance as a problem instead of throwing", () => {
    // With the plain density (n = 1) a far too fast blower finds no balance (calc/README.md).
    const plain = { ...c, engine: { ...c.engine, chargeTemperatureExponent: 1 } };
    const rows = pulleySweep(plain, 5000, [0.03, 0.08]);
    expect(rows[0].point).toBeNull();
    expect(rows[0].problem).toMatch(/balance/);
    expect(rows[0].withinRange).toBe(false);
    expect(rows[0].rangeReasons).toEqual(["no-balance"]);
    expect(rows[1].point).not.toBeNull();
    expect(rows[1].withinRange).toBe(true);
    expect(rows[1].rangeReasons).toEqual([]);
  });
});
