// @ts-nocheck
"use client";
// The curve chart with chart.js loaded after the page, so chart.js stays out of the first-load
// JavaScript. Until it arrives the same curves are shown as a static SVG (curve-preview), which
// the server renders into the page's HTML: the person sees the chart at once.
import { useSyncExternalStore } from "react";
import type { CurveChartProps } from "./curve-chart";
import { CurvePreview } from "./curve-preview";

type ChartModule = typeof import("./curve-chart");
let loaded: ChartModule | null = null;
// Start fetching chart.js as soon as this module runs in the browser, not when the chart first
// renders after hydration.
const loading: Promise<ChartModule> | null =
  typeof window === "undefined"
    ? null
    : import("./curve-chart").then((m) => {
        loaded = m;
        return m;
      });

const subscribe = (done: () => void) => {
  let live = true;
  void loading?.then(() => live && done());
  return () => {
    live = false;
  };
};

export function LazyCurveChart(props: CurveChartProps) {
  // The server snapshot (null) keeps hydration identical to the server's HTML; after that, or on a
  // page opened by client navigation once chart.js is in, the interactive chart is used.
  const chart = useSyncExternalStore(subscribe, () => loaded, () => null);
  return chart ? <chart.CurveChart {...props} /> : <CurvePreview {...props} />;
}
