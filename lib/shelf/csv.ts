// The shelf's CSV files without the database: reading a file into checked records (SI) with an
// error per line, and the cell formats that export writes so a file survives a round trip.
import Papa from "papaparse";
import { FieldError } from "@/lib/errors";
import {
  BLOWER_CSV_COLUMNS,
  MAX_CSV_BYTES,
  MAX_CSV_ROWS,
  PULLEY_CSV_COLUMNS,
  blowerRecordSchema,
  pulleyRecordSchema,
  type BlowerRecord,
  type CsvParseResult,
  type CsvPreviewRow,
  type CsvRowError,
  type PulleyRecord,
  type ShelfKind,
} from "@/lib/shelf/rules";

const OPTIONAL_COLUMNS = new Set(["notes", "min_belt_diameter_mm"]);

export const csvColumns = (kind: ShelfKind): readonly string[] => (kind === "pulleys" ? PULLEY_CSV_COLUMNS : BLOWER_CSV_COLUMNS);

// Schema paths back to the file's column names, so an error names what the person sees.
const PULLEY_FIELD_TO_COLUMN: Record<string, string> = {
  partNumber: "part_number",
  position: "position",
  diameter: "diameter_mm",
  ribCount: "rib_count",
  minBeltDiameter: "min_belt_diameter_mm",
  price: "price",
  stock: "stock",
  notes: "notes",
};
const BLOWER_FIELD_TO_COLUMN: Record<string, string> = {
  partNumber: "part_number",
  name: "name",
  kind: "kind",
  displacementPerRev: "displacement_l_per_rev",
  builtInVolumeRatio: "built_in_volume_ratio",
  maxRpm: "max_rpm",
  volumetricEfficiencyRef: "volumetric_efficiency_ref",
  referenceRpm: "reference_rpm",
  internalEfficiency: "internal_efficiency",
  mechanicalEfficiency: "mechanical_efficiency",
  price: "price",
  stock: "stock",
  notes: "notes",
};

