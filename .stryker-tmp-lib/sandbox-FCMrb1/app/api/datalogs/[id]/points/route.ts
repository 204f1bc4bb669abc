// @ts-nocheck
import { route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { getDatalogPoints } from "@/db/repo/datalogs";

/** The stored samples in SI: rpm, manifold pressure (Pa absolute), intake temperature (K), time (s), throttle (%). */
export const GET = route(async (_req, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await requireActor();
  const { id } = await params;
  const points = await getDatalogPoints(getDb(), actor, id);
  return { units: { rpm: "rev/min", manifoldPressure: "Pa (absolute)", intakeTemperature: "K", time: "s", throttle: "%" }, points };
});
