// `npm run bench:web`: page weight and speed in Debian's Chromium against a production build.
// For each main route: the JavaScript it loads on first visit (compressed with gzip, as a server
// would send it). For the planner: the time from navigation to a drawn boost chart (median of 5).
//   --skip-build   reuse the last benchmark build (.next-bench)
import zlib from "node:zlib";
import { launchBrowser } from "../tests/support/browser";
import { serveThrowaway, signInCookie } from "./serve-throwaway";
import { quantile } from "./stats";

const args = process.argv.slice(2);
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
  console.log("page's HTML (what Next counts as first-load JS); all = every script loaded until the network is idle\n");
  console.log("route                                   first-load gzip kB   all scripts   all gzip kB");
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
    const first = scripts.filter((s) => initial.has(s.url)).reduce((n, s) => n + gzip(s.body), 0);
    const all = scripts.reduce((n, s) => n + gzip(s.body), 0);
    const label = route.replaceAll(demo.id, ":id").slice(0, 38);
    const isPlanner = label === "/combinations/:id";
    console.log(
      `${label.padEnd(39)} ${(first / 1024).toFixed(0).padStart(18)} ${String(scripts.length).padStart(13)} ${(all / 1024).toFixed(0).padStart(13)}` +
        (res && res.status() >= 400 ? `   (HTTP ${res.status()})` : "") +
        (isPlanner ? `   planner first-load target < 250 kB: ${first / 1024 < 250 ? "met" : "NOT met"}` : ""),
    );
    await page.close();
  }

  const times: number[] = [];
  const ttfb: number[] = [];
  for (let i = 0; i < 5; i++) {
    const page = await context.newPage();
    const t0 = Date.now();
    const nav = page.goto(`${server.url}/combinations/${demo.id}`, { waitUntil: "commit" });
    const firstByte = await nav.then(() => Date.now() - t0);
    ttfb.push(firstByte);
    // Drawn = a chart canvas with pixels on it.
    await page.waitForFunction(
      () =>
        [...document.querySelectorAll("canvas")].some((c) => {
          const ctx = (c as HTMLCanvasElement).getContext("2d");
          if (!ctx || c.width === 0) return false;
          const d = ctx.getImageData(0, 0, c.width, c.height).data;
          for (let j = 3; j < d.length; j += 16) if (d[j] !== 0) return true;
          return false;
        }),
      undefined,
      { timeout: 30_000, polling: 16 },
    );
    times.push(Date.now() - t0);
    await page.close();
  }
  times.sort((a, b) => a - b);
  ttfb.sort((a, b) => a - b);
  console.log(`\nplanner: navigation to a drawn chart, median of 5: ${times[2]} ms (min ${times[0]}, max ${times[4]}); first byte of the page: median ${ttfb[2]} ms`);

  // A slider move: from the input event to the frame after React re-rendered and the chart redrew.
  const page = await context.newPage();
  await page.goto(`${server.url}/combinations/${demo.id}`, { waitUntil: "networkidle" });
  await page.waitForSelector("canvas");
  const slider = page.getByRole("slider", { name: "Blower pulley slider" });
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
} finally {
  await browser.close();
  await server.stop();
}
