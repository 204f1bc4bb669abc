"use client";
// The curve chart loaded after the page, so chart.js stays out of the planner's first-load JS.
import dynamic from "next/dynamic";
import type { CurveChartProps } from "./curve-chart";

const load = () => import("./curve-chart");
// Start fetching chart.js as soon as this module runs in the browser, not when the chart first
// renders after hydration, so the chart is drawn sooner while staying out of the first load.
if (typeof window !== "undefined") void load();

export const LazyCurveChart = dynamic<CurveChartProps>(() => load().then((m) => m.CurveChart), {
  ssr: false,
  loading: () => (
    <div role="status" className="flex h-80 items-center justify-center rounded-md border border-dashed border-line text-sm text-muted">
      Drawing the chart…
    </div>
  ),
});
