// @ts-nocheck
// Words for a step's what-if in the viewer's units: the chart legend, the deltas table, the
// "In this step" list and a copy's name all say the same thing ("blower pulley 2.80 in").
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
import type { UnitSystem } from "@/calc";
import { percentText, quantityText } from "@/lib/units/format";
import type { ItemChange } from "./rules";

/** The change in a few words, e.g. "VE +8 %", "blower pulley 2.80 in", "intercooler added (70 %)", "at 1,600 m". */
export function changeText(change: ItemChange, system: UnitSystem): string {
  if (stryMutAct_9fa48("2468")) {
    {}
  } else {
    stryCov_9fa48("2468");
    switch (change.kind) {
      case stryMutAct_9fa48("2470") ? "" : (stryCov_9fa48("2470"), "ve"):
        if (stryMutAct_9fa48("2469")) {} else {
          stryCov_9fa48("2469");
          {
            if (stryMutAct_9fa48("2471")) {
              {}
            } else {
              stryCov_9fa48("2471");
              const pct = Math.round(stryMutAct_9fa48("2472") ? (change.scale - 1) / 100 : (stryCov_9fa48("2472"), (stryMutAct_9fa48("2473") ? change.scale + 1 : (stryCov_9fa48("2473"), change.scale - 1)) * 100));
              return stryMutAct_9fa48("2474") ? `` : (stryCov_9fa48("2474"), `VE ${(stryMutAct_9fa48("2478") ? pct <= 0 : stryMutAct_9fa48("2477") ? pct >= 0 : stryMutAct_9fa48("2476") ? false : stryMutAct_9fa48("2475") ? true : (stryCov_9fa48("2475", "2476", "2477", "2478"), pct > 0)) ? stryMutAct_9fa48("2479") ? "" : (stryCov_9fa48("2479"), "+") : (stryMutAct_9fa48("2483") ? pct >= 0 : stryMutAct_9fa48("2482") ? pct <= 0 : stryMutAct_9fa48("2481") ? false : stryMutAct_9fa48("2480") ? true : (stryCov_9fa48("2480", "2481", "2482", "2483"), pct < 0)) ? stryMutAct_9fa48("2484") ? "" : (stryCov_9fa48("2484"), "−") : stryMutAct_9fa48("2485") ? "" : (stryCov_9fa48("2485"), "±")}${Math.abs(pct)} %`);
            }
          }
        }
      case stryMutAct_9fa48("2487") ? "" : (stryCov_9fa48("2487"), "pulley"):
        if (stryMutAct_9fa48("2486")) {} else {
          stryCov_9fa48("2486");
          return stryMutAct_9fa48("2488") ? `` : (stryCov_9fa48("2488"), `blower pulley ${quantityText(stryMutAct_9fa48("2489") ? "" : (stryCov_9fa48("2489"), "length-small"), change.diameter, system)}`);
        }
      case stryMutAct_9fa48("2491") ? "" : (stryCov_9fa48("2491"), "intercooler"):
        if (stryMutAct_9fa48("2490")) {} else {
          stryCov_9fa48("2490");
          return stryMutAct_9fa48("2492") ? `` : (stryCov_9fa48("2492"), `intercooler added (${percentText(change.effectiveness)})`);
        }
      case stryMutAct_9fa48("2494") ? "" : (stryCov_9fa48("2494"), "altitude"):
        if (stryMutAct_9fa48("2493")) {} else {
          stryCov_9fa48("2493");
          return stryMutAct_9fa48("2495") ? `` : (stryCov_9fa48("2495"), `at ${quantityText(stryMutAct_9fa48("2496") ? "" : (stryCov_9fa48("2496"), "altitude"), change.altitude, system)}`);
        }
    }
  }
}

/** The legend label of an item's curve: "Truck — as built" or "Truck — blower pulley 2.80 in". */
export function variantLabel(label: string, change: ItemChange | null, system: UnitSystem): string {
  if (stryMutAct_9fa48("2497")) {
    {}
  } else {
    stryCov_9fa48("2497");
    return stryMutAct_9fa48("2498") ? `` : (stryCov_9fa48("2498"), `${label} — ${change ? changeText(change, system) : stryMutAct_9fa48("2499") ? "" : (stryCov_9fa48("2499"), "as built")}`);
  }
}