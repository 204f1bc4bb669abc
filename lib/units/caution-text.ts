// calc's cautions and solver errors say their numbers in SI ("136 °C", "72 mm", "kPa"); these
// put them in the person's units at the edge. The one place a caution or error becomes text:
// the planner, sheet, print, share page, side by side and classroom all go through here.
import { CalcConvergenceError, VE_PLAUSIBLE_MAX, VE_PLAUSIBLE_MIN, type Caution, type UnitSystem } from "@/calc";
import { percentText, quantityText } from "./format";

const rpm = (n: number) => `${Math.round(n).toLocaleString("en-US")} rpm`;

/** A caution's message in the person's units (cautions without quantities keep calc's words). */
export function cautionText(c: Caution, units: UnitSystem): string {
  const v = c.values;
  switch (c.code) {
    case "pulley-below-belt-minimum":
      return `The ${quantityText("length-small", v.blowerPulleyDiameter, units)} blower pulley is below the ${quantityText("length-small", v.beltMinimumDiameter, units)} the belt should wrap; expect belt slip, heat and wear. Check the belt maker's minimum.`;
    case "charge-temperature-high":
      return `Charge temperature reaches ${quantityText("temperature", v.manifoldTemperature, units)} at ${rpm(v.rpm)}, above ${quantityText("temperature", v.limit, units)} (a conservative rule of thumb for knock risk). Consider an intercooler, less boost, better fuel or less ignition advance.`;
    case "ve-implausible":
      // VE in percent, as the VE boxes beside it take it.
      return `The VE curve looks implausible (from ${percentText(v.minVe)} to ${percentText(v.maxVe)}, steepest change ${percentText(v.maxSlopePer1000Rpm)} per 1,000 rpm); wide-open-throttle VE usually lies between ${percentText(VE_PLAUSIBLE_MIN)} and ${percentText(VE_PLAUSIBLE_MAX)} and changes smoothly. Check the curve.`;
    default:
      return c.message;
  }
}

/** A solver or model error in the person's units (the blower that cannot feed the engine; others as calc words them). */
export function calcErrorText(e: unknown, units: UnitSystem, fallback = "The model could not solve this combination."): string {
  if (e instanceof CalcConvergenceError && e.reason === "blower-too-slow" && e.values.floorPressure !== undefined) {
    return `At ${rpm(e.rpm)} the blower (${rpm(e.values.blowerRpm)}) cannot feed the engine: manifold pressure would fall below ${quantityText("pressure", e.values.floorPressure, units)} absolute. Choose a smaller blower pulley or a larger blower.`;
  }
  return e instanceof Error ? e.message : fallback;
}
