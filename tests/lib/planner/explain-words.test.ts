// The planner's one sentence on why boost and power moved, word for word, from points built by
// hand so that each driver's share is known: ln(Pm_b/Pm_a) splits into blower speed, slip,
// charge temperature, engine breathing, engine speed and the rest (calc/README.md, "Why boost and
// power moved"). Unit factors: 1 psi = 6 894.757 Pa, 1 hp = 745.6999 W (NIST SP 811); a
// temperature difference of 1 K is 1.8 °F (definition of the Fahrenheit degree).
import { describe, expect, it } from "vitest";
import type { OperatingPoint } from "@/calc";
import { explainSentence } from "@/lib/planner/explain-words";

const HP = 745.6999;

/** The fields explainChange reads; point a at 4000 rpm, 150 kPa absolute (invented). */
const A = {
  rpm: 4000,
  manifoldPressure: 150_000,
  boostGauge: 48_675,
  blowerRpm: 10_000,
  blowerVolumetricEfficiency: 0.8,
  manifoldTemperature: 330,
  effectiveVolumetricEfficiency: 0.85,
  engineVolumetricEfficiency: 0.85,
  airMassFlow: 0.2,
  grossPower: 200_000,
  drivePower: 20_000,
  netPower: 180_000,
};
type Fields = typeof A;
const pt = (o: Partial<Fields> = {}): OperatingPoint => ({ ...A, ...o }) as unknown as OperatingPoint;
/** Point b with manifold pressure a's times `ratio` and boost moved by the same pascals. */
const moved = (ratio: number, o: Partial<Fields>): OperatingPoint => pt({ manifoldPressure: A.manifoldPressure * ratio, boostGauge: A.boostGauge + A.manifoldPressure * (ratio - 1), ...o });

