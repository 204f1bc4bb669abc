// @ts-nocheck
// The classroom's "what if" works on the step's snapshot in the browser: a smaller blower pulley
// raises boost at every speed, better breathing (a higher VE scale) lowers it; nothing else moves.
import { describe, expect, it } from "vitest";
import { combinationSchema } from "@/calc";
import { applyWhatIf, deltaSpeeds, pointAt, rpmGrid, stepCurves } from "@/lib/lessons/curves";
import { snapshotItem } from "../support/lesson-items";
import { vintageV8Cam, vintageV8DrawThrough } from "@/lib/combinations/demo-specs";

const item = (label: string, spec: typeof vintageV8DrawThrough) => snapshotItem(label, spec);
const items = [item("Original cam", vintageV8DrawThrough), item("New cam", vintageV8Cam)];

describe("classroom what-if", () => {
  it("a smaller blower pulley for all items raises boost at every engine speed", () => {
    // Trade fact (common practice, no published source; listed in calc/README.md): a smaller blower pulley raises boost at every engine speed.
    const asBuilt = stepCurves(items, { kind: "none" });
    const smaller = stepCurves(items, { kind: "pulley", diameter: vintageV8DrawThrough.drive.blowerPulleyDiameter * 0.9 });
    for (const [i, c] of smaller.entries()) {
      expect(c.error).toBeNull();
      c.points.forEach((p, k) => expect(p.boostGauge).toBeGreaterThan(asBuilt[i].points[k].boostGauge));
    }
  });

  it("scaling VE up lowers boost under the same pulley", () => {
    // Trade fact (common practice, no published source; listed in calc/README.md): a better-breathing engine lowers boost under the same blower and pulley.
    const asBuilt = stepCurves(items, { kind: "none" });
    const breathes = stepCurves(items, { kind: "ve", scale: 1.1 });
    breathes[0].points.forEach((p, k) => expect(p.boostGauge).toBeLessThan(asBuilt[0].points[k].boostGauge));
  });

  it("leaves the stored spec alone and keeps VE inside the model's range", () => {
    const spec = items[0].spec;
    const before = JSON.stringify(spec);
    const scaled = applyWhatIf(spec, { kind: "ve", scale: 100 });
    expect(JSON.stringify(spec)).toBe(before);
    for (const p of scaled.engine.veCurve) expect(p.ve).toBeLessThanOrEqual(2);
    expect(() => combinationSchema.parse(scaled)).not.toThrow();
  });

  it("runs each curve to its own redline and picks table speeds that every item reaches", () => {
    const curves = stepCurves(items, { kind: "none" });
    expect(curves[0].points.at(-1)!.rpm).toBe(vintageV8DrawThrough.engine.redlineRpm);
    expect(curves[1].points.at(-1)!.rpm).toBe(vintageV8Cam.engine.redlineRpm);
    const speeds = deltaSpeeds(curves.map((c) => c.spec));
    expect(speeds.length).toBeGreaterThan(0);
    for (const rpm of speeds) for (const c of curves) expect(pointAt(c.points, rpm)).not.toBeNull();
    expect(rpmGrid(curves.map((c) => c.spec))[0]).toBe(1500);
  });

  it("reports an item the model cannot solve instead of throwing", () => {
    const broken = { ...items[0], spec: { ...items[0].spec, drive: { ...items[0].spec.drive, blowerPulleyDiameter: 0.001 } } };
    const curves = stepCurves([broken, items[1]], { kind: "none" });
    expect(curves[0].error).toMatch(/pulley/i);
    expect(curves[1].error).toBeNull();
  });
});
