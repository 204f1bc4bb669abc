// Conversions at the edges: people's units in, SI out, and back. The physics never sees
// anything but SI. Exact factors are the international definitions (NIST SP 811, App. B).
import { GASOLINE_DENSITY_KG_PER_L } from "./constants";

/** One inch (m), exact. */
export const INCH = 0.0254;
/** One foot (m), exact. */
export const FOOT = 0.3048;
/** One millimetre (m). */
export const MILLIMETRE = 1e-3;
/** One cubic inch (m³), exact. */
export const CUBIC_INCH = INCH ** 3;
/** One cubic foot (m³), exact. */
export const CUBIC_FOOT = FOOT ** 3;
/** One litre (m³), exact. */
export const LITRE = 1e-3;
/** One avoirdupois pound (kg), exact. */
export const POUND = 0.45359237;
/** Standard acceleration of gravity (m/s²), exact. */
export const STANDARD_GRAVITY = 9.80665;
/** One pound-force (N), exact. */
export const POUND_FORCE = POUND * STANDARD_GRAVITY;
/** One pound-force per square inch (Pa). */
export const PSI = POUND_FORCE / INCH ** 2;
/** One kilopascal (Pa). */
export const KILOPASCAL = 1e3;
/** One bar (Pa), exact. */
export const BAR = 1e5;
/** One mechanical horsepower, 550 ft·lbf/s (W). */
export const HORSEPOWER = 550 * FOOT * POUND_FORCE;
/** One kilowatt (W). */
export const KILOWATT = 1e3;
/** One pound-force foot (N·m). */
export const POUND_FORCE_FOOT = POUND_FORCE * FOOT;
/** One cubic foot per minute (m³/s). */
export const CFM = CUBIC_FOOT / 60;
/** Kelvin of 0 °C (K), exact. */
export const ZERO_CELSIUS = 273.15;
/** One hour (s). */
export const HOUR = 3600;

/** Inches to metres. */
export const inToM = (inches: number): number => inches * INCH;
/** Metres to inches. */
export const mToIn = (m: number): number => m / INCH;
/** Millimetres to metres. */
export const mmToM = (mm: number): number => mm * MILLIMETRE;
/** Metres to millimetres. */
export const mToMm = (m: number): number => m / MILLIMETRE;
/** Cubic inches to cubic metres. */
export const in3ToM3 = (in3: number): number => in3 * CUBIC_INCH;
/** Cubic metres to cubic inches. */
export const m3ToIn3 = (m3: number): number => m3 / CUBIC_INCH;
/** Litres to cubic metres. */
export const litresToM3 = (l: number): number => l * LITRE;
/** Cubic metres to litres. */
export const m3ToLitres = (m3: number): number => m3 / LITRE;
/** psi to pascals (a difference or a gauge/absolute value alike). */
export const psiToPa = (psi: number): number => psi * PSI;
/** Pascals to psi. */
export const paToPsi = (pa: number): number => pa / PSI;
/** Kilopascals to pascals. */
export const kPaToPa = (kPa: number): number => kPa * KILOPASCAL;
/** Pascals to kilopascals. */
export const paToKPa = (pa: number): number => pa / KILOPASCAL;
/** Bar to pascals. */
export const barToPa = (bar: number): number => bar * BAR;
/** Pascals to bar. */
export const paToBar = (pa: number): number => pa / BAR;
/** Gauge pressure (Pa) to absolute (Pa), given the ambient absolute pressure (Pa). */
export const gaugeToAbsolute = (gauge: number, ambient: number): number => gauge + ambient;
/** Absolute pressure (Pa) to gauge (Pa), given the ambient absolute pressure (Pa). */
export const absoluteToGauge = (absolute: number, ambient: number): number => absolute - ambient;
/** Degrees Celsius to kelvin. */
export const cToK = (c: number): number => c + ZERO_CELSIUS;
/** Kelvin to degrees Celsius. */
export const kToC = (k: number): number => k - ZERO_CELSIUS;
/** Degrees Fahrenheit to kelvin. */
export const fToK = (f: number): number => ((f - 32) * 5) / 9 + ZERO_CELSIUS;
/** Kelvin to degrees Fahrenheit. */
export const kToF = (k: number): number => ((k - ZERO_CELSIUS) * 9) / 5 + 32;
/** Cubic feet per minute to m³/s. */
export const cfmToM3s = (cfm: number): number => cfm * CFM;
/** m³/s to cubic feet per minute. */
export const m3sToCfm = (m3s: number): number => m3s / CFM;
/** m³/min to m³/s. */
export const m3PerMinToM3s = (m3min: number): number => m3min / 60;
/** m³/s to m³/min. */
export const m3sToM3PerMin = (m3s: number): number => m3s * 60;
/** Horsepower (550 ft·lbf/s) to watts. */
export const hpToW = (hp: number): number => hp * HORSEPOWER;
/** Watts to horsepower (550 ft·lbf/s). */
export const wToHp = (w: number): number => w / HORSEPOWER;
/** Kilowatts to watts. */
export const kWToW = (kW: number): number => kW * KILOWATT;
/** Watts to kilowatts. */
export const wToKW = (w: number): number => w / KILOWATT;
/** Pound-force feet to newton metres. */
export const lbFtToNm = (lbFt: number): number => lbFt * POUND_FORCE_FOOT;
/** Newton metres to pound-force feet. */
export const nmToLbFt = (nm: number): number => nm / POUND_FORCE_FOOT;
/** Pounds per hour to kg/s. */
export const lbPerHourToKgS = (lbh: number): number => (lbh * POUND) / HOUR;
/** kg/s to pounds per hour. */
export const kgSToLbPerHour = (kgs: number): number => (kgs * HOUR) / POUND;
/** kg/h to kg/s. */
export const kgPerHourToKgS = (kgh: number): number => kgh / HOUR;
/** kg/s to kg/h. */
export const kgSToKgPerHour = (kgs: number): number => kgs * HOUR;
/** Fuel cc/min to kg/s at a liquid density (kg/L), default gasoline 0.74 kg/L (from memory). */
export const ccPerMinToKgS = (ccMin: number, densityKgPerL = GASOLINE_DENSITY_KG_PER_L): number =>
  (ccMin / 1000) * densityKgPerL / 60;
