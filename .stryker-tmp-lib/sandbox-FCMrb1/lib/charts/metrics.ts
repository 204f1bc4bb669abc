// @ts-nocheck
// What the curve chart can plot: each metric's name, its quantity kind (one y axis per kind)
// and how to read it off an operating point. Pure, so tests can check the chart's numbers.
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
import { fromSI, unitLabel, type OperatingPoint, type QuantityKind, type UnitSystem } from "@/calc";
import { digitsOf } from "@/lib/units/format";
export type CurveMetric = "boostGauge" | "manifoldPressure" | "netPower" | "grossPower" | "torque" | "manifoldTemperature" | "dischargeTemperature" | "blowerRpm" | "drivePower" | "airMassFlow" | "injectorDuty";

/** Axis kind: a calc quantity kind, or a percentage (injector duty). */
export type AxisKind = QuantityKind | "percent";
interface MetricDef {
  readonly label: string;
  readonly kind: AxisKind;
  readonly read: (p: OperatingPoint) => number | null;
}
export const METRICS: Readonly<Record<CurveMetric, MetricDef>> = stryMutAct_9fa48("105") ? {} : (stryCov_9fa48("105"), {
  boostGauge: stryMutAct_9fa48("106") ? {} : (stryCov_9fa48("106"), {
    label: stryMutAct_9fa48("107") ? "" : (stryCov_9fa48("107"), "Boost"),
    kind: stryMutAct_9fa48("108") ? "" : (stryCov_9fa48("108"), "pressure"),
    read: stryMutAct_9fa48("109") ? () => undefined : (stryCov_9fa48("109"), p => p.boostGauge)
  }),
  manifoldPressure: stryMutAct_9fa48("110") ? {} : (stryCov_9fa48("110"), {
    label: stryMutAct_9fa48("111") ? "" : (stryCov_9fa48("111"), "Manifold absolute pressure"),
    kind: stryMutAct_9fa48("112") ? "" : (stryCov_9fa48("112"), "pressure"),
    read: stryMutAct_9fa48("113") ? () => undefined : (stryCov_9fa48("113"), p => p.manifoldPressure)
  }),
  netPower: stryMutAct_9fa48("114") ? {} : (stryCov_9fa48("114"), {
    label: stryMutAct_9fa48("115") ? "" : (stryCov_9fa48("115"), "Net power"),
    kind: stryMutAct_9fa48("116") ? "" : (stryCov_9fa48("116"), "power"),
    read: stryMutAct_9fa48("117") ? () => undefined : (stryCov_9fa48("117"), p => p.netPower)
  }),
  grossPower: stryMutAct_9fa48("118") ? {} : (stryCov_9fa48("118"), {
    label: stryMutAct_9fa48("119") ? "" : (stryCov_9fa48("119"), "Gross power"),
    kind: stryMutAct_9fa48("120") ? "" : (stryCov_9fa48("120"), "power"),
    read: stryMutAct_9fa48("121") ? () => undefined : (stryCov_9fa48("121"), p => p.grossPower)
  }),
  drivePower: stryMutAct_9fa48("122") ? {} : (stryCov_9fa48("122"), {
    label: stryMutAct_9fa48("123") ? "" : (stryCov_9fa48("123"), "Blower drive power"),
    kind: stryMutAct_9fa48("124") ? "" : (stryCov_9fa48("124"), "power"),
    read: stryMutAct_9fa48("125") ? () => undefined : (stryCov_9fa48("125"), p => p.drivePower)
  }),
  torque: stryMutAct_9fa48("126") ? {} : (stryCov_9fa48("126"), {
    label: stryMutAct_9fa48("127") ? "" : (stryCov_9fa48("127"), "Net torque"),
    kind: stryMutAct_9fa48("128") ? "" : (stryCov_9fa48("128"), "torque"),
    read: stryMutAct_9fa48("129") ? () => undefined : (stryCov_9fa48("129"), p => p.torque)
  }),
  manifoldTemperature: stryMutAct_9fa48("130") ? {} : (stryCov_9fa48("130"), {
    label: stryMutAct_9fa48("131") ? "" : (stryCov_9fa48("131"), "Charge temperature"),
    kind: stryMutAct_9fa48("132") ? "" : (stryCov_9fa48("132"), "temperature"),
    read: stryMutAct_9fa48("133") ? () => undefined : (stryCov_9fa48("133"), p => p.manifoldTemperature)
  }),
  dischargeTemperature: stryMutAct_9fa48("134") ? {} : (stryCov_9fa48("134"), {
    label: stryMutAct_9fa48("135") ? "" : (stryCov_9fa48("135"), "Blower discharge temperature"),
    kind: stryMutAct_9fa48("136") ? "" : (stryCov_9fa48("136"), "temperature"),
    read: stryMutAct_9fa48("137") ? () => undefined : (stryCov_9fa48("137"), p => p.dischargeTemperature)
  }),
  blowerRpm: stryMutAct_9fa48("138") ? {} : (stryCov_9fa48("138"), {
    label: stryMutAct_9fa48("139") ? "" : (stryCov_9fa48("139"), "Blower speed"),
    kind: stryMutAct_9fa48("140") ? "" : (stryCov_9fa48("140"), "speed"),
    read: stryMutAct_9fa48("141") ? () => undefined : (stryCov_9fa48("141"), p => p.blowerRpm)
  }),
  airMassFlow: stryMutAct_9fa48("142") ? {} : (stryCov_9fa48("142"), {
    label: stryMutAct_9fa48("143") ? "" : (stryCov_9fa48("143"), "Air mass flow"),
    kind: stryMutAct_9fa48("144") ? "" : (stryCov_9fa48("144"), "fuel-flow"),
    read: stryMutAct_9fa48("145") ? () => undefined : (stryCov_9fa48("145"), p => p.airMassFlow)
  }),
  injectorDuty: stryMutAct_9fa48("146") ? {} : (stryCov_9fa48("146"), {
    label: stryMutAct_9fa48("147") ? "" : (stryCov_9fa48("147"), "Injector duty"),
    kind: stryMutAct_9fa48("148") ? "" : (stryCov_9fa48("148"), "percent"),
    read: stryMutAct_9fa48("149") ? () => undefined : (stryCov_9fa48("149"), p => p.injectorDuty)
  })
});

