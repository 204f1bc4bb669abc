// @ts-nocheck
// Several instances behind a load balancer on one PostgreSQL (finding 14): two `next start`
// processes of the same build, on two ports, one database. A session made on one works on the
// other, a sign-in limit counted on one holds on the other, a save on one is seen by the other, a
// stale save is refused across them, and mail queued once is sent once although both send.
import crypto from "node:crypto";
import type { ChildProcess } from "node:child_process";
import pg from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { exampleCombination } from "@/calc";
import { connect, type Db } from "@/db/connect";
import { enqueueMail } from "@/db/repo/outbox";
import { createMember } from "@/db/repo/users";
import { startMailFake, type MailFake } from "../../scripts/mail-fake";
import { freePort } from "../../scripts/cluster";
import { nextEnv, startNext, stopGroup, waitForHttp } from "../../scripts/proc";
import { rawRequest } from "../support/raw-http";

const PASSWORD = "a-long-enough-password";
const base = process.env.PW_TEST_PG_BASE!;
const dbName = `instances_${crypto.randomBytes(4).toString("hex")}`;
let apps: ChildProcess[] = [];
let urls: string[] = [];
let mail: MailFake;
let pool: pg.Pool;
let db: Db;

beforeAll(async () => {
  const admin = new pg.Client({ connectionString: `${base}/postgres` });
  await admin.connect();
  await admin.query(`CREATE DATABASE ${dbName} TEMPLATE ${process.env.PW_TEST_TEMPLATE_DB ?? "app"}`);
  await admin.end();
  ({ pool, db } = connect(`${base}/${dbName}`, 4));
  mail = await startMailFake({ smtpPort: await freePort(), httpPort: await freePort() });
  const ports = [await freePort(), await freePort()];
  urls = ports.map((p) => `http://127.0.0.1:${p}`);
  const secret = crypto.randomBytes(32).toString("base64url");
  const env = nextEnv({
    NEXT_DIST_DIR: process.env.NEXT_DIST_DIR,
    DATABASE_URL: `${base}/${dbName}`,
    // Behind one load balancer both answer for one public address.
    NEXTAUTH_URL: urls[0],
    AUTH_SECRET: secret,
    NEXTAUTH_SECRET: secret,
    SHARE_SECRET: crypto.randomBytes(32).toString("base64url"),
    SMTP_URL: mail.smtpUrl,
    MAIL_POLL_MS: "200",
  });
  apps = ports.map((port) => startNext({ port, host: "127.0.0.1", env, quiet: true }));
  await Promise.all(urls.map((u) => waitForHttp(`${u}/api/health`)));
}, 120_000);

afterAll(async () => {
  apps.forEach(stopGroup);
  await mail?.stop();
  await pool?.end();
  const admin = new pg.Client({ connectionString: `${base}/postgres` });
  await admin.connect();
  await admin.query(`DROP DATABASE IF EXISTS ${dbName} WITH (FORCE)`);
  await admin.end();
});

async function member() {
  const email = `multi-${crypto.randomBytes(4).toString("hex")}@example.com`;
  await createMember(db, { email, name: "Multi Instance", password: PASSWORD });
  return email;
}

/** A password sign-in on instance `i` from a chosen loopback address; the session cookie, or why not. */
async function signIn(i: number, email: string, password: string, localAddress = "127.0.0.1") {
  const csrf = await rawRequest(`${urls[i]}/api/auth/csrf`, { localAddress });
  const cookie = (csrf.headers["set-cookie"] ?? []).map((s) => s.split(";")[0]).join("; ");
  const res = await rawRequest(`${urls[i]}/api/auth/callback/password`, {
    method: "POST",
    localAddress,
    headers: { "content-type": "application/x-www-form-urlencoded", cookie },
    body: new URLSearchParams({ csrfToken: JSON.parse(csrf.body).csrfToken, email, password, json: "true" }).toString(),
  });
  const session = (res.headers["set-cookie"] ?? []).map((s) => s.split(";")[0]).find((s) => /session-token=./.test(s));
  return { session, url: String(JSON.parse(res.body).url ?? "") };
}

