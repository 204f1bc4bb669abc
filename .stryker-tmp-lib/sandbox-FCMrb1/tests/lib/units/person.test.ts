// @ts-nocheck
// The person's units as stored (preset + departures), in links and at the API boundary.
// Unit ids and presets are the project's own table (calc/units.ts); no outside value is checked here.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { UNIT_PRESETS, unitOfKind, unitChoices, QUANTITY_KINDS, type Units } from "@/calc";
import { CHOOSABLE_KINDS, KIND_NAMES, personUnits, toPreferences, unitPreferencesSchema, unitsName, unitsParamSchema } from "@/lib/units/person";

describe("a person's units", () => {
  it("a preset with no departures stays the preset's name; a departure gives a record", () => {
    expect(personUnits({ unitSystem: "imperial", unitChoices: null })).toBe("imperial");
    expect(personUnits({ unitSystem: "metric", unitChoices: {} })).toBe("metric");
    const mixed = personUnits({ unitSystem: "imperial", unitChoices: { displacement: "L" } });
    expect(typeof mixed).toBe("object");
    expect(unitOfKind("displacement", mixed).id).toBe("L");
    expect(unitOfKind("pressure", mixed).id).toBe(UNIT_PRESETS.imperial.pressure);
    // A departure equal to the preset's own unit is no departure.
    expect(personUnits({ unitSystem: "metric", unitChoices: { displacement: UNIT_PRESETS.metric.displacement } })).toBe("metric");
  });

  it("names a preset by its name and a mix as the person's own", () => {
    expect(unitsName("imperial")).toBe("imperial");
    expect(unitsName("metric")).toBe("metric");
    expect(unitsName({ ...UNIT_PRESETS.imperial, displacement: "L" })).toBe("your own units");
  });

  it("stores only the kinds that differ from the preset, and reads back the same units (property)", () => {
    const unitsArb = fc.record(Object.fromEntries(QUANTITY_KINDS.map((k) => [k, fc.constantFrom(...unitChoices(k).map((u) => u.id))]))) as fc.Arbitrary<Units>;
    fc.assert(
      fc.property(unitsArb, fc.constantFrom("imperial" as const, "metric" as const), (units, preset) => {
        const stored = toPreferences(units, preset);
        expect(stored.unitSystem).toBe(preset);
        for (const [k, id] of Object.entries(stored.unitChoices)) expect(id).not.toBe(UNIT_PRESETS[preset][k as keyof Units]);
        const back = personUnits(stored);
        for (const k of QUANTITY_KINDS) expect(unitOfKind(k, back).id).toBe(units[k]);
      }),
      { numRuns: 200 },
    );
    expect(toPreferences("metric")).toEqual({ unitSystem: "metric", unitChoices: {} });
    expect(toPreferences({ ...UNIT_PRESETS.metric, pressure: "psi" })).toEqual({ unitSystem: "metric", unitChoices: { pressure: "psi" } });
  });

  it("offers every kind with a choice, each with a name", () => {
    expect(CHOOSABLE_KINDS).toEqual(QUANTITY_KINDS.filter((k) => unitChoices(k).length > 1));
    expect(CHOOSABLE_KINDS).toEqual(expect.arrayContaining(["displacement", "pressure", "temperature", "length-small", "power", "torque", "airflow"]));
    for (const k of QUANTITY_KINDS) expect(KIND_NAMES[k].length).toBeGreaterThan(3);
  });

  it("accepts a preset and known unit ids per kind; names the field it refuses", () => {
    expect(unitPreferencesSchema.parse({ unitSystem: "imperial", units: { displacement: "L" } })).toEqual({ unitSystem: "imperial", units: { displacement: "L" } });
    expect(unitPreferencesSchema.parse({ unitSystem: "metric" })).toEqual({ unitSystem: "metric" });
    const badPreset = unitPreferencesSchema.safeParse({ unitSystem: "nautical" });
    expect(badPreset.success || badPreset.error.issues[0]).toMatchObject({ path: ["unitSystem"], message: "unitSystem must be imperial or metric" });
    const badUnit = unitPreferencesSchema.safeParse({ unitSystem: "metric", units: { pressure: "furlong" } });
    expect(badUnit.success || badUnit.error.issues[0]).toMatchObject({ path: ["units", "pressure"] });
    expect(badUnit.success || badUnit.error.issues[0].message).toMatch(/^pressure must be one of .*psi/);
    const extra = unitPreferencesSchema.safeParse({ unitSystem: "metric", units: { colour: "red" } });
    expect(extra.success).toBe(false);
  });

  it("reads a units link parameter, and refuses anything else with one message", () => {
    expect(unitsParamSchema.parse("imperial")).toBe("imperial");
    const mixed = unitsParamSchema.parse("metric~pressure.psi");
    expect(unitOfKind("pressure", mixed).id).toBe("psi");
    expect(unitOfKind("temperature", mixed).id).toBe(UNIT_PRESETS.metric.temperature);
    for (const bad of ["", "cubits", "metric~", "metric~Pressure.psi", "x".repeat(401), 7]) {
      const r = unitsParamSchema.safeParse(bad);
      expect(r.success || r.error.issues[0].message).toBe("Units must be imperial or metric.");
    }
  });
});
