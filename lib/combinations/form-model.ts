// The planner's form: the same shape as calc's Combination, but in the user's units (and
// fractions as percentages), plus a few switches the model does not see. Pure, so the
// conversions and the validation can be tested in node. calc's combinationSchema stays the
// one set of rules; this module only converts to SI first and puts the messages in the
// user's units.
import { z } from "zod";
import {
  combinationSchema,
  fromSI,
  roundInward,
  toSI,
  unitLabel,
  type BlowerKind,
  type Combination,
  type CombinationInput,
  type QuantityKind,
  unitsToParam,
  type UnitSystem,
} from "@/calc";
import { inputDigitsOf, roundTo } from "@/lib/units/format";
import { FORM_ONLY_FIELDS, SPEC_FIELDS, valueAt } from "./field-table";

/** One VE row as edited: engine speed (rpm) and VE in percent. */
export type VeRow = { rpm: number; ve: number };

/** The planner's form values: user units, percentages for fractions; NaN where a box is empty. */
export type PlannerForm = {
  engine: {
    displacement: number;
    cylinders: number;
    redlineRpm: number;
    veCurve: VeRow[];
    /** Optional refinements (calc/README.md): NaN leaves each out, so the model's default applies. */
    chargeTemperatureExponent: number;
    compressionRatio: number;
    exhaustBackPressure: number;
  };
  blower: {
    kind: BlowerKind;
    displacementPerRev: number;
    builtInVolumeRatio: number;
    maxRpm: number;
    volumetricEfficiencyRef: number;
    referenceRpm: number;
    internalEfficiency: number;
    mechanicalEfficiency: number;
  };
  drive: { crankPulleyDiameter: number; blowerPulleyDiameter: number; beltSlip: number };
  ambient: {
    altitude: number;
    pressure: number;
    temperature: number;
    inletLoss: number;
    /** A flow-rated inlet (optional refinement); its rating depression may be left empty (NaN). */
    inletRestrictionOn: boolean;
    inletRestriction: { ratedFlow: number; ratingDepression: number };
  };
  intercoolerOn: boolean;
  intercooler: { effectiveness: number; pressureDrop: number; coolantTemperature: number };
  fuel: {
    afr: number;
    bsfc: number;
    injectorsOn: boolean;
    injectorCount: number;
    injectorFlow: number;
    maxDuty: number;
    evaporatedBeforeBlower: number;
    evaporatedInBlower: number;
    evaporatedInPort: number;
  };
};

/** How a field is shown: a quantity in the user's units, a fraction as percent, or as is. */
export type FieldKind = QuantityKind | "percent" | "plain";

/** Every numeric field of the form by dotted path (VE rows use "engine.veCurve.#.rpm|ve"), from the field table. */
export const FIELD_KINDS: Readonly<Record<string, FieldKind>> = Object.fromEntries(
  [...SPEC_FIELDS, ...FORM_ONLY_FIELDS].flatMap((f): [string, FieldKind][] =>
    f.quantity === "text" || f.quantity === "ve-curve" ? [] : [[f.path, f.quantity === "count" ? "plain" : f.quantity]],
  ),
);

/** The kind of a dotted path, VE row indexes folded to "#". */
export function kindOf(path: string): FieldKind | undefined {
  return FIELD_KINDS[path.replace(/\.\d+\./, ".#.")];
}

/** The unit shown beside a field ("" for counts and plain ratios). */
export function unitOf(path: string, system: UnitSystem): string {
  const kind = kindOf(path);
  if (!kind || kind === "plain") return "";
  if (kind === "percent") return "%";
  return unitLabel(kind, system);
}

/** A form number to SI. */
export function fieldToSI(kind: FieldKind, v: number, system: UnitSystem): number {
  if (kind === "plain") return v;
  if (kind === "percent") return v / 100;
  return toSI(kind, v, system);
}

/** Decimal places of a percentage box (a 2.5 % belt slip, an 84.25 % VE cell). */
const PERCENT_DIGITS = 2;

