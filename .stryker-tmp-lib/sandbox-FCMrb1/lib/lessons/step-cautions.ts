// @ts-nocheck
// The cautions of a classroom step: each labelled by the curve (item) it belongs to, a caution
// raised twice for the same item listed once, and the general notice left to the panel (once).
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
import { cautions as cautionsOf, type Caution } from "@/calc";
import type { ItemCurve } from "./curves";
export type ItemCaution = {
  item: string;
  caution: Caution;
};
const SEVERITY_ORDER = {
  danger: 0,
  warning: 1,
  info: 2
} as const;

/** Every specific caution of the step's solved curves, one per code and item, most serious first. */
export function stepCautions(curves: readonly ItemCurve[]): ItemCaution[] {
  if (stryMutAct_9fa48("2845")) {
    {}
  } else {
    stryCov_9fa48("2845");
    const seen = new Set<string>();
    const out: ItemCaution[] = stryMutAct_9fa48("2846") ? ["Stryker was here"] : (stryCov_9fa48("2846"), []);
    for (const c of curves) {
      if (stryMutAct_9fa48("2847")) {
        {}
      } else {
        stryCov_9fa48("2847");
        if (stryMutAct_9fa48("2850") ? false : stryMutAct_9fa48("2849") ? true : stryMutAct_9fa48("2848") ? c.points.length : (stryCov_9fa48("2848", "2849", "2850"), !c.points.length)) continue;
        for (const caution of cautionsOf(c.spec, c.points)) {
          if (stryMutAct_9fa48("2851")) {
            {}
          } else {
            stryCov_9fa48("2851");
            const key = stryMutAct_9fa48("2852") ? `` : (stryCov_9fa48("2852"), `${caution.code}\u0000${c.label}`);
            if (stryMutAct_9fa48("2855") ? caution.code === "general" && seen.has(key) : stryMutAct_9fa48("2854") ? false : stryMutAct_9fa48("2853") ? true : (stryCov_9fa48("2853", "2854", "2855"), (stryMutAct_9fa48("2857") ? caution.code !== "general" : stryMutAct_9fa48("2856") ? false : (stryCov_9fa48("2856", "2857"), caution.code === (stryMutAct_9fa48("2858") ? "" : (stryCov_9fa48("2858"), "general")))) || seen.has(key))) continue;
            seen.add(key);
            out.push(stryMutAct_9fa48("2859") ? {} : (stryCov_9fa48("2859"), {
              item: c.label,
              caution
            }));
          }
        }
      }
    }
    return stryMutAct_9fa48("2860") ? out : (stryCov_9fa48("2860"), out.sort(stryMutAct_9fa48("2861") ? () => undefined : (stryCov_9fa48("2861"), (a, b) => stryMutAct_9fa48("2862") ? SEVERITY_ORDER[a.caution.severity] + SEVERITY_ORDER[b.caution.severity] : (stryCov_9fa48("2862"), SEVERITY_ORDER[a.caution.severity] - SEVERITY_ORDER[b.caution.severity]))));
  }
}