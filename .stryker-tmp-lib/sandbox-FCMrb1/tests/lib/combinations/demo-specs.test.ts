// @ts-nocheck
// The invented demo engines are plausible and inside the model's range, and each storyline does
// what its revision note says. Bounds are the author's unless a source is named.
import { describe, expect, it } from "vitest";
import { boostCurve, combinationSchema, cToK, paToPsi, type Combination, type CombinationInput } from "@/calc";
import * as specs from "@/lib/combinations/demo-specs";
import { TEMPLATES } from "@/lib/combinations/templates";

const parse = (s: CombinationInput): Combination => combinationSchema.parse(s);
/** Every 250 rpm from the first VE point to redline. */
function sweep(c: Combination) {
  const rpms: number[] = [];
  for (let n = c.engine.veCurve[0].rpm; n < c.engine.redlineRpm; n += 250) rpms.push(n);
  return boostCurve(c, [...rpms, c.engine.redlineRpm]);
}

describe("the demo engines", () => {
  const all = Object.entries(specs) as [string, CombinationInput][];

  it.each(all)("%s is inside the model's range and plausible from its first VE point to redline", (_, spec) => {
    const c = parse(spec);
    // design.md: no demo engine between 4.8 and 5.1 L
    expect(c.engine.displacement < 0.0048 || c.engine.displacement > 0.0051).toBe(true);
    const points = sweep(c);
    for (const p of points) {
      expect(p.rangeReasons).toEqual([]);
      expect(p.withinRange).toBe(true);
      expect(p.boostGauge).toBeGreaterThan(0);
      // an un-intercooled Roots at these ratios runs a hot charge; 125 °C is the author's ceiling
      expect(p.manifoldTemperature).toBeLessThan(cToK(125));
      expect(p.blowerRpm).toBeLessThanOrEqual(c.blower.maxRpm);
    }
    // boost roughly 4–15 psi where the engine makes its power (author's bounds for a street demo)
    const top = paToPsi(points.at(-1)!.boostGauge);
    expect(top).toBeGreaterThan(4);
    expect(top).toBeLessThan(15);
  });

  it("every template is one of the demo engines", () => {
    for (const t of TEMPLATES) expect(Object.values(specs)).toContain(t.spec);
  });
});

describe("the demo storylines", () => {
  const at = (s: CombinationInput, rpms: number[]) => boostCurve(parse(s), rpms);

  it("the truck's smaller pulley raises boost at every speed (trade fact, common practice, no published source)", () => {
    const rpms = [1500, 2500, 3500, 4500, 5200];
    const [a, b] = [at(specs.workTruckV6, rpms), at(specs.workTruckV6SmallerPulley, rpms)];
    rpms.forEach((_, i) => expect(b[i].boostGauge).toBeGreaterThan(a[i].boostGauge));
  });

  it("the big-inch V8's intercooler cools the charge; the larger injectors bring duty under the limit", () => {
    const rpms = [2000, 4000, 6000];
    const [hot, cooled, injectors] = [at(specs.bigInchTwinScrew, rpms), at(specs.bigInchIntercooled, rpms), at(specs.bigInchLargerInjectors, rpms)];
    rpms.forEach((_, i) => expect(cooled[i].manifoldTemperature).toBeLessThan(hot[i].manifoldTemperature - 20));
    const maxDuty = parse(specs.bigInchIntercooled).fuel.maxDuty;
    expect(cooled.at(-1)!.injectorDuty!).toBeGreaterThan(maxDuty);
    for (const p of injectors) expect(p.injectorDuty!).toBeLessThan(maxDuty);
  });

  it("the vintage V8's cam: less boost and more net power from the middle up (trade fact, calc/README.md)", () => {
    const rpms = [4000, 4500, 5000, 5500];
    const [a, b] = [at(specs.vintageV8DrawThrough, rpms), at(specs.vintageV8Cam, rpms)];
    rpms.forEach((_, i) => {
      expect(b[i].boostGauge).toBeLessThan(a[i].boostGauge);
      expect(b[i].netPower).toBeGreaterThan(a[i].netPower);
    });
  });

  it("the road car at 1,600 m: the standard atmosphere's pressure (ISO 2533), less boost and less power", () => {
    // source: ISO 2533 troposphere, 1600 m → 83 528 Pa (calc's standardAtmosphere, tests/calc/atmosphere.test.ts)
    expect(parse(specs.roadCarFourAtAltitude).ambient.pressure).toBeCloseTo(83_528, -1);
    const rpms = [3000, 5000];
    const [a, b] = [at(specs.roadCarFour, rpms), at(specs.roadCarFourAtAltitude, rpms)];
    rpms.forEach((_, i) => {
      expect(b[i].boostGauge).toBeLessThan(a[i].boostGauge);
      expect(b[i].netPower).toBeLessThan(a[i].netPower);
    });
  });
});
