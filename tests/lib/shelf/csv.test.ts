// Reading a shelf CSV without a database: the header, per-line errors named by column and line,
// size limits, spreadsheet-formula defusing, and the mm / litre cells that export writes.
// Reference for the file format: RFC 4180 (quoted cells may hold commas, quotes and line breaks).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { csvColumns, litres, mm, parseShelfCsv, safeText } from "@/lib/shelf/csv";
import { stockCell, stockClass } from "@/lib/shelf/stock";
import { BLOWER_CSV_COLUMNS, MAX_CSV_ROWS, PULLEY_CSV_COLUMNS } from "@/lib/shelf/rules";
import { fieldError } from "../../support/field-error";

const HEADER = PULLEY_CSV_COLUMNS.join(",");
const row = (pn: string, diameterMm: number | string, extra: Partial<{ position: string; ribs: string; stock: string; notes: string; min: string; price: string }> = {}) =>
  [pn, extra.position ?? "blower", diameterMm, extra.ribs ?? "8", extra.min ?? "71.12", extra.price ?? "89.00", extra.stock ?? "3", extra.notes ?? ""].join(",");


describe("parseShelfCsv", () => {
  it("reads pulleys into SI records with their line numbers (mm → m: 1 mm = 0.001 m)", () => {
    const r = parseShelfCsv("pulleys", ["\uFEFF" + HEADER, row("pw-bp-0275-8", 69.85, { position: " Blower " }), "", row("PW-CP-0200-8", "200", { position: "crank", min: "", notes: "'=SUM(A1)" })].join("\r\n"));
    expect(r.errors).toEqual([]);
    expect(r.rows.map((x) => x.line)).toEqual([2, 4]);
    const [a, b] = r.rows.map((x) => x.record);
    expect(a).toMatchObject({ partNumber: "PW-BP-0275-8", position: "blower", ribCount: 8, price: "89.00", stock: 3, notes: "" });
    expect(a.diameter).toBeCloseTo(0.06985, 12);
    expect(a.minBeltDiameter).toBeCloseTo(0.07112, 12);
    expect(b.position).toBe("crank");
    expect(b.minBeltDiameter).toBeNull();
    // The apostrophe export put before a formula is taken off again.
    expect(b.notes).toBe("=SUM(A1)");
  });

  it("reads blowers: L/rev → m³/rev (1 L = 0.001 m³), kind lower-cased", () => {
    const header = BLOWER_CSV_COLUMNS.join(",");
    const line = ["PW-BL-1", "'+Roots", "ROOTS", "1.9", "1", "14000", "0.9", "10000", "0.55", "0.92", "1500", "2", ""].join(",");
    const r = parseShelfCsv("blowers", `${header}\n${line}`);
    expect(r.errors).toEqual([]);
    const rec = r.rows[0].record;
    expect(rec).toMatchObject({ partNumber: "PW-BL-1", name: "+Roots", kind: "roots", builtInVolumeRatio: 1, maxRpm: 14000, volumetricEfficiencyRef: 0.9, referenceRpm: 10000, internalEfficiency: 0.55, mechanicalEfficiency: 0.92, price: "1500.00", stock: 2 });
    expect(rec.displacementPerRev).toBeCloseTo(0.0019, 12);
  });

  it("names the line and the file's column for every bad row, with mm bounds in mm", () => {
    const r = parseShelfCsv("pulleys", [HEADER, row("PW-A-1", 900), row("PW-A-2", 70, { ribs: "two", stock: "" }), "PW-A-3,blower", row("PW-A-1", 70), row("PW-A-4", 70)].join("\n"));
    // Line 5 repeats PW-A-1, but line 2 was refused, so line 5 is the first good PW-A-1.
    expect(r.rows.map((x) => x.line)).toEqual([5, 6]);
    expect(r.errors.map((e) => [e.line, e.column])).toEqual([[2, "diameter_mm"], [3, "rib_count"], [3, "stock"], [4, ""]]);
    expect(r.errors[0].message).toBe("Diameter must be between 30 and 500 mm.");
    expect(r.errors[3].message).toBe("This line has 2 cells; the header has 8.");
  });

  it("a repeated part number is refused on its second line, naming the first", () => {
    const r = parseShelfCsv("pulleys", [HEADER, row("PW-A-1", 70), row("PW-A-2", 70), row("pw-a-1", 72)].join("\n"));
    expect(r.rows.map((x) => x.line)).toEqual([2, 3]);
    expect(r.errors).toEqual([{ line: 4, column: "part_number", message: "Part number PW-A-1 is already on line 2 of this file." }]);
  });

  it("counts the lines a quoted cell spans (RFC 4180) so later errors name the right line", () => {
    const r = parseShelfCsv("pulleys", [HEADER, row("PW-A-1", 70, { notes: '"two\nlines\nhere"' }), row("PW-A-2", 9000)].join("\n"));
    expect(r.rows[0].record.notes).toBe("two\nlines\nhere");
    expect(r.errors.map((e) => e.line)).toEqual([5]);
  });

  it("the optional columns may be left out; a missing or unknown column is named with the expected list", () => {
    const short = PULLEY_CSV_COLUMNS.filter((c) => c !== "notes" && c !== "min_belt_diameter_mm");
    const r = parseShelfCsv("pulleys", `${short.join(",")}\nPW-A-1,crank,150,8,10,1`);
    expect(r.rows[0].record).toMatchObject({ minBeltDiameter: null, notes: "" });
    const e = fieldError(() => parseShelfCsv("pulleys", "part_number,colour,position\nx,y,z"));
    expect(e.field).toBe("file");
    expect(e.message).toBe(`The columns do not match a pulley file (missing diameter_mm, rib_count, price, stock; unknown colour). Expected columns: ${PULLEY_CSV_COLUMNS.join(", ")}.`);
    expect(fieldError(() => parseShelfCsv("blowers", HEADER)).message).toMatch(/^The columns do not match a blower file \(missing name, kind, .*; unknown position, diameter_mm, rib_count, min_belt_diameter_mm\)/);
    // Header names are matched trimmed and case-blind; an empty trailing header cell is no unknown column.
    expect(parseShelfCsv("pulleys", ` ${HEADER.toUpperCase()},\nPW-A-1,crank,150,8,,10,1,,`).rows).toHaveLength(1);
  });

  it("an empty file, a header alone and a file over the limits are refused with the field 'file'", () => {
    expect(fieldError(() => parseShelfCsv("pulleys", " \n ")).message).toBe(`The file is empty. Expected a header line with the columns: ${PULLEY_CSV_COLUMNS.join(", ")}.`);
    expect(fieldError(() => parseShelfCsv("pulleys", `${HEADER}\n,,,,,,,\n`)).message).toBe("The file has a header but no rows.");
    expect(fieldError(() => parseShelfCsv("pulleys", HEADER + "\n" + "x".repeat(1_000_001))).message).toMatch(/^The file is 1\.0 MB; the limit is 1 MB and 5,000 rows/);
    const many = [HEADER, ...Array.from({ length: MAX_CSV_ROWS + 1 }, (_, i) => row(`PW-R-${i}`, 70))].join("\n");
    expect(fieldError(() => parseShelfCsv("pulleys", many)).message).toBe("The file has more than 5,000 rows; the limit is 5,000 rows and 1 MB. Split it into smaller files.");
    const exactly = [HEADER, ...Array.from({ length: MAX_CSV_ROWS }, (_, i) => row(`PW-R-${i}`, 70))].join("\n");
    expect(parseShelfCsv("pulleys", exactly).rows).toHaveLength(MAX_CSV_ROWS);
  });
});

