// A step's stored what-if per item: the pure change of the spec (applyWhatIf), the curves shown
// beside each other (as built, then changed), their labels, the editor's unit conversion, and the
// cautions by item without repeats.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { INTERCOOLER_DEMO_DEFAULTS, combinationSchema, inToM, type Combination } from "@/calc";
import { bigInchIntercooled, workTruckV6 } from "@/lib/combinations/demo-specs";
import { changeText, variantLabel } from "@/lib/lessons/change-text";
import { applyWhatIf, stepCurves, type WhatIf } from "@/lib/lessons/curves";
import { itemChangeSchema, VE_SCALE_MAX, VE_SCALE_MIN, type ItemChange } from "@/lib/lessons/rules";
import { stepCautions } from "@/lib/lessons/step-cautions";
import { changeDraft, changeInput } from "@/lib/lessons/step-draft";
import { snapshotItem } from "../../support/lesson-items";

const truck: Combination = combinationSchema.parse(workTruckV6);
const bigInch: Combination = combinationSchema.parse(bigInchIntercooled);
const item = snapshotItem;

const changeArb: fc.Arbitrary<ItemChange> = fc.oneof(
  fc.double({ min: VE_SCALE_MIN, max: VE_SCALE_MAX, noNaN: true }).map((scale) => ({ kind: "ve" as const, scale })),
  fc.double({ min: inToM(2.4), max: inToM(5), noNaN: true }).map((diameter) => ({ kind: "pulley" as const, diameter })),
  fc.double({ min: 0.3, max: 0.95, noNaN: true }).map((effectiveness) => ({ kind: "intercooler" as const, effectiveness })),
  fc.double({ min: -500, max: 6000, noNaN: true }).map((altitude) => ({ kind: "altitude" as const, altitude })),
);

describe("applyWhatIf with a step's change", () => {
  it("changes only its own part of the spec, leaves the stored spec alone and stays a valid combination", () => {
    fc.assert(
      fc.property(changeArb, fc.constantFrom(truck, bigInch), (change, spec) => {
        const before = JSON.stringify(spec);
        const out = applyWhatIf(spec, change);
        expect(JSON.stringify(spec)).toBe(before);
        expect(() => combinationSchema.parse(out)).not.toThrow();
        const touched = { ve: "engine", pulley: "drive", intercooler: "intercooler", altitude: "ambient" }[change.kind];
        for (const part of ["engine", "blower", "drive", "ambient", "intercooler", "fuel"] as const) {
          if (part !== touched) expect(out[part]).toEqual(spec[part]);
        }
      }),
    );
  });

  it("is the identity with no change, and the same change twice is the change once (except VE, which scales)", () => {
    fc.assert(
      fc.property(changeArb.filter((c) => c.kind !== "ve"), (change) => {
        expect(applyWhatIf(truck, { kind: "none" })).toBe(truck);
        expect(applyWhatIf(applyWhatIf(truck, change), change)).toEqual(applyWhatIf(truck, change));
      }),
    );
  });

  it("sets what each change names", () => {
    expect(applyWhatIf(truck, { kind: "pulley", diameter: inToM(2.8) }).drive.blowerPulleyDiameter).toBeCloseTo(inToM(2.8), 12);
    const ve = applyWhatIf(truck, { kind: "ve", scale: 1.08 });
    ve.engine.veCurve.forEach((p, i) => expect(p.ve).toBeCloseTo(truck.engine.veCurve[i].ve * 1.08, 12));
    // Added to an engine without one: calc's default pressure drop and coolant (calc/defaults.ts).
    expect(applyWhatIf(truck, { kind: "intercooler", effectiveness: 0.6 }).intercooler).toEqual({ ...INTERCOOLER_DEMO_DEFAULTS, effectiveness: 0.6 });
    // On one that has one: its own pressure drop and coolant stay.
    expect(applyWhatIf(bigInch, { kind: "intercooler", effectiveness: 0.8 }).intercooler).toEqual({ ...bigInch.intercooler, effectiveness: 0.8 });
    // source: U.S. Standard Atmosphere 1976, 1,500 m: 84,560 Pa (from memory); the temperature stays as built.
    const high = applyWhatIf(truck, { kind: "altitude", altitude: 1500 });
    expect(high.ambient.pressure).toBeCloseTo(84_560, -2);
    expect(high.ambient.temperature).toBe(truck.ambient.temperature);
  });
});

