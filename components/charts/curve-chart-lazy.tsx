"use client";
// The curve chart loaded after the page, so chart.js stays out of the planner's first-load JS.
import dynamic from "next/dynamic";
import type { CurveChartProps } from "./curve-chart";

export const LazyCurveChart = dynamic<CurveChartProps>(() => import("./curve-chart").then((m) => m.CurveChart), {
  ssr: false,
  loading: () => (
    <div role="status" className="flex h-80 items-center justify-center rounded-md border border-dashed border-line text-sm text-muted">
      Drawing the chart…
    </div>
  ),
});
