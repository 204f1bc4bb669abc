// A first guess of which column of a log holds what, from its headings and its values; the
// person sees the guess (with why) and changes it. Pure, like parse.ts.
//
// Every range below is the author's choice (no published source): typical readings of a
// street or strip engine with a positive-displacement blower, wide enough for part throttle.
import { logLines, readNumber, splitLine, type DatalogMappingInput, type LogLayoutGuess, temperatureUnitText, type PressureUnit, type TemperatureUnit } from "./parse";

/** What a column's numbers look like (the first rows of the file). */
export interface ColumnProfile {
  /** How many fields were numbers. */
  count: number;
  min: number;
  max: number;
  median: number;
  /** Never falls, and rises from nine samples in ten to the next. */
  rising: boolean;
  /** Median step between consecutive samples. */
  medianStep: number;
  /** How uneven the steps are: median distance of a step from the median step, over the median step (0 for a steady clock). */
  stepUnevenness: number;
}

/** Rows looked at: enough to see a pull, few enough to guess while the file is previewed. */
const SAMPLE_ROWS = 400;

const medianOf = (xs: readonly number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const n = s.length;
  return n === 0 ? NaN : n % 2 ? s[(n - 1) / 2] : (s[n / 2 - 1] + s[n / 2]) / 2;
};

/** The profile of one column's numbers in file order, or null with fewer than two numbers. */
export function profileColumn(values: readonly number[]): ColumnProfile | null {
  if (values.length < 2) return null;
  const steps = values.slice(1).map((v, i) => v - values[i]);
  const rises = steps.filter((d) => d > 0).length;
  const medianStep = medianOf(steps);
  return {
    count: values.length,
    min: Math.min(...values),
    max: Math.max(...values),
    median: medianOf(values),
    // A repeated time stamp happens now and then (two channels logged at once); a fall never does.
    rising: steps.every((d) => d >= 0) && rises >= 0.9 * steps.length,
    medianStep,
    stepUnevenness: medianStep > 0 ? medianOf(steps.map((d) => Math.abs(d - medianStep))) / medianStep : Infinity,
  };
}

/** The numbers of every column in the first data rows (unreadable fields left out). */
export function columnValues(text: string, layout: Pick<LogLayoutGuess, "delimiter" | "decimalComma" | "hasHeader" | "columnCount">): number[][] {
  const first = layout.hasHeader ? 1 : 0;
  const lines = logLines(text).slice(first, first + SAMPLE_ROWS);
  const cols: number[][] = Array.from({ length: layout.columnCount }, () => []);
  for (const { text: raw } of lines) {
    const f = splitLine(raw, layout.delimiter);
    for (let c = 0; c < cols.length; c++) {
      const v = f[c] === undefined ? null : readNumber(f[c], layout.decimalComma);
      if (v !== null) cols[c].push(v);
    }
  }
  return cols;
}

// ---------- what the values say ----------

/**
 * Time: a rising column of small numbers. "Small" is under 500 (seconds of a log up to about
 * eight minutes), or steps of a second or less (a longer log in seconds), or a start under 100
 * (milliseconds from the start of the log). A pull's engine speed also rises, but from hundreds
 * of rpm in steps of tens.
 */
export function looksLikeTime(p: ColumnProfile): boolean {
  return p.rising && p.min >= 0 && (p.max < 500 || p.medianStep <= 1 || p.min < 100);
}

/** Engine speed: never time-like; median 500–10,000 rpm, nothing below 0 or above 20,000. */
export function looksLikeEngineSpeed(p: ColumnProfile): boolean {
  return !looksLikeTime(p) && p.min >= 0 && p.max <= 20_000 && p.median >= 500 && p.median <= 10_000;
}

/** Throttle: 0–100 % and a run from part throttle (≤ 30 %) to wide open (≥ 95 %) in the same log. */
export function looksLikeThrottle(p: ColumnProfile): boolean {
  return !looksLikeTime(p) && p.min >= 0 && p.min <= 30 && p.max >= 95 && p.max <= 100.5;
}

export type PressureGuess = { unit: PressureUnit; kind: "gauge" | "absolute" };

