// @ts-nocheck
"use client";
// On phones the editor's sections sit behind tabs (one section at a time, under the results);
// on wide screens every section shows and the tab bar is hidden. Each EditorBox reads the chosen
// section from this context, so the editor itself stays one list of sections.
import { createContext, useContext, useState } from "react";

/** The editor's sections by legend, with the form paths each holds (for the error marks). */
export const EDITOR_SECTIONS = [
  { legend: "Engine", prefix: "engine." },
  { legend: "Blower", prefix: "blower." },
  { legend: "Drive", prefix: "drive." },
  { legend: "Ambient air", prefix: "ambient." },
  { legend: "Intercooler", prefix: "intercooler" },
  { legend: "Fuel", prefix: "fuel." },
] as const;

const ActiveSection = createContext<string | null>(null);

/** Whether a section is hidden on phones (it is not the chosen tab). */
export function useSectionHidden(legend: string): boolean {
  const active = useContext(ActiveSection);
  return active !== null && active !== legend;
}

export const sectionId = (legend: string) => `editor-${legend.toLowerCase().replace(/\s+/g, "-")}`;

export function EditorTabs({ errors, children }: { errors: Record<string, string>; children: React.ReactNode }) {
  const [active, setActive] = useState<string>(EDITOR_SECTIONS[0].legend);
  return (
    <ActiveSection.Provider value={active}>
      <div role="tablist" aria-label="Combination sections" className="sticky top-0 z-10 -mx-1 flex gap-1 overflow-x-auto bg-bg px-1 py-1 lg:hidden" data-testid="editor-tabs">
        {EDITOR_SECTIONS.map(({ legend, prefix }) => {
          const bad = Object.keys(errors).some((k) => k.startsWith(prefix));
          const on = legend === active;
          return (
            <button
              key={legend}
              type="button"
              role="tab"
              aria-selected={on}
              aria-controls={sectionId(legend)}
              onClick={() => setActive(legend)}
              className={`shrink-0 rounded-md border px-2 py-1 text-sm ${on ? "border-accent bg-accent/10 font-semibold" : "border-line"} ${bad ? "text-danger" : ""}`}
            >
              {legend}
              {bad ? <span aria-hidden="true"> •</span> : null}
              {bad ? <span className="sr-only"> (has fields to fix)</span> : null}
            </button>
          );
        })}
      </div>
      {children}
    </ActiveSection.Provider>
  );
}
