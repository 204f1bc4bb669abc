// @ts-nocheck
import "server-only";
import { NextResponse } from "next/server";
import type { z } from "zod";
import { FieldError } from "@/lib/errors";
import { PayloadTooLarge, readBodyCapped } from "./body-limit";
import { toFailure } from "./errors";
import { assertSameOrigin, CrossSiteRequest } from "./origin-check";

export { PayloadTooLarge };
export const MAX_JSON_BYTES = 512 * 1024;

export class UnsupportedMediaType extends Error {
  readonly status = 415;
  constructor() {
    super("Send the body as JSON with Content-Type: application/json.");
  }
}

/**
 * Reads a JSON body with a size limit counted while it streams; a bad body is a 400/413/415
 * naming the problem, never a 500. Only a JSON content type is accepted: a form or text/plain
 * post (which any other site can make a browser send) is refused.
 */
export async function readJson(req: Request, maxBytes = MAX_JSON_BYTES): Promise<unknown> {
  const type = (req.headers.get("content-type") ?? "").split(";")[0].trim().toLowerCase();
  if (type !== "application/json" && !/^application\/[\w.+-]+\+json$/.test(type)) throw new UnsupportedMediaType();
  const text = (await readBodyCapped(req, maxBytes)).toString("utf8");
  if (!text.trim()) throw new FieldError("_", "The request body is empty; send a JSON object.");
  try {
    return JSON.parse(text);
  } catch {
    throw new FieldError("_", "The request body is not valid JSON.");
  }
}

export async function parseJson<T extends z.ZodType>(req: Request, schema: T): Promise<z.infer<T>> {
  return schema.parse(await readJson(req));
}

/** Parses URL search params (as a plain object) with a schema. */
export function parseQuery<T extends z.ZodType>(req: Request, schema: T): z.infer<T> {
  return schema.parse(Object.fromEntries(new URL(req.url).searchParams));
}

/** Answers carry people's data: no shared cache (a proxy) and no browser cache may keep them. */
function noStore(res: Response): Response {
  if (!res.headers.has("cache-control")) res.headers.set("Cache-Control", "private, no-store");
  return res;
}

/**
 * Wraps a route handler: writes from another site's pages are refused first, every thrown error
 * becomes a JSON answer with the right status, and every answer is marked not to be cached.
 */
export function route<C>(fn: (req: Request, ctx: C) => Promise<Response | unknown>) {
  return async (req: Request, ctx: C): Promise<Response> => {
    try {
      assertSameOrigin(req);
      const out = await fn(req, ctx);
      return noStore(out instanceof Response ? out : NextResponse.json(out));
    } catch (err) {
      if (err instanceof PayloadTooLarge || err instanceof UnsupportedMediaType || err instanceof CrossSiteRequest) {
        return noStore(NextResponse.json({ error: err.message }, { status: err.status }));
      }
      const f = toFailure(err);
      return noStore(
        NextResponse.json(
          { error: f.message, ...(f.fieldErrors ? { fieldErrors: f.fieldErrors } : {}), ...(f.details ? { details: f.details } : {}) },
          { status: f.status, headers: f.status === 503 ? { "Retry-After": "5" } : undefined },
        ),
      );
    }
  };
}
