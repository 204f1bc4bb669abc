// @ts-nocheck
// `npm run bench:http`: the server under load. autocannon against `next start` on 127.0.0.1 for
// the combinations list and the calc route, at 1, 16 and 64 connections, each as a ratio to a
// trivial route of the same app measured in the same run. Figures, not pass/fail.
//
// Each cell is warmed up, then measured `--runs` times; the table gives the median of the runs
// and the spread of p99 across them, because one run on a shared machine can be 30 % off. It also
// gives the CPU time each request cost the app and PostgreSQL, which is steadier than latency and
// says where the time went (at a fixed number of connections, mean latency ≈ connections ÷ req/s).
//   --skip-build      reuse the last benchmark build (.next-bench)
//   --seconds N       duration of each measured run (default 5)
//   --runs N          measured runs per cell (default 3)
//   --connections L   comma-separated connection counts (default 1,16,64)
//   --routes L        comma-separated subset of list,calc,point (the trivial route is always measured)
//   --profile DIR     write a CPU profile of the app to DIR (for `node --cpu-prof`'s viewers)
import autocannon from "autocannon";
import fs from "node:fs";
import path from "node:path";
import { exampleCombination } from "../calc";
import { cpuSplit } from "./cpu-time";
import { quantile } from "./stats";
import { serveThrowaway, signInCookie } from "./serve-throwaway";

const args = process.argv.slice(2);
const opt = (name: string) => (args.includes(name) ? args[args.indexOf(name) + 1] : undefined);
const seconds = Number(opt("--seconds")) || 5;
const runs = Number(opt("--runs")) || 3;
const levels = (opt("--connections") ?? "1,16,64").split(",").map(Number);
const profileDir = opt("--profile");
const routes = new Set(["trivial", ...(opt("--routes") ?? "list,calc,point").split(",")]);

type Target = { key: string; name: string; path: string; method?: "GET" | "POST"; body?: string };
type Run = { rps: number; p50: number; p99: number; bad: number; appMs: number; pgMs: number };

const median = (xs: number[]) => quantile(xs, 0.5);

async function measure(url: string, cookie: string, t: Target, connections: number, appGroup: number, duration = seconds): Promise<Run> {
  const before = cpuSplit(appGroup);
  const r = await autocannon({
    url: url + t.path,
    method: t.method ?? "GET",
    body: t.body,
    headers: { cookie, ...(t.body ? { "content-type": "application/json" } : {}) },
    connections,
    duration,
  });
  const after = cpuSplit(appGroup);
  const n = Math.max(1, r.requests.total);
  return {
    rps: r.requests.average,
    p50: r.latency.p50,
    p99: r.latency.p99,
    bad: r.non2xx + r.errors + r.timeouts,
    appMs: (after.app - before.app) / n,
    pgMs: (after.postgres - before.postgres) / n,
  };
}

