// @ts-nocheck
// The summary rows and the history diff, read from the one field table.
import { describe, expect, it } from "vitest";
import { combinationSchema, type Combination } from "@/calc";
import { workTruckV6 } from "@/lib/combinations/demo-specs";
import { SPEC_FIELDS, type SpecField } from "@/lib/combinations/field-table";
import { showValue, specChanges, specRows } from "@/lib/combinations/spec-fields";

const demo: Combination = combinationSchema.parse(workTruckV6);

describe("spec rows and changes", () => {
  it("shows every table field once, in the user's units", () => {
    const rows = specRows(demo, "imperial");
    expect(rows.map((r) => r.path)).toEqual(SPEC_FIELDS.map((f) => f.path));
    const byPath = Object.fromEntries(rows.map((r) => [r.path, r.value]));
    // source: the demo seed defines a 3.4 in blower pulley and 4.3 L; 1 in = 25.4 mm (NIST SP 811)
    expect(byPath["drive.blowerPulleyDiameter"]).toBe("3.40 in");
    expect(specRows(demo, "metric").find((r) => r.path === "drive.blowerPulleyDiameter")?.value).toBe("86.36 mm");
    expect(byPath["drive.beltSlip"]).toBe("2.0 %");
    expect(byPath["intercooler.effectiveness"]).toBe("no intercooler");
  });

  it("lists only the fields that changed, with the table's label", () => {
    const after = combinationSchema.parse({ ...workTruckV6, drive: { ...workTruckV6.drive, blowerPulleyDiameter: 0.0762 } });
    // source: 0.0762 m = 3.00 in exactly (1 in = 25.4 mm, NIST SP 811)
    expect(specChanges(demo, after, "imperial")).toEqual([{ path: "drive.blowerPulleyDiameter", label: "Blower pulley diameter", before: "3.40 in", after: "3.00 in" }]);
    expect(specChanges(demo, demo, "metric")).toEqual([]);
  });
});

describe("one value as text, per kind of field", () => {
  const field = (quantity: SpecField["quantity"], extra: Partial<SpecField> = {}): SpecField => ({ path: "x", label: "X", quantity, ...extra });

  it("an absent value says the field's own words, else a dash", () => {
    expect(showValue(field("plain", { absent: "model default (0)" }), undefined, "metric")).toBe("model default (0)");
    expect(showValue(field("plain", { absent: "model default (0)" }), null, "metric")).toBe("model default (0)");
    expect(showValue(field("plain"), undefined, "imperial")).toBe("—");
    // Zero is a value, not an absence.
    expect(showValue(field("plain", { absent: "none" }), 0, "imperial")).toBe("0");
  });

  it("words, counts, percents and plain numbers, grouped and rounded as en-US writes them", () => {
    expect(showValue(field("text"), "twin-screw", "metric")).toBe("twin-screw");
    expect(showValue(field("count"), 12, "metric")).toBe("12");
    expect(showValue(field("count"), 1234.4, "metric")).toBe("1,234");
    expect(showValue(field("count"), "eight", "metric")).toBe("eight");
    expect(showValue(field("percent"), 0.8255, "imperial")).toBe("82.6 %");
    expect(showValue(field("percent"), "high", "imperial")).toBe("high");
    expect(showValue(field("plain", { digits: 2 }), 1.5, "imperial")).toBe("1.50");
    expect(showValue(field("plain"), 11.7, "imperial")).toBe("12");
    expect(showValue(field("plain"), "n/a", "imperial")).toBe("n/a");
  });

  it("the VE curve as rpm: percent pairs; anything else as it is", () => {
    const curve = [
      { rpm: 1500, ve: 0.804 },
      { rpm: 6000, ve: 0.856 },
    ];
    expect(showValue(field("ve-curve"), curve, "metric")).toBe("1,500 rpm: 80 %, 6,000 rpm: 86 %");
    expect(showValue(field("ve-curve"), "flat", "metric")).toBe("flat");
  });

  it("a quantity in the person's units with the field's digits", () => {
    // source: 1 psi = 6,894.757 Pa (NIST SP 811, B.8): 13,789.5 Pa = 2.00 psi = 13.79 kPa
    expect(showValue(field("pressure", { digits: 2 }), 13_789.5, "imperial")).toBe("2.00 psi");
    expect(showValue(field("pressure", { digits: 2 }), 13_789.5, "metric")).toBe("13.79 kPa");
    expect(showValue(field("pressure"), 13_789.5, "metric")).toBe("14 kPa");
    expect(showValue(field("pressure"), "unknown", "metric")).toBe("unknown");
  });

  it("a change of an optional field from absent to given is listed with the absent words", () => {
    const withBack = combinationSchema.parse({ ...workTruckV6, engine: { ...workTruckV6.engine, exhaustBackPressure: 13_789.5 } });
    expect(specChanges(demo, withBack, "imperial")).toEqual([
      { path: "engine.exhaustBackPressure", label: "Exhaust back pressure (gauge)", before: "model default (0)", after: "2.00 psi" },
    ]);
    expect(specChanges(withBack, demo, "imperial")[0]).toMatchObject({ before: "2.00 psi", after: "model default (0)" });
  });
});