/** A SI number to the form, at the input precision of its unit (see inputDigitsOf). */
export function fieldFromSI(kind: FieldKind, v: number, system: UnitSystem): number {
  if (kind === "plain") return v;
  if (kind === "percent") return roundTo(v * 100, PERCENT_DIGITS);
  return roundTo(fromSI(kind, v, system), inputDigitsOf(kind, system));
}

const num = (v: unknown): number => (typeof v === "number" ? v : v === "" || v == null ? Number.NaN : Number(v));

/**
 * The form values as a calc Combination input (SI, fractions); switched-off parts become null.
 * Given the stored combination the form was filled from (`base`), a field still showing exactly
 * what that stored value displays as keeps the stored value itself: a save in inches does not
 * turn an untouched 0.005 m³ into 0.0049999997 m³.
 */
const storedAt = (base: Combination | undefined, path: string): unknown => valueAt(base, path);

export function toSpec(f: PlannerForm, system: UnitSystem, base?: Combination): CombinationInput {
  const stored = (path: string) => storedAt(base, path);
  const q = (path: string, v: unknown) => {
    const kind = kindOf(path)!;
    const n = num(v);
    const b = stored(path);
    return typeof b === "number" && fieldFromSI(kind, b, system) === n ? b : fieldToSI(kind, n, system);
  };
  // An optional field left empty is left out again, or stays null where the stored spec said null.
  const opt = (path: string, v: unknown) => (Number.isNaN(num(v)) ? (stored(path) === null ? null : undefined) : q(path, v));
  const optional = (path: string, v: unknown) => opt(path, v) ?? undefined;
  const restriction = f.ambient.inletRestriction ?? NO_RESTRICTION; // a draft kept before these fields
  return {
    engine: {
      displacement: q("engine.displacement", f.engine.displacement),
      cylinders: num(f.engine.cylinders),
      redlineRpm: num(f.engine.redlineRpm),
      veCurve: f.engine.veCurve.map((r, i) => ({ rpm: num(r.rpm), ve: q(`engine.veCurve.${i}.ve`, r.ve) })),
      chargeTemperatureExponent: optional("engine.chargeTemperatureExponent", f.engine.chargeTemperatureExponent),
      compressionRatio: opt("engine.compressionRatio", f.engine.compressionRatio),
      exhaustBackPressure: optional("engine.exhaustBackPressure", f.engine.exhaustBackPressure),
    },
    blower: {
      kind: f.blower.kind,
      displacementPerRev: q("blower.displacementPerRev", f.blower.displacementPerRev),
      builtInVolumeRatio: num(f.blower.builtInVolumeRatio),
      maxRpm: num(f.blower.maxRpm),
      volumetricEfficiencyRef: q("blower.volumetricEfficiencyRef", f.blower.volumetricEfficiencyRef),
      referenceRpm: num(f.blower.referenceRpm),
      internalEfficiency: q("blower.internalEfficiency", f.blower.internalEfficiency),
      mechanicalEfficiency: q("blower.mechanicalEfficiency", f.blower.mechanicalEfficiency),
    },
    drive: {
      crankPulleyDiameter: q("drive.crankPulleyDiameter", f.drive.crankPulleyDiameter),
      blowerPulleyDiameter: q("drive.blowerPulleyDiameter", f.drive.blowerPulleyDiameter),
      beltSlip: q("drive.beltSlip", f.drive.beltSlip),
    },
    ambient: {
      pressure: q("ambient.pressure", f.ambient.pressure),
      temperature: q("ambient.temperature", f.ambient.temperature),
      inletLoss: q("ambient.inletLoss", f.ambient.inletLoss),
      inletRestriction: f.ambient.inletRestrictionOn
        ? {
            ratedFlow: q("ambient.inletRestriction.ratedFlow", restriction.ratedFlow),
            ratingDepression: optional("ambient.inletRestriction.ratingDepression", restriction.ratingDepression),
          }
        : stored("ambient.inletRestriction") === null
          ? null
          : undefined,
    },
    intercooler: f.intercoolerOn
      ? {
          effectiveness: q("intercooler.effectiveness", f.intercooler.effectiveness),
          pressureDrop: q("intercooler.pressureDrop", f.intercooler.pressureDrop),
          coolantTemperature: q("intercooler.coolantTemperature", f.intercooler.coolantTemperature),
        }
      : null,
    fuel: {
      afr: num(f.fuel.afr),
      bsfc: q("fuel.bsfc", f.fuel.bsfc),
      injectorCount: f.fuel.injectorsOn ? num(f.fuel.injectorCount) : null,
      injectorFlow: f.fuel.injectorsOn ? q("fuel.injectorFlow", f.fuel.injectorFlow) : null,
      maxDuty: q("fuel.maxDuty", f.fuel.maxDuty),
      evaporatedBeforeBlower: q("fuel.evaporatedBeforeBlower", f.fuel.evaporatedBeforeBlower),
      evaporatedInBlower: optional("fuel.evaporatedInBlower", f.fuel.evaporatedInBlower),
      evaporatedInPort: optional("fuel.evaporatedInPort", f.fuel.evaporatedInPort),
    },
  };
}

