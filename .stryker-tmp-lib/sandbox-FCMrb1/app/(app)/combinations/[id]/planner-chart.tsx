// @ts-nocheck
"use client";
// The planner's charts: the what-if pulley slider (the saved pulley changes only on Apply), the
// chart switches, boost and power charts, and the one-sentence why under them.
import { toSI, unitLabel, type UnitSystem } from "@/calc";
import { BoostPowerCharts, type BoostExtra } from "@/components/charts/boost-power-charts";
import type { CurveSeries } from "@/components/charts/curve-chart";
import { Button } from "@/components/ui/button";
import { fieldFromSI } from "@/lib/combinations/form-model";
import { quantityText } from "@/lib/units/format";
import type { ChartOptions, SolvedResults } from "./use-planner-results";

type PlannerChartProps = {
  results: SolvedResults;
  system: UnitSystem;
  series: CurveSeries[];
  slider: { min: number; max: number; step: number };
  /** The current pulley in the field's units (the slider rests there without a what-if). */
  pulleyField: number;
  /** The what-if pulley (SI), or null. */
  whatIf: number | null;
  onWhatIf: (si: number | null) => void;
  onApply: (si: number) => void;
  canApply: boolean;
  options: ChartOptions;
  onOptions: (o: ChartOptions) => void;
};

export function PlannerChart({ results, system, series, slider, pulleyField, whatIf, onWhatIf, onApply, canApply, options, onOptions }: PlannerChartProps) {
  const value = whatIf === null ? pulleyField : fieldFromSI("length-small", whatIf, system);
  const shown = whatIf ?? results.spec.drive.blowerPulleyDiameter;
  return (
    <section aria-labelledby="chart-heading" className="flex flex-col gap-2">
      <h2 id="chart-heading" className="text-base font-semibold">
        Boost and power
      </h2>
      <div className="flex flex-wrap items-end gap-3 text-sm">
        <label className="flex min-w-48 flex-1 flex-col gap-1">
          <span className="font-medium">
            Try blower pulley sizes: <output data-testid="slider-value">{quantityText("length-small", shown, system)}</output>
            {whatIf === null ? <span className="font-normal text-muted"> (current)</span> : <span className="font-normal text-muted"> (what-if, not applied)</span>}
          </span>
          <input
            type="range"
            aria-label={`Blower pulley what-if (${unitLabel("length-small", system)})`}
            aria-valuetext={quantityText("length-small", shown, system)}
            min={slider.min}
            max={slider.max}
            step={slider.step}
            value={Number.isFinite(value) ? value : slider.min}
            onChange={(e) => onWhatIf(toSI("length-small", Number(e.target.value), system))}
          />
        </label>
        {whatIf !== null ? (
          <>
            <Button type="button" variant="secondary" onClick={() => onApply(whatIf)} disabled={!canApply}>
              Apply {quantityText("length-small", whatIf, system)}
            </Button>
            <Button type="button" variant="ghost" onClick={() => onWhatIf(null)}>
              Back to current
            </Button>
          </>
        ) : null}
      </div>
      <div className="flex flex-wrap gap-4 text-sm">
        <label className="flex items-center gap-1">
          <input type="checkbox" checked={options.showNeighbours} onChange={(e) => onOptions({ ...options, showNeighbours: e.target.checked })} /> Neighbouring pulleys
        </label>
        <label className="flex items-center gap-1">
          Also on the boost chart:
          <select value={options.extra} onChange={(e) => onOptions({ ...options, extra: e.target.value as BoostExtra })} className="rounded-md border border-line bg-bg px-1 py-0.5">
            <option value="none">nothing</option>
            <option value="manifoldTemperature">charge temperature</option>
            <option value="blowerRpm">blower speed</option>
          </select>
        </label>
      </div>
      <BoostPowerCharts
        series={series}
        unitSystem={system}
        redlineRpm={results.spec.engine.redlineRpm}
        blowerMaxRpm={results.spec.blower.maxRpm}
        extra={options.extra}
        subject="for the current and neighbouring blower pulleys"
      />
      {results.why ? (
        <p className="text-sm" data-testid="planner-why" aria-live="polite">
          {results.why}
        </p>
      ) : null}
    </section>
  );
}
