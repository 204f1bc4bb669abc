import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  blowerSpeed,
  boostCurve,
  calibrateVe,
  combinationSchema,
  driveRatio,
  engineAirflow,
  exampleCombination,
  idealRatioRuleManifoldPressure,
  pulleyForBoost,
  pulleySweep,
  solvePoint,
  type CombinationInput,
} from "@/calc";
import { inputError } from "./support/input-error";

describe("schemas", () => {
  describe("combination", () => {
    it("accepts the example combination and fills defaults", () => {
      const c = exampleCombination();
      const minimal: CombinationInput = {
        engine: c.engine,
        blower: { kind: "roots", displacementPerRev: 0.0016, builtInVolumeRatio: 1, maxRpm: 13_000, volumetricEfficiencyRef: 0.8, referenceRpm: 8000 },
        drive: { crankPulleyDiameter: 0.16, blowerPulleyDiameter: 0.08 },
        ambient: { pressure: 101_325, temperature: 298.15 },
        fuel: { afr: 12, bsfc: 8.5e-8 },
      };
      const parsed = combinationSchema.parse(minimal);
      // Defaults named in calc/README.md: internal 0.85, mechanical 0.95, belt slip 0.02.
      expect(parsed.blower.internalEfficiency).toBe(0.85);
      expect(parsed.blower.mechanicalEfficiency).toBe(0.95);
      expect(parsed.drive.beltSlip).toBe(0.02);
      expect(parsed.ambient.inletLoss).toBe(0);
      expect(parsed.intercooler).toBeNull();
      expect(parsed.fuel.evaporatedBeforeBlower).toBe(0);
    });

    it("refuses an inlet loss of half the ambient pressure or more, on that field, and takes one just under", () => {
      const c = exampleCombination();
      const at = (pressure: number, inletLoss: number) => ({ ...c, ambient: { ...c.ambient, pressure, inletLoss } });
      const e = inputError(() => solvePoint(at(30_000, 15_000), 3000));
      expect(e.issues).toEqual([{ field: "ambient.inletLoss", message: "Inlet pressure loss must be less than half the ambient pressure" }]);
      expect(combinationSchema.safeParse(at(30_000, 14_999)).success).toBe(true);
    });

    it("sorts the VE curve by rpm", () => {
      const c = exampleCombination();
      const shuffled = { ...c, engine: { ...c.engine, veCurve: [...c.engine.veCurve].reverse() } };
      expect(combinationSchema.parse(shuffled).engine.veCurve.map((p) => p.rpm)).toEqual(c.engine.veCurve.map((p) => p.rpm));
    });

    it("names the field and its range for a blower pulley out of bounds", () => {
      const c = exampleCombination();
      const e = inputError(() => solvePoint({ ...c, drive: { ...c.drive, blowerPulleyDiameter: 0.6 } }, 3000));
      expect(e.field).toBe("drive.blowerPulleyDiameter");
      expect(e.message).toBe("Blower pulley diameter must be between 0.03 and 0.5 m");
    });

    it("rejects any blower pulley outside 0.03–0.5 m, naming the field", () => {
      const c = exampleCombination();
      fc.assert(
        fc.property(fc.oneof(fc.double({ min: -1, max: 0.0299, noNaN: true }), fc.double({ min: 0.5001, max: 10, noNaN: true })), (d) => {
          expect(inputError(() => solvePoint({ ...c, drive: { ...c.drive, blowerPulleyDiameter: d } }, 3000)).field).toBe("drive.blowerPulleyDiameter");
        }),
        { numRuns: 50 },
      );
    });

    it("rejects a Roots blower with a built-in volume ratio other than 1", () => {
      const c = exampleCombination();
      expect(inputError(() => solvePoint({ ...c, blower: { ...c.blower, builtInVolumeRatio: 1.5 } }, 3000)).field).toBe("blower.builtInVolumeRatio");
    });

    it("rejects a VE curve with a repeated engine speed, naming the point", () => {
      const c = exampleCombination();
      const veCurve = [{ rpm: 2000, ve: 0.8 }, { rpm: 2000, ve: 0.85 }];
      expect(inputError(() => solvePoint({ ...c, engine: { ...c.engine, veCurve } }, 3000)).field).toBe("engine.veCurve.1.rpm");
    });

    it("rejects an empty VE curve", () => {
      const c = exampleCombination();
      expect(inputError(() => solvePoint({ ...c, engine: { ...c.engine, veCurve: [] } }, 3000)).field).toBe("engine.veCurve");
    });

    it("wants both injector count and flow, or neither", () => {
      const c = exampleCombination();
      expect(inputError(() => solvePoint({ ...c, fuel: { ...c.fuel, injectorFlow: null } }, 3000)).field).toBe("fuel.injectorFlow");
      // The flow without a count names the count: the field the person left out.
      const noCount = inputError(() => solvePoint({ ...c, fuel: { ...c.fuel, injectorCount: null } }, 3000));
      expect(noCount.issues).toEqual([{ field: "fuel.injectorCount", message: "Give both the number of injectors and the flow of one injector, or neither" }]);
      expect(solvePoint({ ...c, fuel: { ...c.fuel, injectorCount: null, injectorFlow: null } }, 3000).injectorDuty).toBeNull();
    });

    it("rejects a missing or unknown blower kind", () => {
      const c = exampleCombination();
      const { kind: _kind, ...rest } = c.blower;
      expect(inputError(() => solvePoint({ ...c, blower: rest } as unknown as CombinationInput, 3000)).field).toBe("blower.kind");
      // @ts-expect-error a blower kind must be 'roots' or 'twin-screw'
      const wrongKind: CombinationInput = { ...c, blower: { ...c.blower, kind: "centrifugal" } };
      expect(inputError(() => solvePoint(wrongKind, 3000)).field).toBe("blower.kind");
    });

    it("lists every failing field, not only the first", () => {
      const c = exampleCombination();
      const e = inputError(() =>
        solvePoint({ ...c, engine: { ...c.engine, displacement: -1 }, ambient: { ...c.ambient, temperature: 10 } }, 3000),
      );
      expect(e.issues.map((i) => i.field).sort()).toEqual(["ambient.temperature", "engine.displacement"]);
    });
  });

  describe("entry-point arguments", () => {
    const c = exampleCombination();
    it("engine speed", () => {
      expect(inputError(() => solvePoint(c, 50)).field).toBe("rpm");
      expect(inputError(() => solvePoint(c, Number.NaN)).field).toBe("rpm");
      expect(inputError(() => blowerSpeed(c, -1)).field).toBe("rpm");
      expect(inputError(() => boostCurve(c, [3000, 99_999])).field).toBe("rpms.1");
    });
    it("pulley diameters and targets", () => {
      expect(inputError(() => pulleySweep(c, 4000, [0.08, 0.01])).field).toBe("blowerPulleyDiameters.1");
      expect(inputError(() => pulleyForBoost(c, 4000, 1e7)).field).toBe("targetBoostGauge");
      expect(inputError(() => pulleyForBoost(c, 4000, 50_000, [0.08, 2])).field).toBe("stockDiameters.1");
    });
    it("measurements", () => {
      expect(inputError(() => calibrateVe(c, [])).field).toBe("measured");
      expect(inputError(() => calibrateVe(c, [{ rpm: 3000, boostGauge: Number.POSITIVE_INFINITY }])).field).toBe("measured.0.boostGauge");
      expect(inputError(() => calibrateVe(c, [{ rpm: 3000, boostGauge: 1000 }, { rpm: 3000, boostGauge: 2000 }])).issues).toEqual([
        { field: "measured.1.rpm", message: "3000 rpm is measured twice" },
      ]);
    });
    it("small helpers", () => {
      expect(inputError(() => driveRatio(0, 0.1)).field).toBe("crankDiameter");
      expect(inputError(() => engineAirflow(0.005, 3000, -0.1)).field).toBe("ve");
      // Not a number at all gets the same message as a number that is not positive.
      expect(inputError(() => driveRatio("0.2" as unknown as number, 0.1)).issues).toEqual([
        { field: "crankDiameter", message: "Crank pulley diameter must be a positive number in m" },
      ]);
      expect(inputError(() => engineAirflow(0.005, 0, 0.9)).issues).toEqual([{ field: "rpm", message: "Engine speed must be a positive number in rpm" }]);
      expect(inputError(() => idealRatioRuleManifoldPressure(c, 0)).field).toBe("rpm");
    });
  });
});
