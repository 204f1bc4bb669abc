// @ts-nocheck
// The person's units: a preset plus a unit per quantity kind where they depart from it, as
// stored on users (unit_system, unit_choices) and as carried in links and forms.
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
import { QUANTITY_KINDS, nearestPreset, presetOf, resolveUnits, unitChoices, unitsFromParam, UNIT_PRESETS, type QuantityKind, type UnitPreset, type Units, type UnitSystem } from "@/calc";

/** The stored shape: the preset and the per-kind departures from it. */
export type UnitPreferences = {
  unitSystem: UnitPreset;
  unitChoices: Readonly<Record<string, string>> | null;
};

/** A person's units as one record per kind (what every display helper accepts). */
export function personUnits(u: UnitPreferences): UnitSystem {
  if (stryMutAct_9fa48("4626")) {
    {}
  } else {
    stryCov_9fa48("4626");
    const units = resolveUnits(u.unitSystem, u.unitChoices);
    return stryMutAct_9fa48("4627") ? presetOf(units) && units : (stryCov_9fa48("4627"), presetOf(units) ?? units);
  }
}

/** How a choice is named in messages: a preset's name, else "your own units". */
export function unitsName(system: UnitSystem): string {
  if (stryMutAct_9fa48("4628")) {
    {}
  } else {
    stryCov_9fa48("4628");
    return stryMutAct_9fa48("4629") ? presetOf(system) && "your own units" : (stryCov_9fa48("4629"), presetOf(system) ?? (stryMutAct_9fa48("4630") ? "" : (stryCov_9fa48("4630"), "your own units")));
  }
}

/** What each kind is called on the settings page. */
export const KIND_NAMES: Readonly<Record<QuantityKind, string>> = stryMutAct_9fa48("4631") ? {} : (stryCov_9fa48("4631"), {
  "length-small": stryMutAct_9fa48("4632") ? "" : (stryCov_9fa48("4632"), "Pulleys and small lengths"),
  altitude: stryMutAct_9fa48("4633") ? "" : (stryCov_9fa48("4633"), "Altitude"),
  displacement: stryMutAct_9fa48("4634") ? "" : (stryCov_9fa48("4634"), "Engine displacement"),
  "blower-displacement": stryMutAct_9fa48("4635") ? "" : (stryCov_9fa48("4635"), "Blower displacement"),
  pressure: stryMutAct_9fa48("4636") ? "" : (stryCov_9fa48("4636"), "Pressure (boost, barometer)"),
  temperature: stryMutAct_9fa48("4637") ? "" : (stryCov_9fa48("4637"), "Temperature"),
  power: stryMutAct_9fa48("4638") ? "" : (stryCov_9fa48("4638"), "Power"),
  torque: stryMutAct_9fa48("4639") ? "" : (stryCov_9fa48("4639"), "Torque"),
  airflow: stryMutAct_9fa48("4640") ? "" : (stryCov_9fa48("4640"), "Airflow"),
  speed: stryMutAct_9fa48("4641") ? "" : (stryCov_9fa48("4641"), "Engine and blower speed"),
  "fuel-flow": stryMutAct_9fa48("4642") ? "" : (stryCov_9fa48("4642"), "Fuel flow"),
  "injector-flow": stryMutAct_9fa48("4643") ? "" : (stryCov_9fa48("4643"), "Injector flow"),
  bsfc: stryMutAct_9fa48("4644") ? "" : (stryCov_9fa48("4644"), "Fuel consumption (BSFC)")
});

/** Kinds a person may choose (those with more than one unit). */
export const CHOOSABLE_KINDS: readonly QuantityKind[] = stryMutAct_9fa48("4645") ? QUANTITY_KINDS : (stryCov_9fa48("4645"), QUANTITY_KINDS.filter(stryMutAct_9fa48("4646") ? () => undefined : (stryCov_9fa48("4646"), k => stryMutAct_9fa48("4650") ? unitChoices(k).length <= 1 : stryMutAct_9fa48("4649") ? unitChoices(k).length >= 1 : stryMutAct_9fa48("4648") ? false : stryMutAct_9fa48("4647") ? true : (stryCov_9fa48("4647", "4648", "4649", "4650"), unitChoices(k).length > 1))));

