// Starting points for a new combination: the invented demo engines (demo-specs.ts beside this file).
// Every number in them is a demo value; the planner is where a person makes them their own.
import type { CombinationInput } from "@/calc";
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
