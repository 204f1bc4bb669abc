// `npm run bench:http`: the server under load. autocannon against `next start` on 127.0.0.1 for
// the combinations list and the calc route, at 1, 16 and 64 connections, each as a ratio to a
// trivial route of the same app measured in the same run. Figures, not pass/fail.
//   --skip-build   reuse the last benchmark build (.next-bench)
//   --seconds N    duration of each measurement (default 5)
import autocannon from "autocannon";
import { exampleCombination } from "../calc";
import { serveThrowaway, signInCookie } from "./serve-throwaway";

const args = process.argv.slice(2);
const seconds = Number(args[args.indexOf("--seconds") + 1]) || 5;

type Target = { name: string; path: string; method?: "GET" | "POST"; body?: string };

async function measure(url: string, cookie: string, t: Target, connections: number) {
  const r = await autocannon({
    url: url + t.path,
    method: t.method ?? "GET",
    body: t.body,
    headers: { cookie, ...(t.body ? { "content-type": "application/json" } : {}) },
    connections,
    duration: seconds,
  });
  const bad = r.non2xx + r.errors + r.timeouts;
  return { rps: r.requests.average, p50: r.latency.p50, p99: r.latency.p99, bad };
}

const server = await serveThrowaway({ distDir: ".next-bench", build: !args.includes("--skip-build") });
try {
  const cookie = await signInCookie(server.url, "tuner@example.com");
  const calcBody = JSON.stringify({ op: "curve", combination: exampleCombination(), rpms: Array.from({ length: 56 }, (_, i) => 1000 + i * 100) });
  const targets: Target[] = [
    { name: "trivial (/api/health)", path: "/api/health" },
    { name: "combinations list", path: "/api/combinations?pageSize=20" },
    { name: "calc (56-speed curve)", path: "/api/calc", method: "POST", body: calcBody },
  ];
  console.log(`autocannon, ${seconds} s per cell, app and load generator on the same 2-core machine\n`);
  console.log("route                       conns     req/s   p50 ms   p99 ms   non-2xx   ratio to trivial");
  const results: Record<string, Record<number, Awaited<ReturnType<typeof measure>>>> = {};
  for (const connections of [1, 16, 64]) {
    for (const t of targets) {
      await measure(server.url, cookie, t, connections); // warm-up at this level is part of the first second; measure again
      const m = await measure(server.url, cookie, t, connections);
      (results[t.name] ??= {})[connections] = m;
      const base = results[targets[0].name][connections];
      console.log(
        `${t.name.padEnd(27)} ${String(connections).padStart(5)} ${m.rps.toFixed(0).padStart(9)} ${m.p50.toFixed(1).padStart(8)} ${m.p99.toFixed(1).padStart(8)} ${String(m.bad).padStart(9)}   ${(m.rps / base.rps).toFixed(2)}`,
      );
    }
  }
  const list16 = results["combinations list"][16];
  const trivial16 = results[targets[0].name][16];
  const calc16 = results["calc (56-speed curve)"][16];
  console.log("\nTargets (issue: p99 under 50 ms at 16 connections; list at least 1/3 of trivial throughput):");
  console.log(`  list p99 at 16: ${list16.p99.toFixed(1)} ms ${list16.p99 < 50 ? "(met)" : "(NOT met)"}`);
  console.log(`  calc p99 at 16: ${calc16.p99.toFixed(1)} ms ${calc16.p99 < 50 ? "(met)" : "(NOT met)"}`);
  console.log(`  list/trivial throughput at 16: ${(list16.rps / trivial16.rps).toFixed(2)} ${list16.rps / trivial16.rps >= 1 / 3 ? "(met)" : "(NOT met)"}`);
} finally {
  await server.stop();
}
