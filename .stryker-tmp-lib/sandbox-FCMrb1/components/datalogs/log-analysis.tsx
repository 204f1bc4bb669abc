// @ts-nocheck
"use client";
// Cleaning and comparing one log: the samples (kept, part throttle and outliers greyed), the
// binned measured curve over the prediction for the combination as logged, and the error per bin.
import Link from "next/link";
import { useMemo, useState } from "react";
import { unitLabel, fromSI, type Combination, type UnitSystem } from "@/calc";
import { cleanLog, type CleaningOptions, type LogAmbient, type LogPoint } from "@/lib/datalogs/parse";
import { CleaningControls } from "./cleaning-controls";
import { cleaningToQuery } from "@/lib/datalogs/cleaning-query";
import { compareBins, predictedCurve } from "@/lib/datalogs/analysis";
import { fig, PALETTE, rpmText } from "@/lib/datalogs/format";
import { XyChart, type XySeries } from "./xy-chart";

const MAX_DOTS = 4000;
const GREY = "#9aa3ad";
const LIGHT_GREY = "#c8cdd2";

/** At most `max` points, evenly spread, so a long log stays quick to draw. */
function thin<T>(xs: T[], max = MAX_DOTS): T[] {
  if (xs.length <= max) return xs;
  const step = xs.length / max;
  return Array.from({ length: max }, (_, i) => xs[Math.floor(i * step)]);
}

export type LogAnalysisProps = {
  logId: string;
  points: LogPoint[];
  ambient: LogAmbient;
  loggedSpec: Combination;
  unitSystem: UnitSystem;
  initial: CleaningOptions;
};

export function LogAnalysis({ logId, points, ambient, loggedSpec, unitSystem, initial }: LogAnalysisProps) {
  const [options, setOptions] = useState(initial);
  const hasThrottle = points.length > 0 && points.every((p) => p.throttle !== null);
  const cleaned = useMemo(() => cleanLog(points, ambient.pressure, options), [points, ambient.pressure, options]);
  const comparison = useMemo(() => compareBins(loggedSpec, cleaned.bins), [loggedSpec, cleaned.bins]);
  const pUnit = unitLabel("pressure", unitSystem);
  const y = (pa: number) => fromSI("pressure", pa - ambient.pressure, unitSystem);

  const series = useMemo<XySeries[]>(() => {
    const by = (s: string) => thin(points.filter((_, i) => cleaned.status[i] === s).map((p) => ({ x: p.rpm, y: y(p.manifoldPressure) })));
    const usable = cleaned.bins.filter((b) => b.usable);
    const lo = usable.length ? usable[0].from : 1000;
    const hi = usable.length ? usable[usable.length - 1].to : loggedSpec.engine.redlineRpm;
    return [
      { label: "Wide-open-throttle samples", points: by("kept"), color: PALETTE[0], pointRadius: 2 },
      { label: `Outliers (${cleaned.counts.outliers}, not used)`, points: by("outlier"), color: GREY, pointRadius: 3 },
      { label: `Part throttle (${cleaned.counts.partThrottle}, not used)`, points: by("part-throttle"), color: LIGHT_GREY, pointRadius: 2 },
      { label: "Measured, binned", points: usable.map((b) => ({ x: b.rpm, y: fromSI("pressure", b.boostGauge, unitSystem) })), color: PALETTE[1], line: true },
      { label: "Predicted, as logged", points: predictedCurve(loggedSpec, lo, hi).map((p) => ({ x: p.rpm, y: fromSI("pressure", p.boost, unitSystem) })), color: PALETTE[2], line: true, dashed: true, pointRadius: 0 },
    ];
    // y depends only on ambient and units, both in the deps through these values
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [points, cleaned, loggedSpec, unitSystem, ambient.pressure]);

  const rmsDiff = comparison.filter((c) => c.difference !== null);
  const rms = rmsDiff.length ? Math.sqrt(rmsDiff.reduce((s, c) => s + c.difference! ** 2, 0) / rmsDiff.length) : null;

  return (
    <div className="flex flex-col gap-5">
      <CleaningControls value={options} onChange={setOptions} unitSystem={unitSystem} hasThrottle={hasThrottle} />
      <p className="text-sm" role="status" aria-live="polite" data-testid="cleaning-counts">
        {cleaned.counts.total.toLocaleString("en-US")} samples: {cleaned.counts.kept.toLocaleString("en-US")} kept,{" "}
        {cleaned.counts.partThrottle.toLocaleString("en-US")} below the {cleaned.rule === "throttle" ? "throttle" : "boost"} minimum and{" "}
        {cleaned.counts.outliers.toLocaleString("en-US")} outliers (more than {options.madLimit} MAD from their bin&rsquo;s median), both shown grey and left out.
      </p>
      <section aria-labelledby="overlay-heading" className="rounded-md border border-line bg-panel p-3">
        <h2 id="overlay-heading" className="mb-2 font-semibold">
          Measured over predicted boost
        </h2>
        <XyChart series={series} xLabel="Engine speed (rpm)" yLabel={`Boost (${pUnit}, gauge)`} ariaLabel="Scatter of measured boost against engine speed, with the binned measured curve and the predicted curve" />
      </section>
      <section aria-labelledby="compare-heading" className="flex flex-col gap-2">
        <h2 id="compare-heading" className="font-semibold">
          Error per speed bin
        </h2>
        {comparison.length === 0 ? (
          <p className="text-sm text-muted">No bin has {options.minSamples} or more kept samples. Loosen the cleaning.</p>
        ) : (
          <div className="overflow-x-auto">
            <table className="text-sm" aria-label="Measured and predicted boost per speed bin">
              <thead>
                <tr className="text-left text-muted">
                  <th className="pr-5 font-medium">Engine speed (rpm)</th>
                  <th className="pr-5 text-right font-medium">Samples</th>
                  <th className="pr-5 text-right font-medium">Measured ({pUnit})</th>
                  <th className="pr-5 text-right font-medium">Predicted ({pUnit})</th>
                  <th className="pr-5 text-right font-medium">Difference ({pUnit})</th>
                  <th className="pr-5 text-right font-medium">Difference (%)</th>
                </tr>
              </thead>
              <tbody>
                {comparison.map((c, i) => (
                  <tr key={c.rpm}>
                    <td className="pr-5">{rpmText(c.rpm)}</td>
                    <td className="pr-5 text-right">{cleaned.bins.filter((b) => b.usable)[i].kept}</td>
                    <td className="pr-5 text-right">{fig("pressure", c.measured, unitSystem)}</td>
                    <td className="pr-5 text-right">{fig("pressure", c.predicted, unitSystem)}</td>
                    <td className="pr-5 text-right">{c.difference === null ? "—" : (c.difference > 0 ? "+" : "") + fig("pressure", c.difference, unitSystem)}</td>
                    <td className="pr-5 text-right">{c.percent === null ? "—" : `${c.percent > 0 ? "+" : ""}${c.percent.toFixed(1)}`}</td>
                  </tr>
                ))}
              </tbody>
            </table>
            {rms !== null ? <p className="mt-1 text-sm text-muted">Root-mean-square difference: {fig("pressure", rms, unitSystem)} {pUnit}.</p> : null}
          </div>
        )}
      </section>
      <p>
        <Link href={`/datalogs/${logId}/calibrate?${cleaningToQuery(options)}`} className="inline-flex rounded-md bg-accent px-3 py-1.5 text-sm font-medium text-accent-fg hover:opacity-90">
          Calibrate the engine from this log
        </Link>
      </p>
    </div>
  );
}
