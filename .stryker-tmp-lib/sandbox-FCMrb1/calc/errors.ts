// @ts-nocheck
// Typed errors of the computational core. Every error names the input field it concerns
// (a dotted path such as "drive.blowerPulleyDiameter") so forms and the API can place it.

/** One problem with one input field. */
export interface FieldIssue {
  /** Dotted path of the field, e.g. "engine.veCurve.2.rpm" ("" for the whole input). */
  readonly field: string;
  /** Human-readable message. */
  readonly message: string;
}

/** Base class of every error thrown by `calc/`. */
export class CalcError extends Error {
  /** Dotted path of the input field concerned ("" when no single field is to blame). */
  readonly field: string;
  constructor(message: string, field = "") {
    super(message);
    this.name = "CalcError";
    this.field = field;
  }
}

/** An input failed validation; `issues` lists every failing field, `field` the first. */
export class CalcInputError extends CalcError {
  /** Every failing field with its message. */
  readonly issues: readonly FieldIssue[];
  constructor(issues: readonly FieldIssue[]) {
    const first = issues[0] ?? { field: "", message: "Invalid input" };
    super(first.message, first.field);
    this.name = "CalcInputError";
    this.issues = issues;
  }
}

/** Why the balance of blower delivery and engine demand could not be found. */
export type ConvergenceReason = "blower-too-slow" | "no-balance" | "not-converged";

/** The solver could not find (or could not converge on) a balance point. */
export class CalcConvergenceError extends CalcError {
  /** Which way the solve failed. */
  readonly reason: ConvergenceReason;
  /** Engine speed at which it failed (rev/min). */
  readonly rpm: number;
  /** Numbers behind the message, SI (for "blower-too-slow": blowerRpm, floorPressure in Pa absolute). */
  readonly values: Readonly<Record<string, number>>;
  constructor(message: string, reason: ConvergenceReason, rpm: number, field = "", values: Readonly<Record<string, number>> = {}) {
    super(message, field);
    this.name = "CalcConvergenceError";
    this.reason = reason;
    this.rpm = rpm;
    this.values = values;
  }
}

/** A target (e.g. a boost for the pulley finder) lies outside what the allowed range can reach. */
export class CalcTargetUnreachableError extends CalcError {
  /** Lowest value reachable in the allowed range (SI unit of the target; null when unbounded). */
  readonly minimum: number | null;
  /** Highest value reachable in the allowed range (SI unit of the target; null when unbounded). */
  readonly maximum: number | null;
  constructor(message: string, field: string, minimum: number | null, maximum: number | null) {
    super(message, field);
    this.name = "CalcTargetUnreachableError";
    this.minimum = minimum;
    this.maximum = maximum;
  }
}