/** Fuel kg/s to cc/min at a liquid density (kg/L), default gasoline 0.74 kg/L (from memory). */
export const kgSToCcPerMin = (kgs: number, densityKgPerL = GASOLINE_DENSITY_KG_PER_L): number =>
  ((kgs * 60) / densityKgPerL) * 1000;
/** BSFC in lb/(hp·h) to kg/J. */
export const bsfcImperialToSI = (lbPerHpH: number): number => (lbPerHpH * POUND) / (HORSEPOWER * HOUR);
/** BSFC in kg/J to lb/(hp·h). */
export const bsfcSIToImperial = (kgPerJ: number): number => (kgPerJ * HORSEPOWER * HOUR) / POUND;
/** BSFC in g/(kW·h) to kg/J. */
export const bsfcMetricToSI = (gPerKWh: number): number => gPerKWh / 1000 / (KILOWATT * HOUR);
/** BSFC in kg/J to g/(kW·h). */
export const bsfcSIToMetric = (kgPerJ: number): number => kgPerJ * 1000 * KILOWATT * HOUR;

/** The user's choice of display units. */
export type UnitSystem = "imperial" | "metric";

/** Kinds of quantity a form or chart shows, each with one imperial and one metric unit. */
export type QuantityKind =
  | "length-small"
  | "altitude"
  | "displacement"
  | "blower-displacement"
  | "pressure"
  | "temperature"
  | "power"
  | "torque"
  | "airflow"
  | "speed"
  | "fuel-flow"
  | "injector-flow"
  | "bsfc";

interface UnitDef {
  readonly unit: string;
  readonly toSI: (v: number) => number;
  readonly fromSI: (v: number) => number;
}

const id = (v: number): number => v;

