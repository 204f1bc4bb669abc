// @ts-nocheck
"use client";
// The planner: edit a combination and see boost and power against engine speed at once.
// Everything is computed in the browser with calc/ on every change; saving writes a revision.
// The parts: planner-resolver (validation), use-planner-draft (kept drafts), use-planner-results
// (curves, ladder, chart), and the views (header, save bar, readouts, chart, ladder, finder).
import { memo, useCallback, useDeferredValue, useMemo, useState, useTransition } from "react";
import { useForm, useWatch } from "react-hook-form";
import { unitsToParam, type Combination, type UnitSystem } from "@/calc";
import { CautionsPanel } from "@/components/cautions-panel";
import { Editor } from "@/components/planner/editor";
import { EditorTabs } from "@/components/planner/editor-tabs";
import { PulleyFinder } from "@/components/pulleys/pulley-finder";
import { PulleyLadder } from "@/components/pulleys/pulley-ladder";
import { useUnsavedGuard } from "@/components/planner/use-unsaved-guard";
import { Notice } from "@/components/ui/notice";
import { useHydrated } from "@/components/ui/use-hydrated";
import type { ActionState } from "@/lib/action-state";
import { convertForm, fieldFromSI, sameSpec, toForm, toSpec, validateForm, type PlannerForm } from "@/lib/combinations/form-model";
import { finderStock, type Shelf } from "@/lib/planner/compute";
import { unitsName } from "@/lib/units/person";
import { PlannerChart } from "./planner-chart";
import { DraftOffer, PlannerHeader } from "./planner-header";
import { PlannerReadouts } from "./planner-readouts";
import { plannerResolver } from "./planner-resolver";
import { SaveBar, type SaveMessage } from "./save-bar";
import { forgetDraft, usePlannerDraft } from "./use-planner-draft";
import { useChartSeries, usePlannerResults, usePulleySlider, type ChartOptions } from "./use-planner-results";

// A slider move re-renders the planner; these parts keep their props then and skip the work.
const StillEditor = memo(Editor);
const StillLadder = memo(PulleyLadder);
const StillFinder = memo(PulleyFinder);
const NO_ERRORS: Record<string, string> = {};

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