/** A text cell: a leading apostrophe that export added to defuse spreadsheet formulas is dropped. */
const textCell = (s: string | undefined) => (s ?? "").replace(/^'(?=[=+\-@])/, "");
/** On export, text that a spreadsheet would run as a formula gets a leading apostrophe. */
export const safeText = (s: string) => (/^[=+\-@]/.test(s) ? `'${s}` : s);

/** A cell as a number; empty or not a number → NaN so the schema names the field. */
const num = (s: string | undefined) => (s === undefined || s.trim() === "" ? NaN : Number(s.trim()));

/** Checks the size, the header and every row; returns the records (SI) and per-line errors. Never writes. */
export function parseShelfCsv(kind: "pulleys", text: string): CsvParseResult<PulleyRecord>;
export function parseShelfCsv(kind: "blowers", text: string): CsvParseResult<BlowerRecord>;
export function parseShelfCsv(kind: ShelfKind, text: string): CsvParseResult<PulleyRecord | BlowerRecord>;
export function parseShelfCsv(kind: ShelfKind, text: string): CsvParseResult<PulleyRecord | BlowerRecord> {
  const bytes = new TextEncoder().encode(text).length;
  if (bytes > MAX_CSV_BYTES) {
    throw new FieldError("file", `The file is ${(bytes / 1_000_000).toFixed(1)} MB; the limit is 1 MB and ${MAX_CSV_ROWS.toLocaleString("en-US")} rows. Split it into smaller files.`);
  }
  const body = text.replace(/^\uFEFF/, "");
  if (!body.trim()) throw new FieldError("file", `The file is empty. Expected a header line with the columns: ${csvColumns(kind).join(", ")}.`);
  const parsed = Papa.parse<string[]>(body, { header: false, skipEmptyLines: false });
  const table = parsed.data;
  const expected = csvColumns(kind);
  const header = (table[0] ?? []).map((h) => h.trim().toLowerCase());
  const missing = expected.filter((c) => !OPTIONAL_COLUMNS.has(c) && !header.includes(c));
  const unknown = header.filter((h) => h !== "" && !expected.includes(h));
  if (missing.length || unknown.length) {
    const parts = [missing.length ? `missing ${missing.join(", ")}` : "", unknown.length ? `unknown ${unknown.join(", ")}` : ""].filter(Boolean);
    throw new FieldError("file", `The columns do not match a ${kind === "pulleys" ? "pulley" : "blower"} file (${parts.join("; ")}). Expected columns: ${expected.join(", ")}.`);
  }

  const rows: CsvPreviewRow<PulleyRecord | BlowerRecord>[] = [];
  const errors: CsvRowError[] = [];
  const seen = new Map<string, number>();
  const toColumn = kind === "pulleys" ? PULLEY_FIELD_TO_COLUMN : BLOWER_FIELD_TO_COLUMN;
  let line = 1;
  let dataRows = 0;
  for (let i = 0; i < table.length; i++) {
    const cells = table[i];
    const here = line;
    // A quoted cell may span lines: the next row starts after them.
    line += 1 + cells.reduce((n, c) => n + (c.match(/\n/g)?.length ?? 0), 0);
    if (i === 0) continue;
    if (cells.every((c) => c.trim() === "")) continue;
    if (++dataRows > MAX_CSV_ROWS) {
      throw new FieldError("file", `The file has more than ${MAX_CSV_ROWS.toLocaleString("en-US")} rows; the limit is ${MAX_CSV_ROWS.toLocaleString("en-US")} rows and 1 MB. Split it into smaller files.`);
    }
    if (cells.length !== header.length) {
      errors.push({ line: here, column: "", message: `This line has ${cells.length} cells; the header has ${header.length}.` });
      continue;
    }
    const cell = (name: string) => {
      const k = header.indexOf(name);
      return k < 0 ? undefined : cells[k];
    };
    const raw =
      kind === "pulleys"
        ? {
            partNumber: cell("part_number") ?? "",
            position: (cell("position") ?? "").trim().toLowerCase(),
            diameter: num(cell("diameter_mm")) / 1000,
            ribCount: num(cell("rib_count")),
            minBeltDiameter: (cell("min_belt_diameter_mm") ?? "").trim() === "" ? null : num(cell("min_belt_diameter_mm")) / 1000,
            price: cell("price") ?? "",
            stock: num(cell("stock")),
            notes: textCell(cell("notes")),
          }
        : {
            partNumber: cell("part_number") ?? "",
            name: textCell(cell("name")),
            kind: (cell("kind") ?? "").trim().toLowerCase(),
            displacementPerRev: num(cell("displacement_l_per_rev")) / 1000,
            builtInVolumeRatio: num(cell("built_in_volume_ratio")),
            maxRpm: num(cell("max_rpm")),
            volumetricEfficiencyRef: num(cell("volumetric_efficiency_ref")),
            referenceRpm: num(cell("reference_rpm")),
            internalEfficiency: num(cell("internal_efficiency")),
            mechanicalEfficiency: num(cell("mechanical_efficiency")),
            price: cell("price") ?? "",
            stock: num(cell("stock")),
            notes: textCell(cell("notes")),
          };
    const result = (kind === "pulleys" ? pulleyRecordSchema : blowerRecordSchema).safeParse(raw);
    if (!result.success) {
      for (const issue of result.error.issues) {
        const field = String(issue.path[0] ?? "");
        // SI bounds in a message would confuse: the file is in mm. Lengths only, the message ending in
        // metres ("m."): calc's "m³/rev" message names its L/rev range itself, and \b matched before "³".
        const message = issue.message.replace(/between ([\d.]+) and ([\d.]+) m\.?$/, (_m, a, b) => `between ${Number(a) * 1000} and ${Number(b) * 1000} mm.`);
        errors.push({ line: here, column: toColumn[field] ?? field, message });
      }
      continue;
    }
    const pn = result.data.partNumber;
    const first = seen.get(pn);
    if (first !== undefined) {
      errors.push({ line: here, column: "part_number", message: `Part number ${pn} is already on line ${first} of this file.` });
      continue;
    }
    seen.set(pn, here);
    rows.push({ line: here, record: result.data });
  }
  if (!rows.length && !errors.length) throw new FieldError("file", "The file has a header but no rows.");
  return { rows, errors };
}

// Lengths in mm and volumes in L with enough digits to survive a round trip through the file.
export const mm = (m: number) => String(Number((m * 1000).toFixed(4)));
export const litres = (m3: number) => String(Number((m3 * 1000).toFixed(6)));

