// @ts-nocheck
// Request bodies are read in chunks and the read stops as soon as the limit is passed, so a huge
// (or chunked, length-less) body costs the server no more than the limit.

export class PayloadTooLarge extends Error {
  readonly status = 413;
  constructor(readonly limit: number) {
    super(`The request body is larger than ${Math.round(limit / 1024)} kB.`);
  }
}

/** The body's bytes, at most `maxBytes`; a larger body (declared or streamed) is a PayloadTooLarge. */
export async function readBodyCapped(req: Request, maxBytes: number): Promise<Buffer> {
  const declared = Number(req.headers.get("content-length") ?? "0");
  if (declared > maxBytes) throw new PayloadTooLarge(maxBytes);
  if (!req.body) return Buffer.alloc(0);
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > maxBytes) {
      await reader.cancel().catch(() => {});
      throw new PayloadTooLarge(maxBytes);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}

/** A copy of `req` whose body is the (already capped) bytes, for parsers that read the body themselves. */
export function withBody(req: Request, body: Buffer): Request {
  return new Request(req.url, { method: req.method, headers: req.headers, body: body.length ? new Uint8Array(body) : undefined });
}
