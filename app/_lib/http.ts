import "server-only";
import { NextResponse } from "next/server";
import type { z } from "zod";
import { FieldError } from "@/lib/errors";
import { toFailure } from "./errors";

export const MAX_JSON_BYTES = 512 * 1024;

/** Reads a JSON body with a size limit; a bad body is a 400/413 naming the problem, never a 500. */
export async function readJson(req: Request, maxBytes = MAX_JSON_BYTES): Promise<unknown> {
  const declared = Number(req.headers.get("content-length") ?? "0");
  if (declared > maxBytes) throw new PayloadTooLarge(maxBytes);
  const text = await req.text();
  if (Buffer.byteLength(text) > maxBytes) throw new PayloadTooLarge(maxBytes);
  if (!text.trim()) throw new FieldError("_", "The request body is empty; send a JSON object.");
  try {
    return JSON.parse(text);
  } catch {
    throw new FieldError("_", "The request body is not valid JSON.");
  }
}

export class PayloadTooLarge extends Error {
  readonly status = 413;
  constructor(readonly limit: number) {
    super(`The request body is larger than ${Math.round(limit / 1024)} kB.`);
  }
}

export async function parseJson<T extends z.ZodType>(req: Request, schema: T): Promise<z.infer<T>> {
  return schema.parse(await readJson(req));
}

/** Parses URL search params (as a plain object) with a schema. */
export function parseQuery<T extends z.ZodType>(req: Request, schema: T): z.infer<T> {
  return schema.parse(Object.fromEntries(new URL(req.url).searchParams));
}

/** Wraps a route handler: every thrown error becomes a JSON answer with the right status. */
export function route<C>(fn: (req: Request, ctx: C) => Promise<Response | unknown>) {
  return async (req: Request, ctx: C): Promise<Response> => {
    try {
      const out = await fn(req, ctx);
      return out instanceof Response ? out : NextResponse.json(out);
    } catch (err) {
      if (err instanceof PayloadTooLarge) return NextResponse.json({ error: err.message }, { status: 413 });
      const f = toFailure(err);
      return NextResponse.json(
        { error: f.message, ...(f.fieldErrors ? { fieldErrors: f.fieldErrors } : {}), ...(f.details ? { details: f.details } : {}) },
        { status: f.status, headers: f.status === 503 ? { "Retry-After": "5" } : undefined },
      );
    }
  };
}
