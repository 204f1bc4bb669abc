// @ts-nocheck
// The step editor's drafts: what the form holds per item (strings, in the author's units) and how
// it becomes the API's input (SI), so the form and its tests share one conversion.
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
import { fromSI, toSI, unitLabel, type UnitSystem } from "@/calc";
import { localizeMessage } from "@/lib/combinations/form-model";
import { displayValue, quantityText } from "@/lib/units/format";
import { WHAT_IF_ALTITUDE_MAX, WHAT_IF_ALTITUDE_MIN, type ItemChange, type ItemChangeInput, type StepInput } from "./rules";
export type ChangeKind = "none" | ItemChange["kind"];
/** The what-if as typed: VE change in %, pulley in in/mm, intercooler effectiveness in %, altitude in ft/m. */
export type ChangeDraft = {
  kind: ChangeKind;
  value: string;
};
export type ItemDraft = {
  combinationId: string;
  revision: string;
  label: string;
  autoLabel: boolean;
  change: ChangeDraft;
};
export const NO_CHANGE: ChangeDraft = stryMutAct_9fa48("2863") ? {} : (stryCov_9fa48("2863"), {
  kind: stryMutAct_9fa48("2864") ? "" : (stryCov_9fa48("2864"), "none"),
  value: stryMutAct_9fa48("2865") ? "Stryker was here!" : (stryCov_9fa48("2865"), "")
});
export const blankItem = stryMutAct_9fa48("2866") ? () => undefined : (stryCov_9fa48("2866"), (() => {
  const blankItem = (): ItemDraft => stryMutAct_9fa48("2867") ? {} : (stryCov_9fa48("2867"), {
    combinationId: stryMutAct_9fa48("2868") ? "Stryker was here!" : (stryCov_9fa48("2868"), ""),
    revision: stryMutAct_9fa48("2869") ? "" : (stryCov_9fa48("2869"), "current"),
    label: stryMutAct_9fa48("2870") ? "Stryker was here!" : (stryCov_9fa48("2870"), ""),
    autoLabel: stryMutAct_9fa48("2871") ? false : (stryCov_9fa48("2871"), true),
    change: NO_CHANGE
  });
  return blankItem;
})());

/** What the value of each kind is typed in, and a value to start from. */
export const CHANGE_KINDS: Record<Exclude<ChangeKind, "none">, {
  label: string;
  unit: (s: UnitSystem) => string;
  start: (s: UnitSystem) => string;
}> = stryMutAct_9fa48("2872") ? {} : (stryCov_9fa48("2872"), {
  ve: stryMutAct_9fa48("2873") ? {} : (stryCov_9fa48("2873"), {
    label: stryMutAct_9fa48("2874") ? "" : (stryCov_9fa48("2874"), "VE scaled by"),
    unit: stryMutAct_9fa48("2875") ? () => undefined : (stryCov_9fa48("2875"), () => stryMutAct_9fa48("2876") ? "" : (stryCov_9fa48("2876"), "% change, e.g. 8 or −5")),
    start: stryMutAct_9fa48("2877") ? () => undefined : (stryCov_9fa48("2877"), () => stryMutAct_9fa48("2878") ? "" : (stryCov_9fa48("2878"), "8"))
  }),
  pulley: stryMutAct_9fa48("2879") ? {} : (stryCov_9fa48("2879"), {
    label: stryMutAct_9fa48("2880") ? "" : (stryCov_9fa48("2880"), "Blower pulley diameter"),
    unit: stryMutAct_9fa48("2881") ? () => undefined : (stryCov_9fa48("2881"), s => unitLabel(stryMutAct_9fa48("2882") ? "" : (stryCov_9fa48("2882"), "length-small"), s)),
    start: stryMutAct_9fa48("2883") ? () => undefined : (stryCov_9fa48("2883"), s => String(displayValue(stryMutAct_9fa48("2884") ? "" : (stryCov_9fa48("2884"), "length-small"), 0.0711, s)))
  }),
  intercooler: stryMutAct_9fa48("2885") ? {} : (stryCov_9fa48("2885"), {
    label: stryMutAct_9fa48("2886") ? "" : (stryCov_9fa48("2886"), "Intercooler added, effectiveness"),
    unit: stryMutAct_9fa48("2887") ? () => undefined : (stryCov_9fa48("2887"), () => stryMutAct_9fa48("2888") ? "" : (stryCov_9fa48("2888"), "%")),
    start: stryMutAct_9fa48("2889") ? () => undefined : (stryCov_9fa48("2889"), () => stryMutAct_9fa48("2890") ? "" : (stryCov_9fa48("2890"), "70"))
  }),
  altitude: stryMutAct_9fa48("2891") ? {} : (stryCov_9fa48("2891"), {
    label: stryMutAct_9fa48("2892") ? "" : (stryCov_9fa48("2892"), "Altitude"),
    unit: stryMutAct_9fa48("2893") ? () => undefined : (stryCov_9fa48("2893"), s => unitLabel(stryMutAct_9fa48("2894") ? "" : (stryCov_9fa48("2894"), "altitude"), s)),
    start: stryMutAct_9fa48("2895") ? () => undefined : (stryCov_9fa48("2895"), s => String(stryMutAct_9fa48("2896") ? Math.round(fromSI("altitude", 1524, s) / 100) / 100 : (stryCov_9fa48("2896"), Math.round(stryMutAct_9fa48("2897") ? fromSI("altitude", 1524, s) * 100 : (stryCov_9fa48("2897"), fromSI(stryMutAct_9fa48("2898") ? "" : (stryCov_9fa48("2898"), "altitude"), 1524, s) / 100)) * 100)))
  })
});

