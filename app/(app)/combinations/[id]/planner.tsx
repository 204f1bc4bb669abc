"use client";
// The planner: edit a combination and see boost and power against engine speed at once.
// Everything is computed in the browser with calc/ on every change; saving writes a revision.
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useDeferredValue, useEffect, useMemo, useRef, useState, useTransition } from "react";
import { useForm, useWatch, type FieldErrors, type Resolver } from "react-hook-form";
import { z } from "zod";
import { cautions as calcCautions, combinationSchema, unitLabel, type Caution, type Combination, type UnitSystem } from "@/calc";
import type { ActionState } from "@/lib/action-state";
import { CautionsPanel } from "@/components/cautions-panel";
import type { CurveMetric, CurveSeries } from "@/components/charts/curve-chart";
import { LazyCurveChart } from "@/components/charts/curve-chart-lazy";
import {
  finderStock,
  ladder,
  ladderDiameters,
  neighbourPulleys,
  peakPowerRpm,
  rpmGrid,
  safeCurve,
  withPulley,
  type Shelf,
} from "@/lib/planner/compute";
import { Editor } from "@/components/planner/editor";
import { convertForm, fieldFromSI, localizeMessage, sameSpec, toForm, toSpec, validateForm, type PlannerForm } from "@/lib/combinations/form-model";
import { PulleyFinder } from "@/components/planner/pulley-finder";
import { PulleyLadder } from "@/components/planner/pulley-ladder";
import { draftKey, useUnsavedGuard } from "@/components/planner/use-unsaved-guard";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { figure, percentText, quantityText } from "@/lib/units/format";

export type PlannerProps = {
  combinationId: string;
  name: string;
  revision: number;
  isDemo: boolean;
  spec: Combination;
  unitSystem: UnitSystem;
  canWrite: boolean;
  shelf: Shelf;
  save: (input: { spec: unknown; note: string; baseRevision: number }) => Promise<ActionState<{ revision: number }>>;
  duplicate: () => Promise<ActionState>;
  saveUnits: (unitSystem: string) => Promise<ActionState>;
};

type Draft = { system: UnitSystem; values: PlannerForm; savedAt: number };

/** calc's combinationSchema behind zodResolver, with the messages put in the user's units. */
function plannerResolver(s: UnitSystem): Resolver<PlannerForm> {
  return async (values, context, options) => {
    const schema = z.preprocess((v) => toSpec(v as PlannerForm, s), combinationSchema);
    const result = await (zodResolver(schema as never) as unknown as Resolver<PlannerForm>)(values, context, options);
    const walk = (node: unknown, path: string[]) => {
      if (!node || typeof node !== "object") return;
      const e = node as { message?: unknown; type?: unknown };
      if (typeof e.message === "string" && typeof e.type === "string") e.message = localizeMessage(path.join("."), e.message, s);
      for (const [k, v] of Object.entries(node)) if (k !== "ref" && k !== "message" && k !== "type") walk(v, [...path, k]);
    };
    walk(result.errors, []);
    return Object.keys(result.errors).length ? { values: {}, errors: result.errors as FieldErrors<PlannerForm> } : { values, errors: {} };
  };
}

const BASE_METRICS: CurveMetric[] = ["boostGauge", "netPower", "torque"];

