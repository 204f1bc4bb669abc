// The CalcInputError a call throws; fails the test when it throws nothing or something else.
import { CalcInputError } from "@/calc";
import { thrown } from "../../support/thrown";

export const inputError = (fn: () => unknown): CalcInputError => thrown(CalcInputError, fn);
