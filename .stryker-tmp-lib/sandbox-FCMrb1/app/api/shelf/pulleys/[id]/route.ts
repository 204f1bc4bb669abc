// @ts-nocheck
import { route, parseJson } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { deletePulley, updatePulley } from "@/db/repo/shelf";
import { pulleyRecordSchema } from "@/lib/shelf/rules";

type Ctx = { params: Promise<{ id: string }> };

/** Replaces a pulley's details (admin). */
export const PUT = route(async (req, { params }: Ctx) => {
  const actor = await requireActor(["admin"]);
  const { id } = await params;
  return updatePulley(getDb(), actor, id, await parseJson(req, pulleyRecordSchema));
});

export const DELETE = route(async (_req, { params }: Ctx) => {
  const actor = await requireActor(["admin"]);
  const { id } = await params;
  await deletePulley(getDb(), actor, id);
  return { ok: true };
});
