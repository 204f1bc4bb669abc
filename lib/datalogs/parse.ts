// Reading and cleaning a measured log (CSV text → SI points → wide-open-throttle bins).
// Pure: no I/O and no server-only imports, so the upload form previews exactly what the
// server will store, and the analysis pages bin exactly what the calibration uses.
import { z } from "zod";

/** Upload limits: a log past either is refused with a message naming the limit. */
export const DATALOG_LIMITS = { maxBytes: 5 * 1024 * 1024, maxRows: 200_000, maxErrorsListed: 50 } as const;

export const DELIMITERS = [",", ";", "\t", "|"] as const;
export type Delimiter = (typeof DELIMITERS)[number];
export const delimiterNames: Record<Delimiter, string> = { ",": "comma", ";": "semicolon", "\t": "tab", "|": "pipe" };

const PSI_PA = 6894.757293168361; // lbf/in² in Pa (NIST SP 811, App. B)
const PRESSURE_TO_PA = { psi: PSI_PA, kPa: 1000, bar: 100_000 } as const;
export type PressureUnit = keyof typeof PRESSURE_TO_PA;
export const TEMPERATURE_UNITS = ["F", "C", "K"] as const;
export type TemperatureUnit = (typeof TEMPERATURE_UNITS)[number];
/** How a temperature unit is written ("°F", "°C", "K"). */
export const temperatureUnitText = (u: TemperatureUnit) => (u === "K" ? "K" : `°${u}`);
/** A reading in `unit` as kelvin. */
const toKelvin = (v: number, unit: TemperatureUnit) => (unit === "F" ? ((v - 32) * 5) / 9 + 273.15 : unit === "C" ? v + 273.15 : v);

/** The fields that name a column, in the order the form shows them, with their names in messages. */
export const MAPPED_COLUMNS = ["rpm", "pressure", "intakeTemperature", "throttle", "time"] as const;
export type MappedColumn = (typeof MAPPED_COLUMNS)[number];
export const columnLabels: Record<MappedColumn, string> = { rpm: "engine speed", pressure: "manifold pressure", intakeTemperature: "intake air temperature", throttle: "throttle", time: "time" };

const column = (label: string) => z.number({ error: `Pick the column for ${label}` }).int().min(0, `Pick the column for ${label}`).max(255);
const optionalColumn = (label: string) => column(label).nullish().transform((v) => v ?? null);

/** How the columns of a file map onto the quantities (column indexes from 0). */
export const datalogMappingSchema = z
  .object({
    delimiter: z.enum(DELIMITERS, { error: "Delimiter must be comma, semicolon, tab or pipe" }),
    decimalComma: z.boolean().default(false),
    hasHeader: z.boolean().default(true),
    rpm: column(columnLabels.rpm),
    pressure: column(columnLabels.pressure),
    pressureKind: z.enum(["gauge", "absolute"], { error: "Say whether the pressure is boost (gauge) or absolute" }),
    pressureUnit: z.enum(["psi", "kPa", "bar"], { error: "Pressure unit must be psi, kPa or bar" }),
    intakeTemperature: optionalColumn(columnLabels.intakeTemperature),
    temperatureUnit: z.enum(TEMPERATURE_UNITS, { error: "Temperature unit must be °F, °C or K" }).default("F"),
    time: optionalColumn(columnLabels.time),
    throttle: optionalColumn(columnLabels.throttle),
  })
  .superRefine((m, ctx) => {
    if (m.decimalComma && m.delimiter === ",") {
      ctx.addIssue({ code: "custom", path: ["decimalComma"], message: "Decimal commas need a delimiter other than the comma" });
    }
    // The error stands on the later field and names both: "column 1 is already used for engine speed".
    const used = new Map<number, string>();
    for (const key of MAPPED_COLUMNS) {
      const col = m[key];
      if (col === null) continue;
      const taken = used.get(col);
      if (taken) ctx.addIssue({ code: "custom", path: [key], message: `Column ${col + 1} is already used for ${taken}; pick another column for ${columnLabels[key]}` });
      else used.set(col, columnLabels[key]);
    }
  });
export type DatalogMapping = z.output<typeof datalogMappingSchema>;
export type DatalogMappingInput = z.input<typeof datalogMappingSchema>;

