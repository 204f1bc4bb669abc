// @ts-nocheck
"use client";
// The pulley ladder and finder for a combination outside the planner (the recommendation
// sheet): the same components and the same maths, with "Use" choosing the sheet's pulley.
import { useMemo, useState } from "react";
import type { Combination, UnitSystem } from "@/calc";
import { finderStock, ladder, ladderSpeed, peakPowerRpm, rpmGrid, safeCurve, type ShelfPulley } from "@/lib/planner/compute";
import { PulleyFinder } from "./pulley-finder";
import { PulleyLadder } from "./pulley-ladder";

type PulleyHelpProps = { spec: Combination; shelf: ShelfPulley[]; system: UnitSystem; onChoose: (diameter: number) => void };

export function PulleyHelp({ spec, shelf, system, onChoose }: PulleyHelpProps) {
  const [chosenRpm, setChosenRpm] = useState<number | null>(null);
  const computed = useMemo(() => {
    const rpms = rpmGrid(spec);
    const rpm = ladderSpeed(chosenRpm, peakPowerRpm(safeCurve(spec, rpms), spec.engine.redlineRpm));
    return { rpms, rpm, rows: ladder(spec, rpm, shelf) };
  }, [spec, shelf, chosenRpm]);
  return (
    <div className="flex flex-col gap-4">
      <PulleyLadder rows={computed.rows} system={system} rpm={computed.rpm} fromShelf={shelf.length > 0} onUse={onChoose} />
      <PulleyFinder spec={spec} system={system} rpms={computed.rpms} stock={finderStock(shelf)} defaultRpm={computed.rpm} onRpm={setChosenRpm} onApply={onChoose} nested />
    </div>
  );
}