/** A typed number ("−5" and "2,8" allowed), or NaN, which the schema refuses naming the field. */
function numberOf(text: string): number {
  if (stryMutAct_9fa48("2899")) {
    {}
  } else {
    stryCov_9fa48("2899");
    return (stryMutAct_9fa48("2902") ? text.trim() !== "" : stryMutAct_9fa48("2901") ? false : stryMutAct_9fa48("2900") ? true : (stryCov_9fa48("2900", "2901", "2902"), (stryMutAct_9fa48("2903") ? text : (stryCov_9fa48("2903"), text.trim())) === (stryMutAct_9fa48("2904") ? "Stryker was here!" : (stryCov_9fa48("2904"), "")))) ? NaN : Number(stryMutAct_9fa48("2905") ? text.replace(/^[−–]/, "-").replace(",", ".") : (stryCov_9fa48("2905"), text.trim().replace(stryMutAct_9fa48("2907") ? /^[^−–]/ : stryMutAct_9fa48("2906") ? /[−–]/ : (stryCov_9fa48("2906", "2907"), /^[−–]/), stryMutAct_9fa48("2908") ? "" : (stryCov_9fa48("2908"), "-")).replace(stryMutAct_9fa48("2909") ? "" : (stryCov_9fa48("2909"), ","), stryMutAct_9fa48("2910") ? "" : (stryCov_9fa48("2910"), "."))));
  }
}

/** The draft as the API's change (SI), or null for none. Bad numbers are left for the schema to name. */
export function changeInput(d: ChangeDraft, system: UnitSystem): ItemChangeInput | null {
  if (stryMutAct_9fa48("2911")) {
    {}
  } else {
    stryCov_9fa48("2911");
    const v = numberOf(d.value);
    switch (d.kind) {
      case stryMutAct_9fa48("2913") ? "" : (stryCov_9fa48("2913"), "ve"):
        if (stryMutAct_9fa48("2912")) {} else {
          stryCov_9fa48("2912");
          return stryMutAct_9fa48("2914") ? {} : (stryCov_9fa48("2914"), {
            kind: stryMutAct_9fa48("2915") ? "" : (stryCov_9fa48("2915"), "ve"),
            scale: stryMutAct_9fa48("2916") ? 1 - v / 100 : (stryCov_9fa48("2916"), 1 + (stryMutAct_9fa48("2917") ? v * 100 : (stryCov_9fa48("2917"), v / 100)))
          });
        }
      case stryMutAct_9fa48("2919") ? "" : (stryCov_9fa48("2919"), "pulley"):
        if (stryMutAct_9fa48("2918")) {} else {
          stryCov_9fa48("2918");
          return stryMutAct_9fa48("2920") ? {} : (stryCov_9fa48("2920"), {
            kind: stryMutAct_9fa48("2921") ? "" : (stryCov_9fa48("2921"), "pulley"),
            diameter: toSI(stryMutAct_9fa48("2922") ? "" : (stryCov_9fa48("2922"), "length-small"), v, system)
          });
        }
      case stryMutAct_9fa48("2924") ? "" : (stryCov_9fa48("2924"), "intercooler"):
        if (stryMutAct_9fa48("2923")) {} else {
          stryCov_9fa48("2923");
          // Left empty: calc's default effectiveness.
          return stryMutAct_9fa48("2925") ? {} : (stryCov_9fa48("2925"), {
            kind: stryMutAct_9fa48("2926") ? "" : (stryCov_9fa48("2926"), "intercooler"),
            effectiveness: (stryMutAct_9fa48("2929") ? d.value.trim() !== "" : stryMutAct_9fa48("2928") ? false : stryMutAct_9fa48("2927") ? true : (stryCov_9fa48("2927", "2928", "2929"), (stryMutAct_9fa48("2930") ? d.value : (stryCov_9fa48("2930"), d.value.trim())) === (stryMutAct_9fa48("2931") ? "Stryker was here!" : (stryCov_9fa48("2931"), "")))) ? undefined : stryMutAct_9fa48("2932") ? v * 100 : (stryCov_9fa48("2932"), v / 100)
          });
        }
      case stryMutAct_9fa48("2934") ? "" : (stryCov_9fa48("2934"), "altitude"):
        if (stryMutAct_9fa48("2933")) {} else {
          stryCov_9fa48("2933");
          return stryMutAct_9fa48("2935") ? {} : (stryCov_9fa48("2935"), {
            kind: stryMutAct_9fa48("2936") ? "" : (stryCov_9fa48("2936"), "altitude"),
            altitude: toSI(stryMutAct_9fa48("2937") ? "" : (stryCov_9fa48("2937"), "altitude"), v, system)
          });
        }
      default:
        if (stryMutAct_9fa48("2938")) {} else {
          stryCov_9fa48("2938");
          return null;
        }
    }
  }
}

