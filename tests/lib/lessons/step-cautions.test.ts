<<<<<<< HEAD
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
=======
// A classroom step's cautions: every curve's own, most serious first across all curves (danger,
// then warning, then info; in the curves' order within each), and none for a curve that has no
// points. Which caution each set-up raises follows calc's caution rules (calc/README.md,
// "Caution codes") and the figures named beside each set-up.
import { describe, expect, it } from "vitest";
import { combinationSchema, inToM, trySolveCurve, type Combination } from "@/calc";
import { workTruckV6 } from "@/lib/combinations/demo-specs";
import type { ItemCurve } from "@/lib/lessons/curves";
import { stepCautions } from "@/lib/lessons/step-cautions";
import { rpmGrid, withPulley } from "@/lib/planner/compute";

const truck: Combination = combinationSchema.parse(workTruckV6);
const curve = (label: string, spec: Combination, solved = true): ItemCurve => ({ label, item: 0, base: null, spec, points: solved ? trySolveCurve(spec, rpmGrid(spec)) : [], error: null });

// As built (3.4 in): the charge passes 60 °C near redline (350 K measured), a warning.
const asBuilt = curve("As built", truck);
// 1.6 in: blower 19 110 rpm at redline over its 14 000 and injectors past 85 % (dangers); under
// the 76 mm belt minimum, hot charge and a pressure ratio past 2.5 (warnings).
const tiny = curve("Tiny pulley", withPulley(truck, inToM(1.6)));
// 12 in: the blower turns slower than the engine draws at low speed, pressure ratio under 1 (info).
const lazy = curve("Lazy blower", withPulley(truck, inToM(12)));

const listed = (curves: ItemCurve[]) => stepCautions(curves).map((c) => [c.item, c.caution.code, c.caution.severity]);

describe("stepCautions", () => {
  it("lists dangers, then warnings, then notes across all curves, each group in the curves' order", () => {
    expect(listed([lazy, asBuilt, tiny])).toEqual([
      ["Tiny pulley", "blower-overspeed", "danger"],
      ["Tiny pulley", "injector-duty-high", "danger"],
      ["As built", "charge-temperature-high", "warning"],
      ["Tiny pulley", "pulley-below-belt-minimum", "warning"],
      ["Tiny pulley", "charge-temperature-high", "warning"],
      ["Tiny pulley", "pressure-ratio-out-of-range", "warning"],
      ["Lazy blower", "pressure-ratio-out-of-range", "info"],
    ]);
  });

  it("keeps the caution itself, message and figures, beside its item", () => {
    const [first] = stepCautions([asBuilt]);
    expect(first.item).toBe("As built");
    expect(first.caution.code).toBe("charge-temperature-high");
    expect(first.caution.values.limit).toBe(333.15); // 60 °C, calc's default limit
    expect(first.caution.message).toMatch(/^Charge temperature reaches /);
  });

  it("says nothing for a curve without points, though its spec alone would raise cautions", () => {
    // Unsolved, the 1.6 in spec would still be over speed and under the belt minimum by its sizes.
    expect(listed([curve("Not solved", withPulley(truck, inToM(1.6)), false)])).toEqual([]);
    expect(listed([curve("Not solved", withPulley(truck, inToM(1.6)), false), asBuilt])).toEqual([["As built", "charge-temperature-high", "warning"]]);
>>>>>>> mut-b
    expect(stepCautions([])).toEqual([]);
  });
});
