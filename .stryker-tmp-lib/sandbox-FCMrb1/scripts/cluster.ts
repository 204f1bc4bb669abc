// @ts-nocheck
// A private PostgreSQL cluster on 127.0.0.1 for `npm start` and `npm test`.
// Debian's server binaries are installed with apt-get when missing. PostgreSQL refuses to run
// as root, so when we are root every server command runs as the unprivileged `postgres` user.
import { execFileSync, spawnSync } from "node:child_process";
import crypto from "node:crypto";
import fs from "node:fs";
import net from "node:net";
import path from "node:path";

const PG_VERSIONS = ["17", "16", "15"];

export type Cluster = { url: string; port: number; dir: string; stop: () => void };

function findBinDir(): string | null {
  for (const v of PG_VERSIONS) {
    const dir = `/usr/lib/postgresql/${v}/bin`;
    if (fs.existsSync(path.join(dir, "pg_ctl"))) return dir;
  }
  return null;
}

/** Finds the server binaries, installing Debian's `postgresql` package when they are missing. */
export function ensurePostgres(log: (m: string) => void = console.log): string {
  let bin = findBinDir();
  if (bin) return bin;
  if (process.getuid?.() !== 0) {
    throw new Error("PostgreSQL server binaries are missing; install them with: sudo apt-get install -y postgresql");
  }
  log("Installing PostgreSQL (apt-get install postgresql) ...");
  execFileSync("apt-get", ["update", "-qq"], { stdio: "inherit" });
  execFileSync("apt-get", ["install", "-y", "-qq", "postgresql"], {
    stdio: "inherit",
    env: { ...process.env, DEBIAN_FRONTEND: "noninteractive" },
  });
  bin = findBinDir();
  if (!bin) throw new Error("apt-get finished but no PostgreSQL server binaries were found");
  return bin;
}

const isRoot = () => process.getuid?.() === 0;

/** Runs a server command, as the `postgres` user when we are root. */
function runPg(bin: string, cmd: string, args: string[], opts: { allowFail?: boolean } = {}) {
  const exe = path.join(bin, cmd);
  const [file, argv] = isRoot() ? ["runuser", ["-u", "postgres", "--", exe, ...args]] : [exe, args];
  const r = spawnSync(file, argv, { encoding: "utf8", cwd: "/tmp" });
  if (r.status !== 0 && !opts.allowFail) {
    throw new Error(`${cmd} failed (exit ${r.status}): ${r.stderr || r.stdout}`);
  }
  return r;
}

/** Where clusters live when the project folder is closed to the postgres user (root only). */
export const FALLBACK_ROOT = process.env.PW_PG_FALLBACK_ROOT ?? "/var/lib/pulleywright/clusters";

const postgresCanWrite = (dir: string) => spawnSync("runuser", ["-u", "postgres", "--", "test", "-w", dir]).status === 0;

/**
 * The folder the cluster really lives in. Normally `dir`. As root, when a parent folder of `dir`
 * is closed to the postgres user (a clone in /root or in a `mktemp -d` folder), the cluster lives
 * in a folder of its own under FALLBACK_ROOT, named after `dir` so each clone keeps its own data
 * across restarts; a note in `dir`'s parent says where.
 */
export function clusterHome(dir: string): string {
  fs.mkdirSync(dir, { recursive: true, mode: 0o700 });
  if (!isRoot()) return dir;
  execFileSync("chown", ["-R", "postgres:postgres", dir]);
  if (postgresCanWrite(dir)) return dir;
  const home = path.join(FALLBACK_ROOT, crypto.createHash("sha256").update(dir).digest("hex").slice(0, 16));
  fs.mkdirSync(home, { recursive: true, mode: 0o700 });
  execFileSync("chown", ["postgres:postgres", home]);
  fs.chmodSync(home, 0o700);
  if (!postgresCanWrite(home)) {
    throw new Error(`The postgres user can reach neither ${dir} nor ${home}. Set PW_DATA_DIR to a folder it can reach, or DATABASE_URL to an existing server.`);
  }
  fs.writeFileSync(path.join(path.dirname(dir), "pg-location.txt"), `The PostgreSQL data for ${dir} lives in ${home}\n(the folder above is closed to the postgres user).\n`);
  return home;
}

/** A TCP port on 127.0.0.1 that nothing listens on right now. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.once("error", reject);
    srv.listen(0, "127.0.0.1", () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
  });
}

function portInUse(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const sock = net.connect({ port, host: "127.0.0.1" });
    sock.once("connect", () => {
      sock.destroy();
      resolve(true);
    });
    sock.once("error", () => resolve(false));
  });
}

/**
 * Starts (creating on first use) a cluster in `dir` listening on 127.0.0.1:`port` with trust
 * authentication for the local user `app` and a database `app`. Data in `dir` survives stop/start.
 */
export async function startCluster(opts: { dir: string; port: number; log?: (m: string) => void }): Promise<Cluster> {
  const log = opts.log ?? console.log;
  const bin = ensurePostgres(log);
  const dir = clusterHome(path.resolve(opts.dir));
  const url = `postgres://app@127.0.0.1:${opts.port}/app`;
  const fresh = !fs.existsSync(path.join(dir, "PG_VERSION"));
  if (fresh) {
    runPg(bin, "initdb", ["-D", dir, "-U", "app", "--auth=trust", "-E", "UTF8", "--locale=C.UTF-8"]);
    fs.appendFileSync(
      path.join(dir, "postgresql.conf"),
      [
        "",
        "# Pulleywright: loopback only, our own port, TCP only (no socket file in the project).",
        "listen_addresses = '127.0.0.1'",
        `port = ${opts.port}`,
        "unix_socket_directories = ''",
        "max_connections = 200",
        "fsync = on",
        "",
      ].join("\n"),
    );
  } else {
    // The port may have been changed since the cluster was made.
    const conf = path.join(dir, "postgresql.conf");
    const text = fs.readFileSync(conf, "utf8").replace(/^port = \d+$/m, `port = ${opts.port}`);
    fs.writeFileSync(conf, text);
  }
  const status = runPg(bin, "pg_ctl", ["-D", dir, "status"], { allowFail: true });
  if (status.status !== 0) {
    if (await portInUse(opts.port)) {
      throw new Error(`Port ${opts.port} on 127.0.0.1 is taken by another program; set PW_PG_PORT to a free port.`);
    }
    runPg(bin, "pg_ctl", ["-D", dir, "-l", path.join(dir, "server.log"), "-w", "-t", "60", "start"]);
  }
  if (fresh) runPg(bin, "createdb", ["-h", "127.0.0.1", "-p", String(opts.port), "-U", "app", "app"]);
  let stopped = false;
  return {
    url,
    port: opts.port,
    dir,
    stop: () => {
      if (stopped) return;
      stopped = true;
      runPg(bin, "pg_ctl", ["-D", dir, "-m", "fast", "-w", "stop"], { allowFail: true });
    },
  };
}

/** Stops a cluster and removes its folder (for throwaway test clusters). */
export function destroyCluster(cluster: Cluster) {
  cluster.stop();
  fs.rmSync(cluster.dir, { recursive: true, force: true });
}

/** Stops or starts the server of an existing cluster folder (the fault tests pull the database out from under the app). */
export function controlCluster(dir: string, action: "stop" | "start") {
  const bin = ensurePostgres(() => {});
  if (action === "stop") runPg(bin, "pg_ctl", ["-D", dir, "-m", "immediate", "-w", "stop"], { allowFail: true });
  else runPg(bin, "pg_ctl", ["-D", dir, "-l", path.join(dir, "server.log"), "-w", "-t", "60", "start"]);
}
