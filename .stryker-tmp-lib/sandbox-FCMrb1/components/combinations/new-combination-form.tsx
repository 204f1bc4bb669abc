// @ts-nocheck
"use client";
import { useActionState, useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FieldError } from "@/components/ui/field";
import type { ActionState } from "@/lib/action-state";
import { unitLabel, unitsToParam, type UnitSystem } from "@/calc";
import { MAIN_FIGURES } from "@/lib/combinations/main-figures";
import { BLANK_START, type TemplateKey } from "@/lib/combinations/templates";

type NewCombinationFormProps = {
  templates: { key: TemplateKey; label: string; summary: string }[];
  /** The person's units: the main figures are typed in them. */
  units: UnitSystem;
  /** Tuners, sales and admins may keep it for a customer. */
  staff: boolean;
  /** The server action that creates it (passed in by the page). */
  createAction: (prev: ActionState | undefined, form: FormData) => Promise<ActionState>;
};

export function NewCombinationForm({ templates, units, staff, createAction }: NewCombinationFormProps) {
  const [state, action, pending] = useActionState(createAction, undefined);
  // Controlled, so what was typed survives the form reset React does after an action answers.
  const [v, setV] = useState<{ name: string; template: string; customerName: string; customerContact: string; note: string }>({ name: "", template: templates[0]?.key ?? "", customerName: "", customerContact: "", note: "" });
  const [figs, setFigs] = useState<Record<string, string>>({});
  const blank = v.template === BLANK_START;
  const bind = (k: keyof typeof v) => ({ value: v[k], onChange: (e: React.ChangeEvent<HTMLInputElement>) => setV({ ...v, [k]: e.target.value }) });
  const fe = state && !state.ok ? (state.fieldErrors ?? {}) : {};
  const specErrors = Object.entries(fe).filter(([k]) => k.startsWith("spec"));
  const shown = new Set(["name", "template", "customerName", "customerContact", "note", "blowerKind", ...MAIN_FIGURES.map((f) => f.name)]);
  const other = state && !state.ok && !Object.keys(fe).some((k) => shown.has(k)) ? state.message : null;

  return (
    <form action={action} className="flex flex-col gap-5" noValidate>
      <Field label="Name" name="name" required maxLength={120} placeholder="e.g. Tow truck, 3.2 in pulley" errors={fe.name} autoComplete="off" {...bind("name")} />

      <fieldset className="flex flex-col gap-2" aria-describedby={fe.template ? "template-error" : undefined}>
        <legend className="mb-1 text-sm font-medium">Starting point</legend>
        {templates.map((t) => (
          <label key={t.key} className="flex cursor-pointer gap-3 rounded-md border border-line bg-panel p-3 has-[:checked]:border-accent">
            <input type="radio" name="template" value={t.key} checked={v.template === t.key} onChange={() => setV({ ...v, template: t.key })} className="mt-1" />
            <span>
              <span className="block text-sm font-medium">{t.label}</span>
              <span className="block text-xs text-muted tabular-nums">{t.summary}</span>
            </span>
          </label>
        ))}
        <label className="flex cursor-pointer gap-3 rounded-md border border-line bg-panel p-3 has-[:checked]:border-accent">
          <input type="radio" name="template" value={BLANK_START} checked={blank} onChange={() => setV({ ...v, template: BLANK_START })} className="mt-1" />
          <span>
            <span className="block text-sm font-medium">Blank start</span>
            <span className="block text-xs text-muted">Your main figures below (all of them); generic defaults for the rest, to check in the planner.</span>
          </span>
        </label>
        <FieldError id="template-error">{fe.template?.join(" ")}</FieldError>
      </fieldset>

      <input type="hidden" name="units" value={unitsToParam(units)} />
      <fieldset className="flex flex-col gap-3 rounded-md border border-line p-3">
        <legend className="px-1 text-sm font-medium">Main figures {blank ? "(all needed for a blank start)" : "(optional: blank keeps the starting point's)"}</legend>
        <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
          {MAIN_FIGURES.map((f) => (
            <Field
              key={f.name}
              label={f.label}
              name={f.name}
              unit={f.kind ? unitLabel(f.kind, units) : f.name === "redlineRpm" ? "rpm" : undefined}
              type="number"
              step="any"
              inputMode="decimal"
              errors={fe[f.name]}
              value={figs[f.name] ?? ""}
              onChange={(e) => setFigs({ ...figs, [f.name]: e.target.value })}
            />
          ))}
          <label className="flex flex-col gap-1 text-sm">
            <span className="font-medium">Blower kind</span>
            <select name="blowerKind" value={figs.blowerKind ?? ""} onChange={(e) => setFigs({ ...figs, blowerKind: e.target.value })} className="rounded-md border border-line bg-bg px-2 py-1.5">
              <option value="">{blank ? "Choose…" : "As the starting point"}</option>
              <option value="roots">Roots</option>
              <option value="twin-screw">Twin-screw</option>
            </select>
            {fe.blowerKind ? <span className="text-xs text-danger">{fe.blowerKind.join(" ")}</span> : null}
          </label>
        </div>
      </fieldset>

      {staff ? (
        <fieldset className="flex flex-col gap-3 rounded-md border border-line p-3">
          <legend className="px-1 text-sm font-medium">On behalf of a customer (optional)</legend>
          <Field label="Customer name" name="customerName" maxLength={120} autoComplete="off" errors={fe.customerName} {...bind("customerName")} />
          <Field label="Customer contact" name="customerContact" maxLength={200} hint="Phone or e-mail." autoComplete="off" errors={fe.customerContact} {...bind("customerContact")} />
        </fieldset>
      ) : null}

      <Field label="Note for the first revision (optional)" name="note" maxLength={500} placeholder="As it came in" errors={fe.note} {...bind("note")} />

      {specErrors.length ? (
        <p role="alert" className="text-sm text-danger">
          The starting point could not be used: {specErrors.map(([k, v]) => `${k}: ${v.join(" ")}`).join("; ")}
        </p>
      ) : null}
      {other ? (
        <p role="alert" className="text-sm text-danger">
          {other}
        </p>
      ) : null}
      <Button type="submit" disabled={pending} className="self-start">
        {pending ? "Creating…" : "Create and open in the planner"}
      </Button>
    </form>
  );
}
