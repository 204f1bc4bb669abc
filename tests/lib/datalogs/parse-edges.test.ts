// lib/datalogs/parse.ts at its edges: the exact messages, each limit at and just past its value,
// the branches the main parse tests do not take. Figures are hand arithmetic unless a source is named.
import { describe, expect, it } from "vitest";
import {
  binsToMeasured,
  checkLogText,
  cleanLog,
  DATALOG_LIMITS,
  datalogMappingSchema,
  decodeLogBytes,
  DEFAULT_CLEANING,
  guessLayout,
  logAmbientSchema,
  logLines,
  parseLog,
  readNumber,
  splitLine,
  temperatureUnitText,
  type DatalogMappingInput,
  type LogBin,
  type LogPoint,
} from "@/lib/datalogs/parse";

// source: ISO 2533 standard atmosphere, sea level 101 325 Pa.
const SEA_LEVEL = 101_325;
const kpaAbs: DatalogMappingInput = { delimiter: ",", hasHeader: true, rpm: 0, pressure: 1, pressureKind: "absolute", pressureUnit: "kPa" };
const messages = (text: string, m: Partial<DatalogMappingInput> = {}) => parseLog(text, { ...kpaAbs, ...m }, SEA_LEVEL).errors.map((e) => e.message);

describe("decodeLogBytes and checkLogText", () => {
  const enc = (s: string) => new TextEncoder().encode(s);
  it("takes a file of exactly the size limit, refuses one byte more with the size in MB", () => {
    expect(decodeLogBytes(new Uint8Array(DATALOG_LIMITS.maxBytes).fill(0x31)).ok).toBe(true);
    // 5 MiB + 1 byte = 5.0 MB to one decimal
    expect(decodeLogBytes(new Uint8Array(DATALOG_LIMITS.maxBytes + 1).fill(0x31))).toEqual({
      ok: false,
      message: "The file is 5.0 MB; the limit is 5 MB. Trim the log to the pulls you want to compare.",
    });
    expect(checkLogText("1".repeat(DATALOG_LIMITS.maxBytes))).toBeNull();
    // the limit counts UTF-8 bytes, not characters: "é" is two bytes (RFC 3629)
    expect(checkLogText("é".repeat(DATALOG_LIMITS.maxBytes / 2 + 1))).toBe("The file is 5.0 MB; the limit is 5 MB. Trim the log to the pulls you want to compare.");
  });

  it("names UTF-16 by either byte-order mark, and only by a whole mark", () => {
    const utf16 = "The file is UTF-16 text. Save it as UTF-8 (or plain ASCII) CSV and upload it again.";
    expect(decodeLogBytes(new Uint8Array([0xff, 0xfe, 0x31, 0x00]))).toEqual({ ok: false, message: utf16 });
    expect(decodeLogBytes(new Uint8Array([0xfe, 0xff, 0x00, 0x31]))).toEqual({ ok: false, message: utf16 });
    const invalid = "The file is not valid UTF-8 text. Save it as UTF-8 CSV and upload it again.";
    expect(decodeLogBytes(new Uint8Array([0xff, 0x31]))).toEqual({ ok: false, message: invalid });
    expect(decodeLogBytes(new Uint8Array([0xfe, 0x31]))).toEqual({ ok: false, message: invalid });
    expect(decodeLogBytes(new Uint8Array([0x31, 0xfe, 0xff]))).toEqual({ ok: false, message: invalid });
  });

  it("looks for NUL bytes in the first 4096 bytes only", () => {
    const nul = "The file holds NUL bytes: it is binary or UTF-16, not a UTF-8 CSV text file. Export the log as CSV and try again.";
    const at = (i: number) => {
      const b = new Uint8Array(5000).fill(0x31);
      b[i] = 0;
      return decodeLogBytes(b);
    };
    expect(at(0)).toEqual({ ok: false, message: nul });
    expect(at(4095)).toEqual({ ok: false, message: nul });
    expect(at(4096).ok).toBe(true);
  });

  it("drops a leading byte-order mark only", () => {
    expect(decodeLogBytes(enc("rpm\n1"))).toEqual({ ok: true, text: "rpm\n1" });
    expect(decodeLogBytes(enc("a\ufeffb"))).toEqual({ ok: true, text: "a\ufeffb" });
    // source: WHATWG Encoding §4.1 ("UTF-8 decode" strips one BOM): a second one is text.
    expect(decodeLogBytes(enc("\ufeff\ufeffrpm"))).toEqual({ ok: true, text: "\ufeffrpm" });
  });

  it("names UTF-16 by either byte-order mark, and a lone 0xFF byte as invalid UTF-8, not UTF-16", () => {
    const utf16 = /^The file is UTF-16 text\./;
    expect(decodeLogBytes(new Uint8Array([0xfe, 0xff, 0x00, 0x72]))).toMatchObject({ ok: false, message: expect.stringMatching(utf16) }); // big-endian
    expect(decodeLogBytes(new Uint8Array([0xff, 0xfe, 0x72, 0x00]))).toMatchObject({ ok: false, message: expect.stringMatching(utf16) }); // little-endian
    // 0xFF never occurs in UTF-8 (RFC 3629 §1), so "r" then 0xFF is broken UTF-8; nor is it a BOM.
    expect(decodeLogBytes(new Uint8Array([0x72, 0xff, 0x70]))).toMatchObject({ ok: false, message: expect.stringMatching(/not valid UTF-8/) });
    expect(decodeLogBytes(new Uint8Array([0x72, 0xfe, 0x70]))).toMatchObject({ ok: false, message: expect.stringMatching(/not valid UTF-8/) });
  });

  it("text checks: empty or blank, NUL, replacement characters, each with its message", () => {
    expect(checkLogText("")).toBe("The file is empty.");
    expect(checkLogText(" \n\t ")).toBe("The file is empty.");
    expect(checkLogText("a\u0000")).toBe("The file holds NUL bytes: it is binary or UTF-16, not a UTF-8 CSV text file.");
    expect(checkLogText("a\ufffd")).toBe("The file holds characters that could not be read as UTF-8. Save it as UTF-8 CSV and upload it again.");
    expect(checkLogText("rpm,boost\n3000,5")).toBeNull();
  });
});

