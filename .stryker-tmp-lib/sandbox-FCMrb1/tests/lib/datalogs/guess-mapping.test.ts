// @ts-nocheck
// Guessing the column mapping from headings and values. The value ranges are the author's
// (stated in lib/datalogs/guess-mapping.ts); the unit facts are from the sources named.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  guessMapping,
  looksLikeEngineSpeed,
  looksLikeTime,
  pressureFromValues,
  profileColumn,
  temperatureUnitFromValues,
  type ColumnProfile,
} from "@/lib/datalogs/guess-mapping";
import { guessLayout, parseLog } from "@/lib/datalogs/parse";
import { mappingFieldErrors } from "@/lib/datalogs/mapping-errors";

// source: ISO 2533 standard atmosphere, sea level 101 325 Pa.
const SEA_LEVEL = 101_325;

/** A pull logged at 20 Hz: time (s), engine speed rising, boost (bar gauge) rising with sensor noise, intake air (°C) steady. */
function germanPull(rows = 60) {
  const out: string[][] = [];
  for (let i = 0; i < rows; i++) {
    const rpm = 2000 + i * 60 + (i % 3) * 7;
    out.push([(i * 0.05).toFixed(2), String(rpm), (0.2 + (0.6 * i) / rows + [0, 0.02, -0.015][i % 3]).toFixed(3), (30 + (i % 5) * 0.4).toFixed(1)].map((f) => f.replace(".", ",")));
  }
  return out;
}
const csv = (head: string[] | null, rows: string[][], d = ";") => [...(head ? [head.join(d)] : []), ...rows.map((r) => r.join(d))].join("\n") + "\n";

describe("a semicolon, decimal-comma log with German headings", () => {
  const text = csv(["Zeit", "Drehzahl", "Ladedruck", "Ansauglufttemperatur"], germanPull());

  it("maps time, engine speed, boost in bar and intake air in °C, and reads every line", () => {
    const m = guessMapping(guessLayout(text), text);
    expect(m).toMatchObject({ delimiter: ";", decimalComma: true, time: 0, rpm: 1, pressure: 2, pressureUnit: "bar", pressureKind: "gauge", intakeTemperature: 3, temperatureUnit: "C" });
    expect(m.notes.temperatureUnit).toMatch(/from the values.*°C/);
    const r = parseLog(text, m, SEA_LEVEL);
    expect(r.errors).toEqual([]);
    // 0.2 bar gauge = 20 000 Pa above the barometer (source: NIST SP 811, 1 bar = 100 kPa exactly)
    expect(r.points[0].manifoldPressure).toBeCloseTo(SEA_LEVEL + 20_000, 6);
    expect(r.points[0].intakeTemperature).toBeCloseTo(303.15, 9);
  });

  it("maps the same from the values alone: neutral headings, no header, and columns in another order", () => {
    const neutral = csv(["A", "B", "C", "D"], germanPull());
    expect(guessMapping(guessLayout(neutral), neutral)).toMatchObject({ time: 0, rpm: 1, pressure: 2, intakeTemperature: 3, pressureUnit: "bar", temperatureUnit: "C" });
    const bare = csv(null, germanPull());
    expect(guessMapping(guessLayout(bare), bare)).toMatchObject({ hasHeader: false, time: 0, rpm: 1, pressure: 2, intakeTemperature: 3 });
    const order = [3, 1, 0, 2];
    const shuffled = csv(order.map((i) => ["Zeit", "Drehzahl", "Ladedruck", "Ansauglufttemperatur"][i]), germanPull().map((r) => order.map((i) => r[i])));
    expect(guessMapping(guessLayout(shuffled), shuffled)).toMatchObject({ time: 2, rpm: 1, pressure: 3, intakeTemperature: 0 });
  });

  it("does not take a time column for engine speed even when its heading says so", () => {
    const wrong = csv(["Drehzahl", "Kanal 2", "Ladedruck"], germanPull().map((r) => [r[0], r[1], r[2]]));
    const m = guessMapping(guessLayout(wrong), wrong);
    expect(m.rpm).toBe(1);
    expect(m.time).toBe(0);
  });

  it("takes a column headed time in milliseconds that starts late, not as engine speed", () => {
    const text = "Time (ms);Drehzahl;Ladedruck\n" + germanPull().map((r, i) => [String(1500 + 50 * i), r[1], r[2]].join(";")).join("\n");
    expect(guessMapping(guessLayout(text), text)).toMatchObject({ time: 0, rpm: 1, pressure: 2 });
  });
});

