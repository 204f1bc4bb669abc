// A new combination's main figures (displacement, cylinders, redline, blower kind and size,
// pulleys), typed in the person's units, laid over a starting point. Blank figures keep the
// starting point's; a blank start needs them all. Pure.
import { toSI, type CombinationInput, type QuantityKind, type UnitSystem } from "@/calc";
import { FieldError } from "@/lib/errors";

export const MAIN_FIGURES = [
  { name: "displacement", label: "Engine displacement", kind: "displacement" },
  { name: "cylinders", label: "Cylinders", kind: null },
  { name: "redlineRpm", label: "Redline", kind: null },
  { name: "blowerDisplacement", label: "Blower displacement per revolution", kind: "blower-displacement" },
  { name: "crankPulley", label: "Crank pulley diameter", kind: "length-small" },
  { name: "blowerPulley", label: "Blower pulley diameter", kind: "length-small" },
] as const satisfies readonly { name: string; label: string; kind: QuantityKind | null }[];

export type MainFigureName = (typeof MAIN_FIGURES)[number]["name"] | "blowerKind";
export type MainFigures = Partial<Record<MainFigureName, string>>;

/**
 * The starting spec with the figures given; throws FieldError naming the form field for a figure
 * that is not a number, or (with `requireAll`, the blank start) one left out.
 */
export function withMainFigures(start: CombinationInput, figures: MainFigures, system: UnitSystem, requireAll = false): CombinationInput {
  const spec = structuredClone(start) as CombinationInput & { engine: Record<string, unknown>; blower: Record<string, unknown>; drive: Record<string, unknown> };
  const read = (name: (typeof MAIN_FIGURES)[number]["name"]): number | null => {
    const def = MAIN_FIGURES.find((f) => f.name === name)!;
    const text = (figures[name] ?? "").trim();
    if (text === "") {
      if (requireAll) throw new FieldError(name, `${def.label}: give a figure for a blank start.`);
      return null;
    }
    const n = Number(text);
    if (!Number.isFinite(n)) throw new FieldError(name, `${def.label} must be a number.`);
    return def.kind ? toSI(def.kind, n, system) : n;
  };
  const set = (part: Record<string, unknown>, key: string, v: number | null) => {
    if (v !== null) part[key] = v;
  };
  set(spec.engine, "displacement", read("displacement"));
  set(spec.engine, "cylinders", read("cylinders"));
  set(spec.engine, "redlineRpm", read("redlineRpm"));
  set(spec.blower, "displacementPerRev", read("blowerDisplacement"));
  set(spec.drive, "crankPulleyDiameter", read("crankPulley"));
  set(spec.drive, "blowerPulleyDiameter", read("blowerPulley"));
  const kind = (figures.blowerKind ?? "").trim();
  if (kind === "roots" || kind === "twin-screw") spec.blower.kind = kind;
  else if (kind !== "") throw new FieldError("blowerKind", "Blower kind must be Roots or twin-screw.");
  else if (requireAll) throw new FieldError("blowerKind", "Blower kind: choose one for a blank start.");
  return spec;
}
