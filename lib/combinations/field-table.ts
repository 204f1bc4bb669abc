// The one table of a combination's fields: path, label, quantity kind and digits. The planner's
// editor, the form model, the revisions page (summary and history diff) all read it; a unit test
// checks it against calc's combinationSchema so a new calc field cannot be forgotten here.
import type { QuantityKind } from "@/calc";

/**
 * How a field is held and shown: a quantity in the user's units, a fraction edited as a percent,
 * a plain number (ratio), a count, a word, or the VE curve (edited as rows, see FORM_ONLY_KINDS).
 */
export type FieldQuantity = QuantityKind | "percent" | "plain" | "count" | "text" | "ve-curve";

export type SpecField = {
  /** Dotted path in the spec, as the API's field errors name it. */
  path: string;
  /** The label in the summary and the history diff. */
  label: string;
  /** The editor's label, where it words the field differently. */
  editorLabel?: string;
  quantity: FieldQuantity;
  /** Digits shown in the summary and the diff (quantities and plain numbers). */
  digits?: number;
  /** What the summary says where a spec leaves the field out (default "—"). */
  absent?: string;
  /** An optional refinement of the model (calc/README.md, "Refinements"): the editor's advanced inputs. */
  advanced?: true;
};

/** Every field of a combination people edit, in the order the summary shows them. */
export const SPEC_FIELDS: readonly SpecField[] = [
  { path: "engine.displacement", label: "Engine displacement", quantity: "displacement", digits: 2 },
  { path: "engine.cylinders", label: "Cylinders", quantity: "count" },
  { path: "engine.redlineRpm", label: "Redline", quantity: "speed", digits: 0 },
  { path: "engine.veCurve", label: "Volumetric efficiency curve", quantity: "ve-curve" },
  { path: "engine.chargeTemperatureExponent", label: "Charge temperature exponent", quantity: "plain", digits: 2, absent: "model default (0.5)", advanced: true },
  { path: "engine.compressionRatio", label: "Compression ratio", quantity: "plain", digits: 1, absent: "not given (residual gas left out)", advanced: true },
  { path: "engine.exhaustBackPressure", label: "Exhaust back pressure (gauge)", quantity: "pressure", digits: 2, absent: "model default (0)", advanced: true },
  { path: "blower.kind", label: "Blower kind", quantity: "text" },
  { path: "blower.displacementPerRev", label: "Blower displacement", quantity: "blower-displacement", digits: 2 },
  { path: "blower.builtInVolumeRatio", label: "Built-in volume ratio", quantity: "plain", digits: 2 },
  { path: "blower.maxRpm", label: "Blower speed limit", quantity: "speed", digits: 0 },
  { path: "blower.volumetricEfficiencyRef", label: "Blower reference volumetric efficiency", editorLabel: "Blower volumetric efficiency", quantity: "percent" },
  { path: "blower.referenceRpm", label: "Blower reference speed", editorLabel: "Reference blower speed", quantity: "speed", digits: 0 },
  { path: "blower.internalEfficiency", label: "Blower internal efficiency", quantity: "percent" },
  { path: "blower.mechanicalEfficiency", label: "Drive mechanical efficiency", quantity: "percent" },
  { path: "drive.crankPulleyDiameter", label: "Crank pulley diameter", quantity: "length-small", digits: 2 },
  { path: "drive.blowerPulleyDiameter", label: "Blower pulley diameter", quantity: "length-small", digits: 2 },
  { path: "drive.beltSlip", label: "Belt slip", quantity: "percent" },
  { path: "ambient.pressure", label: "Ambient pressure (absolute)", editorLabel: "Barometer (absolute)", quantity: "pressure", digits: 1 },
  { path: "ambient.temperature", label: "Ambient temperature", quantity: "temperature", digits: 0 },
  { path: "ambient.inletLoss", label: "Inlet pressure loss", quantity: "pressure", digits: 2 },
  { path: "ambient.inletRestriction.ratedFlow", label: "Rated flow of the inlet", quantity: "airflow", digits: 0, absent: "no flow-rated inlet", advanced: true },
  { path: "ambient.inletRestriction.ratingDepression", label: "Inlet rating depression", quantity: "pressure", digits: 2, absent: "model default (1.5 inHg)", advanced: true },
  { path: "intercooler.effectiveness", label: "Intercooler effectiveness", quantity: "percent", absent: "no intercooler" },
  { path: "intercooler.pressureDrop", label: "Intercooler pressure drop", quantity: "pressure", digits: 2, absent: "no intercooler" },
  { path: "intercooler.coolantTemperature", label: "Intercooler coolant temperature", editorLabel: "Coolant temperature", quantity: "temperature", digits: 0, absent: "no intercooler" },
  { path: "fuel.afr", label: "Air-fuel ratio", quantity: "plain", digits: 1 },
  { path: "fuel.bsfc", label: "BSFC", quantity: "bsfc", digits: 2 },
  { path: "fuel.injectorCount", label: "Injectors", editorLabel: "Number of injectors", quantity: "count" },
  { path: "fuel.injectorFlow", label: "Injector flow (each)", editorLabel: "Flow of one injector", quantity: "injector-flow", digits: 0 },
  { path: "fuel.maxDuty", label: "Maximum injector duty", quantity: "percent" },
  { path: "fuel.evaporatedBeforeBlower", label: "Fuel evaporated before the blower", quantity: "percent" },
  { path: "fuel.evaporatedInBlower", label: "Fuel evaporated in the blower", quantity: "percent", absent: "model default (0 %)", advanced: true },
  { path: "fuel.evaporatedInPort", label: "Fuel evaporated in the port", quantity: "percent", absent: "model default (0 %)", advanced: true },
];

/** Fields the editor has that the spec does not store (VE rows by "#", the altitude for the barometer). */
export const FORM_ONLY_FIELDS: readonly SpecField[] = [
  { path: "engine.veCurve.#.rpm", label: "Engine speed", quantity: "speed" },
  { path: "engine.veCurve.#.ve", label: "Volumetric efficiency", quantity: "percent" },
  { path: "ambient.altitude", label: "Altitude", quantity: "altitude" },
];

const BY_PATH = new Map([...SPEC_FIELDS, ...FORM_ONLY_FIELDS].map((f) => [f.path, f]));

/** A field by dotted path, VE row indexes folded to "#". */
export function fieldAt(path: string): SpecField | undefined {
  return BY_PATH.get(path.replace(/\.\d+\./, ".#."));
}

/** The editor's label for a field (throws on a path the table lacks: a typo in the editor). */
export function editorLabelOf(path: string): string {
  const f = fieldAt(path);
  if (!f) throw new Error(`No field ${path} in the combination field table`);
  return f.editorLabel ?? f.label;
}

/** The value at a dotted path of a spec (undefined where a part is absent). */
export function valueAt(spec: unknown, path: string): unknown {
  return path.split(".").reduce<unknown>((o, k) => (o && typeof o === "object" ? (o as Record<string, unknown>)[k] : undefined), spec);
}
