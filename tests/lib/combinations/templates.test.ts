// Starting points for a new combination: the templates, their copies, and the main figures typed
// in the person's units laid over them (1 in = 0.0254 m and 1 in³ = 16.387064 cm³ exactly,
// NIST SP 811, Appendix B.8).
import { describe, expect, it } from "vitest";
import { combinationSchema } from "@/calc";
import { BLANK_START, TEMPLATES, TEMPLATE_KEYS, startingSpec, templateSpec } from "@/lib/combinations/templates";
import { VE_SHAPES, shapeAt } from "@/lib/planner/ve-shapes";
import { fieldError } from "../../support/field-error";

const all = { displacement: "350", cylinders: "8", redlineRpm: "6000", blowerDisplacement: "144", crankPulley: "7", blowerPulley: "3.5", blowerKind: "roots" };


describe("templates", () => {
  it("each key gives a fresh copy of its template's spec, valid for the model", () => {
    expect(TEMPLATE_KEYS).toEqual(TEMPLATES.map((t) => t.key));
    for (const t of TEMPLATES) {
      const copy = templateSpec(t.key);
      expect(copy).toEqual(t.spec);
      expect(copy).not.toBe(t.spec);
      expect(combinationSchema.safeParse(copy).success, t.key).toBe(true);
    }
    (templateSpec("v6-roots").engine as { cylinders: number }).cylinders = 99;
    expect(templateSpec("v6-roots").engine.cylinders).not.toBe(99);
    expect(() => templateSpec("v12" as never)).toThrow("unknown template v12");
  });

  it("a template with typed figures keeps the rest of the template; figures go to SI", () => {
    const s = startingSpec("big-v8-twin-screw", { blowerPulley: "3.5", redlineRpm: "" }, "imperial");
    const t = templateSpec("big-v8-twin-screw");
    expect(s.drive.blowerPulleyDiameter).toBeCloseTo(3.5 * 0.0254, 12);
    expect(s.engine.redlineRpm).toBe(t.engine.redlineRpm);
    expect(s.engine.veCurve).toEqual(t.engine.veCurve);
  });

  it("a blank start takes every main figure and lays the first VE shape over the person's redline", () => {
    const s = startingSpec(BLANK_START, all, "imperial");
    expect(s.engine.displacement).toBeCloseTo(350 * 16.387064e-6, 12);
    expect(s.blower.displacementPerRev).toBeCloseTo(144 * 16.387064e-6, 12);
    expect(s.drive.crankPulleyDiameter).toBeCloseTo(0.1778, 12);
    expect([s.engine.cylinders, s.engine.redlineRpm, s.blower.kind]).toEqual([8, 6000, "roots"]);
    // Six speeds from a quarter of redline to redline, each VE read off the shape (to 0.1 %).
    expect(s.engine.veCurve.map((p) => p.rpm)).toEqual([1500, 2400, 3300, 4200, 5100, 6000]);
    for (const p of s.engine.veCurve) expect(p.ve).toBeCloseTo(Math.round(shapeAt(VE_SHAPES[0], p.rpm / 6000) * 1000) / 1000, 9);
    expect(combinationSchema.safeParse(s).success).toBe(true);
  });

  it("a blank start names the first missing figure; a word where a number belongs is named too", () => {
    const e = fieldError(() => startingSpec(BLANK_START, { ...all, cylinders: " " }, "metric"));
    expect([e.field, e.message]).toEqual(["cylinders", "Cylinders: give a figure for a blank start."]);
    expect(fieldError(() => startingSpec(BLANK_START, { ...all, blowerKind: "" }, "metric")).message).toBe("Blower kind: choose one for a blank start.");
    expect(fieldError(() => startingSpec("v6-roots", { redlineRpm: "fast" }, "metric")).message).toBe("Redline must be a number.");
    expect(fieldError(() => startingSpec("v6-roots", { blowerKind: "centrifugal" }, "metric")).field).toBe("blowerKind");
    expect(startingSpec("v6-roots", { blowerKind: "twin-screw" }, "metric").blower.kind).toBe("twin-screw");
    // Spaces around a kind are trimmed; a kind left out keeps the template's; a bad one is named.
    expect(startingSpec("v6-roots", { blowerKind: " twin-screw " }, "metric").blower.kind).toBe("twin-screw");
    expect(startingSpec("v6-roots", {}, "metric").blower.kind).toBe(templateSpec("v6-roots").blower.kind);
    const bad = fieldError(() => startingSpec("v6-roots", { blowerKind: "centrifugal" }, "metric"));
    expect([bad.field, bad.message]).toEqual(["blowerKind", "Blower kind must be Roots or twin-screw."]);
    expect(fieldError(() => startingSpec(BLANK_START, { ...all, blowerKind: "" }, "metric")).field).toBe("blowerKind");
  });
});
