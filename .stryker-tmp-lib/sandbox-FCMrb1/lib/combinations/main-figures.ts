// @ts-nocheck
// A new combination's main figures (displacement, cylinders, redline, blower kind and size,
// pulleys), typed in the person's units, laid over a starting point. Blank figures keep the
// starting point's; a blank start needs them all. Pure.
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
import { toSI, type CombinationInput, type QuantityKind, type UnitSystem } from "@/calc";
import { FieldError } from "@/lib/errors";
export const MAIN_FIGURES = [{
  name: "displacement",
  label: "Engine displacement",
  kind: "displacement"
}, {
  name: "cylinders",
  label: "Cylinders",
  kind: null
}, {
  name: "redlineRpm",
  label: "Redline",
  kind: null
}, {
  name: "blowerDisplacement",
  label: "Blower displacement per revolution",
  kind: "blower-displacement"
}, {
  name: "crankPulley",
  label: "Crank pulley diameter",
  kind: "length-small"
}, {
  name: "blowerPulley",
  label: "Blower pulley diameter",
  kind: "length-small"
}] as const satisfies readonly {
  name: string;
  label: string;
  kind: QuantityKind | null;
}[];
export type MainFigureName = (typeof MAIN_FIGURES)[number]["name"] | "blowerKind";
export type MainFigures = Partial<Record<MainFigureName, string>>;

/**
 * The starting spec with the figures given; throws FieldError naming the form field for a figure
 * that is not a number, or (with `requireAll`, the blank start) one left out.
 */
