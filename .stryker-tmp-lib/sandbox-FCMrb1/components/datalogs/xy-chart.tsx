// @ts-nocheck
"use client";
// A small scatter/line chart for the datalog pages (react-chartjs-2's Scatter): measured samples
// as dots, binned and predicted curves as lines, axes labelled with units.
import { Chart as ChartJS, Legend, LinearScale, LineElement, PointElement, Tooltip, type ChartData, type ChartOptions } from "chart.js";
import { Scatter } from "react-chartjs-2";
import { useThemeColors } from "./theme-colors";

ChartJS.register(LinearScale, PointElement, LineElement, Tooltip, Legend);

export interface XySeries {
  label: string;
  points: { x: number; y: number }[];
  color: string;
  /** Draw as a line through the points (a curve) instead of dots. */
  line?: boolean;
  dashed?: boolean;
  pointRadius?: number;
}

export type XyChartProps = { series: XySeries[]; xLabel: string; yLabel: string; ariaLabel: string; height?: number };

export function XyChart({ series, xLabel, yLabel, ariaLabel, height = 320 }: XyChartProps) {
  const theme = useThemeColors();
  const data: ChartData<"scatter"> = {
    datasets: series.map((s) => ({
      label: s.label,
      data: s.points,
      showLine: !!s.line,
      borderColor: s.color,
      backgroundColor: s.color,
      borderWidth: s.line ? 2 : 0,
      borderDash: s.dashed ? [6, 4] : undefined,
      pointRadius: s.pointRadius ?? (s.line ? 3 : 2),
      pointHoverRadius: 5,
      // curves drawn over the dots (a lower order is drawn later)
      order: s.line ? 0 : 1,
    })),
  };
  const options: ChartOptions<"scatter"> = {
    animation: false,
    maintainAspectRatio: false,
    parsing: false,
    plugins: { legend: { labels: { color: theme.fg } } },
    scales: {
      x: { type: "linear", title: { display: true, text: xLabel, color: theme.fg }, ticks: { color: theme.muted }, grid: { color: theme.line } },
      y: { type: "linear", title: { display: true, text: yLabel, color: theme.fg }, ticks: { color: theme.muted }, grid: { color: theme.line } },
    },
  };
  return (
    <div style={{ height }} className="relative">
      <Scatter data={data} options={options} aria-label={ariaLabel} role="img" />
    </div>
  );
}
