// @ts-nocheck
// The planner's form: the same shape as calc's Combination, but in the user's units (and
// fractions as percentages), plus a few switches the model does not see. Pure, so the
// conversions and the validation can be tested in node. calc's combinationSchema stays the
// one set of rules; this module only converts to SI first and puts the messages in the
// user's units.
function stryNS_9fa48() {
  var g = typeof globalThis === 'object' && globalThis && globalThis.Math === Math && globalThis || new Function("return this")();
  var ns = g.__stryker__ || (g.__stryker__ = {});
  if (ns.activeMutant === undefined && g.process && g.process.env && g.process.env.__STRYKER_ACTIVE_MUTANT__) {
    ns.activeMutant = g.process.env.__STRYKER_ACTIVE_MUTANT__;
  }
  function retrieveNS() {
    return ns;
  }
  stryNS_9fa48 = retrieveNS;
  return retrieveNS();
}
stryNS_9fa48();
function stryCov_9fa48() {
  var ns = stryNS_9fa48();
  var cov = ns.mutantCoverage || (ns.mutantCoverage = {
    static: {},
    perTest: {}
  });
  function cover() {
    var c = cov.static;
    if (ns.currentTestId) {
      c = cov.perTest[ns.currentTestId] = cov.perTest[ns.currentTestId] || {};
    }
    var a = arguments;
    for (var i = 0; i < a.length; i++) {
      c[a[i]] = (c[a[i]] || 0) + 1;
    }
  }
  stryCov_9fa48 = cover;
  cover.apply(null, arguments);
}
function stryMutAct_9fa48(id) {
  var ns = stryNS_9fa48();
  function isActive(id) {
    if (ns.activeMutant === id) {
      if (ns.hitCount !== void 0 && ++ns.hitCount > ns.hitLimit) {
        throw new Error('Stryker: Hit count limit reached (' + ns.hitCount + ')');
      }
      return true;
    }
    return false;
  }
  stryMutAct_9fa48 = isActive;
  return isActive(id);
}
import { z } from "zod";
import { combinationSchema, fromSI, roundInward, toSI, unitLabel, type BlowerKind, type Combination, type CombinationInput, type QuantityKind, unitsToParam, type UnitSystem } from "@/calc";
import { inputDigitsOf, roundTo } from "@/lib/units/format";
import { FORM_ONLY_FIELDS, SPEC_FIELDS, valueAt } from "./field-table";

/** One VE row as edited: engine speed (rpm) and VE in percent. */
export type VeRow = {
  rpm: number;
  ve: number;
};

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
  drive: {
    crankPulleyDiameter: number;
    blowerPulleyDiameter: number;
    beltSlip: number;
  };
  ambient: {
    altitude: number;
    pressure: number;
    temperature: number;
    inletLoss: number;
    /** A flow-rated inlet (optional refinement); its rating depression may be left empty (NaN). */
    inletRestrictionOn: boolean;
    inletRestriction: {
      ratedFlow: number;
      ratingDepression: number;
    };
  };
  intercoolerOn: boolean;
  intercooler: {
    effectiveness: number;
    pressureDrop: number;
    coolantTemperature: number;
  };
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
export const FIELD_KINDS: Readonly<Record<string, FieldKind>> = Object.fromEntries((stryMutAct_9fa48("483") ? [] : (stryCov_9fa48("483"), [...SPEC_FIELDS, ...FORM_ONLY_FIELDS])).flatMap(stryMutAct_9fa48("484") ? () => undefined : (stryCov_9fa48("484"), (f): [string, FieldKind][] => (stryMutAct_9fa48("487") ? f.quantity === "text" && f.quantity === "ve-curve" : stryMutAct_9fa48("486") ? false : stryMutAct_9fa48("485") ? true : (stryCov_9fa48("485", "486", "487"), (stryMutAct_9fa48("489") ? f.quantity !== "text" : stryMutAct_9fa48("488") ? false : (stryCov_9fa48("488", "489"), f.quantity === (stryMutAct_9fa48("490") ? "" : (stryCov_9fa48("490"), "text")))) || (stryMutAct_9fa48("492") ? f.quantity !== "ve-curve" : stryMutAct_9fa48("491") ? false : (stryCov_9fa48("491", "492"), f.quantity === (stryMutAct_9fa48("493") ? "" : (stryCov_9fa48("493"), "ve-curve")))))) ? stryMutAct_9fa48("494") ? ["Stryker was here"] : (stryCov_9fa48("494"), []) : stryMutAct_9fa48("495") ? [] : (stryCov_9fa48("495"), [stryMutAct_9fa48("496") ? [] : (stryCov_9fa48("496"), [f.path, (stryMutAct_9fa48("499") ? f.quantity !== "count" : stryMutAct_9fa48("498") ? false : stryMutAct_9fa48("497") ? true : (stryCov_9fa48("497", "498", "499"), f.quantity === (stryMutAct_9fa48("500") ? "" : (stryCov_9fa48("500"), "count")))) ? stryMutAct_9fa48("501") ? "" : (stryCov_9fa48("501"), "plain") : f.quantity])]))));

/** The kind of a dotted path, VE row indexes folded to "#". */
export function kindOf(path: string): FieldKind | undefined {
  if (stryMutAct_9fa48("502")) {
    {}
  } else {
    stryCov_9fa48("502");
    return FIELD_KINDS[path.replace(stryMutAct_9fa48("504") ? /\.\D+\./ : stryMutAct_9fa48("503") ? /\.\d\./ : (stryCov_9fa48("503", "504"), /\.\d+\./), stryMutAct_9fa48("505") ? "" : (stryCov_9fa48("505"), ".#."))];
  }
}

/** The unit shown beside a field ("" for counts and plain ratios). */
export function unitOf(path: string, system: UnitSystem): string {
  if (stryMutAct_9fa48("506")) {
    {}
  } else {
    stryCov_9fa48("506");
    const kind = kindOf(path);
    if (stryMutAct_9fa48("509") ? !kind && kind === "plain" : stryMutAct_9fa48("508") ? false : stryMutAct_9fa48("507") ? true : (stryCov_9fa48("507", "508", "509"), (stryMutAct_9fa48("510") ? kind : (stryCov_9fa48("510"), !kind)) || (stryMutAct_9fa48("512") ? kind !== "plain" : stryMutAct_9fa48("511") ? false : (stryCov_9fa48("511", "512"), kind === (stryMutAct_9fa48("513") ? "" : (stryCov_9fa48("513"), "plain")))))) return stryMutAct_9fa48("514") ? "Stryker was here!" : (stryCov_9fa48("514"), "");
    if (stryMutAct_9fa48("517") ? kind !== "percent" : stryMutAct_9fa48("516") ? false : stryMutAct_9fa48("515") ? true : (stryCov_9fa48("515", "516", "517"), kind === (stryMutAct_9fa48("518") ? "" : (stryCov_9fa48("518"), "percent")))) return stryMutAct_9fa48("519") ? "" : (stryCov_9fa48("519"), "%");
    return unitLabel(kind, system);
  }
}

