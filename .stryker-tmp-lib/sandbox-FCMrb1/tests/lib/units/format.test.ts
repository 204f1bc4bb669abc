// @ts-nocheck
// Display rounding: the figure on screen for a SI value. Conversion factors: NIST SP 811
// (1 psi = 6894.757 Pa, 1 in = 0.0254 m exact, 1 hp = 745.6999 W); the digits per kind are the
// product's own choice (no outside source).
import { describe, expect, it } from "vitest";
import { deltaText, digitsOf, displayValue, figure, inputDigitsOf, percentText, quantityText, roundTo } from "@/lib/units/format";

describe("display rounding", () => {
  it("pressure: 8 psi shows as 8.0 psi, 55.2 kPa as 55.2 kPa", () => {
    expect(digitsOf("pressure", "imperial")).toBe(1);
    expect(displayValue("pressure", 8 * 6894.757, "imperial")).toBe(8);
    expect(quantityText("pressure", 8 * 6894.757, "imperial")).toBe("8.0 psi");
    expect(quantityText("pressure", 55_240, "metric")).toBe("55.2 kPa");
    expect(displayValue("pressure", 55_260, "metric")).toBe(55.3);
  });
  it("pulleys to 0.01 in and 0.1 mm; speeds with thousands separators", () => {
    expect(figure("length-small", 3.1 * 0.0254, "imperial")).toBe("3.10");
    expect(figure("length-small", 0.07874, "metric")).toBe("78.7");
    expect(figure("speed", 6200, "imperial")).toBe("6,200");
    expect(displayValue("power", 745.6999 * 412.6, "imperial")).toBe(413);
    expect(displayValue("pressure", 8 * 6894.757, "imperial", 3)).toBe(8);
    expect(figure("pressure", 8 * 6894.757, "imperial", 2)).toBe("8.00");
  });
  it("differences carry a sign, temperatures the size of a degree", () => {
    expect(deltaText("pressure", 1.2 * 6894.757, "imperial")).toBe("+1.2 psi");
    expect(deltaText("pressure", -1.2 * 6894.757, "imperial")).toBe("−1.2 psi");
    expect(deltaText("pressure", 0.01, "imperial")).toBe("±0.0 psi");
    // source: NIST SP 811: a kelvin is 1.8 °F as a difference, and one °C
    expect(deltaText("temperature", 10, "imperial")).toBe("+18 °F");
    expect(deltaText("temperature", -10, "metric")).toBe("−10 °C");
    expect(deltaText("power", 745.6999 * 1234, "imperial")).toBe("+1,234 hp");
  });
  it("percentages", () => {
    expect(percentText(0.853)).toBe("85 %");
    expect(percentText(0.8536, 1)).toBe("85.4 %");
  });
});

describe("input boxes", () => {
  it("boxes are a step finer than readouts, per unit (the product's own choice)", () => {
    expect([inputDigitsOf("length-small", "imperial"), inputDigitsOf("length-small", "metric")]).toEqual([3, 2]);
    expect([inputDigitsOf("pressure", "imperial"), inputDigitsOf("pressure", "metric")]).toEqual([2, 1]);
    expect([inputDigitsOf("displacement", "imperial"), inputDigitsOf("displacement", "metric")]).toEqual([1, 3]);
    expect([inputDigitsOf("temperature", "imperial"), inputDigitsOf("speed", "metric")]).toEqual([1, 0]);
    expect([digitsOf("length-small", "imperial"), digitsOf("displacement", "metric"), digitsOf("speed", "metric")]).toEqual([2, 2, 0]);
  });

  it("rounds by an exact power of ten and leaves non-finite values alone", () => {
    expect(roundTo(1.2000000000000002, 3)).toBe(1.2);
    expect(roundTo(14.695948775513449, 2)).toBe(14.7);
    expect(roundTo(2.875, 3)).toBe(2.875);
    expect(roundTo(-0.55, 1)).toBe(-0.5); // Math.round rounds halves up, towards +∞
    expect(roundTo(1234.5, 0)).toBe(1235);
    expect(roundTo(1234.5, -2)).toBe(1200);
    expect(roundTo(Number.NaN, 2)).toBeNaN();
    expect(roundTo(Number.POSITIVE_INFINITY, 2)).toBe(Number.POSITIVE_INFINITY);
    expect(roundTo(Number.NEGATIVE_INFINITY, 0)).toBe(Number.NEGATIVE_INFINITY);
  });

  it("percentages keep the sign and the digits asked for", () => {
    expect(percentText(-0.05)).toBe("-5 %");
    expect(percentText(1.9)).toBe("190 %");
    expect(percentText(0.5, 2)).toBe("50.00 %");
  });
});
