// The planner's form: user units in, SI out, and calc's rules as field errors in the user's units.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { combinationSchema, QUANTITY_KINDS, unitChoices, type Combination, type Units, type UnitSystem } from "@/calc";
import { convertForm, localizeMessage, sameSpec, toForm, toSpec, unitOf, validateForm } from "@/lib/combinations/form-model";
import { workTruckV6 } from "@/lib/combinations/demo-specs";
import { combinationArb } from "@/tests/calc/support/arbitraries";

const demo: Combination = combinationSchema.parse(workTruckV6);

describe("form values and SI", () => {
  it("shows the demo's blower and crank pulleys in inches and millimetres", () => {
    // source: the demo seed defines 3.4 in and 6.0 in; 1 in = 25.4 mm exactly (NIST SP 811)
    const imperial = toForm(demo, "imperial");
    expect(imperial.drive.blowerPulleyDiameter).toBe(3.4);
    expect(imperial.drive.crankPulleyDiameter).toBe(6);
    const metric = toForm(demo, "metric");
    expect(metric.drive.blowerPulleyDiameter).toBeCloseTo(86.36, 6);
    expect(metric.drive.crankPulleyDiameter).toBeCloseTo(152.4, 6);
    // source: 4.3 L = 4.3 / 0.016387064 in³ = 262.40 in³ (1 in³ = 16.387064 cm³, NIST SP 811)
    expect(imperial.engine.displacement).toBeCloseTo(262.4, 1);
    expect(metric.engine.displacement).toBeCloseTo(4.3, 9);
  });

  it("round-trips a form in either system to the same figures in its boxes", () => {
    // Boxes show a unit's input precision, so without the stored spec to fall back on the SI
    // value may move by up to half a last digit, but the figures shown come back unchanged.
    for (const system of ["imperial", "metric"] as const) {
      const f = toForm(demo, system);
      const back = combinationSchema.parse(toSpec(f, system));
      expect(toForm(back, system)).toEqual(f);
    }
  });

  it("shows sensible precision in the boxes, not conversion noise", () => {
    // source: 101 325 Pa = 14.6959 psi (1 psi = 6 894.757 Pa, NIST SP 811, App. B); the box shows 14.7.
    const f = toForm(demo, "imperial");
    expect(f.ambient.pressure).toBe(14.7);
    // source: 4.3 L = 262.40 in³ (1 in³ = 16.387064 cm³, NIST SP 811); shown to 0.1 in³.
    expect(f.engine.displacement).toBe(262.4);
    // Every quantity box has at most its unit's input digits (author's choice per unit, lib/units/format.ts).
    const decimals = (v: number) => (String(v).split(".")[1] ?? "").length;
    for (const system of ["imperial", "metric"] as const) {
      const g = toForm(demo, system);
      expect(decimals(g.ambient.pressure)).toBeLessThanOrEqual(2);
      expect(decimals(g.fuel.bsfc)).toBeLessThanOrEqual(3);
      expect(decimals(g.intercooler.pressureDrop)).toBeLessThanOrEqual(2);
    }
  });

  it("keeps every untouched stored value exactly, in either system (property)", () => {
    fc.assert(
      fc.property(combinationArb, fc.constantFrom("imperial" as const, "metric" as const), (c, system) => {
        const saved = combinationSchema.parse(c);
        expect(combinationSchema.parse(toSpec(toForm(saved, system), system, saved))).toEqual(saved);
      }),
      { numRuns: 300 },
    );
    // Without the stored values to fall back on, the unit round trip alone is not exact (5.0 L
    // through in³ at six figures), which is what keeping them is for.
    const viaInches = toSpec(toForm(demo, "imperial"), "imperial").engine.displacement;
    expect(viaInches).not.toBe(demo.engine.displacement);
    expect(toSpec(toForm(demo, "imperial"), "imperial", demo).engine.displacement).toBe(demo.engine.displacement);
  });

  it("takes an edited field from the form and leaves the rest as stored", () => {
    const f = toForm(demo, "imperial");
    f.drive.blowerPulleyDiameter = 3.3;
    f.engine.veCurve[1].ve = 88;
    const spec = combinationSchema.parse(toSpec(f, "imperial", demo));
    // source: 3.3 in × 0.0254 m/in (NIST SP 811)
    expect(spec.drive.blowerPulleyDiameter).toBeCloseTo(0.08382, 12);
    expect(spec.engine.veCurve[1].ve).toBeCloseTo(0.88, 12);
    expect({ ...spec, drive: { ...spec.drive, blowerPulleyDiameter: 0 }, engine: { ...spec.engine, veCurve: spec.engine.veCurve.filter((_, i) => i !== 1) } }).toEqual({
      ...demo,
      drive: { ...demo.drive, blowerPulleyDiameter: 0 },
      engine: { ...demo.engine, veCurve: demo.engine.veCurve.filter((_, i) => i !== 1) },
    });
  });

  it("turns percentages into fractions and a typed pulley size into metres", () => {
    const f = toForm(demo, "imperial");
    f.engine.veCurve[0].ve = 90;
    f.drive.blowerPulleyDiameter = 3.0;
    f.drive.beltSlip = 3;
    const spec = toSpec(f, "imperial");
    expect(spec.engine.veCurve[0].ve).toBeCloseTo(0.9, 12);
    // source: 3.0 in × 0.0254 m/in = 0.0762 m (exact)
    expect(spec.drive.blowerPulleyDiameter).toBeCloseTo(0.0762, 12);
    expect(spec.drive.beltSlip).toBeCloseTo(0.03, 12);
  });

  it("converts imperial to metric and back without drift", () => {
    const f = toForm(demo, "imperial");
    // A typed pulley size survives in → mm → in without the stored spec: mm boxes keep 0.01 mm.
    const typed = { ...f, drive: { ...f.drive, blowerPulleyDiameter: 3.375 } };
    expect(convertForm(convertForm(typed, "imperial", "metric"), "metric", "imperial").drive.blowerPulleyDiameter).toBe(3.375);
    const again = convertForm(convertForm(f, "imperial", "metric", demo), "metric", "imperial", demo);
    expect(again).toEqual(f);
    expect(toSpec(again, "imperial", demo)).toEqual(toSpec(f, "imperial", demo));
    // source: 25 °C = 77 °F (°F = °C × 9/5 + 32)
    expect(f.ambient.temperature).toBeCloseTo(77, 6);
  });

  it("leaves the stored spec byte-identical after a unit round trip, for any combination", () => {
    fc.assert(
      fc.property(combinationArb, fc.constantFrom<UnitSystem>("imperial", "metric"), (input, start) => {
        const spec = combinationSchema.parse(input);
        const other: UnitSystem = start === "imperial" ? "metric" : "imperial";
        const f = toForm(spec, start);
        const back = convertForm(convertForm(f, start, other, spec), other, start, spec);
        expect(back).toEqual(f);
        const v = validateForm(back, start, spec);
        if (v.ok) expect(JSON.stringify(v.spec)).toBe(JSON.stringify(spec));
      }),
      { numRuns: 60 },
    );
  });

  it("leaves the stored spec byte-identical through any chain of mixed units (property)", () => {
    const unitsArb = fc.record(Object.fromEntries(QUANTITY_KINDS.map((k) => [k, fc.constantFrom(...unitChoices(k).map((u) => u.id))]))) as unknown as fc.Arbitrary<Units>;
    fc.assert(
      fc.property(combinationArb, fc.array(unitsArb, { minLength: 1, maxLength: 4 }), (input, chain) => {
        const spec = combinationSchema.parse(input);
        const start = chain[0];
        const f = toForm(spec, start);
        let cur = f;
        let from: UnitSystem = start;
        for (const to of [...chain.slice(1), "metric" as const, "imperial" as const, start]) {
          cur = convertForm(cur, from, to, spec);
          from = to;
        }
        expect(cur).toEqual(f);
        const v = validateForm(cur, start, spec);
        if (v.ok) expect(JSON.stringify(v.spec)).toBe(JSON.stringify(spec));
      }),
      { numRuns: 80 },
    );
  });

  it("leaves out a switched-off intercooler and injectors", () => {
    const f = toForm(demo, "metric");
    expect(f.intercoolerOn).toBe(false);
    expect(toSpec(f, "metric").intercooler).toBeNull();
    f.intercoolerOn = true;
    expect(toSpec(f, "metric").intercooler).toMatchObject({ effectiveness: expect.any(Number) });
    f.fuel.injectorsOn = false;
    expect(toSpec(f, "metric").fuel.injectorCount).toBeNull();
  });

  it("notices a 0.1 in pulley change as an unsaved edit, and a unit round trip as none", () => {
    const f = toForm(demo, "imperial");
    expect(sameSpec(toSpec(f, "imperial", demo), demo)).toBe(true);
    const round = convertForm(convertForm(f, "imperial", "metric", demo), "metric", "imperial", demo);
    expect(sameSpec(toSpec(round, "imperial", demo), demo)).toBe(true);
    f.drive.blowerPulleyDiameter = 3.3;
    expect(sameSpec(toSpec(f, "imperial", demo), demo)).toBe(false);
  });
});

