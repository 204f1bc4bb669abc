// @ts-nocheck
// Cleaning options in a page's address: read back what was written, fall back per option to the
// default when a value is missing or out of the schema's range, and never let one bad value
// reset the others. The ranges and defaults are the project's own (lib/datalogs/parse.ts).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { cleaningFromQuery, cleaningToQuery } from "@/lib/datalogs/cleaning-query";
import { DEFAULT_CLEANING, type CleaningOptions } from "@/lib/datalogs/parse";

const options = fc.record<CleaningOptions>({
  minThrottle: fc.integer({ min: 0, max: 100 }),
  minBoost: fc.integer({ min: -100_000, max: 400_000 }),
  binWidth: fc.integer({ min: 50, max: 2000 }),
  minSamples: fc.integer({ min: 1, max: 100 }),
  madLimit: fc.double({ min: 1, max: 10, noNaN: true }),
});

describe("cleaning options in the address", () => {
  it("an empty query gives the defaults (90 % throttle, 0 Pa, 250 rpm bins, 3 samples, 3 MAD)", () => {
    expect(cleaningFromQuery({})).toEqual({ minThrottle: 90, minBoost: 0, binWidth: 250, minSamples: 3, madLimit: 3 });
    expect(cleaningFromQuery({})).toEqual(DEFAULT_CLEANING);
  });

  it("writes every option and reads the same options back", () => {
    fc.assert(
      fc.property(options, (o) => {
        const q = Object.fromEntries(new URLSearchParams(cleaningToQuery(o)));
        expect(Object.keys(q).sort()).toEqual(Object.keys(DEFAULT_CLEANING).sort());
        expect(cleaningFromQuery(q)).toEqual(o);
      }),
      { numRuns: 200 },
    );
  });

  it("a bad value falls back to that option's default and keeps the others", () => {
    const good = { minThrottle: "80", minBoost: "20000", binWidth: "500", minSamples: "5", madLimit: "4" };
    expect(cleaningFromQuery(good)).toEqual({ minThrottle: 80, minBoost: 20_000, binWidth: 500, minSamples: 5, madLimit: 4 });
    const bad: Record<keyof CleaningOptions, string[]> = {
      minThrottle: ["-1", "101", "lots"],
      minBoost: ["-100001", "400001", "x"],
      binWidth: ["49", "2001", "250.5"],
      minSamples: ["0", "101", "2.5"],
      madLimit: ["0.5", "11", "?"],
    };
    for (const [key, values] of Object.entries(bad) as [keyof CleaningOptions, string[]][]) {
      for (const v of values) {
        const read = cleaningFromQuery({ ...good, [key]: v });
        expect(read[key], `${key}=${v}`).toBe(DEFAULT_CLEANING[key]);
        for (const other of Object.keys(good) as (keyof CleaningOptions)[]) {
          if (other !== key) expect(read[other]).toBe(Number(good[other]));
        }
      }
    }
  });

  it("the range ends themselves are kept", () => {
    const low = cleaningFromQuery({ minThrottle: "0", minBoost: "-100000", binWidth: "50", minSamples: "1", madLimit: "1" });
    const high = cleaningFromQuery({ minThrottle: "100", minBoost: "400000", binWidth: "2000", minSamples: "100", madLimit: "10" });
    expect(low).toEqual({ minThrottle: 0, minBoost: -100_000, binWidth: 50, minSamples: 1, madLimit: 1 });
    expect(high).toEqual({ minThrottle: 100, minBoost: 400_000, binWidth: 2000, minSamples: 100, madLimit: 10 });
  });
});
