// @ts-nocheck
"use client";
// The two charts every screen shows a combination with: boost on its own (with at most one
// extra quantity on a second axis), and net power with torque, sharing the rpm axis to redline.
// Used by the planner, side by side and (through the same props) the sheet and classroom.
import type { UnitSystem } from "@/calc";
import type { CurveMetric, CurveSeries } from "./curve-chart";
import { LazyCurveChart } from "./curve-chart-lazy";

export type BoostExtra = "none" | "manifoldTemperature" | "blowerRpm";

type BoostPowerChartsProps = {
  series: CurveSeries[];
  unitSystem: UnitSystem;
  redlineRpm?: number;
  blowerMaxRpm?: number;
  extra?: BoostExtra;
  /** What the charts show, for screen readers: "… against engine speed" is added. */
  subject: string;
  height?: number;
  print?: boolean;
};

export function BoostPowerCharts({ series, unitSystem, redlineRpm, blowerMaxRpm, extra = "none", subject, height = 260, print }: BoostPowerChartsProps) {
  const boostMetrics: CurveMetric[] = extra === "none" ? ["boostGauge"] : ["boostGauge", extra];
  return (
    <div className="flex min-w-0 flex-col gap-2" data-testid="boost-power-charts">
      <LazyCurveChart
        series={series}
        metrics={boostMetrics}
        unitSystem={unitSystem}
        redlineRpm={redlineRpm}
        blowerMaxRpm={blowerMaxRpm}
        height={height}
        print={print}
        ariaLabel={`Boost${extra === "manifoldTemperature" ? " and charge temperature" : extra === "blowerRpm" ? " and blower speed" : ""} against engine speed, ${subject}`}
      />
      <LazyCurveChart
        series={series}
        metrics={["netPower", "torque"]}
        unitSystem={unitSystem}
        redlineRpm={redlineRpm}
        height={height}
        print={print}
        ariaLabel={`Net power and torque against engine speed, ${subject}`}
      />
    </div>
  );
}