async function api(i: number, cookie: string, path: string, method = "GET", body?: unknown) {
  const res = await fetch(`${urls[i]}${path}`, { method, headers: { cookie, ...(body ? { "content-type": "application/json" } : {}) }, body: body ? JSON.stringify(body) : undefined });
  return { status: res.status, data: (await res.json()) as Record<string, any> };
}

describe("two instances on one database", () => {
  it("a session made on one works on the other, and signing out on one ends it on both", async () => {
    const email = await member();
    const { session } = await signIn(0, email, PASSWORD);
    expect(session).toBeTruthy();
    expect((await api(1, session!, "/api/me")).data.email).toBe(email);
    const csrfRes = await fetch(`${urls[1]}/api/auth/csrf`);
    const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
    const cookies = [session!, ...csrfRes.headers.getSetCookie().map((c) => c.split(";")[0])].join("; ");
    const out = await fetch(`${urls[1]}/api/auth/signout`, {
      method: "POST",
      headers: { cookie: cookies, "content-type": "application/x-www-form-urlencoded" },
      body: new URLSearchParams({ csrfToken, json: "true" }),
    });
    expect(out.status).toBeLessThan(400);
    expect((await api(0, session!, "/api/me")).status).toBe(401);
  });

  it("a sign-in limit counted on one holds on the other", async () => {
    const email = await member();
    const from = "127.0.0.91";
    for (let i = 0; i < 5; i++) expect((await signIn(i % 2, email, `wrong ${i}`, from)).session).toBeUndefined();
    const blocked = await signIn(1, email, PASSWORD, from);
    expect(blocked.session).toBeUndefined();
    expect(blocked.url).toContain("error=RateLimited");
  });

  it("a save on one is seen by the other, and a stale save is refused across them", async () => {
    const email = await member();
    const { session } = await signIn(0, email, PASSWORD);
    const created = await api(0, session!, "/api/combinations", "POST", { name: "Seen everywhere", spec: exampleCombination() });
    expect(created.status).toBe(201);
    const id = created.data.id as string;
    expect((await api(1, session!, `/api/combinations/${id}`)).data.name).toBe("Seen everywhere");
    expect((await api(1, session!, `/api/combinations/${id}`, "PATCH", { name: "Edited on B", baseRevision: 1 })).status).toBe(200);
    const stale = await api(0, session!, `/api/combinations/${id}`, "PATCH", { name: "Edited on A from revision 1", baseRevision: 1 });
    expect(stale.status).toBe(409);
    expect((await api(0, session!, `/api/combinations/${id}`)).data.name).toBe("Edited on B");
  });

  it("mail queued once is sent once, although both instances send", async () => {
    const tag = crypto.randomBytes(3).toString("hex");
    const ids = [];
    for (let i = 0; i < 8; i++) ids.push(await enqueueMail(db, { to: `once-${tag}-${i}@example.com`, subject: `Once ${i}`, text: "Sent by whichever instance claims it first." }));
    const inbox = async () => ((await (await fetch(`${mail.inboxUrl}/messages`)).json()) as { to: string[] }[]).filter((m) => m.to.some((t) => t.includes(`once-${tag}-`)));
    const until = Date.now() + 20_000;
    while ((await inbox()).length < 8 && Date.now() < until) await new Promise((r) => setTimeout(r, 200));
    await new Promise((r) => setTimeout(r, 1_000)); // time for a second send, were there to be one
    const got = await inbox();
    expect(got).toHaveLength(8);
    expect(new Set(got.map((m) => m.to[0])).size).toBe(8);
    const rows = await pool.query("select status from mail_outbox where id = any($1)", [ids]);
    expect(rows.rows.every((r) => r.status === "sent")).toBe(true);
  });
});
