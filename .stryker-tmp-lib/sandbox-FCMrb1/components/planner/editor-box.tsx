// @ts-nocheck
"use client";
// The editor's panels: a fieldset with its legend, in one look. On phones only the section
// chosen in the editor's tabs shows (editor-tabs.tsx); on wide screens all do.
import { sectionId, useSectionHidden } from "./editor-tabs";

export const grid = "grid grid-cols-1 gap-3 sm:grid-cols-2";

export function EditorBox({ legend, children }: { legend: string; children: React.ReactNode }) {
  const hidden = useSectionHidden(legend);
  return (
    <fieldset id={sectionId(legend)} className={`flex-col gap-3 rounded-lg border border-line bg-panel p-3 ${hidden ? "hidden lg:flex" : "flex"}`}>
      <legend className="px-1 text-sm font-semibold">{legend}</legend>
      {children}
    </fieldset>
  );
}