describe("lines, fields and numbers", () => {
  it("numbers lines from 1 across CRLF, CR and LF, leaving out blank ones", () => {
    expect(logLines("a\r\nb\rc\n\n  \nd")).toEqual([
      { line: 1, text: "a" },
      { line: 2, text: "b" },
      { line: 3, text: "c" },
      { line: 6, text: "d" },
    ]);
    expect(logLines("")).toEqual([]);
  });

  it("splits and trims fields with or without quotes", () => {
    expect(splitLine(" a , b ,c", ",")).toEqual(["a", "b", "c"]);
    expect(splitLine(' "x;y" ; 2 ;""', ";")).toEqual(["x;y", "2", ""]);
    expect(splitLine('a|"b""c"|d', "|")).toEqual(["a", 'b"c', "d"]);
    expect(splitLine('"open,field', ",")).toEqual(["open,field"]);
    expect(splitLine('1\t"2"', "\t")).toEqual(["1", "2"]);
  });

  it("reads numbers as written, refusing anything else", () => {
    expect([readNumber(" +5 ", false), readNumber(".5", false), readNumber("5.", false), readNumber("1E-3", false), readNumber("-2e+2", false)]).toEqual([5, 0.5, 5, 0.001, -200]);
    expect([readNumber("1e400", false), readNumber("-", false), readNumber("e5", false), readNumber("5e", false), readNumber("1.2.3", false), readNumber("0x10", false), readNumber("5 psi", false), readNumber("   ", false)]).toEqual([null, null, null, null, null, null, null, null]);
    // decimal commas: dots group thousands only in groups of three; one comma is the decimal mark
    expect([readNumber("1.234.567,5", true), readNumber("1.500", true), readNumber("1.5", true), readNumber("-1.234", true), readNumber("12,", true)]).toEqual([1234567.5, 1500, 1.5, -1234, 12]);
    expect([readNumber("1.23,4", true), readNumber("12,5,3", true), readNumber("1.500", false)]).toEqual([null, null, 1.5]);
  });

  it("temperature units are written °F, °C and K", () => {
    expect([temperatureUnitText("F"), temperatureUnitText("C"), temperatureUnitText("K")]).toEqual(["°F", "°C", "K"]);
  });
});

