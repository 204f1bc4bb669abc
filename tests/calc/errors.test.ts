// calc's typed errors as the forms and the API read them (calc/README.md, "Errors"): each names
// its field, "" when no single field is to blame, and an input error with no issues still says
// something rather than an empty message.
import { describe, expect, it } from "vitest";
import { CalcConvergenceError, CalcError, CalcInputError, CalcTargetUnreachableError } from "@/calc";

describe("calc errors", () => {
  it("blame no field unless told", () => {
    const plain = new CalcError("Something went wrong");
    expect([plain.name, plain.message, plain.field]).toEqual(["CalcError", "Something went wrong", ""]);
    const stuck = new CalcConvergenceError("No balance", "no-balance", 4000);
    expect([stuck.name, stuck.field, stuck.reason, stuck.rpm, stuck.values]).toEqual(["CalcConvergenceError", "", "no-balance", 4000, {}]);
  });

  it("an input error takes the first issue's field and message, or a plain one with none", () => {
    const two = new CalcInputError([
      { field: "drive.blowerPulleyDiameter", message: "Blower pulley diameter must be between 0.03 and 0.5 m" },
      { field: "rpm", message: "Engine speed must be between 500 and 20000 rpm" },
    ]);
    expect([two.name, two.field, two.message, two.issues.length]).toEqual(["CalcInputError", "drive.blowerPulleyDiameter", "Blower pulley diameter must be between 0.03 and 0.5 m", 2]);
    const none = new CalcInputError([]);
    expect([none.field, none.message, none.issues]).toEqual(["", "Invalid input", []]);
    expect(none).toBeInstanceOf(CalcError);
  });

  it("an unreachable target keeps its field and both bounds, either of which may be open", () => {
    const e = new CalcTargetUnreachableError("Too much boost", "targetBoostGauge", null, 95_000);
    expect([e.name, e.field, e.minimum, e.maximum]).toEqual(["CalcTargetUnreachableError", "targetBoostGauge", null, 95_000]);
  });
});
