// The pulley ladder's limit flags at their bounds (calc/README.md, "Caution codes": belt minimum
// 0.076 m, charge 60 °C, pressure ratio 2.5 by default, each an option): a limit reached is not
// a limit passed. Blower speed Nb = N·r·(1 − belt slip), r = crank/blower pulley (calc/README.md,
// drive; trade fact). The example: 0.16 m crank, 2 % slip, redline 6500 rpm, blower limit 13 000 rpm.
import { describe, expect, it } from "vitest";
import { exampleCombination, pulleySweep, solvePoint, type Combination } from "@/calc";
import { withPulley } from "./support/arbitraries";

const c = exampleCombination();

describe("pulleySweep flags", () => {
  it("gives the blower's speed at the chosen engine speed and at redline", () => {
    const [row] = pulleySweep(c, 5000, [0.08]);
    expect(row.blowerRpm).toBeCloseTo(5000 * 2 * 0.98, 9); // 9 800 rpm
    expect(row.blowerRpmAtRedline).toBeCloseTo(6500 * 2 * 0.98, 9); // 12 740 rpm, under 13 000
    expect(row.overspeed).toBe(false);
    expect(row.problem).toBeNull();
  });

  it("judges overspeed at the chosen speed when it is above redline", () => {
    // 7000 × 2 × 0.98 = 13 720 rpm, over 13 000; at redline the same pulley is within its limit.
    const [row] = pulleySweep(c, 7000, [0.08]);
    expect(row.blowerRpmAtRedline).toBeCloseTo(12_740, 9);
    expect(row.blowerRpm).toBeCloseTo(13_720, 9);
    expect(row.overspeed).toBe(true);
  });

  it("a pulley exactly at the belt minimum is not below it", () => {
    const [at, under] = pulleySweep(c, 5000, [0.076, 0.0759]);
    expect(at.belowBeltMinimum).toBe(false);
    expect(under.belowBeltMinimum).toBe(true);
  });

  it("flags the charge only above its limit", () => {
    const tm = solvePoint(withPulley(c, 0.07), 5000).manifoldTemperature;
    expect(tm).toBeGreaterThan(280);
    expect(tm).toBeLessThan(450); // inside the option's range
    expect(pulleySweep(c, 5000, [0.07], { chargeTemperatureLimit: tm })[0].chargeTemperatureHigh).toBe(false);
    expect(pulleySweep(c, 5000, [0.07], { chargeTemperatureLimit: tm - 0.01 })[0].chargeTemperatureHigh).toBe(true);
  });

  it("flags the injectors only above their duty limit, and never without injectors", () => {
    const duty = solvePoint(withPulley(c, 0.07), 5000).injectorDuty!;
    expect(duty).toBeGreaterThan(0.11); // inside the schema's 0.1–1 for maxDuty
    expect(duty).toBeLessThan(1);
    const withMaxDuty = (maxDuty: number): Combination => ({ ...c, fuel: { ...c.fuel, maxDuty } });
    expect(pulleySweep(withMaxDuty(duty), 5000, [0.07])[0].injectorDutyHigh).toBe(false);
    expect(pulleySweep(withMaxDuty(duty - 0.001), 5000, [0.07])[0].injectorDutyHigh).toBe(true);
    const noInjectors: Combination = { ...c, fuel: { ...c.fuel, injectorCount: null, injectorFlow: null, maxDuty: 0.1 } };
    expect(pulleySweep(noInjectors, 5000, [0.07])[0].injectorDutyHigh).toBe(false);
  });

  it("flags a pressure ratio above the model's limit, or below 1 where the blower restricts the engine", () => {
    const pr = solvePoint(withPulley(c, 0.07), 5000).pressureRatio;
    expect(pr).toBeGreaterThan(1.1);
    expect(pulleySweep(c, 5000, [0.07], { maxModelPressureRatio: pr })[0].pressureRatioOutOfRange).toBe(false);
    expect(pulleySweep(c, 5000, [0.07], { maxModelPressureRatio: pr - 0.01 })[0].pressureRatioOutOfRange).toBe(true);
    // A 0.5 m pulley turns the blower at 0.32 of engine speed: it delivers less than the engine draws.
    const lazy = pulleySweep(c, 5000, [0.5])[0];
    expect(lazy.point!.pressureRatio).toBeLessThan(1);
    expect(lazy.pressureRatioOutOfRange).toBe(true);
  });

  it("names the field of a bad speed or a bad list of diameters", () => {
    const field = (f: () => unknown) => {
      try {
        f();
      } catch (e) {
        return (e as { field?: string }).field;
      }
      return expect.unreachable("expected an input error");
    };
    expect(field(() => pulleySweep(c, -1, [0.08]))).toBe("rpm");
    expect(field(() => pulleySweep(c, 5000, [0.01]))).toMatch(/^blowerPulleyDiameters/);
    expect(field(() => pulleySweep(c, 5000, [0.08], { chargeTemperatureLimit: -5 } as never))).toMatch(/^options/);
  });
});
