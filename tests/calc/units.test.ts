import { describe, expect, it } from "vitest";
import fc from "fast-check";
import convert from "convert-units";
import * as U from "@/calc";
import { relDiff } from "./support/arbitraries";

// convert-units carries most of its factors to about six significant figures.
const CU_TOL = 1e-5;
const positive = fc.double({ min: 1e-3, max: 1e5, noNaN: true });

describe("units", () => {
  describe("factors against the convert-units package", () => {
    it("length: in and mm to m", () => {
      fc.assert(
        fc.property(positive, (v) => {
          expect(relDiff(U.inToM(v), convert(v).from("in").to("m"))).toBeLessThan(CU_TOL);
          expect(relDiff(U.mmToM(v), convert(v).from("mm").to("m"))).toBeLessThan(CU_TOL);
        }),
      );
    });

    it("volume: in³ and L to m³", () => {
      fc.assert(
        fc.property(positive, (v) => {
          expect(relDiff(U.in3ToM3(v), convert(v).from("in3").to("m3"))).toBeLessThan(CU_TOL);
          expect(relDiff(U.litresToM3(v), convert(v).from("l").to("m3"))).toBeLessThan(CU_TOL);
        }),
      );
    });

    it("pressure: psi, kPa and bar to Pa", () => {
      fc.assert(
        fc.property(positive, (v) => {
          expect(relDiff(U.psiToPa(v), convert(v).from("psi").to("Pa"))).toBeLessThan(CU_TOL);
          expect(relDiff(U.kPaToPa(v), convert(v).from("kPa").to("Pa"))).toBeLessThan(CU_TOL);
          expect(relDiff(U.barToPa(v), convert(v).from("bar").to("Pa"))).toBeLessThan(CU_TOL);
        }),
      );
    });

    it("temperature: °F and °C to K", () => {
      fc.assert(
        fc.property(fc.double({ min: -100, max: 500, noNaN: true }), (v) => {
          expect(U.fToK(v)).toBeCloseTo(convert(v).from("F").to("K"), 6);
          expect(U.cToK(v)).toBeCloseTo(convert(v).from("C").to("K"), 9);
        }),
      );
    });

    it("power: kW to W", () => {
      fc.assert(
        fc.property(positive, (v) => {
          expect(relDiff(U.kWToW(v), convert(v).from("kW").to("W"))).toBeLessThan(CU_TOL);
        }),
      );
    });

    it("volume flow: cfm and m³/min to m³/s", () => {
      fc.assert(
        fc.property(positive, (v) => {
          expect(relDiff(U.cfmToM3s(v), convert(v).from("ft3/min").to("m3/s"))).toBeLessThan(CU_TOL);
          expect(relDiff(U.m3PerMinToM3s(v), convert(v).from("m3/min").to("m3/s"))).toBeLessThan(CU_TOL);
        }),
      );
    });

    it("mass flow: lb/h to kg/s", () => {
      fc.assert(
        fc.property(positive, (v) => {
          const viaPackage = convert(v).from("lb").to("kg") / 3600;
          expect(relDiff(U.lbPerHourToKgS(v), viaPackage)).toBeLessThan(CU_TOL);
        }),
      );
    });
  });

  describe("factors against NIST SP 811 (Appendix B)", () => {
    it("1 lbf·ft = 1.355818 N·m", () => {
      // source: NIST SP 811 (2008), App. B.8: pound-force foot → newton meter 1.355 818
      expect(U.lbFtToNm(1)).toBeCloseTo(1.355818, 6);
    });
    it("1 hp (550 ft·lbf/s) = 745.6999 W", () => {
      // source: NIST SP 811 (2008), App. B.8: horsepower (550 ft·lbf/s) → watt 745.6999
      expect(U.hpToW(1)).toBeCloseTo(745.6999, 4);
    });
    it("1 lb = 0.45359237 kg exactly and 1 in = 0.0254 m exactly", () => {
      // source: NIST SP 811 (2008), App. B.8 (international pound and inch, exact by definition)
      expect(U.POUND).toBe(0.45359237);
      expect(U.INCH).toBe(0.0254);
    });
    it("1 psi = 6894.757 Pa", () => {
      // source: NIST SP 811 (2008), App. B.8: pound-force per square inch → pascal 6.894 757 E+03
      expect(U.psiToPa(1)).toBeCloseTo(6894.757, 3);
    });
    it("BSFC: 0.5 lb/(hp·h) in kg/J from the exact pound and NIST's horsepower", () => {
      // source: NIST SP 811 factors (lb = 0.45359237 kg, hp = 745.6999 W), 1 h = 3600 s
      expect(relDiff(U.bsfcImperialToSI(0.5), (0.5 * 0.45359237) / (745.6999 * 3600))).toBeLessThan(1e-7);
      // source: 1 lb/(hp·h) ≈ 608.3 g/(kW·h), common conversion (from memory)
      expect(U.bsfcSIToMetric(U.bsfcImperialToSI(1))).toBeCloseTo(608.3, 0);
    });
    it("injector flow: lb/h × about 10.5 = cc/min for gasoline of 0.72 kg/L", () => {
      // source: the injector trade's rule of thumb cc/min ≈ 10.5 × lb/h (common practice, no published source)
      expect(U.kgSToCcPerMin(U.lbPerHourToKgS(1), 0.72)).toBeCloseTo(10.5, 1);
    });
  });

  describe("every entry of the display unit table, both directions", () => {
    // One display unit in SI, per kind and system. source: NIST SP 811 (2008), Appendix B.8/B.9
    // factors, seven significant figures, hence 1e-6 relative (exact definitions where NIST
    // marks them exact); where convert-units has the unit it is asked too (its factors carry
    // about six figures, its cubic inch only five: CU_TOL). Injector cc/min uses the model's gasoline density
    // 0.74 kg/L (from memory) with NIST's 1 cm³ = 1e-6 m³.
    const TABLE: [U.QuantityKind, U.UnitSystem, number, [string, string]?][] = [
      ["length-small", "imperial", 0.0254, ["in", "m"]],
      ["length-small", "metric", 0.001, ["mm", "m"]],
      ["altitude", "imperial", 0.3048, ["ft", "m"]],
      ["altitude", "metric", 1],
      ["displacement", "imperial", 1.638706e-5, ["in3", "m3"]],
      ["displacement", "metric", 0.001, ["l", "m3"]],
      ["blower-displacement", "imperial", 1.638706e-5, ["in3", "m3"]],
      ["blower-displacement", "metric", 0.001, ["l", "m3"]],
      ["pressure", "imperial", 6894.757, ["psi", "Pa"]],
      ["pressure", "metric", 1000, ["kPa", "Pa"]],
      ["power", "imperial", 745.6999],
      ["power", "metric", 1000, ["kW", "W"]],
      ["torque", "imperial", 1.355818],
      ["torque", "metric", 1],
      ["airflow", "imperial", 4.719474e-4, ["ft3/min", "m3/s"]],
      ["airflow", "metric", 1 / 60, ["m3/min", "m3/s"]],
      ["speed", "imperial", 1],
      ["speed", "metric", 1],
      ["fuel-flow", "imperial", 1.259979e-4],
      ["fuel-flow", "metric", 1 / 3600],
      ["injector-flow", "imperial", 1.259979e-4],
      ["injector-flow", "metric", (1e-6 * 740) / 60],
      ["bsfc", "imperial", 0.45359237 / (745.6999 * 3600)],
      ["bsfc", "metric", 1e-3 / 3.6e6],
    ];
    it("covers every kind in both systems", () => {
      // temperature is affine: pinned at two points in the next test
      const covered = new Set([...TABLE.map(([k, sys]) => `${k}/${sys}`), "temperature/imperial", "temperature/metric"]);
      for (const k of U.QUANTITY_KINDS) for (const sys of ["imperial", "metric"]) expect(covered.has(`${k}/${sys}`), `${k}/${sys}`).toBe(true);
    });
    for (const [kind, system, si, cu] of TABLE) {
      it(`${kind} (${system}, ${U.unitLabel(kind, system)}): 1 unit = ${si} SI`, () => {
        // Away from 1 so that a factor applied the wrong way round cannot pass.
        expect(relDiff(U.toSI(kind, 7, system), 7 * si)).toBeLessThan(1e-6);
        expect(relDiff(U.fromSI(kind, 7 * si, system), 7)).toBeLessThan(1e-6);
        expect(relDiff(U.formatQuantity(kind, 7 * si, system).value, 7)).toBeLessThan(1e-6);
        if (cu) expect(relDiff(U.toSI(kind, 7, system), convert(7).from(cu[0] as never).to(cu[1] as never))).toBeLessThan(CU_TOL);
      });
    }
    // The choices beyond the two presets, each as a person's units with that one kind changed.
    // source: NIST SP 811 (2008), B.8/B.9: 1 cm³ = 1e-6 m³, 1 bar = 1e5 Pa, 1 h = 3600 s (exact); convert-units agrees.
    const EXTRA: [U.QuantityKind, string, number, [string, string]][] = [
      ["displacement", "cc", 1e-6, ["cm3", "m3"]],
      ["blower-displacement", "cc", 1e-6, ["cm3", "m3"]],
      ["pressure", "bar", 1e5, ["bar", "Pa"]],
      ["airflow", "m3h", 1 / 3600, ["m3/h", "m3/s"]],
    ];
    it("covers every unit a person can choose", () => {
      const presetIds = (k: U.QuantityKind) => [U.UNIT_PRESETS.imperial[k], U.UNIT_PRESETS.metric[k]];
      for (const k of U.QUANTITY_KINDS) {
        for (const u of U.unitChoices(k)) expect(presetIds(k).includes(u.id) || EXTRA.some(([ek, id]) => ek === k && id === u.id), `${k}/${u.id}`).toBe(true);
      }
    });
    for (const [kind, unitId, si, cu] of EXTRA) {
      const units = U.resolveUnits("metric", { [kind]: unitId });
      it(`${kind} (${U.unitLabel(kind, units)}): 1 unit = ${si} SI`, () => {
        expect(relDiff(U.toSI(kind, 7, units), 7 * si)).toBeLessThan(1e-12);
        expect(relDiff(U.fromSI(kind, 7 * si, units), 7)).toBeLessThan(1e-12);
        expect(relDiff(U.toSI(kind, 7, units), convert(7).from(cu[0] as never).to(cu[1] as never))).toBeLessThan(CU_TOL);
      });
    }
    it("temperature: °F and °C at the ice and steam points", () => {
      // source: NIST SP 811, B.8: T(K) = t(°C) + 273.15 = (t(°F) + 459.67)/1.8, exact; convert-units agrees
      for (const [f, c, k] of [[32, 0, 273.15], [212, 100, 373.15], [-40, -40, 233.15]]) {
        expect(U.toSI("temperature", f, "imperial")).toBeCloseTo(k, 9);
        expect(U.toSI("temperature", c, "metric")).toBeCloseTo(k, 9);
        expect(U.fromSI("temperature", k, "imperial")).toBeCloseTo(f, 9);
        expect(U.fromSI("temperature", k, "metric")).toBeCloseTo(c, 9);
        expect(U.toSI("temperature", f, "imperial")).toBeCloseTo(convert(f).from("F").to("K"), 6);
      }
    });
  });

  describe("a person's units", () => {
    it("resolves a preset with per-kind choices, ignoring unknown kinds and units", () => {
      const mixed = U.resolveUnits("imperial", { displacement: "L", pressure: "bar", torque: "furlong", nonsense: "x" });
      expect(U.unitLabel("displacement", mixed)).toBe("L");
      expect(U.unitLabel("pressure", mixed)).toBe("bar");
      expect(U.unitLabel("torque", mixed)).toBe("lb·ft");
      // The unknown ids are dropped from the record itself, not only hidden by the label's fallback.
      expect(mixed).toEqual({ ...U.UNIT_PRESETS.imperial, displacement: "L", pressure: "bar" });
      expect(U.unitLabel("temperature", mixed)).toBe("°F");
      expect(U.presetOf(mixed)).toBeNull();
      expect(U.presetOf(U.resolveUnits("metric", {}))).toBe("metric");
      expect(U.nearestPreset(mixed)).toBe("imperial");
      // A tie goes to imperial: six kinds in each preset's unit, plus rpm, which is in both.
      const tie = U.resolveUnits("imperial", { "length-small": "mm", altitude: "m", displacement: "L", "blower-displacement": "L", pressure: "kPa", temperature: "C" });
      expect(U.nearestPreset(tie)).toBe("imperial");
      expect(U.nearestPreset(U.resolveUnits("imperial", { "length-small": "mm", altitude: "m", displacement: "L", "blower-displacement": "L", pressure: "kPa", temperature: "C", power: "kW" }))).toBe("metric");
    });

    it("a choice survives its link parameter (property)", () => {
      const unitsArb = fc.record(Object.fromEntries(U.QUANTITY_KINDS.map((k) => [k, fc.constantFrom(...U.unitChoices(k).map((u) => u.id))]))) as unknown as fc.Arbitrary<U.Units>;
      fc.assert(
        fc.property(unitsArb, (units) => {
          const back = U.unitsFromParam(U.unitsToParam(units));
          for (const k of U.QUANTITY_KINDS) expect(U.unitOfKind(k, back).id).toBe(units[k]);
        }),
      );
      expect(U.unitsToParam("metric")).toBe("metric");
      expect(U.unitsToParam(U.resolveUnits("imperial", { displacement: "L" }))).toBe("imperial~displacement.L");
      expect(U.unitsFromParam("junk")).toBe("imperial");
    });

    it("every unit choice round-trips through SI", () => {
      for (const k of U.QUANTITY_KINDS) {
        for (const u of U.unitChoices(k)) {
          for (const v of [-1234.5, 0.75, 98765]) expect(relDiff(u.fromSI(u.toSI(v)), v)).toBeLessThan(1e-12);
        }
      }
    });
  });

  describe("round trips", () => {
    it("every quantity kind round-trips through SI in both systems", () => {
      fc.assert(
        fc.property(
          fc.constantFrom(...U.QUANTITY_KINDS),
          fc.constantFrom<U.UnitSystem>("imperial", "metric"),
          // Magnitudes 1 to 1e6 of either sign, never near zero where any factor would pass.
          fc.double({ min: 1, max: 1e6, noNaN: true }),
          fc.boolean(),
          (kind, system, magnitude, negative) => {
            const v = negative ? -magnitude : magnitude;
            const back = U.fromSI(kind, U.toSI(kind, v, system), system);
            expect(relDiff(back, v)).toBeLessThan(1e-12);
          },
        ),
      );
    });

    it("gauge and absolute pressure helpers invert each other", () => {
      fc.assert(
        fc.property(fc.double({ min: -5e4, max: 4e5, noNaN: true }), fc.double({ min: 3e4, max: 1.1e5, noNaN: true }), (g, p0) => {
          expect(U.absoluteToGauge(U.gaugeToAbsolute(g, p0), p0)).toBeCloseTo(g, 6);
        }),
      );
    });

    it("cc/min round-trips at any fuel density", () => {
      fc.assert(
        fc.property(positive, fc.double({ min: 0.6, max: 1.0, noNaN: true }), (v, rho) => {
          expect(relDiff(U.kgSToCcPerMin(U.ccPerMinToKgS(v, rho), rho), v)).toBeLessThan(1e-12);
        }),
      );
    });
  });

  describe("display helpers", () => {
    it("label each kind in each system", () => {
      expect(U.formatQuantity("pressure", U.psiToPa(10), "imperial")).toEqual({ value: expect.closeTo(10, 12), unit: "psi" });
      expect(U.formatQuantity("pressure", 50_000, "metric")).toEqual({ value: 50, unit: "kPa" });
      expect(U.formatQuantity("temperature", 373.15, "imperial").value).toBeCloseTo(212, 9); // source: boiling point of water at 1 atm, 212 °F
      expect(U.formatQuantity("temperature", 373.15, "metric")).toEqual({ value: expect.closeTo(100, 9), unit: "°C" });
      expect(U.unitLabel("length-small", "imperial")).toBe("in");
      expect(U.unitLabel("length-small", "metric")).toBe("mm");
      expect(U.unitLabel("displacement", "imperial")).toBe("in³");
      expect(U.unitLabel("displacement", "metric")).toBe("L");
      expect(U.unitLabel("blower-displacement", "imperial")).toBe("in³/rev");
      expect(U.unitLabel("blower-displacement", "metric")).toBe("L/rev");
      expect(U.unitLabel("power", "imperial")).toBe("hp");
      expect(U.unitLabel("power", "metric")).toBe("kW");
      expect(U.unitLabel("torque", "imperial")).toBe("lb·ft");
      expect(U.unitLabel("torque", "metric")).toBe("N·m");
      expect(U.unitLabel("airflow", "imperial")).toBe("cfm");
      expect(U.unitLabel("airflow", "metric")).toBe("m³/min");
      expect(U.unitLabel("speed", "metric")).toBe("rpm");
      expect(U.unitLabel("fuel-flow", "imperial")).toBe("lb/h");
      expect(U.unitLabel("fuel-flow", "metric")).toBe("kg/h");
    });

    it("read a form field in the user's units: 3.0 in is 76.2 mm", () => {
      // source: 1 in = 25.4 mm exactly (NIST SP 811)
      expect(U.toSI("length-small", 3, "imperial")).toBeCloseTo(0.0762, 12);
      expect(U.fromSI("length-small", 0.0762, "metric")).toBeCloseTo(76.2, 9);
    });
  });
});

