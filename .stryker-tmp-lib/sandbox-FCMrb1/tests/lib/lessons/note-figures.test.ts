// @ts-nocheck
// Live figures in a lesson note: the token parser, the figures (the chart's own points, straight
// lines between them, the viewer's units) and the markers for anything that is not a figure.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { combinationSchema, inToM, type Combination } from "@/calc";
import { workTruckV6 } from "@/lib/combinations/demo-specs";
import { stepCurves } from "@/lib/lessons/curves";
import { fillNoteFigures, figureText, parseNoteToken } from "@/lib/lessons/note-figures";
import { quantityText } from "@/lib/units/format";
import { snapshotItem } from "../../support/lesson-items";

const truck: Combination = combinationSchema.parse(workTruckV6);
const item = snapshotItem;
const curves = stepCurves([item("Truck", truck, { kind: "pulley", diameter: inToM(3.0) }), item("Other", truck)], { kind: "none" });
const at = (i: number, rpm: number) => curves[i].points.find((p) => p.rpm === rpm)!;

describe("parseNoteToken", () => {
  it("reads figure, speed or peak/redline, and an optional curve number", () => {
    expect(parseNoteToken("boost@4500")).toEqual({ figure: "boost", at: 4500, curve: 0 });
    expect(parseNoteToken(" Power @ peak ")).toEqual({ figure: "power", at: "peak", curve: 0 });
    expect(parseNoteToken("torque@redline#2")).toEqual({ figure: "torque", at: "redline", curve: 1 });
    for (const bad of ["lap@4500", "boost", "boost@", "boost@fast", "boost@45", "boost@4500#0", "boost@4500#x", ""]) expect(parseNoteToken(bad), bad).toBeNull();
  });
});

describe("fillNoteFigures", () => {
  it("replaces a token by the chart's figure in the viewer's units", () => {
    expect(fillNoteFigures("Boost is {boost@4500}.", curves, "imperial")).toBe(`Boost is ${quantityText("pressure", at(0, 4500).boostGauge, "imperial")}.`);
    expect(fillNoteFigures("{boost@4500#2}", curves, "metric")).toBe(quantityText("pressure", at(1, 4500).boostGauge, "metric"));
    const peak = Math.max(...curves[1].points.filter((p) => p.withinRange).map((p) => p.netPower));
    expect(fillNoteFigures("{power@peak#2}", curves, "imperial")).toBe(quantityText("power", peak, "imperial"));
    expect(fillNoteFigures("{blower@redline}", curves, "imperial")).toBe(quantityText("speed", curves[0].points.at(-1)!.blowerRpm, "imperial"));
  });

  it("between two chart points reads the straight line the chart draws", () => {
    const [lo, hi] = [at(0, 4500), at(0, 4750)];
    const mid = (lo.boostGauge + hi.boostGauge) / 2;
    expect(fillNoteFigures("{boost@4625}", curves, "imperial")).toBe(quantityText("pressure", mid, "imperial"));
  });

  it("marks unknown tokens and figures there are none of, without throwing", () => {
    expect(fillNoteFigures("{lap@4500}", curves, "imperial")).toBe("`{lap@4500}: unknown figure`");
    expect(fillNoteFigures("{boost@900}", curves, "imperial")).toBe("`{boost@900}: no figure at 900 rpm`");
    expect(fillNoteFigures("{boost@4500#4}", curves, "imperial")).toBe("`{boost@4500#4}: this step has no item 4`");
    expect(fillNoteFigures("no tokens here", curves, "imperial")).toBe("no tokens here");
    const failed = stepCurves([{ ...item("Broken", truck), spec: { ...truck, drive: { ...truck.drive, blowerPulleyDiameter: 0.001 } } }, item("Other", truck)], { kind: "none" });
    expect(figureText({ figure: "boost", at: 3000, curve: 0 }, failed, "imperial")).toEqual({ ok: false, reason: "the model has no answer for this item" });
  });

  it("never throws and leaves no brace token behind, whatever the note says", () => {
    fc.assert(
      fc.property(fc.array(fc.oneof(fc.string({ maxLength: 12 }), fc.constantFrom("{boost@4500}", "{power@peak}", "{x}", "{torque@99999#3}", "{", "}")), { maxLength: 8 }), (parts) => {
        const out = fillNoteFigures(parts.join(" "), curves, "metric");
        expect(out).not.toMatch(/(^|[^`])\{boost@4500\}/);
      }),
    );
  });
});