/** A form number to SI. */
export function fieldToSI(kind: FieldKind, v: number, system: UnitSystem): number {
  if (stryMutAct_9fa48("520")) {
    {}
  } else {
    stryCov_9fa48("520");
    if (stryMutAct_9fa48("523") ? kind !== "plain" : stryMutAct_9fa48("522") ? false : stryMutAct_9fa48("521") ? true : (stryCov_9fa48("521", "522", "523"), kind === (stryMutAct_9fa48("524") ? "" : (stryCov_9fa48("524"), "plain")))) return v;
    if (stryMutAct_9fa48("527") ? kind !== "percent" : stryMutAct_9fa48("526") ? false : stryMutAct_9fa48("525") ? true : (stryCov_9fa48("525", "526", "527"), kind === (stryMutAct_9fa48("528") ? "" : (stryCov_9fa48("528"), "percent")))) return stryMutAct_9fa48("529") ? v * 100 : (stryCov_9fa48("529"), v / 100);
    return toSI(kind, v, system);
  }
}

/** Decimal places of a percentage box (a 2.5 % belt slip, an 84.25 % VE cell). */
const PERCENT_DIGITS = 2;

/** A SI number to the form, at the input precision of its unit (see inputDigitsOf). */
export function fieldFromSI(kind: FieldKind, v: number, system: UnitSystem): number {
  if (stryMutAct_9fa48("530")) {
    {}
  } else {
    stryCov_9fa48("530");
    if (stryMutAct_9fa48("533") ? kind !== "plain" : stryMutAct_9fa48("532") ? false : stryMutAct_9fa48("531") ? true : (stryCov_9fa48("531", "532", "533"), kind === (stryMutAct_9fa48("534") ? "" : (stryCov_9fa48("534"), "plain")))) return v;
    if (stryMutAct_9fa48("537") ? kind !== "percent" : stryMutAct_9fa48("536") ? false : stryMutAct_9fa48("535") ? true : (stryCov_9fa48("535", "536", "537"), kind === (stryMutAct_9fa48("538") ? "" : (stryCov_9fa48("538"), "percent")))) return roundTo(stryMutAct_9fa48("539") ? v / 100 : (stryCov_9fa48("539"), v * 100), PERCENT_DIGITS);
    return roundTo(fromSI(kind, v, system), inputDigitsOf(kind, system));
  }
}
const num = stryMutAct_9fa48("540") ? () => undefined : (stryCov_9fa48("540"), (() => {
  const num = (v: unknown): number => (stryMutAct_9fa48("543") ? typeof v !== "number" : stryMutAct_9fa48("542") ? false : stryMutAct_9fa48("541") ? true : (stryCov_9fa48("541", "542", "543"), typeof v === (stryMutAct_9fa48("544") ? "" : (stryCov_9fa48("544"), "number")))) ? v : (stryMutAct_9fa48("547") ? v === "" && v == null : stryMutAct_9fa48("546") ? false : stryMutAct_9fa48("545") ? true : (stryCov_9fa48("545", "546", "547"), (stryMutAct_9fa48("549") ? v !== "" : stryMutAct_9fa48("548") ? false : (stryCov_9fa48("548", "549"), v === (stryMutAct_9fa48("550") ? "Stryker was here!" : (stryCov_9fa48("550"), "")))) || (stryMutAct_9fa48("552") ? v != null : stryMutAct_9fa48("551") ? false : (stryCov_9fa48("551", "552"), v == null)))) ? Number.NaN : Number(v);
  return num;
})());

/**
 * The form values as a calc Combination input (SI, fractions); switched-off parts become null.
 * Given the stored combination the form was filled from (`base`), a field still showing exactly
 * what that stored value displays as keeps the stored value itself: a save in inches does not
 * turn an untouched 0.005 m³ into 0.0049999997 m³.
 */
