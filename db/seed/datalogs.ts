// The demo's synthetic datalog: a wide-open-throttle pull of the "Small-block 5.0 L street build",
// generated with calc from an invented "true" VE curve a few percent off the stored one, plus
// seeded noise, a few part-throttle rows and two spikes. Nothing here comes from a real test.
// The same text ships as public/samples/demo-datalog.csv (scripts/write-demo-datalog.ts).
import { and, eq } from "drizzle-orm";
import { combinationSchema, paToPsi, solvePoint, veAt, type CombinationInput, type VePoint } from "@/calc";
import type { Db } from "../connect";
import { createDatalog } from "../repo/datalogs";
import { combinations, datalogs } from "../schema";
import type { DemoCombinations } from "./combinations";
import { smallBlockSmallerPulley } from "@/lib/combinations/demo-specs";
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
 * engine breathing like `trueVeCurve`: Time (s), Engine speed (rpm), Throttle (%), Boost (psi),
 * and optionally Intake air (°F).
 */
export function synthesizeLogCsv(spec: CombinationInput, o: SynthOptions): string {
  const c = combinationSchema.parse(spec);
  const truth = { ...c, engine: { ...c.engine, veCurve: [...o.trueVeCurve] } };
  const from = o.fromRpm ?? 2000;
  const to = o.toRpm ?? 6000;
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

/** The invented "true" breathing of the demo small-block: a few percent off the stored curve. */
export function demoTrueVeCurve(): VePoint[] {
  const stored = combinationSchema.parse(smallBlockSmallerPulley).engine.veCurve;
  const off = [-0.04, -0.03, 0.02, 0.04, 0.05, 0.03];
  return stored.map((p, i) => ({ rpm: p.rpm, ve: Math.round(p.ve * (1 + (off[i] ?? 0)) * 1000) / 1000 }));
}

export const DEMO_DATALOG_NAME = "Dyno pull, 3.1 in pulley (synthetic demo)";
export const DEMO_DATALOG_FILE = "demo-datalog.csv";

/** The demo log's text: also written to public/samples/demo-datalog.csv. */
export function demoDatalogCsv(): string {
  return synthesizeLogCsv(smallBlockSmallerPulley, {
    trueVeCurve: demoTrueVeCurve(),
    noisePsi: 0.15,
    noiseF: 1.5,
    seed: 20240611,
    partThrottleRows: 8,
    outlierRows: [57, 263],
  });
}

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
  const [combo] = await db.select({ id: combinations.id }).from(combinations).where(eq(combinations.id, combos.smallBlock));
  if (!combo) return;
  const [existing] = await db
    .select({ id: datalogs.id })
    .from(datalogs)
    .where(and(eq(datalogs.combinationId, combo.id), eq(datalogs.name, DEMO_DATALOG_NAME)));
  if (existing) return;
  await createDatalog(db, people.tuner, {
    combinationId: combo.id,
    name: DEMO_DATALOG_NAME,
    fileName: DEMO_DATALOG_FILE,
    text: demoDatalogCsv(),
    mapping: { ...DEMO_DATALOG_MAPPING },
  });
}

/** VE of the demo's true curve at an engine speed (for tests and the sample's documentation). */
export const demoTrueVeAt = (rpm: number) => veAt(demoTrueVeCurve(), rpm);
