// @ts-nocheck
// Every threshold of calc/cautions.ts on both sides: exactly at the limit raises nothing, just
// past it raises the caution. The limits themselves are the project's (DEMO belt minimum,
// 60 °C charge rule of thumb — common practice, no published source — the model's PR range and
// the author-chosen VE plausibility bounds); these tests check only where each one trips.
import { describe, expect, it } from "vitest";
import { cautions, MODEL_MAX_PRESSURE_RATIO, type Combination } from "@/calc";
import type { CautionPoint } from "@/calc/cautions";
import { cautionBase, cautionPoint } from "./support/caution-case";

const base = cautionBase;
const point = cautionPoint;
const codes = (c: Combination, points: CautionPoint[] = [point()], options = {}) => cautions(c, points, options).map((x) => `${x.code}/${x.severity}`);

describe("caution thresholds, both sides", () => {
  it("a combination at none of the limits raises only the general notice", () => {
    expect(codes(base())).toEqual(["general/info"]);
  });

  it("blower overspeed: at exactly the limit no caution, one rev/min over it a danger", () => {
    // 6500 × 0.16/0.08 × (1 − 0) = 13 000 rev/min, worked by hand
    expect(codes(base())).not.toContain("blower-overspeed/danger");
    const c = base();
    const over = { ...c, blower: { ...c.blower, maxRpm: 12_999 } };
    const found = cautions(over, [point()]).find((x) => x.code === "blower-overspeed");
    expect(found?.severity).toBe("danger");
    expect(found?.values).toEqual({ engineRpm: 6500, blowerRpm: 13_000, maxRpm: 12_999 });
    expect(found?.message).toContain("13,000 rpm");
  });

  it("blower overspeed counts the highest engine speed of the points when it is past redline", () => {
    const found = cautions(base(), [point({ rpm: 3000 }), point({ rpm: 6600 }), point({ rpm: 5000 })]).find((x) => x.code === "blower-overspeed");
    expect(found?.values.engineRpm).toBe(6600);
    expect(found?.values.blowerRpm).toBe(13_200);
    expect(codes(base(), [point({ rpm: 6500 })])).not.toContain("blower-overspeed/danger");
  });

  it("belt minimum: a 76 mm pulley passes, 75.9 mm is flagged; an override moves the line", () => {
    const at = (d: number): Combination => {
      const c = base();
      return { ...c, drive: { ...c.drive, blowerPulleyDiameter: d }, blower: { ...c.blower, maxRpm: 40_000 } };
    };
    expect(codes(at(0.076))).not.toContain("pulley-below-belt-minimum/warning");
    expect(codes(at(0.0759))).toContain("pulley-below-belt-minimum/warning");
    expect(codes(at(0.07), [point()], { beltMinimumDiameter: 0.07 })).not.toContain("pulley-below-belt-minimum/warning");
    expect(codes(at(0.0699), [point()], { beltMinimumDiameter: 0.07 })).toContain("pulley-below-belt-minimum/warning");
  });

  it("charge temperature: 333.15 K (60 °C) passes, 333.16 K is flagged at the hottest point", () => {
    expect(codes(base(), [point({ manifoldTemperature: 333.15 })])).not.toContain("charge-temperature-high/warning");
    const pts = [point({ rpm: 3000, manifoldTemperature: 330 }), point({ rpm: 4000, manifoldTemperature: 333.16 }), point({ rpm: 5000, manifoldTemperature: 331 })];
    const found = cautions(base(), pts).find((x) => x.code === "charge-temperature-high");
    expect(found?.severity).toBe("warning");
    expect(found?.values).toEqual({ manifoldTemperature: 333.16, limit: 333.15, rpm: 4000 });
    expect(codes(base(), [point({ manifoldTemperature: 340 })], { chargeTemperatureLimit: 340 })).not.toContain("charge-temperature-high/warning");
  });

  it("injector duty: exactly the limit passes, just over is a danger at the highest-duty point; no injectors, no caution", () => {
    expect(codes(base(), [point({ injectorDuty: 0.85 })])).not.toContain("injector-duty-high/danger");
    const pts = [point({ rpm: 3000, injectorDuty: 0.6 }), point({ rpm: 4000, injectorDuty: 0.8501 }), point({ rpm: 5000, injectorDuty: null }), point({ rpm: 6000, injectorDuty: 0.7 })];
    const found = cautions(base(), pts).find((x) => x.code === "injector-duty-high");
    expect(found?.severity).toBe("danger");
    expect(found?.values).toEqual({ injectorDuty: 0.8501, limit: 0.85, rpm: 4000 });
    expect(codes(base(), [point({ injectorDuty: null }), point({ rpm: 5000, injectorDuty: null })])).not.toContain("injector-duty-high/danger");
  });

  it("pressure ratio above the model's range: exactly 2.5 passes, 2.501 warns at the highest point", () => {
    expect(MODEL_MAX_PRESSURE_RATIO).toBe(2.5);
    expect(codes(base(), [point({ pressureRatio: 2.5 })])).not.toContain("pressure-ratio-out-of-range/warning");
    const pts = [point({ rpm: 3000, pressureRatio: 2.4 }), point({ rpm: 4000, pressureRatio: 2.501 }), point({ rpm: 5000, pressureRatio: 2.45 })];
    const found = cautions(base(), pts).find((x) => x.code === "pressure-ratio-out-of-range" && x.severity === "warning");
    expect(found?.values).toEqual({ pressureRatio: 2.501, limit: 2.5, rpm: 4000 });
    expect(codes(base(), [point({ pressureRatio: 2.6 })], { maxModelPressureRatio: 2.6 })).not.toContain("pressure-ratio-out-of-range/warning");
  });

  it("pressure ratio below 1: exactly 1 passes, 0.999 is an info note at the lowest point", () => {
    expect(codes(base(), [point({ pressureRatio: 1 })])).not.toContain("pressure-ratio-out-of-range/info");
    const pts = [point({ rpm: 3000, pressureRatio: 1.2 }), point({ rpm: 4000, pressureRatio: 0.999 }), point({ rpm: 5000, pressureRatio: 1.1 })];
    const found = cautions(base(), pts).find((x) => x.code === "pressure-ratio-out-of-range" && x.severity === "info");
    expect(found?.values).toEqual({ pressureRatio: 0.999, limit: 1, rpm: 4000 });
  });

  describe("VE plausibility (author-chosen bounds 0.5–1.3 and 0.2 per 1000 rev/min)", () => {
    const withCurve = (veCurve: { rpm: number; ve: number }[]): Combination => ({ ...base(), engine: { ...base().engine, veCurve } });
    const flagged = (veCurve: { rpm: number; ve: number }[]) => codes(withCurve(veCurve)).includes("ve-implausible/warning");
    it("lowest VE: 0.5 passes, 0.499 is flagged", () => {
      expect(flagged([{ rpm: 2000, ve: 0.5 }, { rpm: 4000, ve: 0.6 }])).toBe(false);
      expect(flagged([{ rpm: 2000, ve: 0.499 }, { rpm: 4000, ve: 0.6 }])).toBe(true);
    });
    it("highest VE: 1.3 passes, 1.301 is flagged", () => {
      expect(flagged([{ rpm: 2000, ve: 1.2 }, { rpm: 4000, ve: 1.3 }])).toBe(false);
      expect(flagged([{ rpm: 2000, ve: 1.2 }, { rpm: 4000, ve: 1.301 }])).toBe(true);
    });
    it("steepest change: 0.2 per 1000 rev/min passes, 0.201 is flagged, wherever on the curve", () => {
      expect(flagged([{ rpm: 2000, ve: 0.6 }, { rpm: 4000, ve: 1.0 }])).toBe(false); // (1.0 − 0.6)/2 is exactly 0.2 in binary floating point
      expect(flagged([{ rpm: 2000, ve: 0.7 }, { rpm: 3000, ve: 0.75 }, { rpm: 4000, ve: 0.951 }, { rpm: 5000, ve: 0.96 }])).toBe(true);
      const found = cautions(withCurve([{ rpm: 2000, ve: 0.9 }, { rpm: 3000, ve: 0.85 }, { rpm: 4000, ve: 0.649 }]), [point()]).find((x) => x.code === "ve-implausible");
      expect(found?.values.minVe).toBe(0.649);
      expect(found?.values.maxVe).toBe(0.9);
      expect(found?.values.maxSlopePer1000Rpm).toBeCloseTo(0.201, 12);
    });
  });

  it("orders dangers before warnings before info, the general notice last", () => {
    const c = base();
    const bad: Combination = { ...c, blower: { ...c.blower, maxRpm: 10_000 } };
    const list = codes(bad, [point({ pressureRatio: 0.9, manifoldTemperature: 340, injectorDuty: 0.95 })]);
    expect(list).toEqual(["blower-overspeed/danger", "injector-duty-high/danger", "charge-temperature-high/warning", "pressure-ratio-out-of-range/info", "general/info"]);
  });
});
