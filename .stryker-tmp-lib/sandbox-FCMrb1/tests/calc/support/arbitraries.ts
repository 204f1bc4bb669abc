// @ts-nocheck
// Generators of arbitrary (invented) inputs for property tests, and an independent restatement
// of the equations of calc/README.md used as test oracles. None of these numbers are check values.
import fc from "fast-check";
import type { Combination } from "@/calc";

/** R for dry air as calc/README.md states it (J/(kg·K)); any thermodynamics text gives 287.05. */
export const R_MODEL = 287.05;
/** κ = (γ − 1)/γ with γ = 1.4 (calc/README.md). */
export const KAPPA_MODEL = 0.4 / 1.4;

/** Relative difference |a − b| / max(|a|, |b|, tiny). */
export function relDiff(a: number, b: number): number {
  return Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b), 1e-300);
}

/** VE at rpm, piecewise-linear, flat outside: calc/README.md restated independently. */
export function veOf(curve: readonly { rpm: number; ve: number }[], rpm: number): number {
  const pts = [...curve].sort((a, b) => a.rpm - b.rpm);
  if (rpm <= pts[0].rpm) return pts[0].ve;
  for (let i = 1; i < pts.length; i++) {
    if (rpm <= pts[i].rpm) {
      const t = (rpm - pts[i - 1].rpm) / (pts[i].rpm - pts[i - 1].rpm);
      return pts[i - 1].ve + t * (pts[i].ve - pts[i - 1].ve);
    }
  }
  return pts[pts.length - 1].ve;
}

/** A VE curve of 1–6 points, rpm 1000–7500 (strictly increasing), each within ±10 % of a level of 0.7–1.05. */
export const veCurveArb = fc
  .uniqueArray(fc.integer({ min: 10, max: 75 }), { minLength: 1, maxLength: 6 })
  .chain((hundreds) =>
    fc.tuple(
      fc.constant([...hundreds].sort((a, b) => a - b).map((h) => h * 100)),
      fc.double({ min: 0.7, max: 1.05, noNaN: true }),
      fc.array(fc.double({ min: 0.9, max: 1.1, noNaN: true }), { minLength: hundreds.length, maxLength: hundreds.length }),
    ),
  )
  .map(([rpms, level, factors]) => rpms.map((rpm, i) => ({ rpm, ve: level * factors[i] })));

/**
 * A valid combination within the range the model is meant for: its ideal ratio-rule pressure
 * ratio at a mid VE lies in [1.05, 1.8] (the blower pulley is derived from it) and the blower's
 * internal efficiency is at least 0.8. Far outside that range (a blower sweeping more than
 * about ηint/κ times the engine's flow, no intercooler) the model rightly finds no balance.
 */
export const combinationArb: fc.Arbitrary<Combination> = fc
  .record({
    displacement: fc.double({ min: 0.0015, max: 0.008, noNaN: true }),
    veCurve: veCurveArb,
    kind: fc.constantFrom("roots" as const, "twin-screw" as const),
    vi: fc.double({ min: 1.2, max: 2.5, noNaN: true }),
    blowerToEngine: fc.double({ min: 0.2, max: 0.6, noNaN: true }),
    etaRef: fc.double({ min: 0.6, max: 0.98, noNaN: true }),
    refRpm: fc.integer({ min: 5000, max: 15_000 }),
    etaInt: fc.double({ min: 0.8, max: 1, noNaN: true }),
    etaMech: fc.double({ min: 0.85, max: 1, noNaN: true }),
    crank: fc.double({ min: 0.12, max: 0.25, noNaN: true }),
    idealPr: fc.double({ min: 1.05, max: 1.8, noNaN: true }),
    beltSlip: fc.double({ min: 0, max: 0.05, noNaN: true }),
    pressure: fc.double({ min: 70_000, max: 105_000, noNaN: true }),
    temperature: fc.double({ min: 260, max: 315, noNaN: true }),
    inletLoss: fc.double({ min: 0, max: 4000, noNaN: true }),
    intercooler: fc.option(
      fc.record({
        effectiveness: fc.double({ min: 0.3, max: 0.95, noNaN: true }),
        pressureDrop: fc.double({ min: 0, max: 8000, noNaN: true }),
        coolantTemperature: fc.double({ min: 280, max: 330, noNaN: true }),
      }),
      { nil: null },
    ),
    afr: fc.double({ min: 10, max: 14.7, noNaN: true }),
    bsfc: fc.double({ min: 6e-8, max: 1.2e-7, noNaN: true }),
  })
  .map((g): Combination => {
    const vb = g.displacement * g.blowerToEngine;
    const midVe = g.veCurve[Math.floor(g.veCurve.length / 2)].ve;
    // Ratio rule: PR = Vb·r·(1 − s)·2/(Vd·VE)  →  r = PR·Vd·VE/(2·Vb·(1 − s)).
    const ratio = (g.idealPr * g.displacement * midVe) / (2 * vb * (1 - g.beltSlip));
    return {
      engine: { displacement: g.displacement, cylinders: 8, veCurve: g.veCurve, redlineRpm: 7500 },
      blower: {
        kind: g.kind,
        displacementPerRev: vb,
        builtInVolumeRatio: g.kind === "roots" ? 1 : g.vi,
        maxRpm: 40_000,
        volumetricEfficiencyRef: g.etaRef,
        referenceRpm: g.refRpm,
        internalEfficiency: g.etaInt,
        mechanicalEfficiency: g.etaMech,
      },
      drive: { crankPulleyDiameter: g.crank, blowerPulleyDiameter: g.crank / ratio, beltSlip: g.beltSlip },
      ambient: { pressure: g.pressure, temperature: g.temperature, inletLoss: g.inletLoss },
      intercooler: g.intercooler,
      fuel: { afr: g.afr, bsfc: g.bsfc, injectorCount: null, injectorFlow: null, maxDuty: 0.85, evaporatedBeforeBlower: 0 },
    };
  })
  .filter((c) => c.drive.blowerPulleyDiameter >= 0.03 && c.drive.blowerPulleyDiameter <= 0.5);

/** An engine speed for property tests (rev/min). */
export const rpmArb = fc.integer({ min: 1500, max: 7000 });

/** The same combination in the ideal limit of calc/README.md (no slip, ηint = 1, ε = 1 back to T1, no losses). */
export function idealLimit(c: Combination): Combination {
  return {
    ...c,
    blower: { ...c.blower, volumetricEfficiencyRef: 1, internalEfficiency: 1 },
    drive: { ...c.drive, beltSlip: 0 },
    ambient: { ...c.ambient, inletLoss: 0 },
    intercooler: { effectiveness: 1, pressureDrop: 0, coolantTemperature: c.ambient.temperature },
    fuel: { ...c.fuel, evaporatedBeforeBlower: 0 },
  };
}

/** A copy with another blower pulley diameter (m). */
export function withPulley(c: Combination, diameter: number): Combination {
  return { ...c, drive: { ...c.drive, blowerPulleyDiameter: diameter } };
}

/** A copy with every VE point multiplied by a factor. */
export function withVeScaled(c: Combination, factor: number): Combination {
  return { ...c, engine: { ...c.engine, veCurve: c.engine.veCurve.map((p) => ({ rpm: p.rpm, ve: p.ve * factor })) } };
}
