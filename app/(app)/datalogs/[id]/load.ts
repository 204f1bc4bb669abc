import "server-only";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { NotFoundError } from "@/lib/errors";
import { getDatalogAnalysis } from "@/db/repo/datalogs";
import { toActor } from "@/db/repo/users";

/** The signed-in user and the log's analysis data; a log they may not see is a 404. */
export async function loadAnalysis(id: string) {
  const user = await requirePageUser();
  const actor = toActor(user);
  try {
    return { user, actor, ...(await getDatalogAnalysis(getDb(), actor, id)) };
  } catch (e) {
    if (e instanceof NotFoundError) notFound();
    throw e;
  }
}