/**
 * Manifold pressure from its range: within −1…4 is bar (gauge, as boost logs usually are);
 * a median of 90–300 with nothing under 15 is kPa absolute; within −15…45 is psi gauge; other
 * readings within −100…300 are kPa gauge. Null when no pressure reads like this.
 */
export function pressureFromValues(p: ColumnProfile): PressureGuess | null {
  if (p.min >= -1 && p.max <= 4) return { unit: "bar", kind: "gauge" };
  if (p.median >= 90 && p.median <= 300 && p.min >= 15 && p.max <= 400) return { unit: "kPa", kind: "absolute" };
  if (p.min >= -15 && p.max <= 45) return { unit: "psi", kind: "gauge" };
  if (p.min >= -100 && p.max <= 300) return { unit: "kPa", kind: "gauge" };
  return null;
}

/**
 * Intake air temperature unit from the median: 200 or more is kelvin, 60–200 is °F (60 °F is
 * 16 °C; an intake with a median of 60 °C or more is rare), under 60 is °C. Null outside −40…400.
 */
export function temperatureUnitFromValues(p: ColumnProfile): TemperatureUnit | null {
  if (p.median < -40 || p.median > 400) return null;
  return p.median >= 200 ? "K" : p.median >= 60 ? "F" : "C";
}

/** How much a column moves against its size: boost swings through a pull, air temperature drifts. */
const relativeSpread = (p: ColumnProfile) => (p.max - p.min) / Math.max(Math.abs(p.median), 1);

// ---------- what the headings say ----------

// English and German trade words; a heading match still needs values that fit (or no values).
const HEADINGS = {
  time: /^time|\btime\b|\(s\)|seconds|^t$|^zeit|\bzeit\b/,
  rpm: /rpm|engine speed|\bspeed\b|\brev|drehzahl|u\/min|1\/min/,
  pressure: /boost|map\b|manifold|pressure|druck/,
  notPressure: /baro|ambient|umgebung|atmos|temp/,
  temperature: /iat|intake.*(air|temp)|air temp|charge temp|temp|ansaugluft/,
  throttle: /throttle|tps|pedal|drossel|gaspedal/,
} as const;

/** Column notes for the person: why a column or unit was picked ("from the values: median 38"). */
export type GuessNotes = Partial<Record<"time" | "rpm" | "pressure" | "pressureUnit" | "intakeTemperature" | "temperatureUnit" | "throttle", string>>;

const round = (v: number) => Number(v.toPrecision(3)).toLocaleString("en-US");
const range = (p: ColumnProfile) => `${round(p.min)}–${round(p.max)}`;

/**
 * A first guess of the mapping. With the file's text it reads the values too: headings win when
 * their column's values fit, and values alone place the columns the headings do not name. The
 * result does not depend on the order of the columns (ties apart).
 */