/** Every optional refinement of calc's schema, each either left out or given (calc/README.md, "Refinements"). */
const refinementsArb = fc.record(
  {
    chargeTemperatureExponent: fc.double({ min: 0, max: 1, noNaN: true }),
    compressionRatio: fc.option(fc.double({ min: 4, max: 20, noNaN: true }), { nil: null }),
    exhaustBackPressure: fc.double({ min: 0, max: 100_000, noNaN: true }),
    inletRestriction: fc.option(
      fc.record({ ratedFlow: fc.double({ min: 0.01, max: 2, noNaN: true }), ratingDepression: fc.double({ min: 500, max: 30_000, noNaN: true }) }, { requiredKeys: ["ratedFlow"] }),
      { nil: null },
    ),
    evaporatedInBlower: fc.double({ min: 0, max: 0.3, noNaN: true }),
    evaporatedInPort: fc.double({ min: 0, max: 0.3, noNaN: true }),
  },
  { requiredKeys: [] },
);

/** A stored combination with the given refinements put where calc's schema keeps them. */
function withRefinements(c: Combination, r: Partial<Record<string, unknown>>): Combination {
  const pick = (keys: string[]) => Object.fromEntries(keys.filter((k) => k in r).map((k) => [k, r[k]]));
  return combinationSchema.parse({
    ...c,
    engine: { ...c.engine, ...pick(["chargeTemperatureExponent", "compressionRatio", "exhaustBackPressure"]) },
    ambient: { ...c.ambient, ...pick(["inletRestriction"]) },
    fuel: { ...c.fuel, ...pick(["evaporatedInBlower", "evaporatedInPort"]) },
  });
}

