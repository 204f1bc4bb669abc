// @ts-nocheck
// What each caution says to a person, word for word, in one crafted case per caution: the
// figures in the text are the ones behind it, in the units people read (rpm grouped, °C, %).
// The texts are the project's own; the figures are worked by hand from the crafted inputs.
import { describe, expect, it } from "vitest";
import { cautions, type Combination } from "@/calc";
import { inputError } from "./support/input-error";
import type { CautionPoint } from "@/calc/cautions";
import { cautionBase, cautionPoint } from "./support/caution-case";

const base = cautionBase;
const point = cautionPoint;
const messageOf = (c: Combination, points: CautionPoint[], code: string, severity?: string) =>
  cautions(c, points).find((x) => x.code === code && (!severity || x.severity === severity))?.message;

describe("caution messages", () => {
  it("overspeed names both speeds and the limit, grouped, and what to change", () => {
    const c = base();
    expect(messageOf({ ...c, blower: { ...c.blower, maxRpm: 12_000 } }, [point()], "blower-overspeed")).toBe(
      "At 6,500 rpm the blower turns 13,000 rpm, over its 12,000 rpm limit. Use a larger blower pulley or a smaller crank pulley.",
    );
  });

  it("belt minimum gives both diameters in mm", () => {
    const c = base();
    expect(messageOf({ ...c, drive: { ...c.drive, blowerPulleyDiameter: 0.07 }, blower: { ...c.blower, maxRpm: 40_000 } }, [point()], "pulley-below-belt-minimum")).toBe(
      "The 70 mm blower pulley is below the 76 mm the belt should wrap; expect belt slip, heat and wear. Check the belt maker's minimum.",
    );
  });

  it("charge temperature gives the hottest point in °C (K − 273.15) and the limit", () => {
    expect(messageOf(base(), [point({ rpm: 3000 }), point({ rpm: 5250, manifoldTemperature: 353.15 })], "charge-temperature-high")).toBe(
      "Charge temperature reaches 80 °C at 5,250 rpm, above 60 °C (a conservative rule of thumb for knock risk). Consider an intercooler, less boost, better fuel or less ignition advance.",
    );
  });

  it("injector duty gives the highest duty in % and the limit; points without a duty are passed over", () => {
    const pts = [point({ injectorDuty: null }), point({ rpm: 5000, injectorDuty: 0.92 }), point({ rpm: 6000, injectorDuty: 0.9 })];
    expect(messageOf(base(), pts, "injector-duty-high")).toBe(
      "Injector duty reaches 92 % at 5,000 rpm, above the 85 % limit: the engine may run lean. Use larger injectors or more fuel pressure.",
    );
    expect(cautions(base(), pts).find((x) => x.code === "injector-duty-high")?.values).toEqual({ injectorDuty: 0.92, limit: 0.85, rpm: 5000 });
  });

  it("pressure ratio above the range and below 1 each say what they mean", () => {
    const pts = [point({ rpm: 2000, pressureRatio: 0.95 }), point({ rpm: 4000, pressureRatio: 2.6 }), point({ rpm: 3000, pressureRatio: 1.2 })];
    expect(messageOf(base(), pts, "pressure-ratio-out-of-range", "warning")).toBe(
      "Pressure ratio reaches 2.60 at 4,000 rpm; the model is meant for ratios up to about 2.5, so treat these figures as rough.",
    );
    expect(messageOf(base(), pts, "pressure-ratio-out-of-range", "info")).toBe(
      "At 2,000 rpm the blower delivers less than the engine would draw on its own (pressure ratio 0.95): it restricts the engine there.",
    );
  });

  it("an implausible VE curve states its extremes and steepest change", () => {
    const c = base();
    const wild = { ...c, engine: { ...c.engine, veCurve: [{ rpm: 2000, ve: 0.6 }, { rpm: 3000, ve: 0.95 }, { rpm: 6000, ve: 0.9 }] } };
    // Steepest change: (0.95 − 0.6) / 1 (thousand rpm) = 0.35.
    expect(messageOf(wild, [point()], "ve-implausible")).toBe(
      "The VE curve looks implausible (from 0.60 to 0.95, steepest change 0.35 per 1000 rpm); wide-open-throttle VE usually lies between 0.5 and 1.3 and changes smoothly. Check the curve.",
    );
  });

  it("the points are checked: a point without a pressure ratio is refused with the field named", () => {
    expect(() => cautions(base(), [{ rpm: 4000, manifoldTemperature: 300, injectorDuty: null } as unknown as CautionPoint])).toThrow(/Each point needs a pressure ratio/);
    expect(() => cautions(base(), "none" as unknown as CautionPoint[])).toThrow(/Points must be a list of operating points/);
  });

  it("on a tie the first point is named; the belt caution carries both diameters", () => {
    const tie = [
      cautionPoint({ rpm: 3000, manifoldTemperature: 340, pressureRatio: 2.6, injectorDuty: 0.9 }),
      cautionPoint({ rpm: 5000, manifoldTemperature: 340, pressureRatio: 2.6, injectorDuty: 0.9 }),
    ];
    const out = cautions(base(), tie);
    for (const code of ["charge-temperature-high", "injector-duty-high", "pressure-ratio-out-of-range"]) expect(out.find((x) => x.code === code)?.values.rpm, code).toBe(3000);
    const low = cautions(base(), [cautionPoint({ rpm: 3000, pressureRatio: 0.9 }), cautionPoint({ rpm: 5000, pressureRatio: 0.9 })]);
    expect(low.find((x) => x.severity === "info" && x.code === "pressure-ratio-out-of-range")?.values.rpm).toBe(3000);
    const c = base();
    const belt = cautions({ ...c, drive: { ...c.drive, blowerPulleyDiameter: 0.07 }, blower: { ...c.blower, maxRpm: 40_000 } }, [cautionPoint()]);
    expect(belt.find((x) => x.code === "pulley-below-belt-minimum")?.values).toEqual({ blowerPulleyDiameter: 0.07, beltMinimumDiameter: 0.076 });
  });

  it("bad points and options are named by their path", () => {
    expect(inputError(() => cautions(base(), [cautionPoint({ pressureRatio: "x" as unknown as number })])).field).toBe("points.0.pressureRatio");
    expect(inputError(() => cautions(base(), [cautionPoint()], { beltMinimumDiameter: -1 })).field).toMatch(/^options\.beltMinimumDiameter/);
  });
});
