// @ts-nocheck
// Measured logs: upload (parsed on the server, stored all-or-nothing), read, delete, and the VE
// calibration that saves a new revision of the combination. Members work on their own logs;
// staff on the shop's; nobody else sees a log (db/policy.ts canReadOwned without the demo rule).
import { and, asc, desc, eq, isNull, type SQL } from "drizzle-orm";
import { z, ZodError } from "zod";
import {
  checkLogText,
  cleanLog,
  cleaningSchema,
  datalogMappingSchema,
  DATALOG_LIMITS,
  logAmbientSchema,
  parseLog,
  type CleaningInput,
  type LogAmbient,
  type LogPoint,
} from "@/lib/datalogs/parse";
import { fitVe, NoUsableBinsError, specAsLogged, TooManyBinsError, withFittedVe } from "@/lib/datalogs/analysis";
import { CalcInputError, combinationSchema, type Combination } from "@/calc";
import { fitRuns, type LogRun } from "@/lib/datalogs/runs";
import type { DbOrTx } from "../connect";
import { FieldError, NotFoundError } from "@/lib/errors";
import { assert, canReadOwned, canWriteOwned, isShopStaff, type Actor } from "../policy";
import { combinations, datalogPoints, datalogs, users, type DatalogRow } from "../schema";
import { getCombination, getRevision, saveCombination } from "@/db/repo/combinations";

export const createDatalogSchema = z.object({
  combinationId: z.uuid("Pick a combination."),
  name: z.string().trim().min(1, "Give the log a name.").max(120, "Name must be at most 120 characters."),
  fileName: z.string().trim().min(1, "File name is missing.").max(200, "File name must be at most 200 characters."),
  text: z.string({ error: "The file text is missing." }).max(DATALOG_LIMITS.maxBytes, `The file is larger than ${DATALOG_LIMITS.maxBytes / 1024 / 1024} MB.`),
  mapping: datalogMappingSchema,
  /** Barometer and air temperature at the time of the log; the combination's when left out. */
  ambient: logAmbientSchema.nullish(),
  /** Store every readable row and list the unreadable ones instead of refusing the file. */
  skipUnreadable: z.boolean({ error: "skipUnreadable must be true or false." }).optional().default(false),
});
export type CreateDatalogInput = z.input<typeof createDatalogSchema>;

export const calibrateSchema = cleaningSchema.extend({
  /** The revision of the combination the person saw; the save is refused (409) if someone saved since. */
  baseRevision: z.number({ error: "baseRevision (the revision you started from) is required." }).int().min(1),
  /** The combination's logs to fit together (runs at one or more pulley sizes); this log alone when left out. */
  logIds: z.array(z.uuid("logIds must hold log ids."), { error: "logIds must be a list of log ids." }).min(1, "Choose at least one log.").max(10, "Choose at most 10 logs.").optional(),
});
export type CalibrateInput = z.input<typeof calibrateSchema>;

/** Bytes of JSON a POST of a log may carry: the file limit plus room for escaping and the mapping. */
export const MAX_UPLOAD_JSON_BYTES = Math.ceil(DATALOG_LIMITS.maxBytes * 1.3) + 64 * 1024;

function visibleTo(actor: Actor): SQL | undefined {
  return isShopStaff(actor) ? undefined : eq(datalogs.ownerId, actor.id);
}

export async function listDatalogs(db: DbOrTx, actor: Actor, opts: { combinationId?: string } = {}) {
  const conds: (SQL | undefined)[] = [visibleTo(actor), isNull(combinations.deletedAt)];
  if (opts.combinationId) {
    if (!z.uuid().safeParse(opts.combinationId).success) return [];
    conds.push(eq(datalogs.combinationId, opts.combinationId));
  }
  return db
    .select({
      id: datalogs.id,
      name: datalogs.name,
      fileName: datalogs.fileName,
      combinationId: datalogs.combinationId,
      combinationName: combinations.name,
      revision: datalogs.revision,
      pointCount: datalogs.pointCount,
      ownerId: datalogs.ownerId,
      ownerName: users.name,
      createdAt: datalogs.createdAt,
    })
    .from(datalogs)
    .innerJoin(combinations, eq(combinations.id, datalogs.combinationId))
    .innerJoin(users, eq(users.id, datalogs.ownerId))
    .where(and(...conds))
    .orderBy(desc(datalogs.createdAt), asc(datalogs.id));
}