const NO_RESTRICTION = { ratedFlow: Number.NaN, ratingDepression: Number.NaN };

/** Demo starting values for parts a saved spec leaves out (an intercooler, injectors): invented. */
const SPARE_INTERCOOLER = { effectiveness: 0.7, pressureDrop: 3000, coolantTemperature: 308.15 };
const SPARE_INJECTORS = { injectorCount: 8, injectorFlow: 0.005 };
/** About 750 cfm, rating depression left to calc's default. */
const SPARE_INLET_RESTRICTION = { ratedFlow: 0.354, ratingDepression: undefined };

/** A saved combination (SI) as form values in `system`. */
export function toForm(spec: Combination, system: UnitSystem, altitude = 0): PlannerForm {
  const s = (path: string, v: number) => fieldFromSI(FIELD_KINDS[path], v, system);
  const opt = (path: string, v: number | null | undefined) => (v == null ? Number.NaN : s(path, v));
  const inlet = spec.ambient.inletRestriction ?? SPARE_INLET_RESTRICTION;
  const ic = spec.intercooler ?? SPARE_INTERCOOLER;
  const hasInjectors = spec.fuel.injectorCount != null && spec.fuel.injectorFlow != null;
  return {
    engine: {
      displacement: s("engine.displacement", spec.engine.displacement),
      cylinders: spec.engine.cylinders,
      redlineRpm: spec.engine.redlineRpm,
      veCurve: spec.engine.veCurve.map((p) => ({ rpm: p.rpm, ve: fieldFromSI("percent", p.ve, system) })),
      chargeTemperatureExponent: opt("engine.chargeTemperatureExponent", spec.engine.chargeTemperatureExponent),
      compressionRatio: opt("engine.compressionRatio", spec.engine.compressionRatio),
      exhaustBackPressure: opt("engine.exhaustBackPressure", spec.engine.exhaustBackPressure),
    },
    blower: {
      kind: spec.blower.kind,
      displacementPerRev: s("blower.displacementPerRev", spec.blower.displacementPerRev),
      builtInVolumeRatio: spec.blower.builtInVolumeRatio,
      maxRpm: spec.blower.maxRpm,
      volumetricEfficiencyRef: s("blower.volumetricEfficiencyRef", spec.blower.volumetricEfficiencyRef),
      referenceRpm: spec.blower.referenceRpm,
      internalEfficiency: s("blower.internalEfficiency", spec.blower.internalEfficiency),
      mechanicalEfficiency: s("blower.mechanicalEfficiency", spec.blower.mechanicalEfficiency),
    },
    drive: {
      crankPulleyDiameter: s("drive.crankPulleyDiameter", spec.drive.crankPulleyDiameter),
      blowerPulleyDiameter: s("drive.blowerPulleyDiameter", spec.drive.blowerPulleyDiameter),
      beltSlip: s("drive.beltSlip", spec.drive.beltSlip),
    },
    ambient: {
      altitude: s("ambient.altitude", altitude),
      pressure: s("ambient.pressure", spec.ambient.pressure),
      temperature: s("ambient.temperature", spec.ambient.temperature),
      inletLoss: s("ambient.inletLoss", spec.ambient.inletLoss),
      inletRestrictionOn: spec.ambient.inletRestriction != null,
      inletRestriction: {
        ratedFlow: s("ambient.inletRestriction.ratedFlow", inlet.ratedFlow),
        ratingDepression: opt("ambient.inletRestriction.ratingDepression", inlet.ratingDepression),
      },
    },
    intercoolerOn: spec.intercooler !== null,
    intercooler: {
      effectiveness: s("intercooler.effectiveness", ic.effectiveness),
      pressureDrop: s("intercooler.pressureDrop", ic.pressureDrop),
      coolantTemperature: s("intercooler.coolantTemperature", ic.coolantTemperature),
    },
    fuel: {
      afr: spec.fuel.afr,
      bsfc: s("fuel.bsfc", spec.fuel.bsfc),
      injectorsOn: hasInjectors,
      injectorCount: spec.fuel.injectorCount ?? SPARE_INJECTORS.injectorCount,
      injectorFlow: s("fuel.injectorFlow", spec.fuel.injectorFlow ?? SPARE_INJECTORS.injectorFlow),
      maxDuty: s("fuel.maxDuty", spec.fuel.maxDuty),
      evaporatedBeforeBlower: s("fuel.evaporatedBeforeBlower", spec.fuel.evaporatedBeforeBlower),
      evaporatedInBlower: opt("fuel.evaporatedInBlower", spec.fuel.evaporatedInBlower),
      evaporatedInPort: opt("fuel.evaporatedInPort", spec.fuel.evaporatedInPort),
    },
  };
}

