// @ts-nocheck
"use client";
// Where each axis of a drawn chart sits and how much its tick labels and title need, written on
// the canvas (data-axes) so a browser test can check that titles and ticks do not overlap.
import type { CartesianScaleOptions, Plugin, Scale } from "chart.js";
import { toFont, toPadding } from "chart.js/helpers";

export type AxisReport = {
  id: string;
  /** "x" or "y". */
  axis: string;
  /** The axis's box on the canvas (CSS px). */
  left: number;
  top: number;
  right: number;
  bottom: number;
  /** Widest tick label and a label's line height (px). */
  labelWidth: number;
  labelHeight: number;
  /** Tick mark and the gap between it and the labels (px). */
  tickSpace: number;
  /** The title's line height with its padding (0 when hidden), and its text's length (px). */
  titleHeight: number;
  titleWidth: number;
};

function report(scale: Scale, ctx: CanvasRenderingContext2D): AxisReport {
  const o = scale.options as unknown as CartesianScaleOptions;
  const tick = toFont(o.ticks.font as Parameters<typeof toFont>[0]);
  const title = toFont(o.title.font as Parameters<typeof toFont>[0]);
  ctx.save();
  ctx.font = tick.string;
  const labelWidth = o.ticks.display ? Math.max(0, ...scale.ticks.map((t) => ctx.measureText(String(t.label ?? "")).width)) : 0;
  ctx.font = title.string;
  const titleWidth = o.title.display ? ctx.measureText(String(o.title.text)).width : 0;
  ctx.restore();
  return {
    id: scale.id,
    axis: scale.axis,
    left: scale.left,
    top: scale.top,
    right: scale.right,
    bottom: scale.bottom,
    labelWidth,
    labelHeight: o.ticks.display ? tick.lineHeight : 0,
    tickSpace: (o.grid?.drawTicks ? (o.grid.tickLength ?? 0) : 0) + (o.ticks.display ? (o.ticks.padding ?? 0) : 0),
    titleHeight: o.title.display ? title.lineHeight + toPadding(o.title.padding as Parameters<typeof toPadding>[0]).height : 0,
    titleWidth,
  };
}

export const axesReportPlugin: Plugin<"line"> = {
  id: "pwAxesReport",
  afterDraw(chart) {
    chart.canvas.dataset.axes = JSON.stringify(Object.values(chart.scales).map((s) => report(s, chart.ctx)));
  },
};
