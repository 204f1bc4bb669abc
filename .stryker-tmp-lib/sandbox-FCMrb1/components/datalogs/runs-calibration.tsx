// @ts-nocheck
"use client";
// Calibrate from the combination's logs: pick the logs (runs at one or more pulley sizes), see the
// residuals before and after, what the fit changed (from → to), and the next pulley predicted.
import { useMemo, useState } from "react";
import { unitLabel, type Combination, type UnitSystem } from "@/calc";
import { cleanLog, type CleaningOptions, type LogAmbient, type LogPoint } from "@/lib/datalogs/parse";
import { fitRuns, predictNextPulley, type LogRun } from "@/lib/datalogs/runs";
import { fig, rpmText } from "@/lib/datalogs/format";
import { DataTable } from "@/components/ui/data-table";
import { Notice } from "@/components/ui/notice";

export type CalibrationLog = { id: string; name: string; revision: number; blowerPulleyDiameter: number; points: LogPoint[]; ambient: LogAmbient };

type Props = { thisLogId: string; logs: CalibrationLog[]; current: Combination; options: CleaningOptions; unitSystem: UnitSystem; onChosen: (ids: string[]) => void };

const pct = (v: number) => `${(100 * v).toFixed(1)} %`;

export function RunsCalibration({ thisLogId, logs, current, options, unitSystem, onChosen }: Props) {
  const [chosen, setChosen] = useState<string[]>([thisLogId]);
  const pUnit = unitLabel("pressure", unitSystem);
  const runs: LogRun[] = useMemo(
    () => logs.filter((l) => chosen.includes(l.id)).map((l) => ({ id: l.id, name: l.name, blowerPulleyDiameter: l.blowerPulleyDiameter, bins: cleanLog(l.points, l.ambient.pressure, options).bins })),
    [logs, chosen, options],
  );
  const fit = useMemo(() => {
    try {
      return { ok: true as const, ...fitRuns(current, runs) };
    } catch (e) {
      return { ok: false as const, message: e instanceof Error ? e.message : "The logs could not be fitted." };
    }
  }, [current, runs]);
  const topRpm = fit.ok ? Math.max(...fit.runs.flatMap((r) => r.measured.map((m) => m.rpm))) : 0;
  const next = fit.ok ? predictNextPulley(current, fit.calibrated, fit.runs, topRpm) : null;
  const sizes = new Set(runs.map((r) => r.blowerPulleyDiameter)).size;

  function toggle(id: string, on: boolean) {
    const ids = on ? [...chosen, id] : chosen.filter((x) => x !== id);
    setChosen(ids);
    onChosen(ids);
  }

  return (
    <section aria-labelledby="runs-heading" className="flex flex-col gap-3 rounded-md border border-line bg-panel p-3" data-testid="runs-calibration">
      <h2 id="runs-heading" className="font-semibold">
        Logs to calibrate from
      </h2>
      <fieldset className="flex flex-col gap-1">
        <legend className="text-sm text-muted">Each log is a run at the blower pulley of the revision it was logged with. Two or more pulley sizes let the fit move the blower&apos;s slip too.</legend>
        {logs.map((l) => (
          <label key={l.id} className="flex items-center gap-2 text-sm">
            <input type="checkbox" checked={chosen.includes(l.id)} onChange={(e) => toggle(l.id, e.target.checked)} />
            {l.name} (revision {l.revision}, blower pulley {fig("length-small", l.blowerPulleyDiameter, unitSystem)} {unitLabel("length-small", unitSystem)})
          </label>
        ))}
      </fieldset>
      {!fit.ok ? <Notice tone="danger">{fit.message}</Notice> : null}
      {fit.ok ? (
        <>
          <h3 className="font-medium">What the fit changed ({sizes} pulley {sizes === 1 ? "size: VE only" : "sizes: slip and VE"})</h3>
          <ul className="list-disc pl-5 text-sm" data-testid="fitted-changes">
            {fit.fitted.map((f) =>
              f.parameter === "blower.volumetricEfficiencyRef" ? (
                <li key={f.parameter}>
                  Blower volumetric efficiency (slip): {pct(f.from)} → {pct(f.to)}
                </li>
              ) : (
                <li key={f.parameter}>
                  Engine VE at {rpmText(f.to[0].rpm)}–{rpmText(f.to[f.to.length - 1].rpm)} rpm: {pct(Math.min(...f.from.map((p) => p.ve)))}–{pct(Math.max(...f.from.map((p) => p.ve)))} →{" "}
                  {pct(Math.min(...f.to.map((p) => p.ve)))}–{pct(Math.max(...f.to.map((p) => p.ve)))}
                </li>
              ),
            )}
          </ul>
          <DataTable
            density="figures"
            caption="Residuals before and after the fit"
            rows={fit.residuals}
            rowKey={(r) => `${r.run}-${r.rpm}`}
            empty="No residuals."
            columns={[
              { label: "Pulley", cell: (r) => fig("length-small", r.blowerPulleyDiameter, unitSystem) },
              { label: "Engine speed (rpm)", cell: (r) => rpmText(r.rpm) },
              { label: `Measured (${pUnit})`, align: "right", cell: (r) => fig("pressure", r.measuredBoostGauge, unitSystem) },
              { label: `Residual before (${pUnit})`, align: "right", cell: (r) => fig("pressure", r.residualBefore, unitSystem, 3) },
              { label: `Residual after (${pUnit})`, align: "right", cell: (r) => fig("pressure", r.residualAfter, unitSystem, 3) },
            ]}
          />
          {next ? (
            <p className="text-sm" data-testid="next-pulley">
              Next pulley, {fig("length-small", next.diameter, unitSystem)} {unitLabel("length-small", unitSystem)}, at {rpmText(topRpm)} rpm:{" "}
              {next.withinRange ? (
                <>
                  {fig("pressure", next.after, unitSystem)} {pUnit} with the fit ({fig("pressure", next.before, unitSystem)} {pUnit} before it).
                </>
              ) : (
                <>outside the model&apos;s range; no figure is given.</>
              )}{" "}
              Check blower speed and belt before ordering.
            </p>
          ) : null}
        </>
      ) : null}
    </section>
  );
}
