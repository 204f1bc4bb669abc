// @ts-nocheck
// Pure helpers of the classroom view: the "what if" adjustments (a step's stored change per item
// and the live one for every item) and the curves and deltas of a step's items, computed in the
// browser with calc/.
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
import { INTERCOOLER_DEMO_DEFAULTS, boostCurve, combinationSchema, standardAtmosphere, type Combination, type OperatingPoint, type UnitSystem } from "@/calc";
import { VE_SCALE_MAX, VE_SCALE_MIN, type ItemChange, type LessonSeries, type StepItemSnapshot } from "@/lib/lessons/rules";
import { calcErrorText } from "@/lib/units/caution-text";
import { variantLabel } from "./change-text";

/** The chart metric (an OperatingPoint field) behind each lesson series. */
export const SERIES_METRIC = {
  boost: "boostGauge",
  netPower: "netPower",
  torque: "torque",
  chargeTemperature: "manifoldTemperature",
  blowerSpeed: "blowerRpm"
} as const satisfies Record<LessonSeries, keyof OperatingPoint>;
export const SERIES_LABEL: Record<LessonSeries, string> = stryMutAct_9fa48("2500") ? {} : (stryCov_9fa48("2500"), {
  boost: stryMutAct_9fa48("2501") ? "" : (stryCov_9fa48("2501"), "Boost"),
  netPower: stryMutAct_9fa48("2502") ? "" : (stryCov_9fa48("2502"), "Net power"),
  torque: stryMutAct_9fa48("2503") ? "" : (stryCov_9fa48("2503"), "Torque"),
  chargeTemperature: stryMutAct_9fa48("2504") ? "" : (stryCov_9fa48("2504"), "Charge temperature"),
  blowerSpeed: stryMutAct_9fa48("2505") ? "" : (stryCov_9fa48("2505"), "Blower speed")
});

/** A what-if: nothing, or one change (the live control uses one pulley or a VE scale for every item). */
export type WhatIf = {
  kind: "none";
} | ItemChange;
export { VE_SCALE_MAX, VE_SCALE_MIN };

/**
 * The item's spec with the what-if applied (a new object; the stored spec is left alone). VE stays
 * inside the model's accepted range; an intercooler keeps the item's own pressure drop and coolant
 * if it has one, else calc's defaults; altitude sets the barometer from the standard atmosphere and
 * keeps the ambient temperature as built, so only the thinner air changes.
 */
export function applyWhatIf(spec: Combination, w: WhatIf): Combination {
  if (stryMutAct_9fa48("2506")) {
    {}
  } else {
    stryCov_9fa48("2506");
    switch (w.kind) {
      case stryMutAct_9fa48("2508") ? "" : (stryCov_9fa48("2508"), "pulley"):
        if (stryMutAct_9fa48("2507")) {} else {
          stryCov_9fa48("2507");
          return stryMutAct_9fa48("2509") ? {} : (stryCov_9fa48("2509"), {
            ...spec,
            drive: stryMutAct_9fa48("2510") ? {} : (stryCov_9fa48("2510"), {
              ...spec.drive,
              blowerPulleyDiameter: w.diameter
            })
          });
        }
      case stryMutAct_9fa48("2512") ? "" : (stryCov_9fa48("2512"), "ve"):
        if (stryMutAct_9fa48("2511")) {} else {
          stryCov_9fa48("2511");
          {
            if (stryMutAct_9fa48("2513")) {
              {}
            } else {
              stryCov_9fa48("2513");
              const veCurve = spec.engine.veCurve.map(stryMutAct_9fa48("2514") ? () => undefined : (stryCov_9fa48("2514"), p => stryMutAct_9fa48("2515") ? {} : (stryCov_9fa48("2515"), {
                rpm: p.rpm,
                ve: stryMutAct_9fa48("2516") ? Math.max(2, Math.max(0.2, p.ve * w.scale)) : (stryCov_9fa48("2516"), Math.min(2, stryMutAct_9fa48("2517") ? Math.min(0.2, p.ve * w.scale) : (stryCov_9fa48("2517"), Math.max(0.2, stryMutAct_9fa48("2518") ? p.ve / w.scale : (stryCov_9fa48("2518"), p.ve * w.scale)))))
              })));
              return stryMutAct_9fa48("2519") ? {} : (stryCov_9fa48("2519"), {
                ...spec,
                engine: stryMutAct_9fa48("2520") ? {} : (stryCov_9fa48("2520"), {
                  ...spec.engine,
                  veCurve
                })
              });
            }
          }
        }
      case stryMutAct_9fa48("2522") ? "" : (stryCov_9fa48("2522"), "intercooler"):
        if (stryMutAct_9fa48("2521")) {} else {
          stryCov_9fa48("2521");
          return stryMutAct_9fa48("2523") ? {} : (stryCov_9fa48("2523"), {
            ...spec,
            intercooler: stryMutAct_9fa48("2524") ? {} : (stryCov_9fa48("2524"), {
              ...INTERCOOLER_DEMO_DEFAULTS,
              ...spec.intercooler,
              effectiveness: w.effectiveness
            })
          });
        }
      case stryMutAct_9fa48("2526") ? "" : (stryCov_9fa48("2526"), "altitude"):
        if (stryMutAct_9fa48("2525")) {} else {
          stryCov_9fa48("2525");
          return stryMutAct_9fa48("2527") ? {} : (stryCov_9fa48("2527"), {
            ...spec,
            ambient: stryMutAct_9fa48("2528") ? {} : (stryCov_9fa48("2528"), {
              ...spec.ambient,
              pressure: standardAtmosphere(w.altitude).pressure
            })
          });
        }
      default:
        if (stryMutAct_9fa48("2529")) {} else {
          stryCov_9fa48("2529");
          return spec;
        }
    }
  }
}

