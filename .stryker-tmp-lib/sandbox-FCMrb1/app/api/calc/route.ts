// @ts-nocheck
// POST /api/calc: the model on the server for API users and the load benchmark. One JSON body
// names the operation; every input is checked with calc's own schemas (400 naming the field).
import { z } from "zod";
import {
  boostCurve,
  cautionOptionsSchema,
  cautions,
  combinationSchema,
  pulleyDiameterListSchema,
  pulleyForBoost,
  pulleySweep,
  rpmListSchema,
  rpmSchema,
  solvePoint,
  targetBoostSchema,
} from "@/calc";
import { parseJson, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";

const combination = combinationSchema;

const calcRequestSchema = z.discriminatedUnion(
  "op",
  [
    z.object({ op: z.literal("point"), combination, rpm: rpmSchema }),
    z.object({ op: z.literal("curve"), combination, rpms: rpmListSchema }),
    z.object({ op: z.literal("sweep"), combination, rpm: rpmSchema, diameters: pulleyDiameterListSchema.min(1, "Give at least one pulley diameter"), options: cautionOptionsSchema.optional() }),
    z.object({ op: z.literal("pulleyForBoost"), combination, rpm: rpmSchema, targetBoostGauge: targetBoostSchema, stockDiameters: pulleyDiameterListSchema.optional() }),
    z.object({ op: z.literal("cautions"), combination, rpms: rpmListSchema, options: cautionOptionsSchema.optional() }),
  ],
  { error: 'op must be one of "point", "curve", "sweep", "pulleyForBoost", "cautions"' },
);

export const POST = route(async (req) => {
  await requireActor();
  const body = await parseJson(req, calcRequestSchema);
  switch (body.op) {
    case "point":
      return { point: solvePoint(body.combination, body.rpm) };
    case "curve":
      return { points: boostCurve(body.combination, body.rpms) };
    case "sweep":
      return { rows: pulleySweep(body.combination, body.rpm, body.diameters, body.options) };
    case "pulleyForBoost":
      return pulleyForBoost(body.combination, body.rpm, body.targetBoostGauge, body.stockDiameters);
    case "cautions": {
      const points = boostCurve(body.combination, body.rpms);
      return { cautions: cautions(body.combination, points, body.options), points };
    }
  }
});
