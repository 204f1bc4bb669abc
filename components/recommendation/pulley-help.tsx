"use client";
// The pulley ladder (every blower pulley on the shelf at one engine speed) and the pulley finder
// (the size for a target boost), both computed in the browser by calc/ from the sheet's combination.
import { useMemo, useState } from "react";
import { fromSI, pulleyForBoost, pulleySweep, toSI, unitLabel, DEFAULT_BELT_MINIMUM_DIAMETER, type Combination, type PulleyForBoostResult, type UnitSystem } from "@/calc";
import { quantityText } from "@/lib/units/format";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";

export type ShelfPulley = { partNumber: string; diameter: number; ribCount: number; price: string; stock: number; minBeltDiameter: number | null };

type Props = { spec: Combination; pulleys: ShelfPulley[]; unitSystem: UnitSystem; chosen: number; onChoose: (diameter: number) => void };

const same = (a: number, b: number) => Math.abs(a - b) < 1e-6;

export function PulleyHelp({ spec, pulleys, unitSystem, chosen, onChoose }: Props) {
  const [rpm, setRpm] = useState(String(spec.engine.redlineRpm));
  const [target, setTarget] = useState(unitSystem === "metric" ? "55" : "8");
  const [finderRpm, setFinderRpm] = useState(String(Math.round(spec.engine.redlineRpm * 0.85 / 100) * 100));
  const [found, setFound] = useState<PulleyForBoostResult | null>(null);
  const [finderError, setFinderError] = useState<string | null>(null);
  const q = (kind: Parameters<typeof quantityText>[0], si: number) => quantityText(kind, si, unitSystem);

  const diameters = useMemo(() => [...new Set(pulleys.map((p) => Number(p.diameter.toFixed(6))))].sort((a, b) => a - b), [pulleys]);
  const ladder = useMemo(() => {
    const n = Number(rpm);
    if (!Number.isFinite(n) || n < 100 || n > 20_000 || diameters.length === 0) return { rows: [], error: diameters.length ? "Engine speed must be between 100 and 20,000 rpm." : null };
    try {
      return { rows: pulleySweep(spec, n, diameters), error: null };
    } catch (e) {
      return { rows: [], error: e instanceof Error ? e.message : "The ladder could not be computed." };
    }
  }, [spec, rpm, diameters]);

  function find() {
    setFinderError(null);
    setFound(null);
    const n = Number(finderRpm);
    const t = Number(target);
    if (!Number.isFinite(t)) return setFinderError(`Target boost must be a number in ${unitLabel("pressure", unitSystem)}.`);
    if (!Number.isFinite(n)) return setFinderError("Engine speed must be a number in rpm.");
    try {
      setFound(pulleyForBoost(spec, n, toSI("pressure", t, unitSystem), diameters));
    } catch (e) {
      setFinderError(e instanceof Error ? e.message : "No pulley found.");
    }
  }

  return (
    <div className="flex flex-col gap-4">
      <section aria-labelledby="ladder-heading" className="flex flex-col gap-2">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <h3 id="ladder-heading" className="font-semibold">
            Pulley ladder
          </h3>
          <div className="flex items-center gap-2 text-sm">
            <label htmlFor="ladder-rpm">Boost at</label>
            <input id="ladder-rpm" inputMode="numeric" value={rpm} onChange={(e) => setRpm(e.target.value)} className="w-24 rounded-md border border-line bg-panel px-2 py-1 text-right" />
            <span className="text-muted">rpm</span>
          </div>
        </div>
        {ladder.error ? <Notice tone="danger">{ladder.error}</Notice> : null}
        {diameters.length === 0 ? <Notice>There are no blower pulleys on the shelf yet.</Notice> : null}
        <div className="max-h-80 overflow-auto rounded-md border border-line">
          <table className="w-full text-sm">
            <caption className="sr-only">Blower pulleys on the shelf with predicted boost at {rpm} rpm</caption>
            <thead className="sticky top-0 bg-panel">
              <tr className="border-b border-line text-left">
                <th scope="col" className="px-2 py-1 font-medium">
                  Pulley <span className="font-normal text-muted">({unitLabel("length-small", unitSystem)})</span>
                </th>
                <th scope="col" className="px-2 py-1 text-right font-medium">
                  Ratio
                </th>
                <th scope="col" className="px-2 py-1 text-right font-medium">
                  Boost <span className="font-normal text-muted">({unitLabel("pressure", unitSystem)})</span>
                </th>
                <th scope="col" className="px-2 py-1 text-right font-medium">
                  Blower at redline <span className="font-normal text-muted">(rpm)</span>
                </th>
                <th scope="col" className="px-2 py-1 text-right font-medium">
                  Charge <span className="font-normal text-muted">({unitLabel("temperature", unitSystem)})</span>
                </th>
                <th scope="col" className="px-2 py-1 font-medium">
                  Shelf
                </th>
                <th scope="col" className="px-2 py-1 font-medium">
                  Warnings
                </th>
                <th scope="col" className="px-2 py-1">
                  <span className="sr-only">Choose</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {ladder.rows.map((r) => {
                const onShelf = pulleys.filter((p) => same(p.diameter, r.diameter));
                const beltMin = Math.max(...onShelf.map((p) => p.minBeltDiameter ?? DEFAULT_BELT_MINIMUM_DIAMETER));
                const warnings = [
                  r.overspeed ? "over speed limit" : null,
                  r.diameter < beltMin - 1e-9 ? "below belt minimum" : null,
                  r.chargeTemperatureHigh ? "hot charge" : null,
                  r.injectorDutyHigh ? "injectors maxed" : null,
                  r.pressureRatioOutOfRange ? "outside model range" : null,
                  r.problem ? "no balance" : null,
                ].filter(Boolean);
                const isChosen = same(r.diameter, chosen);
                const size = fromSI("length-small", r.diameter, unitSystem).toFixed(unitSystem === "metric" ? 1 : 2);
                return (
                  <tr key={r.diameter} className={`border-b border-line ${isChosen ? "bg-bg font-semibold" : ""}`}>
                    <td className="px-2 py-1">{size}</td>
                    <td className="px-2 py-1 text-right">{r.driveRatio.toFixed(2)}</td>
                    <td className="px-2 py-1 text-right">{r.point ? fromSI("pressure", r.point.boostGauge, unitSystem).toFixed(1) : "–"}</td>
                    <td className={`px-2 py-1 text-right ${r.overspeed ? "text-danger" : ""}`}>
                      {Math.round(r.blowerRpmAtRedline).toLocaleString("en-US")} / {Math.round(spec.blower.maxRpm).toLocaleString("en-US")}
                    </td>
                    <td className={`px-2 py-1 text-right ${r.chargeTemperatureHigh ? "text-warn" : ""}`}>{r.point ? fromSI("temperature", r.point.manifoldTemperature, unitSystem).toFixed(0) : "–"}</td>
                    <td className="px-2 py-1 text-xs">{onShelf.map((p) => `${p.ribCount}-rib ×${p.stock}`).join(", ")}</td>
                    <td className="px-2 py-1 text-xs text-danger">{warnings.join(", ")}</td>
                    <td className="px-2 py-1 text-right">
                      <Button type="button" variant={isChosen ? "primary" : "secondary"} aria-pressed={isChosen} onClick={() => onChoose(r.diameter)} aria-label={`Choose the ${size} ${unitLabel("length-small", unitSystem)} pulley`}>
                        {isChosen ? "Chosen" : "Choose"}
                      </Button>
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      </section>

      <section aria-labelledby="finder-heading" className="flex flex-col gap-2">
        <h3 id="finder-heading" className="font-semibold">
          Pulley finder
        </h3>
        <div className="flex flex-wrap items-end gap-3 text-sm">
          <div className="flex flex-col gap-1">
            <label htmlFor="finder-boost" className="font-medium">
              Target boost <span className="font-normal text-muted">({unitLabel("pressure", unitSystem)})</span>
            </label>
            <input id="finder-boost" inputMode="decimal" value={target} onChange={(e) => setTarget(e.target.value)} className="w-28 rounded-md border border-line bg-panel px-2 py-1.5 text-right" />
          </div>
          <div className="flex flex-col gap-1">
            <label htmlFor="finder-rpm" className="font-medium">
              At engine speed <span className="font-normal text-muted">(rpm)</span>
            </label>
            <input id="finder-rpm" inputMode="numeric" value={finderRpm} onChange={(e) => setFinderRpm(e.target.value)} className="w-28 rounded-md border border-line bg-panel px-2 py-1.5 text-right" />
          </div>
          <Button type="button" variant="secondary" onClick={find}>
            Find pulley
          </Button>
        </div>
        {finderError ? <Notice tone="danger">{finderError}</Notice> : null}
        {found ? (
          <div className="flex flex-col gap-1 text-sm" data-testid="finder-result">
            <p>
              Exact size: <strong>{q("length-small", found.diameter)}</strong> gives {q("pressure", found.point.boostGauge)} at {Math.round(found.point.rpm)} rpm.
            </p>
            {[
              ["Nearest smaller on the shelf (more boost)", found.below],
              ["Nearest larger on the shelf (less boost)", found.above],
            ].map(([label, s]) =>
              s && typeof s === "object" ? (
                <p key={label as string} className="flex flex-wrap items-center gap-2">
                  {label as string}: {q("length-small", s.diameter)}, {q("pressure", s.point.boostGauge)}
                  <Button type="button" variant="ghost" onClick={() => onChoose(s.diameter)}>
                    Choose
                  </Button>
                </p>
              ) : (
                <p key={label as string} className="text-muted">
                  {label as string}: none
                </p>
              ),
            )}
          </div>
        ) : null}
      </section>
    </div>
  );
}