/** Barometer (Pa absolute) and air temperature (K) at the time of the log. */
export const logAmbientSchema = z.object({
  pressure: z.number({ error: "Barometer must be a number" }).min(30_000, "Barometer must be between 30 and 110 kPa").max(110_000, "Barometer must be between 30 and 110 kPa"),
  temperature: z.number({ error: "Air temperature must be a number" }).min(220, "Air temperature must be between −53 °C and 57 °C").max(330, "Air temperature must be between −53 °C and 57 °C"),
});
export type LogAmbient = z.output<typeof logAmbientSchema>;

/** One stored sample, SI: rpm, Pa absolute, K, s, %. `line` is the 1-based line of the file. */
export interface LogPoint {
  line: number;
  time: number | null;
  rpm: number;
  manifoldPressure: number;
  intakeTemperature: number | null;
  throttle: number | null;
}

export interface LineError {
  line: number;
  message: string;
}

// ---------- encoding ----------

/**
 * Decodes file bytes as UTF-8, refusing what is not text: UTF-16 (by its byte-order mark or its
 * NUL bytes), binary files and invalid UTF-8. Returns the text or a message for the person.
 */
export function decodeLogBytes(bytes: Uint8Array): { ok: true; text: string } | { ok: false; message: string } {
  if (bytes.length > DATALOG_LIMITS.maxBytes) return { ok: false, message: tooBigMessage(bytes.length) };
  if ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff)) {
    return { ok: false, message: "The file is UTF-16 text. Save it as UTF-8 (or plain ASCII) CSV and upload it again." };
  }
  const head = bytes.subarray(0, 4096);
  if (head.includes(0)) {
    return { ok: false, message: "The file holds NUL bytes: it is binary or UTF-16, not a UTF-8 CSV text file. Export the log as CSV and try again." };
  }
  try {
    // The decoder drops one leading byte-order mark itself (WHATWG Encoding, "UTF-8 decode").
    return { ok: true, text: new TextDecoder("utf-8", { fatal: true }).decode(bytes) };
  } catch {
    return { ok: false, message: "The file is not valid UTF-8 text. Save it as UTF-8 CSV and upload it again." };
  }
}

/** Checks text that arrived without its bytes (the API): NUL or replacement characters mean a bad decode. */
export function checkLogText(text: string): string | null {
  if (!text.trim()) return "The file is empty.";
  const bytes = new TextEncoder().encode(text).length;
  if (bytes > DATALOG_LIMITS.maxBytes) return tooBigMessage(bytes);
  if (text.includes("\u0000")) return "The file holds NUL bytes: it is binary or UTF-16, not a UTF-8 CSV text file.";
  if (text.includes("\ufffd")) return "The file holds characters that could not be read as UTF-8. Save it as UTF-8 CSV and upload it again.";
  return null;
}

function tooBigMessage(bytes: number) {
  return `The file is ${(bytes / 1024 / 1024).toFixed(1)} MB; the limit is ${DATALOG_LIMITS.maxBytes / 1024 / 1024} MB. Trim the log to the pulls you want to compare.`;
}

// ---------- splitting ----------

/** Lines of the text with their 1-based numbers, blank lines left out. */
export function logLines(text: string): { line: number; text: string }[] {
  const out: { line: number; text: string }[] = [];
  const raw = text.split(/\r\n|\n|\r/);
  for (let i = 0; i < raw.length; i++) if (raw[i].trim() !== "") out.push({ line: i + 1, text: raw[i] });
  return out;
}

/** Splits one line on the delimiter, honouring double-quoted fields ("a,b" and "" escapes). */
export function splitLine(line: string, delimiter: Delimiter): string[] {
  if (!line.includes('"')) return line.split(delimiter).map((f) => f.trim());
  const out: string[] = [];
  let cur = "";
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i];
    if (quoted) {
      if (ch === '"' && line[i + 1] === '"') {
        cur += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else cur += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === delimiter) {
      out.push(cur.trim());
      cur = "";
    } else cur += ch;
  }
  out.push(cur.trim());
  return out;
}

/** Reads a number as written in the file; null when it is not one. */
export function readNumber(field: string, decimalComma: boolean): number | null {
  let s = field.trim();
  if (s === "") return null;
  if (decimalComma) {
    // "1.234,5" groups thousands with dots; otherwise the comma is the decimal mark.
    if (/^[+-]?\d{1,3}(\.\d{3})+(,\d*)?$/.test(s)) s = s.replace(/\./g, "");
    s = s.replace(",", ".");
  }
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(s)) return null;
  const n = Number(s);
  return Number.isFinite(n) ? n : null;
}

