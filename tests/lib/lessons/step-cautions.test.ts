// A step's cautions: most serious first across all its curves (the step's own order kept within a
// severity), and none for a curve the model could not solve.
import { describe, expect, it } from "vitest";
import { combinationSchema, inToM, type Combination } from "@/calc";
import { workTruckV6 } from "@/lib/combinations/demo-specs";
import { stepCurves } from "@/lib/lessons/curves";
import { stepCautions } from "@/lib/lessons/step-cautions";
import { snapshotItem } from "../../support/lesson-items";

const truck: Combination = combinationSchema.parse(workTruckV6);
// calc's severities from most to least serious (calc/cautions.ts, CautionSeverity).
const RANK = { danger: 0, warning: 1, info: 2 } as const;

describe("stepCautions", () => {
  it("puts the dangers of a later curve before the warnings of an earlier one, keeping the step's order within a severity", () => {
    // The truck as built comes first; its 1.6 in copy overspeeds the blower (a danger: by hand,
    // 5200 rpm × 6 in / 1.6 in × 0.98 ≈ 19,100 rpm, over its 14,000 rpm limit) and sits below
    // the 76 mm belt minimum (a warning: 1.6 in = 40.6 mm).
    const curves = stepCurves([snapshotItem("T", truck, { kind: "pulley", diameter: inToM(1.6) })], { kind: "none" });
    expect(curves.map((c) => c.label)).toEqual(["T — as built", "T — blower pulley 1.60 in"]);
    const list = stepCautions(curves);
    const ranks = list.map((c) => RANK[c.caution.severity]);
    expect(ranks).toEqual([...ranks].sort((a, b) => a - b));
    expect(list[0]).toMatchObject({ item: "T — blower pulley 1.60 in", caution: { code: "blower-overspeed", severity: "danger" } });
    expect(list.some((c) => c.item === "T — blower pulley 1.60 in" && c.caution.code === "pulley-below-belt-minimum")).toBe(true);
    const asBuilt = list.filter((c) => c.item === "T — as built");
    expect(asBuilt.length).toBeGreaterThan(0);
    expect(asBuilt.every((c) => c.caution.severity !== "danger")).toBe(true);
    // Within the warnings, the as-built curve's come first, as the step lists it first.
    const warnings = list.filter((c) => c.caution.severity === "warning").map((c) => c.item);
    expect(warnings.slice(0, asBuilt.length)).toEqual(asBuilt.map(() => "T — as built"));
    expect(warnings.slice(asBuilt.length).every((i) => i === "T — blower pulley 1.60 in")).toBe(true);
  });

  it("a curve the model could not solve adds no cautions and does not throw", () => {
    // A 1 mm pulley is outside the schema: the curve carries an error and no points.
    const broken = stepCurves([{ ...snapshotItem("Broken", truck), spec: { ...truck, drive: { ...truck.drive, blowerPulleyDiameter: 0.001 } } }], { kind: "none" });
    expect(broken[0].points).toEqual([]);
    expect(broken[0].error).not.toBeNull();
    expect(stepCautions(broken)).toEqual([]);
    expect(stepCautions([])).toEqual([]);
  });
});
