// @ts-nocheck
// A throwaway copy of the whole app for benchmarks: its own cluster, demo data, mail fake, build
// and server on loopback ports, all stopped by `stop()`.
import crypto from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { destroyCluster, freePort, startCluster } from "./cluster";
import { connect } from "../db/connect";
import { runMigrations } from "../db/migrate";
import { seedDemo } from "../db/seed";
import { startMailFake } from "./mail-fake";
import { buildNext, nextEnv, root, startNext, stopGroup, waitForHttp } from "./proc";

export async function serveThrowaway(opts: { distDir: string; build: boolean; nodeArgs?: string[] }) {
  const workDir = fs.mkdtempSync(path.join(os.tmpdir(), "pw-bench-"));
  fs.chmodSync(workDir, 0o711);
  const cluster = await startCluster({ dir: path.join(workDir, "pg"), port: await freePort(), log: () => {} });
  await runMigrations(cluster.url);
  const { pool, db } = connect(cluster.url, 2);
  await seedDemo(db);
  await pool.end();
  const mail = await startMailFake({ smtpPort: await freePort(), httpPort: await freePort() });
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const secret = crypto.randomBytes(32).toString("base64url");
  const env = nextEnv({
    NEXT_DIST_DIR: opts.distDir,
    DATABASE_URL: cluster.url,
    NEXTAUTH_URL: url,
    AUTH_SECRET: secret,
    NEXTAUTH_SECRET: secret,
    SMTP_URL: mail.smtpUrl,
    MAIL_FAKE_URL: mail.inboxUrl,
  });
  if (opts.build || !fs.existsSync(path.join(root, opts.distDir, "BUILD_ID"))) {
    const code = await buildNext(env, { quiet: true });
    if (code !== 0) throw new Error("next build failed");
  }
  const app = startNext({ port, host: "127.0.0.1", env, quiet: true, nodeArgs: opts.nodeArgs });
  await waitForHttp(`${url}/api/health`);
  return {
    url,
    /** The app's process group (it was started detached, so the group id is its pid). */
    appGroup: app.pid!,
    stop: async () => {
      // Let the app finish before its database goes, so it does not log lost connections.
      const exited = app.exitCode !== null ? Promise.resolve() : new Promise<void>((r) => app.once("exit", () => r()));
      stopGroup(app);
      await Promise.race([exited, new Promise((r) => setTimeout(r, 10_000))]);
      await mail.stop();
      destroyCluster(cluster);
      fs.rmSync(workDir, { recursive: true, force: true });
    },
  };
}

/** Signs in through next-auth's credentials endpoint and returns the Cookie header. */
export async function signInCookie(url: string, email: string, password = "pulleywright-demo") {
  const jar = new Map<string, string>();
  const keep = (res: Response) => {
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(";");
      const i = pair.indexOf("=");
      jar.set(pair.slice(0, i), pair.slice(i + 1));
    }
  };
  const header = () => [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
  const r1 = await fetch(`${url}/api/auth/csrf`);
  keep(r1);
  const { csrfToken } = (await r1.json()) as { csrfToken: string };
  const r2 = await fetch(`${url}/api/auth/callback/password`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: header() },
    body: new URLSearchParams({ csrfToken, email, password, json: "true" }),
  });
  keep(r2);
  if (![...jar.keys()].some((k) => k.includes("session-token"))) throw new Error(`sign-in as ${email} failed`);
  return header();
}