/** Unit label of an axis kind in a system. */
export function axisUnit(kind: AxisKind, system: UnitSystem): string {
  if (stryMutAct_9fa48("150")) {
    {}
  } else {
    stryCov_9fa48("150");
    return (stryMutAct_9fa48("153") ? kind !== "percent" : stryMutAct_9fa48("152") ? false : stryMutAct_9fa48("151") ? true : (stryCov_9fa48("151", "152", "153"), kind === (stryMutAct_9fa48("154") ? "" : (stryCov_9fa48("154"), "percent")))) ? stryMutAct_9fa48("155") ? "" : (stryCov_9fa48("155"), "%") : unitLabel(kind, system);
  }
}

/** Decimal places for values of an axis kind in a system. */
export function axisDigits(kind: AxisKind, system: UnitSystem): number {
  if (stryMutAct_9fa48("156")) {
    {}
  } else {
    stryCov_9fa48("156");
    return (stryMutAct_9fa48("159") ? kind !== "percent" : stryMutAct_9fa48("158") ? false : stryMutAct_9fa48("157") ? true : (stryCov_9fa48("157", "158", "159"), kind === (stryMutAct_9fa48("160") ? "" : (stryCov_9fa48("160"), "percent")))) ? 0 : digitsOf(kind, system);
  }
}

/** A metric's value at a point in the user's units (unrounded), or null when the model has none. */
export function metricValue(metric: CurveMetric, p: OperatingPoint, system: UnitSystem): number | null {
  if (stryMutAct_9fa48("161")) {
    {}
  } else {
    stryCov_9fa48("161");
    const def = METRICS[metric];
    const si = def.read(p);
    if (stryMutAct_9fa48("164") ? si !== null : stryMutAct_9fa48("163") ? false : stryMutAct_9fa48("162") ? true : (stryCov_9fa48("162", "163", "164"), si === null)) return null;
    return (stryMutAct_9fa48("167") ? def.kind !== "percent" : stryMutAct_9fa48("166") ? false : stryMutAct_9fa48("165") ? true : (stryCov_9fa48("165", "166", "167"), def.kind === (stryMutAct_9fa48("168") ? "" : (stryCov_9fa48("168"), "percent")))) ? stryMutAct_9fa48("169") ? si / 100 : (stryCov_9fa48("169"), si * 100) : fromSI(def.kind, si, system);
  }
}

