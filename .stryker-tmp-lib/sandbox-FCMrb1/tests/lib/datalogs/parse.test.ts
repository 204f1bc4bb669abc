// @ts-nocheck
import { describe, expect, it } from "vitest";
import {
  checkLogText,
  cleanLog,
  DATALOG_LIMITS,
  decodeLogBytes,
  guessLayout,
  parseLog,
  readNumber,
  splitLine,
  type DatalogMappingInput,
} from "@/lib/datalogs/parse";
import { guessMapping } from "@/lib/datalogs/guess-mapping";

// source: NIST SP 811 (2008), App. B: 1 psi = 6.894 757 kPa; 1 bar = 100 kPa exactly.
const PSI = 6894.757;
// source: ISO 2533 standard atmosphere, sea level 101 325 Pa.
const SEA_LEVEL = 101_325;

const base: DatalogMappingInput = { delimiter: ",", hasHeader: true, rpm: 0, pressure: 1, pressureKind: "gauge", pressureUnit: "psi" };

describe("layout guess", () => {
  const rows = [
    ["rpm", "boost psi", "iat"],
    ["2000", "5.5", "80"],
    ["2100", "5.75", "81"],
    ["2200", "6", "82"],
  ];
  for (const [d, name] of [[",", "comma"], [";", "semicolon"], ["\t", "tab"], ["|", "pipe"]] as const) {
    it(`finds the ${name} delimiter and the header row`, () => {
      const text = rows.map((r) => r.join(d)).join("\n");
      const g = guessLayout(text);
      expect(g.delimiter).toBe(d);
      expect(g.hasHeader).toBe(true);
      expect(g.columns).toEqual(["rpm", "boost psi", "iat"]);
      expect(g.decimalComma).toBe(false);
    });
  }

  it("sees decimal commas under a semicolon delimiter and parses them", () => {
    const text = "Drehzahl;Ladedruck bar\n2000;0,45\n2100;0,5\n";
    const g = guessLayout(text);
    expect(g).toMatchObject({ delimiter: ";", decimalComma: true, hasHeader: true });
    const r = parseLog(text, { ...guessMapping(g), rpm: 0, pressure: 1, pressureUnit: "bar", pressureKind: "gauge" }, SEA_LEVEL);
    expect(r.errors).toEqual([]);
    // 0.45 bar gauge = 45 000 Pa above the barometer
    expect(r.points[0].manifoldPressure).toBeCloseTo(SEA_LEVEL + 45_000, 6);
  });

  it("takes a file without a header when the first line is numbers", () => {
    const g = guessLayout("2000,5\n2100,6\n");
    expect(g.hasHeader).toBe(false);
    expect(g.columns).toEqual(["Column 1", "Column 2"]);
  });

  it("maps columns from common header words", () => {
    const g = guessLayout("Time (s),Engine speed (rpm),Throttle (%),MAP (kPa),Intake air (°C)\n0,2000,100,150,40\n");
    const m = guessMapping(g);
    expect(m).toMatchObject({ time: 0, rpm: 1, throttle: 2, pressure: 3, pressureKind: "absolute", pressureUnit: "kPa", intakeTemperature: 4, temperatureUnit: "C" });
  });
});

describe("numbers and fields", () => {
  it("reads plain, signed, exponent and decimal-comma numbers; refuses words", () => {
    expect(readNumber("5.25", false)).toBe(5.25);
    expect(readNumber("-3", false)).toBe(-3);
    expect(readNumber("1e3", false)).toBe(1000);
    expect(readNumber("5,25", true)).toBe(5.25);
    expect(readNumber("1.234,5", true)).toBe(1234.5);
    expect(readNumber("5,25", false)).toBeNull();
    expect(readNumber("abc", false)).toBeNull();
    expect(readNumber("", false)).toBeNull();
  });
  it("honours quoted fields", () => {
    expect(splitLine('"a,b",2,"say ""hi"""', ",")).toEqual(["a,b", "2", 'say "hi"']);
  });
});

describe("units", () => {
  const one = (text: string, m: Partial<DatalogMappingInput>) => {
    const r = parseLog(text, { ...base, ...m }, SEA_LEVEL);
    expect(r.errors).toEqual([]);
    return r.points[0];
  };
  it("psi gauge adds the barometer", () => {
    expect(one("rpm,p\n3000,10\n", { pressureUnit: "psi", pressureKind: "gauge" }).manifoldPressure).toBeCloseTo(SEA_LEVEL + 10 * PSI, 0);
  });
  it("psi absolute is taken as it is", () => {
    expect(one("rpm,p\n3000,24.7\n", { pressureUnit: "psi", pressureKind: "absolute" }).manifoldPressure).toBeCloseTo(24.7 * PSI, 0);
  });
  it("kPa absolute and bar gauge", () => {
    expect(one("rpm,p\n3000,170\n", { pressureUnit: "kPa", pressureKind: "absolute" }).manifoldPressure).toBeCloseTo(170_000, 6);
    expect(one("rpm,p\n3000,0.7\n", { pressureUnit: "bar", pressureKind: "gauge" }).manifoldPressure).toBeCloseTo(SEA_LEVEL + 70_000, 6);
  });
  it("°F and °C intake temperature to kelvin", () => {
    // source: definitions of the scales: 212 °F = 100 °C = 373.15 K.
    expect(one("rpm,p,t\n3000,5,212\n", { intakeTemperature: 2, temperatureUnit: "F" }).intakeTemperature).toBeCloseTo(373.15, 9);
    expect(one("rpm,p,t\n3000,5,100\n", { intakeTemperature: 2, temperatureUnit: "C" }).intakeTemperature).toBeCloseTo(373.15, 9);
  });
});