describe("the model's optional refinements in the planner", () => {
  // Invented values inside calc's bounds (calc/schema.ts): every optional field given at once.
  const full = withRefinements(demo, {
    chargeTemperatureExponent: 0.42,
    compressionRatio: 9.25,
    exhaustBackPressure: 12_345.6,
    inletRestriction: { ratedFlow: 0.3777, ratingDepression: 4321 },
    evaporatedInBlower: 0.17,
    evaporatedInPort: 0.23,
  });

  it("saves a spec with every optional field byte-identical, in either system and after a unit switch", () => {
    expect(full.engine.compressionRatio).toBe(9.25); // the fixture really carries them
    for (const system of ["imperial", "metric"] as const) {
      const other: UnitSystem = system === "imperial" ? "metric" : "imperial";
      const f = toForm(full, system);
      for (const form of [f, convertForm(convertForm(f, system, other, full), other, system, full)]) {
        const v = validateForm(form, system, full);
        expect(v.ok && JSON.stringify(v.spec)).toBe(JSON.stringify(full));
      }
    }
  });

  it("keeps any mix of given, left-out and null refinements exactly (property)", () => {
    fc.assert(
      fc.property(combinationArb, refinementsArb, fc.constantFrom<UnitSystem>("imperial", "metric"), (c, r, system) => {
        const saved = withRefinements(combinationSchema.parse(c), r);
        const v = validateForm(toForm(saved, system), system, saved);
        expect(v.ok && JSON.stringify(v.spec)).toBe(JSON.stringify(saved));
        expect(sameSpec(toSpec(toForm(saved, system), system, saved), saved)).toBe(true);
      }),
      { numRuns: 200 },
    );
  });

  it("leaves an emptied box out, so the model's default applies, and reads a typed value in the user's units", () => {
    const f = toForm(full, "imperial");
    f.engine.chargeTemperatureExponent = Number.NaN;
    f.engine.compressionRatio = Number.NaN;
    f.fuel.evaporatedInPort = Number.NaN;
    f.ambient.inletRestrictionOn = false;
    f.engine.exhaustBackPressure = 2;
    const v = validateForm(f, "imperial");
    expect(v.ok).toBe(true);
    if (!v.ok) return;
    expect(v.spec.engine).not.toHaveProperty("chargeTemperatureExponent", expect.anything());
    expect(v.spec.engine.compressionRatio ?? null).toBeNull();
    expect(v.spec.fuel.evaporatedInPort).toBeUndefined();
    expect(v.spec.ambient.inletRestriction ?? null).toBeNull();
    // source: 2 psi × 6894.757 Pa/psi = 13 789.5 Pa (NIST SP 811)
    expect(v.spec.engine.exhaustBackPressure).toBeCloseTo(13_789.5, 0);
    expect(v.spec.fuel.evaporatedInBlower).toBe(0.17);
  });

  it("shows each refinement's unit and names it in calc's message, in the user's units", () => {
    expect(unitOf("engine.exhaustBackPressure", "metric")).toBe("kPa");
    expect(unitOf("ambient.inletRestriction.ratedFlow", "imperial")).toBe("cfm");
    expect(unitOf("fuel.evaporatedInBlower", "imperial")).toBe("%");
    const f = toForm(full, "metric");
    f.engine.compressionRatio = 30;
    f.fuel.evaporatedInBlower = 80;
    const v = validateForm(f, "metric", full);
    expect(v.ok).toBe(false);
    if (v.ok) return;
    expect(v.errors["engine.compressionRatio"]).toMatch(/Compression ratio/);
    expect(v.errors["fuel.evaporatedInPort"]).toBeDefined(); // 17 % + 80 % + 23 % > 100 %
  });

  it("reads a draft kept before these fields existed without losing its other edits", () => {
    const old = toForm(demo, "imperial") as unknown as { ambient: Record<string, unknown> };
    delete old.ambient.inletRestriction;
    const f = old as unknown as ReturnType<typeof toForm>;
    expect(() => convertForm(f, "imperial", "metric")).not.toThrow();
    expect(validateForm(f, "imperial").ok).toBe(true);
  });
});