const server = await serveThrowaway({
  distDir: ".next-bench",
  build: !args.includes("--skip-build"),
  nodeArgs: profileDir ? ["--cpu-prof", `--cpu-prof-dir=${path.resolve(profileDir)}`] : undefined,
});
try {
  const cookie = await signInCookie(server.url, "tuner@example.com");
  const calcBody = JSON.stringify({ op: "curve", combination: exampleCombination(), rpms: Array.from({ length: 56 }, (_, i) => 1000 + i * 100) });
  const pointBody = JSON.stringify({ op: "point", combination: exampleCombination(), rpm: 5000 });
  const targets = ([
    { key: "trivial", name: "trivial (/api/health)", path: "/api/health" },
    { key: "list", name: "combinations list", path: "/api/combinations?pageSize=20" },
    { key: "calc", name: "calc (56-speed curve)", path: "/api/calc", method: "POST", body: calcBody },
    // The same route with a one-point answer (0.7 kB instead of 37 kB): what the route costs apart from the size of its answer.
    { key: "point", name: "calc (one point)", path: "/api/calc", method: "POST", body: pointBody },
  ] satisfies Target[] as Target[]).filter((t) => routes.has(t.key));
  console.log(`autocannon: per cell a 3 s warm-up, then ${runs} runs of ${seconds} s; medians of the runs, with the p99 range.`);
  console.log("The app, PostgreSQL and the load generator share this machine's cores.\n");
  console.log("route                       conns     req/s   p50 ms   p99 ms   p99 range   app ms/req   pg ms/req   non-2xx   ratio to trivial");
  const results: Record<string, Record<number, Run>> = {};
  for (const connections of levels) {
    for (const t of targets) {
      await measure(server.url, cookie, t, connections, server.appGroup, 3); // JIT, pools and caches warm up
      const rs: Run[] = [];
      for (let i = 0; i < runs; i++) rs.push(await measure(server.url, cookie, t, connections, server.appGroup));
      const m: Run = {
        rps: median(rs.map((r) => r.rps)),
        p50: median(rs.map((r) => r.p50)),
        p99: median(rs.map((r) => r.p99)),
        bad: rs.reduce((a, r) => a + r.bad, 0),
        appMs: median(rs.map((r) => r.appMs)),
        pgMs: median(rs.map((r) => r.pgMs)),
      };
      (results[t.name] ??= {})[connections] = m;
      const base = results[targets[0].name][connections];
      const range = `${Math.min(...rs.map((r) => r.p99))}–${Math.max(...rs.map((r) => r.p99))}`;
      console.log(
        [
          t.name.padEnd(27),
          String(connections).padStart(5),
          m.rps.toFixed(0).padStart(9),
          m.p50.toFixed(1).padStart(8),
          m.p99.toFixed(1).padStart(8),
          range.padStart(11),
          m.appMs.toFixed(2).padStart(12),
          m.pgMs.toFixed(2).padStart(11),
          String(m.bad).padStart(9),
          `   ${(m.rps / base.rps).toFixed(2)}`,
        ].join(" "),
      );
    }
  }
  const at16 = (name: string) => results[name]?.[16];
  const list16 = at16("combinations list");
  const trivial16 = at16(targets[0].name);
  const calc16 = at16("calc (56-speed curve)");
  const point16 = at16("calc (one point)");
  if (list16 && trivial16 && calc16) {
    const verdict = (ok: boolean) => (ok ? "(met)" : "(NOT met)");
    console.log("\nTargets (p99 under 50 ms at 16 connections; list at least 1/3 of trivial throughput), on the medians:");
    console.log(`  trivial p99 at 16: ${trivial16.p99.toFixed(1)} ms (the floor this machine sets for any route)`);
    console.log(`  list p99 at 16: ${list16.p99.toFixed(1)} ms ${verdict(list16.p99 < 50)}`);
    console.log(`  calc p99 at 16: ${calc16.p99.toFixed(1)} ms ${verdict(calc16.p99 < 50)}`);
    if (point16) console.log(`    (the same route with a one-point answer: p99 ${point16.p99.toFixed(1)} ms, ${point16.appMs.toFixed(2)} ms of app CPU per request against ${calc16.appMs.toFixed(2)})`);
    console.log(`  list/trivial throughput at 16: ${(list16.rps / trivial16.rps).toFixed(2)} ${verdict(list16.rps / trivial16.rps >= 1 / 3)}`);
  }
} finally {
  await server.stop();
}
if (profileDir) {
  // The app writes its profile as it exits, a moment after the stop signal.
  const has = () => fs.existsSync(profileDir) && fs.readdirSync(profileDir).some((f) => f.endsWith(".cpuprofile"));
  for (let i = 0; i < 40 && !has(); i++) await new Promise((r) => setTimeout(r, 250));
  console.log(has() ? `\nCPU profile of the app in ${profileDir} (open it in Chromium's DevTools, Performance panel).` : "\nThe app wrote no CPU profile.");
}