describe("roundInward", () => {
  const { roundInward } = U;
  it("rounds a converted limit towards the inside of its range, to a clean decimal", () => {
    // 0.03 m = 1.1811 in and 0.5 m = 19.685 in (1 in = 0.0254 m, NIST SP 811, App. B)
    expect(roundInward(0.03 / 0.0254, -2, "up")).toBe(1.19);
    expect(roundInward(0.5 / 0.0254, -1, "down")).toBe(19.6);
    // 0.1 L = 6.1024 in³ (1 in³ = 16.387064 cm³, NIST SP 811): a minimum of 6.2, exactly
    expect(roundInward(100 / 16.387064, -1, "up")).toBe(6.2);
    expect(roundInward(1220.47, 1, "down")).toBe(1220);
    expect(roundInward(30, -1, "up")).toBe(30);
    // A value already on the grid comes back exactly, at tenths and hundredths: scaled by 10 and
    // 100, not divided by 0.1 and 0.01 (0.7 / 0.1 = 6.999…, which would give 0.7000000000000001).
    expect(roundInward(0.7, -1, "up")).toBe(0.7);
    expect(roundInward(4.35, -2, "down")).toBe(4.35);
    expect(roundInward(1234, 2, "up")).toBe(1300);
    expect(roundInward(1234, 2, "down")).toBe(1200);
  });

  it("lands inside the range, on the grid, within one step (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.integer({ min: -4, max: 3 }), fc.constantFrom("up" as const, "down" as const), (v, e, dir) => {
        const r = roundInward(v, e, dir);
        const step = 10 ** e;
        const tol = 1e-9 * Math.max(1, Math.abs(v) / step) * step;
        if (dir === "up") expect(r).toBeGreaterThanOrEqual(v - tol);
        else expect(r).toBeLessThanOrEqual(v + tol);
        expect(Math.abs(r - v)).toBeLessThan(step + tol);
        const n = r / step; // a whole number of steps, up to float error in the division
        expect(Math.abs(n - Math.round(n))).toBeLessThan(1e-6 + 1e-12 * Math.abs(n));
      }),
    );
  });
});
