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
    expect(stepCautions([])).toEqual([]);
  });
});
