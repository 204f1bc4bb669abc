// @ts-nocheck
"use client";
// One item of a step in the editor: which combination, which of its saved revisions (number, date
// and note, so "revision 2" is never mistaken for the item's number), its label and its what-if.
import type { UnitSystem } from "@/calc";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import type { StepSource } from "@/db/repo/lessons";
import type { ItemDraft } from "@/lib/lessons/step-draft";
import { ItemChangeFields } from "./item-change-fields";
import { SelectField } from "./select-field";

type StepItemFieldsProps = {
  id: string;
  index: number;
  draft: ItemDraft;
  sources: StepSource[];
  unitSystem: UnitSystem;
  errors: Record<string, string[]>;
  canRemove: boolean;
  onChange: (change: Partial<ItemDraft>) => void;
  onRemove: () => void;
};

/** "Revision 2 · 3 Nov 2026 · smaller pulley". */
const revisionText = (r: StepSource["revisions"][number]) => [`Revision ${r.number}`, r.date, r.note].filter(Boolean).join(" · ");

function SourceOptions({ label, list }: { label: string; list: StepSource[] }) {
  if (!list.length) return null;
  return (
    <optgroup label={label}>
      {list.map((s) => (
        <option key={s.id} value={s.id}>
          {s.name} (latest: revision {s.revision})
        </option>
      ))}
    </optgroup>
  );
}

export function StepItemFields({ id, index, draft, sources, unitSystem, errors, canRemove, onChange, onRemove }: StepItemFieldsProps) {
  const src = sources.find((s) => s.id === draft.combinationId);
  const latest = src?.revisions.find((r) => r.number === src.revision);
  const n = index + 1;
  const err = (field: string) => errors[`items.${index}.${field}`];
  return (
    <fieldset className="grid gap-2 rounded-md border border-line p-2 sm:grid-cols-[2fr_2fr_1.5fr_auto] sm:items-end">
      <legend className="px-1 text-sm font-semibold">Item {n}</legend>
      <SelectField id={`${id}-c`} label="Combination" value={draft.combinationId} onChange={(e) => onChange({ combinationId: e.target.value, revision: "current" })} errors={err("combinationId")}>
        <option value="">Choose…</option>
        <SourceOptions label="Yours" list={sources.filter((s) => !s.isDemo)} />
        <SourceOptions label="Shop demo combinations" list={sources.filter((s) => s.isDemo)} />
        {draft.combinationId && !src ? <option value={draft.combinationId}>(as saved in this step)</option> : null}
      </SelectField>
      <SelectField id={`${id}-r`} label="Saved revision" value={draft.revision} onChange={(e) => onChange({ revision: e.target.value })} errors={err("revision")}>
        <option value="current">{latest ? `Current — ${revisionText(latest)}` : "Current"}</option>
        {src
          ? src.revisions.map((r) => (
              <option key={r.number} value={String(r.number)}>
                {revisionText(r)}
              </option>
            ))
          : draft.revision !== "current" ? <option value={draft.revision}>Revision {draft.revision}</option> : null}
      </SelectField>
      <Field id={`${id}-l`} label="Label in the chart" name={`label-${index}`} value={draft.label} maxLength={40} onChange={(e) => onChange({ label: e.target.value, autoLabel: false })} errors={err("label")} />
      <Button type="button" variant="ghost" disabled={!canRemove} onClick={onRemove} aria-label={`Remove item ${n}`}>
        Remove
      </Button>
      <ItemChangeFields id={`${id}-w`} value={draft.change} unitSystem={unitSystem} errors={errors} prefix={`items.${index}.change`} onChange={(change) => onChange({ change })} />
    </fieldset>
  );
}
