// @ts-nocheck
// POST {direction: "up" | "down"}: swaps the step with its neighbour; answers the new order of step ids.
import { parseJson, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { moveStep } from "@/db/repo/lessons";
import { moveSchema } from "@/lib/lessons/rules";
import type { StepContext } from "../../../../_shared";

export const dynamic = "force-dynamic";

export const POST = route<StepContext>(async (req, { params }) => {
  const actor = await requireActor();
  const { id, stepId } = await params;
  const { direction } = await parseJson(req, moveSchema);
  return { order: await moveStep(getDb(), actor, id, stepId, direction) };
});
