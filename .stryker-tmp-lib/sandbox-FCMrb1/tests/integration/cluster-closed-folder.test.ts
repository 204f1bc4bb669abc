// @ts-nocheck
// First run in a closed folder (finding 13): as root, a clone inside a folder other users cannot
// enter (a home folder, a `mktemp -d` folder) still gets its private PostgreSQL cluster. Its files
// live where the unprivileged postgres user can reach them, a note says where, and the data is
// kept across a stop and a start. Root only (the situation does not arise otherwise).
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import pg from "pg";
import { afterAll, describe, expect, it, vi } from "vitest";

const root = process.getuid?.() === 0;
const closed = fs.mkdtempSync(path.join(os.tmpdir(), "pw-closed-")); // mode 0700, owned by root
const fallback = fs.mkdtempSync(path.join(os.tmpdir(), "pw-fallback-"));
fs.chmodSync(fallback, 0o755);

afterAll(() => {
  fs.rmSync(closed, { recursive: true, force: true });
  fs.rmSync(fallback, { recursive: true, force: true });
});

describe.skipIf(!root)("a private cluster for a clone in a closed folder", () => {
  it("starts, says where its data lives, and keeps the data across a restart", async () => {
    vi.stubEnv("PW_PG_FALLBACK_ROOT", fallback);
    vi.resetModules();
    const { startCluster, destroyCluster, freePort } = await import("@/scripts/cluster");
    expect(fs.statSync(closed).mode & 0o777).toBe(0o700);
    const dataDir = path.join(closed, "clone", ".data", "pg");
    const port = await freePort();
    let cluster = await startCluster({ dir: dataDir, port, log: () => {} });
    try {
      expect(cluster.dir.startsWith(fallback + path.sep)).toBe(true);
      expect(fs.readFileSync(path.join(closed, "clone", ".data", "pg-location.txt"), "utf8")).toContain(cluster.dir);
      const c1 = new pg.Client({ connectionString: cluster.url });
      await c1.connect();
      await c1.query("create table kept (v text); insert into kept values ('still here')");
      await c1.end();
      cluster.stop();
      // Started again for the same project folder: the same cluster, with its data.
      cluster = await startCluster({ dir: dataDir, port, log: () => {} });
      const c2 = new pg.Client({ connectionString: cluster.url });
      await c2.connect();
      expect((await c2.query("select v from kept")).rows).toEqual([{ v: "still here" }]);
      await c2.end();
    } finally {
      destroyCluster(cluster);
      vi.unstubAllEnvs();
    }
  }, 60_000);
});
