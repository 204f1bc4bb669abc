// @ts-nocheck
"use client";
// Adds or edits one step: a title (numbered for you), two to four items (a combination at a
// revision, a label and an optional what-if), the chart series and a Markdown note. The server
// resolves the items and stores their specs and what-ifs (lib/lessons/rules.ts checks both ends).
import { useId, useState, useTransition } from "react";
import type { UnitSystem } from "@/calc";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import type { LessonStep, StepSource } from "@/db/repo/lessons";
import { SERIES_LABEL } from "@/lib/lessons/curves";
import { LESSON_SERIES, type LessonSeries, type StepInput } from "@/lib/lessons/rules";
import { blankItem, changeDraft, localizeStepErrors, stepInput, type ItemDraft } from "@/lib/lessons/step-draft";
import { StepItemFields } from "./step-item-fields";
import { StepNoteField } from "./step-note-field";

type SaveResult = { ok: true } | { ok: false; message: string; fieldErrors?: Record<string, string[]> };
export type SaveStep = (input: StepInput) => Promise<SaveResult>;

type StepEditorProps = { sources: StepSource[]; initial?: LessonStep; save: SaveStep; onDone?: () => void; heading: string; unitSystem: UnitSystem };

/** A label to start from: the revision's note when one was picked, else the combination's name. */
function suggestLabel(src: StepSource | undefined, revision: string) {
  if (!src) return "";
  const note = revision === "current" ? "" : src.revisions.find((r) => String(r.number) === revision)?.note;
  return (note && !/^first version$/i.test(note) ? note : src.name).slice(0, 40);
}

export function StepEditor({ sources, initial, save, onDone, heading, unitSystem }: StepEditorProps) {
  const id = useId();
  const [title, setTitle] = useState(initial?.title ?? "");
  const [items, setItems] = useState<ItemDraft[]>(
    initial
      ? initial.items.map((it) => ({ combinationId: it.combinationId, revision: String(it.revision), label: it.label, autoLabel: false, change: changeDraft(it.change, unitSystem) }))
      : [blankItem(), blankItem()],
  );
  const [series, setSeries] = useState<LessonSeries[]>(initial?.series ?? ["boost", "netPower"]);
  const [note, setNote] = useState(initial?.note ?? "");
  const [result, setResult] = useState<SaveResult | null>(null);
  const [pending, start] = useTransition();
  const errors = result && !result.ok ? localizeStepErrors(result.fieldErrors ?? {}, unitSystem) : {};

  const patch = (i: number, change: Partial<ItemDraft>) =>
    setItems((list) =>
      list.map((it, k) => {
        if (k !== i) return it;
        const next = { ...it, ...change };
        if (next.autoLabel && (change.combinationId !== undefined || change.revision !== undefined)) {
          next.label = suggestLabel(sources.find((s) => s.id === next.combinationId), next.revision);
        }
        return next;
      }),
    );

  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    start(async () => {
      const r = await save(stepInput(title, items, series, note, unitSystem));
      setResult(r);
      if (r.ok) {
        if (!initial) {
          setTitle("");
          setItems([blankItem(), blankItem()]);
          setNote("");
        }
        onDone?.();
      }
    });
  };

  return (
    <form onSubmit={submit} aria-labelledby={`${id}-h`} className="flex flex-col gap-4 rounded-lg border border-line bg-panel p-4">
      <h3 id={`${id}-h`} className="text-base font-semibold">
        {heading}
      </h3>
      <Field
        id={`${id}-title`}
        label="Step title"
        name="title"
        value={title}
        onChange={(e) => setTitle(e.target.value)}
        maxLength={120}
        errors={errors.title}
        hint="Steps are numbered for you: a leading “1.” is left out."
        required
      />

      <fieldset className="flex flex-col gap-3">
        <legend className="mb-1 text-sm font-medium">Items to compare (two to four)</legend>
        {errors.items ? (
          <p role="alert" className="text-xs text-danger">
            {errors.items.join(" ")}
          </p>
        ) : null}
        {items.map((it, i) => (
          <StepItemFields
            key={i}
            id={`${id}-i${i}`}
            index={i}
            draft={it}
            sources={sources}
            unitSystem={unitSystem}
            errors={errors}
            canRemove={items.length > 2}
            onChange={(change) => patch(i, change)}
            onRemove={() => setItems((l) => l.filter((_, k) => k !== i))}
          />
        ))}
        <Button type="button" variant="secondary" className="self-start" disabled={items.length >= 4} onClick={() => setItems((l) => [...l, blankItem()])}>
          Add an item
        </Button>
      </fieldset>

      <fieldset aria-describedby={errors.series ? `${id}-series-error` : undefined}>
        <legend className="mb-1 text-sm font-medium">Chart series</legend>
        <div className="flex flex-wrap gap-4 text-sm">
          {LESSON_SERIES.map((s) => (
            <label key={s} className="flex items-center gap-2">
              <input type="checkbox" checked={series.includes(s)} onChange={(e) => setSeries((cur) => (e.target.checked ? LESSON_SERIES.filter((x) => x === s || cur.includes(x)) : cur.filter((x) => x !== s)))} />
              {SERIES_LABEL[s]}
            </label>
          ))}
        </div>
        {errors.series ? (
          <p id={`${id}-series-error`} role="alert" className="text-xs text-danger">
            {errors.series.join(" ")}
          </p>
        ) : null}
      </fieldset>

      <StepNoteField id={`${id}-note`} value={note} errors={errors.note} onChange={setNote} />

      {result?.ok && !initial ? <Notice tone="ok">Step added.</Notice> : null}
      {result && !result.ok && !Object.keys(errors).length ? <Notice tone="danger">{result.message}</Notice> : null}
      {result && !result.ok && Object.keys(errors).length ? <Notice tone="danger">Please correct the fields marked above.</Notice> : null}
      <div className="flex gap-2">
        <Button type="submit" disabled={pending}>
          {pending ? "Saving…" : initial ? "Save step" : "Add step"}
        </Button>
        {onDone && initial ? (
          <Button type="button" variant="secondary" onClick={onDone}>
            Cancel
          </Button>
        ) : null}
      </div>
    </form>
  );
}
