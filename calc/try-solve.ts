// "Solve, or say there is no balance": for callers that show what can be solved and leave out
// the speeds where the blower cannot balance the engine, instead of failing the whole answer.
import { CalcConvergenceError } from "./errors";
import { combinationSchema, parseOrThrow, rpmListSchema, rpmSchema, type CombinationInput } from "./schema";
import { prepare, solvePrepared, type OperatingPoint } from "./solve";

/** Operating point at an engine speed (rev/min), or null where no balance exists; bad input still throws CalcInputError. */
export function trySolvePoint(combination: CombinationInput, rpm: number): OperatingPoint | null {
  const p = prepare(parseOrThrow(combinationSchema, combination));
  return trySolvePrepared(p, parseOrThrow(rpmSchema, rpm, "rpm"));
}

/** Operating points at the engine speeds (rev/min) that balance, in the order given; speeds with no balance are left out. */
export function trySolveCurve(combination: CombinationInput, rpms: readonly number[]): OperatingPoint[] {
  const p = prepare(parseOrThrow(combinationSchema, combination));
  const out: OperatingPoint[] = [];
  for (const rpm of parseOrThrow(rpmListSchema, rpms, "rpms")) {
    const point = trySolvePrepared(p, rpm);
    if (point) out.push(point);
  }
  return out;
}

function trySolvePrepared(p: ReturnType<typeof prepare>, rpm: number): OperatingPoint | null {
  try {
    return solvePrepared(p, rpm);
  } catch (e) {
    if (e instanceof CalcConvergenceError) return null;
    throw e;
  }
}
