// @ts-nocheck
// A combination's spec as rows people can read (in their units), and the fields that differ
// between two specs. Pure: used by the revisions page on the server and by tests.
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
import { formatQuantity, type Combination, type CombinationInput, type UnitSystem } from "@/calc";
import { SPEC_FIELDS, valueAt as at, type SpecField } from "./field-table";
type Spec = Combination | CombinationInput;
const num = stryMutAct_9fa48("916") ? () => undefined : (stryCov_9fa48("916"), (() => {
  const num = (v: number, digits: number) => v.toLocaleString(stryMutAct_9fa48("917") ? "" : (stryCov_9fa48("917"), "en-US"), stryMutAct_9fa48("918") ? {} : (stryCov_9fa48("918"), {
    minimumFractionDigits: digits,
    maximumFractionDigits: digits
  }));
  return num;
})());

/** One value as text in the user's units ("—" when absent, e.g. no intercooler). */
export function showValue(def: SpecField, value: unknown, system: UnitSystem): string {
  if (stryMutAct_9fa48("919")) {
    {}
  } else {
    stryCov_9fa48("919");
    if (stryMutAct_9fa48("922") ? value === undefined && value === null : stryMutAct_9fa48("921") ? false : stryMutAct_9fa48("920") ? true : (stryCov_9fa48("920", "921", "922"), (stryMutAct_9fa48("924") ? value !== undefined : stryMutAct_9fa48("923") ? false : (stryCov_9fa48("923", "924"), value === undefined)) || (stryMutAct_9fa48("926") ? value !== null : stryMutAct_9fa48("925") ? false : (stryCov_9fa48("925", "926"), value === null)))) return stryMutAct_9fa48("927") ? def.absent && "—" : (stryCov_9fa48("927"), def.absent ?? (stryMutAct_9fa48("928") ? "" : (stryCov_9fa48("928"), "—")));
    const s = def.quantity;
    if (stryMutAct_9fa48("931") ? s !== "text" : stryMutAct_9fa48("930") ? false : stryMutAct_9fa48("929") ? true : (stryCov_9fa48("929", "930", "931"), s === (stryMutAct_9fa48("932") ? "" : (stryCov_9fa48("932"), "text")))) return String(value);
    if (stryMutAct_9fa48("935") ? s !== "count" : stryMutAct_9fa48("934") ? false : stryMutAct_9fa48("933") ? true : (stryCov_9fa48("933", "934", "935"), s === (stryMutAct_9fa48("936") ? "" : (stryCov_9fa48("936"), "count")))) return (stryMutAct_9fa48("939") ? typeof value !== "number" : stryMutAct_9fa48("938") ? false : stryMutAct_9fa48("937") ? true : (stryCov_9fa48("937", "938", "939"), typeof value === (stryMutAct_9fa48("940") ? "" : (stryCov_9fa48("940"), "number")))) ? num(value, 0) : String(value);
    if (stryMutAct_9fa48("943") ? s !== "percent" : stryMutAct_9fa48("942") ? false : stryMutAct_9fa48("941") ? true : (stryCov_9fa48("941", "942", "943"), s === (stryMutAct_9fa48("944") ? "" : (stryCov_9fa48("944"), "percent")))) return (stryMutAct_9fa48("947") ? typeof value !== "number" : stryMutAct_9fa48("946") ? false : stryMutAct_9fa48("945") ? true : (stryCov_9fa48("945", "946", "947"), typeof value === (stryMutAct_9fa48("948") ? "" : (stryCov_9fa48("948"), "number")))) ? stryMutAct_9fa48("949") ? `` : (stryCov_9fa48("949"), `${num(stryMutAct_9fa48("950") ? value / 100 : (stryCov_9fa48("950"), value * 100), 1)} %`) : String(value);
    if (stryMutAct_9fa48("953") ? s !== "ve-curve" : stryMutAct_9fa48("952") ? false : stryMutAct_9fa48("951") ? true : (stryCov_9fa48("951", "952", "953"), s === (stryMutAct_9fa48("954") ? "" : (stryCov_9fa48("954"), "ve-curve")))) {
      if (stryMutAct_9fa48("955")) {
        {}
      } else {
        stryCov_9fa48("955");
        if (stryMutAct_9fa48("958") ? false : stryMutAct_9fa48("957") ? true : stryMutAct_9fa48("956") ? Array.isArray(value) : (stryCov_9fa48("956", "957", "958"), !Array.isArray(value))) return String(value);
        return value.map(stryMutAct_9fa48("959") ? () => undefined : (stryCov_9fa48("959"), (p: {
          rpm: number;
          ve: number;
        }) => stryMutAct_9fa48("960") ? `` : (stryCov_9fa48("960"), `${num(p.rpm, 0)} rpm: ${num(stryMutAct_9fa48("961") ? p.ve / 100 : (stryCov_9fa48("961"), p.ve * 100), 0)} %`))).join(stryMutAct_9fa48("962") ? "" : (stryCov_9fa48("962"), ", "));
      }
    }
    if (stryMutAct_9fa48("965") ? typeof value === "number" : stryMutAct_9fa48("964") ? false : stryMutAct_9fa48("963") ? true : (stryCov_9fa48("963", "964", "965"), typeof value !== (stryMutAct_9fa48("966") ? "" : (stryCov_9fa48("966"), "number")))) return String(value);
    if (stryMutAct_9fa48("969") ? s !== "plain" : stryMutAct_9fa48("968") ? false : stryMutAct_9fa48("967") ? true : (stryCov_9fa48("967", "968", "969"), s === (stryMutAct_9fa48("970") ? "" : (stryCov_9fa48("970"), "plain")))) return num(value, stryMutAct_9fa48("971") ? def.digits && 0 : (stryCov_9fa48("971"), def.digits ?? 0));
    const q = formatQuantity(s, value, system);
    return stryMutAct_9fa48("972") ? `` : (stryCov_9fa48("972"), `${num(q.value, stryMutAct_9fa48("973") ? def.digits && 0 : (stryCov_9fa48("973"), def.digits ?? 0))} ${q.unit}`);
  }
}
export type SpecRow = {
  path: string;
  label: string;
  value: string;
};