// ---------- guessing the layout ----------

export interface LogLayoutGuess {
  delimiter: Delimiter;
  decimalComma: boolean;
  hasHeader: boolean;
  columnCount: number;
  /** Column names from the header row, or "Column N". */
  columns: string[];
}

/**
 * Guesses the delimiter (the one that splits the first lines into the same number of fields,
 * more than one), whether commas are decimal marks, and whether the first line is a header
 * (it has a field that is not a number while the next line's fields are).
 */
export function guessLayout(text: string): LogLayoutGuess {
  const lines = logLines(text).slice(0, 30).map((l) => l.text);
  let best: { d: Delimiter; score: number; count: number } = { d: ",", score: -1, count: 1 };
  for (const d of DELIMITERS) {
    const counts = lines.map((l) => splitLine(l, d).length);
    const data = counts.slice(1);
    const mode = modeOf(data.length ? data : counts);
    if (mode < 2) continue;
    const agree = counts.filter((c) => c === mode).length / counts.length;
    // Decimal commas split a file on commas as evenly as its real delimiter does: the delimiter
    // whose data fields read as numbers wins the tie.
    const fields = lines.slice(1).flatMap((l) => splitLine(l, d));
    const numeric = fields.length ? fields.filter((f) => readNumber(f, false) !== null || readNumber(f, true) !== null).length / fields.length : 0;
    const score = agree * 100 + numeric * 50 + mode;
    if (score > best.score) best = { d, score, count: mode };
  }
  const rows = lines.map((l) => splitLine(l, best.d));
  const body = rows.slice(1, 30).flat();
  const decimalComma = best.d !== "," && body.some((f) => /^[+-]?\d+,\d+$/.test(f.trim())) && !body.some((f) => /^[+-]?\d+\.\d+$/.test(f.trim()));
  const first = rows[0] ?? [];
  const hasHeader = first.some((f) => f !== "" && readNumber(f, decimalComma) === null);
  const columns = Array.from({ length: best.count }, (_, i) => (hasHeader && first[i] ? first[i] : `Column ${i + 1}`));
  return { delimiter: best.d, decimalComma, hasHeader, columnCount: best.count, columns };
}

function modeOf(xs: number[]): number {
  const n = new Map<number, number>();
  for (const x of xs) n.set(x, (n.get(x) ?? 0) + 1);
  let best = 0;
  let bestN = 0;
  for (const [x, c] of n) if (c > bestN || (c === bestN && x > best)) [best, bestN] = [x, c];
  return best;
}

// ---------- parsing ----------

/** A data line an upload left out, and why ("engine speed 'n/a' is not a number"). */
export interface SkippedLine {
  line: number;
  reason: string;
}

export interface ParseResult {
  points: LogPoint[];
  errors: LineError[];
  /** Lines with errors beyond those listed. */
  moreErrors: number;
  /** Every line left out for an error, with the reason (not capped: an upload that skips lines lists them all). */
  skipped: SkippedLine[];
  /** Data lines read (header and blank lines excluded). */
  dataLines: number;
  /** A problem with the file as a whole (empty, too many rows), or null. */
  fatal: string | null;
}

/**
 * Reads every data line into SI points with the mapping. Bad lines are reported with their line
 * numbers ("line 14: engine speed 'abc' is not a number"); the caller stores nothing unless the
 * list is empty. `ambientPressure` (Pa) turns gauge readings into absolute ones.
 */
