// @ts-nocheck
// POST: a new class code for the lesson (owner or admin).
import { route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { regenerateClassCode } from "@/db/repo/lessons";
import type { LessonContext } from "../../_shared";

export const dynamic = "force-dynamic";

export const POST = route<LessonContext>(async (_req, { params }) => {
  const actor = await requireActor();
  const { id } = await params;
  const row = await regenerateClassCode(getDb(), actor, id);
  return { classCode: row.classCode };
});
