// @ts-nocheck
// Figures on the datalog pages in the user's units (NIST SP 811, Appendix B factors).
import { describe, expect, it } from "vitest";
import { PALETTE, fig, rpmText, withUnit } from "@/lib/datalogs/format";

describe("datalog figures", () => {
  it("boost in psi to 0.01 and kPa to 0.1; temperatures whole; pulleys in in to 0.01 and mm to 0.1", () => {
    // 1 psi = 6894.757 Pa (NIST SP 811, App. B.8).
    expect(fig("pressure", 7.42 * 6894.757, "imperial")).toBe("7.42");
    expect(fig("pressure", 51_160, "metric")).toBe("51.2");
    // 60 °C = 333.15 K = 140 °F (ITS-90 offsets, NIST SP 811 §4.2.1.1).
    expect(fig("temperature", 333.15, "imperial")).toBe("140");
    expect(fig("temperature", 333.15, "metric")).toBe("60");
    // 2.9 in = 0.07366 m (1 in = 0.0254 m exactly, NIST SP 811, App. B.8).
    expect(fig("length-small", 0.07366, "imperial")).toBe("2.90");
    expect(fig("length-small", 0.07366, "metric")).toBe("73.7");
    expect(fig("speed", 12_345.6, "metric")).toBe("12,346");
    // Other kinds as the planner shows them: power in whole kW (1,000 W = 1 kW).
    expect(fig("power", 1000, "metric")).toBe("1");
    expect(fig("power", 1499, "metric")).toBe("1");
    expect(fig("pressure", 6894.757, "imperial", 0)).toBe("1");
  });

  it("nothing to show is a dash, without a unit", () => {
    expect([fig("pressure", null, "metric"), fig("pressure", Number.NaN, "metric"), fig("pressure", Number.POSITIVE_INFINITY, "imperial")]).toEqual(["—", "—", "—"]);
    expect(withUnit("pressure", null, "imperial")).toBe("—");
    expect(withUnit("pressure", 7.42 * 6894.757, "imperial")).toBe("7.42 psi");
    expect(withUnit("temperature", 333.15, "metric", 1)).toBe("60.0 °C");
  });

  it("engine speeds are whole and grouped; the palette is Okabe–Ito's eight colours (Okabe & Ito, 2008)", () => {
    expect([rpmText(5249.6), rpmText(999.4)]).toEqual(["5,250", "999"]);
    expect(PALETTE).toEqual(["#0072B2", "#E69F00", "#009E73", "#CC79A7", "#56B4E9", "#D55E00", "#F0E442", "#000000"]);
  });
});
