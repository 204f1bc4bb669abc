// @ts-nocheck
// The cautions beside every result: the model's own warnings, most serious first, and always
// the general safety notice. Plain markup, so it prints black on white with the page.
import { SAFETY_NOTICE, type Caution, type CautionSeverity, type UnitSystem } from "@/calc";
import { cautionText } from "@/lib/units/caution-text";

export const SEVERITY_WORD: Record<CautionSeverity, string> = { danger: "Danger", warning: "Warning", info: "Note" };
const ORDER: Record<CautionSeverity, number> = { danger: 0, warning: 1, info: 2 };
export const SEVERITY_TONE: Record<CautionSeverity, string> = {
  danger: "border-danger bg-danger-bg text-danger",
  warning: "border-warn bg-warn-bg text-warn",
  info: "border-line bg-panel text-fg",
};

export type CautionsPanelProps = { cautions: readonly Caution[]; units: UnitSystem; compact?: boolean };

export function CautionsPanel({ cautions, units, compact = false }: CautionsPanelProps) {
  // The "general" caution repeats the safety notice, which is listed below in full.
  const specific = cautions.filter((c) => c.code !== "general").sort((a, b) => ORDER[a.severity] - ORDER[b.severity]);
  return (
    <section aria-labelledby="cautions-heading" className="flex flex-col gap-2 break-inside-avoid" data-testid="cautions-panel">
      <h2 id="cautions-heading" className={compact ? "text-sm font-semibold" : "text-base font-semibold"}>
        Cautions
      </h2>
      {specific.length === 0 ? (
        <p className="text-sm text-muted">The model raises no specific caution for this combination.</p>
      ) : (
        <ul className="flex flex-col gap-1.5">
          {specific.map((c, i) => (
            <li key={`${c.code}-${i}`} data-severity={c.severity} className={`rounded-md border px-2.5 py-1.5 text-sm print:border-black print:bg-white print:text-black ${SEVERITY_TONE[c.severity]}`}>
              <span className="font-semibold">{SEVERITY_WORD[c.severity]}: </span>
              {cautionText(c, units)}
            </li>
          ))}
        </ul>
      )}
      <SafetyNotice compact={compact} />
    </section>
  );
}

/** The general safety notice, listed once under every set of cautions. */
export function SafetyNotice({ compact = false }: { compact?: boolean }) {
  return (
    <div className="text-xs text-muted print:text-black">
      <p className="font-medium">Always</p>
      <ul className={`list-disc pl-4 ${compact ? "" : "flex flex-col gap-0.5"}`}>
        {SAFETY_NOTICE.map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ul>
    </div>
  );
}
