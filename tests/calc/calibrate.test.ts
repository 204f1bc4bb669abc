import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { CalcInputError, INTERCOOLER_DEMO_DEFAULTS, boostCurve, calibrateVe, exampleCombination, type Combination } from "@/calc";
import { KAPPA_MODEL, R_MODEL, combinationArb, relDiff } from "./support/arbitraries";

/** Measure a combination at its own VE-curve speeds, as a perfect datalog would. */
function synthetic(c: Combination) {
  const rpms = c.engine.veCurve.map((p) => p.rpm);
  const points = boostCurve(c, rpms);
  fc.pre(points.every((p) => p.boostGauge < 400_000)); // the measurement schema's range
  return points;
}

describe("calibrateVe", () => {
  describe("recovers the VE curve that generated the boost", () => {
    it("from boost alone (model manifold temperature)", () => {
      fc.assert(
        fc.property(combinationArb, (c) => {
          const points = synthetic(c);
          const result = calibrateVe(c, points.map((p) => ({ rpm: p.rpm, boostGauge: p.boostGauge })));
          expect(result.veCurve.map((p) => p.rpm)).toEqual(c.engine.veCurve.map((p) => p.rpm));
          result.veCurve.forEach((p, i) => expect(relDiff(p.ve, c.engine.veCurve[i].ve)).toBeLessThan(1e-9));
          for (const r of result.residuals) {
            expect(r.boostResidual).not.toBeNull();
            expect(Math.abs(r.boostResidual!)).toBeLessThan(1e-6 * c.ambient.pressure);
            expect(r.temperatureResidual).toBeNull();
          }
        }),
        { numRuns: 150 },
      );
    });

    it("from boost and measured manifold temperature", () => {
      fc.assert(
        fc.property(combinationArb, (c) => {
          const points = synthetic(c);
          fc.pre(points.every((p) => p.manifoldTemperature <= 500)); // a temperature sensor's plausible range
          const result = calibrateVe(
            c,
            points.map((p) => ({ rpm: p.rpm, boostGauge: p.boostGauge, manifoldTemperature: p.manifoldTemperature })),
          );
          result.veCurve.forEach((p, i) => expect(relDiff(p.ve, c.engine.veCurve[i].ve)).toBeLessThan(1e-9));
          for (const r of result.residuals) expect(Math.abs(r.temperatureResidual!)).toBeLessThan(1e-6);
        }),
        { numRuns: 150 },
      );
    });
  });

  describe("uses the measured temperature instead of the model's", () => {
    it("VE scales with the measured manifold temperature, VE = ṁ·R·Td/(Pm·Vd·N/120)", () => {
      // calc/README.md (calibrateVe): at a measured PR the blower's delivery is fixed, so VE ∝ Td = T0·(Tm/T0)^n,
      // with the default n = 0.5 of the charge-temperature refinement (calc/README.md).
      fc.assert(
        fc.property(combinationArb, fc.double({ min: -20, max: 40, noNaN: true }), (c, dT) => {
          const points = synthetic(c);
          fc.pre(points.every((p) => p.manifoldTemperature + dT <= 500)); // a temperature sensor's plausible range
          const result = calibrateVe(
            c,
            points.map((p) => ({ rpm: p.rpm, boostGauge: p.boostGauge, manifoldTemperature: p.manifoldTemperature + dT })),
          );
          result.veCurve.forEach((p, i) => {
            const expected = c.engine.veCurve[i].ve * Math.sqrt((points[i].manifoldTemperature + dT) / points[i].manifoldTemperature);
            expect(relDiff(p.ve, expected)).toBeLessThan(1e-9);
          });
          result.residuals.forEach((r) => expect(r.temperatureResidual!).toBeCloseTo(-dT, 6));
        }),
        { numRuns: 100 },
      );
    });
  });

  describe("rejects impossible measurements", () => {
    it("names a boost beyond the blower's dead-head at that speed", () => {
      const c = exampleCombination();
      try {
        // Demo Roots at 1500 rpm: dead-head ratio ≈ 2.7, far below the ≈ 4.5 that 350 kPa of boost needs.
        calibrateVe(c, [{ rpm: 1500, boostGauge: 350_000 }]);
        expect.unreachable();
      } catch (e) {
        expect(e).toBeInstanceOf(CalcInputError);
        expect((e as CalcInputError).issues).toEqual([
          { field: "measured.0.boostGauge", message: "The boost measured at 1500 rpm is beyond what this blower can hold at that speed (dead-head). Check the blower data and pulleys." },
        ]);
      }
    });

    it("names a boost that leaves no manifold pressure at all: −45 kPa gauge at 40 kPa ambient", () => {
      // Absolute = ambient + gauge: 40 kPa − 45 kPa = −5 kPa, no pressure (a log read against the wrong ambient).
      const c = exampleCombination();
      const high: Combination = { ...c, ambient: { ...c.ambient, pressure: 40_000 } };
      try {
        calibrateVe(high, [{ rpm: 3000, boostGauge: 10_000 }, { rpm: 2000, boostGauge: -45_000 }]);
        expect.unreachable();
      } catch (e) {
        expect(e).toBeInstanceOf(CalcInputError);
        expect((e as CalcInputError).issues).toEqual([{ field: "measured.1.boostGauge", message: "The boost measured at 2000 rpm gives a manifold pressure at or below zero" }]);
      }
    });

    it("names a boost that leaves exactly zero manifold pressure, with or without an intercooler's drop", () => {
      const c = exampleCombination();
      for (const intercooler of [null, { ...INTERCOOLER_DEMO_DEFAULTS }]) {
        const high: Combination = { ...c, intercooler, ambient: { ...c.ambient, pressure: 40_000 } };
        expect(() => calibrateVe(high, [{ rpm: 2000, boostGauge: -40_000 }])).toThrow("The boost measured at 2000 rpm gives a manifold pressure at or below zero");
      }
    });

    it("names a boost beyond dead-head as such with an intercooler, which keeps the charge temperature above zero", () => {
      // Beyond dead-head the blower delivers less than nothing; the model's discharge temperature
      // is then meaningless (below 0 K here), but the intercooler pulls the charge it computes back
      // towards the coolant's 35 °C, so a temperature check alone would not catch it.
      const c: Combination = { ...exampleCombination(), intercooler: { ...INTERCOOLER_DEMO_DEFAULTS } };
      expect(() => calibrateVe(c, [{ rpm: 1000, boostGauge: 250_000 }])).toThrow(/^The boost measured at 1000 rpm is beyond what this blower can hold at that speed \(dead-head\)/);
    });

    it("names a vacuum so deep that the model's charge would cool below 0 K, and not as a dead-head", () => {
      // Thin cold air (30 kPa, 220 K), a very lossy Roots (ηint 0.3) and rich fuel all evaporating
      // in the blower (afr 4): below ambient the blower gives work back, and at 6000 rpm a manifold
      // of 8 kPa absolute takes more heat from the charge than it has. The discharge temperature by
      // calc/README.md's energy balance, restated by hand: T2 = T1 + (PR − 1)·P1·Qs/(ηint·ρ1·Qd·cp)
      // − L·x/(afr·cp), with Qd = Qs + Ks·√(P1 − P2) below ambient (orifice law).
      const base = exampleCombination();
      const cold: Combination = {
        ...base,
        ambient: { ...base.ambient, pressure: 30_000, temperature: 220 },
        blower: { ...base.blower, internalEfficiency: 0.3 },
        fuel: { ...base.fuel, afr: 4, evaporatedInBlower: 1 },
      };
      const dischargeTemperature = (boost: number): number => {
        const p1 = 30_000 - cold.ambient.inletLoss;
        const pr = (30_000 + boost) / p1;
        const nb = 6000 * (cold.drive.crankPulleyDiameter / cold.drive.blowerPulleyDiameter) * (1 - cold.drive.beltSlip);
        const qs = (cold.blower.displacementPerRev * nb) / 60;
        const ks = ((1 - cold.blower.volumetricEfficiencyRef) * cold.blower.displacementPerRev * cold.blower.referenceRpm) / 60 / Math.sqrt(101_325 * 0.5);
        const qd = qs + ks * Math.sqrt(p1 - pr * p1);
        const cp = R_MODEL / KAPPA_MODEL;
        return 220 + ((pr - 1) * p1 * qs) / (0.3 * (p1 / (R_MODEL * 220)) * qd * cp) - (350e3 * 1) / (4 * cp);
      };
      expect(dischargeTemperature(-20_000)).toBeGreaterThan(0);
      expect(dischargeTemperature(-22_000)).toBeLessThan(0);
      expect(calibrateVe(cold, [{ rpm: 6000, boostGauge: -20_000 }]).veCurve[0].ve).toBeGreaterThan(0.2);
      expect(() => calibrateVe(cold, [{ rpm: 6000, boostGauge: -22_000 }])).toThrow(
        "The vacuum measured at 6000 rpm is deeper than the model can follow at that speed (its charge would cool below absolute zero). Check the measurement and the ambient pressure.",
      );
    });

    it("names a VE outside 0.2–2: a log taken with a blower of another size than the one described", () => {
      // calc/README.md steps 3–5: at a fixed pressure ratio and blower speed the swept flow and the
      // slip coefficient Ks both scale with displacement, so the delivered air, and the VE the
      // engine needs to swallow it, scale with it too: 0.87 × 3 = 2.61, 0.87 / 5 = 0.174 (by hand).
      const c = exampleCombination();
      const logged = boostCurve(c, [4000])[0];
      expect(logged.engineVolumetricEfficiency).toBe(0.87);
      const sized = (f: number): Combination => ({ ...c, blower: { ...c.blower, displacementPerRev: c.blower.displacementPerRev * f } });
      const refused = (f: number) => {
        try {
          calibrateVe(sized(f), [{ rpm: 4000, boostGauge: logged.boostGauge }]);
        } catch (e) {
          expect(e).toBeInstanceOf(CalcInputError);
          return (e as CalcInputError).issues;
        }
        return expect.unreachable("expected a CalcInputError");
      };
      const message = (ve: string) => `The boost measured at 4000 rpm implies a VE of ${ve}, outside 0.2–2. Check the blower data, the pulleys and the measurement.`;
      expect(refused(3)).toEqual([{ field: "measured.0.boostGauge", message: message("2.61") }]);
      expect(refused(1 / 5)).toEqual([{ field: "measured.0.boostGauge", message: message("0.17") }]);
      // Inside the bounds either side it is accepted: 0.87 × 2.2 = 1.914, 0.87 / 4 = 0.2175.
      expect(calibrateVe(sized(2.2), [{ rpm: 4000, boostGauge: logged.boostGauge }]).veCurve[0].ve).toBeCloseTo(1.914, 6);
      expect(calibrateVe(sized(1 / 4), [{ rpm: 4000, boostGauge: logged.boostGauge }]).veCurve[0].ve).toBeCloseTo(0.2175, 6);
    });

    it("keeps the caller's index in the field path after sorting by rpm", () => {
      const c = exampleCombination();
      try {
        calibrateVe(c, [{ rpm: 5000, boostGauge: 30_000 }, { rpm: 1500, boostGauge: 350_000 }]);
        expect.unreachable();
      } catch (e) {
        expect((e as CalcInputError).field).toBe("measured.1.boostGauge");
      }
    });
  });
});
