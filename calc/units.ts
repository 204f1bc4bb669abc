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
/** Cubic centimetres to cubic metres. */
export const ccToM3 = (cc: number): number => cc * 1e-6;
/** Cubic metres to cubic centimetres. */
export const m3ToCc = (m3: number): number => m3 / 1e-6;
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
/** m³/h to m³/s. */
export const m3PerHourToM3s = (m3h: number): number => m3h / HOUR;
/** m³/s to m³/h. */
export const m3sToM3PerHour = (m3s: number): number => m3s * HOUR;
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

/** A preset of display units: one unit per kind for each side of the Atlantic. */
export type UnitPreset = "imperial" | "metric";

/** Kinds of quantity a form or chart shows, each with its own choice of units. */
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

/** One display unit of a kind: a stable ASCII id (stored per user, put in links), its label and conversions. */
export interface UnitDef {
  readonly id: string;
  readonly unit: string;
  readonly toSI: (v: number) => number;
  readonly fromSI: (v: number) => number;
}

const id = (v: number): number => v;
const def = (unitId: string, unit: string, toSI: (v: number) => number, fromSI: (v: number) => number): UnitDef => ({ id: unitId, unit, toSI, fromSI });

/** The units a person may choose per kind, the imperial preset's first, the metric preset's second. */
const UNITS: Readonly<Record<QuantityKind, readonly UnitDef[]>> = {
  "length-small": [def("in", "in", inToM, mToIn), def("mm", "mm", mmToM, mToMm)],
  altitude: [def("ft", "ft", (v) => v * FOOT, (v) => v / FOOT), def("m", "m", id, id)],
  displacement: [def("in3", "in³", in3ToM3, m3ToIn3), def("L", "L", litresToM3, m3ToLitres), def("cc", "cc", ccToM3, m3ToCc)],
  "blower-displacement": [def("in3", "in³/rev", in3ToM3, m3ToIn3), def("L", "L/rev", litresToM3, m3ToLitres), def("cc", "cc/rev", ccToM3, m3ToCc)],
  pressure: [def("psi", "psi", psiToPa, paToPsi), def("kPa", "kPa", kPaToPa, paToKPa), def("bar", "bar", barToPa, paToBar)],
  temperature: [def("F", "°F", fToK, kToF), def("C", "°C", cToK, kToC)],
  power: [def("hp", "hp", hpToW, wToHp), def("kW", "kW", kWToW, wToKW)],
  torque: [def("lbft", "lb·ft", lbFtToNm, nmToLbFt), def("Nm", "N·m", id, id)],
  airflow: [def("cfm", "cfm", cfmToM3s, m3sToCfm), def("m3min", "m³/min", m3PerMinToM3s, m3sToM3PerMin), def("m3h", "m³/h", m3PerHourToM3s, m3sToM3PerHour)],
  speed: [def("rpm", "rpm", id, id)],
  "fuel-flow": [def("lbh", "lb/h", lbPerHourToKgS, kgSToLbPerHour), def("kgh", "kg/h", kgPerHourToKgS, kgSToKgPerHour)],
  "injector-flow": [def("lbh", "lb/h", lbPerHourToKgS, kgSToLbPerHour), def("ccmin", "cc/min", (v) => ccPerMinToKgS(v), (v) => kgSToCcPerMin(v))],
  bsfc: [def("lbhph", "lb/(hp·h)", bsfcImperialToSI, bsfcSIToImperial), def("gkwh", "g/(kW·h)", bsfcMetricToSI, bsfcSIToMetric)],
};

/** Every quantity kind the display helpers know. */
export const QUANTITY_KINDS: readonly QuantityKind[] = Object.keys(UNITS) as QuantityKind[];

/** The person's units: the id of the unit chosen for each kind. */
export type Units = Readonly<Record<QuantityKind, string>>;

/** What display helpers accept: a preset's name, or a unit per kind. */
export type UnitSystem = UnitPreset | Units;

const presetUnits = (index: number): Units =>
  Object.fromEntries(QUANTITY_KINDS.map((k) => [k, UNITS[k][Math.min(index, UNITS[k].length - 1)].id])) as unknown as Units;

