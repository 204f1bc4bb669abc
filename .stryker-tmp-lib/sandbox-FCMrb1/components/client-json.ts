// @ts-nocheck
// The one client helper for every fetch and mutation from the browser: JSON in and out, and the
// server's message and per-field errors kept on the thrown error so forms can show them.

export class ApiError extends Error {
  constructor(
    message: string,
    readonly status: number,
    readonly fieldErrors: Record<string, string[]> = {},
    readonly body: unknown = null,
    /** The server's own message (its `error` field), when it sent one. */
    readonly serverMessage?: string,
  ) {
    super(message);
  }
}

export async function apiJson<T>(url: string, init: RequestInit & { json?: unknown } = {}): Promise<T> {
  const { json, ...rest } = init;
  const res = await fetch(url, {
    ...rest,
    headers: { ...(json === undefined ? {} : { "content-type": "application/json" }), ...(rest.headers ?? {}) },
    body: json === undefined ? rest.body : JSON.stringify(json),
  });
  const text = await res.text();
  let data: unknown = null;
  try {
    data = text ? JSON.parse(text) : null;
  } catch {
    data = null;
  }
  if (!res.ok) {
    const d = (data ?? {}) as { error?: string; fieldErrors?: Record<string, string[]> };
    throw new ApiError(d.error ?? `The server answered ${res.status}.`, res.status, d.fieldErrors ?? {}, data, d.error);
  }
  return data as T;
}

/** A query string from the non-empty values of an object. */
export function queryString(params: Record<string, string | number | boolean | undefined | null>): string {
  const sp = new URLSearchParams();
  for (const [k, v] of Object.entries(params)) {
    if (v === undefined || v === null || v === "" || v === false) continue;
    sp.set(k, v === true ? "1" : String(v));
  }
  const s = sp.toString();
  return s ? `?${s}` : "";
}
