// @ts-nocheck
// explainChange worked by hand on two crafted points: each driver's change and its share of
// ln(Pm_b/Pm_a), from the balance Pm = ṁ·R·Tm/(VEeff·Vd·N/120) with ṁ = ρ1·ηv·Vb·Nb/60
// (calc/README.md), so a share taken from the wrong field or with the wrong sign shows.
import { describe, expect, it } from "vitest";
import { exampleCombination, explainChange, solvePoint, type OperatingPoint } from "@/calc";

const base = solvePoint(exampleCombination(), 4000);
const pt = (o: Partial<OperatingPoint>): OperatingPoint => ({ ...base, ...o });

describe("explainChange by hand", () => {
  const a = pt({ rpm: 4000, blowerRpm: 10_000, blowerVolumetricEfficiency: 0.8, manifoldTemperature: 320, engineVolumetricEfficiency: 0.85, effectiveVolumetricEfficiency: 0.85, manifoldPressure: 150_000, boostGauge: 50_000, airMassFlow: 0.2, grossPower: 200_000, drivePower: 20_000, netPower: 180_000 });
  const b = pt({ rpm: 5000, blowerRpm: 12_000, blowerVolumetricEfficiency: 0.84, manifoldTemperature: 336, engineVolumetricEfficiency: 0.9, effectiveVolumetricEfficiency: 0.945, manifoldPressure: 165_000, boostGauge: 65_000, airMassFlow: 0.26, grossPower: 260_000, drivePower: 26_000, netPower: 234_000 });
  const e = explainChange(a, b);
  const by = Object.fromEntries(e.drivers.map((d) => [d.driver, d]));

  it("each driver's change", () => {
    expect(by["blower-speed"].change).toBeCloseTo(0.2, 12);
    expect(by["blower-slip"].change).toBeCloseTo(0.04, 12);
    expect(by["charge-temperature"].change).toBeCloseTo(16, 12);
    expect(by["engine-breathing"].change).toBeCloseTo(0.9 / 0.85 - 1, 12);
    expect(by["engine-speed"].change).toBeCloseTo(0.25, 12);
  });

  it("each driver's share: ln of its ratio, with the sign the balance gives it", () => {
    expect(by["blower-speed"].manifoldPressureShare).toBeCloseTo(Math.log(1.2), 12);
    expect(by["blower-slip"].manifoldPressureShare).toBeCloseTo(Math.log(0.84 / 0.8), 12);
    // Tm rises 5 % while VEeff/VE rises from 1 to 1.05: the two cancel in what the engine's demand counts.
    expect(by["charge-temperature"].manifoldPressureShare).toBeCloseTo(Math.log(336 / 320) - Math.log(1.05), 12);
    expect(by["engine-breathing"].manifoldPressureShare).toBeCloseTo(-Math.log(0.9 / 0.85), 12);
    expect(by["engine-speed"].manifoldPressureShare).toBeCloseTo(-Math.log(1.25), 12);
    const named = ["blower-speed", "blower-slip", "charge-temperature", "engine-breathing", "engine-speed"].reduce((s, k) => s + by[k].manifoldPressureShare, 0);
    expect(by.other.manifoldPressureShare).toBeCloseTo(Math.log(1.1) - named, 12);
    expect(by.other.change).toBeCloseTo(Math.exp(by.other.manifoldPressureShare) - 1, 12);
  });

  it("the drivers come largest share first, and the totals are b − a or b / a", () => {
    const shares = e.drivers.map((d) => Math.abs(d.manifoldPressureShare));
    expect([...shares].sort((x, y) => y - x)).toEqual(shares);
    expect(e.drivers[0].driver).toBe("engine-speed");
    expect([e.boostChange, e.grossPowerChange, e.drivePowerChange, e.netPowerChange]).toEqual([15_000, 60_000, 6_000, 54_000]);
    expect(e.manifoldPressureRatio).toBeCloseTo(1.1, 12);
    expect(e.airMassFlowRatio).toBeCloseTo(1.3, 12);
  });
});
