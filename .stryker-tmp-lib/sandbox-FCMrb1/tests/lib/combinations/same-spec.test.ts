// @ts-nocheck
// When two saved specs count as the same (so a unit round trip is not an edit), and how the
// schema's issues become one message per form field. The 1e-5 relative tolerance is the
// project's own choice (a round trip through three-figure boxes stays well inside it).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { combinationSchema } from "@/calc";
import { workTruckV6 } from "@/lib/combinations/demo-specs";
import { issuesToErrors, sameSpec } from "@/lib/combinations/form-model";

describe("sameSpec", () => {
  it("numbers: equal within the relative tolerance, both sides of it", () => {
    expect(sameSpec(1000, 1000)).toBe(true);
    expect(sameSpec(1000, 1000.009)).toBe(true); // 9e-6 relative
    expect(sameSpec(1000, 1000.011)).toBe(false); // 1.1e-5 relative
    expect(sameSpec(1000.011, 1000)).toBe(false);
    expect(sameSpec(-1000, -1000.009)).toBe(true);
    expect(sameSpec(-1000, 1000)).toBe(false);
    expect(sameSpec(1, 1.5, 0.5)).toBe(true);
    expect(sameSpec(1, 2.01, 0.5)).toBe(false);
    // Near zero the tolerance is taken of a floor of 1e-12: 0 and 1e-18 are the same, 0 and 1e-15 not.
    expect(sameSpec(0, 0)).toBe(true);
    expect(sameSpec(0, 1e-18)).toBe(true);
    expect(sameSpec(0, 1e-15)).toBe(false);
  });

  it("NaN matches only NaN", () => {
    expect(sameSpec(Number.NaN, Number.NaN)).toBe(true);
    expect(sameSpec(Number.NaN, 1)).toBe(false);
    expect(sameSpec(1, Number.NaN)).toBe(false);
  });

  it("other values compare strictly; null and a left-out key are the same", () => {
    expect(sameSpec("roots", "roots")).toBe(true);
    expect(sameSpec("roots", "twin-screw")).toBe(false);
    expect(sameSpec(null, null)).toBe(true);
    expect(sameSpec(null, 0)).toBe(false);
    expect(sameSpec(1, "1")).toBe(false);
    expect(sameSpec({ a: 1, b: null }, { a: 1 })).toBe(true);
    expect(sameSpec({ a: 1 }, { a: 1, b: undefined })).toBe(true);
    expect(sameSpec({ a: 1 }, { a: 1, b: 0 })).toBe(false);
    expect(sameSpec({ a: 1, b: 0 }, { a: 1 })).toBe(false);
    expect(sameSpec({ a: 1 }, { b: 1 })).toBe(false);
    expect(sameSpec([1, 2], { 0: 1, 1: 2 })).toBe(false);
    expect(sameSpec([1, 2], [1, 2])).toBe(true);
    expect(sameSpec([1, 2], [2, 1])).toBe(false);
    expect(sameSpec([1, 2], [1, 2, 3])).toBe(false);
    expect(sameSpec({ a: { b: [1, { c: 2 }] } }, { a: { b: [1, { c: 2.00001 }] } })).toBe(true);
    expect(sameSpec({ a: { b: [1, { c: 2 }] } }, { a: { b: [1, { c: 2.1 }] } })).toBe(false);
  });

  it("a spec is the same as itself and as any copy scaled inside the tolerance, not outside", () => {
    const demo = combinationSchema.parse(workTruckV6);
    fc.assert(
      fc.property(fc.double({ min: -0.9e-5, max: 0.9e-5, noNaN: true }), fc.double({ min: 2e-5, max: 0.5, noNaN: true }), (inside, outside) => {
        const scaled = (k: number) => ({ ...demo, engine: { ...demo.engine, displacement: demo.engine.displacement * (1 + k) } });
        expect(sameSpec(demo, scaled(inside))).toBe(true);
        expect(sameSpec(demo, scaled(outside))).toBe(false);
      }),
      { numRuns: 100 },
    );
  });
});

describe("issuesToErrors", () => {
  it("keeps the first message per field, with SI limits in the person's units", () => {
    const issues = [
      { code: "too_small", path: ["drive", "blowerPulleyDiameter"], message: "Blower pulley diameter must be between 0.03 and 0.5 m", origin: "number", minimum: 0.03, input: 0.01 },
      { code: "custom", path: ["drive", "blowerPulleyDiameter"], message: "a second message for the same field", input: 0.01 },
      { code: "custom", path: [], message: "Whole form", input: {} },
      { code: "custom", path: ["engine", "veCurve", 2, "ve"], message: "VE must be a number", input: "x" },
    ] as never;
    // source: 0.03 m = 1.181 in, 0.5 m = 19.685 in (1 in = 0.0254 m, NIST SP 811), rounded inward to three figures
    expect(issuesToErrors(issues, "imperial")).toEqual({
      "drive.blowerPulleyDiameter": "Blower pulley diameter must be between 1.19 and 19.6 in",
      "": "Whole form",
      "engine.veCurve.2.ve": "VE must be a number",
    });
    expect(issuesToErrors(issues, "metric")["drive.blowerPulleyDiameter"]).toBe("Blower pulley diameter must be between 30 and 500 mm");
  });
});
