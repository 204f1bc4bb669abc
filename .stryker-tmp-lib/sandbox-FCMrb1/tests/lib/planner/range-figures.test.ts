// @ts-nocheck
// Figures outside the model's range are replaced by its words on the sheet, its e-mail and the
// lessons' deltas table (calc/README.md, "Range"): the helper, the sheet's data, and the markup.
import { describe, expect, it } from "vitest";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { combinationSchema, inToM, type Combination, type RangeReason } from "@/calc";
import { workTruckV6 } from "@/lib/combinations/demo-specs";
import { figureOrRange, outsideRangeText } from "@/lib/planner/range-words";
import { withPulley } from "@/lib/planner/compute";
import { computeSheet } from "@/lib/recommendations/sheet-data";
import { stepCurves } from "@/lib/lessons/curves";
import { quantityText } from "@/lib/units/format";
import { DeltasTable } from "@/components/lessons/deltas-table";
import { buildSheetEmail } from "@/app/_lib/recommendation-email";

const base: Combination = combinationSchema.parse(workTruckV6);
// A 1.6 in blower pulley drives the demo engine past the model's pressure ratio of 2.5 near
// redline (the same set-up as the ladder's range test in compute.test.ts); bound from calc/README.md.
const tiny = withPulley(base, inToM(1.6));
// At 2.0 in about half the sheet's speeds stay within range (measured: 8 of 16), the upper half not.
const small = withPulley(base, inToM(2.0));

describe("figureOrRange", () => {
  it("words the figure within range and only the range words outside it", () => {
    const reasons: RangeReason[] = ["pressure-ratio-above-range"];
    const text = (p: { withinRange: boolean; rangeReasons: RangeReason[]; x: number }) => `${p.x} psi`;
    expect(figureOrRange({ withinRange: true, rangeReasons: [], x: 7 }, "imperial", text)).toBe("7 psi");
    expect(figureOrRange({ withinRange: false, rangeReasons: reasons, x: 58.6 }, "imperial", text)).toBe(outsideRangeText(reasons, "imperial"));
    expect(figureOrRange({ withinRange: false, rangeReasons: reasons, x: 58.6 }, "imperial", text)).not.toMatch(/58/);
  });
});

describe("the sheet with a point outside the model's range", () => {
  const sheet = computeSheet(small);
  const f = sheet.figures;

  it("carries the redline point's range and reads peaks only among trusted points", () => {
    const top = sheet.points.find((p) => p.rpm === base.engine.redlineRpm)!;
    expect(top.withinRange).toBe(false);
    expect(f.atRedline).toMatchObject({ withinRange: false, rangeReasons: top.rangeReasons });
    expect(f.headline).toMatchObject({ withinRange: false, sold: false });
    const trusted = sheet.points.filter((p) => p.withinRange);
    expect(trusted.length).toBeGreaterThan(0);
    expect(f.peakPower!.netPower).toBe(Math.max(...trusted.map((p) => p.netPower)));
    expect(trusted.some((p) => p.rpm === f.peakPower!.rpm)).toBe(true);
  });

  it("keeps the in-range sheet as it was: the headline is a figure", () => {
    const ok = computeSheet(base).figures;
    expect(ok.headline!.withinRange).toBe(true);
    expect(figureOrRange(ok.headline!, "metric", (h) => quantityText("pressure", h.boostGauge, "metric"))).toMatch(/kPa$/);
  });

  it("the e-mail says the model's words, not a boost figure, for the headline", () => {
    const record = { id: "s1", title: "", customerName: "Ada Example", customerEmail: null, vehicleNotes: "", notes: "", status: "sent", sentAt: null, createdAt: new Date(0), revision: 1, targetRpm: null, parts: [], total: "0.00", spec: small };
    const shop = { name: "Test shop", address: "", phone: "", email: "", website: "" } as Parameters<typeof buildSheetEmail>[0]["shop"];
    const mail = buildSheetEmail({ sheet: record, shop, currency: "USD", unitSystem: "imperial", link: "https://example.test/s", expiresAt: new Date(0) });
    const line = mail.text.split("\n").find((l) => l.startsWith("Predicted boost"))!;
    expect(line).toContain(outsideRangeText(f.headline!.rangeReasons, "imperial"));
    expect(line).not.toMatch(/psi/);
  });
});

describe("the lessons' deltas table", () => {
  it("prints the range words, not boost or power, for an item outside the range, and no change against it", () => {
    const item = (label: string, spec: Combination) => ({ combinationId: label, revision: 1, label, name: label, spec });
    const curves = stepCurves([item("As built", base), item("Tiny pulley", tiny)], { kind: "none" });
    const html = renderToStaticMarkup(createElement(DeltasTable, { curves, unitSystem: "imperial" }));
    const row = html.slice(html.indexOf("Tiny pulley"));
    expect(row).toContain("Outside the model&#x27;s range");
    expect(row).not.toMatch(/psi|hp/);
    // The as-built row still shows figures.
    expect(html.slice(0, html.indexOf("Tiny pulley"))).toMatch(/\d psi/);
  });
});
