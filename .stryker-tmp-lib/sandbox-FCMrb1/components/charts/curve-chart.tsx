// @ts-nocheck
"use client";
// Curves against engine speed: one y axis per kind of quantity, colour-blind-safe colours,
// a redline marker and the blower speed limit. Only the chart.js parts used are registered,
// to keep the planner's bundle small. Screen readers get the same numbers in a hidden table.
import {
  Chart as ChartJS,
  Legend,
  LinearScale,
  LineController,
  LineElement,
  PointElement,
  Tooltip,
  type ChartDataset,
  type ChartOptions,
  type ScaleOptions,
} from "chart.js";
import { useId, useMemo, type JSX } from "react";
import { Line } from "react-chartjs-2";
import type { OperatingPoint, UnitSystem } from "@/calc";
import {
  axisDigits,
  axisUnit,
  DASHES,
  exposeSeries,
  METRICS,
  metricDisplay,
  metricValue,
  OKABE_ITO,
  PRINT_GREYS,
  type AxisKind,
  type CurveMetric,
} from "@/lib/charts/metrics";

import { outsideRangeText } from "@/lib/planner/range-words";
import { axesReportPlugin } from "./axes-report";
import { markersPlugin, useInk, type Marks } from "./chart-marks";

ChartJS.register(LineController, LineElement, PointElement, LinearScale, Tooltip, Legend);

export type { CurveMetric } from "@/lib/charts/metrics";

/** A series; `muted` ones (neighbouring pulleys) are thin and grey-toned, labelled at their line's end instead of in the legend. */
export type CurveSeries = { label: string; points: OperatingPoint[]; dashed?: boolean; colorIndex?: number; muted?: boolean };

/** At most two y axes per chart (readability): metrics of a third kind are left out. */
const MAX_AXES = 2;
/** A point's value for the chart, or null where the model says it is outside its range (a gap in the line). */
const plotted = (m: CurveMetric, p: OperatingPoint, system: UnitSystem) => (p.withinRange ? metricValue(m, p, system) : null);

export type CurveChartProps = {
  series: CurveSeries[];
  metrics: CurveMetric[];
  unitSystem: UnitSystem;
  redlineRpm?: number;
  blowerMaxRpm?: number;
  /** Pixels, or any CSS height (the classroom passes "max(560px, 62vh)"). */
  height?: number | string;
  /** Tick, axis-title and legend size in px (chart.js's default, 12, when left out). */
  fontSize?: number;
  ariaLabel: string;
  print?: boolean;
  animate?: boolean;
};

const fmt = (v: number, digits: number) => v.toLocaleString("en-US", { minimumFractionDigits: digits, maximumFractionDigits: digits });

