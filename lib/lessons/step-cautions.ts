// The cautions of a classroom step: each labelled by the curve (item) it belongs to, a caution
// raised twice for the same item listed once, and the general notice left to the panel (once).
import { cautions as cautionsOf, type Caution } from "@/calc";
import type { ItemCurve } from "./curves";

export type ItemCaution = { item: string; caution: Caution };

const SEVERITY_ORDER = { danger: 0, warning: 1, info: 2 } as const;

/** Every specific caution of the step's solved curves, one per code and item, most serious first. */
export function stepCautions(curves: readonly ItemCurve[]): ItemCaution[] {
  const seen = new Set<string>();
  const out: ItemCaution[] = [];
  for (const c of curves) {
    if (!c.points.length) continue;
    for (const caution of cautionsOf(c.spec, c.points)) {
      const key = `${caution.code}\u0000${c.label}`;
      if (caution.code === "general" || seen.has(key)) continue;
      seen.add(key);
      out.push({ item: c.label, caution });
    }
  }
  return out.sort((a, b) => SEVERITY_ORDER[a.caution.severity] - SEVERITY_ORDER[b.caution.severity]);
}