/**
 * Every quantity of the form re-expressed from one choice of units in another (switches and counts
 * kept). A field still showing its stored value (`base`) is re-expressed from that stored SI value,
 * not from its rounded figure, so a round trip leaves the stored spec byte-identical.
 */
export function convertForm(f: PlannerForm, from: UnitSystem, to: UnitSystem, base?: Combination): PlannerForm {
  if (unitsToParam(from) === unitsToParam(to)) return f;
  const restriction = f.ambient.inletRestriction ?? NO_RESTRICTION;
  const c = (path: string, v: number) => {
    const kind = FIELD_KINDS[path];
    const b = storedAt(base, path);
    if (typeof b === "number" && fieldFromSI(kind, b, from) === num(v)) return fieldFromSI(kind, b, to);
    return fieldFromSI(kind, fieldToSI(kind, num(v), from), to);
  };
  return {
    ...f,
    engine: {
      ...f.engine,
      displacement: c("engine.displacement", f.engine.displacement),
      veCurve: f.engine.veCurve.map((r) => ({ ...r })),
      exhaustBackPressure: c("engine.exhaustBackPressure", f.engine.exhaustBackPressure),
    },
    blower: { ...f.blower, displacementPerRev: c("blower.displacementPerRev", f.blower.displacementPerRev) },
    drive: {
      ...f.drive,
      crankPulleyDiameter: c("drive.crankPulleyDiameter", f.drive.crankPulleyDiameter),
      blowerPulleyDiameter: c("drive.blowerPulleyDiameter", f.drive.blowerPulleyDiameter),
    },
    ambient: {
      ...f.ambient,
      altitude: c("ambient.altitude", f.ambient.altitude),
      pressure: c("ambient.pressure", f.ambient.pressure),
      temperature: c("ambient.temperature", f.ambient.temperature),
      inletLoss: c("ambient.inletLoss", f.ambient.inletLoss),
      inletRestriction: {
        ratedFlow: c("ambient.inletRestriction.ratedFlow", restriction.ratedFlow),
        ratingDepression: c("ambient.inletRestriction.ratingDepression", restriction.ratingDepression),
      },
    },
    intercooler: {
      ...f.intercooler,
      pressureDrop: c("intercooler.pressureDrop", f.intercooler.pressureDrop),
      coolantTemperature: c("intercooler.coolantTemperature", f.intercooler.coolantTemperature),
    },
    fuel: { ...f.fuel, bsfc: c("fuel.bsfc", f.fuel.bsfc), injectorFlow: c("fuel.injectorFlow", f.fuel.injectorFlow) },
  };
}