describe("validation names the field, in the user's units", () => {
  it("rejects a blower pulley too large and gives the limits in inches", () => {
    const f = toForm(demo, "imperial");
    f.drive.blowerPulleyDiameter = 25;
    const r = validateForm(f, "imperial");
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(Object.keys(r.errors)).toEqual(["drive.blowerPulleyDiameter"]);
    // source: calc's limits 0.03–0.5 m; 0.03 / 0.0254 = 1.1811 in, 0.5 / 0.0254 = 19.685 in
    // (1 in = 0.0254 m, NIST SP 811, App. B), stated inward to three figures.
    expect(r.errors["drive.blowerPulleyDiameter"]).toBe("Blower pulley diameter must be between 1.19 and 19.6 in");
  });

  it("gives the same limits in millimetres to a metric user", () => {
    const f = toForm(demo, "metric");
    f.drive.blowerPulleyDiameter = 10;
    const r = validateForm(f, "metric");
    expect(r.ok ? null : r.errors["drive.blowerPulleyDiameter"]).toBe("Blower pulley diameter must be between 30 and 500 mm");
  });

  it("names an empty box", () => {
    const f = toForm(demo, "imperial");
    f.engine.displacement = Number.NaN;
    const r = validateForm(f, "imperial");
    expect(r.ok ? null : r.errors["engine.displacement"]).toMatch(/^Engine displacement must be between 12\.3 and 1220 in³$/); // 0.0002–0.02 m³ is 12.205–1220.5 in³ (NIST SP 811)
  });

  it("states limits that are themselves accepted, for each bounded size in both unit systems", () => {
    // For every field calc bounds, typing exactly the stated minimum or maximum passes validation.
    for (const system of ["metric", "imperial"] as const) {
      const probe = toForm(demo, system);
      const paths: [string, (f: typeof probe, v: number) => void][] = [
        ["drive.blowerPulleyDiameter", (f, v) => (f.drive.blowerPulleyDiameter = v)],
        ["drive.crankPulleyDiameter", (f, v) => (f.drive.crankPulleyDiameter = v)],
        ["engine.displacement", (f, v) => (f.engine.displacement = v)],
        ["blower.displacementPerRev", (f, v) => (f.blower.displacementPerRev = v)],
      ];
      for (const [path, set] of paths) {
        const f = toForm(demo, system);
        set(f, -1);
        const r = validateForm(f, system);
        const m = r.ok ? null : /between (\S+) and (\S+)/.exec(r.errors[path]);
        expect(m, path).not.toBeNull();
        for (const limit of [Number(m![1]), Number(m![2])]) {
          const g = toForm(demo, system);
          set(g, limit);
          const ok = validateForm(g, system);
          expect(ok.ok ? [] : Object.entries(ok.errors).filter(([k]) => k === path), `${path} = ${limit} ${system}`).toEqual([]);
        }
      }
    }
  });

  it("puts fractions as percentages", () => {
    expect(localizeMessage("drive.beltSlip", "Belt slip must be between 0 and 0.2 (as a fraction)", "metric")).toBe("Belt slip must be between 0 and 20 %");
    const f = toForm(demo, "metric");
    f.engine.veCurve[2].ve = 250;
    const r = validateForm(f, "metric");
    expect(r.ok ? null : r.errors["engine.veCurve.2.ve"]).toBe("Volumetric efficiency must be between 20 and 200 %");
  });

  it("catches the rules across fields: a Roots blower's volume ratio, a repeated VE speed, half-given injectors", () => {
    const f = toForm(demo, "imperial");
    f.blower.builtInVolumeRatio = 1.5;
    f.engine.veCurve[1].rpm = f.engine.veCurve[0].rpm;
    f.fuel.injectorFlow = Number.NaN;
    const r = validateForm(f, "imperial");
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors["blower.builtInVolumeRatio"]).toMatch(/Roots blower has no internal compression/);
    expect(r.errors["engine.veCurve.1.rpm"]).toMatch(/twice/);
    expect(r.errors["fuel.injectorFlow"]).toMatch(/Injector flow/);
  });

  it("shows every field's unit", () => {
    expect(unitOf("drive.blowerPulleyDiameter", "imperial")).toBe("in");
    expect(unitOf("drive.blowerPulleyDiameter", "metric")).toBe("mm");
    expect(unitOf("ambient.pressure", "imperial")).toBe("psi");
    expect(unitOf("engine.veCurve.3.ve", "metric")).toBe("%");
    expect(unitOf("fuel.bsfc", "metric")).toBe("g/(kW·h)");
    expect(unitOf("engine.cylinders", "metric")).toBe("");
  });
});