describe("explainSentence", () => {
  it("a 10 % faster blower: boost rose with blower speed, and what the drive costs", () => {
    // Pm × 1.1 = +15 kPa = +2.2 psi; +20 hp net, +5 hp drive.
    const b = moved(1.1, { blowerRpm: 11_000, netPower: A.netPower + 20 * HP, drivePower: A.drivePower + 5 * HP });
    expect(explainSentence(pt(), b, "imperial")).toBe("Against the saved revision at 4,000 rpm: boost +2.2 psi and net power +20 hp; boost rose with blower speed +10.0 %; blower drive power +5 hp.");
    // Metric: +15.0 kPa, 20 × 0.7457 = +15 kW net, 5 × 0.7457 = +4 kW drive.
    expect(explainSentence(pt(), b, "metric")).toBe("Against the saved revision at 4,000 rpm: boost +15.0 kPa and net power +15 kW; boost rose with blower speed +10.0 %; blower drive power +4 kW.");
  });

  it("boost fell with the two largest shares, held back by the ones pulling the other way", () => {
    // Blower −10 % (ln 0.9 = −0.105), VE +10 % (−ln 1.1 = −0.095), charge +10 K (ln 340/330 = +0.030),
    // blower VE 0.80 → 0.82 (ln 1.025 = +0.025): Pm × 0.9 × 340/330 / 1.1 × 1.025 = 0.864, −20.4 kPa = −3.0 psi.
    const ratio = 0.9 * (340 / 330) * (1 / 1.1) * (0.82 / 0.8);
    const b = moved(ratio, { blowerRpm: 9000, manifoldTemperature: 340, engineVolumetricEfficiency: 0.935, effectiveVolumetricEfficiency: 0.935, blowerVolumetricEfficiency: 0.82, netPower: A.netPower - 5 * HP, drivePower: A.drivePower + 0.999 });
    expect(explainSentence(pt(), b, "imperial")).toBe("Against the saved revision at 4,000 rpm: boost −3.0 psi and net power −5 hp; boost fell with blower speed −10.0 % and engine breathing (VE) +10.0 %, held back by charge temperature +18 °F and blower slip down 2.0 points.");
    expect(explainSentence(pt(), b, "metric")).toBe("Against the saved revision at 4,000 rpm: boost −20.4 kPa and net power −4 kW; boost fell with blower speed −10.0 % and engine breathing (VE) +10.0 %, held back by charge temperature +10 °C and blower slip down 2.0 points.");
  });

  it("engine speed and the rest, against another item, at b's speed", () => {
    // Engine and blower both +10 % (shares +0.095 and −0.095, blower first when equal); Pm × 0.95 leaves the rest ln 0.95 (−5.0 %).
    const b = moved(0.95, { rpm: 4400, blowerRpm: 11_000 });
    expect(explainSentence(pt(), b, "metric", "the 3.0 in pulley")).toBe("Against the 3.0 in pulley at 4,400 rpm: boost −7.5 kPa and net power ±0 kW; boost fell with engine speed +10.0 % and inlet air and sizes −5.0 %, held back by blower speed +10.0 %.");
  });

  it("more slip: 'blower slip up', and a drive power change of exactly 1 W is named", () => {
    // Blower VE 0.80 → 0.76: slip up 4.0 points, ln 0.95; Pm × 0.95 = −7.5 kPa; −10 kW net.
    const b = moved(0.95, { blowerVolumetricEfficiency: 0.76, netPower: A.netPower - 10_000, drivePower: A.drivePower - 1 });
    expect(explainSentence(pt(), b, "metric")).toBe("Against the saved revision at 4,000 rpm: boost −7.5 kPa and net power −10 kW; boost fell with blower slip up 4.0 points; blower drive power ±0 kW.");
  });

  it("names a share of 0.0021 of ln Pm either way, not one of 0.0019 (the negligible bound, author's choice 0.002)", () => {
    // About ±315 Pa of boost: under the 0.05 psi that shows as a tenth, so "±0.0 psi".
    const by = (share: number) => moved(Math.exp(share), { blowerRpm: A.blowerRpm * Math.exp(share) });
    expect(explainSentence(pt(), by(0.0021), "imperial")).toBe("Against the saved revision at 4,000 rpm: boost ±0.0 psi and net power ±0 hp; boost rose with blower speed +0.2 %.");
    expect(explainSentence(pt(), by(-0.0021), "imperial")).toBe("Against the saved revision at 4,000 rpm: boost ±0.0 psi and net power ±0 hp; boost fell with blower speed −0.2 %.");
    expect(explainSentence(pt(), by(0.0019), "imperial")).toBeNull();
    expect(explainSentence(pt(), by(-0.0019), "imperial")).toBeNull();
  });

  it("with nothing moved, speaks of net power from 1 W either way, and is silent below", () => {
    expect(explainSentence(pt(), pt({ netPower: A.netPower + 1 }), "imperial")).toBe("Against the saved revision at 4,000 rpm: boost ±0.0 psi and net power ±0 hp.");
    expect(explainSentence(pt(), pt({ netPower: A.netPower - 1 }), "metric")).toBe("Against the saved revision at 4,000 rpm: boost ±0.0 kPa and net power ±0 kW.");
    expect(explainSentence(pt(), pt({ netPower: A.netPower + 0.999 }), "imperial")).toBeNull();
    // Power alone moved: the sentence stops at net power, without the drive's share.
    expect(explainSentence(pt(), pt({ netPower: A.netPower + 5 * HP, drivePower: A.drivePower + 2 * HP }), "imperial")).toBe("Against the saved revision at 4,000 rpm: boost ±0.0 psi and net power +5 hp.");
    expect(explainSentence(pt(), pt({ netPower: A.netPower - 0.999 }), "imperial")).toBeNull();
  });

  it("only drivers against the change: no 'rose with', just what held it back", () => {
    // Blower −0.3 % (share −0.003) is the one named; slip +0.0019 and charge +0.0011 are under the
    // bound; Pm × 1.0001 leaves the rest at +0.0001: the total rises while its only named driver pulls down.
    const b = moved(1.0001, { blowerRpm: A.blowerRpm * Math.exp(-0.003), blowerVolumetricEfficiency: 0.8 * Math.exp(0.0019), manifoldTemperature: 330 * Math.exp(0.0011) });
    expect(explainSentence(pt(), b, "imperial")).toBe("Against the saved revision at 4,000 rpm: boost ±0.0 psi and net power ±0 hp, held back by blower speed −0.3 %.");
  });

  it("says nothing without both points", () => {
    expect(explainSentence(null, pt(), "imperial")).toBeNull();
    expect(explainSentence(pt(), null, "imperial")).toBeNull();
    expect(explainSentence(pt(), pt(), "imperial")).toBeNull();
  });
});