export function Planner(props: PlannerProps) {
  const { combinationId, canWrite, shelf } = props;
  const [system, setSystem] = useState<UnitSystem>(props.unitSystem);
  const [baseSpec, setBaseSpec] = useState<Combination>(props.spec);
  const resolver = useMemo(() => plannerResolver(system, baseSpec), [system, baseSpec]);
  const form = useForm<PlannerForm>({ defaultValues: toForm(props.spec, props.unitSystem), resolver, mode: "onSubmit" });
  const values = useWatch({ control: form.control }) as PlannerForm;

  const [baseRevision, setBaseRevision] = useState(props.revision);
  const [note, setNote] = useState("");
  const [saveMsg, setSaveMsg] = useState<SaveMessage | null>(null);
  const [unitsMsg, setUnitsMsg] = useState<string | null>(null);
  const [saving, startSaving] = useTransition();
  const [, startUnits] = useTransition();
  const [chartOptions, setChartOptions] = useState<ChartOptions>({ showNeighbours: true, extra: "none" });
  // One engine speed for the ladder and the finder (null: peak power speed), and the slider's what-if pulley (SI).
  const [chosenRpm, setChosenRpm] = useState<number | null>(null);
  const [whatIf, setWhatIf] = useState<number | null>(null);

  // Live validation with calc's schema: errors beside the fields, results from the last valid state.
  const valuesKey = JSON.stringify(values) + system;
  const live = useMemo(() => validateForm(values, system, baseSpec), [valuesKey, baseSpec]); // eslint-disable-line react-hooks/exhaustive-deps
  // Keep the last valid combination (state adjusted during render, React's pattern for derived state).
  const [lastGood, setLastGood] = useState<Combination>(props.spec);
  if (live.ok && live.spec !== lastGood) setLastGood(live.spec);
  const spec = live.ok ? live.spec : lastGood;
  const deferredSpec = useDeferredValue(spec);
  const errors = live.ok ? NO_ERRORS : live.errors;
  const dirty = useMemo(() => !sameSpec(toSpec(values, system, baseSpec), baseSpec), [valuesKey, baseSpec]); // eslint-disable-line react-hooks/exhaustive-deps

  useUnsavedGuard(dirty && canWrite);
  const draft = usePlannerDraft({ form, canWrite, combinationId, openedRevision: props.revision, baseRevision, system, values, valuesKey, dirty });

  const switchUnits = (next: UnitSystem) => {
    if (next === system) return;
    form.reset(convertForm(form.getValues(), system, next, baseSpec));
    setSystem(next);
    setUnitsMsg(null);
    startUnits(async () => {
      const r = await props.saveUnits(unitsToParam(next));
      setUnitsMsg(r.ok ? `Units set to ${unitsName(next)}; saved as your preference.` : `Units changed here, but not saved as your preference: ${r.message}`);
    });
  };

  const applyPulley = useCallback(
    (diameter: number) => {
      form.setValue("drive.blowerPulleyDiameter", fieldFromSI("length-small", diameter, system), { shouldDirty: true });
      setWhatIf(null);
    },
    [form, system],
  );
  const stock = useMemo(() => finderStock(shelf.blowerPulleys), [shelf.blowerPulleys]);

  const onSave = form.handleSubmit(
    (vals) => {
      const v = validateForm(vals, system, baseSpec);
      if (!v.ok) return;
      setSaveMsg(null);
      startSaving(async () => {
        const r = await props.save({ spec: v.spec, note, baseRevision });
        if (r.ok && r.data) {
          forgetDraft(combinationId, baseRevision);
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

  const results = usePlannerResults({ spec: deferredSpec, baseSpec, chosenRpm, whatIf, blowerPulleys: shelf.blowerPulleys, system });
  const series = useChartSeries(results, chartOptions.showNeighbours, system);
  const slider = usePulleySlider(spec.drive.blowerPulleyDiameter, shelf.blowerPulleys, system);
  // The server's HTML shows the planner before its code arrives (planner-island.tsx); until it
  // has hydrated, its controls are disabled so nothing typed is lost.
  const hydrated = useHydrated();

  return (
    <fieldset disabled={!hydrated} aria-busy={!hydrated} data-testid="planner" className="m-0 flex min-w-0 flex-col gap-4 border-0 p-0">
      <PlannerHeader name={props.name} combinationId={combinationId} baseRevision={baseRevision} isDemo={props.isDemo} system={system} own={props.unitSystem} onUnits={switchUnits} unitsMessage={unitsMsg} />
      {draft.offer ? <DraftOffer revision={baseRevision} savedAt={draft.offer.savedAt} onRestore={draft.restoreDraft} onDiscard={draft.discardDraft} /> : null}
      <SaveBar invalid={!live.ok} canWrite={canWrite} note={note} onNote={setNote} onSave={(e) => void onSave(e)} saving={saving} dirty={dirty} onDuplicate={duplicate} duplicating={duplicating} message={saveMsg} />

            {/* Phones: results, then the inputs behind section tabs. Wide: inputs left, results right; from
          1,280 px the results column is wider so the finder fits beside the ladder. */}
      <div className="grid grid-cols-1 gap-4 lg:grid-cols-[minmax(0,5fr)_minmax(0,7fr)] xl:grid-cols-[minmax(0,4fr)_minmax(0,8fr)]">
        <div className="order-2 flex min-w-0 flex-col gap-3 lg:order-1">
          <h2 className="text-base font-semibold">Combination</h2>
          <EditorTabs errors={errors}>
            <StillEditor form={form} system={system} errors={errors} blowers={shelf.blowers} values={values} />
          </EditorTabs>
        </div>

        <div className="order-1 flex min-w-0 flex-col gap-4 lg:sticky lg:top-2 lg:order-2 lg:max-h-[calc(100vh-1rem)] lg:overflow-y-auto lg:pr-1" data-testid="planner-results">
          {!live.ok ? (
            <Notice tone="warning" title="Out of date">
              <span data-testid="results-out-of-date">These figures are for the last combination that made sense; fix the fields marked in red to update them.</span>
            </Notice>
          ) : null}
          {results.ok ? (
            <>
              <PlannerReadouts results={results} system={system} stale={!live.ok} />
              <PlannerChart
                results={results}
                system={system}
                series={series}
                slider={slider}
                pulleyField={values.drive.blowerPulleyDiameter}
                whatIf={whatIf}
                onWhatIf={setWhatIf}
                onApply={applyPulley}
                canApply={live.ok}
                options={chartOptions}
                onOptions={setChartOptions}
              />
              <div className="grid grid-cols-1 gap-4 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]" data-testid="ladder-and-finder">
                <StillLadder rows={results.rows} system={system} rpm={results.rpm} fromShelf={shelf.blowerPulleys.length > 0} onUse={applyPulley} />
                <StillFinder spec={results.spec} system={system} rpms={results.rpms} stock={stock} defaultRpm={results.rpm} onRpm={setChosenRpm} onApply={applyPulley} />
              </div>
              <CautionsPanel cautions={results.cautions} units={system} />
            </>
          ) : (
            <Notice tone="danger" title="No prediction">
              {results.message}
            </Notice>
          )}
        </div>
      </div>
    </fieldset>
  );
}
