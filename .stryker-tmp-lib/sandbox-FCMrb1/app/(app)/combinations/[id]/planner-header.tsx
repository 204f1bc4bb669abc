// @ts-nocheck
"use client";
// The planner's heading (name, revision, links, units) and the offer of a kept draft.
import Link from "next/link";
import { presetOf, unitsToParam, type UnitSystem } from "@/calc";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { useDates } from "@/components/locale";

type PlannerHeaderProps = { name: string; combinationId: string; baseRevision: number; isDemo: boolean; system: UnitSystem; own: UnitSystem; onUnits: (u: UnitSystem) => void; unitsMessage: string | null };

export function PlannerHeader({ name, combinationId, baseRevision, isDemo, system, own, onUnits, unitsMessage }: PlannerHeaderProps) {
  // The presets, plus the person's own mix of units (set in Settings) when they have one.
  const choices: { key: string; label: string; units: UnitSystem }[] = [
    { key: "imperial", label: "Imperial", units: "imperial" },
    { key: "metric", label: "Metric", units: "metric" },
    ...(presetOf(own) === null ? [{ key: "own", label: "My units", units: own }] : []),
  ];
  const current = unitsToParam(system);
  return (
    <>
      <header className="flex flex-wrap items-start gap-x-6 gap-y-2">
        <div className="flex flex-col gap-1">
          <h1 className="text-xl font-semibold">{name}</h1>
          <p className="text-sm text-muted">
            Planner · revision <span data-testid="base-revision">{baseRevision}</span>
            {isDemo ? " · shop demo (invented data)" : ""} ·{" "}
            <Link href={`/combinations/${combinationId}/revisions`} className="text-accent underline underline-offset-2">
              History
            </Link>{" "}
            ·{" "}
            <Link href={`/compare?items=${combinationId}:current`} className="text-accent underline underline-offset-2">
              Side by side
            </Link>
          </p>
        </div>
        <fieldset className="ml-auto flex items-center gap-3 text-sm">
          <legend className="sr-only">Units</legend>
          <span aria-hidden="true" className="text-muted">
            Units
          </span>
          {choices.map((c) => (
            <label key={c.key} className="flex items-center gap-1">
              <input type="radio" name="planner-units" value={c.key} checked={unitsToParam(c.units) === current} onChange={() => onUnits(c.units)} />
              {c.label}
            </label>
          ))}
          <Link href="/settings#units" className="text-accent underline underline-offset-2">
            Per quantity…
          </Link>
        </fieldset>
      </header>
      {unitsMessage ? (
        <p role="status" className="text-xs text-muted">
          {unitsMessage}
        </p>
      ) : null}
    </>
  );
}

export function DraftOffer({ revision, savedAt, onRestore, onDiscard }: { revision: number; savedAt: number; onRestore: () => void; onDiscard: () => void }) {
  const dates = useDates();
  return (
    <Notice tone="warning" title="Unsaved changes found">
      <p>
        This browser kept changes to revision {revision} from {dates.dateTime(savedAt)} that were never saved.
      </p>
      <div className="mt-2 flex gap-2">
        <Button type="button" onClick={onRestore}>
          Restore unsaved changes
        </Button>
        <Button type="button" variant="secondary" onClick={onDiscard}>
          Discard them
        </Button>
      </div>
    </Notice>
  );
}
