// @ts-nocheck
import { SAFETY_NOTICE } from "@/calc";

/** The general cautions, shown wherever measured and predicted boost are shown. */
export function SafetyNotes() {
  return (
    <aside aria-label="Cautions" className="rounded-md border border-warn bg-warn-bg p-3 text-sm text-warn">
      <p className="font-semibold">Cautions</p>
      <ul className="list-disc pl-5">
        {SAFETY_NOTICE.map((s) => (
          <li key={s}>{s}</li>
        ))}
      </ul>
    </aside>
  );
}