describe("guessLayout edges", () => {
  it("an empty text: one comma-separated column, no header", () => {
    expect(guessLayout("")).toEqual({ delimiter: ",", decimalComma: false, hasHeader: false, columnCount: 1, columns: ["Column 1"] });
  });

  it("a header alone is read as the header", () => {
    expect(guessLayout("rpm;boost;iat")).toEqual({ delimiter: ";", decimalComma: false, hasHeader: true, columnCount: 3, columns: ["rpm", "boost", "iat"] });
  });

  it("equally common field counts: the larger wins; a header blank is named by its number", () => {
    expect(guessLayout("rpm,,x\n1,2\n1,2,3\n")).toEqual({ delimiter: ",", decimalComma: false, hasHeader: true, columnCount: 3, columns: ["rpm", "Column 2", "x"] });
  });

  it("decimal commas only when no field has a decimal point", () => {
    expect(guessLayout("a;b\n1;2,5\n3;4,5\n").decimalComma).toBe(true);
    expect(guessLayout("a;b\n1;2,5\n3;4.5\n").decimalComma).toBe(false);
    expect(guessLayout("a;b\n-1;-2,5\n").decimalComma).toBe(true);
  });

  it("a first line of numbers and blanks is data", () => {
    expect(guessLayout("1,,3\n4,5,6\n").hasHeader).toBe(false);
  });
});

describe("the mapping schema", () => {
  it("fills the defaults", () => {
    expect(datalogMappingSchema.parse({ delimiter: ";", rpm: 0, pressure: 1, pressureKind: "gauge", pressureUnit: "bar" })).toEqual({
      delimiter: ";",
      decimalComma: false,
      hasHeader: true,
      rpm: 0,
      pressure: 1,
      pressureKind: "gauge",
      pressureUnit: "bar",
      intakeTemperature: null,
      temperatureUnit: "F",
      time: null,
      throttle: null,
    });
  });

  it("refuses decimal commas with the comma delimiter and a column used twice, on the later field", () => {
    const r = datalogMappingSchema.safeParse({ ...kpaAbs, decimalComma: true, throttle: 1, time: 0 });
    expect(r.success).toBe(false);
    expect(r.error!.issues.map((i) => [i.path, i.message])).toEqual([
      [["decimalComma"], "Decimal commas need a delimiter other than the comma"],
      [["throttle"], "Column 2 is already used for manifold pressure; pick another column for throttle"],
      [["time"], "Column 1 is already used for engine speed; pick another column for time"],
    ]);
    expect(datalogMappingSchema.safeParse({ ...kpaAbs, delimiter: ";", decimalComma: true }).success).toBe(true);
    expect(datalogMappingSchema.safeParse({ ...kpaAbs, rpm: 5, pressure: 0 }).success).toBe(true);
  });

  it("the barometer and air temperature of the log within their bounds", () => {
    expect(logAmbientSchema.safeParse({ pressure: 30_000, temperature: 220 }).success).toBe(true);
    expect(logAmbientSchema.safeParse({ pressure: 110_000, temperature: 330 }).success).toBe(true);
    expect(logAmbientSchema.safeParse({ pressure: 29_999, temperature: 300 }).error?.issues[0].message).toBe("Barometer must be between 30 and 110 kPa");
    expect(logAmbientSchema.safeParse({ pressure: 110_001, temperature: 300 }).error?.issues[0].message).toBe("Barometer must be between 30 and 110 kPa");
    expect(logAmbientSchema.safeParse({ pressure: 100_000, temperature: 219 }).error?.issues[0].message).toBe("Air temperature must be between −53 °C and 57 °C");
    expect(logAmbientSchema.safeParse({ pressure: 100_000, temperature: 331 }).error?.issues[0].message).toBe("Air temperature must be between −53 °C and 57 °C");
  });

  it("default cleaning: 90 % throttle, 0 boost, 250 rpm bins, 3 samples, 3 MAD (author's choices)", () => {
    expect(DEFAULT_CLEANING).toEqual({ minThrottle: 90, minBoost: 0, binWidth: 250, minSamples: 3, madLimit: 3 });
  });
});

