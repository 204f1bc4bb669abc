// @ts-nocheck
// The demo's synthetic datalogs: two wide-open-throttle pulls of the work truck, one at the 3.4 in
// blower pulley it came in with and one at the 3.1 in pulley fitted after the first log. Both are
// generated with calc from a STATED invented truth that differs from the catalogue figures the
// combination holds (DEMO_TRUTH below: a blower that slips more than its data sheet says, and an
// engine that breathes a few percent better), plus seeded noise, a few part-throttle rows and two
// spikes. Calibrating from the two logs recovers that truth (tests/lib/datalogs/demo-logs.test.ts).
// Nothing here comes from a real test. The same texts ship in public/samples/
// (scripts/write-demo-datalog.ts).
import { and, eq } from "drizzle-orm";
import { combinationSchema, paToPsi, solvePoint, veAt, type Combination, type CombinationInput, type VePoint } from "@/calc";
import type { Db } from "../connect";
import { createDatalog } from "../repo/datalogs";
import { combinations, datalogs } from "../schema";
import type { DemoCombinations } from "./combinations";
import { workTruckV6, workTruckV6SmallerPulley } from "@/lib/combinations/demo-specs";
import type { DemoUsers } from "./index";

/** Deterministic PRNG (mulberry32): the same seed gives the same log on every machine. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal draws from a uniform source (Box–Muller). */
function gaussian(rand: () => number): () => number {
  return () => Math.sqrt(-2 * Math.log(1 - rand())) * Math.cos(2 * Math.PI * rand());
}

export interface SynthOptions {
  /** The engine's "true" VE curve, used instead of the spec's to make the measurements. */
  trueVeCurve: readonly VePoint[];
  /** The blower's "true" volumetric efficiency at its reference point (its slip), instead of the spec's. */
  trueBlowerVolumetricEfficiency?: number;
  fromRpm?: number;
  toRpm?: number;
  /** Wide-open-throttle rows in the sweep. */
  samples?: number;
  /** Standard deviation of the boost noise (psi). */
  noisePsi?: number;
  /** Standard deviation of the intake temperature noise (°F). */
  noiseF?: number;
  seed?: number;
  /** Part-throttle rows before the pull. */
  partThrottleRows?: number;
  /** Rows (indexes in the sweep) given a spike of +4 psi. */
  outlierRows?: readonly number[];
  /** Decimal places of the boost column (psi). */
  pressureDigits?: number;
  /** Write the intake air temperature column (°F). */
  intakeTemperature?: boolean;
}

/**
 * A CSV log (comma-separated, header row, psi gauge, °F) that calc predicts for `spec` with the
 * engine breathing like `trueVeCurve` (and the blower slipping as `trueBlowerVolumetricEfficiency`): Time (s), Engine speed (rpm), Throttle (%), Boost (psi),
 * and optionally Intake air (°F).
 */
export function synthesizeLogCsv(spec: CombinationInput, o: SynthOptions): string {
  const c = combinationSchema.parse(spec);
  const blower = { ...c.blower, volumetricEfficiencyRef: o.trueBlowerVolumetricEfficiency ?? c.blower.volumetricEfficiencyRef };
  const truth: Combination = { ...c, blower, engine: { ...c.engine, veCurve: [...o.trueVeCurve] } };
  const from = o.fromRpm ?? 2000;
  const to = o.toRpm ?? Math.min(6000, c.engine.redlineRpm);
  const n = o.samples ?? 401;
  const rand = seededRandom(o.seed ?? 7);
  const normal = gaussian(rand);
  const noise = o.noisePsi ?? 0;
  const noiseF = o.noiseF ?? 0;
  const digits = o.pressureDigits ?? 2;
  const withT = o.intakeTemperature ?? true;
  const spikes = new Set(o.outlierRows ?? []);
  const header = ["Time (s)", "Engine speed (rpm)", "Throttle (%)", "Boost (psi)", ...(withT ? ["Intake air (°F)"] : [])];
  const rows: string[] = [header.join(",")];
  let t = 0;
  const ambientF = ((c.ambient.temperature - 273.15) * 9) / 5 + 32;
  for (let i = 0; i < (o.partThrottleRows ?? 0); i++) {
    // Cruising before the pull: part throttle, manifold vacuum.
    const rpm = Math.round(from - 300 + 20 * i);
    rows.push([t.toFixed(2), rpm, (25 + 5 * rand()).toFixed(1), (-6 + rand()).toFixed(digits), ...(withT ? [(ambientF + 10).toFixed(1)] : [])].join(","));
    t += 0.1;
  }
  for (let i = 0; i < n; i++) {
    const rpm = Math.round(from + ((to - from) * i) / (n - 1));
    const p = solvePoint(truth, rpm);
    let psi = paToPsi(p.boostGauge) + noise * normal();
    if (spikes.has(i)) psi += 4;
    const tf = ((p.manifoldTemperature - 273.15) * 9) / 5 + 32 + noiseF * normal();
    const throttle = 97 + 3 * rand();
    rows.push([t.toFixed(2), rpm, throttle.toFixed(1), psi.toFixed(digits), ...(withT ? [tf.toFixed(1)] : [])].join(","));
    t += 0.02;
  }
  return rows.join("\n") + "\n";
}