const storedAt = stryMutAct_9fa48("553") ? () => undefined : (stryCov_9fa48("553"), (() => {
  const storedAt = (base: Combination | undefined, path: string): unknown => valueAt(base, path);
  return storedAt;
})());
export function toSpec(f: PlannerForm, system: UnitSystem, base?: Combination): CombinationInput {
  if (stryMutAct_9fa48("554")) {
    {}
  } else {
    stryCov_9fa48("554");
    const stored = stryMutAct_9fa48("555") ? () => undefined : (stryCov_9fa48("555"), (() => {
      const stored = (path: string) => storedAt(base, path);
      return stored;
    })());
    const q = (path: string, v: unknown) => {
      if (stryMutAct_9fa48("556")) {
        {}
      } else {
        stryCov_9fa48("556");
        const kind = kindOf(path)!;
        const n = num(v);
        const b = stored(path);
        return (stryMutAct_9fa48("559") ? typeof b === "number" || fieldFromSI(kind, b, system) === n : stryMutAct_9fa48("558") ? false : stryMutAct_9fa48("557") ? true : (stryCov_9fa48("557", "558", "559"), (stryMutAct_9fa48("561") ? typeof b !== "number" : stryMutAct_9fa48("560") ? true : (stryCov_9fa48("560", "561"), typeof b === (stryMutAct_9fa48("562") ? "" : (stryCov_9fa48("562"), "number")))) && (stryMutAct_9fa48("564") ? fieldFromSI(kind, b, system) !== n : stryMutAct_9fa48("563") ? true : (stryCov_9fa48("563", "564"), fieldFromSI(kind, b, system) === n)))) ? b : fieldToSI(kind, n, system);
      }
    };
    // An optional field left empty is left out again, or stays null where the stored spec said null.
    const opt = stryMutAct_9fa48("565") ? () => undefined : (stryCov_9fa48("565"), (() => {
      const opt = (path: string, v: unknown) => Number.isNaN(num(v)) ? (stryMutAct_9fa48("568") ? stored(path) !== null : stryMutAct_9fa48("567") ? false : stryMutAct_9fa48("566") ? true : (stryCov_9fa48("566", "567", "568"), stored(path) === null)) ? null : undefined : q(path, v);
      return opt;
    })());
    const optional = stryMutAct_9fa48("569") ? () => undefined : (stryCov_9fa48("569"), (() => {
      const optional = (path: string, v: unknown) => stryMutAct_9fa48("570") ? opt(path, v) && undefined : (stryCov_9fa48("570"), opt(path, v) ?? undefined);
      return optional;
    })());
    const restriction = stryMutAct_9fa48("571") ? f.ambient.inletRestriction && NO_RESTRICTION : (stryCov_9fa48("571"), f.ambient.inletRestriction ?? NO_RESTRICTION); // a draft kept before these fields
    return stryMutAct_9fa48("572") ? {} : (stryCov_9fa48("572"), {
      engine: stryMutAct_9fa48("573") ? {} : (stryCov_9fa48("573"), {
        displacement: q(stryMutAct_9fa48("574") ? "" : (stryCov_9fa48("574"), "engine.displacement"), f.engine.displacement),
        cylinders: num(f.engine.cylinders),
        redlineRpm: num(f.engine.redlineRpm),
        veCurve: f.engine.veCurve.map(stryMutAct_9fa48("575") ? () => undefined : (stryCov_9fa48("575"), (r, i) => stryMutAct_9fa48("576") ? {} : (stryCov_9fa48("576"), {
          rpm: num(r.rpm),
          ve: q(stryMutAct_9fa48("577") ? `` : (stryCov_9fa48("577"), `engine.veCurve.${i}.ve`), r.ve)
        }))),
        chargeTemperatureExponent: optional(stryMutAct_9fa48("578") ? "" : (stryCov_9fa48("578"), "engine.chargeTemperatureExponent"), f.engine.chargeTemperatureExponent),
        compressionRatio: opt(stryMutAct_9fa48("579") ? "" : (stryCov_9fa48("579"), "engine.compressionRatio"), f.engine.compressionRatio),
        exhaustBackPressure: optional(stryMutAct_9fa48("580") ? "" : (stryCov_9fa48("580"), "engine.exhaustBackPressure"), f.engine.exhaustBackPressure)
      }),
      blower: stryMutAct_9fa48("581") ? {} : (stryCov_9fa48("581"), {
        kind: f.blower.kind,
        displacementPerRev: q(stryMutAct_9fa48("582") ? "" : (stryCov_9fa48("582"), "blower.displacementPerRev"), f.blower.displacementPerRev),
        builtInVolumeRatio: num(f.blower.builtInVolumeRatio),
        maxRpm: num(f.blower.maxRpm),
        volumetricEfficiencyRef: q(stryMutAct_9fa48("583") ? "" : (stryCov_9fa48("583"), "blower.volumetricEfficiencyRef"), f.blower.volumetricEfficiencyRef),
        referenceRpm: num(f.blower.referenceRpm),
        internalEfficiency: q(stryMutAct_9fa48("584") ? "" : (stryCov_9fa48("584"), "blower.internalEfficiency"), f.blower.internalEfficiency),
        mechanicalEfficiency: q(stryMutAct_9fa48("585") ? "" : (stryCov_9fa48("585"), "blower.mechanicalEfficiency"), f.blower.mechanicalEfficiency)
      }),
      drive: stryMutAct_9fa48("586") ? {} : (stryCov_9fa48("586"), {
        crankPulleyDiameter: q(stryMutAct_9fa48("587") ? "" : (stryCov_9fa48("587"), "drive.crankPulleyDiameter"), f.drive.crankPulleyDiameter),
        blowerPulleyDiameter: q(stryMutAct_9fa48("588") ? "" : (stryCov_9fa48("588"), "drive.blowerPulleyDiameter"), f.drive.blowerPulleyDiameter),
        beltSlip: q(stryMutAct_9fa48("589") ? "" : (stryCov_9fa48("589"), "drive.beltSlip"), f.drive.beltSlip)
      }),
      ambient: stryMutAct_9fa48("590") ? {} : (stryCov_9fa48("590"), {
        pressure: q(stryMutAct_9fa48("591") ? "" : (stryCov_9fa48("591"), "ambient.pressure"), f.ambient.pressure),
        temperature: q(stryMutAct_9fa48("592") ? "" : (stryCov_9fa48("592"), "ambient.temperature"), f.ambient.temperature),
        inletLoss: q(stryMutAct_9fa48("593") ? "" : (stryCov_9fa48("593"), "ambient.inletLoss"), f.ambient.inletLoss),
        inletRestriction: f.ambient.inletRestrictionOn ? stryMutAct_9fa48("594") ? {} : (stryCov_9fa48("594"), {
          ratedFlow: q(stryMutAct_9fa48("595") ? "" : (stryCov_9fa48("595"), "ambient.inletRestriction.ratedFlow"), restriction.ratedFlow),
          ratingDepression: optional(stryMutAct_9fa48("596") ? "" : (stryCov_9fa48("596"), "ambient.inletRestriction.ratingDepression"), restriction.ratingDepression)
        }) : (stryMutAct_9fa48("599") ? stored("ambient.inletRestriction") !== null : stryMutAct_9fa48("598") ? false : stryMutAct_9fa48("597") ? true : (stryCov_9fa48("597", "598", "599"), stored(stryMutAct_9fa48("600") ? "" : (stryCov_9fa48("600"), "ambient.inletRestriction")) === null)) ? null : undefined
      }),
      intercooler: f.intercoolerOn ? stryMutAct_9fa48("601") ? {} : (stryCov_9fa48("601"), {
        effectiveness: q(stryMutAct_9fa48("602") ? "" : (stryCov_9fa48("602"), "intercooler.effectiveness"), f.intercooler.effectiveness),
        pressureDrop: q(stryMutAct_9fa48("603") ? "" : (stryCov_9fa48("603"), "intercooler.pressureDrop"), f.intercooler.pressureDrop),
        coolantTemperature: q(stryMutAct_9fa48("604") ? "" : (stryCov_9fa48("604"), "intercooler.coolantTemperature"), f.intercooler.coolantTemperature)
      }) : null,
      fuel: stryMutAct_9fa48("605") ? {} : (stryCov_9fa48("605"), {
        afr: num(f.fuel.afr),
        bsfc: q(stryMutAct_9fa48("606") ? "" : (stryCov_9fa48("606"), "fuel.bsfc"), f.fuel.bsfc),
        injectorCount: f.fuel.injectorsOn ? num(f.fuel.injectorCount) : null,
        injectorFlow: f.fuel.injectorsOn ? q(stryMutAct_9fa48("607") ? "" : (stryCov_9fa48("607"), "fuel.injectorFlow"), f.fuel.injectorFlow) : null,
        maxDuty: q(stryMutAct_9fa48("608") ? "" : (stryCov_9fa48("608"), "fuel.maxDuty"), f.fuel.maxDuty),
        evaporatedBeforeBlower: q(stryMutAct_9fa48("609") ? "" : (stryCov_9fa48("609"), "fuel.evaporatedBeforeBlower"), f.fuel.evaporatedBeforeBlower),
        evaporatedInBlower: optional(stryMutAct_9fa48("610") ? "" : (stryCov_9fa48("610"), "fuel.evaporatedInBlower"), f.fuel.evaporatedInBlower),
        evaporatedInPort: optional(stryMutAct_9fa48("611") ? "" : (stryCov_9fa48("611"), "fuel.evaporatedInPort"), f.fuel.evaporatedInPort)
      })
    });
  }
}
const NO_RESTRICTION = stryMutAct_9fa48("612") ? {} : (stryCov_9fa48("612"), {
  ratedFlow: Number.NaN,
  ratingDepression: Number.NaN
});

