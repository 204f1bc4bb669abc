// @ts-nocheck
import "server-only";
import { chromium } from "playwright-core";
import { CHROMIUM_ARGS } from "./chromium-args";

// Server-side PDFs: Debian's Chromium, driven by playwright-core, prints one of our own pages.
// One render at a time: a browser is heavy and this machine is small.


export type Paper = "a4" | "letter";

let queue: Promise<unknown> = Promise.resolve();

/** Number of pages in a PDF: the page tree's /Count, else the page objects. */
export function countPdfPages(pdf: Uint8Array): number {
  const text = Buffer.from(pdf).toString("latin1");
  const counts = [...text.matchAll(/\/Type\s*\/Pages\b[^>]*?\/Count\s+(\d+)/g)].map((m) => Number(m[1]));
  if (counts.length) return Math.max(...counts);
  return [...text.matchAll(/\/Type\s*\/Page(?![a-zA-Z])/g)].length;
}

/** Prints `url` to PDF on `paper` (the page's own @page rules apply). */
export function renderPdf(url: string, paper: Paper): Promise<Buffer> {
  const job = queue.then(() => render(url, paper));
  queue = job.catch(() => undefined);
  return job;
}

async function render(url: string, paper: Paper): Promise<Buffer> {
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", args: CHROMIUM_ARGS, timeout: 30_000 });
  try {
    const page = await browser.newPage();
    const res = await page.goto(url, { waitUntil: "networkidle", timeout: 30_000 });
    if (!res || !res.ok()) throw new Error(`The print page answered ${res?.status() ?? "nothing"}.`);
    await page.waitForSelector("[data-testid=recommendation-sheet] canvas", { timeout: 15_000 });
    await page.evaluate(() => document.fonts.ready.then(() => undefined));
    // The sheet is laid out for one page; should a long parts list or notes spill over, shrink it.
    let pdf = Buffer.alloc(0);
    for (const scale of [1, 0.9, 0.8, 0.7]) {
      pdf = Buffer.from(await page.pdf({ preferCSSPageSize: true, format: paper === "a4" ? "A4" : "Letter", printBackground: true, scale }));
      if (countPdfPages(pdf) <= 1) break;
    }
    return pdf;
  } finally {
    await browser.close();
  }
}
