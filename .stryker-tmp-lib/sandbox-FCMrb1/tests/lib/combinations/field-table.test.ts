// @ts-nocheck
// The combination field table against calc's schema: every field people edit is in it once, and
// it names nothing calc does not have, so a new calc field cannot be left out of the editor,
// the summary or the history diff (the optional refinements included: saving from the planner
// must never drop them).
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { combinationSchema, REFINEMENT_DEFAULTS } from "@/calc";
import { editorLabelOf, FORM_ONLY_FIELDS, SPEC_FIELDS } from "@/lib/combinations/field-table";
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