/** Engine speeds for a step's chart: every 250 rpm from 1500 rpm to the highest redline. */
export function rpmGrid(specs: readonly Combination[]): number[] {
  if (stryMutAct_9fa48("2530")) {
    {}
  } else {
    stryCov_9fa48("2530");
    const top = stryMutAct_9fa48("2531") ? Math.min(...specs.map(s => s.engine.redlineRpm)) : (stryCov_9fa48("2531"), Math.max(...specs.map(stryMutAct_9fa48("2532") ? () => undefined : (stryCov_9fa48("2532"), s => s.engine.redlineRpm))));
    const out: number[] = stryMutAct_9fa48("2533") ? ["Stryker was here"] : (stryCov_9fa48("2533"), []);
    for (let r = 1500; stryMutAct_9fa48("2536") ? r >= top : stryMutAct_9fa48("2535") ? r <= top : stryMutAct_9fa48("2534") ? false : (stryCov_9fa48("2534", "2535", "2536"), r < top); stryMutAct_9fa48("2537") ? r -= 250 : (stryCov_9fa48("2537"), r += 250)) out.push(r);
    out.push(top);
    return out;
  }
}

/**
 * One curve of a step. An item with a stored change gives two: as built, then changed (`base` is
 * the index of its as-built curve); `item` is the item's index in the step.
 */
export type ItemCurve = {
  label: string;
  item: number;
  base: number | null;
  spec: Combination;
  points: OperatingPoint[];
  error: string | null;
};
type Variant = {
  label: string;
  item: number;
  base: number | null;
  spec: Combination;
};

/** The curves a step shows: each item, and beside an item with a change its changed copy; the live what-if applies to all. */
export function stepVariants(items: readonly StepItemSnapshot[], live: WhatIf, system: UnitSystem): Variant[] {
  if (stryMutAct_9fa48("2538")) {
    {}
  } else {
    stryCov_9fa48("2538");
    const out: Variant[] = stryMutAct_9fa48("2539") ? ["Stryker was here"] : (stryCov_9fa48("2539"), []);
    items.forEach((it, item) => {
      if (stryMutAct_9fa48("2540")) {
        {}
      } else {
        stryCov_9fa48("2540");
        if (stryMutAct_9fa48("2543") ? false : stryMutAct_9fa48("2542") ? true : stryMutAct_9fa48("2541") ? it.change : (stryCov_9fa48("2541", "2542", "2543"), !it.change)) {
          if (stryMutAct_9fa48("2544")) {
            {}
          } else {
            stryCov_9fa48("2544");
            out.push(stryMutAct_9fa48("2545") ? {} : (stryCov_9fa48("2545"), {
              label: it.label,
              item,
              base: null,
              spec: applyWhatIf(it.spec, live)
            }));
            return;
          }
        }
        const base = out.length;
        out.push(stryMutAct_9fa48("2546") ? {} : (stryCov_9fa48("2546"), {
          label: variantLabel(it.label, null, system),
          item,
          base: null,
          spec: applyWhatIf(it.spec, live)
        }));
        out.push(stryMutAct_9fa48("2547") ? {} : (stryCov_9fa48("2547"), {
          label: variantLabel(it.label, it.change, system),
          item,
          base,
          spec: applyWhatIf(applyWhatIf(it.spec, it.change), live)
        }));
      }
    });
    return out;
  }
}