describe("the rules on one column", () => {
  const p = (values: number[]) => profileColumn(values) as ColumnProfile;

  it("time: rising small numbers, in seconds or milliseconds from the start; a pull's engine speed is not time", () => {
    expect(looksLikeTime(p([0, 0.1, 0.2, 0.3]))).toBe(true);
    expect(looksLikeTime(p([734.2, 734.25, 734.3, 734.35]))).toBe(true); // a long log in seconds
    expect(looksLikeTime(p([0, 50, 100, 150, 9000]))).toBe(true); // milliseconds
    expect(looksLikeTime(p([2000, 2060, 2130, 2180]))).toBe(false);
    expect(looksLikeTime(p([0.3, 0.2, 0.4, 0.5]))).toBe(false); // falls once
    expect(looksLikeTime(p([87, 87, 87, 88, 88]))).toBe(false); // a warming intake mostly stands still
    expect(looksLikeEngineSpeed(p([2000, 2060, 2130, 2180]))).toBe(true);
    expect(looksLikeEngineSpeed(p([300, 320, 350]))).toBe(false);
    expect(looksLikeEngineSpeed(p([0, 0.05, 0.1, 0.15]))).toBe(false);
  });

  it("pressure unit and kind from the range", () => {
    expect(pressureFromValues(p([-0.4, 0.2, 0.9]))).toEqual({ unit: "bar", kind: "gauge" });
    expect(pressureFromValues(p([95, 140, 210]))).toEqual({ unit: "kPa", kind: "absolute" });
    expect(pressureFromValues(p([-8, 6, 14]))).toEqual({ unit: "psi", kind: "gauge" });
    expect(pressureFromValues(p([-60, 20, 90]))).toEqual({ unit: "kPa", kind: "gauge" });
    expect(pressureFromValues(p([1500, 3000]))).toBeNull();
  });

  it("temperature unit from the median: °C under 60, °F from 60, K from 200", () => {
    // source: the Celsius, Fahrenheit and kelvin scales (NIST SP 811 §4.2.1.1): 60 °F ≈ 15.6 °C, 200 K ≈ −73 °C.
    expect(temperatureUnitFromValues(p([28, 31, 35]))).toBe("C");
    expect(temperatureUnitFromValues(p([85, 95, 110]))).toBe("F");
    expect(temperatureUnitFromValues(p([300, 305, 312]))).toBe("K");
    expect(temperatureUnitFromValues(p([59, 59.9]))).toBe("C");
    expect(temperatureUnitFromValues(p([60, 60]))).toBe("F");
    expect(temperatureUnitFromValues(p([900, 950]))).toBeNull();
  });

  it("a unit in the heading wins over the values; the guess from values is noted", () => {
    const text = "Zeit;Drehzahl;Ladedruck (kPa);IAT (°F)\n0,0;2000;20;86\n0,1;2100;25;87\n";
    const m = guessMapping(guessLayout(text), text);
    expect(m).toMatchObject({ pressureUnit: "kPa", pressureKind: "gauge", temperatureUnit: "F" });
    expect(m.notes.temperatureUnit).toBeUndefined();
  });
});

// ---------- properties ----------

type Kind = "time" | "rpm" | "pressure" | "temperature";
const pressureCase = fc.constantFrom(
  { unit: "bar" as const, kind: "gauge" as const, from: -0.3, to: 0.9 },
  { unit: "kPa" as const, kind: "absolute" as const, from: 95, to: 210 },
  { unit: "psi" as const, kind: "gauge" as const, from: -5, to: 14 },
);
const temperatureCase = fc.constantFrom({ unit: "C" as const, at: 35 }, { unit: "F" as const, at: 95 }, { unit: "K" as const, at: 308 });

/** A generated pull: one column per kind, each inside the ranges the rules state. */
const logArb = fc.record({
  rows: fc.integer({ min: 8, max: 80 }),
  t0: fc.double({ min: 0, max: 300, noNaN: true }),
  dt: fc.double({ min: 0.01, max: 0.5, noNaN: true }),
  rpm0: fc.integer({ min: 1200, max: 3000 }),
  rpmStep: fc.integer({ min: 15, max: 80 }),
  pressure: pressureCase,
  temperature: temperatureCase,
  order: fc.shuffledSubarray([0, 1, 2, 3] as const, { minLength: 4, maxLength: 4 }),
  decimalComma: fc.boolean(),
  // A real sensor is never silent: each sample is off by 30–100 % of the noise amplitude, either way.
  noise: fc.array(fc.tuple(fc.boolean(), fc.double({ min: 0.3, max: 1, noNaN: true })).map(([up, m]) => (up ? m : -m)), { minLength: 80, maxLength: 80 }),
});

