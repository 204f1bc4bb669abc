// What the curve chart can plot: each metric's name, its quantity kind (one y axis per kind)
// and how to read it off an operating point. Pure, so tests can check the chart's numbers.
import { fromSI, unitLabel, type OperatingPoint, type QuantityKind, type UnitSystem } from "@/calc";
import { digitsOf } from "@/lib/units/format";

export type CurveMetric =
  | "boostGauge"
  | "manifoldPressure"
  | "netPower"
  | "grossPower"
  | "torque"
  | "manifoldTemperature"
  | "dischargeTemperature"
  | "blowerRpm"
  | "drivePower"
  | "airMassFlow"
  | "injectorDuty";

/** Axis kind: a calc quantity kind, or a percentage (injector duty). */
export type AxisKind = QuantityKind | "percent";

interface MetricDef {
  readonly label: string;
  readonly kind: AxisKind;
  readonly read: (p: OperatingPoint) => number | null;
}

export const METRICS: Readonly<Record<CurveMetric, MetricDef>> = {
  boostGauge: { label: "Boost", kind: "pressure", read: (p) => p.boostGauge },
  manifoldPressure: { label: "Manifold absolute pressure", kind: "pressure", read: (p) => p.manifoldPressure },
  netPower: { label: "Net power", kind: "power", read: (p) => p.netPower },
  grossPower: { label: "Gross power", kind: "power", read: (p) => p.grossPower },
  drivePower: { label: "Blower drive power", kind: "power", read: (p) => p.drivePower },
  torque: { label: "Net torque", kind: "torque", read: (p) => p.torque },
  manifoldTemperature: { label: "Charge temperature", kind: "temperature", read: (p) => p.manifoldTemperature },
  dischargeTemperature: { label: "Blower discharge temperature", kind: "temperature", read: (p) => p.dischargeTemperature },
  blowerRpm: { label: "Blower speed", kind: "speed", read: (p) => p.blowerRpm },
  airMassFlow: { label: "Air mass flow", kind: "fuel-flow", read: (p) => p.airMassFlow },
  injectorDuty: { label: "Injector duty", kind: "percent", read: (p) => p.injectorDuty },
};

/** Unit label of an axis kind in a system. */
export function axisUnit(kind: AxisKind, system: UnitSystem): string {
  return kind === "percent" ? "%" : unitLabel(kind, system);
}

/** Decimal places for values of an axis kind in a system. */
export function axisDigits(kind: AxisKind, system: UnitSystem): number {
  return kind === "percent" ? 0 : digitsOf(kind, system);
}

/** A metric's value at a point in the user's units (unrounded), or null when the model has none. */
export function metricValue(metric: CurveMetric, p: OperatingPoint, system: UnitSystem): number | null {
  const def = METRICS[metric];
  const si = def.read(p);
  if (si === null) return null;
  return def.kind === "percent" ? si * 100 : fromSI(def.kind, si, system);
}

/** The same, rounded as the chart's tooltip and hidden table show it. */
export function metricDisplay(metric: CurveMetric, p: OperatingPoint, system: UnitSystem): number | null {
  const v = metricValue(metric, p, system);
  if (v === null) return null;
  const f = 10 ** axisDigits(METRICS[metric].kind, system);
  return Math.round(v * f) / f;
}

/** Okabe–Ito colour-blind-safe palette, in its usual order. */
export const OKABE_ITO = ["#0072B2", "#E69F00", "#009E73", "#CC79A7", "#56B4E9", "#D55E00", "#F0E442", "#000000"] as const;
/** Greys for print: black first. */
export const PRINT_GREYS = ["#000000", "#555555", "#888888", "#333333", "#aaaaaa"] as const;
/** Dash patterns that tell metrics apart when colour tells series apart. */
export const DASHES: readonly number[][] = [[], [7, 4], [2, 3], [10, 3, 2, 3]];

/** The JSON a chart wrapper exposes in `data-series`: per series, engine speeds and each metric in the user's units. */
export interface ExposedSeries {
  label: string;
  rpm: number[];
  /** Boost (gauge) in the user's pressure unit, rounded for display; [] when not plotted. */
  boost: number[];
  boostUnit: string;
  values: Partial<Record<CurveMetric, (number | null)[]>>;
}

export function exposeSeries(series: { label: string; points: readonly OperatingPoint[] }[], metrics: readonly CurveMetric[], system: UnitSystem): ExposedSeries[] {
  return series.map((s) => ({
    label: s.label,
    rpm: s.points.map((p) => p.rpm),
    boost: s.points.map((p) => metricDisplay("boostGauge", p, system) ?? 0),
    boostUnit: unitLabel("pressure", system),
    values: Object.fromEntries(metrics.map((m) => [m, s.points.map((p) => metricDisplay(m, p, system))])),
  }));
}
