// @ts-nocheck
"use client";
// Calibrate: the VE curve fitted from the log (calc.calibrateVe), old against fitted, the
// residuals, what a smaller pulley gives with the measured engine, and saving it as a revision.
import Link from "next/link";
import { useMemo, useState } from "react";
import { unitLabel, veAt, type Combination, type UnitSystem } from "@/calc";
import { cleanLog, type CleaningOptions, type LogAmbient, type LogPoint } from "@/lib/datalogs/parse";
import { ApiError, apiJson } from "@/components/client-json";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { DataTable } from "@/components/ui/data-table";
import { Notice } from "@/components/ui/notice";
import { fitVe, pulleyComparison, smallerPulleys, withFittedVe, type VeFit } from "@/lib/datalogs/analysis";
import { CleaningControls } from "./cleaning-controls";
import { fig, PALETTE, rpmText } from "@/lib/datalogs/format";
import { RunsCalibration, type CalibrationLog } from "./runs-calibration";
import { XyChart } from "./xy-chart";

export type CalibrateViewProps = {
  logId: string;
  logName: string;
  points: LogPoint[];
  ambient: LogAmbient;
  loggedSpec: Combination;
  current: { id: string; name: string; revision: number; spec: Combination };
  loggedRevision: number;
  canSave: boolean;
  unitSystem: UnitSystem;
  initial: CleaningOptions;
  /** The combination's logs the person may pick to fit together (this one included). */
  logs: CalibrationLog[];
};

type SaveState = { kind: "saved"; revision: number } | { kind: "conflict" | "error"; message: string } | null;

