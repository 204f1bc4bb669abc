// @ts-nocheck
"use client";
// The model's optional refinements (calc/README.md, "Refinements"), folded away until wanted. An
// empty box leaves its field out of the spec, so the model's default applies; a stored value is
// shown and saved back as it was.
import { useState } from "react";
import { SPEC_FIELDS, valueAt } from "@/lib/combinations/field-table";
import type { EditorProps } from "./editor";
import { grid } from "./editor-box";
import { NumField } from "./num-field";

const ADVANCED = SPEC_FIELDS.filter((f) => f.advanced);
const RESTRICTION = "ambient.inletRestriction.";

export function AdvancedSection({ form, system, errors, values }: Omit<EditorProps, "blowers">) {
  const common = { system, register: form.register, errors, values };
  const inUse = values.ambient.inletRestrictionOn || ADVANCED.some((f) => !f.path.startsWith(RESTRICTION) && Number.isFinite(valueAt(values, f.path)));
  const [openedWithValues] = useState(inUse);
  const hasError = ADVANCED.some((f) => f.path in errors);
  const field = (path: string) => {
    const f = ADVANCED.find((x) => x.path === path)!;
    return <NumField key={path} path={path} hint={`Empty: ${f.absent}.`} {...common} />;
  };
  return (
    <details open={openedWithValues || hasError} className="rounded-lg border border-line bg-panel p-3" data-testid="advanced-inputs">
      <summary className="cursor-pointer text-sm font-semibold">Advanced model inputs</summary>
      <div className="mt-3 flex flex-col gap-3">
        <p className="text-xs text-muted">Optional refinements of the model. Leave a box empty for the model&apos;s default.</p>
        <div className={grid}>{ADVANCED.filter((f) => !f.path.startsWith(RESTRICTION)).map((f) => field(f.path))}</div>
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" defaultChecked={values.ambient.inletRestrictionOn} {...form.register("ambient.inletRestrictionOn")} /> Inlet rated by flow (a carburettor or throttle body)
        </label>
        {values.ambient.inletRestrictionOn ? <div className={grid}>{ADVANCED.filter((f) => f.path.startsWith(RESTRICTION)).map((f) => field(f.path))}</div> : null}
      </div>
    </details>
  );
}
