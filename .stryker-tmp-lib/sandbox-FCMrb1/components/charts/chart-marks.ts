// @ts-nocheck
"use client";
// The chart's own drawing: redline and blower speed limit lines (a chart.js plugin) and the
// page's colours read from the theme.
import type { Plugin } from "chart.js";
import { useEffect, useState } from "react";

export type Marks = { redlineRpm?: number; blowerMaxRpm?: number; speedAxis?: string; ink: string; print: boolean };

/** Draws the redline (vertical) and blower speed limit (horizontal) lines, and a white page in print. */
export const markersPlugin: Plugin<"line"> = {
  id: "pwMarkers",
  beforeDraw(chart) {
    const marks = (chart.options.plugins as { pwMarkers?: Marks }).pwMarkers;
    if (!marks?.print) return;
    const { ctx } = chart;
    ctx.save();
    ctx.fillStyle = "#ffffff";
    ctx.fillRect(0, 0, chart.width, chart.height);
    ctx.restore();
  },
  afterDatasetsDraw(chart) {
    const marks = (chart.options.plugins as { pwMarkers?: Marks }).pwMarkers;
    if (!marks) return;
    const { ctx, chartArea: area, scales } = chart;
    ctx.save();
    ctx.lineWidth = 1.5;
    ctx.strokeStyle = marks.ink;
    ctx.fillStyle = marks.ink;
    ctx.font = "11px sans-serif";
    if (marks.redlineRpm !== undefined && scales.x) {
      const x = scales.x.getPixelForValue(marks.redlineRpm);
      if (x >= area.left && x <= area.right) {
        ctx.setLineDash([4, 3]);
        ctx.beginPath();
        ctx.moveTo(x, area.top);
        ctx.lineTo(x, area.bottom);
        ctx.stroke();
        ctx.setLineDash([]);
        ctx.textAlign = "right";
        ctx.fillText("Redline", x - 3, area.top + 11);
      }
    }
    // Direct labels at the right end of muted lines (neighbouring pulleys), in the line's colour.
    ctx.textAlign = "right";
    chart.data.datasets.forEach((ds, i) => {
      const label = (ds as { pwDirectLabel?: string }).pwDirectLabel;
      const meta = chart.getDatasetMeta(i);
      if (!label || meta.hidden) return;
      const last = [...meta.data].reverse().find((el) => !(el as { skip?: boolean }).skip && Number.isFinite(el.y));
      if (!last) return;
      ctx.fillStyle = String(ds.borderColor ?? marks.ink);
      ctx.fillText(label, Math.min(last.x, area.right) - 4, last.y - 4);
    });
    ctx.fillStyle = marks.ink;
    const speed = marks.speedAxis ? scales[marks.speedAxis] : undefined;
    if (marks.blowerMaxRpm !== undefined && speed) {
      const y = speed.getPixelForValue(marks.blowerMaxRpm);
      if (y >= area.top && y <= area.bottom) {
        ctx.setLineDash([8, 3, 2, 3]);
        ctx.beginPath();
        ctx.moveTo(area.left, y);
        ctx.lineTo(area.right, y);
        ctx.stroke();
        ctx.setLineDash([]);
        ctx.textAlign = "left";
        ctx.fillText("Blower speed limit", area.left + 4, y - 4);
      }
    }
    ctx.restore();
  },
};

/** The page's colours from the CSS variables, followed when the theme changes. */
export function useInk(print: boolean): { fg: string; muted: string; grid: string } {
  const [ink, setInk] = useState({ fg: "#16191d", muted: "#5b636d", grid: "#d9dde2" });
  useEffect(() => {
    if (print) return;
    const read = () => {
      const s = getComputedStyle(document.documentElement);
      const v = (name: string, fallback: string) => s.getPropertyValue(name).trim() || fallback;
      setInk({ fg: v("--pw-fg", "#16191d"), muted: v("--pw-muted", "#5b636d"), grid: v("--pw-border", "#d9dde2") });
    };
    read();
    const media = window.matchMedia("(prefers-color-scheme: dark)");
    media.addEventListener("change", read);
    const observer = new MutationObserver(read);
    observer.observe(document.documentElement, { attributes: true, attributeFilter: ["class"] });
    return () => {
      media.removeEventListener("change", read);
      observer.disconnect();
    };
  }, [print]);
  return print ? { fg: "#000000", muted: "#333333", grid: "#cccccc" } : ink;
}