/** Display units per kind and system, with their conversions to and from SI. */
const UNITS: Readonly<Record<QuantityKind, Readonly<Record<UnitSystem, UnitDef>>>> = {
  "length-small": {
    imperial: { unit: "in", toSI: inToM, fromSI: mToIn },
    metric: { unit: "mm", toSI: mmToM, fromSI: mToMm },
  },
  altitude: {
    imperial: { unit: "ft", toSI: (v) => v * FOOT, fromSI: (v) => v / FOOT },
    metric: { unit: "m", toSI: id, fromSI: id },
  },
  displacement: {
    imperial: { unit: "in³", toSI: in3ToM3, fromSI: m3ToIn3 },
    metric: { unit: "L", toSI: litresToM3, fromSI: m3ToLitres },
  },
  "blower-displacement": {
    imperial: { unit: "in³/rev", toSI: in3ToM3, fromSI: m3ToIn3 },
    metric: { unit: "L/rev", toSI: litresToM3, fromSI: m3ToLitres },
  },
  pressure: {
    imperial: { unit: "psi", toSI: psiToPa, fromSI: paToPsi },
    metric: { unit: "kPa", toSI: kPaToPa, fromSI: paToKPa },
  },
  temperature: {
    imperial: { unit: "°F", toSI: fToK, fromSI: kToF },
    metric: { unit: "°C", toSI: cToK, fromSI: kToC },
  },
  power: {
    imperial: { unit: "hp", toSI: hpToW, fromSI: wToHp },
    metric: { unit: "kW", toSI: kWToW, fromSI: wToKW },
  },
  torque: {
    imperial: { unit: "lb·ft", toSI: lbFtToNm, fromSI: nmToLbFt },
    metric: { unit: "N·m", toSI: id, fromSI: id },
  },
  airflow: {
    imperial: { unit: "cfm", toSI: cfmToM3s, fromSI: m3sToCfm },
    metric: { unit: "m³/min", toSI: m3PerMinToM3s, fromSI: m3sToM3PerMin },
  },
  speed: {
    imperial: { unit: "rpm", toSI: id, fromSI: id },
    metric: { unit: "rpm", toSI: id, fromSI: id },
  },
  "fuel-flow": {
    imperial: { unit: "lb/h", toSI: lbPerHourToKgS, fromSI: kgSToLbPerHour },
    metric: { unit: "kg/h", toSI: kgPerHourToKgS, fromSI: kgSToKgPerHour },
  },
  "injector-flow": {
    imperial: { unit: "lb/h", toSI: lbPerHourToKgS, fromSI: kgSToLbPerHour },
    metric: { unit: "cc/min", toSI: (v) => ccPerMinToKgS(v), fromSI: (v) => kgSToCcPerMin(v) },
  },
  bsfc: {
    imperial: { unit: "lb/(hp·h)", toSI: bsfcImperialToSI, fromSI: bsfcSIToImperial },
    metric: { unit: "g/(kW·h)", toSI: bsfcMetricToSI, fromSI: bsfcSIToMetric },
  },
};

/** Every quantity kind the display helpers know. */
export const QUANTITY_KINDS: readonly QuantityKind[] = Object.keys(UNITS) as QuantityKind[];

/** The display unit label of a kind in a system, e.g. unitLabel('pressure', 'imperial') = 'psi'. */
export function unitLabel(kind: QuantityKind, system: UnitSystem): string {
  return UNITS[kind][system].unit;
}

/** A SI value in the user's units: { value, unit } (speed stays rpm in both systems). */
export function formatQuantity(kind: QuantityKind, siValue: number, system: UnitSystem): { value: number; unit: string } {
  const def = UNITS[kind][system];
  return { value: def.fromSI(siValue), unit: def.unit };
}

/** A value typed in the user's units to SI. */
export function toSI(kind: QuantityKind, value: number, system: UnitSystem): number {
  return UNITS[kind][system].toSI(value);
}

/** A SI value to the user's units (number only; see formatQuantity for the label). */
export function fromSI(kind: QuantityKind, siValue: number, system: UnitSystem): number {
  return UNITS[kind][system].fromSI(siValue);
}

/**
 * A limit converted to the user's units and rounded to a multiple of 10^exponent towards the
 * inside of its range ("up" for a minimum, "down" for a maximum), so that the figure a message
 * states is itself accepted: 0.03 m is 1.1811 in, so a minimum reads 1.19, not 1.18.
 */
export function roundInward(value: number, exponent: number, dir: "up" | "down"): number {
  const step = (n: number) => (dir === "up" ? Math.ceil(n - 1e-9) : Math.floor(n + 1e-9));
  // Scale by an exact power of ten, so 6.2 comes back as 6.2 rather than 6.2000000000000002.
  if (exponent < 0) {
    const m = 10 ** -exponent;
    return step(value * m) / m;
  }
  const m = 10 ** exponent;
  return step(value / m) * m;
}