/** Line chart of operating points against engine speed. */
export function CurveChart({
  series,
  metrics,
  unitSystem,
  redlineRpm,
  blowerMaxRpm,
  height = 320,
  fontSize,
  ariaLabel,
  print = false,
  animate = false,
}: CurveChartProps): JSX.Element {
  const tableId = useId();
  const ink = useInk(print);

  const axes = useMemo(() => {
    const kinds: AxisKind[] = [];
    for (const m of metrics) if (!kinds.includes(METRICS[m].kind) && kinds.length < MAX_AXES) kinds.push(METRICS[m].kind);
    return kinds.map((kind, i) => ({
      kind,
      id: `y${i}`,
      position: (i % 2 === 0 ? "left" : "right") as "left" | "right",
      title: `${metrics.filter((m) => METRICS[m].kind === kind).map((m) => METRICS[m].label).join(", ")} (${axisUnit(kind, unitSystem)})`,
    }));
  }, [metrics, unitSystem]);

  const datasets = useMemo(() => {
    const many = series.length > 1;
    const palette = print ? PRINT_GREYS : OKABE_ITO.map((c) => (c === "#000000" ? ink.fg : c));
    const out: ChartDataset<"line", { x: number; y: number | null }[]>[] = [];
    series.forEach((s, si) => {
      metrics.forEach((m, mi) => {
        const axis = axes.find((a) => a.kind === METRICS[m].kind);
        if (!axis) return;
        const colour = s.muted ? ink.muted : palette[(many ? (s.colorIndex ?? si) : (s.colorIndex ?? 0) + mi) % palette.length];
        const dash = many || print ? DASHES[mi % DASHES.length] : [];
        out.push({
          label: metrics.length > 1 || series.length > 1 ? `${s.label}: ${METRICS[m].label}` : s.label,
          data: s.points.map((p) => ({ x: p.rpm, y: plotted(m, p, unitSystem) })),
          yAxisID: axis.id,
          borderColor: colour,
          backgroundColor: colour,
          borderWidth: s.muted ? 1.25 : s.dashed ? 1.5 : 2.5,
          borderDash: s.dashed && dash.length === 0 ? [6, 4] : dash,
          pointRadius: 0,
          pointHoverRadius: 3,
          tension: 0.25,
          spanGaps: false,
          // Direct label for muted lines (drawn by the marks plugin), none in the legend.
          ...(s.muted ? { pwDirectLabel: s.label } : {}),
        });
      });
    });
    return out;
  }, [series, metrics, axes, unitSystem, print, ink.fg, ink.muted]);

  const speedAxis = axes.find((a) => a.kind === "speed")?.id;

  const options = useMemo((): ChartOptions<"line"> => {
    const font = fontSize ? { font: { size: fontSize } } : {};
    const scales: Record<string, ScaleOptions<"linear">> = {
      x: {
        type: "linear",
        title: { display: true, text: "Engine speed (rpm)", color: ink.fg, ...font },
        // The x axis ends at redline: nothing beyond it is a prediction anyone should use.
        ...(redlineRpm !== undefined ? { max: redlineRpm } : {}),
        ticks: { color: ink.muted, callback: (v) => fmt(Number(v), 0), ...font },
        grid: { color: ink.grid },
      } as ScaleOptions<"linear">,
    };
    for (const a of axes) {
      const max = a.kind === "speed" && blowerMaxRpm !== undefined ? { suggestedMax: blowerMaxRpm * 1.05 } : {};
      scales[a.id] = {
        type: "linear",
        position: a.position,
        title: { display: true, text: a.title, color: ink.fg, ...font },
        ticks: { color: ink.muted, ...font },
        grid: { color: ink.grid, drawOnChartArea: a.id === "y0" },
        ...max,
      } as ScaleOptions<"linear">;
    }
    const marks: Marks = { redlineRpm, blowerMaxRpm: speedAxis ? blowerMaxRpm : undefined, speedAxis, ink: print ? "#000000" : ink.fg, print };
    return {
      responsive: true,
      maintainAspectRatio: false,
      animation: animate && !print ? { duration: 250 } : false,
      parsing: false,
      normalized: true,
      interaction: { mode: "index", intersect: false },
      scales,
      plugins: {
        legend: {
          position: "bottom",
          labels: { color: ink.fg, boxWidth: 18, boxHeight: 2, ...font, filter: (item, data) => !(data.datasets[item.datasetIndex ?? 0] as { pwDirectLabel?: string }).pwDirectLabel },
        },
        tooltip: {
          enabled: !print,
          callbacks: {
            title: (items) => (items.length ? `${fmt(items[0].parsed.x ?? 0, 0)} rpm` : ""),
            label: (item) => {
              const ds = item.dataset;
              const axis = axes.find((a) => a.id === ds.yAxisID);
              if (!axis || item.parsed.y === null) return `${ds.label}: –`;
              return `${ds.label}: ${fmt(item.parsed.y, axisDigits(axis.kind, unitSystem))} ${axisUnit(axis.kind, unitSystem)}`;
            },
          },
        },
        pwMarkers: marks,
      } as ChartOptions<"line">["plugins"],
    };
  }, [axes, ink, redlineRpm, blowerMaxRpm, speedAxis, print, animate, unitSystem, fontSize]);

  const exposed = useMemo(() => JSON.stringify(exposeSeries(series, metrics, unitSystem)), [series, metrics, unitSystem]);
  const rpms = useMemo(() => [...new Set(series.flatMap((s) => s.points.map((p) => p.rpm)))].sort((a, b) => a - b), [series]);

  return (
    <figure className={`flex flex-col gap-1 ${print ? "bg-white" : ""}`} data-testid="curve-chart" data-series={exposed} data-font-size={fontSize ?? 12}>
      <div style={{ height }} className="relative">
        <Line
          data={{ datasets }}
          options={options}
          plugins={[markersPlugin, axesReportPlugin]}
          role="img"
          aria-label={ariaLabel}
          aria-describedby={tableId}
        />
      </div>
      {/* The wrapper clips: a table ignores a 1 px width, so an sr-only table alone widens the page. */}
      <div className="sr-only">
      <table id={tableId} data-testid="curve-chart-table">
        <caption>{ariaLabel}</caption>
        <thead>
          <tr>
            <th scope="col">Engine speed (rpm)</th>
            {series.flatMap((s) =>
              metrics.map((m) => (
                <th scope="col" key={`${s.label}-${m}`}>
                  {`${s.label}: ${METRICS[m].label} (${axisUnit(METRICS[m].kind, unitSystem)})`}
                </th>
              )),
            )}
          </tr>
        </thead>
        <tbody>
          {rpms.map((rpm) => (
            <tr key={rpm}>
              <th scope="row">{fmt(rpm, 0)}</th>
              {series.flatMap((s) =>
                metrics.map((m) => {
                  const p = s.points.find((q) => q.rpm === rpm);
                  if (p && !p.withinRange) return <td key={`${s.label}-${m}`}>{outsideRangeText(p.rangeReasons, unitSystem)}</td>;
                  const v = p ? metricDisplay(m, p, unitSystem) : null;
                  return <td key={`${s.label}-${m}`}>{v === null ? "–" : fmt(v, axisDigits(METRICS[m].kind, unitSystem))}</td>;
                }),
              )}
            </tr>
          ))}
        </tbody>
      </table>
      </div>
    </figure>
  );
}