/** Demo starting values for parts a saved spec leaves out (an intercooler, injectors): invented. */
const SPARE_INTERCOOLER = stryMutAct_9fa48("613") ? {} : (stryCov_9fa48("613"), {
  effectiveness: 0.7,
  pressureDrop: 3000,
  coolantTemperature: 308.15
});
const SPARE_INJECTORS = stryMutAct_9fa48("614") ? {} : (stryCov_9fa48("614"), {
  injectorCount: 8,
  injectorFlow: 0.005
});
/** About 750 cfm, rating depression left to calc's default. */
const SPARE_INLET_RESTRICTION = stryMutAct_9fa48("615") ? {} : (stryCov_9fa48("615"), {
  ratedFlow: 0.354,
  ratingDepression: undefined
});

/** A saved combination (SI) as form values in `system`. */
export function toForm(spec: Combination, system: UnitSystem, altitude = 0): PlannerForm {
  if (stryMutAct_9fa48("616")) {
    {}
  } else {
    stryCov_9fa48("616");
    const s = stryMutAct_9fa48("617") ? () => undefined : (stryCov_9fa48("617"), (() => {
      const s = (path: string, v: number) => fieldFromSI(FIELD_KINDS[path], v, system);
      return s;
    })());
    const opt = stryMutAct_9fa48("618") ? () => undefined : (stryCov_9fa48("618"), (() => {
      const opt = (path: string, v: number | null | undefined) => (stryMutAct_9fa48("621") ? v != null : stryMutAct_9fa48("620") ? false : stryMutAct_9fa48("619") ? true : (stryCov_9fa48("619", "620", "621"), v == null)) ? Number.NaN : s(path, v);
      return opt;
    })());
    const inlet = stryMutAct_9fa48("622") ? spec.ambient.inletRestriction && SPARE_INLET_RESTRICTION : (stryCov_9fa48("622"), spec.ambient.inletRestriction ?? SPARE_INLET_RESTRICTION);
    const ic = stryMutAct_9fa48("623") ? spec.intercooler && SPARE_INTERCOOLER : (stryCov_9fa48("623"), spec.intercooler ?? SPARE_INTERCOOLER);
    const hasInjectors = stryMutAct_9fa48("626") ? spec.fuel.injectorCount != null || spec.fuel.injectorFlow != null : stryMutAct_9fa48("625") ? false : stryMutAct_9fa48("624") ? true : (stryCov_9fa48("624", "625", "626"), (stryMutAct_9fa48("628") ? spec.fuel.injectorCount == null : stryMutAct_9fa48("627") ? true : (stryCov_9fa48("627", "628"), spec.fuel.injectorCount != null)) && (stryMutAct_9fa48("630") ? spec.fuel.injectorFlow == null : stryMutAct_9fa48("629") ? true : (stryCov_9fa48("629", "630"), spec.fuel.injectorFlow != null)));
    return stryMutAct_9fa48("631") ? {} : (stryCov_9fa48("631"), {
      engine: stryMutAct_9fa48("632") ? {} : (stryCov_9fa48("632"), {
        displacement: s(stryMutAct_9fa48("633") ? "" : (stryCov_9fa48("633"), "engine.displacement"), spec.engine.displacement),
        cylinders: spec.engine.cylinders,
        redlineRpm: spec.engine.redlineRpm,
        veCurve: spec.engine.veCurve.map(stryMutAct_9fa48("634") ? () => undefined : (stryCov_9fa48("634"), p => stryMutAct_9fa48("635") ? {} : (stryCov_9fa48("635"), {
          rpm: p.rpm,
          ve: fieldFromSI(stryMutAct_9fa48("636") ? "" : (stryCov_9fa48("636"), "percent"), p.ve, system)
        }))),
        chargeTemperatureExponent: opt(stryMutAct_9fa48("637") ? "" : (stryCov_9fa48("637"), "engine.chargeTemperatureExponent"), spec.engine.chargeTemperatureExponent),
        compressionRatio: opt(stryMutAct_9fa48("638") ? "" : (stryCov_9fa48("638"), "engine.compressionRatio"), spec.engine.compressionRatio),
        exhaustBackPressure: opt(stryMutAct_9fa48("639") ? "" : (stryCov_9fa48("639"), "engine.exhaustBackPressure"), spec.engine.exhaustBackPressure)
      }),
      blower: stryMutAct_9fa48("640") ? {} : (stryCov_9fa48("640"), {
        kind: spec.blower.kind,
        displacementPerRev: s(stryMutAct_9fa48("641") ? "" : (stryCov_9fa48("641"), "blower.displacementPerRev"), spec.blower.displacementPerRev),
        builtInVolumeRatio: spec.blower.builtInVolumeRatio,
        maxRpm: spec.blower.maxRpm,
        volumetricEfficiencyRef: s(stryMutAct_9fa48("642") ? "" : (stryCov_9fa48("642"), "blower.volumetricEfficiencyRef"), spec.blower.volumetricEfficiencyRef),
        referenceRpm: spec.blower.referenceRpm,
        internalEfficiency: s(stryMutAct_9fa48("643") ? "" : (stryCov_9fa48("643"), "blower.internalEfficiency"), spec.blower.internalEfficiency),
        mechanicalEfficiency: s(stryMutAct_9fa48("644") ? "" : (stryCov_9fa48("644"), "blower.mechanicalEfficiency"), spec.blower.mechanicalEfficiency)
      }),
      drive: stryMutAct_9fa48("645") ? {} : (stryCov_9fa48("645"), {
        crankPulleyDiameter: s(stryMutAct_9fa48("646") ? "" : (stryCov_9fa48("646"), "drive.crankPulleyDiameter"), spec.drive.crankPulleyDiameter),
        blowerPulleyDiameter: s(stryMutAct_9fa48("647") ? "" : (stryCov_9fa48("647"), "drive.blowerPulleyDiameter"), spec.drive.blowerPulleyDiameter),
        beltSlip: s(stryMutAct_9fa48("648") ? "" : (stryCov_9fa48("648"), "drive.beltSlip"), spec.drive.beltSlip)
      }),
      ambient: stryMutAct_9fa48("649") ? {} : (stryCov_9fa48("649"), {
        altitude: s(stryMutAct_9fa48("650") ? "" : (stryCov_9fa48("650"), "ambient.altitude"), altitude),
        pressure: s(stryMutAct_9fa48("651") ? "" : (stryCov_9fa48("651"), "ambient.pressure"), spec.ambient.pressure),
        temperature: s(stryMutAct_9fa48("652") ? "" : (stryCov_9fa48("652"), "ambient.temperature"), spec.ambient.temperature),
        inletLoss: s(stryMutAct_9fa48("653") ? "" : (stryCov_9fa48("653"), "ambient.inletLoss"), spec.ambient.inletLoss),
        inletRestrictionOn: stryMutAct_9fa48("656") ? spec.ambient.inletRestriction == null : stryMutAct_9fa48("655") ? false : stryMutAct_9fa48("654") ? true : (stryCov_9fa48("654", "655", "656"), spec.ambient.inletRestriction != null),
        inletRestriction: stryMutAct_9fa48("657") ? {} : (stryCov_9fa48("657"), {
          ratedFlow: s(stryMutAct_9fa48("658") ? "" : (stryCov_9fa48("658"), "ambient.inletRestriction.ratedFlow"), inlet.ratedFlow),
          ratingDepression: opt(stryMutAct_9fa48("659") ? "" : (stryCov_9fa48("659"), "ambient.inletRestriction.ratingDepression"), inlet.ratingDepression)
        })
      }),
      intercoolerOn: stryMutAct_9fa48("662") ? spec.intercooler === null : stryMutAct_9fa48("661") ? false : stryMutAct_9fa48("660") ? true : (stryCov_9fa48("660", "661", "662"), spec.intercooler !== null),
      intercooler: stryMutAct_9fa48("663") ? {} : (stryCov_9fa48("663"), {
        effectiveness: s(stryMutAct_9fa48("664") ? "" : (stryCov_9fa48("664"), "intercooler.effectiveness"), ic.effectiveness),
        pressureDrop: s(stryMutAct_9fa48("665") ? "" : (stryCov_9fa48("665"), "intercooler.pressureDrop"), ic.pressureDrop),
        coolantTemperature: s(stryMutAct_9fa48("666") ? "" : (stryCov_9fa48("666"), "intercooler.coolantTemperature"), ic.coolantTemperature)
      }),
      fuel: stryMutAct_9fa48("667") ? {} : (stryCov_9fa48("667"), {
        afr: spec.fuel.afr,
        bsfc: s(stryMutAct_9fa48("668") ? "" : (stryCov_9fa48("668"), "fuel.bsfc"), spec.fuel.bsfc),
        injectorsOn: hasInjectors,
        injectorCount: stryMutAct_9fa48("669") ? spec.fuel.injectorCount && SPARE_INJECTORS.injectorCount : (stryCov_9fa48("669"), spec.fuel.injectorCount ?? SPARE_INJECTORS.injectorCount),
        injectorFlow: s(stryMutAct_9fa48("670") ? "" : (stryCov_9fa48("670"), "fuel.injectorFlow"), stryMutAct_9fa48("671") ? spec.fuel.injectorFlow && SPARE_INJECTORS.injectorFlow : (stryCov_9fa48("671"), spec.fuel.injectorFlow ?? SPARE_INJECTORS.injectorFlow)),
        maxDuty: s(stryMutAct_9fa48("672") ? "" : (stryCov_9fa48("672"), "fuel.maxDuty"), spec.fuel.maxDuty),
        evaporatedBeforeBlower: s(stryMutAct_9fa48("673") ? "" : (stryCov_9fa48("673"), "fuel.evaporatedBeforeBlower"), spec.fuel.evaporatedBeforeBlower),
        evaporatedInBlower: opt(stryMutAct_9fa48("674") ? "" : (stryCov_9fa48("674"), "fuel.evaporatedInBlower"), spec.fuel.evaporatedInBlower),
        evaporatedInPort: opt(stryMutAct_9fa48("675") ? "" : (stryCov_9fa48("675"), "fuel.evaporatedInPort"), spec.fuel.evaporatedInPort)
      })
    });
  }
}

