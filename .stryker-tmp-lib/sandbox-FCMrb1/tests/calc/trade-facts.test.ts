// @ts-nocheck
// Facts of the trade (common practice, no published source), checked against the model.
import { describe, expect, it } from "vitest";
import { boostCurve, driveRatio, exampleCombination, exampleTwinScrewCombination, solvePoint, type Combination } from "@/calc";
import { withPulley, withVeScaled } from "./support/arbitraries";

const flatVe = (c: Combination): Combination => ({ ...c, engine: { ...c.engine, veCurve: [{ rpm: 3000, ve: 0.85 }] } });
const rpms = Array.from({ length: 56 }, (_, i) => 1000 + i * 100);

describe("facts of the trade (common practice, no published source)", () => {
  it("drive ratio is crank pulley over blower pulley diameter", () => {
    expect(driveRatio(0.2, 0.1)).toBe(2);
    expect(driveRatio(0.15, 0.1)).toBeCloseTo(1.5, 12);
  });

  it("a low-slip twin-screw over a flat VE curve gives a nearly flat boost curve; a high-slip Roots's climbs", () => {
    const r0 = flatVe(exampleCombination());
    const roots: Combination = { ...r0, blower: { ...r0.blower, volumetricEfficiencyRef: 0.7 } };
    const t0 = flatVe(exampleTwinScrewCombination());
    const screw: Combination = { ...t0, blower: { ...t0.blower, volumetricEfficiencyRef: 0.95 } };
    const speeds = [2500, 3000, 3500, 4000, 4500, 5000, 5500, 6000];
    const screwBoost = boostCurve(screw, speeds).map((p) => p.boostGauge);
    const rootsBoost = boostCurve(roots, speeds).map((p) => p.boostGauge);
    // "Nearly flat" and "climbs" are trade facts (common practice, no published source); the
    // numbers that make them testable are the author's choice, not from any source:
    // "Nearly flat": spread within a fifth (20 %) of the highest boost (author-chosen bound).
    expect((Math.max(...screwBoost) - Math.min(...screwBoost)) / Math.max(...screwBoost)).toBeLessThan(0.2);
    // "Climbs": rises at every step and ends at least half again (×1.5) above where it started
    // (author-chosen bound).
    for (let i = 1; i < rootsBoost.length; i++) expect(rootsBoost[i]).toBeGreaterThan(rootsBoost[i - 1]);
    expect(rootsBoost.at(-1)! / rootsBoost[0]).toBeGreaterThan(1.5);
  });

  it("a blower pulley change scales absolute manifold pressure by about the change in drive ratio (within 15 %)", () => {
    const c = exampleCombination();
    const d1 = c.drive.blowerPulleyDiameter;
    const d2 = d1 * 0.9;
    for (const rpm of [2000, 3000, 4000, 5000, 6000]) {
      const a = solvePoint(c, rpm);
      const b = solvePoint(withPulley(c, d2), rpm);
      const scale = b.manifoldPressure / a.manifoldPressure / (d1 / d2);
      // The ratio rule is the trade's rule of thumb (common practice, no published source); the
      // ±15 % band around it is the author's choice, wide enough for slip and heating.
      expect(scale).toBeGreaterThan(0.85);
      expect(scale).toBeLessThan(1.15);
    }
  });

  it("raising VE lowers boost and lowers drive power at the same pulley", () => {
    for (const c of [exampleCombination(), exampleTwinScrewCombination()]) {
      const better = withVeScaled(c, 1.1);
      for (const rpm of [2000, 3500, 5000, 6500]) {
        const a = solvePoint(c, rpm);
        const b = solvePoint(better, rpm);
        expect(b.boostGauge).toBeLessThan(a.boostGauge);
        expect(b.drivePower).toBeLessThan(a.drivePower);
      }
    }
  });

  it("a better-breathing engine (more displacement) makes less boost under the same blower and pulley", () => {
    const c = exampleCombination();
    const bigger: Combination = { ...c, engine: { ...c.engine, displacement: c.engine.displacement * 1.15 } };
    for (const rpm of [2000, 4000, 6000]) expect(solvePoint(bigger, rpm).boostGauge).toBeLessThan(solvePoint(c, rpm).boostGauge);
  });

  it("a smaller blower pulley raises boost at every engine speed", () => {
    for (const c of [exampleCombination(), exampleTwinScrewCombination()]) {
      const base = boostCurve(c, rpms);
      const smaller = boostCurve(withPulley(c, c.drive.blowerPulleyDiameter * 0.95), rpms);
      smaller.forEach((p, i) => expect(p.boostGauge).toBeGreaterThan(base[i].boostGauge));
    }
  });
});
