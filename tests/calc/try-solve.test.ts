// trySolvePoint / trySolveCurve: the same answer as solvePoint where a balance exists, null (or a
// left-out speed) where it does not, and bad input still refused. The values come from solvePoint
// itself (the contract under test is "same answer or none"), so no reference figures are needed.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { CalcConvergenceError, CalcInputError, exampleCombination, solvePoint, trySolveCurve, trySolvePoint, type Combination } from "@/calc";
import { combinationArb, rpmArb } from "./support/arbitraries";

const starved = (): Combination => {
  const c = exampleCombination();
  // The starved blower of solve.test.ts: it cannot feed the engine at any speed (blower-too-slow).
  return {
    ...c,
    engine: { ...c.engine, displacement: 0.02 },
    blower: { ...c.blower, displacementPerRev: 0.0001 },
    drive: { ...c.drive, crankPulleyDiameter: 0.03, blowerPulleyDiameter: 0.5 },
  };
};

function solveOrNull(c: Combination, rpm: number) {
  try {
    return solvePoint(c, rpm);
  } catch (e) {
    if (e instanceof CalcConvergenceError) return null;
    throw e;
  }
}

describe("trySolvePoint", () => {
  it("equals solvePoint, or is null exactly where solvePoint finds no balance", () => {
    fc.assert(
      fc.property(combinationArb, rpmArb, (c, rpm) => {
        expect(trySolvePoint(c, rpm)).toEqual(solveOrNull(c, rpm));
      }),
      { numRuns: 60 },
    );
  });

  it("is null for a blower that cannot feed the engine", () => {
    expect(trySolvePoint(starved(), 6000)).toBeNull();
  });

  it("still refuses bad input with CalcInputError", () => {
    expect(() => trySolvePoint(exampleCombination(), -5)).toThrow(CalcInputError);
  });

  it("names the field of bad input as calc/README.md promises: the speed, or the speed's place in the list", () => {
    // Engine speed bounds 100–20 000 rpm: calc's rpmSchema.
    const issuesOf = (run: () => unknown) => {
      try {
        run();
      } catch (e) {
        expect(e).toBeInstanceOf(CalcInputError);
        return (e as CalcInputError).issues;
      }
      return expect.unreachable("expected a CalcInputError");
    };
    const message = "Engine speed must be between 100 and 20000 rpm";
    expect(issuesOf(() => trySolvePoint(exampleCombination(), -5))).toEqual([{ field: "rpm", message }]);
    expect(issuesOf(() => trySolveCurve(exampleCombination(), [3000, 50_000]))).toEqual([{ field: "rpms.1", message }]);
  });
});

describe("trySolveCurve", () => {
  it("keeps the speeds that balance, in order, each equal to solvePoint", () => {
    fc.assert(
      fc.property(combinationArb, fc.array(rpmArb, { minLength: 1, maxLength: 6 }), (c, rpms) => {
        const expected = rpms.map((n) => solveOrNull(c, n)).filter((p) => p !== null);
        expect(trySolveCurve(c, rpms)).toEqual(expected);
      }),
      { numRuns: 30 },
    );
  });

  it("is empty where no speed balances", () => {
    expect(trySolveCurve(starved(), [3000, 6000])).toEqual([]);
  });
});
