// @ts-nocheck
// The chart's first frame: the same curves drawn as a plain SVG from the points the page already
// has (computed on the server when the page is rendered there), shown until chart.js arrives.
// No tooltips or legend clicks; the interactive chart replaces it a moment later.
import type { OperatingPoint } from "@/calc";
import { axisUnit, METRICS, metricValue, OKABE_ITO, type AxisKind } from "@/lib/charts/metrics";
import type { CurveChartProps } from "./curve-chart";

// Drawing box in SVG units; the SVG scales to the figure's width, keeping the aspect ratio.
const W = 640;
const PAD = { left: 48, right: 48, top: 10, bottom: 34 };

/** Ticks at 1, 2 or 5 × 10^n inside [lo, hi]: two to seven of them. */
export function niceTicks(lo: number, hi: number): number[] {
  if (!(hi > lo)) return [lo];
  const raw = (hi - lo) / 6;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((k) => k * mag).find((s) => s >= raw) ?? 10 * mag;
  const out: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9; v += step) out.push(Number(v.toPrecision(12)));
  return out;
}

/** A line's path through the plotted points, broken where the model has no figure (outside its range). */
function linePath(points: readonly OperatingPoint[], y: (p: OperatingPoint) => number | null, sx: (x: number) => number, sy: (v: number) => number): string {
  let d = "";
  let pen = false;
  for (const p of points) {
    const v = p.withinRange ? y(p) : null;
    if (v === null || !Number.isFinite(v)) {
      pen = false;
      continue;
    }
    d += `${pen ? "L" : "M"}${sx(p.rpm).toFixed(1)} ${sy(v).toFixed(1)}`;
    pen = true;
  }
  return d;
}

export function CurvePreview({ series, metrics, unitSystem, redlineRpm, height = 320, ariaLabel }: CurveChartProps) {
  const h = typeof height === "number" ? height : 320;
  const kinds: AxisKind[] = [];
  for (const m of metrics) if (!kinds.includes(METRICS[m].kind) && kinds.length < 2) kinds.push(METRICS[m].kind);
  const rpms = series.flatMap((s) => s.points.map((p) => p.rpm));
  const x0 = rpms.length ? Math.min(...rpms) : 0;
  const x1 = redlineRpm ?? (rpms.length ? Math.max(...rpms) : 1);
  const sx = (x: number) => PAD.left + ((x - x0) / (x1 - x0 || 1)) * (W - PAD.left - PAD.right);
  const axes = kinds.map((kind) => {
    const vals = series.flatMap((s) => s.points.filter((p) => p.withinRange && p.rpm <= x1).flatMap((p) => metrics.filter((m) => METRICS[m].kind === kind).map((m) => metricValue(m, p, unitSystem)))).filter((v): v is number => v !== null && Number.isFinite(v));
    const lo0 = Math.min(0, ...vals);
    const hi0 = Math.max(1e-9, ...vals);
    // Widen the axis by a step at either end the ticks leave out, so no curve leaves the plot.
    const ticks = niceTicks(lo0, hi0);
    const step = ticks.length > 1 ? ticks[1] - ticks[0] : 1;
    if (ticks[0] > lo0) ticks.unshift(Number((ticks[0] - step).toPrecision(12)));
    if (ticks[ticks.length - 1] < hi0) ticks.push(Number((ticks[ticks.length - 1] + step).toPrecision(12)));
    const lo = ticks[0];
    const hi = ticks[ticks.length - 1];
    const sy = (v: number) => h - PAD.bottom - ((v - lo) / (hi - lo || 1)) * (h - PAD.top - PAD.bottom);
    return { kind, ticks, sy };
  });
  const lines = series.flatMap((s, si) =>
    metrics.flatMap((m, mi) => {
      const axis = axes.find((a) => a.kind === METRICS[m].kind);
      if (!axis) return [];
      const colour = s.muted ? "var(--color-muted, #888)" : OKABE_ITO[(series.length > 1 ? (s.colorIndex ?? si) : (s.colorIndex ?? 0) + mi) % OKABE_ITO.length];
      const d = linePath(s.points.filter((p) => p.rpm <= x1), (p) => metricValue(m, p, unitSystem), sx, axis.sy);
      return d ? [{ key: `${si}-${m}`, d, colour, width: s.muted ? 1.25 : 2.5, dash: s.dashed || mi > 0 ? "6 4" : undefined }] : [];
    }),
  );
  const bottom = h - PAD.bottom;
  return (
    <figure className="flex min-w-0 flex-col gap-1" data-testid="curve-preview">
      <svg viewBox={`0 0 ${W} ${h}`} width="100%" style={{ maxHeight: h }} aria-hidden="true" className="text-muted" fontSize="11">
        {axes[0]?.ticks.map((t) => (
          <line key={t} x1={PAD.left} x2={W - PAD.right} y1={axes[0].sy(t)} y2={axes[0].sy(t)} stroke="currentColor" strokeOpacity="0.2" />
        ))}
        {axes.map((a, i) =>
          a.ticks.map((t) => (
            <text key={`${a.kind}-${t}`} x={i === 0 ? PAD.left - 4 : W - PAD.right + 4} y={a.sy(t) + 4} textAnchor={i === 0 ? "end" : "start"} fill="currentColor">
              {t.toLocaleString("en-US")}
            </text>
          )),
        )}
        {niceTicks(x0, x1).map((t) => (
          <text key={`x${t}`} x={sx(t)} y={bottom + 14} textAnchor="middle" fill="currentColor">
            {t.toLocaleString("en-US")}
          </text>
        ))}
        <text x={(PAD.left + W - PAD.right) / 2} y={h - 4} textAnchor="middle" fill="currentColor">
          Engine speed (rpm){axes.length ? ` · ${axes.map((a) => axisUnit(a.kind, unitSystem)).join(" left, ")}${axes.length > 1 ? " right" : ""}` : ""}
        </text>
        {redlineRpm !== undefined ? <line x1={sx(redlineRpm)} x2={sx(redlineRpm)} y1={PAD.top} y2={bottom} stroke="currentColor" strokeDasharray="4 3" /> : null}
        {lines.map((l) => (
          <path key={l.key} data-curve="" d={l.d} fill="none" stroke={l.colour} strokeWidth={l.width} strokeDasharray={l.dash} strokeLinejoin="round" />
        ))}
      </svg>
      <p role="status" className="sr-only">
        {ariaLabel}: the interactive chart and its table are loading.
      </p>
    </figure>
  );
}
