// @ts-nocheck
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import convert from "convert-units";
import {
  CalcConvergenceError,
  boostCurve,
  deadHeadPressureRatio,
  engineAirflow,
  exampleCombination,
  idealCycleEfficiency,
  idealRatioRuleManifoldPressure,
  isentropicTemperature,
  solvePoint,
  standardAtmosphere,
  GAS_CONSTANT,
  type Combination,
} from "@/calc";
import { KAPPA_MODEL, R_MODEL, combinationArb, idealLimit, relDiff, rpmArb, veOf, withPulley, withVeScaled } from "./support/arbitraries";

describe("solvePoint", () => {
  describe("mass balance (calc/README.md)", () => {
    it("blower delivery equals engine demand at density P/(R·T), to 1e-9 relative", () => {
      fc.assert(
        fc.property(combinationArb, rpmArb, (c, rpm) => {
          const p = solvePoint(c, rpm);
          // Engine demand, calc/README.md step 7 with the charge-temperature refinement restated:
          // ṁe = Pm/(R·Td)·Vd·(N/120)·VE(N), Td = T0·(Tm/T0)^n, n = 0.5 by default (calc/README.md).
          const td = c.ambient.temperature * Math.sqrt(p.manifoldTemperature / c.ambient.temperature);
          const demand = (p.manifoldPressure / (R_MODEL * td)) * c.engine.displacement * (rpm / 120) * veOf(c.engine.veCurve, rpm);
          expect(relDiff(p.airMassFlow, demand)).toBeLessThan(1e-9);
          // The effective VE states the same balance at manifold density.
          const atManifold = (p.manifoldPressure / (R_MODEL * p.manifoldTemperature)) * c.engine.displacement * (rpm / 120) * p.effectiveVolumetricEfficiency;
          expect(relDiff(p.airMassFlow, atManifold)).toBeLessThan(1e-9);
        }),
        { numRuns: 300 },
      );
    });

    it("the mass flow is the blower's own delivery by the orifice-law slip of calc/README.md", () => {
      fc.assert(
        fc.property(combinationArb, rpmArb, (c, rpm) => {
          const p = solvePoint(c, rpm);
          const p1 = c.ambient.pressure - c.ambient.inletLoss;
          const rho1 = p1 / (R_MODEL * c.ambient.temperature);
          const vb = c.blower.displacementPerRev;
          const ks = ((1 - c.blower.volumetricEfficiencyRef) * vb * c.blower.referenceRpm) / 60 / Math.sqrt(101_325 * 0.5);
          const nb = rpm * (c.drive.crankPulleyDiameter / c.drive.blowerPulleyDiameter) * (1 - c.drive.beltSlip);
          const dp = p.dischargePressure - p1;
          const q1 = (vb * nb) / 60 - ks * Math.sign(dp) * Math.sqrt(Math.abs(dp));
          expect(relDiff(p.blowerRpm, nb)).toBeLessThan(1e-12);
          expect(relDiff(p.airMassFlow, rho1 * q1)).toBeLessThan(1e-9);
          expect(relDiff(p.blowerVolumetricEfficiency, q1 / ((vb * nb) / 60))).toBeLessThan(1e-9);
        }),
        { numRuns: 200 },
      );
    });

    it("reports the equivalent adiabatic efficiency by its definition T1(PR^κ − 1)/(T2 − T1)", () => {
      // source: definition of adiabatic (isentropic) efficiency, any compressor text; calc/README.md
      fc.assert(
        fc.property(combinationArb, rpmArb, (c, rpm) => {
          const p = solvePoint(c, rpm);
          fc.pre(Math.abs(p.pressureRatio - 1) > 1e-3);
          const t1 = c.ambient.temperature;
          const expected = (t1 * (p.pressureRatio ** KAPPA_MODEL - 1)) / (p.dischargeTemperature - t1);
          expect(relDiff(p.adiabaticEfficiency, expected)).toBeLessThan(1e-7);
        }),
        { numRuns: 200 },
      );
    });

    it("a slow, leaky blower at low engine speed still balances below its dead-head ratio", () => {
      const c: Combination = exampleCombination();
      const leaky: Combination = { ...c, blower: { ...c.blower, volumetricEfficiencyRef: 0.35, referenceRpm: 12_000 } };
      const p = solvePoint(leaky, 800);
      const p1 = c.ambient.pressure - c.ambient.inletLoss;
      const ks = (0.65 * c.blower.displacementPerRev * 12_000) / 60 / Math.sqrt(101_325 * 0.5);
      const deadHead = deadHeadPressureRatio((c.blower.displacementPerRev * p.blowerRpm) / 60, ks, p1);
      expect(p.pressureRatio).toBeLessThan(deadHead);
      expect(p.airMassFlow).toBeGreaterThan(0);
    });

    it("throws a typed convergence error, not a silent answer, when the blower cannot feed the engine", () => {
      const c = exampleCombination();
      const starved: Combination = {
        ...c,
        engine: { ...c.engine, displacement: 0.02 },
        blower: { ...c.blower, displacementPerRev: 0.0001 },
        drive: { ...c.drive, crankPulleyDiameter: 0.03, blowerPulleyDiameter: 0.5 },
      };
      let caught: unknown;
      try {
        solvePoint(starved, 6000);
      } catch (e) {
        caught = e;
      }
      expect(caught).toBeInstanceOf(CalcConvergenceError);
      expect((caught as CalcConvergenceError).reason).toBe("blower-too-slow");
      expect((caught as CalcConvergenceError).field).toBe("drive.blowerPulleyDiameter");
    });
  });

  describe("ideal limit (calc/README.md: no slip, ηint = 1, ε = 1 back to T1, no losses)", () => {
    it("reproduces the ratio rule Pm/P1 = Vb·Nb/(Vd·N/2·VE) exactly (1e-9 relative)", () => {
      fc.assert(
        fc.property(combinationArb, rpmArb, (c0, rpm) => {
          const c = idealLimit(c0);
          const p = solvePoint(c, rpm);
          const r = c.drive.crankPulleyDiameter / c.drive.blowerPulleyDiameter;
          const ratioRule = (c.ambient.pressure * c.blower.displacementPerRev * rpm * r) / ((c.engine.displacement * rpm * veOf(c.engine.veCurve, rpm)) / 2);
          expect(relDiff(p.manifoldPressure, ratioRule)).toBeLessThan(1e-9);
          expect(relDiff(idealRatioRuleManifoldPressure(c, rpm), ratioRule)).toBeLessThan(1e-12);
        }),
        { numRuns: 300 },
      );
    });

    it("scales absolute manifold pressure with the drive ratio", () => {
      fc.assert(
        fc.property(combinationArb, rpmArb, fc.double({ min: 0.8, max: 1.25, noNaN: true }), (c0, rpm, k) => {
          const c = idealLimit(c0);
          const d2 = c.drive.blowerPulleyDiameter * k;
          fc.pre(d2 >= 0.03 && d2 <= 0.5);
          const a = solvePoint(c, rpm);
          const b = solvePoint(withPulley(c, d2), rpm);
          // Drive ratio falls by 1/k, so manifold pressure must too.
          expect(relDiff(b.manifoldPressure / a.manifoldPressure, 1 / k)).toBeLessThan(1e-9);
        }),
        { numRuns: 200 },
      );
    });
  });

  describe("monotonic responses", () => {
    it("boost falls as the blower pulley grows", () => {
      fc.assert(
        fc.property(combinationArb, rpmArb, fc.double({ min: 1.01, max: 1.3, noNaN: true }), (c, rpm, k) => {
          const d2 = c.drive.blowerPulleyDiameter * k;
          fc.pre(d2 <= 0.5);
          expect(solvePoint(withPulley(c, d2), rpm).boostGauge).toBeLessThan(solvePoint(c, rpm).boostGauge);
        }),
        { numRuns: 200 },
      );
    });

    it("boost falls as VE rises", () => {
      fc.assert(
        fc.property(combinationArb, rpmArb, fc.double({ min: 1.01, max: 1.3, noNaN: true }), (c, rpm, k) => {
          expect(solvePoint(withVeScaled(c, k), rpm).boostGauge).toBeLessThan(solvePoint(c, rpm).boostGauge);
        }),
        { numRuns: 200 },
      );
    });

    it("manifold pressure rises as ambient pressure rises", () => {
      fc.assert(
        fc.property(combinationArb, rpmArb, fc.double({ min: 500, max: 5000, noNaN: true }), (c, rpm, dp) => {
          const higher: Combination = { ...c, ambient: { ...c.ambient, pressure: c.ambient.pressure + dp } };
          expect(solvePoint(higher, rpm).manifoldPressure).toBeGreaterThan(solvePoint(c, rpm).manifoldPressure);
        }),
        { numRuns: 200 },
      );
    });

    it("fuel evaporated ahead of the blower cools the charge and raises the mass flow", () => {
      const c = exampleCombination();
      const wet: Combination = { ...c, fuel: { ...c.fuel, evaporatedBeforeBlower: 0.5 } };
      const dry = solvePoint(c, 5000);
      const cooled = solvePoint(wet, 5000);
      expect(cooled.manifoldTemperature).toBeLessThan(dry.manifoldTemperature);
      expect(cooled.airMassFlow).toBeGreaterThan(dry.airMassFlow);
      // With the plain density (n = 1) and no intercooler every temperature scales with T1, so
      // the pressure ratio cannot move.
      const plain = (x: Combination): Combination => ({ ...x, engine: { ...x.engine, chargeTemperatureExponent: 1 } });
      expect(relDiff(solvePoint(plain(wet), 5000).pressureRatio, solvePoint(plain(c), 5000).pressureRatio)).toBeLessThan(1e-9);
      // With n = 0.5 the engine's intake gains less than the blower's delivery from a cooler
      // charge, so the pressure ratio rises a little (Td/T1 ∝ T1^−1/2 at a fixed PR).
      expect(cooled.pressureRatio).toBeGreaterThan(dry.pressureRatio);
      // With an intercooler at a fixed coolant temperature, Tm = (1 − ε)·T2 + ε·Tc falls by a smaller
      // fraction than T1 does, so at a given PR the blower's mass gain outruns the engine's: boost rises.
      const ic = { effectiveness: 0.7, pressureDrop: 2000, coolantTemperature: 310 };
      expect(solvePoint({ ...wet, intercooler: ic }, 5000).boostGauge).toBeGreaterThan(solvePoint({ ...c, intercooler: ic }, 5000).boostGauge);
    });
  });

  describe("outputs of §3.11", () => {
    // Consistency with the contract only (no outside source): outputs.test.ts pins these to hand-worked values.
    it("derive fuel, power and torque from the mass flow as calc/README.md states", () => {
      const c = exampleCombination();
      const p = solvePoint(c, 4800);
      expect(relDiff(p.fuelMassFlow, p.airMassFlow / c.fuel.afr)).toBeLessThan(1e-12);
      expect(relDiff(p.grossPower, p.airMassFlow / (c.fuel.afr * c.fuel.bsfc))).toBeLessThan(1e-12);
      expect(relDiff(p.netPower, p.grossPower - p.drivePower)).toBeLessThan(1e-12);
      expect(relDiff(p.torque, p.netPower / ((2 * Math.PI * 4800) / 60))).toBeLessThan(1e-12);
      expect(relDiff(p.boostGauge, p.manifoldPressure - c.ambient.pressure)).toBeLessThan(1e-12);
      expect(p.injectorDuty).not.toBeNull();
      expect(relDiff(p.injectorDuty ?? 0, p.fuelMassFlow / ((c.fuel.injectorCount ?? 0) * (c.fuel.injectorFlow ?? 0)))).toBeLessThan(1e-12);
      const noInjectors: Combination = { ...c, fuel: { ...c.fuel, injectorCount: null, injectorFlow: null } };
      expect(solvePoint(noInjectors, 4800).injectorDuty).toBeNull();
    });

    it("boostCurve gives one point per engine speed, in order", () => {
      const rpms = [6000, 2000, 4000];
      const curve = boostCurve(exampleCombination(), rpms);
      expect(curve.map((p) => p.rpm)).toEqual(rpms);
    });
  });
});

