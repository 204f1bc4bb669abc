// @ts-nocheck
// The CalcInputError a call throws; fails the test when it throws nothing or something else.
import { expect } from "vitest";
import { CalcInputError } from "@/calc";

export function inputError(fn: () => unknown): CalcInputError {
  try {
    fn();
  } catch (e) {
    if (e instanceof CalcInputError) return e;
    throw e;
  }
  return expect.unreachable("expected a CalcInputError");
}
