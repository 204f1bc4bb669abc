// The combination field table against calc's schema: every field people edit is in it once, and
// it names nothing calc does not have, so a new calc field cannot be left out of the editor,
// the summary or the history diff (the optional refinements included: saving from the planner
// must never drop them).
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { combinationSchema, REFINEMENT_DEFAULTS } from "@/calc";
import { editorLabelOf, fieldAt, FORM_ONLY_FIELDS, SPEC_FIELDS, valueAt } from "@/lib/combinations/field-table";
import { FIELD_KINDS } from "@/lib/combinations/form-model";

/** Dotted paths of a zod schema's leaves; an array (the VE curve) counts as one leaf. */
function leaves(schema: z.ZodType, prefix = ""): string[] {
  const def = (schema as unknown as { def: { type: string; innerType?: z.ZodType; in?: z.ZodType; shape?: Record<string, z.ZodType> } }).def;
  if (def.innerType) return leaves(def.innerType, prefix); // optional, nullable, default
  if (def.type === "pipe" && def.in) return leaves(def.in, prefix);
  if (def.type === "object" && def.shape) {
    return Object.entries(def.shape).flatMap(([k, v]) => leaves(v, prefix ? `${prefix}.${k}` : k));
  }
  return [prefix];
}

describe("the combination field table", () => {
  const schemaLeaves = leaves(combinationSchema);

  it("walks calc's schema to its leaves (so the checks below see every field)", () => {
    // source: calc/schema.ts defines these; a walk that stopped at the parts would find six.
    expect(schemaLeaves).toContain("engine.veCurve");
    expect(schemaLeaves).toContain("intercooler.coolantTemperature");
    expect(schemaLeaves).toContain("ambient.inletRestriction.ratedFlow");
    expect(schemaLeaves.length).toBeGreaterThan(25);
  });

  it("has every edited leaf of calc's schema exactly once", () => {
    const tablePaths = SPEC_FIELDS.map((f) => f.path);
    for (const leaf of schemaLeaves) {
      expect(tablePaths.filter((p) => p === leaf), leaf).toHaveLength(1);
    }
  });

  it("names only fields calc has", () => {
    for (const f of SPEC_FIELDS) expect(schemaLeaves, f.path).toContain(f.path);
  });

  it("marks as advanced exactly the model's optional refinements, each saying what an empty box means", () => {
    // source: calc/README.md, "Refinements" (each mechanism's parameter) and REFINEMENT_DEFAULTS
    const advanced = SPEC_FIELDS.filter((f) => f.advanced).map((f) => f.path);
    expect(advanced.sort()).toEqual(
      [
        "ambient.inletRestriction.ratedFlow",
        "ambient.inletRestriction.ratingDepression",
        "engine.chargeTemperatureExponent",
        "engine.compressionRatio",
        "engine.exhaustBackPressure",
        "fuel.evaporatedInBlower",
        "fuel.evaporatedInPort",
      ].sort(),
    );
    for (const f of SPEC_FIELDS.filter((x) => x.advanced)) expect(f.absent, f.path).toBeTruthy();
    expect(SPEC_FIELDS.find((f) => f.path === "engine.chargeTemperatureExponent")?.absent).toContain(String(REFINEMENT_DEFAULTS.chargeTemperatureExponent));
  });

  it("keeps editor-only fields out of the stored spec", () => {
    for (const f of FORM_ONLY_FIELDS) expect(schemaLeaves).not.toContain(f.path);
  });

  it("gives the form a kind for every numeric field and the editor a label for every field", () => {
    for (const f of [...SPEC_FIELDS, ...FORM_ONLY_FIELDS]) {
      expect(editorLabelOf(f.path).length, f.path).toBeGreaterThan(0);
      if (f.quantity !== "text" && f.quantity !== "ve-curve") expect(FIELD_KINDS[f.path], f.path).toBeDefined();
    }
    expect(() => editorLabelOf("engine.nosuch")).toThrow(/engine\.nosuch/);
  });

  it("labels each field once, so the history diff never shows two rows alike", () => {
    const labels = SPEC_FIELDS.map((f) => f.label);
    expect(new Set(labels).size).toBe(labels.length);
  });
});

describe("paths into the table and into a spec", () => {
  it("a VE row of any index finds the row's field, two-digit rows too", () => {
    expect(fieldAt("engine.veCurve.0.rpm")).toBe(fieldAt("engine.veCurve.#.rpm"));
    expect(fieldAt("engine.veCurve.12.ve")).toBe(fieldAt("engine.veCurve.#.ve"));
    expect(fieldAt("engine.veCurve.12.ve")).toBeDefined();
    expect(fieldAt("engine.veCurve..ve")).toBeUndefined();
    expect(editorLabelOf("engine.veCurve.10.rpm")).toBe(editorLabelOf("engine.veCurve.1.rpm"));
    expect(() => editorLabelOf("engine.nothing")).toThrow("No field engine.nothing in the combination field table");
  });

  it("a value at a path stops at the first part that is not an object", () => {
    expect(valueAt({ a: { b: 2 } }, "a.b")).toBe(2);
    expect(valueAt({ a: null }, "a.b")).toBeUndefined();
    expect(valueAt({ a: 5 }, "a.b")).toBeUndefined();
    expect(valueAt({ a: "text" }, "a.length")).toBeUndefined();
    expect(valueAt(undefined, "a")).toBeUndefined();
    expect(valueAt({ a: [10, 20] }, "a.1")).toBe(20);
  });
});