type GeneratedLog = typeof logArb extends fc.Arbitrary<infer T> ? T : never;

function writeLog(g: GeneratedLog) {
  const columns: Record<Kind, number[]> = { time: [], rpm: [], pressure: [], temperature: [] };
  for (let i = 0; i < g.rows; i++) {
    columns.time.push(g.t0 + i * g.dt);
    columns.rpm.push(g.rpm0 + i * g.rpmStep + (i % 2) * 5);
    // Boost rises through the pull with sensor noise (±3 % of its span), as a logged pull does.
    const span = g.pressure.to - g.pressure.from;
    columns.pressure.push(g.pressure.from + (span * i) / (g.rows - 1) + 0.03 * g.noise[i] * span);
    columns.temperature.push(g.temperature.at + (i % 4) * 0.5);
  }
  const kinds: Kind[] = ["time", "rpm", "pressure", "temperature"];
  const order = g.order.map((i) => kinds[i]);
  const d = g.decimalComma ? ";" : ",";
  const num = (v: number) => (g.decimalComma ? v.toFixed(3).replace(".", ",") : v.toFixed(3));
  const lines = [order.map((_, i) => `ch${i + 1}`).join(d)];
  for (let i = 0; i < g.rows; i++) lines.push(order.map((k) => num(columns[k][i])).join(d));
  return { text: lines.join("\n"), columnOf: (k: Kind) => order.indexOf(k) };
}

describe("properties", () => {
  it("a column shuffle keeps the guess: each quantity follows its column, units unchanged", () => {
    fc.assert(
      fc.property(logArb, (g) => {
        const { text, columnOf } = writeLog(g);
        const m = guessMapping(guessLayout(text), text);
        expect(m.time).toBe(columnOf("time"));
        expect(m.rpm).toBe(columnOf("rpm"));
        expect(m.pressure).toBe(columnOf("pressure"));
        expect(m.intakeTemperature).toBe(columnOf("temperature"));
        expect(m.pressureUnit).toBe(g.pressure.unit);
        expect(m.pressureKind).toBe(g.pressure.kind);
        expect(m.temperatureUnit).toBe(g.temperature.unit);
      }),
      { numRuns: 150 },
    );
  });

  it("a monotonic time column (seconds, or milliseconds from the start) is never taken as engine speed, whatever its heading", () => {
    const timeArb = fc.oneof(
      fc.record({ t0: fc.double({ min: 0, max: 5000, noNaN: true }), dt: fc.double({ min: 0.001, max: 1, noNaN: true }) }),
      fc.record({ t0: fc.integer({ min: 0, max: 99 }), dt: fc.integer({ min: 1, max: 200 }) }),
    );
    fc.assert(
      fc.property(timeArb, fc.integer({ min: 3, max: 60 }), fc.constantFrom("rpm", "Drehzahl", "x", "Zeit"), fc.boolean(), (t, rows, heading, withRpm) => {
        // The other column is engine speed, or boost (then engine speed is left for the person to pick).
        const lines = [`${heading},${withRpm ? "engine" : "boost"}`];
        for (let i = 0; i < rows; i++) lines.push(`${(t.t0 + i * t.dt).toFixed(3)},${withRpm ? 2000 + 40 * i : (i % 7) - 2}`);
        const text = lines.join("\n");
        const m = guessMapping(guessLayout(text), text);
        expect(m.rpm).not.toBe(0);
        expect(m.time).toBe(0);
        if (!withRpm) expect(m.notes.rpm).toBeUndefined();
      }),
      { numRuns: 200 },
    );
  });
});

describe("mapping errors by field", () => {
  const ok = { delimiter: ";" as const, decimalComma: true, hasHeader: true, rpm: 1, pressure: 2, pressureKind: "gauge" as const, pressureUnit: "bar" as const, intakeTemperature: 3, temperatureUnit: "C" as const, time: 0, throttle: null };

  it("has none for a sound mapping", () => {
    expect(mappingFieldErrors(ok)).toEqual({});
  });

  it("puts a clash on the later field in the form's order and names both; decimal commas under a comma delimiter on their own field", () => {
    expect(mappingFieldErrors({ ...ok, time: 1 })).toEqual({ time: ["Column 2 is already used for engine speed; pick another column for time"] });
    expect(mappingFieldErrors({ ...ok, throttle: 3 })).toEqual({ throttle: ["Column 4 is already used for intake air temperature; pick another column for throttle"] });
    expect(Object.keys(mappingFieldErrors({ ...ok, delimiter: "," }))).toEqual(["decimalComma"]);
  });
});
