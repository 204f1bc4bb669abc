// A step's what-if limits, refused by the server in SI, read in the author's units in the editor.
// Conversions: 1 ft = 0.3048 m and 1 in = 0.0254 m exactly (NIST SP 811, Appendix B.8).
import { describe, expect, it } from "vitest";
import { localizeStepErrors, stepInput, type ItemDraft } from "@/lib/lessons/step-draft";
import { stepInputSchema } from "@/lib/lessons/rules";

const ID = "00000000-0000-4000-8000-000000000001";
const item = (change: ItemDraft["change"]): ItemDraft => ({ combinationId: ID, revision: "current", label: "A", autoLabel: false, change });

/** The server's field errors for the step the editor would send (dotted paths, as app/_lib/errors.ts keys them). */
function serverErrors(items: ItemDraft[], system: "imperial" | "metric"): Record<string, string[]> {
  const r = stepInputSchema.safeParse(stepInput("Altitude", items, ["boost"], "", system));
  if (r.success) return {};
  const out: Record<string, string[]> = {};
  for (const i of r.error.issues) (out[i.path.map(String).join(".")] ??= []).push(i.message);
  return out;
}

describe("what-if limits in the author's units", () => {
  it("an altitude out of range is named with its limits in feet for an imperial author and metres for a metric one", () => {
    const high = [item({ kind: "altitude", value: "25000" }), item({ kind: "none", value: "" })];
    const imperial = serverErrors(high, "imperial");
    expect(Object.keys(imperial)).toEqual(["items.0.change.altitude"]);
    // −500 m = −1,640 ft; 6,000 m = 19,685 ft (÷ 0.3048)
    expect(localizeStepErrors(imperial, "imperial")).toEqual({ "items.0.change.altitude": ["Altitude must be between -1,640 ft and 19,685 ft."] });
    const metric = serverErrors([item({ kind: "altitude", value: "7000" }), item({ kind: "none", value: "" })], "metric");
    expect(localizeStepErrors(metric, "metric")).toEqual({ "items.0.change.altitude": ["Altitude must be between -500 m and 6,000 m."] });
  });

  it("a pulley out of range is named in inches; other errors pass through untouched", () => {
    const errors = serverErrors([item({ kind: "none", value: "" }), item({ kind: "pulley", value: "30" })], "imperial");
    expect(Object.keys(errors)).toEqual(["items.1.change.diameter"]);
    // 0.03 m = 1.181 in, 0.5 m = 19.69 in; the limits are rounded inward to three figures.
    expect(localizeStepErrors(errors, "imperial")["items.1.change.diameter"]).toEqual(["Blower pulley diameter must be between 1.19 and 19.6 in"]);
    const other = { title: ["Give the step a title."], "items.0.label": ["Give the item a short label."] };
    expect(localizeStepErrors(other, "imperial")).toEqual(other);
  });

  it("only an item's own altitude or diameter path is rewritten, one message per message", () => {
    const near = {
      "lesson.items.0.change.altitude": ["Altitude must be between -500 and 6000 m"],
      "items.0.change.altitude.note": ["Altitude must be between -500 and 6000 m"],
      "items.x.change.diameter": ["Blower pulley diameter must be between 0.03 and 0.5 m."],
      "items.0.change.diameter.max": ["Blower pulley diameter must be between 0.03 and 0.5 m."],
    };
    expect(localizeStepErrors(near, "imperial")).toEqual(near);
    const two = { "items.12.change.altitude": ["first", "second"] };
    expect(localizeStepErrors(two, "metric")).toEqual({ "items.12.change.altitude": ["Altitude must be between -500 m and 6,000 m.", "Altitude must be between -500 m and 6,000 m."] });
  });
});
