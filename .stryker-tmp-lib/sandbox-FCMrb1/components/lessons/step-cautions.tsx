// @ts-nocheck
// The step's cautions in the classroom: each names the item (curve) it belongs to, none repeats,
// and the general safety notice comes once at the end. Words come from `cautionText` (the viewer's units) only.
import type { UnitSystem } from "@/calc";
import { SEVERITY_TONE, SEVERITY_WORD, SafetyNotice } from "@/components/cautions-panel";
import type { ItemCaution } from "@/lib/lessons/step-cautions";
import { cautionText } from "@/lib/units/caution-text";

type StepCautionsProps = { cautions: ItemCaution[]; unitSystem: UnitSystem };

export function StepCautions({ cautions, unitSystem }: StepCautionsProps) {
  return (
    <section aria-labelledby="step-cautions-heading" className="flex flex-col gap-2" data-testid="cautions-panel">
      <h2 id="step-cautions-heading" className="text-2xl font-semibold">
        Cautions
      </h2>
      {cautions.length === 0 ? (
        <p className="text-base text-muted">The model raises no specific caution for these items.</p>
      ) : (
        <ul className="flex flex-col gap-1.5">
          {cautions.map(({ item, caution }) => (
            <li key={`${caution.code}-${item}`} data-severity={caution.severity} data-item={item} className={`rounded-md border px-3 py-2 text-base ${SEVERITY_TONE[caution.severity]}`}>
              <span className="font-semibold">
                {SEVERITY_WORD[caution.severity]} · {item}:{" "}
              </span>
              {cautionText(caution, unitSystem)}
            </li>
          ))}
        </ul>
      )}
      <SafetyNotice />
    </section>
  );
}
