// @ts-nocheck
// Cautions and solver errors in the person's units: calc says them in SI, the edge re-words them.
import { describe, expect, it } from "vitest";
import { cautions, CalcConvergenceError, combinationSchema, resolveUnits, solvePoint, type Combination } from "@/calc";
import { calcErrorText, cautionText } from "@/lib/units/caution-text";
import { workTruckV6 } from "@/lib/combinations/demo-specs";

const demo: Combination = combinationSchema.parse(workTruckV6);
// A 72 mm pulley (below calc's 76 mm demo belt minimum), a 136 °C charge and a VE curve of 84 % to 190 %.
const small = { ...demo, drive: { ...demo.drive, blowerPulleyDiameter: 0.072 }, engine: { ...demo.engine, veCurve: demo.engine.veCurve.map((p, i) => ({ ...p, ve: i === 0 ? 0.84 : 1.9 })) } };
const hot = [{ rpm: 5000, pressureRatio: 1.6, manifoldTemperature: 409.15, injectorDuty: null }];
const list = cautions(small, hot);
const of = (code: string) => list.find((c) => c.code === code)!;

describe("caution text in the person's units", () => {
  it("calc's own message is in SI (what the edge must not show an imperial person)", () => {
    expect(of("pulley-below-belt-minimum").message).toContain("72 mm");
    expect(of("charge-temperature-high").message).toContain("136 °C");
  });

  it("an imperial person reads inches and °F", () => {
    // source: 0.072 m / 0.0254 m/in = 2.83 in; 0.076 m = 2.99 in (1 in = 0.0254 m exactly, NIST SP 811)
    expect(cautionText(of("pulley-below-belt-minimum"), "imperial")).toContain("The 2.83 in blower pulley is below the 2.99 in");
    // source: 409.15 K = 136 °C = 276.8 °F; 333.15 K = 60 °C = 140 °F (°F = °C × 9/5 + 32, NIST SP 811 B.8)
    const t = cautionText(of("charge-temperature-high"), "imperial");
    expect(t).toContain("277 °F");
    expect(t).toContain("above 140 °F");
    expect(t).not.toMatch(/°C|mm/);
  });

  it("a metric person reads millimetres and °C, and a mixed person their own mix", () => {
    expect(cautionText(of("pulley-below-belt-minimum"), "metric")).toContain("The 72.0 mm blower pulley is below the 76.0 mm");
    const mixed = resolveUnits("imperial", { temperature: "C" });
    expect(cautionText(of("charge-temperature-high"), mixed)).toContain("136 °C");
    expect(cautionText(of("pulley-below-belt-minimum"), mixed)).toContain("2.83 in");
  });

  it("states VE in percent, as the VE boxes take it", () => {
    const t = cautionText(of("ve-implausible"), "imperial");
    expect(t).toContain("from 84 % to 190 %");
    expect(t).toContain("between 50 % and 130 %");
  });

  it("keeps calc's words where there is no quantity to convert", () => {
    const general = list.find((c) => c.code === "general")!;
    expect(cautionText(general, "metric")).toBe(general.message);
  });
});

describe("solver errors in the person's units", () => {
  it("the blower that cannot feed the engine names its pressure in psi or kPa", () => {
    // The starved blower of tests/calc/solve.test.ts: a tiny blower turned slowly on a big engine.
    const slow = { ...demo, engine: { ...demo.engine, displacement: 0.02 }, blower: { ...demo.blower, displacementPerRev: 0.0001 }, drive: { ...demo.drive, crankPulleyDiameter: 0.03, blowerPulleyDiameter: 0.5 } };
    let err: unknown = null;
    try {
      solvePoint(slow, 5000);
      expect.unreachable();
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(CalcConvergenceError);
    expect((err as CalcConvergenceError).message).toMatch(/kPa/);
    expect(calcErrorText(err, "imperial")).toMatch(/cannot feed the engine: manifold pressure would fall below \d+\.\d psi absolute/);
    expect(calcErrorText(err, "imperial")).not.toMatch(/kPa/);
    expect(calcErrorText(err, "metric")).toMatch(/below \d+\.\d kPa absolute/);
  });

  it("passes other errors through", () => {
    expect(calcErrorText(new Error("plain"), "metric")).toBe("plain");
    expect(calcErrorText("odd", "metric")).toBe("The model could not solve this combination.");
  });
});

describe("whole texts, worded once for every page", () => {
  // Figures worked by hand: 0.072 m = 2.83 in, 0.076 m = 2.99 in (1 in = 0.0254 m); 409.15 K =
  // 136 °C = 276.8 °F, 333.15 K = 60 °C = 140 °F (NIST SP 811, B.8); the VE curve rises from 0.84
  // at 1,500 rpm to 1.90 at 2,500 rpm: 1.06 per 1,000 rpm.
  it("the belt caution", () => {
    expect(cautionText(of("pulley-below-belt-minimum"), "imperial")).toBe(
      "The 2.83 in blower pulley is below the 2.99 in the belt should wrap; expect belt slip, heat and wear. Check the belt maker's minimum.",
    );
    expect(cautionText(of("pulley-below-belt-minimum"), "metric")).toBe(
      "The 72.0 mm blower pulley is below the 76.0 mm the belt should wrap; expect belt slip, heat and wear. Check the belt maker's minimum.",
    );
  });

  it("the charge temperature caution", () => {
    const tail = " (a conservative rule of thumb for knock risk). Consider an intercooler, less boost, better fuel or less ignition advance.";
    expect(cautionText(of("charge-temperature-high"), "imperial")).toBe(`Charge temperature reaches 277 °F at 5,000 rpm, above 140 °F${tail}`);
    expect(cautionText(of("charge-temperature-high"), "metric")).toBe(`Charge temperature reaches 136 °C at 5,000 rpm, above 60 °C${tail}`);
  });

  it("the VE caution, the same in either system", () => {
    const text =
      "The VE curve looks implausible (from 84 % to 190 %, steepest change 106 % per 1,000 rpm); wide-open-throttle VE usually lies between 50 % and 130 % and changes smoothly. Check the curve.";
    expect(cautionText(of("ve-implausible"), "imperial")).toBe(text);
    expect(cautionText(of("ve-implausible"), "metric")).toBe(text);
  });

  it("the starved blower's error", () => {
    // Blower speed = 5,000 rpm × 0.03/0.5 × (1 − 0.02 slip) = 294 rpm; the floor is 5 % of the
    // inlet pressure (101,325 − 1,500 Pa): 4,991 Pa = 0.72 psi (1 psi = 6,894.757 Pa) = 5.0 kPa.
    const slow = { ...demo, engine: { ...demo.engine, displacement: 0.02 }, blower: { ...demo.blower, displacementPerRev: 0.0001 }, drive: { ...demo.drive, crankPulleyDiameter: 0.03, blowerPulleyDiameter: 0.5 } };
    let err: unknown = null;
    try {
      solvePoint(slow, 5000);
    } catch (e) {
      err = e;
    }
    const tail = " absolute. Choose a smaller blower pulley or a larger blower.";
    expect(calcErrorText(err, "imperial")).toBe(`At 5,000 rpm the blower (294 rpm) cannot feed the engine: manifold pressure would fall below 0.7 psi${tail}`);
    expect(calcErrorText(err, "metric")).toBe(`At 5,000 rpm the blower (294 rpm) cannot feed the engine: manifold pressure would fall below 5.0 kPa${tail}`);
    expect(calcErrorText(new Error("plain"), "metric", "unused")).toBe("plain");
    expect(calcErrorText(42, "metric", "Given fallback.")).toBe("Given fallback.");
  });
});
