// calc's range codes in words, with their bounds in the person's units. Bounds from calc/README.md
// ("Range"): pressure ratio 2.5, charge 473.15 K (200 °C; × 1.8 + 32 = 392 °F), 10 % overspeed.
import { describe, expect, it } from "vitest";
import { OUTSIDE_RANGE, outsideRangeText, rangeReasonText } from "@/lib/planner/range-words";

describe("range words", () => {
  it("words each reason, in either unit system", () => {
    expect(rangeReasonText("pressure-ratio-above-range", "metric")).toBe("pressure ratio above 2.5");
    expect(rangeReasonText("charge-temperature-above-bound", "metric")).toBe("charge hotter than 200 °C");
    expect(rangeReasonText("charge-temperature-above-bound", "imperial")).toBe("charge hotter than 392 °F");
    expect(rangeReasonText("blower-overspeed-margin", "imperial")).toBe("blower more than 10 % over its speed limit");
    expect(rangeReasonText("no-balance", "metric")).toBe("no balance of blower and engine");
  });

  it("joins the reasons after the heading with semicolons, in the order given, and is the heading alone with none", () => {
    expect(OUTSIDE_RANGE).toBe("Outside the model's range");
    expect(outsideRangeText([], "metric")).toBe("Outside the model's range");
    expect(outsideRangeText(["no-balance"], "metric")).toBe("Outside the model's range: no balance of blower and engine");
    expect(outsideRangeText(["blower-overspeed-margin", "pressure-ratio-above-range", "charge-temperature-above-bound"], "imperial")).toBe(
      "Outside the model's range: blower more than 10 % over its speed limit; pressure ratio above 2.5; charge hotter than 392 °F",
    );
  });
});