export function withMainFigures(start: CombinationInput, figures: MainFigures, system: UnitSystem, requireAll = stryMutAct_9fa48("856") ? true : (stryCov_9fa48("856"), false)): CombinationInput {
  if (stryMutAct_9fa48("857")) {
    {}
  } else {
    stryCov_9fa48("857");
    const spec = structuredClone(start) as CombinationInput & {
      engine: Record<string, unknown>;
      blower: Record<string, unknown>;
      drive: Record<string, unknown>;
    };
    const read = (name: (typeof MAIN_FIGURES)[number]["name"]): number | null => {
      if (stryMutAct_9fa48("858")) {
        {}
      } else {
        stryCov_9fa48("858");
        const def = MAIN_FIGURES.find(stryMutAct_9fa48("859") ? () => undefined : (stryCov_9fa48("859"), f => stryMutAct_9fa48("862") ? f.name !== name : stryMutAct_9fa48("861") ? false : stryMutAct_9fa48("860") ? true : (stryCov_9fa48("860", "861", "862"), f.name === name)))!;
        const text = stryMutAct_9fa48("863") ? figures[name] ?? "" : (stryCov_9fa48("863"), (stryMutAct_9fa48("864") ? figures[name] && "" : (stryCov_9fa48("864"), figures[name] ?? (stryMutAct_9fa48("865") ? "Stryker was here!" : (stryCov_9fa48("865"), "")))).trim());
        if (stryMutAct_9fa48("868") ? text !== "" : stryMutAct_9fa48("867") ? false : stryMutAct_9fa48("866") ? true : (stryCov_9fa48("866", "867", "868"), text === (stryMutAct_9fa48("869") ? "Stryker was here!" : (stryCov_9fa48("869"), "")))) {
          if (stryMutAct_9fa48("870")) {
            {}
          } else {
            stryCov_9fa48("870");
            if (stryMutAct_9fa48("872") ? false : stryMutAct_9fa48("871") ? true : (stryCov_9fa48("871", "872"), requireAll)) throw new FieldError(name, stryMutAct_9fa48("873") ? `` : (stryCov_9fa48("873"), `${def.label}: give a figure for a blank start.`));
            return null;
          }
        }
        const n = Number(text);
        if (stryMutAct_9fa48("876") ? false : stryMutAct_9fa48("875") ? true : stryMutAct_9fa48("874") ? Number.isFinite(n) : (stryCov_9fa48("874", "875", "876"), !Number.isFinite(n))) throw new FieldError(name, stryMutAct_9fa48("877") ? `` : (stryCov_9fa48("877"), `${def.label} must be a number.`));
        return def.kind ? toSI(def.kind, n, system) : n;
      }
    };
    const set = (part: Record<string, unknown>, key: string, v: number | null) => {
      if (stryMutAct_9fa48("878")) {
        {}
      } else {
        stryCov_9fa48("878");
        if (stryMutAct_9fa48("881") ? v === null : stryMutAct_9fa48("880") ? false : stryMutAct_9fa48("879") ? true : (stryCov_9fa48("879", "880", "881"), v !== null)) part[key] = v;
      }
    };
    set(spec.engine, stryMutAct_9fa48("882") ? "" : (stryCov_9fa48("882"), "displacement"), read(stryMutAct_9fa48("883") ? "" : (stryCov_9fa48("883"), "displacement")));
    set(spec.engine, stryMutAct_9fa48("884") ? "" : (stryCov_9fa48("884"), "cylinders"), read(stryMutAct_9fa48("885") ? "" : (stryCov_9fa48("885"), "cylinders")));
    set(spec.engine, stryMutAct_9fa48("886") ? "" : (stryCov_9fa48("886"), "redlineRpm"), read(stryMutAct_9fa48("887") ? "" : (stryCov_9fa48("887"), "redlineRpm")));
    set(spec.blower, stryMutAct_9fa48("888") ? "" : (stryCov_9fa48("888"), "displacementPerRev"), read(stryMutAct_9fa48("889") ? "" : (stryCov_9fa48("889"), "blowerDisplacement")));
    set(spec.drive, stryMutAct_9fa48("890") ? "" : (stryCov_9fa48("890"), "crankPulleyDiameter"), read(stryMutAct_9fa48("891") ? "" : (stryCov_9fa48("891"), "crankPulley")));
    set(spec.drive, stryMutAct_9fa48("892") ? "" : (stryCov_9fa48("892"), "blowerPulleyDiameter"), read(stryMutAct_9fa48("893") ? "" : (stryCov_9fa48("893"), "blowerPulley")));
    const kind = stryMutAct_9fa48("894") ? figures.blowerKind ?? "" : (stryCov_9fa48("894"), (stryMutAct_9fa48("895") ? figures.blowerKind && "" : (stryCov_9fa48("895"), figures.blowerKind ?? (stryMutAct_9fa48("896") ? "Stryker was here!" : (stryCov_9fa48("896"), "")))).trim());
    if (stryMutAct_9fa48("899") ? kind === "roots" && kind === "twin-screw" : stryMutAct_9fa48("898") ? false : stryMutAct_9fa48("897") ? true : (stryCov_9fa48("897", "898", "899"), (stryMutAct_9fa48("901") ? kind !== "roots" : stryMutAct_9fa48("900") ? false : (stryCov_9fa48("900", "901"), kind === (stryMutAct_9fa48("902") ? "" : (stryCov_9fa48("902"), "roots")))) || (stryMutAct_9fa48("904") ? kind !== "twin-screw" : stryMutAct_9fa48("903") ? false : (stryCov_9fa48("903", "904"), kind === (stryMutAct_9fa48("905") ? "" : (stryCov_9fa48("905"), "twin-screw")))))) spec.blower.kind = kind;else if (stryMutAct_9fa48("908") ? kind === "" : stryMutAct_9fa48("907") ? false : stryMutAct_9fa48("906") ? true : (stryCov_9fa48("906", "907", "908"), kind !== (stryMutAct_9fa48("909") ? "Stryker was here!" : (stryCov_9fa48("909"), "")))) throw new FieldError(stryMutAct_9fa48("910") ? "" : (stryCov_9fa48("910"), "blowerKind"), stryMutAct_9fa48("911") ? "" : (stryCov_9fa48("911"), "Blower kind must be Roots or twin-screw."));else if (stryMutAct_9fa48("913") ? false : stryMutAct_9fa48("912") ? true : (stryCov_9fa48("912", "913"), requireAll)) throw new FieldError(stryMutAct_9fa48("914") ? "" : (stryCov_9fa48("914"), "blowerKind"), stryMutAct_9fa48("915") ? "" : (stryCov_9fa48("915"), "Blower kind: choose one for a blank start."));
    return spec;
  }
}