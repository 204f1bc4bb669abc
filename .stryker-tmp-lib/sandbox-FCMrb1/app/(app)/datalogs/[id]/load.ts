// @ts-nocheck
import "server-only";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { NotFoundError } from "@/lib/errors";
import { getDatalogAnalysis, listDatalogs } from "@/db/repo/datalogs";
import type { Actor } from "@/db/policy";
import { toActor } from "@/db/repo/users";

/** The signed-in user and the log's analysis data; a log they may not see is a 404. */
export async function loadAnalysis(id: string) {
  const user = await requirePageUser();
  const actor = toActor(user);
  try {
    return { user, actor, ...(await getDatalogAnalysis(getDb(), actor, id)) };
  } catch (e) {
    if (e instanceof NotFoundError) notFound();
    throw e;
  }
}

/** Logs a calibration may pick from: the combination's newest ten, each with its points and the pulley it was logged at. */
export async function loadCombinationLogs(actor: Actor, combinationId: string) {
  const list = (await listDatalogs(getDb(), actor, { combinationId })).slice(0, 10);
  const all = await Promise.all(list.map((l) => getDatalogAnalysis(getDb(), actor, l.id)));
  return all.map((a) => ({ id: a.log.id, name: a.log.name, revision: a.log.revision, blowerPulleyDiameter: a.loggedSpec.drive.blowerPulleyDiameter, points: a.points, ambient: a.ambient }));
}
