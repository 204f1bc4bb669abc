// @ts-nocheck
// POST {code}: join the published lesson with this class code (read-only access to it alone).
import { parseJson, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { joinLesson } from "@/db/repo/lessons";
import { joinSchema } from "@/lib/lessons/rules";

export const dynamic = "force-dynamic";

export const POST = route(async (req) => {
  const actor = await requireActor();
  return joinLesson(getDb(), actor, await parseJson(req, joinSchema));
});
