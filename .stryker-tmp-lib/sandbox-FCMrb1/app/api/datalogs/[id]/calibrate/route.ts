// @ts-nocheck
import { parseJson, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { calibrateFromDatalog, calibrateSchema } from "@/db/repo/datalogs";

/**
 * Fits the VE curve from the log ({ baseRevision, minThrottle?, minBoost?, binWidth?, minSamples?,
 * madLimit? }) and saves it as a new revision of the combination; 409 when baseRevision is stale.
 */
export const POST = route(async (req, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await requireActor();
  const { id } = await params;
  const input = await parseJson(req, calibrateSchema);
  return calibrateFromDatalog(getDb(), actor, id, input);
});
