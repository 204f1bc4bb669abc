// The engine's VE curve and airflow on their own: veAt against an independent restatement of
// piecewise-linear interpolation, and the four-stroke airflow with its input messages.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { engineAirflow, veAt } from "@/calc";
import { relDiff, veCurveArb, veOf } from "./support/arbitraries";
import { inputError } from "./support/input-error";

describe("veAt", () => {
  it("matches linear interpolation between points and is flat outside (property; oracle restated in tests/calc/support)", () => {
    fc.assert(
      fc.property(veCurveArb, fc.integer({ min: 500, max: 9000 }), (curve, rpm) => {
        expect(relDiff(veAt(curve, rpm), veOf(curve, rpm))).toBeLessThan(1e-12);
      }),
      { numRuns: 500 },
    );
  });

  it("passes through every point of the curve exactly, so the VE a person typed is the VE used (property)", () => {
    fc.assert(
      fc.property(veCurveArb, (curve) => {
        for (const p of curve) expect(veAt(curve, p.rpm), `${p.rpm} rpm`).toBe(p.ve);
      }),
      { numRuns: 500 },
    );
  });

  it("hand-worked: a third of the way from (3000, 0.80) to (6000, 0.92) is 0.84; the ends hold", () => {
    const curve = [{ rpm: 1000, ve: 0.7 }, { rpm: 2000, ve: 0.75 }, { rpm: 3000, ve: 0.8 }, { rpm: 6000, ve: 0.92 }, { rpm: 7000, ve: 0.9 }];
    expect(veAt(curve, 4000)).toBeCloseTo(0.84, 12);
    expect(veAt(curve, 1500)).toBeCloseTo(0.725, 12);
    expect(veAt(curve, 6500)).toBeCloseTo(0.91, 12);
    expect(veAt(curve, 3000)).toBe(0.8);
    expect([veAt(curve, 500), veAt(curve, 1000), veAt(curve, 7000), veAt(curve, 9000)]).toEqual([0.7, 0.7, 0.9, 0.9]);
  });
});

describe("engineAirflow", () => {
  it("a four-stroke draws Vd·N/2 per minute times VE: 5.7 L at 6000 rpm and VE 0.9 is 0.2565 m³/s", () => {
    // source: Heywood, Internal Combustion Engine Fundamentals (1988), eq. 2.27 (ṁ = ηv·ρ·Vd·N/2), as a volume flow.
    expect(engineAirflow(0.0057, 6000, 0.9)).toBeCloseTo((0.0057 * 6000 * 0.9) / 2 / 60, 12);
    expect(engineAirflow(0.0057, 6000, 0.9)).toBeCloseTo(0.2565, 12);
    expect(engineAirflow(0.0057, 6000, 0)).toBe(0);
  });

  it("names each input and its unit", () => {
    const d = inputError(() => engineAirflow(0, 3000, 0.9));
    expect([d.field, d.message]).toEqual(["displacement", expect.stringMatching(/Engine displacement must be a positive number in m³/)]);
    const n = inputError(() => engineAirflow(0.005, -1, 0.9));
    expect([n.field, n.message]).toEqual(["rpm", expect.stringMatching(/Engine speed must be a positive number in rpm/)]);
    expect(inputError(() => engineAirflow(0.005, 3000, -0.1)).message).toMatch(/Volumetric efficiency must be a non-negative number/);
    expect(inputError(() => engineAirflow(0.005, 3000, "x" as unknown as number)).message).toMatch(/Volumetric efficiency must be a non-negative number/);
  });
});
