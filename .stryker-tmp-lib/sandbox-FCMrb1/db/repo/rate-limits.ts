// @ts-nocheck
import { and, count, eq, gt, lt, sql } from "drizzle-orm";
import type { DbOrTx } from "../connect";
import { inKeyOrder } from "../keyed-queue";
import { rateLimitHits } from "../schema";

const LOCK_BUCKET = 73; // advisory-lock class for rate-limit buckets (see users.ts for the others)

/**
 * Counts one hit against `bucket` if fewer than `max` were counted in the last `windowMs`, under
 * an advisory lock on the bucket so that parallel requests cannot all pass. True when allowed.
 * Every instance shares the table, so a limit holds across instances.
 */
export async function takeHit(db: DbOrTx, bucket: string, max: number, windowMs: number): Promise<boolean> {
  return inKeyOrder([`bucket:${bucket}`], () => db.transaction(async (tx) => {
    await tx.execute(sql`select pg_advisory_xact_lock(${LOCK_BUCKET}, hashtext(${bucket}))`);
    const since = new Date(Date.now() - windowMs);
    const [{ n }] = await tx.select({ n: count() }).from(rateLimitHits).where(and(eq(rateLimitHits.bucket, bucket), gt(rateLimitHits.createdAt, since)));
    if (n >= max) return false;
    await tx.insert(rateLimitHits).values({ bucket });
    return true;
  }));
}

/** Drops hits older than a day (every window is shorter); the mail sender calls it now and then. */
export async function pruneHits(db: DbOrTx) {
  await db.delete(rateLimitHits).where(lt(rateLimitHits.createdAt, new Date(Date.now() - 24 * 3600_000)));
}
