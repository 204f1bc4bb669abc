// "Outside the model's range", in words and in the person's units: the one place the UI turns
// calc's range codes into text (ladder, charts' tables, side by side, sheet, share page, lessons).
import { BLOWER_OVERSPEED_MARGIN, CHARGE_TEMPERATURE_BOUND, MODEL_MAX_PRESSURE_RATIO, type OperatingPoint, type RangeReason, type UnitSystem } from "@/calc";
import { quantityText } from "@/lib/units/format";

export const OUTSIDE_RANGE = "Outside the model's range";

/** One reason in words, with its bound in the person's units. */
export function rangeReasonText(reason: RangeReason, system: UnitSystem): string {
  switch (reason) {
    case "pressure-ratio-above-range":
      return `pressure ratio above ${MODEL_MAX_PRESSURE_RATIO.toFixed(1)}`;
    case "charge-temperature-above-bound":
      return `charge hotter than ${quantityText("temperature", CHARGE_TEMPERATURE_BOUND, system)}`;
    case "blower-overspeed-margin":
      return `blower more than ${Math.round(BLOWER_OVERSPEED_MARGIN * 100)} % over its speed limit`;
    case "no-balance":
      return "no balance of blower and engine";
  }
}

/** "Outside the model's range: pressure ratio above 2.5; …" (the heading alone with no reasons). */
export function outsideRangeText(reasons: readonly RangeReason[], system: UnitSystem): string {
  return reasons.length ? `${OUTSIDE_RANGE}: ${reasons.map((r) => rangeReasonText(r, system)).join("; ")}` : OUTSIDE_RANGE;
}

/** What a screen needs of a point to know whether its figures may be shown. */
export type RangeOf = Pick<OperatingPoint, "withinRange" | "rangeReasons">;

/** A point's figures as `text()` words them, or why the model gives none there: the one rule the
 *  sheet, share page, e-mail and lessons print figures through. */
export function figureOrRange<P extends RangeOf>(point: P, system: UnitSystem, text: (point: P) => string): string {
  return point.withinRange ? text(point) : outsideRangeText(point.rangeReasons, system);
}