/** The two presets, each a unit per kind. */
export const UNIT_PRESETS: Readonly<Record<UnitPreset, Units>> = { imperial: presetUnits(0), metric: presetUnits(1) };

/** The units a person may choose for a kind. */
export function unitChoices(kind: QuantityKind): readonly UnitDef[] {
  return UNITS[kind];
}

/**
 * A preset plus per-kind choices as a full Units record. Unknown kinds or unit ids are
 * ignored, so a stored choice from an older release falls back to the preset.
 */
export function resolveUnits(preset: UnitPreset, choices?: Readonly<Partial<Record<string, unknown>>> | null): Units {
  const out: Record<string, string> = { ...UNIT_PRESETS[preset] };
  for (const k of QUANTITY_KINDS) {
    const c = choices?.[k];
    if (typeof c === "string" && UNITS[k].some((u) => u.id === c)) out[k] = c;
  }
  return out as unknown as Units;
}

/** The unit used for a kind: the one resolver every helper below goes through. */
export function unitOfKind(kind: QuantityKind, system: UnitSystem): UnitDef {
  const wanted = typeof system === "string" ? UNIT_PRESETS[system][kind] : system[kind];
  return UNITS[kind].find((u) => u.id === wanted) ?? UNITS[kind][0];
}

/** The preset a choice equals, or null when it mixes units of both. */
export function presetOf(system: UnitSystem): UnitPreset | null {
  if (typeof system === "string") return system;
  const same = (p: UnitPreset) => QUANTITY_KINDS.every((k) => unitOfKind(k, system).id === UNIT_PRESETS[p][k]);
  return same("imperial") ? "imperial" : same("metric") ? "metric" : null;
}

/** The preset nearest a choice (the one it shares most units with; imperial on a tie), e.g. for paper size. */
export function nearestPreset(system: UnitSystem): UnitPreset {
  if (typeof system === "string") return system;
  const shared = (p: UnitPreset) => QUANTITY_KINDS.filter((k) => unitOfKind(k, system).id === UNIT_PRESETS[p][k]).length;
  return shared("metric") > shared("imperial") ? "metric" : "imperial";
}

/** A choice as a short link parameter: the nearest preset, then any kind that differs ("imperial~displacement.L"). */
export function unitsToParam(system: UnitSystem): string {
  const base = nearestPreset(system);
  const diffs = QUANTITY_KINDS.filter((k) => unitOfKind(k, system).id !== UNIT_PRESETS[base][k]).map((k) => `~${k}.${unitOfKind(k, system).id}`);
  return base + diffs.join("");
}

/** A link parameter back to units (anything unreadable falls back to imperial). */
export function unitsFromParam(param: unknown): UnitSystem {
  if (typeof param !== "string") return "imperial";
  const [head, ...rest] = param.split("~");
  const preset: UnitPreset = head === "metric" ? "metric" : "imperial";
  if (rest.length === 0) return preset;
  return resolveUnits(preset, Object.fromEntries(rest.map((r) => r.split(".", 2))));
}

/** The display unit label of a kind, e.g. unitLabel('pressure', 'imperial') = 'psi'. */
export function unitLabel(kind: QuantityKind, system: UnitSystem): string {
  return unitOfKind(kind, system).unit;
}

/** A SI value in the user's units: { value, unit } (speed stays rpm in both systems). */
export function formatQuantity(kind: QuantityKind, siValue: number, system: UnitSystem): { value: number; unit: string } {
  const u = unitOfKind(kind, system);
  return { value: u.fromSI(siValue), unit: u.unit };
}

/** A value typed in the user's units to SI. */
export function toSI(kind: QuantityKind, value: number, system: UnitSystem): number {
  return unitOfKind(kind, system).toSI(value);
}

/** A SI value to the user's units (number only; see formatQuantity for the label). */
export function fromSI(kind: QuantityKind, siValue: number, system: UnitSystem): number {
  return unitOfKind(kind, system).fromSI(siValue);
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