/** A stored change back in the author's units, for editing. */
export function changeDraft(c: ItemChange | null | undefined, system: UnitSystem): ChangeDraft {
  if (stryMutAct_9fa48("2939")) {
    {}
  } else {
    stryCov_9fa48("2939");
    if (stryMutAct_9fa48("2942") ? false : stryMutAct_9fa48("2941") ? true : stryMutAct_9fa48("2940") ? c : (stryCov_9fa48("2940", "2941", "2942"), !c)) return NO_CHANGE;
    switch (c.kind) {
      case stryMutAct_9fa48("2944") ? "" : (stryCov_9fa48("2944"), "ve"):
        if (stryMutAct_9fa48("2943")) {} else {
          stryCov_9fa48("2943");
          return stryMutAct_9fa48("2945") ? {} : (stryCov_9fa48("2945"), {
            kind: stryMutAct_9fa48("2946") ? "" : (stryCov_9fa48("2946"), "ve"),
            value: String(stryMutAct_9fa48("2947") ? Math.round((c.scale - 1) * 1000) * 10 : (stryCov_9fa48("2947"), Math.round(stryMutAct_9fa48("2948") ? (c.scale - 1) / 1000 : (stryCov_9fa48("2948"), (stryMutAct_9fa48("2949") ? c.scale + 1 : (stryCov_9fa48("2949"), c.scale - 1)) * 1000)) / 10))
          });
        }
      case stryMutAct_9fa48("2951") ? "" : (stryCov_9fa48("2951"), "pulley"):
        if (stryMutAct_9fa48("2950")) {} else {
          stryCov_9fa48("2950");
          return stryMutAct_9fa48("2952") ? {} : (stryCov_9fa48("2952"), {
            kind: stryMutAct_9fa48("2953") ? "" : (stryCov_9fa48("2953"), "pulley"),
            value: String(displayValue(stryMutAct_9fa48("2954") ? "" : (stryCov_9fa48("2954"), "length-small"), c.diameter, system))
          });
        }
      case stryMutAct_9fa48("2956") ? "" : (stryCov_9fa48("2956"), "intercooler"):
        if (stryMutAct_9fa48("2955")) {} else {
          stryCov_9fa48("2955");
          return stryMutAct_9fa48("2957") ? {} : (stryCov_9fa48("2957"), {
            kind: stryMutAct_9fa48("2958") ? "" : (stryCov_9fa48("2958"), "intercooler"),
            value: String(Math.round(stryMutAct_9fa48("2959") ? c.effectiveness / 100 : (stryCov_9fa48("2959"), c.effectiveness * 100)))
          });
        }
      case stryMutAct_9fa48("2961") ? "" : (stryCov_9fa48("2961"), "altitude"):
        if (stryMutAct_9fa48("2960")) {} else {
          stryCov_9fa48("2960");
          return stryMutAct_9fa48("2962") ? {} : (stryCov_9fa48("2962"), {
            kind: stryMutAct_9fa48("2963") ? "" : (stryCov_9fa48("2963"), "altitude"),
            value: String(Math.round(fromSI(stryMutAct_9fa48("2964") ? "" : (stryCov_9fa48("2964"), "altitude"), c.altitude, system)))
          });
        }
    }
  }
}

