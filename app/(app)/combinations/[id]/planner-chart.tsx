"use client";
// The planner's chart: the pulley slider, the series switches and the boost and power curves.
import { unitLabel, type UnitSystem } from "@/calc";
import type { CurveMetric, CurveSeries } from "@/components/charts/curve-chart";
import { LazyCurveChart } from "@/components/charts/curve-chart-lazy";
import { quantityText } from "@/lib/units/format";
import type { ChartOptions, SolvedResults } from "./use-planner-results";

type PlannerChartProps = {
  results: SolvedResults;
  system: UnitSystem;
  series: CurveSeries[];
  metrics: CurveMetric[];
  slider: { min: number; max: number; step: number };
  /** The pulley as the spec holds it (SI) and as the field holds it (user's units). */
  pulley: { si: number; field: number };
  onPulley: (fieldValue: number) => void;
  options: ChartOptions;
  onOptions: (o: ChartOptions) => void;
};

export function PlannerChart({ results, system, series, metrics, slider, pulley, onPulley, options, onOptions }: PlannerChartProps) {
  const toggle = (k: keyof ChartOptions) => (e: React.ChangeEvent<HTMLInputElement>) => onOptions({ ...options, [k]: e.target.checked });
  return (
    <section aria-labelledby="chart-heading" className="flex flex-col gap-2">
      <h2 id="chart-heading" className="text-base font-semibold">
        Boost and power
      </h2>
      <label className="flex flex-col gap-1 text-sm">
        <span className="font-medium">
          Try blower pulley sizes <span className="font-normal text-muted">({unitLabel("length-small", system)})</span>
        </span>
        <input
          type="range"
          aria-label="Blower pulley slider"
          aria-valuetext={quantityText("length-small", pulley.si, system)}
          min={slider.min}
          max={slider.max}
          step={slider.step}
          value={Number.isFinite(pulley.field) ? pulley.field : slider.min}
          onChange={(e) => onPulley(Number(e.target.value))}
        />
      </label>
      <div className="flex flex-wrap gap-4 text-sm">
        <label className="flex items-center gap-1">
          <input type="checkbox" checked={options.showNeighbours} onChange={toggle("showNeighbours")} /> Neighbouring pulleys
        </label>
        <label className="flex items-center gap-1">
          <input type="checkbox" checked={options.showTemperature} onChange={toggle("showTemperature")} /> Charge temperature
        </label>
        <label className="flex items-center gap-1">
          <input type="checkbox" checked={options.showBlowerSpeed} onChange={toggle("showBlowerSpeed")} /> Blower speed
        </label>
      </div>
      <LazyCurveChart
        series={series}
        metrics={metrics}
        unitSystem={system}
        redlineRpm={results.spec.engine.redlineRpm}
        blowerMaxRpm={results.spec.blower.maxRpm}
        height={360}
        ariaLabel="Boost, net power and torque against engine speed for the current and neighbouring blower pulleys"
      />
    </section>
  );
}