/** A log `actor` may read; 404 when it does not exist or is not theirs to see (no hint which). */
export async function getDatalog(db: DbOrTx, actor: Actor, id: string): Promise<DatalogRow & { ambient: LogAmbient | null }> {
  if (!z.uuid().safeParse(id).success) throw new NotFoundError("No such log.");
  const [row] = await db.select().from(datalogs).where(eq(datalogs.id, id));
  if (!row || !canReadOwned(actor, row.ownerId)) throw new NotFoundError("No such log.");
  return row as DatalogRow & { ambient: LogAmbient | null };
}

/** The stored samples in file order (SI). */
export async function getDatalogPoints(db: DbOrTx, actor: Actor, id: string): Promise<LogPoint[]> {
  await getDatalog(db, actor, id);
  return db
    .select({
      line: datalogPoints.line,
      time: datalogPoints.time,
      rpm: datalogPoints.rpm,
      manifoldPressure: datalogPoints.manifoldPressure,
      intakeTemperature: datalogPoints.intakeTemperature,
      throttle: datalogPoints.throttle,
    })
    .from(datalogPoints)
    .where(eq(datalogPoints.datalogId, id))
    .orderBy(asc(datalogPoints.seq));
}

/** Bad lines become field errors on `text`, each naming its line, so the form lists them all. */
function lineErrors(messages: string[]): ZodError {
  return new ZodError(messages.map((message) => ({ code: "custom" as const, path: ["text"], message, input: undefined })));
}

/**
 * Parses the file on the server (the browser's preview is never trusted) and stores the log with
 * all its points in one transaction: a file with one bad line stores nothing.
 */
export async function createDatalog(db: DbOrTx, actor: Actor, input: CreateDatalogInput) {
  const v = createDatalogSchema.parse(input);
  const combo = await getCombination(db, actor, v.combinationId);
  assert(canWriteOwned(actor, combo.ownerId), "You can upload logs only for your own combinations.");
  const textProblem = checkLogText(v.text);
  if (textProblem) throw new FieldError("text", textProblem);
  const ambient: LogAmbient = v.ambient ?? { pressure: combo.spec.ambient.pressure, temperature: combo.spec.ambient.temperature };
  const parsed = parseLog(v.text, v.mapping, ambient.pressure);
  if (parsed.fatal) throw new FieldError("text", parsed.fatal);
  if (parsed.errors.length && !v.skipUnreadable) {
    const more = parsed.moreErrors ? [`…and ${parsed.moreErrors} more lines with errors.`] : [];
    throw lineErrors([...parsed.errors.map((e) => e.message), ...more]);
  }
  if (parsed.points.length === 0) throw new FieldError("text", parsed.skipped.length ? "No line of the file is readable; nothing to keep." : "The file has no data rows.");
  const skipped = v.skipUnreadable ? parsed.skipped : [];
  // All-or-nothing for what is kept: the log and every readable row in one transaction.
  const log = await db.transaction(async (tx) => {
    const [log] = await tx
      .insert(datalogs)
      .values({
        ownerId: actor.id,
        combinationId: combo.id,
        revision: combo.revision,
        name: v.name,
        fileName: v.fileName,
        rawText: v.text,
        mapping: v.mapping,
        ambient,
        pointCount: parsed.points.length,
      })
      .returning();
    // 7 parameters a row: 4000 rows stay well under PostgreSQL's 65 535 parameters per statement.
    for (let i = 0; i < parsed.points.length; i += 4000) {
      await tx.insert(datalogPoints).values(
        parsed.points.slice(i, i + 4000).map((p, j) => ({
          datalogId: log.id,
          seq: i + j,
          line: p.line,
          time: p.time,
          rpm: p.rpm,
          manifoldPressure: p.manifoldPressure,
          intakeTemperature: p.intakeTemperature,
          throttle: p.throttle,
        })),
      );
    }
    return log;
  });
  return { ...log, skipped };
}

