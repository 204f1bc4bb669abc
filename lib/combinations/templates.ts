// Starting points for a new combination: the invented demo engines (demo-specs.ts beside this file).
// Every number in them is a demo value; the planner is where a person makes them their own.
import type { CombinationInput } from "@/calc";
import { bigBlockTwinScrew, fourCylinderRoots, smallBlockBaseline } from "@/lib/combinations/demo-specs";

export type TemplateKey = "small-block-roots" | "big-v8-twin-screw" | "four-cylinder-roots";

export const TEMPLATES: readonly { key: TemplateKey; label: string; spec: CombinationInput }[] = [
  { key: "small-block-roots", label: "Small-block V8 ~5 L, Roots", spec: smallBlockBaseline },
  { key: "big-v8-twin-screw", label: "Large V8 ~7 L, twin-screw", spec: bigBlockTwinScrew },
  { key: "four-cylinder-roots", label: "Four-cylinder ~2 L, Roots", spec: fourCylinderRoots },
];

export const TEMPLATE_KEYS = TEMPLATES.map((t) => t.key) as [TemplateKey, ...TemplateKey[]];

export function templateSpec(key: TemplateKey): CombinationInput {
  const t = TEMPLATES.find((x) => x.key === key);
  if (!t) throw new Error(`unknown template ${key}`);
  // A fresh copy: the demo objects are shared.
  return structuredClone(t.spec);
}