/** The same, rounded as the chart's tooltip and hidden table show it. */
export function metricDisplay(metric: CurveMetric, p: OperatingPoint, system: UnitSystem): number | null {
  if (stryMutAct_9fa48("170")) {
    {}
  } else {
    stryCov_9fa48("170");
    const v = metricValue(metric, p, system);
    if (stryMutAct_9fa48("173") ? v !== null : stryMutAct_9fa48("172") ? false : stryMutAct_9fa48("171") ? true : (stryCov_9fa48("171", "172", "173"), v === null)) return null;
    const f = 10 ** axisDigits(METRICS[metric].kind, system);
    return stryMutAct_9fa48("174") ? Math.round(v * f) * f : (stryCov_9fa48("174"), Math.round(stryMutAct_9fa48("175") ? v / f : (stryCov_9fa48("175"), v * f)) / f);
  }
}

/** Okabe–Ito colour-blind-safe palette, in its usual order. */
export const OKABE_ITO = ["#0072B2", "#E69F00", "#009E73", "#CC79A7", "#56B4E9", "#D55E00", "#F0E442", "#000000"] as const;
/** Greys for print: black first. */
export const PRINT_GREYS = ["#000000", "#555555", "#888888", "#333333", "#aaaaaa"] as const;
/** Dash patterns that tell metrics apart when colour tells series apart. */
export const DASHES: readonly number[][] = stryMutAct_9fa48("176") ? [] : (stryCov_9fa48("176"), [stryMutAct_9fa48("177") ? ["Stryker was here"] : (stryCov_9fa48("177"), []), stryMutAct_9fa48("178") ? [] : (stryCov_9fa48("178"), [7, 4]), stryMutAct_9fa48("179") ? [] : (stryCov_9fa48("179"), [2, 3]), stryMutAct_9fa48("180") ? [] : (stryCov_9fa48("180"), [10, 3, 2, 3])]);

/** The JSON a chart wrapper exposes in `data-series`: per series, engine speeds and each metric in the user's units. */
export interface ExposedSeries {
  label: string;
  rpm: number[];
  /** Boost (gauge) in the user's pressure unit, rounded for display; [] when not plotted. */
  boost: number[];
  boostUnit: string;
  values: Partial<Record<CurveMetric, (number | null)[]>>;
}
export function exposeSeries(series: {
  label: string;
  points: readonly OperatingPoint[];
}[], metrics: readonly CurveMetric[], system: UnitSystem): ExposedSeries[] {
  if (stryMutAct_9fa48("181")) {
    {}
  } else {
    stryCov_9fa48("181");
    return series.map(stryMutAct_9fa48("182") ? () => undefined : (stryCov_9fa48("182"), s => stryMutAct_9fa48("183") ? {} : (stryCov_9fa48("183"), {
      label: s.label,
      rpm: s.points.map(stryMutAct_9fa48("184") ? () => undefined : (stryCov_9fa48("184"), p => p.rpm)),
      boost: s.points.map(stryMutAct_9fa48("185") ? () => undefined : (stryCov_9fa48("185"), p => stryMutAct_9fa48("186") ? metricDisplay("boostGauge", p, system) && 0 : (stryCov_9fa48("186"), metricDisplay(stryMutAct_9fa48("187") ? "" : (stryCov_9fa48("187"), "boostGauge"), p, system) ?? 0))),
      boostUnit: unitLabel(stryMutAct_9fa48("188") ? "" : (stryCov_9fa48("188"), "pressure"), system),
      values: Object.fromEntries(metrics.map(stryMutAct_9fa48("189") ? () => undefined : (stryCov_9fa48("189"), m => stryMutAct_9fa48("190") ? [] : (stryCov_9fa48("190"), [m, s.points.map(stryMutAct_9fa48("191") ? () => undefined : (stryCov_9fa48("191"), p => metricDisplay(m, p, system)))]))))
    })));
  }
}