// @ts-nocheck
// One step: PATCH replaces it (items re-resolved, unchanged ones keep their snapshot), DELETE removes it.
import { NextResponse } from "next/server";
import { parseJson, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { deleteStep, updateStep } from "@/db/repo/lessons";
import { stepInputSchema } from "@/lib/lessons/rules";
import type { StepContext } from "../../../_shared";

export const dynamic = "force-dynamic";

export const PATCH = route<StepContext>(async (req, { params }) => {
  const actor = await requireActor();
  const { id, stepId } = await params;
  return updateStep(getDb(), actor, id, stepId, await parseJson(req, stepInputSchema));
});

export const DELETE = route<StepContext>(async (_req, { params }) => {
  const actor = await requireActor();
  const { id, stepId } = await params;
  await deleteStep(getDb(), actor, id, stepId);
  return new NextResponse(null, { status: 204 });
});