/** Each curve up to its own redline; one the model cannot solve reports why (in the viewer's units) instead of throwing. */
export function stepCurves(items: readonly StepItemSnapshot[], live: WhatIf, system: UnitSystem = stryMutAct_9fa48("2548") ? "" : (stryCov_9fa48("2548"), "imperial")): ItemCurve[] {
  if (stryMutAct_9fa48("2549")) {
    {}
  } else {
    stryCov_9fa48("2549");
    const variants = stepVariants(items, live, system);
    const grid = rpmGrid(variants.map(stryMutAct_9fa48("2550") ? () => undefined : (stryCov_9fa48("2550"), v => v.spec)));
    return variants.map(v => {
      if (stryMutAct_9fa48("2551")) {
        {}
      } else {
        stryCov_9fa48("2551");
        try {
          if (stryMutAct_9fa48("2552")) {
            {}
          } else {
            stryCov_9fa48("2552");
            const valid = combinationSchema.parse(v.spec);
            return stryMutAct_9fa48("2553") ? {} : (stryCov_9fa48("2553"), {
              ...v,
              spec: valid,
              points: boostCurve(valid, stryMutAct_9fa48("2554") ? [] : (stryCov_9fa48("2554"), [...(stryMutAct_9fa48("2555") ? grid : (stryCov_9fa48("2555"), grid.filter(stryMutAct_9fa48("2556") ? () => undefined : (stryCov_9fa48("2556"), r => stryMutAct_9fa48("2560") ? r >= valid.engine.redlineRpm : stryMutAct_9fa48("2559") ? r <= valid.engine.redlineRpm : stryMutAct_9fa48("2558") ? false : stryMutAct_9fa48("2557") ? true : (stryCov_9fa48("2557", "2558", "2559", "2560"), r < valid.engine.redlineRpm))))), valid.engine.redlineRpm])),
              error: null
            });
          }
        } catch (e) {
          if (stryMutAct_9fa48("2561")) {
            {}
          } else {
            stryCov_9fa48("2561");
            const issue = stryMutAct_9fa48("2563") ? (e as {
              issues?: {
                message: string;
              }[];
            }).issues[0]?.message : stryMutAct_9fa48("2562") ? (e as {
              issues?: {
                message: string;
              }[];
            }).issues?.[0].message : (stryCov_9fa48("2562", "2563"), (e as {
              issues?: {
                message: string;
              }[];
            }).issues?.[0]?.message);
            return stryMutAct_9fa48("2564") ? {} : (stryCov_9fa48("2564"), {
              ...v,
              points: stryMutAct_9fa48("2565") ? ["Stryker was here"] : (stryCov_9fa48("2565"), []),
              error: stryMutAct_9fa48("2566") ? issue && calcErrorText(e, system, String(e)) : (stryCov_9fa48("2566"), issue ?? calcErrorText(e, system, String(e)))
            });
          }
        }
      }
    });
  }
}

/** The engine speeds of the deltas table: mid-range and near the lowest redline, rounded to 500 rpm. */
export function deltaSpeeds(specs: readonly Combination[]): number[] {
  if (stryMutAct_9fa48("2567")) {
    {}
  } else {
    stryCov_9fa48("2567");
    const low = stryMutAct_9fa48("2568") ? Math.max(...specs.map(s => s.engine.redlineRpm)) : (stryCov_9fa48("2568"), Math.min(...specs.map(stryMutAct_9fa48("2569") ? () => undefined : (stryCov_9fa48("2569"), s => s.engine.redlineRpm))));
    const top = stryMutAct_9fa48("2570") ? Math.min(2000, Math.floor((low - 250) / 500) * 500) : (stryCov_9fa48("2570"), Math.max(2000, stryMutAct_9fa48("2571") ? Math.floor((low - 250) / 500) / 500 : (stryCov_9fa48("2571"), Math.floor(stryMutAct_9fa48("2572") ? (low - 250) * 500 : (stryCov_9fa48("2572"), (stryMutAct_9fa48("2573") ? low + 250 : (stryCov_9fa48("2573"), low - 250)) / 500)) * 500)));
    const mid = stryMutAct_9fa48("2574") ? Math.min(1500, Math.round(top / 2 / 500) * 500) : (stryCov_9fa48("2574"), Math.max(1500, stryMutAct_9fa48("2575") ? Math.round(top / 2 / 500) / 500 : (stryCov_9fa48("2575"), Math.round(stryMutAct_9fa48("2576") ? top / 2 * 500 : (stryCov_9fa48("2576"), (stryMutAct_9fa48("2577") ? top * 2 : (stryCov_9fa48("2577"), top / 2)) / 500)) * 500)));
    return (stryMutAct_9fa48("2580") ? mid !== top : stryMutAct_9fa48("2579") ? false : stryMutAct_9fa48("2578") ? true : (stryCov_9fa48("2578", "2579", "2580"), mid === top)) ? stryMutAct_9fa48("2581") ? [] : (stryCov_9fa48("2581"), [top]) : stryMutAct_9fa48("2582") ? [] : (stryCov_9fa48("2582"), [mid, top]);
  }
}

/** The point of a curve at an engine speed (the grid holds every 250 rpm), or null. */
export function pointAt(points: readonly OperatingPoint[], rpm: number): OperatingPoint | null {
  if (stryMutAct_9fa48("2583")) {
    {}
  } else {
    stryCov_9fa48("2583");
    return stryMutAct_9fa48("2584") ? points.find(p => Math.abs(p.rpm - rpm) < 1e-6) && null : (stryCov_9fa48("2584"), points.find(stryMutAct_9fa48("2585") ? () => undefined : (stryCov_9fa48("2585"), p => stryMutAct_9fa48("2589") ? Math.abs(p.rpm - rpm) >= 1e-6 : stryMutAct_9fa48("2588") ? Math.abs(p.rpm - rpm) <= 1e-6 : stryMutAct_9fa48("2587") ? false : stryMutAct_9fa48("2586") ? true : (stryCov_9fa48("2586", "2587", "2588", "2589"), Math.abs(stryMutAct_9fa48("2590") ? p.rpm + rpm : (stryCov_9fa48("2590"), p.rpm - rpm)) < 1e-6))) ?? null);
  }
}