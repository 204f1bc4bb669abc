// Live figures in a step's note: `{boost@4500}`, `{power@peak}`, `{torque@redline#2}` are replaced
// by the figure computed from the same points the chart draws (straight lines between them), in
// the viewer's units, so the words cannot contradict the chart. Anything in braces that is not a
// figure shows as a marked code span instead, and a note never fails to render.
import type { OperatingPoint, QuantityKind, UnitSystem } from "@/calc";
import { quantityText } from "@/lib/units/format";
import type { ItemCurve } from "./curves";

/** The figures a note may quote: the token's word, the point's field and its kind of quantity. */
export const NOTE_FIGURES = {
  boost: { key: "boostGauge", kind: "pressure" },
  power: { key: "netPower", kind: "power" },
  torque: { key: "torque", kind: "torque" },
  charge: { key: "manifoldTemperature", kind: "temperature" },
  blower: { key: "blowerRpm", kind: "speed" },
} as const satisfies Record<string, { key: keyof OperatingPoint; kind: QuantityKind }>;
type FigureName = keyof typeof NOTE_FIGURES;

export type NoteToken = { figure: FigureName; at: number | "peak" | "redline"; curve: number };

const CANDIDATE = /\{([^{}\n`]{1,40})\}/g;
const TOKEN = /^\s*([a-z]+)\s*@\s*(\d{3,5}|peak|redline)\s*(?:#\s*(\d))?\s*$/i;

/** A token's parts, or null when the text in braces is not a figure. `curve` counts from 0. */
export function parseNoteToken(inner: string): NoteToken | null {
  const m = TOKEN.exec(inner);
  if (!m) return null;
  const figure = m[1].toLowerCase();
  if (!(figure in NOTE_FIGURES)) return null;
  const where = m[2].toLowerCase();
  const curve = m[3] ? Number(m[3]) - 1 : 0;
  if (curve < 0) return null;
  return { figure: figure as FigureName, at: where === "peak" || where === "redline" ? where : Number(where), curve };
}

/** The value of `key` at `rpm` on straight lines between the points, or a reason there is none. */
function valueAt(points: readonly OperatingPoint[], key: keyof OperatingPoint, rpm: number): number | string {
  const i = points.findIndex((p) => p.rpm >= rpm);
  if (i < 0 || points[0].rpm > rpm) return `no figure at ${rpm.toLocaleString("en-US")} rpm`;
  const hi = points[i];
  const lo = hi.rpm === rpm ? hi : points[i - 1];
  if (!lo.withinRange || !hi.withinRange) return `outside the model's range at ${rpm.toLocaleString("en-US")} rpm`;
  const [a, b] = [lo[key] as number, hi[key] as number];
  return hi.rpm === lo.rpm ? b : a + ((b - a) * (rpm - lo.rpm)) / (hi.rpm - lo.rpm);
}

/** A token's figure as text in the viewer's units, or a reason there is none. */
export function figureText(token: NoteToken, curves: readonly ItemCurve[], system: UnitSystem): { ok: true; text: string } | { ok: false; reason: string } {
  const curve = curves[token.curve];
  if (!curve) return { ok: false, reason: `this step has no item ${token.curve + 1}` };
  if (!curve.points.length) return { ok: false, reason: "the model has no answer for this item" };
  const { key, kind } = NOTE_FIGURES[token.figure];
  let value: number | string;
  if (token.at === "peak") {
    const inRange = curve.points.filter((p) => p.withinRange);
    value = inRange.length ? Math.max(...inRange.map((p) => p[key] as number)) : "outside the model's range";
  } else {
    value = valueAt(curve.points, key, token.at === "redline" ? curve.points.at(-1)!.rpm : token.at);
  }
  return typeof value === "number" ? { ok: true, text: quantityText(kind, value, system) } : { ok: false, reason: value };
}

/** The note with every `{…}` replaced: a figure, or a code span saying why there is none. */
export function fillNoteFigures(markdown: string, curves: readonly ItemCurve[], system: UnitSystem): string {
  return markdown.replace(CANDIDATE, (whole, inner: string) => {
    const token = parseNoteToken(inner);
    if (!token) return `\`${whole}: unknown figure\``;
    const r = figureText(token, curves, system);
    return r.ok ? r.text : `\`${whole}: ${r.reason}\``;
  });
}

/** The step editor's help: the tokens a note may use. */
export const NOTE_FIGURE_HELP =
  "Live figures: {boost@4500} is the first item's boost at 4,500 rpm; {power@peak} its highest net power; {torque@redline#2} the second curve's torque at its redline. Figures: boost, power, torque, charge (temperature), blower (speed). Shown in each viewer's units.";