describe("a step's curves with a what-if", () => {
  const items = [item("Truck", truck, { kind: "pulley", diameter: inToM(2.8) }), item("Big-inch", bigInch)];

  it("shows a changed item as built and changed, side by side, labelled in the viewer's units", () => {
    const curves = stepCurves(items, { kind: "none" }, "imperial");
    expect(curves.map((c) => c.label)).toEqual(["Truck — as built", "Truck — blower pulley 2.80 in", "Big-inch"]);
    expect(curves.map((c) => c.base)).toEqual([null, 0, null]);
    expect(curves.map((c) => c.item)).toEqual([0, 0, 1]);
    expect(stepCurves(items, { kind: "none" }, "metric")[1].label).toBe("Truck — blower pulley 71.1 mm");
    // Trade fact (common practice, no published source; calc/README.md): a smaller blower pulley raises boost at every speed.
    curves[1].points.forEach((p, k) => expect(p.boostGauge).toBeGreaterThan(curves[0].points[k].boostGauge));
  });

  it("an intercooler added lowers the charge temperature; altitude lowers the manifold's absolute pressure", () => {
    // Trade facts (common practice, no published source): an intercooler cools the charge; a positive-displacement blower multiplies the thinner air at altitude.
    const [asBuilt, cooled] = stepCurves([item("Truck", truck, { kind: "intercooler", effectiveness: 0.7 }), item("B", bigInch)], { kind: "none" });
    cooled.points.forEach((p, k) => expect(p.manifoldTemperature).toBeLessThan(asBuilt.points[k].manifoldTemperature));
    const [sea, high] = stepCurves([item("Truck", truck, { kind: "altitude", altitude: 1500 }), item("B", bigInch)], { kind: "none" });
    high.points.forEach((p, k) => expect(p.manifoldPressure).toBeLessThan(sea.points[k].manifoldPressure));
  });

  it("applies the live what-if on top of both the as-built and the changed curve", () => {
    const live: WhatIf = { kind: "ve", scale: 1.1 };
    const curves = stepCurves(items, live);
    expect(curves[0].spec.engine.veCurve[0].ve).toBeCloseTo(truck.engine.veCurve[0].ve * 1.1, 12);
    expect(curves[1].spec.drive.blowerPulleyDiameter).toBeCloseTo(inToM(2.8), 12);
    expect(curves[1].spec.engine.veCurve[0].ve).toBeCloseTo(truck.engine.veCurve[0].ve * 1.1, 12);
  });

  it("words each change", () => {
    expect(changeText({ kind: "ve", scale: 1.08 }, "imperial")).toBe("VE +8 %");
    expect(changeText({ kind: "ve", scale: 0.95 }, "metric")).toBe("VE −5 %");
    expect(changeText({ kind: "intercooler", effectiveness: 0.7 }, "imperial")).toBe("intercooler added (70 %)");
    expect(changeText({ kind: "altitude", altitude: 1524 }, "imperial")).toBe("at 5,000 ft");
    expect(variantLabel("Truck", null, "imperial")).toBe("Truck — as built");
  });
});

describe("the editor's what-if fields", () => {
  it("turn typed values in the author's units into the stored change and back", () => {
    expect(changeInput({ kind: "pulley", value: "2.8" }, "imperial")).toEqual({ kind: "pulley", diameter: inToM(2.8) });
    expect(changeInput({ kind: "ve", value: "−5" }, "imperial")).toEqual({ kind: "ve", scale: 0.95 });
    expect(changeInput({ kind: "intercooler", value: "" }, "metric")).toEqual({ kind: "intercooler", effectiveness: undefined });
    expect(itemChangeSchema.parse(changeInput({ kind: "intercooler", value: "" }, "metric"))).toEqual({ kind: "intercooler", effectiveness: INTERCOOLER_DEMO_DEFAULTS.effectiveness });
    expect(changeInput({ kind: "none", value: "" }, "metric")).toBeNull();
    fc.assert(
      fc.property(changeArb, fc.constantFrom("imperial" as const, "metric" as const), (change, system) => {
        const back = itemChangeSchema.parse(changeInput(changeDraft(change, system), system));
        expect(back.kind).toBe(change.kind);
      }),
    );
  });

  it("refuse a bad or empty value, naming the field", () => {
    const r = itemChangeSchema.safeParse(changeInput({ kind: "pulley", value: "abc" }, "imperial"));
    expect(r.success).toBe(false);
    expect(r.error?.issues[0].path).toEqual(["diameter"]);
    expect(r.error?.issues[0].message).toMatch(/Blower pulley diameter/);
    expect(itemChangeSchema.safeParse({ kind: "ve", scale: 1.5 }).error?.issues[0].message).toMatch(/VE scale must be between 0.8 and 1.2/);
    expect(itemChangeSchema.safeParse({ kind: "altitude", altitude: 9000 }).error?.issues[0].message).toMatch(/Altitude must be between/);
    expect(itemChangeSchema.safeParse({ kind: "nitrous" }).success).toBe(false);
  });
});

describe("cautions of a step", () => {
  it("are labelled by their curve and not repeated; the general notice is left out (the panel shows it once)", () => {
    // A 1.6 in pulley on the truck overspeeds the blower and leaves the model's range (compare tests/lib/planner/range-figures.test.ts).
    const tiny = item("Truck", truck, { kind: "pulley", diameter: inToM(1.6) });
    const curves = stepCurves([tiny, item("Truck again", truck, { kind: "pulley", diameter: inToM(1.6) })], { kind: "none" });
    const list = stepCautions(curves);
    expect(list.length).toBeGreaterThan(0);
    expect(list.some((c) => c.item === "Truck — blower pulley 1.60 in")).toBe(true);
    expect(list.every((c) => c.caution.code !== "general")).toBe(true);
    const keys = list.map((c) => `${c.caution.code}|${c.item}`);
    expect(new Set(keys).size).toBe(keys.length);
    // The same curve listed twice still gives each caution once.
    expect(stepCautions([...curves, curves[1]]).length).toBe(list.length);
  });
});

describe("a VE change's sign", () => {
  it("plus, minus (U+2212) or ± for no change after rounding to whole percent", () => {
    expect(changeText({ kind: "ve", scale: 1.004 }, "metric")).toBe("VE ±0 %");
    expect(changeText({ kind: "ve", scale: 0.996 }, "metric")).toBe("VE ±0 %");
    expect(changeText({ kind: "ve", scale: 1 }, "imperial")).toBe("VE ±0 %");
    expect(changeText({ kind: "ve", scale: 1.006 }, "metric")).toBe("VE +1 %");
    expect(changeText({ kind: "ve", scale: 0.99 }, "metric")).toBe("VE −1 %");
    expect(changeText({ kind: "ve", scale: 1.2 }, "metric")).toBe("VE +20 %");
  });
});