export function Planner(props: PlannerProps) {
  const { combinationId, canWrite, shelf } = props;
  const [system, setSystem] = useState<UnitSystem>(props.unitSystem);
  const resolver = useMemo(() => plannerResolver(system), [system]);
  const form = useForm<PlannerForm>({ defaultValues: toForm(props.spec, props.unitSystem), resolver, mode: "onSubmit" });
  const values = useWatch({ control: form.control }) as PlannerForm;

  const [baseRevision, setBaseRevision] = useState(props.revision);
  const [baseSpec, setBaseSpec] = useState<Combination>(props.spec);
  const [note, setNote] = useState("");
  const [saveMsg, setSaveMsg] = useState<{ tone: "ok" | "danger"; text: string } | null>(null);
  const [unitsMsg, setUnitsMsg] = useState<string | null>(null);
  const [saving, startSaving] = useTransition();
  const [, startUnits] = useTransition();
  const [showNeighbours, setShowNeighbours] = useState(true);
  const [showTemperature, setShowTemperature] = useState(false);
  const [showBlowerSpeed, setShowBlowerSpeed] = useState(false);

  // Live validation with calc's schema: errors beside the fields, results from the last valid state.
  const valuesKey = JSON.stringify(values) + system;
  const live = useMemo(() => validateForm(values, system, baseSpec), [valuesKey, baseSpec]); // eslint-disable-line react-hooks/exhaustive-deps
  // Keep the last valid combination (state adjusted during render, React's pattern for derived state).
  const [lastGood, setLastGood] = useState<Combination>(props.spec);
  if (live.ok && live.spec !== lastGood) setLastGood(live.spec);
  const spec = live.ok ? live.spec : lastGood;
  const deferredSpec = useDeferredValue(spec);
  const errors = live.ok ? {} : live.errors;
  const dirty = useMemo(() => !sameSpec(toSpec(values, system), baseSpec), [valuesKey, baseSpec]); // eslint-disable-line react-hooks/exhaustive-deps

  useUnsavedGuard(dirty && canWrite);

  // Drafts: kept in this browser per combination and revision, offered back on return.
  const key = draftKey(combinationId, baseRevision);
  const [offer, setOffer] = useState<Draft | null>(null);
  const decided = useRef(false);
  useEffect(() => {
    if (!canWrite) return;
    let found: Draft | null = null;
    try {
      const raw = window.localStorage.getItem(draftKey(combinationId, props.revision));
      const d = raw ? (JSON.parse(raw) as Draft) : null;
      if (d && d.values && (d.system === "imperial" || d.system === "metric")) found = d;
    } catch {
      found = null;
    }
    if (found) setOffer(found); // eslint-disable-line react-hooks/set-state-in-effect
    else decided.current = true;
  }, [canWrite, combinationId, props.revision]);
  useEffect(() => {
    if (!decided.current || !canWrite) return;
    const t = window.setTimeout(() => {
      try {
        if (dirty) window.localStorage.setItem(key, JSON.stringify({ system, values, savedAt: Date.now() } satisfies Draft));
        else window.localStorage.removeItem(key);
      } catch {
        // Private browsing or a full store: the leave warning still guards the edits.
      }
    }, 300);
    return () => window.clearTimeout(t);
  }, [valuesKey, dirty, key, canWrite]); // eslint-disable-line react-hooks/exhaustive-deps

  const restoreDraft = () => {
    if (!offer) return;
    form.reset(convertForm(offer.values, offer.system, system));
    decided.current = true;
    setOffer(null);
  };
  const discardDraft = () => {
    try {
      window.localStorage.removeItem(key);
    } catch {
      // nothing to remove
    }
    decided.current = true;
    setOffer(null);
  };

  const switchUnits = (next: UnitSystem) => {
    if (next === system) return;
    form.reset(convertForm(form.getValues(), system, next));
    setSystem(next);
    setUnitsMsg(null);
    startUnits(async () => {
      const r = await props.saveUnits(next);
      setUnitsMsg(r.ok ? `Units set to ${next}; saved as your preference.` : `Units changed here, but not saved as your preference: ${r.message}`);
    });
  };

  const applyPulley = (diameter: number) => {
    form.setValue("drive.blowerPulleyDiameter", fieldFromSI("length-small", diameter, system), { shouldDirty: true });
  };

  const onSave = form.handleSubmit(
    (vals) => {
      const v = validateForm(vals, system, baseSpec);
      if (!v.ok) return;
      setSaveMsg(null);
      startSaving(async () => {
        const r = await props.save({ spec: v.spec, note, baseRevision });
        if (r.ok && r.data) {
          try {
            window.localStorage.removeItem(draftKey(combinationId, baseRevision));
          } catch {
            // ignore
          }
          setBaseRevision(r.data.revision);
          setBaseSpec(v.spec);
          setNote("");
          setSaveMsg({ tone: "ok", text: `Saved revision ${r.data.revision}` });
        } else if (!r.ok) {
          setSaveMsg({ tone: "danger", text: r.status === 409 ? `${r.message} Your edits are still here.` : r.message });
        }
      });
    },
    () => setSaveMsg({ tone: "danger", text: "Some fields need attention (marked in red) before this can be saved." }),
  );

  const [duplicating, startDuplicate] = useTransition();
  const duplicate = () =>
    startDuplicate(async () => {
      const r = await props.duplicate();
      if (r && !r.ok) setSaveMsg({ tone: "danger", text: r.message });
    });

  // Results, recomputed from the deferred spec so typing stays responsive.
  const results = useMemo(() => {
    try {
      const s = deferredSpec;
      const rpms = rpmGrid(s);
      const current = safeCurve(s, rpms);
      const peak = peakPowerRpm(current, s.engine.redlineRpm);
      const n = neighbourPulleys(s.drive.blowerPulleyDiameter, shelf.blowerPulleys, system);
      const smaller = n.smaller === null ? null : { d: n.smaller, points: safeCurve(withPulley(s, n.smaller), rpms) };
      const larger = n.larger === null ? null : { d: n.larger, points: safeCurve(withPulley(s, n.larger), rpms) };
      const rows = ladder(s, peak, shelf.blowerPulleys);
      const list: Caution[] = calcCautions(s, current);
      return { ok: true as const, spec: s, rpms, curve: current, peak, smaller, larger, rows, cautions: list };
    } catch (e) {
      return { ok: false as const, message: e instanceof Error ? e.message : "The model could not solve this combination." };
    }
  }, [deferredSpec, shelf.blowerPulleys, system]);

  const series = useMemo((): CurveSeries[] => {
    if (!results.ok) return [];
    const d = results.spec.drive.blowerPulleyDiameter;
    const out: CurveSeries[] = [{ label: `Current ${quantityText("length-small", d, system)}`, points: results.curve, colorIndex: 0 }];
    if (showNeighbours && results.smaller) out.push({ label: `${quantityText("length-small", results.smaller.d, system)} (smaller)`, points: results.smaller.points, dashed: true, colorIndex: 5 });
    if (showNeighbours && results.larger) out.push({ label: `${quantityText("length-small", results.larger.d, system)} (larger)`, points: results.larger.points, dashed: true, colorIndex: 2 });
    return out;
  }, [results, showNeighbours, system]);
  const metrics = useMemo(
    (): CurveMetric[] => [...BASE_METRICS, ...(showTemperature ? (["manifoldTemperature"] as const) : []), ...(showBlowerSpeed ? (["blowerRpm"] as const) : [])],
    [showTemperature, showBlowerSpeed],
  );

  const slider = useMemo(() => {
    const ds = ladderDiameters(spec.drive.blowerPulleyDiameter, shelf.blowerPulleys);
    const lo = Math.min(ds[0], spec.drive.blowerPulleyDiameter);
    const hi = Math.max(ds[ds.length - 1], spec.drive.blowerPulleyDiameter);
    return { min: fieldFromSI("length-small", lo, system), max: fieldFromSI("length-small", hi, system), step: system === "imperial" ? 0.05 : 1 };
  }, [spec.drive.blowerPulleyDiameter, shelf.blowerPulleys, system]);

  const redline = results.ok ? results.curve.find((p) => p.rpm === results.spec.engine.redlineRpm) ?? null : null;
  const peakPoint = results.ok ? results.curve.find((p) => p.rpm === results.peak) ?? null : null;
  const peakBoost = results.ok && results.curve.length ? results.curve.reduce((a, b) => (b.boostGauge > a.boostGauge ? b : a)) : null;
  const peakTorque = results.ok && results.curve.length ? results.curve.reduce((a, b) => (b.torque > a.torque ? b : a)) : null;

  return (
    <div className="flex flex-col gap-4">
      <header className="flex flex-wrap items-start gap-x-6 gap-y-2">
        <div className="flex flex-col gap-1">
          <h1 className="text-xl font-semibold">{props.name}</h1>
          <p className="text-sm text-muted">
            Planner · revision <span data-testid="base-revision">{baseRevision}</span>
            {props.isDemo ? " · shop demo (invented data)" : ""} ·{" "}
            <Link href={`/combinations/${combinationId}/revisions`} className="text-accent underline underline-offset-2">
              History
            </Link>{" "}
            ·{" "}
            <Link href={`/compare?items=${combinationId}:current`} className="text-accent underline underline-offset-2">
              Side by side
            </Link>
          </p>
        </div>
        <fieldset className="ml-auto flex items-center gap-3 text-sm">
          <legend className="sr-only">Units</legend>
          <span aria-hidden="true" className="text-muted">
            Units
          </span>
          {(["imperial", "metric"] as const).map((u) => (
            <label key={u} className="flex items-center gap-1">
              <input type="radio" name="planner-units" value={u} checked={system === u} onChange={() => switchUnits(u)} />
              {u === "imperial" ? "Imperial" : "Metric"}
            </label>
          ))}
        </fieldset>
      </header>
      {unitsMsg ? (
        <p role="status" className="text-xs text-muted">
          {unitsMsg}
        </p>
      ) : null}

      {offer ? (
        <Notice tone="warning" title="Unsaved changes found">
          <p>
            This browser kept changes to revision {baseRevision} from {new Date(offer.savedAt).toLocaleString()} that were never saved.
          </p>
          <div className="mt-2 flex gap-2">
            <Button type="button" onClick={restoreDraft}>
              Restore unsaved changes
            </Button>
            <Button type="button" variant="secondary" onClick={discardDraft}>
              Discard them
            </Button>
          </div>
        </Notice>
      ) : null}

      <section aria-label="Save" className="flex flex-wrap items-end gap-3 rounded-lg border border-line bg-panel p-3">
        {canWrite ? (
          <form
            onSubmit={(e) => {
              e.preventDefault();
              void onSave(e);
            }}
            className="flex flex-1 flex-wrap items-end gap-3"
          >
            <label className="flex min-w-64 flex-1 flex-col gap-1 text-sm">
              <span className="font-medium">Revision note</span>
              <input
                type="text"
                value={note}
                maxLength={500}
                onChange={(e) => setNote(e.target.value)}
                placeholder="What changed, e.g. smaller blower pulley"
                className="rounded-md border border-line bg-bg px-2.5 py-1.5"
              />
            </label>
            <Button type="submit" disabled={saving}>
              {saving ? "Saving…" : "Save revision"}
            </Button>
            <span className="text-xs text-muted" aria-live="polite">
              {dirty ? "Unsaved changes" : "No unsaved changes"}
            </span>
          </form>
        ) : (
          <div className="flex flex-1 flex-wrap items-center gap-3">
            <p className="text-sm text-muted">You can try changes here, but not save them to this combination. Duplicate it to keep your own copy.</p>
            <Button type="button" onClick={duplicate} disabled={duplicating}>
              {duplicating ? "Duplicating…" : "Duplicate to edit"}
            </Button>
          </div>
        )}
        <div role="status" aria-live="polite" className="basis-full text-sm empty:hidden">
          {saveMsg ? <span className={saveMsg.tone === "ok" ? "text-ok" : "text-danger"}>{saveMsg.text}</span> : null}
        </div>
      </section>

      <div className="grid grid-cols-1 gap-4 lg:grid-cols-[minmax(0,5fr)_minmax(0,7fr)]">
        <div className="flex flex-col gap-3">
          <h2 className="text-base font-semibold">Combination</h2>
          <Editor form={form} system={system} errors={errors} blowers={shelf.blowers} values={values} />
        </div>

        <div className="flex flex-col gap-4">
          {!live.ok ? (
            <Notice tone="warning" title="Some fields need attention">
              The results below are for the last combination that made sense. Fix the fields marked in red to update them.
            </Notice>
          ) : null}
          {results.ok ? (
            <>
              <section aria-labelledby="summary-heading" className="flex flex-col gap-2">
                <h2 id="summary-heading" className="text-base font-semibold">
                  Predicted
                </h2>
                <dl className="grid grid-cols-2 gap-x-4 gap-y-2 text-sm sm:grid-cols-3" aria-live="polite">
                  <Readout id="boost-redline" label="Boost at redline" value={redline ? quantityText("pressure", redline.boostGauge, system) : "–"} si={redline?.boostGauge} />
                  <Readout id="boost-peak" label="Highest boost" value={peakBoost ? `${quantityText("pressure", peakBoost.boostGauge, system)} at ${figure("speed", peakBoost.rpm, system)} rpm` : "–"} si={peakBoost?.boostGauge} />
                  <Readout id="power-peak" label="Peak net power" value={peakPoint ? `${quantityText("power", peakPoint.netPower, system)} at ${figure("speed", peakPoint.rpm, system)} rpm` : "–"} si={peakPoint?.netPower} />
                  <Readout id="torque-peak" label="Peak net torque" value={peakTorque ? `${quantityText("torque", peakTorque.torque, system)} at ${figure("speed", peakTorque.rpm, system)} rpm` : "–"} si={peakTorque?.torque} />
                  <Readout
                    id="blower-speed-redline"
                    label="Blower speed at redline"
                    value={redline ? `${figure("speed", redline.blowerRpm, system)} of ${figure("speed", results.spec.blower.maxRpm, system)} rpm` : "–"}
                    si={redline?.blowerRpm}
                    danger={!!redline && redline.blowerRpm > results.spec.blower.maxRpm}
                  />
                  <Readout id="charge-temperature-redline" label="Charge temperature at redline" value={redline ? quantityText("temperature", redline.manifoldTemperature, system) : "–"} si={redline?.manifoldTemperature} />
                  <Readout id="drive-power-redline" label="Blower drive power at redline" value={redline ? quantityText("power", redline.drivePower, system) : "–"} si={redline?.drivePower} />
                  <Readout id="overdrive" label="Drive ratio (overdrive)" value={redline ? `${redline.driveRatio.toFixed(2)} (${percentText(redline.driveRatio - 1)})` : "–"} si={redline?.driveRatio} />
                  {redline?.injectorDuty != null ? <Readout id="injector-duty-redline" label="Injector duty at redline" value={percentText(redline.injectorDuty)} si={redline.injectorDuty} /> : null}
                </dl>
              </section>

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
                    aria-valuetext={quantityText("length-small", spec.drive.blowerPulleyDiameter, system)}
                    min={slider.min}
                    max={slider.max}
                    step={slider.step}
                    value={Number.isFinite(values.drive.blowerPulleyDiameter) ? values.drive.blowerPulleyDiameter : slider.min}
                    onChange={(e) => form.setValue("drive.blowerPulleyDiameter", Number(e.target.value), { shouldDirty: true })}
                  />
                </label>
                <div className="flex flex-wrap gap-4 text-sm">
                  <label className="flex items-center gap-1">
                    <input type="checkbox" checked={showNeighbours} onChange={(e) => setShowNeighbours(e.target.checked)} /> Neighbouring pulleys
                  </label>
                  <label className="flex items-center gap-1">
                    <input type="checkbox" checked={showTemperature} onChange={(e) => setShowTemperature(e.target.checked)} /> Charge temperature
                  </label>
                  <label className="flex items-center gap-1">
                    <input type="checkbox" checked={showBlowerSpeed} onChange={(e) => setShowBlowerSpeed(e.target.checked)} /> Blower speed
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
              <CautionsPanel cautions={results.cautions} />
            </>
          ) : (
            <Notice tone="danger" title="No prediction">
              {results.message}
            </Notice>
          )}
        </div>
      </div>

      {results.ok ? (
        <>
          <PulleyLadder
            rows={results.rows}
            system={system}
            peakRpm={results.peak}
            redlineRpm={results.spec.engine.redlineRpm}
            fromShelf={shelf.blowerPulleys.length > 0}
            onUse={applyPulley}
          />
          <PulleyFinder spec={results.spec} system={system} rpms={results.rpms} stock={finderStock(shelf.blowerPulleys)} defaultRpm={results.peak} onApply={applyPulley} />
        </>
      ) : null}
    </div>
  );
}

function Readout({ id, label, value, si, danger }: { id: string; label: string; value: string; si?: number; danger?: boolean }) {
  return (
    <div className="flex flex-col">
      <dt className="text-xs text-muted">{label}</dt>
      <dd className={`num text-base font-semibold tabular-nums ${danger ? "text-danger" : ""}`} data-testid={`readout-${id}`} data-si={si ?? ""}>
        {value}
      </dd>
    </div>
  );
}
