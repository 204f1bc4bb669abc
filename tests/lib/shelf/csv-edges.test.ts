// lib/shelf/csv.ts at its edges: exact messages, each limit at and just past its value, every
// blower field's column name, and the cells export writes. RFC 4180 for the file format.
import { describe, expect, it } from "vitest";
import { parseShelfCsv } from "@/lib/shelf/csv";
import { BLOWER_CSV_COLUMNS, PULLEY_CSV_COLUMNS } from "@/lib/shelf/rules";
import { fieldError } from "../../support/field-error";

const HEADER = PULLEY_CSV_COLUMNS.join(",");
const BLOWER_HEADER = BLOWER_CSV_COLUMNS.join(",");
const pulley = (pn: string, cells: Partial<Record<"position" | "diameter" | "ribs" | "min" | "price" | "stock" | "notes", string>> = {}) =>
  [pn, cells.position ?? "blower", cells.diameter ?? "70", cells.ribs ?? "8", cells.min ?? "", cells.price ?? "10", cells.stock ?? "1", cells.notes ?? ""].join(",");


describe("parseShelfCsv edges", () => {
  it("the size limit counts UTF-8 bytes: 1 000 000 pass the size check, 1 000 001 do not", () => {
    // "é" is two bytes in UTF-8 (RFC 3629): 1000 of them in the notes are 2000 bytes; blank lines
    // (skipped rows) pad the file to exactly the limit
    const body = `${HEADER}\n${pulley("PW-A-1", { notes: "é".repeat(1000) })}`;
    const pad = (n: number) => body + "\n".repeat(n - new TextEncoder().encode(body).length);
    const at = pad(1_000_000);
    expect(new TextEncoder().encode(at).length).toBe(1_000_000);
    expect(parseShelfCsv("pulleys", at).rows).toHaveLength(1);
    const over = at + "x";
    expect(fieldError(() => parseShelfCsv("pulleys", over))).toMatchObject({
      field: "file",
      message: "The file is 1.0 MB; the limit is 1 MB and 5,000 rows. Split it into smaller files.",
    });
  });

  it("a byte-order mark is dropped only at the start; a file of only one is empty", () => {
    expect(fieldError(() => parseShelfCsv("blowers", "\uFEFF")).message).toBe(`The file is empty. Expected a header line with the columns: ${BLOWER_CSV_COLUMNS.join(", ")}.`);
  });

  it("names only what is missing, or only what is unknown", () => {
    const noPrice = PULLEY_CSV_COLUMNS.filter((c) => c !== "price").join(",");
    expect(fieldError(() => parseShelfCsv("pulleys", `${noPrice}\nx`)).message).toBe(`The columns do not match a pulley file (missing price). Expected columns: ${PULLEY_CSV_COLUMNS.join(", ")}.`);
    expect(fieldError(() => parseShelfCsv("pulleys", `${HEADER},colour\nx`)).message).toBe(`The columns do not match a pulley file (unknown colour). Expected columns: ${PULLEY_CSV_COLUMNS.join(", ")}.`);
  });

  it("rows of empty cells are skipped but still counted as lines", () => {
    const r = parseShelfCsv("pulleys", [HEADER, ",,,,,,,", pulley("PW-A-1", { diameter: "9000" })].join("\n"));
    expect(r).toEqual({ rows: [], errors: [{ line: 3, column: "diameter_mm", message: "Diameter must be between 30 and 500 mm." }] });
  });

  it("a file with only bad rows gives its errors rather than 'no rows'", () => {
    const r = parseShelfCsv("pulleys", [HEADER, "PW-A-1"].join("\n"));
    expect(r).toEqual({ rows: [], errors: [{ line: 2, column: "", message: "This line has 1 cells; the header has 8." }] });
  });

  it("a pulley record whole: mm to m, an empty cell is a missing number, the belt minimum in mm", () => {
    const r = parseShelfCsv("pulleys", [HEADER, pulley("pw-a-1", { position: "CRANK", diameter: " 150 ", min: "80", price: "$12.5", notes: "'note" })].join("\n"));
    expect(r.errors).toEqual([]);
    // 150 mm = 0.15 m, 80 mm = 0.08 m (1 mm = 0.001 m, NIST SP 811)
    expect(r.rows).toEqual([{ line: 2, record: { partNumber: "PW-A-1", position: "crank", diameter: 0.15, ribCount: 8, minBeltDiameter: 0.08, price: "12.50", stock: 1, notes: "'note" } }]);
    const bad = parseShelfCsv("pulleys", [HEADER, pulley("PW-A-2", { diameter: "", min: "10", ribs: " ", stock: "x" })].join("\n"));
    expect(bad.errors).toEqual([
      { line: 2, column: "diameter_mm", message: "Diameter must be between 30 and 500 mm." },
      { line: 2, column: "rib_count", message: "Rib count must be a whole number from 3 to 16." },
      { line: 2, column: "min_belt_diameter_mm", message: "Minimum belt diameter must be between 20 and 300 mm." },
      { line: 2, column: "stock", message: "Stock must be a whole number (0 or more)." },
    ]);
  });

  it("an apostrophe comes off only before a formula character", () => {
    const notes = ["'=1", "'+1", "'-1", "'@x", "'x", "a'=1", "''=1"];
    const r = parseShelfCsv("pulleys", [HEADER, ...notes.map((n, i) => pulley(`PW-N-${i}`, { notes: n }))].join("\n"));
    expect(r.rows.map((x) => x.record.notes)).toEqual(["=1", "+1", "-1", "@x", "'x", "a'=1", "''=1"]);
  });

  it("every blower field's problem names the file's column", () => {
    const line = ["PW-BL-1", "", "vane", "x", "x", "x", "x", "x", "x", "x", "-1", "-1", ""].join(",");
    const r = parseShelfCsv("blowers", `${BLOWER_HEADER}\n${line}`);
    expect(r.errors.map((e) => e.column)).toEqual([
      "kind",
      "displacement_l_per_rev",
      "built_in_volume_ratio",
      "max_rpm",
      "volumetric_efficiency_ref",
      "reference_rpm",
      "internal_efficiency",
      "mechanical_efficiency",
      "name",
      "price",
      "stock",
    ]);
  });

  // A bug found here: the metres-to-mm rewrite also took "0.01 m³/rev" and wrote "10 mm.³/rev".
  it("a blower's displacement message keeps its own units (the mm rewrite is for metres only)", () => {
    const line = ["PW-BL-1", "Roots", "roots", "50", "1", "14000", "0.9", "10000", "0.55", "0.92", "1500", "2", ""].join(",");
    const r = parseShelfCsv("blowers", `${BLOWER_HEADER}\n${line}`);
    expect(r.errors).toEqual([{ line: 2, column: "displacement_l_per_rev", message: "Blower displacement must be between 0.0001 and 0.01 m³/rev (0.1–10 L/rev)" }]);
  });

  it("a whole blower record: L/rev to m³/rev, name and kind cleaned", () => {
    const line = ["pw-bl-2", "'=Twin", " Twin-Screw ", "2.3", "2.5", "16000", "0.85", "12000", "0.7", "0.93", "2999.99", "0", "a note"].join(",");
    const r = parseShelfCsv("blowers", `${BLOWER_HEADER}\n${line}`);
    expect(r.errors).toEqual([]);
    // 2.3 L = 0.0023 m³ (1 L = 0.001 m³, NIST SP 811)
    expect(r.rows[0].record).toEqual({
      partNumber: "PW-BL-2",
      name: "=Twin",
      kind: "twin-screw",
      displacementPerRev: expect.closeTo(0.0023, 12),
      builtInVolumeRatio: 2.5,
      maxRpm: 16000,
      volumetricEfficiencyRef: 0.85,
      referenceRpm: 12000,
      internalEfficiency: 0.7,
      mechanicalEfficiency: 0.93,
      price: "2999.99",
      stock: 0,
      notes: "a note",
    });
  });
});