export function guessMapping(layout: LogLayoutGuess, text?: string): DatalogMappingInput & { notes: GuessNotes } {
  const names = layout.columns.map((c) => c.toLowerCase());
  const profiles = (text ? columnValues(text, layout) : names.map(() => [])).map(profileColumn);
  const used = new Set<number>();
  const notes: GuessNotes = {};

  type Field = "time" | "rpm" | "throttle" | "pressure" | "intakeTemperature";
  // Per quantity: the heading, what a named column's values must allow (loose), what values
  // alone must show (strict), and which of several fitting columns to prefer.
  const rules: { field: Field; heading: RegExp; not?: RegExp; named: (p: ColumnProfile) => boolean; values: (p: ColumnProfile) => boolean; rank?: (p: ColumnProfile) => number }[] = [
    // Of several rising columns, time is the one logged by the steadiest clock.
    // A column headed "time" may count in milliseconds from anywhere; it must still rise.
    { field: "time", heading: HEADINGS.time, named: (p) => p.rising && p.min >= 0, values: looksLikeTime, rank: (p) => -p.stepUnevenness },
    { field: "rpm", heading: HEADINGS.rpm, named: (p) => !looksLikeTime(p) && p.min >= 0 && p.max <= 20_000, values: looksLikeEngineSpeed },
    { field: "throttle", heading: HEADINGS.throttle, named: (p) => p.min >= -1 && p.max <= 110, values: looksLikeThrottle },
    { field: "pressure", heading: HEADINGS.pressure, not: HEADINGS.notPressure, named: (p) => pressureFromValues(p) !== null, values: (p) => pressureFromValues(p) !== null, rank: relativeSpread },
    { field: "intakeTemperature", heading: HEADINGS.temperature, named: (p) => temperatureUnitFromValues(p) !== null, values: (p) => temperatureUnitFromValues(p) !== null, rank: (p) => -relativeSpread(p) },
  ];
  const found: Partial<Record<Field, number>> = {};
  const free = () => names.map((_, i) => i).filter((i) => !used.has(i));
  // Headings first, for every quantity, so values never take a column a heading names.
  for (const r of rules) {
    const col = free().find((i) => r.heading.test(names[i]) && !(r.not && r.not.test(names[i])) && (profiles[i] === null || r.named(profiles[i])));
    if (col === undefined) continue;
    found[r.field] = col;
    used.add(col);
  }
  for (const r of rules) {
    if (found[r.field] !== undefined) continue;
    const fitting = free().filter((i) => profiles[i] !== null && r.values(profiles[i]) && !(r.not && r.not.test(names[i])));
    if (!fitting.length) continue;
    // Highest rank wins; equal ranks keep the earlier column.
    const col = r.rank ? fitting.reduce((a, b) => (r.rank!(profiles[b]!) > r.rank!(profiles[a]!) ? b : a)) : fitting[0];
    found[r.field] = col;
    used.add(col);
    notes[r.field] = `Guessed from the values: ${range(profiles[col]!)}`;
  }
  const at = (f: Field) => found[f] ?? null;
  const time = at("time");
  const rpm = at("rpm");
  const throttle = at("throttle");
  const pressure = at("pressure");
  const temp = at("intakeTemperature");

  // Units: a unit in the heading wins; otherwise the values' range decides.
  const pHeader = pressure === null ? "" : names[pressure];
  const pProfile = pressure === null ? null : profiles[pressure];
  const fromValues = pProfile ? pressureFromValues(pProfile) : null;
  const headingUnit: PressureUnit | null = /kpa/.test(pHeader) ? "kPa" : /\bbar\b/.test(pHeader) ? "bar" : /psi/.test(pHeader) ? "psi" : null;
  const headingKind = /boost|gauge|lade|rel/.test(pHeader) ? "gauge" : /map\b|abs/.test(pHeader) ? "absolute" : null;
  const pressureUnit = headingUnit ?? fromValues?.unit ?? "psi";
  const pressureKind = headingKind ?? (fromValues && fromValues.unit === pressureUnit ? fromValues.kind : "gauge");
  if (!headingUnit && fromValues && pProfile) notes.pressureUnit = `Guessed from the values (${range(pProfile)}): ${pressureUnit} ${pressureKind}`;

  const tHeader = temp === null ? "" : names[temp];
  const tProfile = temp === null ? null : profiles[temp];
  const tHeading: TemperatureUnit | null = /°c|\bc\)|celsius|\(c/.test(tHeader) ? "C" : /°f|\bf\)|fahrenheit|\(f/.test(tHeader) ? "F" : /\(k\)|kelvin|\bk\)/.test(tHeader) ? "K" : null;
  const tValues = tProfile ? temperatureUnitFromValues(tProfile) : null;
  const temperatureUnit = tHeading ?? tValues ?? "F";
  if (!tHeading && tValues && tProfile) notes.temperatureUnit = `Guessed from the values (median ${round(tProfile.median)}): ${temperatureUnitText(temperatureUnit)}`;

  // Placeholders the person must change (the form marks the clash); never the time column.
  const rpmCol = rpm ?? firstFree(names.length, used, time === 0 ? 1 : 0);
  return {
    delimiter: layout.delimiter,
    decimalComma: layout.decimalComma,
    hasHeader: layout.hasHeader,
    rpm: rpmCol,
    pressure: pressure ?? firstFree(names.length, new Set([...used, rpmCol]), rpmCol === 1 ? 2 : 1),
    pressureKind,
    pressureUnit,
    intakeTemperature: temp,
    temperatureUnit,
    time,
    throttle,
    notes,
  };
}

/** The first column not taken (a placeholder the person must change), or `fallback`. */
function firstFree(count: number, used: ReadonlySet<number>, fallback: number): number {
  for (let i = 0; i < count; i++) if (!used.has(i)) return i;
  return fallback;
}