export function parseLog(text: string, mappingInput: DatalogMappingInput, ambientPressure: number): ParseResult {
  const m = datalogMappingSchema.parse(mappingInput);
  const result: ParseResult = { points: [], errors: [], moreErrors: 0, skipped: [], dataLines: 0, fatal: null };
  const textProblem = checkLogText(text);
  if (textProblem) return { ...result, fatal: textProblem };
  const lines = logLines(text);
  const data = m.hasHeader ? lines.slice(1) : lines;
  if (data.length === 0) return { ...result, fatal: "The file has no data rows under its header." };
  if (data.length > DATALOG_LIMITS.maxRows) {
    return { ...result, dataLines: data.length, fatal: `The file has ${data.length.toLocaleString("en-US")} data rows; the limit is ${DATALOG_LIMITS.maxRows.toLocaleString("en-US")}. Trim the log to the pulls you want to compare.` };
  }
  result.dataLines = data.length;
  const toPa = PRESSURE_TO_PA[m.pressureUnit];
  const fail = (line: number, message: string) => {
    result.skipped.push({ line, reason: message });
    if (result.errors.length < DATALOG_LIMITS.maxErrorsListed) result.errors.push({ line, message: `line ${line}: ${message}` });
    else result.moreErrors++;
  };
  for (const { line, text: raw } of data) {
    const f = splitLine(raw, m.delimiter);
    const num = (col: number | null, label: string, required: boolean): number | null | undefined => {
      if (col === null) return null;
      const field = f[col];
      if (field === undefined || field === "") {
        if (required) {
          fail(line, `${label} is missing (column ${col + 1})`);
          return undefined;
        }
        return null;
      }
      const v = readNumber(field, m.decimalComma);
      if (v === null) {
        fail(line, `${label} '${field.length > 30 ? field.slice(0, 30) + "…" : field}' is not a number`);
        return undefined;
      }
      return v;
    };
    const rpm = num(m.rpm, "engine speed", true);
    if (rpm === undefined) continue;
    const p = num(m.pressure, "manifold pressure", true);
    if (p === undefined) continue;
    const t = num(m.intakeTemperature, "intake air temperature", false);
    if (t === undefined) continue;
    const time = num(m.time, "time", false);
    if (time === undefined) continue;
    const thr = num(m.throttle, "throttle", false);
    if (thr === undefined) continue;
    if (rpm === null || p === null) continue; // unreachable: required columns
    if (rpm < 0 || rpm > 20_000) {
      fail(line, `engine speed ${rpm} rpm is outside 0–20 000 rpm`);
      continue;
    }
    const abs = (m.pressureKind === "gauge" ? p * toPa + ambientPressure : p * toPa);
    if (!(abs > 0) || abs > 1_000_000) {
      fail(line, `manifold pressure ${p} ${m.pressureUnit}${m.pressureKind === "gauge" ? " gauge" : " absolute"} gives ${(abs / 1000).toFixed(1)} kPa absolute, outside 0–1000 kPa`);
      continue;
    }
    let tempK: number | null = null;
    if (t !== null) {
      tempK = toKelvin(t, m.temperatureUnit);
      if (tempK < 220 || tempK > 500) {
        fail(line, `intake air temperature ${t} ${temperatureUnitText(m.temperatureUnit)} is outside −53 to 227 °C`);
        continue;
      }
    }
    if (thr !== null && (thr < 0 || thr > 110)) {
      fail(line, `throttle ${thr} % is outside 0–100 %`);
      continue;
    }
    result.points.push({ line, time, rpm, manifoldPressure: abs, intakeTemperature: tempK, throttle: thr });
  }
  return result;
}

// ---------- cleaning and binning ----------

export const cleaningSchema = z.object({
  /** Keep samples at or above this throttle (%); used when the log has a throttle column. */
  minThrottle: z.coerce.number({ error: "Minimum throttle must be a number" }).min(0, "Minimum throttle must be 0–100 %").max(100, "Minimum throttle must be 0–100 %").default(90),
  /** Keep samples at or above this boost (Pa gauge); the rule when there is no throttle column. */
  minBoost: z.coerce.number({ error: "Minimum boost must be a number" }).min(-100_000, "Minimum boost must be above −100 kPa").max(400_000, "Minimum boost must be below 400 kPa").default(0),
  /** Width of an engine-speed bin (rpm). */
  binWidth: z.coerce.number({ error: "Bin width must be a number" }).int("Bin width must be a whole number of rpm").min(50, "Bin width must be 50–2000 rpm").max(2000, "Bin width must be 50–2000 rpm").default(250),
  /** A bin needs this many kept samples to count. */
  minSamples: z.coerce.number({ error: "Samples per bin must be a number" }).int().min(1, "Samples per bin must be 1–100").max(100, "Samples per bin must be 1–100").default(3),
  /** Outlier limit in scaled median absolute deviations from the bin's median. */
  madLimit: z.coerce.number({ error: "Outlier limit must be a number" }).min(1, "Outlier limit must be 1–10 MAD").max(10, "Outlier limit must be 1–10 MAD").default(3),
});
export type CleaningOptions = z.output<typeof cleaningSchema>;
export type CleaningInput = z.input<typeof cleaningSchema>;
export const DEFAULT_CLEANING: CleaningOptions = cleaningSchema.parse({});