const SI_UNITS = /^(m³\/rev|m³|m|Pa|K|kg\/s|kg\/J|rpm)$/;

/**
 * calc's message for a field, with its limits put in the user's units: "Blower pulley diameter
 * must be between 0.03 and 0.5 m" reads "… between 1.18 and 19.7 in" to an imperial user.
 */
export function localizeMessage(path: string, message: string, system: UnitSystem): string {
  const kind = kindOf(path);
  const m = /^(.*) between (\S+) and (\S+?)(?: (\S+))?(?: \((.*)\))?$/.exec(message);
  if (!kind || !m) return message;
  const [, head, lo, hi, unit] = m;
  if (unit !== undefined && !SI_UNITS.test(unit)) return message;
  const a = Number(lo);
  const b = Number(hi);
  if (!Number.isFinite(a) || !Number.isFinite(b)) return message;
  // Unrounded: the limit is rounded inward below, not to the box's precision first.
  const inUnits = (v: number) => (kind === "plain" || kind === "speed" ? v : kind === "percent" ? v * 100 : fromSI(kind, v, system));
  const u = unitOf(path, system);
  return `${head} between ${inward(inUnits(a), "up")} and ${inward(inUnits(b), "down")}${u ? (u === "%" ? " %" : ` ${u}`) : ""}`;
}

/** A limit to three significant digits, rounded towards the inside of the range (see roundInward). */
function inward(v: number, dir: "up" | "down"): string {
  if (v === 0 || !Number.isFinite(v)) return String(v);
  return String(Number(roundInward(v, Math.floor(Math.log10(Math.abs(v))) - 2, dir).toPrecision(3)));
}

/** Field errors keyed by the form's dotted paths, in words and in the user's units. */
export type FormErrors = Record<string, string>;

/** Validates form values with calc's combinationSchema; returns the SI combination or errors by field. */
export function validateForm(f: PlannerForm, system: UnitSystem, base?: Combination): { ok: true; spec: Combination } | { ok: false; errors: FormErrors } {
  const r = combinationSchema.safeParse(toSpec(f, system, base));
  if (r.success) return { ok: true, spec: r.data };
  return { ok: false, errors: issuesToErrors(r.error.issues, system) };
}

/** zod issues (paths of the SI combination, which match the form's) to messages per form field. */
export function issuesToErrors(issues: readonly z.core.$ZodIssue[], system: UnitSystem): FormErrors {
  const out: FormErrors = {};
  for (const issue of issues) {
    const path = issue.path.map(String).join(".");
    if (!(path in out)) out[path] = localizeMessage(path, issue.message, system);
  }
  return out;
}

/** Relative closeness of two saved specs, so a unit round trip is not mistaken for an edit (null ≡ left out). */
export function sameSpec(a: unknown, b: unknown, rel = 1e-5): boolean {
  if (typeof a === "number" && typeof b === "number") {
    if (Number.isNaN(a) || Number.isNaN(b)) return Number.isNaN(a) && Number.isNaN(b);
    return Math.abs(a - b) <= rel * Math.max(Math.abs(a), Math.abs(b), 1e-12);
  }
  if (a === null || b === null || typeof a !== "object" || typeof b !== "object") return a === b;
  if (Array.isArray(a) !== Array.isArray(b)) return false;
  // A refinement given as null and one left out mean the same to calc (off, or its default).
  const ka = Object.keys(a as object).filter((k) => (a as Record<string, unknown>)[k] != null);
  const kb = Object.keys(b as object).filter((k) => (b as Record<string, unknown>)[k] != null);
  if (ka.length !== kb.length) return false;
  return ka.every((k) => sameSpec((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k], rel));
}
