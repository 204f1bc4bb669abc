// @ts-nocheck
"use client";
// The classroom view for a projector: one step at a time in large type, keyboard navigation,
// the step's items overlaid on one chart, a small deltas table, the note, and a "what if" slider
// that moves every curve live without saving anything.
import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import type { UnitSystem } from "@/calc";
import { CurveChart } from "@/components/charts/curve-chart";
import type { LessonStep } from "@/db/repo/lessons";
import { CopyItemButton, type CopyItemAction } from "./copy-item-button";
import { changeText } from "@/lib/lessons/change-text";
import { SERIES_METRIC, stepCurves, type WhatIf } from "@/lib/lessons/curves";
import { fillNoteFigures } from "@/lib/lessons/note-figures";
import { stepCautions } from "@/lib/lessons/step-cautions";
import { stripStepNumber } from "@/lib/lessons/rules";
import { DeltasTable } from "./deltas-table";
import { LessonNote } from "./lesson-note";
import { KeyGuide } from "./key-guide";
import { StepCautions } from "./step-cautions";
import { useRoomSize } from "./room-size";
import { WhatIfControl } from "./what-if-control";

export type ClassroomViewProps = {
  title: string;
  ownerName: string;
  steps: LessonStep[];
  unitSystem: UnitSystem;
  initialStep?: number;
  /** Copies an item into the viewer's own combinations (bound to the lesson on the server). */
  copyItem: CopyItemAction;
};

/** Keys that move between steps, unless the focus is in a control that uses them itself. */
const NEXT = new Set(["ArrowRight", "PageDown"]);
const PREV = new Set(["ArrowLeft", "PageUp"]);

function ownsArrowKeys(el: EventTarget | null) {
  if (!(el instanceof HTMLElement)) return false;
  return el.isContentEditable || ["INPUT", "SELECT", "TEXTAREA"].includes(el.tagName);
}

export function ClassroomView({ title, ownerName, steps, unitSystem, initialStep = 0, copyItem }: ClassroomViewProps) {
  const count = steps.length;
  const [index, setIndex] = useState(() => Math.min(Math.max(0, initialStep), Math.max(0, count - 1)));
  const [whatIf, setWhatIf] = useState<WhatIf>({ kind: "none" });
  const root = useRef<HTMLDivElement>(null);
  const room = useRoomSize();

  const go = useCallback(
    (to: number) => {
      const next = Math.min(Math.max(0, to), count - 1);
      setIndex(next);
      // Each step has its own what-if; a new step starts as built.
      setWhatIf({ kind: "none" });
      const url = new URL(window.location.href);
      url.searchParams.set("step", String(next + 1));
      window.history.replaceState(null, "", url);
    },
    [count],
  );

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (e.altKey || e.ctrlKey || e.metaKey || ownsArrowKeys(e.target)) return;
      let to: number | null = null;
      if (NEXT.has(e.key)) to = index + 1;
      else if (PREV.has(e.key)) to = index - 1;
      else if (e.key === "Home") to = 0;
      else if (e.key === "End") to = count - 1;
      if (to === null) return;
      e.preventDefault();
      go(to);
    };
    window.addEventListener("keydown", onKey);
    // Marks the view as listening (tests wait for it; harmless otherwise).
    root.current?.setAttribute("data-keys", "on");
    return () => window.removeEventListener("keydown", onKey);
  }, [index, count, go]);

  const step = steps[index];
  const curves = useMemo(() => (step ? stepCurves(step.items, whatIf, unitSystem) : []), [step, whatIf, unitSystem]);
  const warnings = useMemo(() => stepCautions(curves), [curves]);
  const note = useMemo(() => (step ? fillNoteFigures(step.note, curves, unitSystem) : ""), [step, curves, unitSystem]);

  if (!step) {
    return <p className="text-2xl">This lesson has no steps yet.</p>;
  }

  const metrics = step.series.map((s) => SERIES_METRIC[s]);
  const redline = Math.max(...curves.map((c) => c.spec.engine.redlineRpm));
  const blowerMax = Math.min(...curves.map((c) => c.spec.blower.maxRpm));
  const failed = curves.filter((c) => c.error);

  return (
    <div ref={root} className="flex flex-col gap-6">
      <header className="flex flex-wrap items-baseline justify-between gap-4">
        <div>
          <p className="text-lg text-muted">
            {title} · {ownerName}
          </p>
          <h1 className="text-2xl font-semibold leading-tight sm:text-4xl">{stripStepNumber(step.title)}</h1>
        </div>
        <nav aria-label="Steps" className="flex flex-wrap items-center gap-3 text-base sm:text-xl">
          <button type="button" onClick={() => go(index - 1)} disabled={index === 0} className="rounded-md border border-line bg-panel px-4 py-2 font-medium disabled:opacity-40">
            ← Previous
          </button>
          <p aria-live="polite" aria-atomic="true" className="min-w-[9ch] text-center tabular-nums" data-testid="step-counter">
            Step {index + 1} of {count}
          </p>
          <button type="button" onClick={() => go(index + 1)} disabled={index === count - 1} className="rounded-md bg-accent px-4 py-2 font-medium text-accent-fg disabled:opacity-40">
            Next →
          </button>
        </nav>
      </header>

      <div className="grid gap-6 xl:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <section aria-label="Chart" className="flex min-w-0 flex-col gap-4 rounded-lg border border-line bg-panel p-2 sm:p-4">
          <CurveChart
            series={curves.filter((c) => c.points.length).map((c, i) => ({ label: c.label, points: c.points, colorIndex: i }))}
            metrics={metrics}
            unitSystem={unitSystem}
            redlineRpm={redline}
            blowerMaxRpm={step.series.includes("blowerSpeed") ? blowerMax : undefined}
            ariaLabel={`${step.title}: ${curves.map((c) => c.label).join(" against ")}, against engine speed`}
            height={room.height}
            fontSize={room.fontSize}
          />
          {failed.map((c) => (
            <p key={c.label} role="alert" className="rounded-md border border-danger bg-danger-bg px-3 py-2 text-danger">
              {c.label}: the model has no answer for this setting ({c.error})
            </p>
          ))}
          <WhatIfControl key={step.id} items={step.items} unitSystem={unitSystem} value={whatIf} onChange={setWhatIf} />
        </section>

        <div className="flex min-w-0 flex-col gap-6">
          <DeltasTable curves={curves} unitSystem={unitSystem} />
          <LessonNote markdown={note} className="text-xl leading-relaxed" />
        </div>
      </div>

      <section aria-labelledby="items-heading" className="flex flex-col gap-3">
        <h2 id="items-heading" className="text-2xl font-semibold">
          In this step
        </h2>
        <ul className="grid gap-3 md:grid-cols-2">
          {step.items.map((it, i) => (
            <li key={`${it.combinationId}-${it.revision}-${i}`} className="flex flex-wrap items-center justify-between gap-3 rounded-lg border border-line bg-panel p-3">
              <div>
                <p className="text-lg font-medium">{it.label}</p>
                <p className="text-sm text-muted">
                  {it.name}, revision {it.revision}
                  {it.change ? `; shown as built and with ${changeText(it.change, unitSystem)} (copied with the change)` : ""}
                </p>
              </div>
              <CopyItemButton action={copyItem} stepId={step.id} item={i} label={it.label} />
            </li>
          ))}
        </ul>
      </section>

      <StepCautions cautions={warnings} unitSystem={unitSystem} />
      <KeyGuide />
    </div>
  );
}