describe("bad input", () => {
  it("reports each bad line with its number and stores no point from it", () => {
    const text = ["rpm,boost", "2000,5", "abc,6", "", "2200,", "2300,7", "2400,x"].join("\n");
    const r = parseLog(text, base, SEA_LEVEL);
    expect(r.errors.map((e) => e.message)).toEqual([
      "line 3: engine speed 'abc' is not a number",
      "line 5: manifold pressure is missing (column 2)",
      "line 7: manifold pressure 'x' is not a number",
    ]);
    expect(r.points.map((p) => p.line)).toEqual([2, 6]);
  });
  it("refuses impossible values naming the field", () => {
    const r = parseLog("rpm,boost,thr\n-5,5,100\n3000,-20,100\n3000,5,150\n", { ...base, throttle: 2 }, SEA_LEVEL);
    expect(r.errors.map((e) => e.message)).toEqual([
      expect.stringMatching(/^line 2: engine speed -5 rpm is outside/),
      expect.stringMatching(/^line 3: manifold pressure -20 psi gauge gives .* outside/),
      expect.stringMatching(/^line 4: throttle 150 % is outside/),
    ]);
  });
  it("an empty file, or one with only a header, is refused", () => {
    expect(parseLog("", base, SEA_LEVEL).fatal).toMatch(/empty/);
    expect(parseLog("rpm,boost\n\n", base, SEA_LEVEL).fatal).toMatch(/no data rows/);
  });
  it("a file over the row limit is refused with the limit named", () => {
    const text = "rpm,boost\n" + "3000,5\n".repeat(DATALOG_LIMITS.maxRows + 1);
    const r = parseLog(text, base, SEA_LEVEL);
    expect(r.fatal).toMatch(/200,000/);
    expect(r.points).toEqual([]);
  });
  it("a file over the size limit is refused before it is read", () => {
    const big = new Uint8Array(DATALOG_LIMITS.maxBytes + 1).fill(0x31);
    const d = decodeLogBytes(big);
    expect(d.ok).toBe(false);
    expect(!d.ok && d.message).toMatch(/limit is 5 MB/);
    expect(checkLogText("1".repeat(DATALOG_LIMITS.maxBytes + 1))).toMatch(/limit is 5 MB/);
  });
  it("UTF-16, binary and invalid UTF-8 are refused; UTF-8 with a BOM is read", () => {
    const utf16 = new Uint8Array([0xff, 0xfe, 0x72, 0x00, 0x70, 0x00]);
    expect(decodeLogBytes(utf16)).toMatchObject({ ok: false, message: expect.stringMatching(/UTF-16/) });
    const utf16NoBom = new Uint8Array([0x72, 0x00, 0x70, 0x00, 0x6d, 0x00]);
    expect(decodeLogBytes(utf16NoBom)).toMatchObject({ ok: false, message: expect.stringMatching(/NUL/) });
    const latin1 = new Uint8Array([0x72, 0x70, 0x6d, 0x2c, 0xb0, 0x46, 0x0a]); // "rpm,°F" in Latin-1
    expect(decodeLogBytes(latin1)).toMatchObject({ ok: false, message: expect.stringMatching(/not valid UTF-8/) });
    const bom = new Uint8Array([0xef, 0xbb, 0xbf, ...new TextEncoder().encode("rpm,boost\n2000,5\n")]);
    expect(decodeLogBytes(bom)).toEqual({ ok: true, text: "rpm,boost\n2000,5\n" });
    expect(checkLogText("rpm\u0000,boost")).toMatch(/NUL/);
    expect(checkLogText("rpm,\ufffd")).toMatch(/UTF-8/);
  });
  it("a mapping using one column twice is refused naming the field", () => {
    expect(() => parseLog("a,b\n1,2\n", { ...base, pressure: 0 }, SEA_LEVEL)).toThrow(/already used/);
  });
});

describe("cleaning", () => {
  const pt = (line: number, rpm: number, psi: number, throttle: number | null) => ({
    line,
    time: null,
    rpm,
    manifoldPressure: SEA_LEVEL + psi * PSI,
    intakeTemperature: null,
    throttle,
  });
  it("keeps wide-open throttle, flags outliers visibly, and bins by engine speed", () => {
    const points = [
      pt(2, 2010, 6, 30), // part throttle
      ...Array.from({ length: 9 }, (_, i) => pt(3 + i, 2010 + 20 * i, 6 + 0.01 * i, 100)),
      pt(12, 2100, 10, 100), // a spike 4 psi above its neighbours
      ...Array.from({ length: 10 }, (_, i) => pt(13 + i, 2260 + 20 * i, 7, 100)),
    ];
    const c = cleanLog(points, SEA_LEVEL, { minThrottle: 90, binWidth: 250, minSamples: 3 });
    expect(c.rule).toBe("throttle");
    expect(c.counts).toEqual({ total: 21, kept: 19, partThrottle: 1, outliers: 1 });
    expect(c.status[0]).toBe("part-throttle");
    expect(c.status[10]).toBe("outlier");
    expect(c.bins.map((b) => [b.from, b.kept, b.outliers])).toEqual([
      [2000, 9, 1],
      [2250, 10, 0],
    ]);
    // the first bin's mean boost leaves the spike out: 6 + 0.04 psi on average
    expect(c.bins[0].boostGauge / PSI).toBeCloseTo(6.04, 6);
  });
  it("without a throttle column keeps samples at or above the minimum boost", () => {
    const points = [pt(2, 2000, -5, null), pt(3, 2010, 1, null), pt(4, 2020, 2, null)];
    const c = cleanLog(points, SEA_LEVEL, { minBoost: 0.5 * PSI, minSamples: 1 });
    expect(c.rule).toBe("boost");
    expect(c.status).toEqual(["part-throttle", "kept", "kept"]);
  });
});
