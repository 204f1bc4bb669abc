// @ts-nocheck
// Starting points for a new combination: the invented demo engines (demo-specs.ts beside this file).
// Every number in them is a demo value; the planner is where a person makes them their own.
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
import type { CombinationInput, UnitSystem } from "@/calc";
import { applyShape, VE_SHAPES } from "@/lib/planner/ve-shapes";
import { withMainFigures, type MainFigures } from "./main-figures";
import { bigInchIntercooled, roadCarFour, vintageV8DrawThrough, workTruckV6 } from "@/lib/combinations/demo-specs";
export type TemplateKey = "v6-roots" | "big-v8-twin-screw" | "vintage-v8-draw-through" | "four-cylinder-twin-screw";
export const TEMPLATES: readonly {
  key: TemplateKey;
  label: string;
  spec: CombinationInput;
}[] = stryMutAct_9fa48("987") ? [] : (stryCov_9fa48("987"), [stryMutAct_9fa48("988") ? {} : (stryCov_9fa48("988"), {
  key: stryMutAct_9fa48("989") ? "" : (stryCov_9fa48("989"), "v6-roots"),
  label: stryMutAct_9fa48("990") ? "" : (stryCov_9fa48("990"), "V6 ~4.3 L, Roots"),
  spec: workTruckV6
}), stryMutAct_9fa48("991") ? {} : (stryCov_9fa48("991"), {
  key: stryMutAct_9fa48("992") ? "" : (stryCov_9fa48("992"), "big-v8-twin-screw"),
  label: stryMutAct_9fa48("993") ? "" : (stryCov_9fa48("993"), "Big-inch V8 ~7.4 L, twin-screw, intercooled"),
  spec: bigInchIntercooled
}), stryMutAct_9fa48("994") ? {} : (stryCov_9fa48("994"), {
  key: stryMutAct_9fa48("995") ? "" : (stryCov_9fa48("995"), "vintage-v8-draw-through"),
  label: stryMutAct_9fa48("996") ? "" : (stryCov_9fa48("996"), "Vintage V8 ~5.7 L, Roots drawing through a carburettor"),
  spec: vintageV8DrawThrough
}), stryMutAct_9fa48("997") ? {} : (stryCov_9fa48("997"), {
  key: stryMutAct_9fa48("998") ? "" : (stryCov_9fa48("998"), "four-cylinder-twin-screw"),
  label: stryMutAct_9fa48("999") ? "" : (stryCov_9fa48("999"), "Four-cylinder ~2.4 L, twin-screw, intercooled"),
  spec: roadCarFour
})]);
export const TEMPLATE_KEYS = TEMPLATES.map(t => t.key) as [TemplateKey, ...TemplateKey[]];
export function templateSpec(key: TemplateKey): CombinationInput {
  if (stryMutAct_9fa48("1000")) {
    {}
  } else {
    stryCov_9fa48("1000");
    const t = TEMPLATES.find(stryMutAct_9fa48("1001") ? () => undefined : (stryCov_9fa48("1001"), x => stryMutAct_9fa48("1004") ? x.key !== key : stryMutAct_9fa48("1003") ? false : stryMutAct_9fa48("1002") ? true : (stryCov_9fa48("1002", "1003", "1004"), x.key === key)));
    if (stryMutAct_9fa48("1007") ? false : stryMutAct_9fa48("1006") ? true : stryMutAct_9fa48("1005") ? t : (stryCov_9fa48("1005", "1006", "1007"), !t)) throw new Error(stryMutAct_9fa48("1008") ? `` : (stryCov_9fa48("1008"), `unknown template ${key}`));
    // A fresh copy: the demo objects are shared.
    return structuredClone(t.spec);
  }
}

/** A blank start: every main figure from the person, generic defaults (the first template's) for the rest. */
export const BLANK_START = stryMutAct_9fa48("1009") ? "" : (stryCov_9fa48("1009"), "blank");

/** The first revision's spec: the starting point (or a blank start) with the main figures typed. */
export function startingSpec(key: TemplateKey | typeof BLANK_START, figures: MainFigures, system: UnitSystem): CombinationInput {
  if (stryMutAct_9fa48("1010")) {
    {}
  } else {
    stryCov_9fa48("1010");
    if (stryMutAct_9fa48("1013") ? key === BLANK_START : stryMutAct_9fa48("1012") ? false : stryMutAct_9fa48("1011") ? true : (stryCov_9fa48("1011", "1012", "1013"), key !== BLANK_START)) return withMainFigures(templateSpec(key), figures, system);
    const spec = withMainFigures(templateSpec(TEMPLATES[0].key), figures, system, true) as CombinationInput & {
      engine: {
        redlineRpm: number;
        veCurve: {
          rpm: number;
          ve: number;
        }[];
      };
    };
    // The default VE shape laid over the person's own speed range (up to their redline).
    spec.engine.veCurve = applyShape(VE_SHAPES[0], spec.engine.redlineRpm, stryMutAct_9fa48("1014") ? ["Stryker was here"] : (stryCov_9fa48("1014"), [])).map(stryMutAct_9fa48("1015") ? () => undefined : (stryCov_9fa48("1015"), r => stryMutAct_9fa48("1016") ? {} : (stryCov_9fa48("1016"), {
      rpm: r.rpm,
      ve: stryMutAct_9fa48("1017") ? r.ve * 100 : (stryCov_9fa48("1017"), r.ve / 100)
    })));
    return spec;
  }
}