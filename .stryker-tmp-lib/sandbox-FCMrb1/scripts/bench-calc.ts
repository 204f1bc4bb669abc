// @ts-nocheck
// Times one full planner recompute of the computational core and compares it with the same
// work done by the closed-form ratio rule. Run: npx tsx scripts/bench-calc.ts (or npm run bench).
import {
  boostCurve,
  combinationSchema,
  exampleCombination,
  pulleyForBoost,
  pulleySweep,
  psiToPa,
  veAt,
} from "../calc/index";
import { idealRatioRulePrepared, prepare } from "../calc/solve";
import { quantile } from "./stats";

const TARGET_MS = 0.5;
const WARMUP_RUNS = 300;
const MEASURED_RUNS = 2000;

const combination = exampleCombination();
const rpms = Array.from({ length: 56 }, (_, i) => 1000 + i * 100); // 1000–6500 rpm
const curvePulleys = [0.07, 0.075, 0.08, 0.085, 0.09]; // m
const ladder = Array.from({ length: 30 }, (_, i) => 0.06 + i * 0.002); // 60–118 mm
const finderRpm = 5000;
const finderTarget = psiToPa(8);
const shelf = [0.065, 0.07, 0.075, 0.08, 0.085, 0.09, 0.095, 0.1];

/** The planner's full recompute with the model. */
function modelRecompute(): number {
  let sink = 0;
  for (const d of curvePulleys) {
    const points = boostCurve({ ...combination, drive: { ...combination.drive, blowerPulleyDiameter: d } }, rpms);
    sink += points[points.length - 1].boostGauge;
  }
  for (const row of pulleySweep(combination, finderRpm, ladder)) sink += row.point?.boostGauge ?? 0;
  sink += pulleyForBoost(combination, finderRpm, finderTarget, shelf).diameter;
  return sink;
}

/** The same work with the closed-form ratio rule (validated once per call, as the model is). */
function ratioRuleRecompute(): number {
  let sink = 0;
  for (const d of curvePulleys) {
    const c = combinationSchema.parse({ ...combination, drive: { ...combination.drive, blowerPulleyDiameter: d } });
    const p = prepare(c);
    for (const n of rpms) sink += idealRatioRulePrepared(p, n);
  }
  const c = combinationSchema.parse(combination);
  for (const d of ladder) sink += idealRatioRulePrepared(prepare(c, d), finderRpm);
  const cf = combinationSchema.parse(combination);
  const p = prepare(cf);
  const pm = cf.ambient.pressure + finderTarget;
  const ve = veAt(cf.engine.veCurve, finderRpm);
  sink += (2 * cf.drive.crankPulleyDiameter * (1 - cf.drive.beltSlip) * p.p1 * p.vb) / (cf.engine.displacement * ve * pm);
  return sink;
}

function timeRuns(fn: () => number): { median: number; p95: number; mean: number } {
  let sink = 0;
  for (let i = 0; i < WARMUP_RUNS; i++) sink += fn();
  const samples = new Float64Array(MEASURED_RUNS);
  for (let i = 0; i < MEASURED_RUNS; i++) {
    const t0 = performance.now();
    sink += fn();
    samples[i] = performance.now() - t0;
  }
  if (!Number.isFinite(sink)) throw new Error("benchmark produced a non-finite result");
  return { median: quantile(samples, 0.5), p95: quantile(samples, 0.95), mean: samples.reduce((s, v) => s + v, 0) / samples.length };
}

const work = `${curvePulleys.length} boost curves × ${rpms.length} engine speeds + a ${ladder.length}-size pulley ladder + one pulley finder`;
const model = timeRuns(modelRecompute);
const rule = timeRuns(ratioRuleRecompute);
const ms = (v: number): string => `${v.toFixed(3)} ms`;

console.log("Pulleywright calc benchmark: one full planner recompute");
console.log(`  work:              ${work}`);
console.log(`  runs:              ${MEASURED_RUNS} measured after ${WARMUP_RUNS} warm-up (Node ${process.version})`);
console.log(`  model     median:  ${ms(model.median)}   p95: ${ms(model.p95)}   mean: ${ms(model.mean)}`);
console.log(`  ratio rule median: ${ms(rule.median)}   p95: ${ms(rule.p95)}   mean: ${ms(rule.mean)}`);
console.log(`  model / ratio rule (median): ${(model.median / rule.median).toFixed(1)}×`);
console.log(`  target: median under ${TARGET_MS} ms — ${model.median < TARGET_MS ? "MET" : "NOT MET"}`);
if (model.median >= TARGET_MS) process.exitCode = 1;
