// The summary rows and the history diff, read from the one field table.
import { describe, expect, it } from "vitest";
import { combinationSchema, type Combination } from "@/calc";
import { workTruckV6 } from "@/lib/combinations/demo-specs";
import { SPEC_FIELDS } from "@/lib/combinations/field-table";
import { specChanges, specRows } from "@/lib/combinations/spec-fields";

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