/**
 * Every quantity of the form re-expressed from one choice of units in another (switches and counts
 * kept). A field still showing its stored value (`base`) is re-expressed from that stored SI value,
 * not from its rounded figure, so a round trip leaves the stored spec byte-identical.
 */
export function convertForm(f: PlannerForm, from: UnitSystem, to: UnitSystem, base?: Combination): PlannerForm {
  if (stryMutAct_9fa48("676")) {
    {}
  } else {
    stryCov_9fa48("676");
    if (stryMutAct_9fa48("679") ? unitsToParam(from) !== unitsToParam(to) : stryMutAct_9fa48("678") ? false : stryMutAct_9fa48("677") ? true : (stryCov_9fa48("677", "678", "679"), unitsToParam(from) === unitsToParam(to))) return f;
    const restriction = stryMutAct_9fa48("680") ? f.ambient.inletRestriction && NO_RESTRICTION : (stryCov_9fa48("680"), f.ambient.inletRestriction ?? NO_RESTRICTION);
    const c = (path: string, v: number) => {
      if (stryMutAct_9fa48("681")) {
        {}
      } else {
        stryCov_9fa48("681");
        const kind = FIELD_KINDS[path];
        const b = storedAt(base, path);
        if (stryMutAct_9fa48("684") ? typeof b === "number" || fieldFromSI(kind, b, from) === num(v) : stryMutAct_9fa48("683") ? false : stryMutAct_9fa48("682") ? true : (stryCov_9fa48("682", "683", "684"), (stryMutAct_9fa48("686") ? typeof b !== "number" : stryMutAct_9fa48("685") ? true : (stryCov_9fa48("685", "686"), typeof b === (stryMutAct_9fa48("687") ? "" : (stryCov_9fa48("687"), "number")))) && (stryMutAct_9fa48("689") ? fieldFromSI(kind, b, from) !== num(v) : stryMutAct_9fa48("688") ? true : (stryCov_9fa48("688", "689"), fieldFromSI(kind, b, from) === num(v))))) return fieldFromSI(kind, b, to);
        return fieldFromSI(kind, fieldToSI(kind, num(v), from), to);
      }
    };
    return stryMutAct_9fa48("690") ? {} : (stryCov_9fa48("690"), {
      ...f,
      engine: stryMutAct_9fa48("691") ? {} : (stryCov_9fa48("691"), {
        ...f.engine,
        displacement: c(stryMutAct_9fa48("692") ? "" : (stryCov_9fa48("692"), "engine.displacement"), f.engine.displacement),
        veCurve: f.engine.veCurve.map(stryMutAct_9fa48("693") ? () => undefined : (stryCov_9fa48("693"), r => stryMutAct_9fa48("694") ? {} : (stryCov_9fa48("694"), {
          ...r
        }))),
        exhaustBackPressure: c(stryMutAct_9fa48("695") ? "" : (stryCov_9fa48("695"), "engine.exhaustBackPressure"), f.engine.exhaustBackPressure)
      }),
      blower: stryMutAct_9fa48("696") ? {} : (stryCov_9fa48("696"), {
        ...f.blower,
        displacementPerRev: c(stryMutAct_9fa48("697") ? "" : (stryCov_9fa48("697"), "blower.displacementPerRev"), f.blower.displacementPerRev)
      }),
      drive: stryMutAct_9fa48("698") ? {} : (stryCov_9fa48("698"), {
        ...f.drive,
        crankPulleyDiameter: c(stryMutAct_9fa48("699") ? "" : (stryCov_9fa48("699"), "drive.crankPulleyDiameter"), f.drive.crankPulleyDiameter),
        blowerPulleyDiameter: c(stryMutAct_9fa48("700") ? "" : (stryCov_9fa48("700"), "drive.blowerPulleyDiameter"), f.drive.blowerPulleyDiameter)
      }),
      ambient: stryMutAct_9fa48("701") ? {} : (stryCov_9fa48("701"), {
        ...f.ambient,
        altitude: c(stryMutAct_9fa48("702") ? "" : (stryCov_9fa48("702"), "ambient.altitude"), f.ambient.altitude),
        pressure: c(stryMutAct_9fa48("703") ? "" : (stryCov_9fa48("703"), "ambient.pressure"), f.ambient.pressure),
        temperature: c(stryMutAct_9fa48("704") ? "" : (stryCov_9fa48("704"), "ambient.temperature"), f.ambient.temperature),
        inletLoss: c(stryMutAct_9fa48("705") ? "" : (stryCov_9fa48("705"), "ambient.inletLoss"), f.ambient.inletLoss),
        inletRestriction: stryMutAct_9fa48("706") ? {} : (stryCov_9fa48("706"), {
          ratedFlow: c(stryMutAct_9fa48("707") ? "" : (stryCov_9fa48("707"), "ambient.inletRestriction.ratedFlow"), restriction.ratedFlow),
          ratingDepression: c(stryMutAct_9fa48("708") ? "" : (stryCov_9fa48("708"), "ambient.inletRestriction.ratingDepression"), restriction.ratingDepression)
        })
      }),
      intercooler: stryMutAct_9fa48("709") ? {} : (stryCov_9fa48("709"), {
        ...f.intercooler,
        pressureDrop: c(stryMutAct_9fa48("710") ? "" : (stryCov_9fa48("710"), "intercooler.pressureDrop"), f.intercooler.pressureDrop),
        coolantTemperature: c(stryMutAct_9fa48("711") ? "" : (stryCov_9fa48("711"), "intercooler.coolantTemperature"), f.intercooler.coolantTemperature)
      }),
      fuel: stryMutAct_9fa48("712") ? {} : (stryCov_9fa48("712"), {
        ...f.fuel,
        bsfc: c(stryMutAct_9fa48("713") ? "" : (stryCov_9fa48("713"), "fuel.bsfc"), f.fuel.bsfc),
        injectorFlow: c(stryMutAct_9fa48("714") ? "" : (stryCov_9fa48("714"), "fuel.injectorFlow"), f.fuel.injectorFlow)
      })
    });
  }
}
const SI_UNITS = stryMutAct_9fa48("716") ? /^(m³\/rev|m³|m|Pa|K|kg\/s|kg\/J|rpm)/ : stryMutAct_9fa48("715") ? /(m³\/rev|m³|m|Pa|K|kg\/s|kg\/J|rpm)$/ : (stryCov_9fa48("715", "716"), /^(m³\/rev|m³|m|Pa|K|kg\/s|kg\/J|rpm)$/);

