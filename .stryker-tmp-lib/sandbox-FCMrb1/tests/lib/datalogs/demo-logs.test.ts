// @ts-nocheck
// The demo's two synthetic logs of the work truck (public/samples/) against their STATED invented
// truth (db/seed/datalogs.ts, DEMO_TRUTH): read through the app's own parser and cleaner, then
// calibrated with calc's `calibrate`. A round trip, so the tolerances are the calibration's own
// targets from calc/README.md and tests/calc/calibrate-runs.test.ts (author's bounds): slip 0.03,
// a third pulley's boost 0.3 psi; VE 3 % with the logs' noise, since slip and VE trade against
// each other (a slip 0.02 off, the noise swing calc/README.md reports, moves the implied VE by
// about 0.02/0.74 ≈ 2.7 %); without noise, slip 0.005 and VE 0.5 %.
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { boostCurve, calibrate, combinationSchema, inToM, paToPsi, veAt } from "@/calc";
import { binsToMeasured, cleanLog, guessLayout, parseLog } from "@/lib/datalogs/parse";
import { guessMapping } from "@/lib/datalogs/guess-mapping";
import { DEMO_DATALOG_MAPPING, DEMO_DATALOGS, DEMO_TRUTH, demoLogCsv, demoTrueVeCurve, demoTruth, synthesizeLogCsv } from "@/db/seed/datalogs";
import { workTruckV6 } from "@/lib/combinations/demo-specs";

const catalogue = combinationSchema.parse(workTruckV6);
const samples = path.join(import.meta.dirname, "../../../public/samples");

/** A log's run for `calibrate`, through the app's parser and cleaner; the sample file unless `text` is given. */
function runOf(log: (typeof DEMO_DATALOGS)[number], text = fs.readFileSync(path.join(samples, log.fileName), "utf8")) {
  const mapping = guessMapping(guessLayout(text), text);
  expect(mapping).toMatchObject(DEMO_DATALOG_MAPPING);
  const parsed = parseLog(text, mapping, catalogue.ambient.pressure);
  expect(parsed.errors).toEqual([]);
  const cleaned = cleanLog(parsed.points, catalogue.ambient.pressure, { binWidth: 250, minThrottle: 90 });
  return { text, blowerPulleyDiameter: combinationSchema.parse(log.spec).drive.blowerPulleyDiameter, measured: binsToMeasured(cleaned.bins) };
}

describe("the demo logs", () => {
  const runs = DEMO_DATALOGS.map((log) => runOf(log));

  it("are the seed's logs, at two pulley sizes", () => {
    // Header and length, not bytes: a refinement of calc/ may move the figures a little.
    // Regenerate with `npx tsx scripts/write-demo-datalog.ts` after such a change.
    DEMO_DATALOGS.forEach((log, i) => {
      const seeded = demoLogCsv(log).split("\n");
      expect(runs[i].text.split("\n")[0]).toBe(seeded[0]);
      expect(runs[i].text.split("\n").length).toBe(seeded.length);
    });
    expect(runs[0].blowerPulleyDiameter).toBeCloseTo(inToM(3.4), 9);
    expect(runs[1].blowerPulleyDiameter).toBeCloseTo(inToM(3.0), 9);
  });

  it("state a truth visibly off the catalogue: more slip, better breathing", () => {
    // author's bounds: large enough to show in the boost, so the calibration has something to find
    expect(catalogue.blower.volumetricEfficiencyRef - DEMO_TRUTH.blowerVolumetricEfficiency).toBeGreaterThanOrEqual(0.05);
    const truthBoost = boostCurve(demoTruth(runs[0].blowerPulleyDiameter), [4000])[0].boostGauge;
    const catalogueBoost = boostCurve(catalogue, [4000])[0].boostGauge;
    expect(paToPsi(catalogueBoost - truthBoost)).toBeGreaterThan(1);
  });

  it("a Roots log climbs with engine speed, as the model's Roots does (trade fact, calc/README.md)", () => {
    for (const run of runs) {
      const m = run.measured;
      const first = m.slice(0, 3).reduce((s, p) => s + p.boostGauge, 0) / 3;
      const last = m.slice(-3).reduce((s, p) => s + p.boostGauge, 0) / 3;
      // at least 2 psi from the bottom of the pull to the top: an author's bound for "climbs"
      expect(paToPsi(last - first)).toBeGreaterThan(2);
    }
  });

  /** Largest relative VE error of a fit against the truth, inside the logged span away from its ends. */
  const veError = (veCurve: readonly { rpm: number; ve: number }[]) =>
    Math.max(...veCurve.filter((p) => p.rpm >= 2000 && p.rpm <= 5000).map((p) => Math.abs(p.ve / veAt(demoTrueVeCurve(), p.rpm) - 1)));
  const fit = (rs: typeof runs) => calibrate(catalogue, rs.map(({ blowerPulleyDiameter, measured }) => ({ blowerPulleyDiameter, measured })));

  it("noise-free logs of the same truth give it back almost exactly", () => {
    const clean = DEMO_DATALOGS.map((log) =>
      runOf(log, synthesizeLogCsv(log.spec, { trueVeCurve: demoTrueVeCurve(), trueBlowerVolumetricEfficiency: DEMO_TRUTH.blowerVolumetricEfficiency, fromRpm: 1800, pressureDigits: 4 })),
    );
    const r = fit(clean);
    expect(Math.abs(r.combination.blower.volumetricEfficiencyRef - DEMO_TRUTH.blowerVolumetricEfficiency)).toBeLessThan(0.005);
    expect(veError(r.combination.engine.veCurve)).toBeLessThan(0.005);
  });

  it("calibrating from both demo logs recovers the stated slip within 0.03 and the VE within 3 %", () => {
    const r = fit(runs);
    expect(Math.abs(r.combination.blower.volumetricEfficiencyRef - DEMO_TRUTH.blowerVolumetricEfficiency)).toBeLessThan(0.03);
    expect(r.fitted.map((f) => f.parameter)).toContain("blower.volumetricEfficiencyRef");
    expect(veError(r.combination.engine.veCurve)).toBeLessThan(0.03);
    // and a pulley neither log used: the fitted truck predicts the true truck within 0.3 psi
    const third = inToM(3.2);
    const rpms = [2500, 3500, 4500];
    const fitted = boostCurve({ ...r.combination, drive: { ...r.combination.drive, blowerPulleyDiameter: third } }, rpms);
    const truth = boostCurve(demoTruth(third), rpms);
    fitted.forEach((p, i) => expect(Math.abs(paToPsi(p.boostGauge - truth[i].boostGauge))).toBeLessThan(0.3));
  });
});
