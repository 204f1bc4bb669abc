// The column rules of lib/datalogs/guess-mapping.ts one by one, each at its limit and just past
// it. Every range and threshold checked here is the author's choice (stated at the top of
// guess-mapping.ts, no published source); the expected values are worked out by hand from the
// input numbers in each case.
import { describe, expect, it } from "vitest";
import {
  columnValues,
  guessMapping,
  looksLikeEngineSpeed,
  looksLikeThrottle,
  looksLikeTime,
  pressureFromValues,
  profileColumn,
  temperatureUnitFromValues,
  type ColumnProfile,
} from "@/lib/datalogs/guess-mapping";
import type { LogLayoutGuess } from "@/lib/datalogs/parse";

const p = (values: number[]) => profileColumn(values) as ColumnProfile;

describe("profileColumn", () => {
  it("is null under two numbers", () => {
    expect(profileColumn([])).toBeNull();
    expect(profileColumn([4])).toBeNull();
  });

  it("an odd count: the middle value is the median; steps 1, 2, 3, 4 have median 2.5 and sit 1.5, 0.5, 0.5, 1.5 from it", () => {
    // unevenness = median distance 1 / median step 2.5 = 0.4 (by hand)
    expect(profileColumn([0, 1, 3, 6, 10])).toEqual({ count: 5, min: 0, max: 10, median: 3, rising: true, medianStep: 2.5, stepUnevenness: 0.4 });
  });

  it("an even count: the median is the mean of the middle two; steps 1, 2, 3 have median 2 and sit 1, 0, 1 from it", () => {
    // unevenness = 1 / 2 = 0.5; values given out of order so the sort matters
    expect(profileColumn([0, 1, 3, 6])).toEqual({ count: 4, min: 0, max: 6, median: 2, rising: true, medianStep: 2, stepUnevenness: 0.5 });
    expect(p([6, 0, 3, 1]).median).toBe(2);
  });

  it("a steady clock is perfectly even", () => {
    expect(profileColumn([10, 20, 30, 40])).toEqual({ count: 4, min: 10, max: 40, median: 25, rising: true, medianStep: 10, stepUnevenness: 0 });
  });

  it("no clock at all (falling or standing steps): unevenness is infinite", () => {
    expect(profileColumn([3, 2, 1])).toEqual({ count: 3, min: 1, max: 3, median: 2, rising: false, medianStep: -1, stepUnevenness: Infinity });
    expect(profileColumn([5, 5, 5])).toEqual({ count: 3, min: 5, max: 5, median: 5, rising: false, medianStep: 0, stepUnevenness: Infinity });
  });

  it("rising: one repeated stamp in ten steps is allowed (9 rises of 10 is the author's limit), two are not, one fall never is", () => {
    expect(p([0, 1, 2, 3, 4, 4, 5, 6, 7, 8, 9]).rising).toBe(true); // 9 rises, 1 repeat
    expect(p([0, 1, 2, 3, 4, 4, 5, 6, 7, 7, 8]).rising).toBe(false); // 8 rises, 2 repeats
    expect(p([0, 1, 2, 3, 4, 3.5, 5, 6, 7, 8, 9]).rising).toBe(false); // 9 rises, 1 fall
    expect(p([0, 1]).rising).toBe(true);
  });
});

const layout = (columnCount: number, hasHeader = false) => ({ delimiter: "," as const, decimalComma: false, hasHeader, columnCount });

describe("columnValues", () => {
  it("reads each column's numbers, leaving out unreadable fields, missing fields and fields past the last column", () => {
    expect(columnValues("1,2,3\n4,x,6,7\n8,9\n", layout(3))).toEqual([
      [1, 4, 8],
      [2, 9],
      [3, 6],
    ]);
  });

  it("reads decimal commas under a semicolon delimiter", () => {
    expect(columnValues("a;b\n1,5;2\n", { delimiter: ";", decimalComma: true, hasHeader: true, columnCount: 2 })).toEqual([[1.5], [2]]);
  });

  it("reads the first 400 data rows (author's choice), with or without a header", () => {
    const rows = Array.from({ length: 401 }, (_, i) => `${i + 1},0`);
    const first400 = Array.from({ length: 400 }, (_, i) => i + 1);
    expect(columnValues(["t,x", ...rows].join("\n"), layout(2, true))[0]).toEqual(first400);
    expect(columnValues(rows.join("\n"), layout(2, false))[0]).toEqual(first400);
  });
});