describe("export cells", () => {
  it("text a spreadsheet would run as a formula (= + - @) gets an apostrophe; other text is untouched (OWASP CSV injection advice)", () => {
    expect(["=1", "+1", "-1", "@x", "a=1", "", "'x"].map(safeText)).toEqual(["'=1", "'+1", "'-1", "'@x", "a=1", "", "'x"]);
  });

  it("mm and litre cells carry enough digits to come back to the same SI value (round trip, 1 mm = 1e-3 m, 1 L = 1e-3 m³)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 300, max: 5000 }), fc.integer({ min: 100, max: 10_000 }), (tenthsMm, ml) => {
        const m = tenthsMm / 10_000;
        expect(Number(mm(m)) / 1000).toBeCloseTo(m, 12);
        const m3 = ml / 1e6;
        expect(Number(litres(m3)) / 1000).toBeCloseTo(m3, 12);
      }),
    );
    expect(mm(0.08255)).toBe("82.55");
    expect(litres(0.0019)).toBe("1.9");
    expect(mm(0.0123456789)).toBe("12.3457");
  });

  it("an empty shelf slot reads '0 (out)' and is marked; the columns follow the kind", () => {
    expect([stockCell({ stock: 0 }), stockCell({ stock: 4 }), stockClass({ stock: 0 }), stockClass({ stock: 1 })]).toEqual(["0 (out)", 4, "text-danger", ""]);
    expect(csvColumns("pulleys")).toBe(PULLEY_CSV_COLUMNS);
    expect(csvColumns("blowers")).toBe(BLOWER_CSV_COLUMNS);
  });
});