/** Every field of a spec as a readable row. */
export function specRows(spec: Spec, system: UnitSystem): SpecRow[] {
  if (stryMutAct_9fa48("974")) {
    {}
  } else {
    stryCov_9fa48("974");
    return SPEC_FIELDS.map(stryMutAct_9fa48("975") ? () => undefined : (stryCov_9fa48("975"), d => stryMutAct_9fa48("976") ? {} : (stryCov_9fa48("976"), {
      path: d.path,
      label: d.label,
      value: showValue(d, at(spec, d.path), system)
    })));
  }
}
export type SpecChange = {
  path: string;
  label: string;
  before: string;
  after: string;
};

/**
 * The fields that differ between two specs, old → new. Compared on the stored SI values (so a
 * change too small to show in the rounded figures is still listed), shown in the user's units.
 */
export function specChanges(before: Spec, after: Spec, system: UnitSystem): SpecChange[] {
  if (stryMutAct_9fa48("977")) {
    {}
  } else {
    stryCov_9fa48("977");
    const out: SpecChange[] = stryMutAct_9fa48("978") ? ["Stryker was here"] : (stryCov_9fa48("978"), []);
    for (const d of SPEC_FIELDS) {
      if (stryMutAct_9fa48("979")) {
        {}
      } else {
        stryCov_9fa48("979");
        const a = at(before, d.path);
        const b = at(after, d.path);
        if (stryMutAct_9fa48("982") ? JSON.stringify(a ?? null) === JSON.stringify(b ?? null) : stryMutAct_9fa48("981") ? false : stryMutAct_9fa48("980") ? true : (stryCov_9fa48("980", "981", "982"), JSON.stringify(stryMutAct_9fa48("983") ? a && null : (stryCov_9fa48("983"), a ?? null)) !== JSON.stringify(stryMutAct_9fa48("984") ? b && null : (stryCov_9fa48("984"), b ?? null)))) {
          if (stryMutAct_9fa48("985")) {
            {}
          } else {
            stryCov_9fa48("985");
            out.push(stryMutAct_9fa48("986") ? {} : (stryCov_9fa48("986"), {
              path: d.path,
              label: d.label,
              before: showValue(d, a, system),
              after: showValue(d, b, system)
            }));
          }
        }
      }
    }
    return out;
  }
}