describe("looksLikeTime (author's limits: max under 500, steps of 1 or less, or a start under 100)", () => {
  it("needs a start at 0 or later", () => {
    expect(looksLikeTime(p([-1, 0, 1, 2]))).toBe(false);
    expect(looksLikeTime(p([0, 1, 2]))).toBe(true);
  });

  it("small: a maximum under 500, steps and start being large", () => {
    expect(looksLikeTime(p([100, 200, 300, 400]))).toBe(true);
    expect(looksLikeTime(p([100, 300, 500]))).toBe(false);
  });

  it("or steps of 1 or less", () => {
    expect(looksLikeTime(p([600, 601, 602, 603]))).toBe(true);
    expect(looksLikeTime(p([600, 602, 604, 606]))).toBe(false);
  });

  it("or a start under 100", () => {
    expect(looksLikeTime(p([99, 400, 700]))).toBe(true);
    expect(looksLikeTime(p([100, 400, 700]))).toBe(false);
  });
});

describe("looksLikeEngineSpeed (author's limits: median 500–10,000, nothing below 0 or above 20,000)", () => {
  it("a time column counting milliseconds is not engine speed", () => {
    expect(looksLikeEngineSpeed(p([0, 1000, 2000]))).toBe(false);
  });

  it("nothing below 0", () => {
    expect(looksLikeEngineSpeed(p([1000, 0, 2000]))).toBe(true);
    expect(looksLikeEngineSpeed(p([-10, 1000, 2000]))).toBe(false);
  });

  it("nothing above 20,000", () => {
    expect(looksLikeEngineSpeed(p([1000, 20_000, 2000]))).toBe(true);
    expect(looksLikeEngineSpeed(p([1000, 2000, 25_000]))).toBe(false);
  });

  it("a median of 500 to 10,000", () => {
    expect(looksLikeEngineSpeed(p([500, 400, 600]))).toBe(true);
    expect(looksLikeEngineSpeed(p([499, 400, 600]))).toBe(false);
    expect(looksLikeEngineSpeed(p([10_000, 9000, 11_000]))).toBe(true);
    expect(looksLikeEngineSpeed(p([12_000, 11_000, 13_000]))).toBe(false);
  });
});

describe("looksLikeThrottle (author's limits: from 0–30 % up to 95–100.5 %)", () => {
  it("a part-to-wide-open run that does not rise like a clock", () => {
    expect(looksLikeThrottle(p([20, 0, 100]))).toBe(true);
  });

  it("a time column running 0 to 100 is not throttle", () => {
    expect(looksLikeThrottle(p([0, 50, 100]))).toBe(false);
  });

  it("the lowest reading: 0 to 30", () => {
    expect(looksLikeThrottle(p([-5, 50, 100]))).toBe(false);
    expect(looksLikeThrottle(p([30, 100, 50]))).toBe(true);
    expect(looksLikeThrottle(p([31, 100, 50]))).toBe(false);
  });

  it("the highest reading: 95 to 100.5", () => {
    expect(looksLikeThrottle(p([0, 95, 50]))).toBe(true);
    expect(looksLikeThrottle(p([0, 94, 50]))).toBe(false);
    expect(looksLikeThrottle(p([0, 100.5, 50]))).toBe(true);
    expect(looksLikeThrottle(p([0, 101, 50]))).toBe(false);
  });
});

