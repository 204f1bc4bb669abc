"use client";
// Adds or edits one step: a title, two to four items (a combination at a revision, with a label),
// the chart series and a Markdown note. The server resolves the items and stores their specs.
import { useId, useState, useTransition, type ReactNode } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import type { LessonStep, StepSource } from "@/db/repo/lessons";
import type { LessonSeries, StepInput } from "@/lib/lessons/rules";
import { SERIES_LABEL } from "@/lib/lessons/curves";
import { LessonNote } from "./lesson-note";

type SaveResult = { ok: true } | { ok: false; message: string; fieldErrors?: Record<string, string[]> };
export type SaveStep = (input: StepInput) => Promise<SaveResult>;

type StepEditorProps = { sources: StepSource[]; initial?: LessonStep; save: SaveStep; onDone?: () => void; heading: string };

type ItemDraft = { combinationId: string; revision: string; label: string; autoLabel: boolean };

const SERIES: LessonSeries[] = ["boost", "netPower", "torque", "chargeTemperature", "blowerSpeed"];
const blankItem = (): ItemDraft => ({ combinationId: "", revision: "current", label: "", autoLabel: true });

/** A label to start from: the revision's note when one was picked, else the combination's name. */
function suggestLabel(src: StepSource | undefined, revision: string) {
  if (!src) return "";
  const note = revision === "current" ? "" : src.revisions.find((r) => String(r.number) === revision)?.note;
  return (note && !/^first version$/i.test(note) ? note : src.name).slice(0, 40);
}

function Select({ id, label, errors, children, ...rest }: { id: string; label: string; errors?: string[]; children: ReactNode } & React.SelectHTMLAttributes<HTMLSelectElement>) {
  const errorId = `${id}-error`;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        {label}
      </label>
      <select
        id={id}
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={errors?.length ? errorId : undefined}
        className="rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm aria-[invalid=true]:border-danger"
        {...rest}
      >
        {children}
      </select>
      {errors?.length ? (
        <p id={errorId} role="alert" className="text-xs text-danger">
          {errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}

export function StepEditor({ sources, initial, save, onDone, heading }: StepEditorProps) {
  const id = useId();
  const [title, setTitle] = useState(initial?.title ?? "");
  const [items, setItems] = useState<ItemDraft[]>(
    initial ? initial.items.map((it) => ({ combinationId: it.combinationId, revision: String(it.revision), label: it.label, autoLabel: false })) : [blankItem(), blankItem()],
  );
  const [series, setSeries] = useState<LessonSeries[]>(initial?.series ?? ["boost", "netPower"]);
  const [note, setNote] = useState(initial?.note ?? "");
  const [preview, setPreview] = useState(false);
  const [result, setResult] = useState<SaveResult | null>(null);
  const [pending, start] = useTransition();
  const errors = result && !result.ok ? (result.fieldErrors ?? {}) : {};

  const demo = sources.filter((s) => s.isDemo);
  const own = sources.filter((s) => !s.isDemo);

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
    const input: StepInput = {
      title,
      items: items.map((it) => ({ combinationId: it.combinationId, revision: it.revision === "current" ? "current" : Number(it.revision), label: it.label })),
      series,
      note,
    };
    start(async () => {
      const r = await save(input);
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
      <Field id={`${id}-title`} label="Step title" name="title" value={title} onChange={(e) => setTitle(e.target.value)} maxLength={120} errors={errors.title} required />

      <fieldset className="flex flex-col gap-3">
        <legend className="mb-1 text-sm font-medium">Items to compare (two to four)</legend>
        {errors.items ? (
          <p role="alert" className="text-xs text-danger">
            {errors.items.join(" ")}
          </p>
        ) : null}
        {items.map((it, i) => {
          const src = sources.find((s) => s.id === it.combinationId);
          const n = i + 1;
          return (
            <div key={i} className="grid gap-2 rounded-md border border-line p-2 sm:grid-cols-[2fr_1.3fr_1.5fr_auto] sm:items-end">
              <Select id={`${id}-c${i}`} label={`Combination ${n}`} value={it.combinationId} onChange={(e) => patch(i, { combinationId: e.target.value, revision: "current" })} errors={errors[`items.${i}.combinationId`]}>
                <option value="">Choose…</option>
                {own.length ? (
                  <optgroup label="Yours">
                    {own.map((s) => (
                      <option key={s.id} value={s.id}>
                        {s.name}
                      </option>
                    ))}
                  </optgroup>
                ) : null}
                {demo.length ? (
                  <optgroup label="Shop demo combinations">
                    {demo.map((s) => (
                      <option key={s.id} value={s.id}>
                        {s.name}
                      </option>
                    ))}
                  </optgroup>
                ) : null}
                {it.combinationId && !src ? <option value={it.combinationId}>(as saved in this step)</option> : null}
              </Select>
              <Select id={`${id}-r${i}`} label={`Revision ${n}`} value={it.revision} onChange={(e) => patch(i, { revision: e.target.value })} errors={errors[`items.${i}.revision`]}>
                <option value="current">Current{src ? ` (revision ${src.revision})` : ""}</option>
                {src
                  ? src.revisions.map((r) => (
                      <option key={r.number} value={String(r.number)}>
                        Revision {r.number}
                        {r.note ? `: ${r.note}` : ""}
                      </option>
                    ))
                  : it.revision !== "current" ? <option value={it.revision}>Revision {it.revision}</option> : null}
              </Select>
              <Field
                id={`${id}-l${i}`}
                label={`Label ${n}`}
                name={`label-${i}`}
                value={it.label}
                maxLength={40}
                onChange={(e) => patch(i, { label: e.target.value, autoLabel: false })}
                errors={errors[`items.${i}.label`]}
              />
              <Button type="button" variant="ghost" disabled={items.length <= 2} onClick={() => setItems((l) => l.filter((_, k) => k !== i))} aria-label={`Remove item ${n}`}>
                Remove
              </Button>
            </div>
          );
        })}
        <Button type="button" variant="secondary" className="self-start" disabled={items.length >= 4} onClick={() => setItems((l) => [...l, blankItem()])}>
          Add an item
        </Button>
      </fieldset>

      <fieldset aria-describedby={errors.series ? `${id}-series-error` : undefined}>
        <legend className="mb-1 text-sm font-medium">Chart series</legend>
        <div className="flex flex-wrap gap-4 text-sm">
          {SERIES.map((s) => (
            <label key={s} className="flex items-center gap-2">
              <input type="checkbox" checked={series.includes(s)} onChange={(e) => setSeries((cur) => (e.target.checked ? SERIES.filter((x) => x === s || cur.includes(x)) : cur.filter((x) => x !== s)))} />
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

      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-note`} className="text-sm font-medium">
          Note <span className="font-normal text-muted">(Markdown: **bold**, lists, links)</span>
        </label>
        <textarea
          id={`${id}-note`}
          value={note}
          onChange={(e) => setNote(e.target.value)}
          rows={6}
          maxLength={5000}
          aria-invalid={errors.note ? true : undefined}
          aria-describedby={errors.note ? `${id}-note-error` : undefined}
          className="rounded-md border border-line bg-panel px-2.5 py-1.5 font-mono text-sm"
        />
        {errors.note ? (
          <p id={`${id}-note-error`} role="alert" className="text-xs text-danger">
            {errors.note.join(" ")}
          </p>
        ) : null}
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" checked={preview} onChange={(e) => setPreview(e.target.checked)} /> Show a preview
        </label>
        {preview ? <LessonNote markdown={note} className="rounded-md border border-line p-3 text-sm" /> : null}
      </div>

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
