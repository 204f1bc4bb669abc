// @ts-nocheck
// Live figures in a step's note: `{boost@4500}`, `{power@peak}`, `{torque@redline#2}` are replaced
// by the figure computed from the same points the chart draws (straight lines between them), in
// the viewer's units, so the words cannot contradict the chart. Anything in braces that is not a
// figure shows as a marked code span instead, and a note never fails to render.
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
import type { OperatingPoint, QuantityKind, UnitSystem } from "@/calc";
import { quantityText } from "@/lib/units/format";
import type { ItemCurve } from "./curves";

/** The figures a note may quote: the token's word, the point's field and its kind of quantity. */
export const NOTE_FIGURES = {
  boost: {
    key: "boostGauge",
    kind: "pressure"
  },
  power: {
    key: "netPower",
    kind: "power"
  },
  torque: {
    key: "torque",
    kind: "torque"
  },
  charge: {
    key: "manifoldTemperature",
    kind: "temperature"
  },
  blower: {
    key: "blowerRpm",
    kind: "speed"
  }
} as const satisfies Record<string, {
  key: keyof OperatingPoint;
  kind: QuantityKind;
}>;
type FigureName = keyof typeof NOTE_FIGURES;
export type NoteToken = {
  figure: FigureName;
  at: number | "peak" | "redline";
  curve: number;
};
const CANDIDATE = stryMutAct_9fa48("2592") ? /\{([{}\n`]{1,40})\}/g : stryMutAct_9fa48("2591") ? /\{([^{}\n`])\}/g : (stryCov_9fa48("2591", "2592"), /\{([^{}\n`]{1,40})\}/g);
const TOKEN = stryMutAct_9fa48("2612") ? /^\s*([a-z]+)\s*@\s*(\d{3,5}|peak|redline)\s*(?:#\s*(\d))?\S*$/i : stryMutAct_9fa48("2611") ? /^\s*([a-z]+)\s*@\s*(\d{3,5}|peak|redline)\s*(?:#\s*(\d))?\s$/i : stryMutAct_9fa48("2610") ? /^\s*([a-z]+)\s*@\s*(\d{3,5}|peak|redline)\s*(?:#\s*(\D))?\s*$/i : stryMutAct_9fa48("2609") ? /^\s*([a-z]+)\s*@\s*(\d{3,5}|peak|redline)\s*(?:#\S*(\d))?\s*$/i : stryMutAct_9fa48("2608") ? /^\s*([a-z]+)\s*@\s*(\d{3,5}|peak|redline)\s*(?:#\s(\d))?\s*$/i : stryMutAct_9fa48("2607") ? /^\s*([a-z]+)\s*@\s*(\d{3,5}|peak|redline)\s*(?:#\s*(\d))\s*$/i : stryMutAct_9fa48("2606") ? /^\s*([a-z]+)\s*@\s*(\d{3,5}|peak|redline)\S*(?:#\s*(\d))?\s*$/i : stryMutAct_9fa48("2605") ? /^\s*([a-z]+)\s*@\s*(\d{3,5}|peak|redline)\s(?:#\s*(\d))?\s*$/i : stryMutAct_9fa48("2604") ? /^\s*([a-z]+)\s*@\s*(\D{3,5}|peak|redline)\s*(?:#\s*(\d))?\s*$/i : stryMutAct_9fa48("2603") ? /^\s*([a-z]+)\s*@\s*(\d|peak|redline)\s*(?:#\s*(\d))?\s*$/i : stryMutAct_9fa48("2602") ? /^\s*([a-z]+)\s*@\S*(\d{3,5}|peak|redline)\s*(?:#\s*(\d))?\s*$/i : stryMutAct_9fa48("2601") ? /^\s*([a-z]+)\s*@\s(\d{3,5}|peak|redline)\s*(?:#\s*(\d))?\s*$/i : stryMutAct_9fa48("2600") ? /^\s*([a-z]+)\S*@\s*(\d{3,5}|peak|redline)\s*(?:#\s*(\d))?\s*$/i : stryMutAct_9fa48("2599") ? /^\s*([a-z]+)\s@\s*(\d{3,5}|peak|redline)\s*(?:#\s*(\d))?\s*$/i : stryMutAct_9fa48("2598") ? /^\s*([^a-z]+)\s*@\s*(\d{3,5}|peak|redline)\s*(?:#\s*(\d))?\s*$/i : stryMutAct_9fa48("2597") ? /^\s*([a-z])\s*@\s*(\d{3,5}|peak|redline)\s*(?:#\s*(\d))?\s*$/i : stryMutAct_9fa48("2596") ? /^\S*([a-z]+)\s*@\s*(\d{3,5}|peak|redline)\s*(?:#\s*(\d))?\s*$/i : stryMutAct_9fa48("2595") ? /^\s([a-z]+)\s*@\s*(\d{3,5}|peak|redline)\s*(?:#\s*(\d))?\s*$/i : stryMutAct_9fa48("2594") ? /^\s*([a-z]+)\s*@\s*(\d{3,5}|peak|redline)\s*(?:#\s*(\d))?\s*/i : stryMutAct_9fa48("2593") ? /\s*([a-z]+)\s*@\s*(\d{3,5}|peak|redline)\s*(?:#\s*(\d))?\s*$/i : (stryCov_9fa48("2593", "2594", "2595", "2596", "2597", "2598", "2599", "2600", "2601", "2602", "2603", "2604", "2605", "2606", "2607", "2608", "2609", "2610", "2611", "2612"), /^\s*([a-z]+)\s*@\s*(\d{3,5}|peak|redline)\s*(?:#\s*(\d))?\s*$/i);

/** A token's parts, or null when the text in braces is not a figure. `curve` counts from 0. */
export function parseNoteToken(inner: string): NoteToken | null {
  if (stryMutAct_9fa48("2613")) {
    {}
  } else {
    stryCov_9fa48("2613");
    const m = TOKEN.exec(inner);
    if (stryMutAct_9fa48("2616") ? false : stryMutAct_9fa48("2615") ? true : stryMutAct_9fa48("2614") ? m : (stryCov_9fa48("2614", "2615", "2616"), !m)) return null;
    const figure = stryMutAct_9fa48("2617") ? m[1].toUpperCase() : (stryCov_9fa48("2617"), m[1].toLowerCase());
    if (stryMutAct_9fa48("2620") ? false : stryMutAct_9fa48("2619") ? true : stryMutAct_9fa48("2618") ? figure in NOTE_FIGURES : (stryCov_9fa48("2618", "2619", "2620"), !(figure in NOTE_FIGURES))) return null;
    const where = stryMutAct_9fa48("2621") ? m[2].toUpperCase() : (stryCov_9fa48("2621"), m[2].toLowerCase());
    const curve = m[3] ? stryMutAct_9fa48("2622") ? Number(m[3]) + 1 : (stryCov_9fa48("2622"), Number(m[3]) - 1) : 0;
    if (stryMutAct_9fa48("2626") ? curve >= 0 : stryMutAct_9fa48("2625") ? curve <= 0 : stryMutAct_9fa48("2624") ? false : stryMutAct_9fa48("2623") ? true : (stryCov_9fa48("2623", "2624", "2625", "2626"), curve < 0)) return null;
    return stryMutAct_9fa48("2627") ? {} : (stryCov_9fa48("2627"), {
      figure: figure as FigureName,
      at: (stryMutAct_9fa48("2630") ? where === "peak" && where === "redline" : stryMutAct_9fa48("2629") ? false : stryMutAct_9fa48("2628") ? true : (stryCov_9fa48("2628", "2629", "2630"), (stryMutAct_9fa48("2632") ? where !== "peak" : stryMutAct_9fa48("2631") ? false : (stryCov_9fa48("2631", "2632"), where === (stryMutAct_9fa48("2633") ? "" : (stryCov_9fa48("2633"), "peak")))) || (stryMutAct_9fa48("2635") ? where !== "redline" : stryMutAct_9fa48("2634") ? false : (stryCov_9fa48("2634", "2635"), where === (stryMutAct_9fa48("2636") ? "" : (stryCov_9fa48("2636"), "redline")))))) ? where : Number(where),
      curve
    });
  }
}

/** The value of `key` at `rpm` on straight lines between the points, or a reason there is none. */
function valueAt(points: readonly OperatingPoint[], key: keyof OperatingPoint, rpm: number): number | string {
  if (stryMutAct_9fa48("2637")) {
    {}
  } else {
    stryCov_9fa48("2637");
    const i = points.findIndex(stryMutAct_9fa48("2638") ? () => undefined : (stryCov_9fa48("2638"), p => stryMutAct_9fa48("2642") ? p.rpm < rpm : stryMutAct_9fa48("2641") ? p.rpm > rpm : stryMutAct_9fa48("2640") ? false : stryMutAct_9fa48("2639") ? true : (stryCov_9fa48("2639", "2640", "2641", "2642"), p.rpm >= rpm)));
    if (stryMutAct_9fa48("2645") ? i < 0 && points[0].rpm > rpm : stryMutAct_9fa48("2644") ? false : stryMutAct_9fa48("2643") ? true : (stryCov_9fa48("2643", "2644", "2645"), (stryMutAct_9fa48("2648") ? i >= 0 : stryMutAct_9fa48("2647") ? i <= 0 : stryMutAct_9fa48("2646") ? false : (stryCov_9fa48("2646", "2647", "2648"), i < 0)) || (stryMutAct_9fa48("2651") ? points[0].rpm <= rpm : stryMutAct_9fa48("2650") ? points[0].rpm >= rpm : stryMutAct_9fa48("2649") ? false : (stryCov_9fa48("2649", "2650", "2651"), points[0].rpm > rpm)))) return stryMutAct_9fa48("2652") ? `` : (stryCov_9fa48("2652"), `no figure at ${rpm.toLocaleString(stryMutAct_9fa48("2653") ? "" : (stryCov_9fa48("2653"), "en-US"))} rpm`);
    const hi = points[i];
    const lo = (stryMutAct_9fa48("2656") ? hi.rpm !== rpm : stryMutAct_9fa48("2655") ? false : stryMutAct_9fa48("2654") ? true : (stryCov_9fa48("2654", "2655", "2656"), hi.rpm === rpm)) ? hi : points[stryMutAct_9fa48("2657") ? i + 1 : (stryCov_9fa48("2657"), i - 1)];
    if (stryMutAct_9fa48("2660") ? !lo.withinRange && !hi.withinRange : stryMutAct_9fa48("2659") ? false : stryMutAct_9fa48("2658") ? true : (stryCov_9fa48("2658", "2659", "2660"), (stryMutAct_9fa48("2661") ? lo.withinRange : (stryCov_9fa48("2661"), !lo.withinRange)) || (stryMutAct_9fa48("2662") ? hi.withinRange : (stryCov_9fa48("2662"), !hi.withinRange)))) return stryMutAct_9fa48("2663") ? `` : (stryCov_9fa48("2663"), `outside the model's range at ${rpm.toLocaleString(stryMutAct_9fa48("2664") ? "" : (stryCov_9fa48("2664"), "en-US"))} rpm`);
    const [a, b] = stryMutAct_9fa48("2665") ? [] : (stryCov_9fa48("2665"), [lo[key] as number, hi[key] as number]);
    return (stryMutAct_9fa48("2668") ? hi.rpm !== lo.rpm : stryMutAct_9fa48("2667") ? false : stryMutAct_9fa48("2666") ? true : (stryCov_9fa48("2666", "2667", "2668"), hi.rpm === lo.rpm)) ? b : stryMutAct_9fa48("2669") ? a - (b - a) * (rpm - lo.rpm) / (hi.rpm - lo.rpm) : (stryCov_9fa48("2669"), a + (stryMutAct_9fa48("2670") ? (b - a) * (rpm - lo.rpm) * (hi.rpm - lo.rpm) : (stryCov_9fa48("2670"), (stryMutAct_9fa48("2671") ? (b - a) / (rpm - lo.rpm) : (stryCov_9fa48("2671"), (stryMutAct_9fa48("2672") ? b + a : (stryCov_9fa48("2672"), b - a)) * (stryMutAct_9fa48("2673") ? rpm + lo.rpm : (stryCov_9fa48("2673"), rpm - lo.rpm)))) / (stryMutAct_9fa48("2674") ? hi.rpm + lo.rpm : (stryCov_9fa48("2674"), hi.rpm - lo.rpm)))));
  }
}

/** A token's figure as text in the viewer's units, or a reason there is none. */
export function figureText(token: NoteToken, curves: readonly ItemCurve[], system: UnitSystem): {
  ok: true;
  text: string;
} | {
  ok: false;
  reason: string;
} {
  if (stryMutAct_9fa48("2675")) {
    {}
  } else {
    stryCov_9fa48("2675");
    const curve = curves[token.curve];
    if (stryMutAct_9fa48("2678") ? false : stryMutAct_9fa48("2677") ? true : stryMutAct_9fa48("2676") ? curve : (stryCov_9fa48("2676", "2677", "2678"), !curve)) return stryMutAct_9fa48("2679") ? {} : (stryCov_9fa48("2679"), {
      ok: stryMutAct_9fa48("2680") ? true : (stryCov_9fa48("2680"), false),
      reason: stryMutAct_9fa48("2681") ? `` : (stryCov_9fa48("2681"), `this step has no item ${stryMutAct_9fa48("2682") ? token.curve - 1 : (stryCov_9fa48("2682"), token.curve + 1)}`)
    });
    if (stryMutAct_9fa48("2685") ? false : stryMutAct_9fa48("2684") ? true : stryMutAct_9fa48("2683") ? curve.points.length : (stryCov_9fa48("2683", "2684", "2685"), !curve.points.length)) return stryMutAct_9fa48("2686") ? {} : (stryCov_9fa48("2686"), {
      ok: stryMutAct_9fa48("2687") ? true : (stryCov_9fa48("2687"), false),
      reason: stryMutAct_9fa48("2688") ? "" : (stryCov_9fa48("2688"), "the model has no answer for this item")
    });
    const {
      key,
      kind
    } = NOTE_FIGURES[token.figure];
    let value: number | string;
    if (stryMutAct_9fa48("2691") ? token.at !== "peak" : stryMutAct_9fa48("2690") ? false : stryMutAct_9fa48("2689") ? true : (stryCov_9fa48("2689", "2690", "2691"), token.at === (stryMutAct_9fa48("2692") ? "" : (stryCov_9fa48("2692"), "peak")))) {
      if (stryMutAct_9fa48("2693")) {
        {}
      } else {
        stryCov_9fa48("2693");
        const inRange = stryMutAct_9fa48("2694") ? curve.points : (stryCov_9fa48("2694"), curve.points.filter(stryMutAct_9fa48("2695") ? () => undefined : (stryCov_9fa48("2695"), p => p.withinRange)));
        value = inRange.length ? stryMutAct_9fa48("2696") ? Math.min(...inRange.map(p => p[key] as number)) : (stryCov_9fa48("2696"), Math.max(...inRange.map(stryMutAct_9fa48("2697") ? () => undefined : (stryCov_9fa48("2697"), p => p[key] as number)))) : stryMutAct_9fa48("2698") ? "" : (stryCov_9fa48("2698"), "outside the model's range");
      }
    } else {
      if (stryMutAct_9fa48("2699")) {
        {}
      } else {
        stryCov_9fa48("2699");
        value = valueAt(curve.points, key, (stryMutAct_9fa48("2702") ? token.at !== "redline" : stryMutAct_9fa48("2701") ? false : stryMutAct_9fa48("2700") ? true : (stryCov_9fa48("2700", "2701", "2702"), token.at === (stryMutAct_9fa48("2703") ? "" : (stryCov_9fa48("2703"), "redline")))) ? curve.points.at(stryMutAct_9fa48("2704") ? +1 : (stryCov_9fa48("2704"), -1))!.rpm : token.at);
      }
    }
    return (stryMutAct_9fa48("2707") ? typeof value !== "number" : stryMutAct_9fa48("2706") ? false : stryMutAct_9fa48("2705") ? true : (stryCov_9fa48("2705", "2706", "2707"), typeof value === (stryMutAct_9fa48("2708") ? "" : (stryCov_9fa48("2708"), "number")))) ? stryMutAct_9fa48("2709") ? {} : (stryCov_9fa48("2709"), {
      ok: stryMutAct_9fa48("2710") ? false : (stryCov_9fa48("2710"), true),
      text: quantityText(kind, value, system)
    }) : stryMutAct_9fa48("2711") ? {} : (stryCov_9fa48("2711"), {
      ok: stryMutAct_9fa48("2712") ? true : (stryCov_9fa48("2712"), false),
      reason: value
    });
  }
}

/** The note with every `{…}` replaced: a figure, or a code span saying why there is none. */
export function fillNoteFigures(markdown: string, curves: readonly ItemCurve[], system: UnitSystem): string {
  if (stryMutAct_9fa48("2713")) {
    {}
  } else {
    stryCov_9fa48("2713");
    return markdown.replace(CANDIDATE, (whole, inner: string) => {
      if (stryMutAct_9fa48("2714")) {
        {}
      } else {
        stryCov_9fa48("2714");
        const token = parseNoteToken(inner);
        if (stryMutAct_9fa48("2717") ? false : stryMutAct_9fa48("2716") ? true : stryMutAct_9fa48("2715") ? token : (stryCov_9fa48("2715", "2716", "2717"), !token)) return stryMutAct_9fa48("2718") ? `` : (stryCov_9fa48("2718"), `\`${whole}: unknown figure\``);
        const r = figureText(token, curves, system);
        return r.ok ? r.text : stryMutAct_9fa48("2719") ? `` : (stryCov_9fa48("2719"), `\`${whole}: ${r.reason}\``);
      }
    });
  }
}

/** The step editor's help: the tokens a note may use. */
export const NOTE_FIGURE_HELP = stryMutAct_9fa48("2720") ? "" : (stryCov_9fa48("2720"), "Live figures: {boost@4500} is the first item's boost at 4,500 rpm; {power@peak} its highest net power; {torque@redline#2} the second curve's torque at its redline. Figures: boost, power, torque, charge (temperature), blower (speed). Shown in each viewer's units.");