/** A choice as what is stored: a preset (given, else the nearest) and only the kinds that differ from it. */
export function toPreferences(system: UnitSystem, preset: UnitPreset = nearestPreset(system)): {
  unitSystem: UnitPreset;
  unitChoices: Record<string, string>;
} {
  if (stryMutAct_9fa48("4651")) {
    {}
  } else {
    stryCov_9fa48("4651");
    const units: Units = (stryMutAct_9fa48("4654") ? typeof system !== "string" : stryMutAct_9fa48("4653") ? false : stryMutAct_9fa48("4652") ? true : (stryCov_9fa48("4652", "4653", "4654"), typeof system === (stryMutAct_9fa48("4655") ? "" : (stryCov_9fa48("4655"), "string")))) ? UNIT_PRESETS[system] : system;
    const choices: Record<string, string> = {};
    for (const k of QUANTITY_KINDS) if (stryMutAct_9fa48("4658") ? units[k] === UNIT_PRESETS[preset][k] : stryMutAct_9fa48("4657") ? false : stryMutAct_9fa48("4656") ? true : (stryCov_9fa48("4656", "4657", "4658"), units[k] !== UNIT_PRESETS[preset][k])) choices[k] = units[k];
    return stryMutAct_9fa48("4659") ? {} : (stryCov_9fa48("4659"), {
      unitSystem: preset,
      unitChoices: choices
    });
  }
}
const kindSchema = (k: QuantityKind) => {
  if (stryMutAct_9fa48("4660")) {
    {}
  } else {
    stryCov_9fa48("4660");
    const ids = unitChoices(k).map(u => u.id) as [string, ...string[]];
    return z.enum(ids, stryMutAct_9fa48("4661") ? {} : (stryCov_9fa48("4661"), {
      error: stryMutAct_9fa48("4662") ? `` : (stryCov_9fa48("4662"), `${k} must be one of ${ids.join(stryMutAct_9fa48("4663") ? "" : (stryCov_9fa48("4663"), ", "))}`)
    })).optional();
  }
};

/** What /api/me and the settings form accept: a preset, and optionally a unit per kind. */
export const unitPreferencesSchema = z.object(stryMutAct_9fa48("4664") ? {} : (stryCov_9fa48("4664"), {
  unitSystem: z.enum(stryMutAct_9fa48("4665") ? [] : (stryCov_9fa48("4665"), [stryMutAct_9fa48("4666") ? "" : (stryCov_9fa48("4666"), "imperial"), stryMutAct_9fa48("4667") ? "" : (stryCov_9fa48("4667"), "metric")]), stryMutAct_9fa48("4668") ? {} : (stryCov_9fa48("4668"), {
    error: stryMutAct_9fa48("4669") ? "" : (stryCov_9fa48("4669"), "unitSystem must be imperial or metric")
  })),
  units: z.object(Object.fromEntries(QUANTITY_KINDS.map(stryMutAct_9fa48("4670") ? () => undefined : (stryCov_9fa48("4670"), k => stryMutAct_9fa48("4671") ? [] : (stryCov_9fa48("4671"), [k, kindSchema(k)])))), stryMutAct_9fa48("4672") ? {} : (stryCov_9fa48("4672"), {
    error: stryMutAct_9fa48("4673") ? "" : (stryCov_9fa48("4673"), "units must be an object of unit ids per kind")
  })).strict().optional()
}));

/** A units link or form parameter ("imperial", "metric~pressure.psi"), validated. */
export const unitsParamSchema = stryMutAct_9fa48("4674") ? z.string({
  error: "Units must be imperial or metric."
}).min(400).regex(/^(imperial|metric)(~[a-z-]+\.[A-Za-z0-9]+)*$/, {
  error: "Units must be imperial or metric."
}).transform(p => unitsFromParam(p)) : (stryCov_9fa48("4674"), z.string(stryMutAct_9fa48("4675") ? {} : (stryCov_9fa48("4675"), {
  error: stryMutAct_9fa48("4676") ? "" : (stryCov_9fa48("4676"), "Units must be imperial or metric.")
})).max(400).regex(stryMutAct_9fa48("4683") ? /^(imperial|metric)(~[a-z-]+\.[^A-Za-z0-9]+)*$/ : stryMutAct_9fa48("4682") ? /^(imperial|metric)(~[a-z-]+\.[A-Za-z0-9])*$/ : stryMutAct_9fa48("4681") ? /^(imperial|metric)(~[^a-z-]+\.[A-Za-z0-9]+)*$/ : stryMutAct_9fa48("4680") ? /^(imperial|metric)(~[a-z-]\.[A-Za-z0-9]+)*$/ : stryMutAct_9fa48("4679") ? /^(imperial|metric)(~[a-z-]+\.[A-Za-z0-9]+)$/ : stryMutAct_9fa48("4678") ? /^(imperial|metric)(~[a-z-]+\.[A-Za-z0-9]+)*/ : stryMutAct_9fa48("4677") ? /(imperial|metric)(~[a-z-]+\.[A-Za-z0-9]+)*$/ : (stryCov_9fa48("4677", "4678", "4679", "4680", "4681", "4682", "4683"), /^(imperial|metric)(~[a-z-]+\.[A-Za-z0-9]+)*$/), stryMutAct_9fa48("4684") ? {} : (stryCov_9fa48("4684"), {
  error: stryMutAct_9fa48("4685") ? "" : (stryCov_9fa48("4685"), "Units must be imperial or metric.")
})).transform(stryMutAct_9fa48("4686") ? () => undefined : (stryCov_9fa48("4686"), p => unitsFromParam(p))));