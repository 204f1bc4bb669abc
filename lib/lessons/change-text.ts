// Words for a step's what-if in the viewer's units: the chart legend, the deltas table, the
// "In this step" list and a copy's name all say the same thing ("blower pulley 2.80 in").
import type { UnitSystem } from "@/calc";
import { percentText, quantityText } from "@/lib/units/format";
import type { ItemChange } from "./rules";

/** The change in a few words, e.g. "VE +8 %", "blower pulley 2.80 in", "intercooler added (70 %)", "at 1,600 m". */
export function changeText(change: ItemChange, system: UnitSystem): string {
  switch (change.kind) {
    case "ve": {
      const pct = Math.round((change.scale - 1) * 100);
      return `VE ${pct > 0 ? "+" : pct < 0 ? "−" : "±"}${Math.abs(pct)} %`;
    }
    case "pulley":
      return `blower pulley ${quantityText("length-small", change.diameter, system)}`;
    case "intercooler":
      return `intercooler added (${percentText(change.effectiveness)})`;
    case "altitude":
      return `at ${quantityText("altitude", change.altitude, system)}`;
  }
}

/** The legend label of an item's curve: "Truck — as built" or "Truck — blower pulley 2.80 in". */
export function variantLabel(label: string, change: ItemChange | null, system: UnitSystem): string {
  return `${label} — ${change ? changeText(change, system) : "as built"}`;
}
