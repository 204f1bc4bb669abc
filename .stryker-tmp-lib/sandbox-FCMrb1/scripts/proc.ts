// @ts-nocheck
// Small process helpers shared by the start, test and bench scripts.
import { execFileSync, spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import path from "node:path";

/** Extra environment variables for a child process. */
export type Env = Record<string, string | undefined>;

export const root = path.resolve(import.meta.dirname, "..");
export const nextBin = path.join(root, "node_modules/next/dist/bin/next");

/** Runs a command to completion, streaming its output; resolves with its exit code. */
export function run(cmd: string, args: string[], opts: { env?: Env; quiet?: boolean } = {}): Promise<number> {
  return new Promise((resolve) => {
    const child = spawn(cmd, args, { cwd: root, env: { ...process.env, ...opts.env }, stdio: opts.quiet ? "ignore" : "inherit" });
    child.on("exit", (code, signal) => resolve(code ?? (signal ? 1 : 0)));
    child.on("error", () => resolve(127));
  });
}

/** Starts `next start` in its own process group, so stopping it stops its workers too. */
export function startNext(opts: { port: number; host: string; env: Env; quiet?: boolean; nodeArgs?: string[] }): ChildProcess {
  return spawn(process.execPath, [...(opts.nodeArgs ?? []), nextBin, "start", "-p", String(opts.port), "-H", opts.host], {
    cwd: root,
    env: { ...process.env, ...opts.env },
    stdio: opts.quiet ? ["ignore", "ignore", "inherit"] : "inherit",
    detached: true,
  });
}

export function stopGroup(child: ChildProcess | undefined) {
  if (!child?.pid || child.exitCode !== null) return;
  try {
    process.kill(-child.pid, "SIGTERM");
  } catch {
    /* already gone */
  }
}

/** Polls a URL until it answers (any status below 500), or gives up after `timeoutMs`. */
export async function waitForHttp(url: string, timeoutMs = 60_000) {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    try {
      const r = await fetch(url, { signal: AbortSignal.timeout(2_000) });
      if (r.status < 500) return;
    } catch {
      /* not yet */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`${url} did not answer within ${timeoutMs / 1000} s`);
}

/**
 * `next build`, leaving tsconfig.json as committed: Next adds its build folder's type paths to
 * it, and each test or bench build folder would otherwise pile up there.
 */
export async function buildNext(env: Env, opts: { quiet?: boolean } = {}): Promise<number> {
  const tsconfig = path.join(root, "tsconfig.json");
  const saved = fs.readFileSync(tsconfig, "utf8");
  try {
    return await run(process.execPath, [nextBin, "build"], { env, quiet: opts.quiet });
  } finally {
    fs.writeFileSync(tsconfig, saved);
  }
}

/** Environment for `next build` / `next start`: telemetry off, our own build folder when asked. */
export function nextEnv(extra: Env = {}): Env {
  return { NEXT_TELEMETRY_DISABLED: "1", NODE_ENV: "production", ...extra };
}

/** Installs Debian's Chromium when it is missing (server-side PDFs and the browser tests use it). */
export function ensureChromium(purpose: string) {
  if (fs.existsSync("/usr/bin/chromium")) return;
  if (process.getuid?.() !== 0) throw new Error(`Chromium is missing (needed for ${purpose}): sudo apt-get install -y chromium`);
  console.log(`Installing Debian's chromium for ${purpose} …`);
  execFileSync("apt-get", ["update", "-qq"], { stdio: "inherit" });
  execFileSync("apt-get", ["install", "-y", "-qq", "chromium"], { stdio: "inherit", env: { ...process.env, DEBIAN_FRONTEND: "noninteractive" } });
}
