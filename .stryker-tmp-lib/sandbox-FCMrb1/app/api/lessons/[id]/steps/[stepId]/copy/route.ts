// @ts-nocheck
// POST {item}: copies the step's item (its snapshot spec) into the caller's own combinations.
import { NextResponse } from "next/server";
import { parseJson, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { copyStepItem } from "@/db/repo/lessons";
import { copySchema } from "@/lib/lessons/rules";
import type { StepContext } from "../../../../_shared";

export const dynamic = "force-dynamic";

export const POST = route<StepContext>(async (req, { params }) => {
  const actor = await requireActor();
  const { id, stepId } = await params;
  const row = await copyStepItem(getDb(), actor, id, stepId, await parseJson(req, copySchema));
  return NextResponse.json(row, { status: 201, headers: { Location: `/api/combinations/${row.id}` } });
});
