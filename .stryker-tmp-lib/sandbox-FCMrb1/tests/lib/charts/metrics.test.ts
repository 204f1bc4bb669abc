// @ts-nocheck
// What the curve chart plots, in the user's units: each metric read off calc's operating point
// and converted with factors checked here against NIST SP 811 (Appendix B), independently of
// calc's unit table, then rounded to the digits the chart shows.
import { describe, expect, it } from "vitest";
import { exampleCombination, solvePoint, type OperatingPoint } from "@/calc";
import { METRICS, axisDigits, axisUnit, exposeSeries, metricDisplay, metricValue, type CurveMetric } from "@/lib/charts/metrics";

// source: NIST SP 811 (2008), Appendix B.8/B.9.
const PA_PER_PSI = 6894.757;
const W_PER_HP = 745.69987; // mechanical horsepower, 550 ft·lbf/s
const NM_PER_LBFT = 1.355818;
const KG_PER_LB = 0.45359237;
const fOfK = (k: number) => (k * 9) / 5 - 459.67;

const point: OperatingPoint = solvePoint(exampleCombination(), 4500);

describe("metric values in the user's units", () => {
  it("imperial: psi, hp, lb·ft, °F, rpm, lb/h (NIST SP 811 factors)", () => {
    const want: [CurveMetric, number][] = [
      ["boostGauge", point.boostGauge / PA_PER_PSI],
      ["manifoldPressure", point.manifoldPressure / PA_PER_PSI],
      ["netPower", point.netPower / W_PER_HP],
      ["grossPower", point.grossPower / W_PER_HP],
      ["drivePower", point.drivePower / W_PER_HP],
      ["torque", point.torque / NM_PER_LBFT],
      ["manifoldTemperature", fOfK(point.manifoldTemperature)],
      ["dischargeTemperature", fOfK(point.dischargeTemperature)],
      ["blowerRpm", point.blowerRpm],
      ["airMassFlow", (point.airMassFlow * 3600) / KG_PER_LB],
    ];
    for (const [m, v] of want) expect(metricValue(m, point, "imperial")! / v, m).toBeCloseTo(1, 6);
  });

  it("metric: kPa, kW, N·m, °C, kg/h; injector duty in percent in both", () => {
    const want: [CurveMetric, number][] = [
      ["boostGauge", point.boostGauge / 1000],
      ["netPower", point.netPower / 1000],
      ["torque", point.torque],
      ["manifoldTemperature", point.manifoldTemperature - 273.15],
      ["airMassFlow", point.airMassFlow * 3600],
    ];
    for (const [m, v] of want) expect(metricValue(m, point, "metric")! / v, m).toBeCloseTo(1, 9);
    expect(metricValue("injectorDuty", point, "metric")).toBeCloseTo(point.injectorDuty! * 100, 12);
    expect(metricValue("injectorDuty", point, "imperial")).toBeCloseTo(point.injectorDuty! * 100, 12);
  });

  it("no injectors, no duty: null, not 0", () => {
    const dry = { ...point, injectorDuty: null };
    expect(metricValue("injectorDuty", dry, "metric")).toBeNull();
    expect(metricDisplay("injectorDuty", dry, "metric")).toBeNull();
  });

  it("display values are rounded to the axis's digits: psi to 0.1, °F and hp whole, duty whole percent", () => {
    const p = { ...point, boostGauge: 0.26 * PA_PER_PSI, netPower: 300.6 * W_PER_HP, manifoldTemperature: (130.4 + 459.67) * (5 / 9), injectorDuty: 0.7349 };
    expect(metricDisplay("boostGauge", p, "imperial")).toBe(0.3);
    expect(metricDisplay("netPower", p, "imperial")).toBe(301);
    expect(metricDisplay("manifoldTemperature", p, "imperial")).toBe(130);
    expect(metricDisplay("injectorDuty", p, "imperial")).toBe(73);
    expect([axisDigits("pressure", "imperial"), axisDigits("percent", "metric"), axisDigits("power", "metric")]).toEqual([1, 0, 0]);
  });

  it("axes: one unit per kind, percent for duty; every metric's kind has a unit", () => {
    expect([axisUnit("pressure", "imperial"), axisUnit("pressure", "metric"), axisUnit("percent", "imperial"), axisUnit("power", "metric")]).toEqual(["psi", "kPa", "%", "kW"]);
    for (const [m, def] of Object.entries(METRICS)) {
      expect(axisUnit(def.kind, "imperial"), m).toBeTruthy();
      expect(def.label, m).toBeTruthy();
    }
    expect(METRICS.injectorDuty.kind).toBe("percent");
    expect(METRICS.airMassFlow.kind).toBe("fuel-flow");
  });
});

describe("the series a chart exposes", () => {
  it("per series: speeds, boost rounded in the user's unit, and each plotted metric", () => {
    const pts = [solvePoint(exampleCombination(), 3000), point];
    const [s] = exposeSeries([{ label: "Demo", points: pts }], ["netPower", "injectorDuty"], "imperial");
    expect(s.label).toBe("Demo");
    expect(s.rpm).toEqual([3000, 4500]);
    expect(s.boostUnit).toBe("psi");
    expect(s.boost).toEqual(pts.map((p) => Math.round((p.boostGauge / PA_PER_PSI) * 10) / 10));
    expect(Object.keys(s.values)).toEqual(["netPower", "injectorDuty"]);
    expect(s.values.netPower).toEqual(pts.map((p) => Math.round(p.netPower / W_PER_HP)));
    expect(exposeSeries([{ label: "m", points: pts }], [], "metric")[0]).toMatchObject({ boostUnit: "kPa", values: {} });
  });
});
