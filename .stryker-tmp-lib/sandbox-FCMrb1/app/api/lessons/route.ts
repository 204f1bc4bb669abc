// @ts-nocheck
// Lessons: GET the caller's authored and joined lessons; POST creates one (instructors and admins).
import { NextResponse } from "next/server";
import { parseJson, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { createLesson, listLessons } from "@/db/repo/lessons";
import { lessonMetaSchema } from "@/lib/lessons/rules";

export const dynamic = "force-dynamic";

export const GET = route(async () => {
  const actor = await requireActor();
  return listLessons(getDb(), actor);
});

export const POST = route(async (req) => {
  const actor = await requireActor();
  const row = await createLesson(getDb(), actor, await parseJson(req, lessonMetaSchema));
  return NextResponse.json(row, { status: 201, headers: { Location: `/api/lessons/${row.id}` } });
});