/**
 * calc's message for a field, with its limits put in the user's units: "Blower pulley diameter
 * must be between 0.03 and 0.5 m" reads "… between 1.18 and 19.7 in" to an imperial user.
 */
export function localizeMessage(path: string, message: string, system: UnitSystem): string {
  if (stryMutAct_9fa48("717")) {
    {}
  } else {
    stryCov_9fa48("717");
    const kind = kindOf(path);
    const m = (stryMutAct_9fa48("729") ? /^(.*) between (\S+) and (\S+?)(?: (\S+))?(?: \((.)\))?$/ : stryMutAct_9fa48("728") ? /^(.*) between (\S+) and (\S+?)(?: (\S+))?(?: \((.*)\))$/ : stryMutAct_9fa48("727") ? /^(.*) between (\S+) and (\S+?)(?: (\s+))?(?: \((.*)\))?$/ : stryMutAct_9fa48("726") ? /^(.*) between (\S+) and (\S+?)(?: (\S))?(?: \((.*)\))?$/ : stryMutAct_9fa48("725") ? /^(.*) between (\S+) and (\S+?)(?: (\S+))(?: \((.*)\))?$/ : stryMutAct_9fa48("724") ? /^(.*) between (\S+) and (\s+?)(?: (\S+))?(?: \((.*)\))?$/ : stryMutAct_9fa48("723") ? /^(.*) between (\S+) and (\S)(?: (\S+))?(?: \((.*)\))?$/ : stryMutAct_9fa48("722") ? /^(.*) between (\s+) and (\S+?)(?: (\S+))?(?: \((.*)\))?$/ : stryMutAct_9fa48("721") ? /^(.*) between (\S) and (\S+?)(?: (\S+))?(?: \((.*)\))?$/ : stryMutAct_9fa48("720") ? /^(.) between (\S+) and (\S+?)(?: (\S+))?(?: \((.*)\))?$/ : stryMutAct_9fa48("719") ? /^(.*) between (\S+) and (\S+?)(?: (\S+))?(?: \((.*)\))?/ : stryMutAct_9fa48("718") ? /(.*) between (\S+) and (\S+?)(?: (\S+))?(?: \((.*)\))?$/ : (stryCov_9fa48("718", "719", "720", "721", "722", "723", "724", "725", "726", "727", "728", "729"), /^(.*) between (\S+) and (\S+?)(?: (\S+))?(?: \((.*)\))?$/)).exec(message);
    if (stryMutAct_9fa48("732") ? !kind && !m : stryMutAct_9fa48("731") ? false : stryMutAct_9fa48("730") ? true : (stryCov_9fa48("730", "731", "732"), (stryMutAct_9fa48("733") ? kind : (stryCov_9fa48("733"), !kind)) || (stryMutAct_9fa48("734") ? m : (stryCov_9fa48("734"), !m)))) return message;
    const [, head, lo, hi, unit] = m;
    if (stryMutAct_9fa48("737") ? unit !== undefined || !SI_UNITS.test(unit) : stryMutAct_9fa48("736") ? false : stryMutAct_9fa48("735") ? true : (stryCov_9fa48("735", "736", "737"), (stryMutAct_9fa48("739") ? unit === undefined : stryMutAct_9fa48("738") ? true : (stryCov_9fa48("738", "739"), unit !== undefined)) && (stryMutAct_9fa48("740") ? SI_UNITS.test(unit) : (stryCov_9fa48("740"), !SI_UNITS.test(unit))))) return message;
    const a = Number(lo);
    const b = Number(hi);
    if (stryMutAct_9fa48("743") ? !Number.isFinite(a) && !Number.isFinite(b) : stryMutAct_9fa48("742") ? false : stryMutAct_9fa48("741") ? true : (stryCov_9fa48("741", "742", "743"), (stryMutAct_9fa48("744") ? Number.isFinite(a) : (stryCov_9fa48("744"), !Number.isFinite(a))) || (stryMutAct_9fa48("745") ? Number.isFinite(b) : (stryCov_9fa48("745"), !Number.isFinite(b))))) return message;
    // Unrounded: the limit is rounded inward below, not to the box's precision first.
    const inUnits = stryMutAct_9fa48("746") ? () => undefined : (stryCov_9fa48("746"), (() => {
      const inUnits = (v: number) => (stryMutAct_9fa48("749") ? kind === "plain" && kind === "speed" : stryMutAct_9fa48("748") ? false : stryMutAct_9fa48("747") ? true : (stryCov_9fa48("747", "748", "749"), (stryMutAct_9fa48("751") ? kind !== "plain" : stryMutAct_9fa48("750") ? false : (stryCov_9fa48("750", "751"), kind === (stryMutAct_9fa48("752") ? "" : (stryCov_9fa48("752"), "plain")))) || (stryMutAct_9fa48("754") ? kind !== "speed" : stryMutAct_9fa48("753") ? false : (stryCov_9fa48("753", "754"), kind === (stryMutAct_9fa48("755") ? "" : (stryCov_9fa48("755"), "speed")))))) ? v : (stryMutAct_9fa48("758") ? kind !== "percent" : stryMutAct_9fa48("757") ? false : stryMutAct_9fa48("756") ? true : (stryCov_9fa48("756", "757", "758"), kind === (stryMutAct_9fa48("759") ? "" : (stryCov_9fa48("759"), "percent")))) ? stryMutAct_9fa48("760") ? v / 100 : (stryCov_9fa48("760"), v * 100) : fromSI(kind, v, system);
      return inUnits;
    })());
    const u = unitOf(path, system);
    return stryMutAct_9fa48("761") ? `` : (stryCov_9fa48("761"), `${head} between ${inward(inUnits(a), stryMutAct_9fa48("762") ? "" : (stryCov_9fa48("762"), "up"))} and ${inward(inUnits(b), stryMutAct_9fa48("763") ? "" : (stryCov_9fa48("763"), "down"))}${u ? (stryMutAct_9fa48("766") ? u !== "%" : stryMutAct_9fa48("765") ? false : stryMutAct_9fa48("764") ? true : (stryCov_9fa48("764", "765", "766"), u === (stryMutAct_9fa48("767") ? "" : (stryCov_9fa48("767"), "%")))) ? stryMutAct_9fa48("768") ? "" : (stryCov_9fa48("768"), " %") : stryMutAct_9fa48("769") ? `` : (stryCov_9fa48("769"), ` ${u}`) : stryMutAct_9fa48("770") ? "Stryker was here!" : (stryCov_9fa48("770"), "")}`);
  }
}

