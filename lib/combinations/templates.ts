// Starting points for a new combination: the invented demo engines (demo-specs.ts beside this file).
// Every number in them is a demo value; the planner is where a person makes them their own.
import type { CombinationInput, UnitSystem } from "@/calc";
import { applyShape, VE_SHAPES } from "@/lib/planner/ve-shapes";
import { withMainFigures, type MainFigures } from "./main-figures";
import { bigInchIntercooled, roadCarFour, vintageV8DrawThrough, workTruckV6 } from "@/lib/combinations/demo-specs";

export type TemplateKey = "v6-roots" | "big-v8-twin-screw" | "vintage-v8-draw-through" | "four-cylinder-twin-screw";

export const TEMPLATES: readonly { key: TemplateKey; label: string; spec: CombinationInput }[] = [
  { key: "v6-roots", label: "V6 ~4.3 L, Roots", spec: workTruckV6 },
  { key: "big-v8-twin-screw", label: "Big-inch V8 ~7.4 L, twin-screw, intercooled", spec: bigInchIntercooled },
  { key: "vintage-v8-draw-through", label: "Vintage V8 ~5.7 L, Roots drawing through a carburettor", spec: vintageV8DrawThrough },
  { key: "four-cylinder-twin-screw", label: "Four-cylinder ~2.4 L, twin-screw, intercooled", spec: roadCarFour },
];

export const TEMPLATE_KEYS = TEMPLATES.map((t) => t.key) as [TemplateKey, ...TemplateKey[]];

export function templateSpec(key: TemplateKey): CombinationInput {
  const t = TEMPLATES.find((x) => x.key === key);
  if (!t) throw new Error(`unknown template ${key}`);
  // A fresh copy: the demo objects are shared.
  return structuredClone(t.spec);
}

/** A blank start: every main figure from the person, generic defaults (the first template's) for the rest. */
export const BLANK_START = "blank";

/** The first revision's spec: the starting point (or a blank start) with the main figures typed. */
export function startingSpec(key: TemplateKey | typeof BLANK_START, figures: MainFigures, system: UnitSystem): CombinationInput {
  if (key !== BLANK_START) return withMainFigures(templateSpec(key), figures, system);
  const spec = withMainFigures(templateSpec(TEMPLATES[0].key), figures, system, true) as CombinationInput & { engine: { redlineRpm: number; veCurve: { rpm: number; ve: number }[] } };
  // The default VE shape laid over the person's own speed range (up to their redline).
  spec.engine.veCurve = applyShape(VE_SHAPES[0], spec.engine.redlineRpm, []).map((r) => ({ rpm: r.rpm, ve: r.ve / 100 }));
  return spec;
}