/** The form's drafts as the API's step input. */
export function stepInput(title: string, items: ItemDraft[], series: StepInput["series"], note: string, system: UnitSystem): StepInput {
  if (stryMutAct_9fa48("2965")) {
    {}
  } else {
    stryCov_9fa48("2965");
    return stryMutAct_9fa48("2966") ? {} : (stryCov_9fa48("2966"), {
      title,
      items: items.map(stryMutAct_9fa48("2967") ? () => undefined : (stryCov_9fa48("2967"), it => stryMutAct_9fa48("2968") ? {} : (stryCov_9fa48("2968"), {
        combinationId: it.combinationId,
        revision: (stryMutAct_9fa48("2971") ? it.revision !== "current" : stryMutAct_9fa48("2970") ? false : stryMutAct_9fa48("2969") ? true : (stryCov_9fa48("2969", "2970", "2971"), it.revision === (stryMutAct_9fa48("2972") ? "" : (stryCov_9fa48("2972"), "current")))) ? stryMutAct_9fa48("2973") ? "" : (stryCov_9fa48("2973"), "current") : Number(it.revision),
        label: it.label,
        change: changeInput(it.change, system)
      }))),
      series,
      note
    });
  }
}

/**
 * The server's field errors for a step with the what-if limits in the author's units: the rules
 * state them in SI ("Altitude must be between -500 and 6000 m"), the boxes take ft or in.
 */
export function localizeStepErrors(errors: Record<string, string[]>, system: UnitSystem): Record<string, string[]> {
  if (stryMutAct_9fa48("2974")) {
    {}
  } else {
    stryCov_9fa48("2974");
    const out: Record<string, string[]> = {};
    for (const [path, messages] of Object.entries(errors)) {
      if (stryMutAct_9fa48("2975")) {
        {}
      } else {
        stryCov_9fa48("2975");
        if (stryMutAct_9fa48("2977") ? false : stryMutAct_9fa48("2976") ? true : (stryCov_9fa48("2976", "2977"), (stryMutAct_9fa48("2981") ? /^items\.\D+\.change\.altitude$/ : stryMutAct_9fa48("2980") ? /^items\.\d\.change\.altitude$/ : stryMutAct_9fa48("2979") ? /^items\.\d+\.change\.altitude/ : stryMutAct_9fa48("2978") ? /items\.\d+\.change\.altitude$/ : (stryCov_9fa48("2978", "2979", "2980", "2981"), /^items\.\d+\.change\.altitude$/)).test(path))) {
          if (stryMutAct_9fa48("2982")) {
            {}
          } else {
            stryCov_9fa48("2982");
            out[path] = messages.map(stryMutAct_9fa48("2983") ? () => undefined : (stryCov_9fa48("2983"), () => stryMutAct_9fa48("2984") ? `` : (stryCov_9fa48("2984"), `Altitude must be between ${quantityText(stryMutAct_9fa48("2985") ? "" : (stryCov_9fa48("2985"), "altitude"), WHAT_IF_ALTITUDE_MIN, system, 0)} and ${quantityText(stryMutAct_9fa48("2986") ? "" : (stryCov_9fa48("2986"), "altitude"), WHAT_IF_ALTITUDE_MAX, system, 0)}.`)));
          }
        } else if (stryMutAct_9fa48("2988") ? false : stryMutAct_9fa48("2987") ? true : (stryCov_9fa48("2987", "2988"), (stryMutAct_9fa48("2992") ? /^items\.\D+\.change\.diameter$/ : stryMutAct_9fa48("2991") ? /^items\.\d\.change\.diameter$/ : stryMutAct_9fa48("2990") ? /^items\.\d+\.change\.diameter/ : stryMutAct_9fa48("2989") ? /items\.\d+\.change\.diameter$/ : (stryCov_9fa48("2989", "2990", "2991", "2992"), /^items\.\d+\.change\.diameter$/)).test(path))) {
          if (stryMutAct_9fa48("2993")) {
            {}
          } else {
            stryCov_9fa48("2993");
            out[path] = messages.map(stryMutAct_9fa48("2994") ? () => undefined : (stryCov_9fa48("2994"), m => localizeMessage(stryMutAct_9fa48("2995") ? "" : (stryCov_9fa48("2995"), "drive.blowerPulleyDiameter"), m.replace(stryMutAct_9fa48("2996") ? /\./ : (stryCov_9fa48("2996"), /\.$/), stryMutAct_9fa48("2997") ? "Stryker was here!" : (stryCov_9fa48("2997"), "")), system)));
          }
        } else out[path] = messages;
      }
    }
    return out;
  }
}