describe("parseLog edges", () => {
  it("a whole point, SI, with every column", () => {
    const r = parseLog("t,rpm,map,iat,tps\n1.5,3000,150,300,95\n", { ...kpaAbs, time: 0, rpm: 1, pressure: 2, intakeTemperature: 3, temperatureUnit: "K", throttle: 4 }, SEA_LEVEL);
    expect(r).toEqual({
      points: [{ line: 2, time: 1.5, rpm: 3000, manifoldPressure: 150_000, intakeTemperature: 300, throttle: 95 }],
      errors: [],
      moreErrors: 0,
      skipped: [],
      dataLines: 1,
      fatal: null,
    });
  });

  it("a file without a header reads its first line as data", () => {
    const r = parseLog("3000,150\n3100,151\n", { ...kpaAbs, hasHeader: false }, SEA_LEVEL);
    expect(r.points.map((p) => [p.line, p.rpm])).toEqual([[1, 3000], [2, 3100]]);
    expect(r.dataLines).toBe(2);
  });

  it("the fatal problems, exactly", () => {
    expect(parseLog("", kpaAbs, SEA_LEVEL)).toEqual({ points: [], errors: [], moreErrors: 0, skipped: [], dataLines: 0, fatal: "The file is empty." });
    expect(parseLog("rpm,map\n", kpaAbs, SEA_LEVEL)).toEqual({ points: [], errors: [], moreErrors: 0, skipped: [], dataLines: 0, fatal: "The file has no data rows under its header." });
  });

  it("a missing optional field is null; a missing required one is an error", () => {
    const r = parseLog("rpm,map,iat,t,tps\n3000,150\n3000,150,,,\n3000\n", { ...kpaAbs, intakeTemperature: 2, time: 3, throttle: 4 }, SEA_LEVEL);
    expect(r.points).toEqual([
      { line: 2, time: null, rpm: 3000, manifoldPressure: 150_000, intakeTemperature: null, throttle: null },
      { line: 3, time: null, rpm: 3000, manifoldPressure: 150_000, intakeTemperature: null, throttle: null },
    ]);
    expect(r.errors).toEqual([{ line: 4, message: "line 4: manifold pressure is missing (column 2)" }]);
    expect(r.skipped).toEqual([{ line: 4, reason: "manifold pressure is missing (column 2)" }]);
    expect(messages("rpm,map\n,150\n")).toEqual(["line 2: engine speed is missing (column 1)"]);
  });

  it("a bad optional field refuses the line, naming it", () => {
    const m = { intakeTemperature: 2, time: 3, throttle: 4 };
    expect(messages("rpm,map,iat,t,tps\n3000,150,hot,1,90\n3000,150,300,x,90\n3000,150,300,1,wide\n", m)).toEqual([
      "line 2: intake air temperature 'hot' is not a number",
      "line 3: time 'x' is not a number",
      "line 4: throttle 'wide' is not a number",
    ]);
  });

  it("cuts a bad field past 30 characters", () => {
    const thirty = "a".repeat(30);
    expect(messages(`rpm,map\n${thirty},1\n${thirty}b,1\n`)).toEqual([`line 2: engine speed '${thirty}' is not a number`, `line 3: engine speed '${thirty}…' is not a number`]);
  });

  it("engine speed 0–20 000 rpm, both ends kept", () => {
    const r = parseLog("rpm,map\n0,150\n20000,150\n-1,150\n20000.5,150\n", kpaAbs, SEA_LEVEL);
    expect(r.points.map((p) => p.rpm)).toEqual([0, 20000]);
    expect(r.errors.map((e) => e.message)).toEqual(["line 4: engine speed -1 rpm is outside 0–20 000 rpm", "line 5: engine speed 20000.5 rpm is outside 0–20 000 rpm"]);
  });

  it("manifold pressure above 0 and up to 1000 kPa absolute, gauge readings on the barometer", () => {
    const r = parseLog("rpm,map\n1,0\n1,0.001\n1,1000\n1,1000.1\n", kpaAbs, SEA_LEVEL);
    expect(r.points.map((p) => p.manifoldPressure)).toEqual([1, 1_000_000]);
    expect(r.errors.map((e) => e.message)).toEqual([
      "line 2: manifold pressure 0 kPa absolute gives 0.0 kPa absolute, outside 0–1000 kPa",
      "line 5: manifold pressure 1000.1 kPa absolute gives 1000.1 kPa absolute, outside 0–1000 kPa",
    ]);
    // −101.325 kPa gauge on a 101 325 Pa barometer is 0 absolute; 898.675 kPa gauge is 1000 kPa
    const g = parseLog("rpm,map\n1,-101.325\n1,898.675\n", { ...kpaAbs, pressureKind: "gauge" }, SEA_LEVEL);
    expect(g.errors.map((e) => e.message)).toEqual(["line 2: manifold pressure -101.325 kPa gauge gives 0.0 kPa absolute, outside 0–1000 kPa"]);
    expect(g.points.map((p) => p.manifoldPressure)).toEqual([1_000_000]);
    // 10 bar absolute is 1000 kPa (1 bar = 100 kPa, NIST SP 811 App. B)
    expect(parseLog("rpm,map\n1,10\n", { ...kpaAbs, pressureUnit: "bar" }, SEA_LEVEL).points[0].manifoldPressure).toBe(1_000_000);
  });

  it("intake temperature 220–500 K, both ends kept, the unit named in the message", () => {
    const r = parseLog("rpm,map,iat\n1,150,220\n1,150,500\n1,150,219.9\n1,150,500.1\n", { ...kpaAbs, intakeTemperature: 2, temperatureUnit: "K" }, SEA_LEVEL);
    expect(r.points.map((p) => p.intakeTemperature)).toEqual([220, 500]);
    expect(r.errors.map((e) => e.message)).toEqual(["line 4: intake air temperature 219.9 K is outside −53 to 227 °C", "line 5: intake air temperature 500.1 K is outside −53 to 227 °C"]);
    // 1000 °F = 810.9 K; −100 °C = 173.15 K (definitions of the scales)
    expect(messages("rpm,map,iat\n1,150,1000\n", { intakeTemperature: 2, temperatureUnit: "F" })).toEqual(["line 2: intake air temperature 1000 °F is outside −53 to 227 °C"]);
    expect(messages("rpm,map,iat\n1,150,-100\n", { intakeTemperature: 2, temperatureUnit: "C" })).toEqual(["line 2: intake air temperature -100 °C is outside −53 to 227 °C"]);
    // 32 °F = 273.15 K, 0 °C = 273.15 K
    expect(parseLog("rpm,map,iat\n1,150,32\n", { ...kpaAbs, intakeTemperature: 2, temperatureUnit: "F" }, SEA_LEVEL).points[0].intakeTemperature).toBeCloseTo(273.15, 9);
    expect(parseLog("rpm,map,iat\n1,150,0\n", { ...kpaAbs, intakeTemperature: 2, temperatureUnit: "C" }, SEA_LEVEL).points[0].intakeTemperature).toBeCloseTo(273.15, 9);
  });

  it("throttle 0–110 %, both ends kept (sensors read past 100)", () => {
    const r = parseLog("rpm,map,tps\n1,150,0\n1,150,110\n1,150,-0.5\n1,150,110.5\n", { ...kpaAbs, throttle: 2 }, SEA_LEVEL);
    expect(r.points.map((p) => p.throttle)).toEqual([0, 110]);
    expect(r.errors.map((e) => e.message)).toEqual(["line 4: throttle -0.5 % is outside 0–100 %", "line 5: throttle 110.5 % is outside 0–100 %"]);
  });

  it("lists the first 50 errors and counts the rest; every skipped line is kept", () => {
    const text = "rpm,map\n" + Array.from({ length: 52 }, () => "x,1").join("\n") + "\n3000,150\n";
    const r = parseLog(text, kpaAbs, SEA_LEVEL);
    expect(r.errors).toHaveLength(50);
    expect(r.errors[49]).toEqual({ line: 51, message: "line 51: engine speed 'x' is not a number" });
    expect(r.moreErrors).toBe(2);
    expect(r.skipped).toHaveLength(52);
    expect(r.skipped[51]).toEqual({ line: 53, reason: "engine speed 'x' is not a number" });
    expect(r.points.map((p) => p.line)).toEqual([54]);
    expect(r.dataLines).toBe(53);
    const fifty = parseLog("rpm,map\n" + Array.from({ length: 50 }, () => "x,1").join("\n"), kpaAbs, SEA_LEVEL);
    expect([fifty.errors.length, fifty.moreErrors]).toEqual([50, 0]);
  });
});

