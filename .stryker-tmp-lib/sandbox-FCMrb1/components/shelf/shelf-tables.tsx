// @ts-nocheck
"use client";
// The parts shelf: pulleys and blowers in two tabs; the admin also gets edit forms and CSV import.
import { useState } from "react";
import type { UnitSystem } from "@/calc";
import { BlowerTable } from "./blower-table";
import { CsvImport } from "./csv-import";
import { PulleyTable } from "./pulley-table";

const TABS = [
  ["pulleys", "Pulleys"],
  ["blowers", "Blowers"],
] as const;

export function ShelfTables({ system, isAdmin }: { system: UnitSystem; isAdmin: boolean }) {
  const [tab, setTab] = useState<"pulleys" | "blowers">("pulleys");
  return (
    <div className="flex flex-col gap-4">
      <div role="tablist" aria-label="Shelf" className="flex gap-1 border-b border-line">
        {TABS.map(([key, label]) => (
          <button
            key={key}
            id={`tab-${key}`}
            type="button"
            role="tab"
            aria-selected={tab === key}
            aria-controls={`panel-${key}`}
            onClick={() => setTab(key)}
            onKeyDown={(e) => {
              if (e.key === "ArrowRight" || e.key === "ArrowLeft") setTab(tab === "pulleys" ? "blowers" : "pulleys");
            }}
            tabIndex={tab === key ? 0 : -1}
            className={`-mb-px border-b-2 px-3 py-1.5 text-sm ${tab === key ? "border-accent font-semibold text-accent" : "border-transparent text-muted hover:text-fg"}`}
          >
            {label}
          </button>
        ))}
      </div>
      <div role="tabpanel" id={`panel-${tab}`} aria-labelledby={`tab-${tab}`} className="flex flex-col gap-4">
        {tab === "pulleys" ? <PulleyTable system={system} isAdmin={isAdmin} /> : <BlowerTable system={system} isAdmin={isAdmin} />}
        {isAdmin ? <CsvImport key={tab} kind={tab} /> : null}
      </div>
    </div>
  );
}