describe("units beside the boxes", () => {
  it("VE rows of any index, counts and ratios without a unit, unknown paths without one", () => {
    expect(unitOf("engine.veCurve.0.ve", "imperial")).toBe("%");
    expect(unitOf("engine.veCurve.12.ve", "metric")).toBe("%");
    expect(unitOf("engine.veCurve.12.rpm", "metric")).toBe("rpm");
    expect(unitOf("drive.blowerPulleyDiameter", "imperial")).toBe("in");
    expect(unitOf("drive.blowerPulleyDiameter", "metric")).toBe("mm");
    expect(unitOf("blower.builtInVolumeRatio", "metric")).toBe("");
    expect(unitOf("no.such.field", "metric")).toBe("");
  });

  it("a box left empty or holding words reaches calc as a missing number, named on its field", () => {
    const f = toForm(combinationSchema.parse(workTruckV6), "imperial");
    for (const bad of ["", null, "six"] as unknown[]) {
      const v = validateForm({ ...f, engine: { ...f.engine, cylinders: bad as number } }, "imperial");
      expect(v.ok).toBe(false);
      if (!v.ok) expect(Object.keys(v.errors)).toEqual(["engine.cylinders"]);
    }
    // A number typed as text is read as that number.
    const v = validateForm({ ...f, engine: { ...f.engine, cylinders: "8" as unknown as number } }, "imperial");
    expect(v.ok && v.spec.engine.cylinders).toBe(8);
  });
});