/** A limit to three significant digits, rounded towards the inside of the range (see roundInward). */
function inward(v: number, dir: "up" | "down"): string {
  if (stryMutAct_9fa48("771")) {
    {}
  } else {
    stryCov_9fa48("771");
    if (stryMutAct_9fa48("774") ? v === 0 && !Number.isFinite(v) : stryMutAct_9fa48("773") ? false : stryMutAct_9fa48("772") ? true : (stryCov_9fa48("772", "773", "774"), (stryMutAct_9fa48("776") ? v !== 0 : stryMutAct_9fa48("775") ? false : (stryCov_9fa48("775", "776"), v === 0)) || (stryMutAct_9fa48("777") ? Number.isFinite(v) : (stryCov_9fa48("777"), !Number.isFinite(v))))) return String(v);
    return String(Number(roundInward(v, stryMutAct_9fa48("778") ? Math.floor(Math.log10(Math.abs(v))) + 2 : (stryCov_9fa48("778"), Math.floor(Math.log10(Math.abs(v))) - 2), dir).toPrecision(3)));
  }
}

/** Field errors keyed by the form's dotted paths, in words and in the user's units. */
export type FormErrors = Record<string, string>;

/** Validates form values with calc's combinationSchema; returns the SI combination or errors by field. */
export function validateForm(f: PlannerForm, system: UnitSystem, base?: Combination): {
  ok: true;
  spec: Combination;
} | {
  ok: false;
  errors: FormErrors;
} {
  if (stryMutAct_9fa48("779")) {
    {}
  } else {
    stryCov_9fa48("779");
    const r = combinationSchema.safeParse(toSpec(f, system, base));
    if (stryMutAct_9fa48("781") ? false : stryMutAct_9fa48("780") ? true : (stryCov_9fa48("780", "781"), r.success)) return stryMutAct_9fa48("782") ? {} : (stryCov_9fa48("782"), {
      ok: stryMutAct_9fa48("783") ? false : (stryCov_9fa48("783"), true),
      spec: r.data
    });
    return stryMutAct_9fa48("784") ? {} : (stryCov_9fa48("784"), {
      ok: stryMutAct_9fa48("785") ? true : (stryCov_9fa48("785"), false),
      errors: issuesToErrors(r.error.issues, system)
    });
  }
}

/** zod issues (paths of the SI combination, which match the form's) to messages per form field. */
export function issuesToErrors(issues: readonly z.core.$ZodIssue[], system: UnitSystem): FormErrors {
  if (stryMutAct_9fa48("786")) {
    {}
  } else {
    stryCov_9fa48("786");
    const out: FormErrors = {};
    for (const issue of issues) {
      if (stryMutAct_9fa48("787")) {
        {}
      } else {
        stryCov_9fa48("787");
        const path = issue.path.map(String).join(stryMutAct_9fa48("788") ? "" : (stryCov_9fa48("788"), "."));
        if (stryMutAct_9fa48("791") ? false : stryMutAct_9fa48("790") ? true : stryMutAct_9fa48("789") ? path in out : (stryCov_9fa48("789", "790", "791"), !(path in out))) out[path] = localizeMessage(path, issue.message, system);
      }
    }
    return out;
  }
}

