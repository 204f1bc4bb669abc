// @ts-nocheck
// explainChange splits a change of manifold pressure exactly into its drivers. The check is
// the algebra of the balance (calc/README.md, steps 7–8): the shares add up to ln(Pm_b/Pm_a).
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { exampleCombination, explainChange, solvePoint } from "@/calc";
import { combinationArb, rpmArb, withPulley } from "./support/arbitraries";

describe("explainChange", () => {
  it("the drivers' shares add up to ln(Pm_b/Pm_a) for any two points of one engine", () => {
    fc.assert(
      fc.property(combinationArb, rpmArb, rpmArb, fc.double({ min: 0.85, max: 1.15, noNaN: true }), (c, n1, n2, k) => {
        const d = c.drive.blowerPulleyDiameter * k;
        fc.pre(d >= 0.03 && d <= 0.5);
        const a = solvePoint(c, n1);
        const b = solvePoint(withPulley(c, d), n2);
        const e = explainChange(a, b);
        const sum = e.drivers.reduce((s, x) => s + x.manifoldPressureShare, 0);
        expect(Math.abs(sum - Math.log(b.manifoldPressure / a.manifoldPressure))).toBeLessThan(1e-12);
        // Same engine and inlet: nothing is left for "other".
        expect(Math.abs(e.drivers.find((x) => x.driver === "other")!.manifoldPressureShare)).toBeLessThan(1e-9);
      }),
      { numRuns: 150 },
    );
  });

  it("a smaller pulley: blower speed leads, slip and a hotter charge are the smaller, named parts; power follows the air", () => {
    const c = exampleCombination();
    const a = solvePoint(c, 5000);
    const b = solvePoint(withPulley(c, c.drive.blowerPulleyDiameter * 0.9), 5000);
    const e = explainChange(a, b);
    expect(e.drivers[0].driver).toBe("blower-speed");
    expect(e.drivers[0].change).toBeCloseTo(1 / 0.9 - 1, 12);
    const slip = e.drivers.find((x) => x.driver === "blower-slip")!;
    const heat = e.drivers.find((x) => x.driver === "charge-temperature")!;
    expect(slip.change).toBeLessThan(0); // more pressure, more leakage
    expect(slip.manifoldPressureShare).toBeLessThan(0);
    expect(heat.change).toBeGreaterThan(0); // hotter charge
    expect(heat.manifoldPressureShare).toBeGreaterThan(0);
    expect(e.boostChange).toBeGreaterThan(0);
    expect(e.netPowerChange).toBeCloseTo(e.grossPowerChange - e.drivePowerChange, 6);
    expect(e.airMassFlowRatio).toBeGreaterThan(1);
  });
});