describe("edges of the form's conversions", () => {
  it("an empty box or null reaches calc as NaN, not as 0; a number typed as text as that number", () => {
    const f = toForm(demo, "imperial");
    // Number("") and Number(null) are both 0 in JavaScript (ECMA-262 ToNumber), which would be a real
    // (if invalid) cylinder count; the form must say "missing" instead.
    for (const empty of ["", null, undefined] as unknown[]) {
      expect(toSpec({ ...f, engine: { ...f.engine, cylinders: empty as number } }, "imperial").engine.cylinders, String(empty)).toBeNaN();
    }
    expect(toSpec({ ...f, engine: { ...f.engine, cylinders: "6" as unknown as number } }, "imperial").engine.cylinders).toBe(6);
    expect(toSpec({ ...f, engine: { ...f.engine, cylinders: 4 } }, "imperial").engine.cylinders).toBe(4);
  });

  it("injectors show as on only when both their count and their flow are stored", () => {
    // A hand-made stored spec with one of the two missing (the schema refuses it, an older save might hold it).
    const fuel = (injectorCount: number | null, injectorFlow: number | null): Combination => ({ ...demo, fuel: { ...demo.fuel, injectorCount, injectorFlow } });
    expect(toForm(fuel(6, 0.005), "imperial").fuel.injectorsOn).toBe(true);
    expect(toForm(fuel(6, null), "imperial").fuel.injectorsOn).toBe(false);
    expect(toForm(fuel(null, 0.005), "imperial").fuel.injectorsOn).toBe(false);
    expect(toForm(fuel(null, null), "imperial").fuel.injectorsOn).toBe(false);
  });

  it("converting to the same units hands back the form untouched; to others, re-expresses it", () => {
    const f = toForm(demo, "imperial");
    f.drive.blowerPulleyDiameter = 3.4567; // finer than the box's 3 decimals: left alone when nothing changes
    expect(convertForm(f, "imperial", "imperial")).toBe(f);
    expect(convertForm(f, "imperial", "imperial", demo).drive.blowerPulleyDiameter).toBe(3.4567);
    // source: 1 in = 25.4 mm exactly (NIST SP 811): 3.4 in = 86.36 mm, 6 in = 152.4 mm.
    const g = toForm(demo, "imperial");
    const metric = convertForm(g, "imperial", "metric");
    expect(metric.drive.blowerPulleyDiameter).toBeCloseTo(86.36, 9);
    expect(metric.drive.crankPulleyDiameter).toBeCloseTo(152.4, 9);
  });

  it("a box edited away from its stored value is converted from what it shows, not from the stored value", () => {
    const f = toForm(demo, "imperial");
    f.drive.blowerPulleyDiameter = 3.3;
    // source: 3.3 in × 25.4 mm/in = 83.82 mm (NIST SP 811); the stored 3.4 in would give 86.36 mm.
    expect(convertForm(f, "imperial", "metric", demo).drive.blowerPulleyDiameter).toBeCloseTo(83.82, 9);
    // The untouched crank pulley still comes from its stored value: 6 in = 152.4 mm.
    expect(convertForm(f, "imperial", "metric", demo).drive.crankPulleyDiameter).toBeCloseTo(152.4, 9);
  });
});

describe("localizeMessage leaves alone what it cannot read", () => {
  const pulley = "drive.blowerPulleyDiameter";
  it("a limit already in another unit, a limit that is not a number, a message over two lines", () => {
    for (const message of [
      "Ambient pressure must be between 30 and 110 kPa",
      "Blower pulley diameter must be between 0.03 and 0.5 in",
      "Blower pulley diameter must be between 0.03 and some m",
      "Blower pulley diameter must be between few and 0.5 m",
      "Check the drive.\nBlower pulley diameter must be between 0.03 and 0.5 m",
    ]) {
      const path = message.startsWith("Ambient") ? "ambient.pressure" : pulley;
      expect(localizeMessage(path, message, "imperial"), message).toBe(message);
    }
    // The same message in SI units is put in inches: 0.03 m = 1.181 in → 1.19 rounded inward, 0.5 m = 19.685 in → 19.6
    // (1 in = 0.0254 m, NIST SP 811; inward rounding to three figures: author's choice).
    expect(localizeMessage(pulley, "Blower pulley diameter must be between 0.03 and 0.5 m", "imperial")).toBe("Blower pulley diameter must be between 1.19 and 19.6 in");
  });
});