/** Relative closeness of two saved specs, so a unit round trip is not mistaken for an edit (null ≡ left out). */
export function sameSpec(a: unknown, b: unknown, rel = 1e-5): boolean {
  if (stryMutAct_9fa48("792")) {
    {}
  } else {
    stryCov_9fa48("792");
    if (stryMutAct_9fa48("795") ? typeof a === "number" || typeof b === "number" : stryMutAct_9fa48("794") ? false : stryMutAct_9fa48("793") ? true : (stryCov_9fa48("793", "794", "795"), (stryMutAct_9fa48("797") ? typeof a !== "number" : stryMutAct_9fa48("796") ? true : (stryCov_9fa48("796", "797"), typeof a === (stryMutAct_9fa48("798") ? "" : (stryCov_9fa48("798"), "number")))) && (stryMutAct_9fa48("800") ? typeof b !== "number" : stryMutAct_9fa48("799") ? true : (stryCov_9fa48("799", "800"), typeof b === (stryMutAct_9fa48("801") ? "" : (stryCov_9fa48("801"), "number")))))) {
      if (stryMutAct_9fa48("802")) {
        {}
      } else {
        stryCov_9fa48("802");
        if (stryMutAct_9fa48("805") ? Number.isNaN(a) && Number.isNaN(b) : stryMutAct_9fa48("804") ? false : stryMutAct_9fa48("803") ? true : (stryCov_9fa48("803", "804", "805"), Number.isNaN(a) || Number.isNaN(b))) return stryMutAct_9fa48("808") ? Number.isNaN(a) || Number.isNaN(b) : stryMutAct_9fa48("807") ? false : stryMutAct_9fa48("806") ? true : (stryCov_9fa48("806", "807", "808"), Number.isNaN(a) && Number.isNaN(b));
        return stryMutAct_9fa48("812") ? Math.abs(a - b) > rel * Math.max(Math.abs(a), Math.abs(b), 1e-12) : stryMutAct_9fa48("811") ? Math.abs(a - b) < rel * Math.max(Math.abs(a), Math.abs(b), 1e-12) : stryMutAct_9fa48("810") ? false : stryMutAct_9fa48("809") ? true : (stryCov_9fa48("809", "810", "811", "812"), Math.abs(stryMutAct_9fa48("813") ? a + b : (stryCov_9fa48("813"), a - b)) <= (stryMutAct_9fa48("814") ? rel / Math.max(Math.abs(a), Math.abs(b), 1e-12) : (stryCov_9fa48("814"), rel * (stryMutAct_9fa48("815") ? Math.min(Math.abs(a), Math.abs(b), 1e-12) : (stryCov_9fa48("815"), Math.max(Math.abs(a), Math.abs(b), 1e-12))))));
      }
    }
    if (stryMutAct_9fa48("818") ? (a === null || b === null || typeof a !== "object") && typeof b !== "object" : stryMutAct_9fa48("817") ? false : stryMutAct_9fa48("816") ? true : (stryCov_9fa48("816", "817", "818"), (stryMutAct_9fa48("820") ? (a === null || b === null) && typeof a !== "object" : stryMutAct_9fa48("819") ? false : (stryCov_9fa48("819", "820"), (stryMutAct_9fa48("822") ? a === null && b === null : stryMutAct_9fa48("821") ? false : (stryCov_9fa48("821", "822"), (stryMutAct_9fa48("824") ? a !== null : stryMutAct_9fa48("823") ? false : (stryCov_9fa48("823", "824"), a === null)) || (stryMutAct_9fa48("826") ? b !== null : stryMutAct_9fa48("825") ? false : (stryCov_9fa48("825", "826"), b === null)))) || (stryMutAct_9fa48("828") ? typeof a === "object" : stryMutAct_9fa48("827") ? false : (stryCov_9fa48("827", "828"), typeof a !== (stryMutAct_9fa48("829") ? "" : (stryCov_9fa48("829"), "object")))))) || (stryMutAct_9fa48("831") ? typeof b === "object" : stryMutAct_9fa48("830") ? false : (stryCov_9fa48("830", "831"), typeof b !== (stryMutAct_9fa48("832") ? "" : (stryCov_9fa48("832"), "object")))))) return stryMutAct_9fa48("835") ? a !== b : stryMutAct_9fa48("834") ? false : stryMutAct_9fa48("833") ? true : (stryCov_9fa48("833", "834", "835"), a === b);
    if (stryMutAct_9fa48("838") ? Array.isArray(a) === Array.isArray(b) : stryMutAct_9fa48("837") ? false : stryMutAct_9fa48("836") ? true : (stryCov_9fa48("836", "837", "838"), Array.isArray(a) !== Array.isArray(b))) return stryMutAct_9fa48("839") ? true : (stryCov_9fa48("839"), false);
    // A refinement given as null and one left out mean the same to calc (off, or its default).
    const ka = stryMutAct_9fa48("840") ? Object.keys(a as object) : (stryCov_9fa48("840"), Object.keys(a as object).filter(stryMutAct_9fa48("841") ? () => undefined : (stryCov_9fa48("841"), k => stryMutAct_9fa48("844") ? (a as Record<string, unknown>)[k] == null : stryMutAct_9fa48("843") ? false : stryMutAct_9fa48("842") ? true : (stryCov_9fa48("842", "843", "844"), (a as Record<string, unknown>)[k] != null))));
    const kb = stryMutAct_9fa48("845") ? Object.keys(b as object) : (stryCov_9fa48("845"), Object.keys(b as object).filter(stryMutAct_9fa48("846") ? () => undefined : (stryCov_9fa48("846"), k => stryMutAct_9fa48("849") ? (b as Record<string, unknown>)[k] == null : stryMutAct_9fa48("848") ? false : stryMutAct_9fa48("847") ? true : (stryCov_9fa48("847", "848", "849"), (b as Record<string, unknown>)[k] != null))));
    if (stryMutAct_9fa48("852") ? ka.length === kb.length : stryMutAct_9fa48("851") ? false : stryMutAct_9fa48("850") ? true : (stryCov_9fa48("850", "851", "852"), ka.length !== kb.length)) return stryMutAct_9fa48("853") ? true : (stryCov_9fa48("853"), false);
    return stryMutAct_9fa48("854") ? ka.some(k => sameSpec((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k], rel)) : (stryCov_9fa48("854"), ka.every(stryMutAct_9fa48("855") ? () => undefined : (stryCov_9fa48("855"), k => sameSpec((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k], rel))));
  }
}