describe("reference checks", () => {
  it("air density at 15 °C and 101.325 kPa is 1.225 kg/m³", () => {
    // source: ISO 2533 / U.S. Standard Atmosphere 1976: R = R*/M0 = 8314.32/28.9644 = 287.053
    // J/(kg·K) (from memory); the model rounds it to 287.05, so 2e-5 relative and no wider.
    expect(relDiff(GAS_CONSTANT, 8314.32 / 28.9644)).toBeLessThan(2e-5);
    // source: same standard, sea-level density 1.2250 kg/m³ (four figures: 5e-5 relative)
    expect(relDiff(101_325 / (GAS_CONSTANT * 288.15), 1.225)).toBeLessThan(5e-5);
    expect(standardAtmosphere(0).density).toBeCloseTo(1.225, 3);
  });

  it("isentropic temperature T2/T1 = PR^((γ−1)/γ): PR 2 from 288.15 K gives about 351.3 K", () => {
    // source: isentropic relation of an ideal gas (any thermodynamics text, e.g. Çengel & Boles);
    // 288.15 × 2^(0.4/1.4) = 351.26 K, worked by hand
    expect(isentropicTemperature(288.15, 2)).toBeCloseTo(351.26, 1);
    fc.assert(
      fc.property(fc.double({ min: 200, max: 350, noNaN: true }), fc.double({ min: 1, max: 4, noNaN: true }), (t1, pr) => {
        expect(relDiff(isentropicTemperature(t1, pr), t1 * Math.pow(pr, 0.4 / 1.4))).toBeLessThan(1e-12);
      }),
    );
  });

  it("the ideal Roots cycle's efficiency ws/w is 0.8598 at PR 1.5", () => {
    // source: isentropic work per inlet volume (PR^κ − 1)/κ (ideal-gas relation, e.g. Çengel &
    // Boles) over the constant-volume (Roots) work PR − 1; worked by hand: 1.5^0.285714 = 1.12282,
    // 0.12282/0.285714 = 0.42988, /0.5 = 0.85977
    expect(idealCycleEfficiency(1.5, 1)).toBeCloseTo(0.85977, 4);
    fc.assert(
      fc.property(fc.double({ min: 1.05, max: 3, noNaN: true }), (pr) => {
        const textbook = (Math.pow(pr, KAPPA_MODEL) - 1) / KAPPA_MODEL / (pr - 1);
        expect(relDiff(idealCycleEfficiency(pr, 1), textbook)).toBeLessThan(1e-12);
      }),
    );
  });

  it("a machine with built-in compression is isentropic when the pressure ratio equals its built-in ratio Vi^γ", () => {
    // source: compressor texts on screw machines: at PR = PRi there is no constant-volume step
    fc.assert(
      fc.property(fc.double({ min: 1.05, max: 3, noNaN: true }), (vi) => {
        expect(idealCycleEfficiency(Math.pow(vi, 1.4), vi)).toBeCloseTo(1, 12);
      }),
    );
  });

  it("four-stroke airflow matches the handbook form cfm = in³·rpm·VE/3456", () => {
    // source: Heywood, Internal Combustion Engine Fundamentals (1988), ch. 2; 3456 = 2 × 1728 in³/ft³
    fc.assert(
      fc.property(
        fc.double({ min: 60, max: 800, noNaN: true }),
        fc.integer({ min: 500, max: 9000 }),
        fc.double({ min: 0.5, max: 1.3, noNaN: true }),
        (cubicInches, rpm, ve) => {
          const handbookCfm = (cubicInches * rpm * ve) / 3456;
          const displacementM3 = convert(cubicInches).from("in3").to("m3");
          const modelCfm = convert(engineAirflow(displacementM3, rpm, ve)).from("m3/s").to("ft3/min");
          // convert-units carries its factors to about 6 significant figures
          expect(relDiff(modelCfm, handbookCfm)).toBeLessThan(1e-5);
        },
      ),
    );
  });
});
