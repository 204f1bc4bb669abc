// @ts-nocheck
"use client";
// The lesson's steps in order, with move up/down (plain buttons, so the keyboard works), edit
// and delete, and the form that adds a step.
import { useState, useTransition } from "react";
import { StepEditor, type SaveStep } from "@/components/lessons/step-editor";
import { SERIES_LABEL } from "@/lib/lessons/curves";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import type { LessonStep, StepSource } from "@/db/repo/lessons";
import { stripStepNumber, type StepInput } from "@/lib/lessons/rules";
import { changeText } from "@/lib/lessons/change-text";
import type { UnitSystem } from "@/calc";

type Result = { ok: true } | { ok: false; message: string; fieldErrors?: Record<string, string[]> };
type StepListProps = {
  steps: LessonStep[];
  sources: StepSource[];
  save: (stepId: string | null, input: StepInput) => Promise<Result>;
  remove: (stepId: string) => Promise<Result>;
  move: (stepId: string, direction: "up" | "down") => Promise<Result>;
  unitSystem: UnitSystem;
};

export function StepList({ steps, sources, save, remove, move, unitSystem }: StepListProps) {
  const [editing, setEditing] = useState<string | null>(null);
  const [pending, start] = useTransition();
  const [error, setError] = useState<string | null>(null);
  const run = (fn: () => Promise<Result>) =>
    start(async () => {
      const r = await fn();
      setError(r.ok ? null : r.message);
    });
  const addStep: SaveStep = (input) => save(null, input);

  return (
    <section aria-labelledby="steps-heading" className="flex flex-col gap-4">
      <h2 id="steps-heading" className="text-lg font-semibold">
        Steps
      </h2>
      {error ? <Notice tone="danger">{error}</Notice> : null}
      {steps.length === 0 ? <p className="text-sm text-muted">No steps yet. Add the first one below.</p> : null}
      <ol className="flex flex-col gap-3">
        {steps.map((s, i) => (
          <li key={s.id} className="flex flex-col gap-3 rounded-lg border border-line bg-panel p-3" aria-label={`Step ${i + 1}: ${stripStepNumber(s.title)}`}>
            <div className="flex flex-wrap items-start justify-between gap-3">
              <div>
                <p className="font-medium">
                  <span className="text-muted tabular-nums">{i + 1}.</span> {stripStepNumber(s.title)}
                </p>
                <p className="text-sm text-muted">
                  {s.items.map((it) => `${it.label} (${it.name}, revision ${it.revision}${it.change ? `; what-if: ${changeText(it.change, unitSystem)}` : ""})`).join(" · ")}
                </p>
                <p className="text-xs text-muted">Series: {s.series.map((x) => SERIES_LABEL[x]).join(", ")}</p>
              </div>
              <div className="flex flex-wrap gap-1">
                <Button type="button" variant="secondary" disabled={pending || i === 0} onClick={() => run(() => move(s.id, "up"))} aria-label={`Move step ${i + 1} up`}>
                  ↑ Up
                </Button>
                <Button type="button" variant="secondary" disabled={pending || i === steps.length - 1} onClick={() => run(() => move(s.id, "down"))} aria-label={`Move step ${i + 1} down`}>
                  ↓ Down
                </Button>
                <Button type="button" variant="secondary" onClick={() => setEditing(editing === s.id ? null : s.id)} aria-expanded={editing === s.id} aria-label={`Edit step ${i + 1}`}>
                  Edit
                </Button>
                <Button
                  type="button"
                  variant="danger"
                  disabled={pending}
                  aria-label={`Delete step ${i + 1}`}
                  onClick={() => {
                    if (window.confirm(`Delete step ${i + 1}, “${s.title}”?`)) run(() => remove(s.id));
                  }}
                >
                  Delete
                </Button>
              </div>
            </div>
            {editing === s.id ? <StepEditor heading={`Edit step ${i + 1}`} sources={sources} unitSystem={unitSystem} initial={s} save={(input) => save(s.id, input)} onDone={() => setEditing(null)} /> : null}
          </li>
        ))}
      </ol>
      <StepEditor heading="Add a step" sources={sources} unitSystem={unitSystem} save={addStep} />
    </section>
  );
}
