// @ts-nocheck
// `npm run bench:web`: page weight and speed in Debian's Chromium against a production build.
// For each main route: the JavaScript it loads on first visit (compressed with gzip, as a server
// would send it). For the planner: the time from navigation to a drawn boost chart (median of 5)
// and a slider move's redraw against two idle frames. Each is printed beside its budget
// (issue 15's budgets, the project's own choice) with met / NOT met, and the load average, since
// other work on the machine slows the timings.
//   --skip-build   reuse the last benchmark build (.next-bench)
import os from "node:os";
import zlib from "node:zlib";
import { launchBrowser } from "../tests/support/browser";
import { ensureChromium } from "./proc";
import { serveThrowaway, signInCookie } from "./serve-throwaway";
import { quantile } from "./stats";

const args = process.argv.slice(2);

/** Budgets (issue 15): planner first-load JavaScript, navigation to a drawn chart, a slider move. */
const BUDGET = { plannerFirstLoadKB: 180, drawnChartMs: 900, sliderRatio: 1.2 };
const verdict = (ok: boolean) => (ok ? "met" : "NOT met");
const load = () => os.loadavg().map((x) => x.toFixed(1)).join(", ");
const summary: string[] = [];
ensureChromium("the web benchmark");
const server = await serveThrowaway({ distDir: ".next-bench", build: !args.includes("--skip-build") });
const browser = await launchBrowser();
try {
  const cookie = await signInCookie(server.url, "tuner@example.com");
  const list = (await (await fetch(`${server.url}/api/combinations?search=Work%20truck&pageSize=5`, { headers: { cookie } })).json()) as {
    items: { id: string; name: string }[];
  };
  const demo = list.items.find((c) => c.name.startsWith("Work truck"));
  if (!demo) throw new Error("the demo work truck combination was not found");
  const routes = [
    "/",
    "/combinations",
    `/combinations/${demo.id}`,
    `/combinations/${demo.id}/revisions`,
    `/compare?items=${demo.id}:1,${demo.id}:2`,
    "/shelf",
    "/recommendations",
    "/datalogs",
    "/lessons",
  ];
  const context = await browser.newContext();
  await context.addCookies(
    cookie.split("; ").map((kv) => {
      const i = kv.indexOf("=");
      return { name: kv.slice(0, i), value: kv.slice(i + 1), url: server.url };
    }),
  );

  console.log("JavaScript per route, gzip -6 as a server would send it: first load = the script tags in the");
  console.log("page's HTML (what Next counts as first-load JS); preloaded = scripts the HTML only preloads (a dynamic");
  console.log("import the server already rendered, e.g. the planner's own code: fetched at once, hydrated when it lands);");
  console.log("all = every script loaded until the network is idle (adds chart.js, loaded after the first frame)\n");
  console.log("route                                   first-load gzip kB   preloaded gzip kB   all scripts   all gzip kB");
  for (const route of routes) {
    const page = await context.newPage();
    const bodies: Promise<{ url: string; body: Buffer | null }>[] = [];
    page.on("response", (r) => {
      if (r.request().resourceType() === "script") bodies.push(r.body().then((body) => ({ url: r.url(), body }), () => ({ url: r.url(), body: null })));
    });
    const res = await page.goto(server.url + route, { waitUntil: "networkidle" });
    // First load: the scripts the server's HTML names (scripts added later by the page are not).
    const html = (await res?.text()) ?? "";
    const initial = new Set([...html.matchAll(/<script[^>]+src="([^"]+)"/g)].map((m) => new URL(m[1].replaceAll("&amp;", "&"), server.url).toString()));
    const scripts = (await Promise.all(bodies)).filter((b): b is { url: string; body: Buffer } => !!b.body);
    const gzip = (b: Buffer) => zlib.gzipSync(b, { level: 6 }).length;
    const preloadHrefs = [...html.matchAll(/<link[^>]+>/g)].map((m) => m[0]).filter((l) => /as="script"/.test(l)).map((l) => l.match(/href="([^"]+)"/)?.[1]);
    const preload = new Set(preloadHrefs.filter((h): h is string => !!h).map((h) => new URL(h.replaceAll("&amp;", "&"), server.url).toString()));
    const first = scripts.filter((s) => initial.has(s.url)).reduce((n, s) => n + gzip(s.body), 0);
    const preloaded = scripts.filter((s) => preload.has(s.url) && !initial.has(s.url)).reduce((n, s) => n + gzip(s.body), 0);
    const all = scripts.reduce((n, s) => n + gzip(s.body), 0);
    const label = route.replaceAll(demo.id, ":id").slice(0, 38);
    const isPlanner = label === "/combinations/:id";
    console.log(
      `${label.padEnd(39)} ${(first / 1024).toFixed(0).padStart(18)} ${(preloaded / 1024).toFixed(0).padStart(19)} ${String(scripts.length).padStart(13)} ${(all / 1024).toFixed(0).padStart(13)}` +
        (res && res.status() >= 400 ? `   (HTTP ${res.status()})` : "") +
        (isPlanner ? `   budget ≤ ${BUDGET.plannerFirstLoadKB} kB: ${verdict(first / 1024 <= BUDGET.plannerFirstLoadKB)}` : ""),
    );
    if (isPlanner) {
      summary.push(`planner first-load JavaScript   ${(first / 1024).toFixed(0).padStart(7)} kB gzip   budget ≤ ${BUDGET.plannerFirstLoadKB} kB   ${verdict(first / 1024 <= BUDGET.plannerFirstLoadKB)}`);
      summary.push(`  (the planner's own code, preloaded and hydrated after the shell: ${(preloaded / 1024).toFixed(0)} kB; every script until idle: ${(all / 1024).toFixed(0)} kB)`);
    }
    await page.close();
  }

  // Drawn = the chart's first picture: the static SVG curves the server renders into the page
  // (components/charts/curve-preview.tsx), or a chart canvas with pixels on it. "Interactive" =
  // the chart.js canvas drawn, once chart.js has loaded.
  const times: number[] = [];
  const live: number[] = [];
  const ready: number[] = [];
  const ttfb: number[] = [];
  for (let i = 0; i < 5; i++) {
    const page = await context.newPage();
    const t0 = Date.now();
    const nav = page.goto(`${server.url}/combinations/${demo.id}`, { waitUntil: "commit" });
    const firstByte = await nav.then(() => Date.now() - t0);
    ttfb.push(firstByte);
    // One predicate for both (it runs in the page, so it cannot call out to a helper).
    const drawn = (svgCounts: boolean) => {
      const curve = document.querySelector<SVGPathElement>('[data-testid="curve-preview"] path[data-curve]');
      if (svgCounts && curve && curve.getTotalLength() > 0 && curve.getBoundingClientRect().width > 0) return true;
      return [...document.querySelectorAll("canvas")].some((c) => {
        const ctx = (c as HTMLCanvasElement).getContext("2d");
        if (!ctx || c.width === 0) return false;
        const d = ctx.getImageData(0, 0, c.width, c.height).data;
        for (let j = 3; j < d.length; j += 16) if (d[j] !== 0) return true;
        return false;
      });
    };
    await page.waitForFunction(drawn, true, { timeout: 30_000, polling: "raf" });
    times.push(Date.now() - t0);
    // Interactive planner: hydrated (its controls enabled) and its form holding the saved values.
    await page.waitForFunction(
      () => !!document.querySelector('[data-testid="planner"]:enabled') && !!(document.getElementById("f-drive.blowerPulleyDiameter") as HTMLInputElement | null)?.value,
      undefined,
      { timeout: 30_000, polling: 16 },
    );
    ready.push(Date.now() - t0);
    await page.waitForFunction(drawn, false, { timeout: 30_000, polling: 16 });
    live.push(Date.now() - t0);
    await page.close();
  }
  const med5 = (xs: number[]) => quantile(xs, 0.5);
  console.log(
    `\nplanner: navigation to a drawn chart, median of 5: ${med5(times)} ms (min ${Math.min(...times)}, max ${Math.max(...times)}); ` +
      `to a hydrated planner (controls enabled, form filled): median ${med5(ready)} ms; ` +
      `to the interactive chart.js chart: median ${med5(live)} ms; first byte of the page: median ${med5(ttfb)} ms`,
  );
  summary.push(`navigation to a drawn chart     ${String(med5(times)).padStart(7)} ms median     budget ≤ ${BUDGET.drawnChartMs} ms   ${verdict(med5(times) <= BUDGET.drawnChartMs)}`);

  // A slider move: from the input event to the frame after React re-rendered and the chart redrew.
  const page = await context.newPage();
  await page.goto(`${server.url}/combinations/${demo.id}`, { waitUntil: "networkidle" });
  await page.waitForSelector("canvas");
  const slider = page.getByRole("slider", { name: /^Blower pulley what-if/ });
  await slider.waitFor();
  const frameTimes = await slider.evaluate(async (el) => {
    const input = el as HTMLInputElement;
    const setter = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, "value")!.set!;
    const out: number[] = [];
    const idle: number[] = [];
    for (let i = 0; i < 30; i++) {
      const t0 = performance.now();
      await new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r)));
      idle.push(performance.now() - t0);
    }
    const min = Number(input.min);
    const max = Number(input.max);
    for (let i = 0; i < 30; i++) {
      const v = min + ((max - min) * (i % 10)) / 10;
      const t0 = performance.now();
      setter.call(input, String(v));
      input.dispatchEvent(new Event("input", { bubbles: true }));
      await new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r)));
      out.push(performance.now() - t0);
    }
    return { out, idle };
  });
  const med = (xs: number[]) => quantile(xs, 0.5);
  const p90 = (xs: number[]) => quantile(xs, 0.9);
  console.log(
    `planner: slider move to the second frame after it, median of 30: ${med(frameTimes.out).toFixed(1)} ms (p90 ${p90(frameTimes.out).toFixed(1)} ms) ` +
      `against ${med(frameTimes.idle).toFixed(1)} ms for two idle frames: ratio ${(med(frameTimes.out) / med(frameTimes.idle)).toFixed(2)}`,
  );
  const ratio = med(frameTimes.out) / med(frameTimes.idle);
  summary.push(`slider move / two idle frames   ${ratio.toFixed(2).padStart(7)}×           budget ≤ ${BUDGET.sliderRatio}×      ${verdict(ratio <= BUDGET.sliderRatio)}`);
  console.log(`\nBudgets (load average now: ${load()} on ${os.cpus().length} cores)\n${summary.join("\n")}`);
} finally {
  await browser.close();
  await server.stop();
}
