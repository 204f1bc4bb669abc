// @ts-nocheck
// What people read off a point: drive power, fuel, power, torque and the inlet cfm, pinned to
// hand-worked cases and handbook forms rather than to the solver's own formulas.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import convert from "convert-units";
import { exampleCombination, solvePoint, type Combination } from "@/calc";
import { blowerState, newState, pointFromState, prepare } from "@/calc/solve";
import { combinationArb, idealLimit, relDiff, rpmArb, veOf } from "./support/arbitraries";

/** A Roots case with round numbers to work by hand: sea-level standard air, no losses. */
function handCase(): Combination {
  const c = exampleCombination();
  return {
    ...c,
    blower: { ...c.blower, kind: "roots", builtInVolumeRatio: 1, displacementPerRev: 0.0016, internalEfficiency: 0.85, mechanicalEfficiency: 0.95 },
    ambient: { pressure: 101_325, temperature: 288.15, inletLoss: 0 },
    fuel: { ...c.fuel, afr: 12.5, bsfc: 8.5e-8, evaporatedBeforeBlower: 0 },
  };
}

describe("drive power, fuel, power and torque", () => {
  it("a Roots blower at PR 1.5 and 9000 rev/min takes 15 057.6 W from the crank (worked by hand)", () => {
    // source: the ideal Roots cycle compresses at constant volume, so its work per swept volume is
    // P1·(PR − 1) (e.g. Perry's Chemical Engineers' Handbook, rotary blowers; from memory); shaft
    // power = P1·(PR − 1)·Vb·Nb/60/ηint/ηmech. Worked by hand: Vb·Nb/60 = 0.0016·9000/60 =
    // 0.24 m³/s; 50 662.5 Pa · 0.24 m³/s = 12 159 W; /0.85 = 14 304.71 W; /0.95 = 15 057.59 W.
    const p = prepare(handCase());
    const s = blowerState(p, 0.24, 1.5, newState());
    expect(s.airPower).toBeCloseTo(14_304.71, 1);
    // Mass flow set by hand so the rest can be worked by hand too.
    s.massFlow = 0.2;
    const point = pointFromState(p, 6000, 9000, 0.85, 1.5, s);
    expect(point.drivePower).toBeCloseTo(15_057.59, 1);
    // source: Heywood, Internal Combustion Engine Fundamentals (1988), ch. 2: sfc = ṁf/P and
    // P = 2π·N·T. Worked by hand: ṁf = 0.2/12.5 = 0.016 kg/s; P = 0.016/8.5e-8 = 188 235.29 W;
    // net = 188 235.29 − 15 057.59 = 173 177.71 W; T = 173 177.71/(2π·6000/60) = 275.621 N·m.
    expect(point.fuelMassFlow).toBeCloseTo(0.016, 12);
    expect(point.grossPower).toBeCloseTo(188_235.29, 1);
    expect(point.netPower).toBeCloseTo(173_177.71, 1);
    expect(point.torque).toBeCloseTo(275.621, 2);
  });

  it("every solved Roots point's drive power is P1·(PR − 1)·Vb·Nb/60/ηint/ηmech", () => {
    // source: as above (constant-volume compression work); checked on the solver's public output
    fc.assert(
      fc.property(
        combinationArb.filter((c) => c.blower.kind === "roots"),
        rpmArb,
        (c, rpm) => {
          const p = solvePoint(c, rpm);
          const b = c.blower;
          const byHand = (p.blowerInletPressure * (p.pressureRatio - 1) * b.displacementPerRev * p.blowerRpm) / 60 / b.internalEfficiency / b.mechanicalEfficiency;
          expect(relDiff(p.drivePower, byHand)).toBeLessThan(1e-9);
        },
      ),
      { numRuns: 100 },
    );
  });
});

describe("the inlet airflow people read (cfm)", () => {
  it("in the ideal limit it is the blower's swept cfm (cid/rev·rpm/1728) and the ratio rule's PR × engine cfm (cid·rpm·VE/3456)", () => {
    // source: Heywood (1988), ch. 2, four-stroke volume flow Vd·N/2·VE; 1728 in³/ft³ and
    // 3456 = 2 × 1728. In the ideal limit (no slip, no losses, charge back at ambient
    // temperature) the blower delivers its swept volume and the engine takes PR times its
    // ambient-density flow. Conversions by convert-units, which carries about 6 significant figures.
    fc.assert(
      fc.property(combinationArb, rpmArb, (c0, rpm) => {
        const ideal = idealLimit(c0);
        const c: Combination = { ...ideal, engine: { ...ideal.engine, chargeTemperatureExponent: 1, compressionRatio: null } };
        const p = solvePoint(c, rpm);
        const cfm = convert(p.inletAirflow).from("m3/s").to("ft3/min");
        const blowerCid = convert(c.blower.displacementPerRev).from("m3").to("in3");
        expect(relDiff(cfm, (blowerCid * p.blowerRpm) / 1728)).toBeLessThan(1e-5);
        const engineCid = convert(c.engine.displacement).from("m3").to("in3");
        expect(relDiff(cfm, (p.pressureRatio * engineCid * rpm * veOf(c.engine.veCurve, rpm)) / 3456)).toBeLessThan(1e-5);
      }),
      { numRuns: 100 },
    );
  });
});