/**
 * The stated invented truth behind the demo logs. The combination holds the catalogue figures;
 * the truck's real blower slips more (volumetric efficiency 0.74 at its reference point against
 * the data sheet's 0.82), and its engine breathes a few percent better than the VE curve typed in.
 */
export const DEMO_TRUTH = {
  blowerVolumetricEfficiency: 0.74,
  /** Relative VE offsets, one per point of the stored curve. */
  veOffsets: [0.02, 0.03, 0.04, 0.04, 0.03],
} as const;

/** The truck's "true" VE curve: the stored one moved by DEMO_TRUTH.veOffsets. */
export function demoTrueVeCurve(): VePoint[] {
  const stored = combinationSchema.parse(workTruckV6).engine.veCurve;
  return stored.map((p, i) => ({ rpm: p.rpm, ve: Math.round(p.ve * (1 + (DEMO_TRUTH.veOffsets[i] ?? 0)) * 1000) / 1000 }));
}

/** The truck as it really is, at a blower pulley diameter (m): the truth the logs were made from. */
export function demoTruth(blowerPulleyDiameter: number): Combination {
  const c = combinationSchema.parse(workTruckV6);
  return {
    ...c,
    engine: { ...c.engine, veCurve: demoTrueVeCurve() },
    blower: { ...c.blower, volumetricEfficiencyRef: DEMO_TRUTH.blowerVolumetricEfficiency },
    drive: { ...c.drive, blowerPulleyDiameter },
  };
}

/** The two demo logs: the pull before the pulley swap and the one after. */
export const DEMO_DATALOGS = [
  { name: "Dyno pull, 3.4 in pulley (synthetic demo)", fileName: "demo-datalog.csv", spec: workTruckV6, seed: 4301 },
  { name: "Dyno pull, 3.0 in pulley (synthetic demo)", fileName: "demo-datalog-3.0in.csv", spec: workTruckV6SmallerPulley, seed: 4302 },
] as const;

/** The first log's name (the one before the pulley swap). */
export const DEMO_DATALOG_NAME = DEMO_DATALOGS[0].name;

/** A demo log's text, as stored by the seed and written to public/samples/. */
export function demoLogCsv(log: (typeof DEMO_DATALOGS)[number]): string {
  return synthesizeLogCsv(log.spec, {
    trueVeCurve: demoTrueVeCurve(),
    trueBlowerVolumetricEfficiency: DEMO_TRUTH.blowerVolumetricEfficiency,
    fromRpm: 1800,
    noisePsi: 0.15,
    noiseF: 1.5,
    seed: log.seed,
    partThrottleRows: 8,
    outlierRows: [57, 263],
  });
}

/** The first demo log's text (public/samples/demo-datalog.csv). */
export const demoDatalogCsv = () => demoLogCsv(DEMO_DATALOGS[0]);

/** The columns of the demo file, as the upload form's mapping step would set them. */
export const DEMO_DATALOG_MAPPING = {
  delimiter: ",",
  decimalComma: false,
  hasHeader: true,
  time: 0,
  rpm: 1,
  throttle: 2,
  pressure: 3,
  pressureKind: "gauge",
  pressureUnit: "psi",
  intakeTemperature: 4,
  temperatureUnit: "F",
} as const;

export async function seedDatalogs(db: Db, people: DemoUsers, combos: DemoCombinations) {
  const [combo] = await db.select({ id: combinations.id }).from(combinations).where(eq(combinations.id, combos.workTruck));
  if (!combo) return;
  for (const log of DEMO_DATALOGS) {
    const [existing] = await db
      .select({ id: datalogs.id })
      .from(datalogs)
      .where(and(eq(datalogs.combinationId, combo.id), eq(datalogs.name, log.name)));
    if (existing) continue;
    await createDatalog(db, people.tuner, {
      combinationId: combo.id,
      name: log.name,
      fileName: log.fileName,
      text: demoLogCsv(log),
      mapping: { ...DEMO_DATALOG_MAPPING },
    });
  }
}

/** VE of the demo's true curve at an engine speed (for tests and the sample's documentation). */
export const demoTrueVeAt = (rpm: number) => veAt(demoTrueVeCurve(), rpm);
