// @ts-nocheck
// The belt drive on its own: ratio, overdrive and blower speed against the belt-drive speed
// relation, and the messages that name each field.
import { describe, expect, it } from "vitest";
import { blowerSpeed, driveRatio, exampleCombination, overdrive } from "@/calc";
import { inputError } from "./support/input-error";


describe("belt drive", () => {
  it("a 200 mm crank pulley on a 100 mm blower pulley turns the blower at twice engine speed less slip", () => {
    // source: belt-drive speed ratio n2 = n1·D1/D2 (Machinery's Handbook, "Belts and pulleys", from memory);
    // slip as a fraction lost, common practice, no published source. 5000 × 2 × (1 − 0.02) = 9800.
    const c = exampleCombination();
    const spec = { ...c, drive: { crankPulleyDiameter: 0.2, blowerPulleyDiameter: 0.1, beltSlip: 0.02 } };
    expect(blowerSpeed(spec, 5000)).toBeCloseTo(9800, 9);
    expect(blowerSpeed({ ...spec, drive: { ...spec.drive, beltSlip: 0 } }, 5000)).toBeCloseTo(10_000, 9);
    expect(driveRatio(0.2, 0.1)).toBe(2);
    // Overdrive as the trade quotes it: a 2:1 ratio is 100 % overdrive (common practice, no published source).
    expect(overdrive(2)).toBe(1);
    expect(overdrive(1.5)).toBe(0.5);
  });

  it("names the pulley and its unit when a diameter is not positive", () => {
    const crank = inputError(() => driveRatio(0, 0.1));
    expect(crank.field).toBe("crankDiameter");
    expect(crank.message).toMatch(/Crank pulley diameter must be a positive number in m/);
    const blower = inputError(() => driveRatio(0.2, -0.1));
    expect(blower.field).toBe("blowerPulleyDiameter");
    expect(blower.message).toMatch(/Blower pulley diameter must be a positive number in m/);
    expect(inputError(() => blowerSpeed(exampleCombination(), 5)).field).toBe("rpm");
  });
});