describe("pressureFromValues (author's ranges)", () => {
  const bar = { unit: "bar", kind: "gauge" };
  const kPaAbs = { unit: "kPa", kind: "absolute" };
  const psi = { unit: "psi", kind: "gauge" };
  const kPaGauge = { unit: "kPa", kind: "gauge" };

  it("bar gauge within −1…4", () => {
    expect(pressureFromValues(p([-1, 0, 2]))).toEqual(bar);
    expect(pressureFromValues(p([0, 2, 4]))).toEqual(bar);
    expect(pressureFromValues(p([-2, 0, 3]))).toEqual(psi);
  });

  it("kPa absolute: median 90–300, nothing under 15 or over 400", () => {
    expect(pressureFromValues(p([80, 90, 100]))).toEqual(kPaAbs);
    expect(pressureFromValues(p([20, 50, 80]))).toEqual(kPaGauge); // median under 90
    expect(pressureFromValues(p([290, 300, 310]))).toEqual(kPaAbs);
    expect(pressureFromValues(p([310, 320, 330]))).toBeNull(); // median over 300
    expect(pressureFromValues(p([15, 100, 200]))).toEqual(kPaAbs);
    expect(pressureFromValues(p([10, 100, 200]))).toEqual(kPaGauge); // a reading under 15
    expect(pressureFromValues(p([100, 150, 400]))).toEqual(kPaAbs);
    expect(pressureFromValues(p([100, 150, 450]))).toBeNull(); // a reading over 400
  });

  it("psi gauge within −15…45", () => {
    expect(pressureFromValues(p([-15, 0, 40]))).toEqual(psi);
    expect(pressureFromValues(p([-20, 0, 40]))).toEqual(kPaGauge);
    expect(pressureFromValues(p([0, 10, 45]))).toEqual(psi);
    expect(pressureFromValues(p([0, 10, 46]))).toEqual(kPaGauge);
  });

  it("kPa gauge within −100…300, else nothing", () => {
    expect(pressureFromValues(p([-100, 0, 100]))).toEqual(kPaGauge);
    expect(pressureFromValues(p([-110, 0, 100]))).toBeNull();
    expect(pressureFromValues(p([-50, 0, 300]))).toEqual(kPaGauge);
    expect(pressureFromValues(p([-50, 0, 310]))).toBeNull();
  });
});

describe("temperatureUnitFromValues (author's ranges: medians −40…400; K from 200)", () => {
  it("takes medians from −40 to 400, both ends included", () => {
    expect(temperatureUnitFromValues(p([-40, -40]))).toBe("C");
    expect(temperatureUnitFromValues(p([-50, -50]))).toBeNull();
    expect(temperatureUnitFromValues(p([400, 400]))).toBe("K");
    expect(temperatureUnitFromValues(p([401, 401]))).toBeNull();
  });

  it("kelvin from a median of 200", () => {
    // source: NIST SP 811 §4.2.1.1: 200 K ≈ −73 °C, an air temperature no intake sees; 199 °F ≈ 93 °C
    expect(temperatureUnitFromValues(p([200, 200]))).toBe("K");
    expect(temperatureUnitFromValues(p([199, 199]))).toBe("F");
  });
});

// ---------- guessMapping: headings against values ----------

/** A layout with a header row, comma delimited, as guessLayout gives for such a file. */
const headed = (columns: string[]): LogLayoutGuess => ({ delimiter: ",", decimalComma: false, hasHeader: true, columnCount: columns.length, columns });
const file = (columns: string[], rows: (string | number)[][]) => [columns.join(","), ...rows.map((r) => r.join(","))].join("\n") + "\n";
const guess = (columns: string[], rows: (string | number)[][]) => guessMapping(headed(columns), file(columns, rows));