export async function deleteDatalog(db: DbOrTx, actor: Actor, id: string) {
  const log = await getDatalog(db, actor, id);
  assert(canWriteOwned(actor, log.ownerId), "You cannot delete this log.");
  await db.delete(datalogs).where(eq(datalogs.id, id));
}

/** Everything the analysis pages need: the log, its points, the spec as logged and the combination now. */
export async function getDatalogAnalysis(db: DbOrTx, actor: Actor, id: string) {
  const log = await getDatalog(db, actor, id);
  const [points, combination] = await Promise.all([getDatalogPoints(db, actor, id), getCombination(db, actor, log.combinationId)]);
  const revision = await getRevision(db, actor, log.combinationId, log.revision);
  const ambient = log.ambient ?? { pressure: revision.spec.ambient.pressure, temperature: revision.spec.ambient.temperature };
  return { log, points, ambient, combination, loggedSpec: specAsLogged(revision.spec, ambient) };
}

/**
 * Fits the VE curve from the log (the same cleaning the page shows) and saves the current spec
 * with that curve as a new revision, noted with the log's name. A stale baseRevision is a 409.
 */
export async function calibrateFromDatalog(db: DbOrTx, actor: Actor, id: string, input: CalibrateInput) {
  const v = calibrateSchema.parse(input);
  const { log, points, ambient, combination, loggedSpec } = await getDatalogAnalysis(db, actor, id);
  assert(canWriteOwned(actor, combination.ownerId), "You can view this combination but not change it.");
  if (v.logIds) return calibrateFromLogs(db, actor, log, combination, v);
  const cleaned = cleanLog(points, ambient.pressure, v as CleaningInput);
  let fit;
  try {
    fit = fitVe(loggedSpec, cleaned.bins);
  } catch (e) {
    if (e instanceof NoUsableBinsError || e instanceof TooManyBinsError) throw new FieldError(e.field, e.message);
    throw e;
  }
  const spec: Combination = withFittedVe(combination.spec, fit.veCurve);
  const saved = await saveCombination(db, actor, combination.id, { spec, baseRevision: v.baseRevision, note: `VE calibrated from log “${log.name}”` });
  return { combinationId: combination.id, revision: saved.revision, veCurve: fit.veCurve, residuals: fit.residuals };
}

/** Slip (with two or more pulley sizes) and VE fitted to the chosen logs of the same combination, saved as a new revision. */
async function calibrateFromLogs(db: DbOrTx, actor: Actor, log: DatalogRow, combination: { id: string; spec: unknown }, v: z.output<typeof calibrateSchema>) {
  const ids = [...new Set(v.logIds)];
  const logs = await Promise.all(ids.map((id) => getDatalogAnalysis(db, actor, id)));
  const stranger = logs.find((l) => l.log.combinationId !== log.combinationId);
  if (stranger) throw new FieldError("logIds", `Log “${stranger.log.name}” belongs to another combination.`);
  const runs: LogRun[] = logs.map((l) => ({ id: l.log.id, name: l.log.name, blowerPulleyDiameter: l.loggedSpec.drive.blowerPulleyDiameter, bins: cleanLog(l.points, l.ambient.pressure, v as CleaningInput).bins }));
  let fit;
  try {
    fit = fitRuns(combinationSchema.parse(combination.spec), runs);
  } catch (e) {
    if (e instanceof CalcInputError) throw new FieldError("logIds", e.message);
    if (e instanceof Error && !(e instanceof ZodError)) throw new FieldError("logIds", e.message);
    throw e;
  }
  const names = logs.map((l) => `“${l.log.name}”`).join(", ");
  const what = fit.fitted.some((f) => f.parameter === "blower.volumetricEfficiencyRef") ? "Slip and VE" : "VE";
  const saved = await saveCombination(db, actor, combination.id, { spec: fit.calibrated, baseRevision: v.baseRevision, note: `${what} calibrated from ${logs.length === 1 ? "log" : "logs"} ${names}` });
  return { combinationId: combination.id, revision: saved.revision, fitted: fit.fitted, residuals: fit.residuals };
}
