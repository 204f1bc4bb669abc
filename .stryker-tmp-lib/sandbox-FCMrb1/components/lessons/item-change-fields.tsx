// @ts-nocheck
"use client";
// One item's stored what-if in the step editor: none, VE scaled, another blower pulley, an
// intercooler added or another altitude, typed in the author's units (lib/lessons/step-draft.ts).
import type { UnitSystem } from "@/calc";
import { Field } from "@/components/ui/field";
import { CHANGE_KINDS, type ChangeDraft, type ChangeKind } from "@/lib/lessons/step-draft";
import { SelectField } from "./select-field";

type ItemChangeFieldsProps = { id: string; value: ChangeDraft; unitSystem: UnitSystem; errors: Record<string, string[]>; prefix: string; onChange: (d: ChangeDraft) => void };

const KIND_LABEL: Record<ChangeKind, string> = {
  none: "None: as built",
  ve: "VE scaled by a percentage",
  pulley: "Another blower pulley",
  intercooler: "An intercooler added",
  altitude: "At another altitude",
};

export function ItemChangeFields({ id, value, unitSystem, errors, prefix, onChange }: ItemChangeFieldsProps) {
  const kind = value.kind === "none" ? null : CHANGE_KINDS[value.kind];
  // The schema names the value's own field (e.g. items.1.change.diameter) or the change itself.
  const valueErrors = Object.entries(errors)
    .filter(([k]) => k === prefix || k.startsWith(`${prefix}.`))
    .flatMap(([, v]) => v);
  return (
    <div className="grid gap-2 sm:col-span-full sm:grid-cols-2">
      <SelectField
        id={`${id}-kind`}
        label="What-if (shown beside the item as built)"
        value={value.kind}
        onChange={(e) => {
          const k = e.target.value as ChangeKind;
          onChange({ kind: k, value: k === "none" ? "" : CHANGE_KINDS[k].start(unitSystem) });
        }}
      >
        {(Object.keys(KIND_LABEL) as ChangeKind[]).map((k) => (
          <option key={k} value={k}>
            {KIND_LABEL[k]}
          </option>
        ))}
      </SelectField>
      {kind ? (
        <Field
          id={`${id}-value`}
          label={kind.label}
          unit={kind.unit(unitSystem)}
          name={`${id}-value`}
          inputMode="decimal"
          value={value.value}
          onChange={(e) => onChange({ ...value, value: e.target.value })}
          hint={value.kind === "intercooler" ? "Leave empty for the model's default; pressure drop and coolant use the defaults too." : undefined}
          errors={valueErrors.length ? valueErrors : undefined}
        />
      ) : null}
    </div>
  );
}
