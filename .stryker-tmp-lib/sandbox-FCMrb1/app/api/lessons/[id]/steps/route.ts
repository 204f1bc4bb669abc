// @ts-nocheck
// A lesson's steps: GET in order (anyone who may read the lesson), POST adds one at the end (owner or admin).
import { NextResponse } from "next/server";
import { parseJson, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { addStep, getLesson } from "@/db/repo/lessons";
import { stepInputSchema } from "@/lib/lessons/rules";
import type { LessonContext } from "../../_shared";

export const dynamic = "force-dynamic";

export const GET = route<LessonContext>(async (_req, { params }) => {
  const actor = await requireActor();
  const { id } = await params;
  return (await getLesson(getDb(), actor, id)).steps;
});

export const POST = route<LessonContext>(async (req, { params }) => {
  const actor = await requireActor();
  const { id } = await params;
  const step = await addStep(getDb(), actor, id, await parseJson(req, stepInputSchema));
  return NextResponse.json(step, { status: 201 });
});
