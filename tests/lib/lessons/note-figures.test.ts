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

// Hand-made curves for the edges: the blower figure is a speed, shown in rpm in both systems with no
// decimals (calc/units.ts: speed stays rpm), so each expected text below is worked out by hand.
describe("figures on hand-made points", () => {
  const base = curves[0].points[0];
  const pt = (rpm: number, blowerRpm: number, withinRange = true) => ({ ...base, rpm, blowerRpm, withinRange });
  const curveOf = (points: ReturnType<typeof pt>[]) => [{ ...curves[0], points }];
  // Deliberately not on one straight line, so reading the wrong neighbour gives another number.
  const bent = curveOf([pt(1000, 2000), pt(2000, 5000), pt(3000, 6000), pt(4000, 10000)]);

  it("reads the first point exactly at its own speed, and nothing just below it", () => {
    expect(figureText({ figure: "blower", at: 1000, curve: 0 }, bent, "metric")).toEqual({ ok: true, text: "2,000 rpm" });
    expect(figureText({ figure: "blower", at: 999, curve: 0 }, bent, "metric")).toEqual({ ok: false, reason: "no figure at 999 rpm" });
    expect(figureText({ figure: "blower", at: 4001, curve: 0 }, bent, "metric")).toEqual({ ok: false, reason: "no figure at 4,001 rpm" });
    expect(figureText({ figure: "blower", at: 4000, curve: 0 }, bent, "imperial")).toEqual({ ok: true, text: "10,000 rpm" });
  });

  it("interpolates between the point below and the point above", () => {
    // 2000 rpm → 5000, 3000 rpm → 6000: at 2500 rpm half way, 5500 (by hand).
    expect(figureText({ figure: "blower", at: 2500, curve: 0 }, bent, "metric")).toEqual({ ok: true, text: "5,500 rpm" });
    // 3000 → 6000, 4000 → 10000: a quarter of the way, 6000 + 1000 = 7000.
    expect(figureText({ figure: "blower", at: 3250, curve: 0 }, bent, "metric")).toEqual({ ok: true, text: "7,000 rpm" });
  });

  it("a point within range reads at its own speed even when its neighbour is outside the range", () => {
    const edge = curveOf([pt(1000, 2000, false), pt(2000, 5000), pt(3000, 6000)]);
    expect(figureText({ figure: "blower", at: 2000, curve: 0 }, edge, "metric")).toEqual({ ok: true, text: "5,000 rpm" });
    expect(figureText({ figure: "blower", at: 1500, curve: 0 }, edge, "metric")).toEqual({ ok: false, reason: "outside the model's range at 1,500 rpm" });
    expect(figureText({ figure: "blower", at: 1000, curve: 0 }, edge, "metric")).toEqual({ ok: false, reason: "outside the model's range at 1,000 rpm" });
    const top = curveOf([pt(1000, 2000), pt(2000, 5000), pt(3000, 6000, false)]);
    expect(figureText({ figure: "blower", at: 2500, curve: 0 }, top, "metric")).toEqual({ ok: false, reason: "outside the model's range at 2,500 rpm" });
    expect(figureText({ figure: "blower", at: 2000, curve: 0 }, top, "metric")).toEqual({ ok: true, text: "5,000 rpm" });
    expect(fillNoteFigures("{blower@redline}", top, "metric")).toBe("`{blower@redline}: outside the model's range at 3,000 rpm`");
  });

  it("the peak counts only points within the range, and says so when there are none", () => {
    const highOutside = curveOf([pt(1000, 2000), pt(2000, 5000), pt(3000, 9000, false)]);
    expect(figureText({ figure: "blower", at: "peak", curve: 0 }, highOutside, "metric")).toEqual({ ok: true, text: "5,000 rpm" });
    const allOutside = curveOf([pt(1000, 2000, false), pt(2000, 5000, false)]);
    expect(fillNoteFigures("{blower@peak}", allOutside, "metric")).toBe("`{blower@peak}: outside the model's range`");
  });
});