export function CalibrateView(props: CalibrateViewProps) {
  const { logId, logName, points, ambient, loggedSpec, current, loggedRevision, canSave, unitSystem, initial, logs } = props;
  const [logIds, setLogIds] = useState<string[]>([logId]);
  const manyLogs = !(logIds.length === 1 && logIds[0] === logId);
  const [options, setOptions] = useState(initial);
  const hasThrottle = points.length > 0 && points.every((p) => p.throttle !== null);
  const pUnit = unitLabel("pressure", unitSystem);
  const dUnit = unitLabel("length-small", unitSystem);

  const cleaned = useMemo(() => cleanLog(points, ambient.pressure, options), [points, ambient.pressure, options]);
  const fit = useMemo((): { ok: true; fit: VeFit } | { ok: false; message: string } => {
    try {
      return { ok: true, fit: fitVe(loggedSpec, cleaned.bins) };
    } catch (e) {
      return { ok: false, message: e instanceof Error ? e.message : "The VE curve could not be fitted." };
    }
  }, [loggedSpec, cleaned.bins]);

  const usable = cleaned.bins.filter((b) => b.usable);
  const defaultRpm = usable.length ? Math.round(usable[usable.length - 1].rpm / 250) * 250 : 5000;
  const [rpmText_, setRpmText] = useState(String(defaultRpm));
  const chosenRpm = Number(rpmText_);
  const rpmError = !(chosenRpm >= 500 && chosenRpm <= 20_000) ? "Engine speed must be between 500 and 20 000 rpm" : undefined;

  const calibrated = fit.ok ? withFittedVe(current.spec, fit.fit.veCurve) : null;
  const ladder = useMemo(() => {
    if (!calibrated || rpmError) return null;
    return pulleyComparison(current.spec, calibrated, chosenRpm, smallerPulleys(current.spec.drive.blowerPulleyDiameter));
  }, [calibrated, current.spec, chosenRpm, rpmError]);

  const [save, setSave] = useState<SaveState>(null);
  const [busy, setBusy] = useState(false);

  async function saveRevision() {
    setBusy(true);
    setSave(null);
    try {
      const data = await apiJson<{ revision?: number } | null>(`/api/datalogs/${logId}/calibrate`, { method: "POST", json: { ...options, baseRevision: current.revision, ...(manyLogs ? { logIds } : {}) } });
      if (data?.revision) setSave({ kind: "saved", revision: data.revision });
      else setSave({ kind: "error", message: "The save failed (status 200)." });
    } catch (e) {
      if (e instanceof ApiError) setSave({ kind: e.status === 409 ? "conflict" : "error", message: e.serverMessage ?? `The save failed (status ${e.status}).` });
      else setSave({ kind: "error", message: "The save did not reach the server. Check the connection and try again." });
    } finally {
      setBusy(false);
    }
  }

  const oldCurve = loggedSpec.engine.veCurve;
  const range = fit.ok ? [fit.fit.veCurve[0].rpm, fit.fit.veCurve[fit.fit.veCurve.length - 1].rpm] : [0, 0];
  const oldDense = fit.ok
    ? Array.from({ length: 41 }, (_, i) => {
        const rpm = Math.min(oldCurve[0].rpm, range[0]) + ((Math.max(oldCurve[oldCurve.length - 1].rpm, range[1]) - Math.min(oldCurve[0].rpm, range[0])) * i) / 40;
        return { x: rpm, y: 100 * veAt(oldCurve, rpm) };
      })
    : [];
  const savedCurve = calibrated?.engine.veCurve ?? [];
  const savedDense = oldDense.map((p) => ({ x: p.x, y: 100 * veAt(savedCurve, p.x) }));

  return (
    <div className="flex flex-col gap-5">
      <CleaningControls value={options} onChange={setOptions} unitSystem={unitSystem} hasThrottle={hasThrottle} />
      <p className="text-sm" role="status" aria-live="polite">
        Fitting one VE point per speed bin from {usable.length} bins ({cleaned.counts.kept} kept samples; {cleaned.counts.outliers} outliers and {cleaned.counts.partThrottle} part-throttle samples left out)
        , with the model&apos;s charge temperature (the one it predicts with, so the saved curve gives back the boost it was fitted to)
        {points.some((p) => p.intakeTemperature !== null) ? "; the logged intake air temperature is compared with it below" : ""}.
      </p>
      {current.revision !== loggedRevision ? (
        <Notice tone="warning">
          The log was taken with revision {loggedRevision}; the combination is now at revision {current.revision}. The fit uses the revision as logged and is saved onto the current
          one: if the engine itself changed since, this calibration does not describe it.
        </Notice>
      ) : null}
      {!fit.ok ? <Notice tone="danger">{fit.message}</Notice> : null}
      {fit.ok ? (
        <>
          <section aria-labelledby="ve-heading" className="flex flex-col gap-3 rounded-md border border-line bg-panel p-3">
            <h2 id="ve-heading" className="font-semibold">
              Volumetric efficiency: stored against fitted
            </h2>
            <XyChart
              height={280}
              xLabel="Engine speed (rpm)"
              yLabel="Volumetric efficiency (%)"
              ariaLabel="Stored and fitted volumetric efficiency against engine speed"
              series={[
                { label: "Stored (as logged)", points: oldDense, color: PALETTE[0], line: true, pointRadius: 0 },
                { label: "Fitted from the log", points: fit.fit.veCurve.map((p) => ({ x: p.rpm, y: 100 * p.ve })), color: PALETTE[5], line: true },
                { label: "Saved (with the stored shape outside the log)", points: savedDense, color: PALETTE[2], line: true, pointRadius: 0 },
              ]}
            />
            <div className="overflow-x-auto">
              <DataTable
                density="figures"
                caption="Stored and fitted volumetric efficiency with residuals"
                rows={fit.fit.rows.map((r, i) => ({ ...r, res: fit.fit.residuals[i] }))}
                rowKey={(r) => String(r.rpm)}
                empty="No rows."
                columns={[
                  { label: "Engine speed (rpm)", cell: (r) => rpmText(r.rpm) },
                  { label: "Stored VE (%)", align: "right", cell: (r) => (100 * r.oldVe).toFixed(1) },
                  { label: "Fitted VE (%)", align: "right", cell: (r) => (100 * r.fittedVe).toFixed(1) },
                  { label: "Change (%)", align: "right", cell: (r) => `${r.fittedVe >= r.oldVe ? "+" : ""}${(100 * (r.fittedVe / r.oldVe - 1)).toFixed(1)}` },
                  { label: `Measured boost (${pUnit})`, align: "right", cell: (r) => fig("pressure", r.res.measuredBoostGauge, unitSystem) },
                  { label: `Fitted model (${pUnit})`, align: "right", cell: (r) => fig("pressure", r.res.predictedBoostGauge, unitSystem) },
                  { label: `Residual (${pUnit})`, align: "right", cell: (r) => fig("pressure", r.res.boostResidual, unitSystem, 3) },
                ]}
              />
              <p className="mt-1 text-xs text-muted">
                Outside the logged speeds ({rpmText(range[0])}–{rpmText(range[1])} rpm) the log says nothing: the saved curve keeps the stored curve&apos;s shape there, scaled to meet
                the fit at its ends (the &ldquo;Saved&rdquo; line), so it is not flat.
              </p>
            </div>
          </section>

          <section aria-labelledby="ladder-heading" className="flex flex-col gap-3 rounded-md border border-line bg-panel p-3">
            <h2 id="ladder-heading" className="font-semibold">
              With the measured engine, a smaller pulley gives this
            </h2>
            <Field className="max-w-xs" label="At engine speed" name="ladderRpm" unit="rpm" inputMode="numeric" value={rpmText_} onChange={(e) => setRpmText(e.target.value)} errors={rpmError} />
            {ladder ? (
              <DataTable
                density="figures"
                caption="Boost per blower pulley with the stored and the measured engine"
                rows={ladder.map((r, i) => ({ ...r, current: i === 0 }))}
                rowKey={(r) => String(r.diameter)}
                empty="No pulleys."
                columns={[
                  {
                    label: `Blower pulley (${dUnit})`,
                    cell: (r) => (
                      <>
                        {fig("length-small", r.diameter, unitSystem)}
                        {r.current ? <span className="text-muted"> (current)</span> : null}
                      </>
                    ),
                  },
                  { label: `Boost, stored VE (${pUnit})`, align: "right", cell: (r) => fig("pressure", r.oldBoost, unitSystem) },
                  { label: `Boost, measured engine (${pUnit})`, align: "right", cell: (r) => fig("pressure", r.measuredBoost, unitSystem) },
                  { label: "Blower speed (rpm)", align: "right", cell: (r) => rpmText(r.blowerRpm) },
                  {
                    label: "Warnings",
                    cellClassName: "text-warn",
                    cell: (r) => [r.overspeed ? "blower over its speed limit at redline" : null, r.belowBeltMinimum ? "below the belt's minimum diameter" : null].filter(Boolean).join("; "),
                  },
                ]}
              />
            ) : null}
          </section>

          <RunsCalibration thisLogId={logId} logs={logs} current={current.spec} options={options} unitSystem={unitSystem} onChosen={setLogIds} />

          <section aria-labelledby="save-heading" className="flex flex-col gap-2">
            <h2 id="save-heading" className="font-semibold">
              Save the fitted curve
            </h2>
            <p className="text-sm">
              Saves {current.name} as a new revision (after revision {current.revision}) {manyLogs
                ? "with the slip and VE fitted to the chosen logs (above) and a note naming them."
                : <>with this VE curve and the note &ldquo;VE calibrated from log {logName}&rdquo;.</>}{" "}
              Everything else stays as it is now.
            </p>
            {canSave ? (
              <div>
                <Button onClick={saveRevision} disabled={busy || save?.kind === "saved"}>
                  {busy ? "Saving…" : "Save as a new revision"}
                </Button>
              </div>
            ) : (
              <Notice>You can see this combination but not change it.</Notice>
            )}
            {save?.kind === "saved" ? (
              <Notice tone="ok" title={`Saved as revision ${save.revision}.`}>
                <Link className="underline" href={`/combinations/${current.id}`}>
                  See the pulley ladder with the measured engine
                </Link>
              </Notice>
            ) : null}
            {save?.kind === "conflict" ? (
              <Notice tone="danger" title="Not saved: the combination changed.">
                {save.message}{" "}
                <Button variant="secondary" onClick={() => window.location.reload()}>
                  Reload this page
                </Button>
              </Notice>
            ) : null}
            {save?.kind === "error" ? <Notice tone="danger">{save.message}</Notice> : null}
          </section>
        </>
      ) : null}
      <p className="text-xs text-muted">Boost is gauge, above the barometer of the log ({fig("pressure", ambient.pressure, unitSystem)} {pUnit} absolute). Figures in your units; change them in Settings.</p>
    </div>
  );
}
