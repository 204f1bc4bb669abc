// @ts-nocheck
import { route, parseJson } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { deleteBlower, updateBlower } from "@/db/repo/shelf";
import { blowerRecordSchema } from "@/lib/shelf/rules";

type Ctx = { params: Promise<{ id: string }> };

/** Replaces a blower's details (admin). */
export const PUT = route(async (req, { params }: Ctx) => {
  const actor = await requireActor(["admin"]);
  const { id } = await params;
  return updateBlower(getDb(), actor, id, await parseJson(req, blowerRecordSchema));
});

export const DELETE = route(async (_req, { params }: Ctx) => {
  const actor = await requireActor(["admin"]);
  const { id } = await params;
  await deleteBlower(getDb(), actor, id);
  return { ok: true };
});