describe("guessMapping", () => {
  it("takes every column by its heading when the values allow it; only the pressure unit comes from the values", () => {
    const m = guess(
      ["Time", "rpm", "boost"],
      [
        [0, 2000, 0.2],
        [0.1, 2100, 0.5],
        [0.2, 2200, 0.8],
        [0.3, 2300, 0.6],
      ],
    );
    expect(m).toEqual({
      delimiter: ",",
      decimalComma: false,
      hasHeader: true,
      rpm: 1,
      pressure: 2,
      pressureKind: "gauge", // "boost" in the heading
      pressureUnit: "bar", // 0.2–0.8 lies within −1…4
      intakeTemperature: null,
      temperatureUnit: "F",
      time: 0,
      throttle: null,
      notes: { pressureUnit: "Guessed from the values (0.2–0.8): bar gauge" },
    });
  });

  it("a column headed time must rise", () => {
    const m = guess(
      ["Time", "engine speed"],
      [
        [0.1, 2000],
        [0.05, 2100],
        [0.2, 2200],
        [0.25, 2300],
      ],
    );
    expect(m.time).toBeNull();
    expect(m.rpm).toBe(1);
  });

  it("a column headed time must not start below 0", () => {
    const m = guess(
      ["Time", "engine speed"],
      [
        [-0.2, 2000],
        [-0.1, 2100],
        [0, 2200],
        [0.1, 2300],
      ],
    );
    expect(m.time).toBeNull();
  });

  it("a column headed engine speed may start at 0 (engine off), and is then not a guess from the values", () => {
    const m = guess(
      ["rpm", "boost"],
      [
        [800, 0.1],
        [0, 0.2],
        [900, 0.4],
        [1000, 0.5],
        [1100, 0.6],
      ],
    );
    expect(m.rpm).toBe(0);
    expect(m.notes).toEqual({ pressureUnit: "Guessed from the values (0.1–0.6): bar gauge" });
  });

  it("a column headed engine speed with a reading below 0 or above 20,000 is left for the person (placeholder: the first free column)", () => {
    const below = guess(
      ["state", "rpm", "boost"],
      [
        ["ok", -100, 0.1],
        ["ok", 1000, 0.2],
        ["ok", 2000, 0.4],
        ["ok", 3000, 0.5],
      ],
    );
    expect(below).toMatchObject({ rpm: 0, pressure: 2 });
    expect(below.notes.rpm).toBeUndefined();
    const above = guess(
      ["state", "rpm", "boost"],
      [
        ["ok", 1000, 0.1],
        ["ok", 25_000, 0.2],
        ["ok", 2000, 0.4],
        ["ok", 3000, 0.5],
      ],
    );
    expect(above).toMatchObject({ rpm: 0, pressure: 2 });
    // 20,000 itself is still an engine speed (the parser's own bound, 0–20 000 rpm); one more is not.
    const edge = (top: number) => guess(["state", "rpm", "boost"], [["ok", 1000, 0.1], ["ok", top, 0.2], ["ok", 2000, 0.4], ["ok", 3000, 0.5]]);
    expect(edge(20_000)).toMatchObject({ rpm: 1, pressure: 2 });
    expect(edge(20_001)).toMatchObject({ rpm: 0, pressure: 2 });
  });

  it("a free column whose values are no temperature in any unit (median above 400) is not guessed as the intake temperature", () => {
    const m = guess(
      ["rpm", "boost", "counter"],
      [
        [2000, 0.2, 1_000_000],
        [2100, 0.5, 3_000_000],
        [2200, 0.8, 2_000_000],
        [2300, 0.6, 2_500_000],
      ],
    );
    expect(m).toMatchObject({ rpm: 0, pressure: 1, intakeTemperature: null });
    expect(m.notes.intakeTemperature).toBeUndefined();
  });

  it("a column headed throttle may read −1 to 110 (author's slack for sensor offset); past that it is not throttle", () => {
    const withThrottle = (t: number[]) => guess(["rpm", "throttle"], t.map((v, i) => [2000 + 100 * i, v]));
    expect(withThrottle([-1, 50, 110, 30])).toMatchObject({ rpm: 0, throttle: 1 });
    expect(withThrottle([-1, 50, 110, 30]).notes.throttle).toBeUndefined();
    expect(withThrottle([-2, 50, 110, 30]).throttle).toBeNull();
    expect(withThrottle([-1, 50, 111, 30]).throttle).toBeNull();
  });

  it("from values alone: pressure is the column that swings most, intake air the steadiest of the rest", () => {
    // Spread over median (by hand): a 1.8 / 1 = 1.8, b 20 / 30 ≈ 0.67, c 1 / 30.5 ≈ 0.03.
    const m = guess(
      ["a", "b", "c"],
      [
        [0.2, 20, 30],
        [1.0, 40, 31],
        [0.6, 30, 30.5],
        [2.0, 25, 30.2],
        [1.5, 35, 30.8],
      ],
    );
    expect(m).toEqual({
      delimiter: ",",
      decimalComma: false,
      hasHeader: true,
      rpm: 1, // placeholder: the first column left
      pressure: 0,
      pressureKind: "gauge",
      pressureUnit: "bar",
      intakeTemperature: 2,
      temperatureUnit: "C",
      time: null,
      throttle: null,
      notes: {
        pressure: "Guessed from the values: 0.2–2",
        pressureUnit: "Guessed from the values (0.2–2): bar gauge",
        intakeTemperature: "Guessed from the values: 30–31",
        temperatureUnit: "Guessed from the values (median 30.5): °C",
      },
    });
  });
});
