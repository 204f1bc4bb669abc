// @ts-nocheck
// One lesson: GET (owner, admin, or a member of the published lesson), PATCH title/summary/published
// and DELETE (owner or admin).
import { NextResponse } from "next/server";
import { parseJson, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { deleteLesson, getLesson, updateLesson } from "@/db/repo/lessons";
import { updateLessonSchema } from "@/lib/lessons/rules";
import { lessonJson, type LessonContext } from "../_shared";

export const dynamic = "force-dynamic";

export const GET = route<LessonContext>(async (_req, { params }) => {
  const actor = await requireActor();
  const { id } = await params;
  return lessonJson(await getLesson(getDb(), actor, id));
});

export const PATCH = route<LessonContext>(async (req, { params }) => {
  const actor = await requireActor();
  const { id } = await params;
  return updateLesson(getDb(), actor, id, await parseJson(req, updateLessonSchema.strict()));
});

export const DELETE = route<LessonContext>(async (_req, { params }) => {
  const actor = await requireActor();
  const { id } = await params;
  await deleteLesson(getDb(), actor, id);
  return new NextResponse(null, { status: 204 });
});