/** Smallest spread used for the outlier test (Pa): a noiseless log must not flag rounding. */
export const OUTLIER_FLOOR_PA = 500;

export type SampleStatus = "kept" | "part-throttle" | "outlier";

export interface LogBin {
  /** Bin range [from, to) (rpm). */
  from: number;
  to: number;
  /** Mean engine speed of the kept samples (rpm). */
  rpm: number;
  kept: number;
  outliers: number;
  /** Mean boost of the kept samples (Pa gauge). */
  boostGauge: number;
  /** Mean intake temperature of the kept samples that have one (K), or null. */
  intakeTemperature: number | null;
  /** Enough kept samples to use (minSamples). */
  usable: boolean;
}

export interface CleanedLog {
  status: SampleStatus[];
  bins: LogBin[];
  counts: { total: number; kept: number; partThrottle: number; outliers: number };
  /** Which rule chose the wide-open-throttle samples. */
  rule: "throttle" | "boost";
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const n = s.length;
  return n % 2 ? s[(n - 1) / 2] : (s[n / 2 - 1] + s[n / 2]) / 2;
};

/**
 * Keeps the wide-open-throttle samples (throttle ≥ minThrottle, or boost ≥ minBoost when the log
 * has no throttle), bins them by engine speed, and marks as outliers the samples further than
 * madLimit scaled MADs (1.4826·MAD, the normal-consistent scale) from their bin's median boost.
 * Nothing is dropped silently: every sample gets a status.
 */
export function cleanLog(points: readonly LogPoint[], ambientPressure: number, optionsInput: CleaningInput = {}): CleanedLog {
  const o = cleaningSchema.parse(optionsInput);
  const rule = points.length > 0 && points.every((p) => p.throttle !== null) ? "throttle" : "boost";
  const status: SampleStatus[] = points.map((p) => {
    const wot = rule === "throttle" ? (p.throttle as number) >= o.minThrottle : p.manifoldPressure - ambientPressure >= o.minBoost;
    return wot ? "kept" : "part-throttle";
  });
  const byBin = new Map<number, number[]>();
  points.forEach((p, i) => {
    if (status[i] !== "kept" || p.rpm <= 0) return;
    const b = Math.floor(p.rpm / o.binWidth);
    const list = byBin.get(b);
    if (list) list.push(i);
    else byBin.set(b, [i]);
  });
  const bins: LogBin[] = [];
  for (const b of [...byBin.keys()].sort((x, y) => x - y)) {
    const idx = byBin.get(b)!;
    const press = idx.map((i) => points[i].manifoldPressure);
    const med = median(press);
    const spread = Math.max(1.4826 * median(press.map((x) => Math.abs(x - med))), OUTLIER_FLOOR_PA);
    const keep: number[] = [];
    for (const i of idx) {
      if (Math.abs(points[i].manifoldPressure - med) > o.madLimit * spread) status[i] = "outlier";
      else keep.push(i);
    }
    const mean = (f: (i: number) => number, list = keep) => list.reduce((s, i) => s + f(i), 0) / list.length;
    const withTemp = keep.filter((i) => points[i].intakeTemperature !== null);
    bins.push({
      from: b * o.binWidth,
      to: (b + 1) * o.binWidth,
      rpm: mean((i) => points[i].rpm),
      kept: keep.length,
      outliers: idx.length - keep.length,
      boostGauge: mean((i) => points[i].manifoldPressure) - ambientPressure,
      intakeTemperature: withTemp.length ? mean((i) => points[i].intakeTemperature as number, withTemp) : null,
      usable: keep.length >= o.minSamples,
    });
  }
  const counts = { total: points.length, kept: 0, partThrottle: 0, outliers: 0 };
  for (const s of status) {
    if (s === "kept") counts.kept++;
    else if (s === "outlier") counts.outliers++;
    else counts.partThrottle++;
  }
  return { status, bins, counts, rule };
}

/** Measured points for calc's calibrateVe: one per usable bin, whole rpm, measured temperature when logged. */
export function binsToMeasured(bins: readonly LogBin[]): { rpm: number; boostGauge: number; manifoldTemperature: number | null }[] {
  return bins
    .filter((b) => b.usable && b.kept > 0)
    .map((b) => ({ rpm: Math.round(b.rpm), boostGauge: b.boostGauge, manifoldTemperature: b.intakeTemperature }))
    .filter((b, i, all) => i === 0 || b.rpm !== all[i - 1].rpm);
}
