// @ts-nocheck
import { z } from "zod";
import { route, parseQuery } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { exportShelfCsv } from "@/db/repo/shelf-csv";
import { shelfKindSchema } from "@/lib/shelf/rules";

/** The shelf as CSV, in the columns the import reads. */
export const GET = route(async (req) => {
  const actor = await requireActor();
  const { kind } = parseQuery(req, z.object({ kind: shelfKindSchema }));
  const csv = await exportShelfCsv(getDb(), actor, kind);
  const day = new Date().toISOString().slice(0, 10);
  return new Response(csv + "\n", {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="shelf-${kind}-${day}.csv"`,
      "cache-control": "no-store",
    },
  });
});
