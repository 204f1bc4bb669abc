// @ts-nocheck
// Boost and net power of each item at a couple of engine speeds, with the change against the
// first item (the step's reference) or, for an item's what-if, against that item as built.
import type { UnitSystem } from "@/calc";
import { deltaText, quantityText } from "@/lib/units/format";
import { deltaSpeeds, pointAt, type ItemCurve } from "@/lib/lessons/curves";
import { figureOrRange } from "@/lib/planner/range-words";

type DeltasTableProps = { curves: ItemCurve[]; unitSystem: UnitSystem };

const COLUMNS = [
  { key: "boostGauge", kind: "pressure", label: "Boost" },
  { key: "netPower", kind: "power", label: "Net power" },
] as const;

export function DeltasTable({ curves, unitSystem }: DeltasTableProps) {
  if (!curves.length) return null;
  const speeds = deltaSpeeds(curves.map((c) => c.spec));
  const [ref] = curves;
  return (
    <table className="w-full border-collapse text-lg tabular-nums" data-testid="deltas-table">
      <caption className="mb-2 text-left text-base text-muted">Figures at two engine speeds; the change is against “{ref.label}”{curves.some((c) => c.base !== null) ? ", and a what-if's against its item as built" : ""}.</caption>
      <thead>
        <tr className="border-b border-line text-left text-base">
          <th scope="col" className="py-1 pr-3 font-medium">
            Item
          </th>
          {speeds.flatMap((rpm) =>
            COLUMNS.map((c) => (
              <th key={`${rpm}-${c.key}`} scope="col" className="py-1 pr-3 text-right font-medium">
                {c.label} at {rpm.toLocaleString("en-US")} rpm
              </th>
            )),
          )}
        </tr>
      </thead>
      <tbody>
        {curves.map((curve, i) => (
          <tr key={`${curve.label}-${i}`} className="border-b border-line align-top">
            <th scope="row" className="py-1.5 pr-3 text-left font-medium">
              {curve.label}
            </th>
            {speeds.flatMap((rpm) =>
              COLUMNS.map((c) => {
                const p = pointAt(curve.points, rpm);
                const base = pointAt(curves[curve.base ?? 0].points, rpm);
                return (
                  <td key={`${rpm}-${c.key}`} className={`py-1.5 pr-3 text-right ${p && !p.withinRange ? "text-base text-warn" : ""}`}>
                    {p ? figureOrRange(p, unitSystem, (q) => quantityText(c.kind, q[c.key], unitSystem)) : "–"}
                    {/* No change is worked out against or from a point outside the model's range. */}
                    {i > 0 && p?.withinRange && base?.withinRange ? <span className="block text-base text-muted">{deltaText(c.kind, p[c.key] - base[c.key], unitSystem)}</span> : null}
                  </td>
                );
              }),
            )}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
