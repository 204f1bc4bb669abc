// @ts-nocheck
// A tiny HTTP client with a cookie jar, signed in through next-auth's credentials endpoint.
export const BASE_URL = process.env.PW_BASE_URL ?? "http://127.0.0.1:3000";

export class Client {
  private cookies = new Map<string, string>();

  private store(res: Response) {
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(";");
      const i = pair.indexOf("=");
      this.cookies.set(pair.slice(0, i), pair.slice(i + 1));
    }
  }

  cookieHeader() {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
  }

  async fetch(path: string, init: RequestInit = {}) {
    const headers = new Headers(init.headers);
    if (this.cookies.size) headers.set("cookie", this.cookieHeader());
    const res = await fetch(BASE_URL + path, { ...init, headers, redirect: "manual" });
    this.store(res);
    return res;
  }

  async json(path: string, method = "GET", body?: unknown) {
    const res = await this.fetch(path, {
      method,
      headers: body === undefined ? {} : { "content-type": "application/json" },
      body: body === undefined ? undefined : typeof body === "string" ? body : JSON.stringify(body),
    });
    const text = await res.text();
    let data: unknown = null;
    try {
      data = text ? JSON.parse(text) : null;
    } catch {
      data = text;
    }
    return { status: res.status, data: data as Record<string, any>, headers: res.headers };
  }

  /** Signs in with e-mail and password; returns true when a session cookie was set. */
  async signIn(email: string, password = "pulleywright-demo") {
    const csrf = (await (await this.fetch("/api/auth/csrf")).json()) as { csrfToken: string };
    const res = await this.fetch("/api/auth/callback/password", {
      method: "POST",
      headers: { "content-type": "application/x-www-form-urlencoded" },
      body: new URLSearchParams({ csrfToken: csrf.csrfToken, email, password, json: "true" }),
    });
    return res.status < 400 && [...this.cookies.keys()].some((k) => k.includes("session-token"));
  }
}

export async function signedIn(email: string, password?: string) {
  const c = new Client();
  if (!(await c.signIn(email, password))) throw new Error(`could not sign in as ${email}`);
  return c;
}
