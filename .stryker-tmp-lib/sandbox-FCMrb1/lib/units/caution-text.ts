// @ts-nocheck
// calc's cautions and solver errors say their numbers in SI ("136 °C", "72 mm", "kPa"); these
// put them in the person's units at the edge. The one place a caution or error becomes text:
// the planner, sheet, print, share page, side by side and classroom all go through here.
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
import { CalcConvergenceError, VE_PLAUSIBLE_MAX, VE_PLAUSIBLE_MIN, type Caution, type UnitSystem } from "@/calc";
import { percentText, quantityText } from "./format";
const rpm = stryMutAct_9fa48("4517") ? () => undefined : (stryCov_9fa48("4517"), (() => {
  const rpm = (n: number) => stryMutAct_9fa48("4518") ? `` : (stryCov_9fa48("4518"), `${Math.round(n).toLocaleString(stryMutAct_9fa48("4519") ? "" : (stryCov_9fa48("4519"), "en-US"))} rpm`);
  return rpm;
})());

/** A caution's message in the person's units (cautions without quantities keep calc's words). */
export function cautionText(c: Caution, units: UnitSystem): string {
  if (stryMutAct_9fa48("4520")) {
    {}
  } else {
    stryCov_9fa48("4520");
    const v = c.values;
    switch (c.code) {
      case stryMutAct_9fa48("4522") ? "" : (stryCov_9fa48("4522"), "pulley-below-belt-minimum"):
        if (stryMutAct_9fa48("4521")) {} else {
          stryCov_9fa48("4521");
          return stryMutAct_9fa48("4523") ? `` : (stryCov_9fa48("4523"), `The ${quantityText(stryMutAct_9fa48("4524") ? "" : (stryCov_9fa48("4524"), "length-small"), v.blowerPulleyDiameter, units)} blower pulley is below the ${quantityText(stryMutAct_9fa48("4525") ? "" : (stryCov_9fa48("4525"), "length-small"), v.beltMinimumDiameter, units)} the belt should wrap; expect belt slip, heat and wear. Check the belt maker's minimum.`);
        }
      case stryMutAct_9fa48("4527") ? "" : (stryCov_9fa48("4527"), "charge-temperature-high"):
        if (stryMutAct_9fa48("4526")) {} else {
          stryCov_9fa48("4526");
          return stryMutAct_9fa48("4528") ? `` : (stryCov_9fa48("4528"), `Charge temperature reaches ${quantityText(stryMutAct_9fa48("4529") ? "" : (stryCov_9fa48("4529"), "temperature"), v.manifoldTemperature, units)} at ${rpm(v.rpm)}, above ${quantityText(stryMutAct_9fa48("4530") ? "" : (stryCov_9fa48("4530"), "temperature"), v.limit, units)} (a conservative rule of thumb for knock risk). Consider an intercooler, less boost, better fuel or less ignition advance.`);
        }
      case stryMutAct_9fa48("4532") ? "" : (stryCov_9fa48("4532"), "ve-implausible"):
        if (stryMutAct_9fa48("4531")) {} else {
          stryCov_9fa48("4531");
          // VE in percent, as the VE boxes beside it take it.
          return stryMutAct_9fa48("4533") ? `` : (stryCov_9fa48("4533"), `The VE curve looks implausible (from ${percentText(v.minVe)} to ${percentText(v.maxVe)}, steepest change ${percentText(v.maxSlopePer1000Rpm)} per 1,000 rpm); wide-open-throttle VE usually lies between ${percentText(VE_PLAUSIBLE_MIN)} and ${percentText(VE_PLAUSIBLE_MAX)} and changes smoothly. Check the curve.`);
        }
      default:
        if (stryMutAct_9fa48("4534")) {} else {
          stryCov_9fa48("4534");
          return c.message;
        }
    }
  }
}

/** A solver or model error in the person's units (the blower that cannot feed the engine; others as calc words them). */
export function calcErrorText(e: unknown, units: UnitSystem, fallback = stryMutAct_9fa48("4535") ? "" : (stryCov_9fa48("4535"), "The model could not solve this combination.")): string {
  if (stryMutAct_9fa48("4536")) {
    {}
  } else {
    stryCov_9fa48("4536");
    if (stryMutAct_9fa48("4539") ? e instanceof CalcConvergenceError && e.reason === "blower-too-slow" || e.values.floorPressure !== undefined : stryMutAct_9fa48("4538") ? false : stryMutAct_9fa48("4537") ? true : (stryCov_9fa48("4537", "4538", "4539"), (stryMutAct_9fa48("4541") ? e instanceof CalcConvergenceError || e.reason === "blower-too-slow" : stryMutAct_9fa48("4540") ? true : (stryCov_9fa48("4540", "4541"), e instanceof CalcConvergenceError && (stryMutAct_9fa48("4543") ? e.reason !== "blower-too-slow" : stryMutAct_9fa48("4542") ? true : (stryCov_9fa48("4542", "4543"), e.reason === (stryMutAct_9fa48("4544") ? "" : (stryCov_9fa48("4544"), "blower-too-slow")))))) && (stryMutAct_9fa48("4546") ? e.values.floorPressure === undefined : stryMutAct_9fa48("4545") ? true : (stryCov_9fa48("4545", "4546"), e.values.floorPressure !== undefined)))) {
      if (stryMutAct_9fa48("4547")) {
        {}
      } else {
        stryCov_9fa48("4547");
        return stryMutAct_9fa48("4548") ? `` : (stryCov_9fa48("4548"), `At ${rpm(e.rpm)} the blower (${rpm(e.values.blowerRpm)}) cannot feed the engine: manifold pressure would fall below ${quantityText(stryMutAct_9fa48("4549") ? "" : (stryCov_9fa48("4549"), "pressure"), e.values.floorPressure, units)} absolute. Choose a smaller blower pulley or a larger blower.`);
      }
    }
    return e instanceof Error ? e.message : fallback;
  }
}