describe("cleanLog edges", () => {
  const pt = (line: number, rpm: number, gaugePa: number, throttle: number | null, intakeTemperature: number | null = null): LogPoint => ({
    line,
    time: null,
    rpm,
    manifoldPressure: SEA_LEVEL + gaugePa,
    intakeTemperature,
    throttle,
  });

  it("no points: the boost rule, nothing binned", () => {
    expect(cleanLog([], SEA_LEVEL)).toEqual({ status: [], bins: [], counts: { total: 0, kept: 0, partThrottle: 0, outliers: 0 }, rule: "boost" });
  });

  it("the throttle rule only when every sample has a throttle; a sample at the minimum is kept", () => {
    const c = cleanLog([pt(1, 3000, 0, 90), pt(2, 3000, 0, 89.9)], SEA_LEVEL, { minThrottle: 90, minSamples: 1 });
    expect([c.rule, c.status]).toEqual(["throttle", ["kept", "part-throttle"]]);
    const b = cleanLog([pt(1, 3000, 20_000, 100), pt(2, 3000, 20_000, null), pt(3, 3000, 19_999, null)], SEA_LEVEL, { minBoost: 20_000, minSamples: 1 });
    expect([b.rule, b.status]).toEqual(["boost", ["kept", "kept", "part-throttle"]]);
  });

  it("a bin is [from, to): the whole bin, means of the kept samples, the temperature of those that have one", () => {
    const c = cleanLog(
      [pt(1, 2000, 10_000, 100, 300), pt(2, 2100, 12_000, 100, null), pt(3, 2249.9, 14_000, 100, 310), pt(4, 2250, 30_000, 100), pt(5, 0, 30_000, 100)],
      SEA_LEVEL,
      { binWidth: 250, minSamples: 3 },
    );
    // first bin: rpm (2000 + 2100 + 2249.9) / 3 = 2116.633…, boost (10 + 12 + 14) / 3 = 12 kPa, temperature (300 + 310) / 2 = 305 K
    expect(c.bins).toEqual([
      { from: 2000, to: 2250, rpm: expect.closeTo(2116.6333333, 6), kept: 3, outliers: 0, boostGauge: expect.closeTo(12_000, 6), intakeTemperature: 305, usable: true },
      { from: 2250, to: 2500, rpm: 2250, kept: 1, outliers: 0, boostGauge: 30_000, intakeTemperature: null, usable: false },
    ]);
    // a speed of 0 stays kept but is never binned
    expect(c.status[4]).toBe("kept");
    expect(c.counts).toEqual({ total: 5, kept: 5, partThrottle: 0, outliers: 0 });
  });

  it("usable from exactly minSamples kept samples", () => {
    const three = [pt(1, 3000, 10_000, 100), pt(2, 3010, 10_000, 100), pt(3, 3020, 10_000, 100)];
    expect(cleanLog(three, SEA_LEVEL, { minSamples: 3 }).bins[0].usable).toBe(true);
    expect(cleanLog(three, SEA_LEVEL, { minSamples: 4 }).bins[0].usable).toBe(false);
  });

  it("bins come sorted by speed whatever the order of the samples", () => {
    const c = cleanLog([pt(1, 5000, 1, 100), pt(2, 3000, 1, 100), pt(3, 4000, 1, 100)], SEA_LEVEL, { minSamples: 1, binWidth: 500 });
    expect(c.bins.map((b) => b.from)).toEqual([3000, 4000, 5000]);
  });

  it("with no spread the outlier limit is 3 × 500 Pa: 1500 Pa off is kept, 1501 Pa is not", () => {
    const flat = (off: number) => [0, 0, 0, 0, off].map((g, i) => pt(i + 1, 3000 + i, 20_000 + g, 100));
    expect(cleanLog(flat(1500), SEA_LEVEL).status).toEqual(["kept", "kept", "kept", "kept", "kept"]);
    const c = cleanLog(flat(1501), SEA_LEVEL);
    expect(c.status).toEqual(["kept", "kept", "kept", "kept", "outlier"]);
    expect(c.bins[0]).toMatchObject({ kept: 4, outliers: 1, boostGauge: 20_000 });
    expect(c.counts).toEqual({ total: 5, kept: 4, partThrottle: 0, outliers: 1 });
    // the same sample below the median
    expect(cleanLog(flat(-1501), SEA_LEVEL).status[4]).toBe("outlier");
  });

  it("with spread the limit is madLimit × 1.4826 × MAD (the normal-consistent scale): 3 × 1.4826 × 1000 = 4447.8 Pa", () => {
    // offsets 0, 1000, 2000, 3000 and one more: median 2000, MAD 1000
    const bin = (last: number, madLimit = 3) => cleanLog([0, 1000, 2000, 3000, last].map((g, i) => pt(i + 1, 3000 + i, 20_000 + g, 100)), SEA_LEVEL, { madLimit }).status[4];
    expect(bin(2000 + 4447)).toBe("kept");
    expect(bin(2000 + 4448)).toBe("outlier");
    // 2 × 1.4826 × 1000 = 2965.2
    expect(bin(2000 + 2965, 2)).toBe("kept");
    expect(bin(2000 + 2966, 2)).toBe("outlier");
  });

  it("an even number of samples takes the mean of the middle two as the median", () => {
    // offsets 0, 0, 4000, 4000, 4000, 20000: median (4000 + 4000) / 2 = 4000; deviations 4000, 4000,
    // 0, 0, 0, 16000 → MAD (0 + 4000) / 2 = 2000; limit 3 × 1.4826 × 2000 = 8895.6: only 20000 is out
    const c = cleanLog([0, 0, 4000, 4000, 4000, 20_000].map((g, i) => pt(i + 1, 3000 + i, 20_000 + g, 100)), SEA_LEVEL);
    expect(c.status).toEqual(["kept", "kept", "kept", "kept", "kept", "outlier"]);
    // offsets 0, 0, 0, 6000: median 0, MAD 0 → floor 500 Pa, limit 1500: 6000 is out
    const d = cleanLog([0, 0, 0, 6000].map((g, i) => pt(i + 1, 3000 + i, 20_000 + g, 100)), SEA_LEVEL);
    expect(d.status).toEqual(["kept", "kept", "kept", "outlier"]);
    // offsets 0, 0, 9000, 9000: median 4500, MAD 4500 → limit 20 015.1: nothing out
    const e = cleanLog([0, 9000, 0, 9000].map((g, i) => pt(i + 1, 3000 + i, 20_000 + g, 100)), SEA_LEVEL);
    expect(e.status).toEqual(["kept", "kept", "kept", "kept"]);
  });
});

describe("binsToMeasured", () => {
  const b = (rpm: number, extra: Partial<LogBin> = {}): LogBin => ({ from: 0, to: 0, rpm, kept: 5, outliers: 0, boostGauge: rpm * 10, intakeTemperature: 300, usable: true, ...extra });
  it("one point per usable bin with samples, whole rpm, the first of two that round alike", () => {
    expect(binsToMeasured([b(2999.5), b(3000.4), b(3500, { usable: false }), b(4000, { kept: 0 }), b(4499.4, { intakeTemperature: null }), b(5000)])).toEqual([
      { rpm: 3000, boostGauge: 29_995, manifoldTemperature: 300 },
      { rpm: 4499, boostGauge: 44_994, manifoldTemperature: null },
      { rpm: 5000, boostGauge: 50_000, manifoldTemperature: 300 },
    ]);
    expect(binsToMeasured([])).toEqual([]);
  });
});
