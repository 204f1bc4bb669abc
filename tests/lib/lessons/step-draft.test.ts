// The step editor's drafts: what each what-if box is typed in, and the way a typed draft becomes
// the API's SI input and back. Conversions: 1 in = 25.4 mm and 1 ft = 0.3048 m exactly (NIST SP 811,
// Appendix B.8); 5,000 ft = 1,524 m, 0.0711 m = 2.799 in.
import { describe, expect, it } from "vitest";
import { CHANGE_KINDS, NO_CHANGE, blankItem, changeDraft, changeInput, stepInput } from "@/lib/lessons/step-draft";

const ID = "00000000-0000-4000-8000-000000000001";

describe("what each what-if box is typed in", () => {
  it("names each kind, its unit in both systems and a value to start from", () => {
    const shown = (s: "imperial" | "metric") =>
      Object.fromEntries(Object.entries(CHANGE_KINDS).map(([k, v]) => [k, [v.label, v.unit(s), v.start(s)]]));
    expect(shown("imperial")).toEqual({
      ve: ["VE scaled by", "% change, e.g. 8 or −5", "8"],
      pulley: ["Blower pulley diameter", "in", "2.8"],
      intercooler: ["Intercooler added, effectiveness", "%", "70"],
      altitude: ["Altitude", "ft", "5000"],
    });
    // 1,524 m rounded to the nearest 100 m; 0.0711 m = 71.1 mm.
    expect(shown("metric")).toEqual({
      ve: ["VE scaled by", "% change, e.g. 8 or −5", "8"],
      pulley: ["Blower pulley diameter", "mm", "71.1"],
      intercooler: ["Intercooler added, effectiveness", "%", "70"],
      altitude: ["Altitude", "m", "1500"],
    });
  });

  it("a new item starts on the current revision with no change and a label to fill in for itself", () => {
    expect(blankItem()).toEqual({ combinationId: "", revision: "current", label: "", autoLabel: true, change: { kind: "none", value: "" } });
    expect(NO_CHANGE).toEqual({ kind: "none", value: "" });
  });
});

describe("typed numbers", () => {
  it("take a decimal comma, a typographic minus or en dash, and spaces around them", () => {
    expect(changeInput({ kind: "pulley", value: " 71,1 " }, "metric")).toEqual({ kind: "pulley", diameter: 0.0711 });
    expect(changeInput({ kind: "ve", value: "–5" }, "metric")).toEqual({ kind: "ve", scale: 0.95 });
    expect(changeInput({ kind: "ve", value: " −5 " }, "metric")).toEqual({ kind: "ve", scale: 0.95 });
    expect(changeInput({ kind: "ve", value: "−12.5" }, "imperial")).toEqual({ kind: "ve", scale: 0.875 });
    expect(changeInput({ kind: "ve", value: "8" }, "imperial")).toEqual({ kind: "ve", scale: 1.08 });
  });

  it("a blank or a word becomes NaN, for the schema to refuse naming the field (not zero)", () => {
    expect(changeInput({ kind: "pulley", value: "   " }, "metric")).toEqual({ kind: "pulley", diameter: NaN });
    expect(changeInput({ kind: "altitude", value: "" }, "metric")).toEqual({ kind: "altitude", altitude: NaN });
    expect(changeInput({ kind: "altitude", value: "high" }, "imperial")).toEqual({ kind: "altitude", altitude: NaN });
  });

  it("each kind in SI: pulley in metres, intercooler as a fraction, altitude in metres", () => {
    expect(changeInput({ kind: "pulley", value: "3" }, "imperial")?.kind).toBe("pulley");
    expect((changeInput({ kind: "pulley", value: "3" }, "imperial") as { diameter: number }).diameter).toBeCloseTo(0.0762, 12);
    expect(changeInput({ kind: "intercooler", value: "70" }, "metric")).toEqual({ kind: "intercooler", effectiveness: 0.7 });
    expect(changeInput({ kind: "intercooler", value: " " }, "metric")).toEqual({ kind: "intercooler", effectiveness: undefined });
    expect((changeInput({ kind: "altitude", value: "5000" }, "imperial") as { altitude: number }).altitude).toBeCloseTo(1524, 9);
    expect(changeInput({ kind: "altitude", value: "1500" }, "metric")).toEqual({ kind: "altitude", altitude: 1500 });
  });
});

describe("a stored change back in the author's units", () => {
  it("gives every kind's box its text", () => {
    expect(changeDraft(null, "metric")).toEqual(NO_CHANGE);
    expect(changeDraft(undefined, "imperial")).toEqual(NO_CHANGE);
    expect(changeDraft({ kind: "ve", scale: 1.085 }, "metric")).toEqual({ kind: "ve", value: "8.5" });
    expect(changeDraft({ kind: "ve", scale: 0.95 }, "imperial")).toEqual({ kind: "ve", value: "-5" });
    expect(changeDraft({ kind: "pulley", diameter: 0.0711 }, "imperial")).toEqual({ kind: "pulley", value: "2.8" });
    expect(changeDraft({ kind: "pulley", diameter: 0.0711 }, "metric")).toEqual({ kind: "pulley", value: "71.1" });
    expect(changeDraft({ kind: "intercooler", effectiveness: 0.72 }, "metric")).toEqual({ kind: "intercooler", value: "72" });
    expect(changeDraft({ kind: "altitude", altitude: 1524 }, "imperial")).toEqual({ kind: "altitude", value: "5000" });
    expect(changeDraft({ kind: "altitude", altitude: 1524 }, "metric")).toEqual({ kind: "altitude", value: "1524" });
  });
});

describe("the form as the API's step input", () => {
  it("keeps title, labels, series and note, reads a revision number, and converts each change", () => {
    const items = [
      { combinationId: ID, revision: "current", label: "As built", autoLabel: false, change: NO_CHANGE },
      { combinationId: ID, revision: "3", label: "Smaller pulley", autoLabel: true, change: { kind: "pulley" as const, value: "71.1" } },
    ];
    expect(stepInput("Pulley step", items, ["boost", "netPower"], "Watch the belt.", "metric")).toEqual({
      title: "Pulley step",
      items: [
        { combinationId: ID, revision: "current", label: "As built", change: null },
        { combinationId: ID, revision: 3, label: "Smaller pulley", change: { kind: "pulley", diameter: 0.0711 } },
      ],
      series: ["boost", "netPower"],
      note: "Watch the belt.",
    });
  });
});
