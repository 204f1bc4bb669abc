// @ts-nocheck
import { describe, expect, it } from "vitest";
import {
  SAFETY_NOTICE,
  boostCurve,
  cautions,
  exampleTwinScrewCombination,
  type CautionCode,
  type Combination,
  type OperatingPoint,
} from "@/calc";

const rpms = Array.from({ length: 12 }, (_, i) => 1000 + i * 500);

/** A combination that should raise nothing but the general notice: twin-screw, intercooled, mild drive. */
function benign(): Combination {
  const c = exampleTwinScrewCombination();
  return { ...c, drive: { ...c.drive, blowerPulleyDiameter: 0.08 } };
}

function codesOf(c: Combination, points: readonly OperatingPoint[] = boostCurve(c, rpms)): CautionCode[] {
  return cautions(c, points).map((x) => x.code);
}

describe("cautions", () => {
  describe("benign combination", () => {
    it("raises only the general safety notice, last", () => {
      expect(codesOf(benign())).toEqual(["general"]);
    });
    it("the general notice carries the safety text of design.md", () => {
      const general = cautions(benign(), []).at(-1)!;
      expect(general.code).toBe("general");
      expect(general.severity).toBe("info");
      expect(general.message).toBe(SAFETY_NOTICE.join(" "));
      const text = SAFETY_NOTICE.join(" ").toLowerCase();
      for (const phrase of ["estimate", "dyno", "wideband", "knock", "speed limit", "belt", "fuel", "ignition timing", "laws", "professionals"]) {
        expect(text).toContain(phrase);
      }
    });
  });

  describe("each code in a crafted case", () => {
    it("blower-overspeed: blower over its limit at redline", () => {
      const c = benign();
      const fast: Combination = { ...c, blower: { ...c.blower, maxRpm: 10_000 } };
      const found = cautions(fast, boostCurve(fast, rpms)).find((x) => x.code === "blower-overspeed");
      expect(found?.severity).toBe("danger");
      // 6500 rpm × 0.16/0.08 × 0.98 = 12 740 rpm at redline (hand-worked from the inputs)
      expect(found?.values.blowerRpm).toBeCloseTo(12_740, 6);
    });

    it("pulley-below-belt-minimum: default 76 mm demo minimum and an override", () => {
      const c = benign();
      const small: Combination = { ...c, drive: { ...c.drive, blowerPulleyDiameter: 0.07 } };
      const pts = boostCurve(small, rpms);
      expect(codesOf(small, pts)).toContain("pulley-below-belt-minimum");
      expect(cautions(small, pts, { beltMinimumDiameter: 0.065 }).map((x) => x.code)).not.toContain("pulley-below-belt-minimum");
    });

    it("charge-temperature-high: no intercooler on a hot day", () => {
      const c = benign();
      const hot: Combination = { ...c, intercooler: null, ambient: { ...c.ambient, temperature: 313.15 } };
      expect(codesOf(hot)).toContain("charge-temperature-high");
      expect(cautions(hot, boostCurve(hot, rpms), { chargeTemperatureLimit: 450 }).map((x) => x.code)).not.toContain("charge-temperature-high");
    });

    it("injector-duty-high: injectors too small", () => {
      const c = benign();
      const tiny: Combination = { ...c, fuel: { ...c.fuel, injectorFlow: 0.002 } };
      const found = cautions(tiny, boostCurve(tiny, rpms)).find((x) => x.code === "injector-duty-high");
      expect(found?.severity).toBe("danger");
      expect(found!.values.injectorDuty).toBeGreaterThan(0.85);
    });

    it("pressure-ratio-out-of-range: above the model's range, and below 1", () => {
      const c = benign();
      const high: Combination = { ...c, drive: { ...c.drive, blowerPulleyDiameter: 0.035 } };
      const hi = cautions(high, boostCurve(high, rpms)).filter((x) => x.code === "pressure-ratio-out-of-range");
      expect(hi.some((x) => x.severity === "warning" && x.values.pressureRatio > 2.5)).toBe(true);
      const slow: Combination = { ...c, drive: { ...c.drive, blowerPulleyDiameter: 0.3 } };
      const lo = cautions(slow, boostCurve(slow, rpms)).filter((x) => x.code === "pressure-ratio-out-of-range");
      expect(lo.some((x) => x.severity === "info" && x.values.pressureRatio < 1)).toBe(true);
    });

    it("ve-implausible: out of range, or a wild jump", () => {
      const c = benign();
      const low: Combination = { ...c, engine: { ...c.engine, veCurve: [{ rpm: 3000, ve: 0.4 }] } };
      expect(codesOf(low, [])).toContain("ve-implausible");
      const high: Combination = { ...c, engine: { ...c.engine, veCurve: [{ rpm: 3000, ve: 1.4 }] } };
      expect(codesOf(high, [])).toContain("ve-implausible");
      const jump: Combination = {
        ...c,
        engine: { ...c.engine, veCurve: [{ rpm: 3000, ve: 0.7 }, { rpm: 3500, ve: 1.0 }, { rpm: 6000, ve: 0.9 }] },
      };
      expect(codesOf(jump, [])).toContain("ve-implausible");
    });
  });

  describe("ordering", () => {
    it("puts danger before warning before info, general last", () => {
      const c = benign();
      const bad: Combination = {
        ...c,
        intercooler: null,
        blower: { ...c.blower, maxRpm: 5000 },
        drive: { ...c.drive, blowerPulleyDiameter: 0.05 },
      };
      const list = cautions(bad, boostCurve(bad, rpms));
      const rank = { danger: 0, warning: 1, info: 2 } as const;
      const ranks = list.slice(0, -1).map((x) => rank[x.severity]);
      expect([...ranks].sort((a, b) => a - b)).toEqual(ranks);
      expect(list.at(-1)!.code).toBe("general");
    });
  });
});
