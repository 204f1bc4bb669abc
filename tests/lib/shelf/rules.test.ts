// The shelf's rules without a database: money strings, part numbers and stock, the record
// schemas' bounds, the forms in the user's units and the list queries. (Moved here from the
// database test so the mutation run reaches them; the database test keeps what needs tables.)
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  blowerFormSchema,
  blowerListQuerySchema,
  formatMoney,
  lineTotal,
  moneySchema,
  partNumberSchema,
  pulleyFormSchema,
  pulleyListQuerySchema,
  pulleyRecordSchema,
  stockSchema,
  sumMoney,
} from "@/lib/shelf/rules";

describe("the pulley form in the user's units", () => {
  it("the form takes the user's units and stores SI", () => {
    const imperial = pulleyFormSchema("imperial").parse({ partNumber: "pw-bp-0325-8", position: "blower", diameter: "3.25", ribCount: "8", minBeltDiameter: "", price: "95", stock: "2", notes: "" });
    // 3.25 in × 0.0254 m/in (source: NIST SP 811, App. B).
    expect(imperial.diameter).toBeCloseTo(0.08255, 12);
    expect(imperial.partNumber).toBe("PW-BP-0325-8");
    expect(imperial.minBeltDiameter).toBeNull();
    expect(imperial.price).toBe("95.00");
    const metric = pulleyFormSchema("metric").safeParse({ partNumber: "PW-X-1", position: "blower", diameter: "900", ribCount: "8", minBeltDiameter: "", price: "95", stock: "2", notes: "" });
    expect(metric.success).toBe(false);
    expect(metric.error?.issues[0].path).toEqual(["diameter"]);
    expect(metric.error?.issues[0].message).toMatch(/mm/);
  });
});

describe("the blower form", () => {
  const blowerForm = (displacementPerRev: string, extra: Record<string, string> = {}) => ({
    partNumber: "PW-BL-T1",
    name: "Test",
    kind: "twin-screw",
    displacementPerRev,
    builtInVolumeRatio: "1.5",
    maxRpm: "15000",
    volumetricEfficiencyRef: "90",
    referenceRpm: "10000",
    internalEfficiency: "85",
    mechanicalEfficiency: "95",
    notes: "",
    price: "100",
    stock: "1",
    ...extra,
  });

  it("states its limits in the user's units and percent, on the field", () => {
    const imperial = blowerFormSchema("imperial").safeParse(blowerForm("2"));
    expect(imperial.error?.issues.map((i) => i.path)).toEqual([["displacementPerRev"]]);
    // calc's 0.1–10 L/rev is 6.1–610.2 in³/rev (1 in³ = 16.387064 cm³, NIST SP 811, App. B), stated inward.
    expect(imperial.error?.issues[0].message).toBe("Blower displacement must be between 6.2 and 610.2 in³/rev.");
    const pct = blowerFormSchema("metric").safeParse(blowerForm("2", { internalEfficiency: "0.85" }));
    expect(pct.error?.issues[0].path).toEqual(["internalEfficiency"]);
    expect(pct.error?.issues[0].message).toBe("Internal efficiency must be between 30 and 100 %.");
  });

  it("names every field's problem at once, not one stage at a time", () => {
    const empty = { partNumber: "", name: "", kind: "roots", displacementPerRev: "", builtInVolumeRatio: "1", maxRpm: "", volumetricEfficiencyRef: "", referenceRpm: "", internalEfficiency: "85", mechanicalEfficiency: "95", notes: "", price: "", stock: "0" };
    const r = blowerFormSchema("metric").safeParse(empty);
    expect(new Set(r.error?.issues.map((i) => i.path.join(".")))).toEqual(new Set(["partNumber", "name", "displacementPerRev", "maxRpm", "volumetricEfficiencyRef", "referenceRpm", "price"]));
    const p = pulleyFormSchema("metric").safeParse({ partNumber: "x", position: "idler", diameter: "", ribCount: "2", minBeltDiameter: "", price: "1.234", stock: "-1", notes: "" });
    expect(new Set(p.error?.issues.map((i) => i.path.join(".")))).toEqual(new Set(["partNumber", "position", "diameter", "ribCount", "price", "stock"]));
  });

  it("accepts every displacement inside the range it states (property)", () => {
    for (const system of ["metric", "imperial"] as const) {
      const schema = blowerFormSchema(system);
      const limits = schema.safeParse(blowerForm("-1")).error!.issues[0].message.match(/between ([\d.]+) and ([\d.]+)/)!;
      const [lo, hi] = [Number(limits[1]), Number(limits[2])];
      fc.assert(
        fc.property(fc.double({ min: lo, max: hi, noNaN: true }), (d) => {
          const r = schema.safeParse(blowerForm(String(d)));
          expect(r.error?.issues ?? []).toEqual([]);
        }),
        { numRuns: 200 },
      );
      // and the stated ends themselves
      expect(schema.safeParse(blowerForm(String(lo))).success).toBe(true);
      expect(schema.safeParse(blowerForm(String(hi))).success).toBe(true);
    }
  });
});

describe("the pulley form", () => {
  const pulleyForm = (diameter: string, minBeltDiameter = "") => ({ partNumber: "PW-BP-T1", position: "blower", diameter, ribCount: "8", minBeltDiameter, price: "95", stock: "2", notes: "" });

  it("states the belt minimum's limits in the user's units too", () => {
    const r = pulleyFormSchema("imperial").safeParse(pulleyForm("3", "0.5"));
    expect(r.error?.issues.map((i) => i.path)).toEqual([["minBeltDiameter"]]);
    // 0.02–0.3 m is 0.787–11.81 in (1 in = 0.0254 m, NIST SP 811, App. B), stated inward.
    expect(r.error?.issues[0].message).toBe("Minimum belt diameter must be between 0.79 and 11.81 in.");
  });

  it("accepts every diameter and belt minimum inside the ranges it states (property)", () => {
    for (const system of ["metric", "imperial"] as const) {
      const schema = pulleyFormSchema(system);
      const range = (message: string) => message.match(/between ([\d.]+) and ([\d.]+)/)!.slice(1).map(Number);
      const [dLo, dHi] = range(schema.safeParse(pulleyForm("-1")).error!.issues[0].message);
      const beltIssue = schema.safeParse(pulleyForm(String((dLo + dHi) / 2), "-1")).error!.issues.find((i) => i.path[0] === "minBeltDiameter")!;
      const [bLo, bHi] = range(beltIssue.message);
      fc.assert(
        fc.property(fc.double({ min: dLo, max: dHi, noNaN: true }), fc.option(fc.double({ min: bLo, max: bHi, noNaN: true })), (d, b) => {
          const r = schema.safeParse(pulleyForm(String(d), b === null ? "" : String(b)));
          expect(r.error?.issues ?? []).toEqual([]);
        }),
        { numRuns: 200 },
      );
      for (const [d, b] of [[dLo, bLo], [dHi, bHi]]) expect(schema.safeParse(pulleyForm(String(d), String(b))).success).toBe(true);
    }
  });
});

describe("money strings", () => {
  // Integer cents as the reference arithmetic (BigInt): exact, so any decimal slip shows.
  const cents = (s: string) => {
    const [w, f = ""] = s.split(".");
    return BigInt(w) * 100n + BigInt((f + "00").slice(0, 2));
  };
  const amount = fc.tuple(fc.bigInt({ min: 0n, max: 99_999_999n }), fc.integer({ min: 0, max: 99 })).map(([w, c]) => `${w}.${String(c).padStart(2, "0")}`);

  it("a price is kept to two decimals, a leading $ and spaces dropped; minus signs, three decimals and non-numbers are refused", () => {
    expect(moneySchema.parse("19.9")).toBe("19.90");
    expect(moneySchema.parse(" $7 ")).toBe("7.00");
    // Only a leading dollar sign comes off: "7$" is not an amount.
    expect(moneySchema.safeParse("7$").success).toBe(false);
    expect(moneySchema.parse(12.5)).toBe("12.50");
    expect(moneySchema.parse("9999999999.99")).toBe("9999999999.99");
    for (const bad of ["-1", "1.234", "", "abc", "12345678901", Number.NaN, Number.POSITIVE_INFINITY]) {
      const r = moneySchema.safeParse(bad);
      expect(r.success, String(bad)).toBe(false);
      expect(r.error?.issues[0].message).toMatch(/^Price must be an amount/);
    }
    expect(moneySchema.safeParse(true).error?.issues[0].message).toBe("Price must be an amount like 19.99.");
  });

  it("line totals and sums are exact in cents (BigInt reference)", () => {
    fc.assert(
      fc.property(amount, fc.integer({ min: 0, max: 999 }), (a, q) => {
        expect(cents(lineTotal(a, q))).toBe(cents(a) * BigInt(q));
      }),
    );
    fc.assert(
      fc.property(fc.array(amount, { maxLength: 8 }), (list) => {
        expect(cents(sumMoney(list))).toBe(list.reduce((s, a) => s + cents(a), 0n));
      }),
    );
    expect(sumMoney([])).toBe("0.00");
    // 0.1 + 0.2 in binary floating point is 0.30000000000000004; in cents it is 0.30.
    expect(sumMoney(["0.1", "0.2"])).toBe("0.30");
    expect(lineTotal("19.99", 3)).toBe("59.97");
  });

  it("formatMoney groups thousands as en-US Intl.NumberFormat does (source: ECMA-402, the runtime's Intl)", () => {
    const ref = new Intl.NumberFormat("en-US", { minimumFractionDigits: 2, maximumFractionDigits: 2 });
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 99_999_999 }), fc.integer({ min: 0, max: 99 }), (w, c) => {
        const s = `${w}.${String(c).padStart(2, "0")}`;
        expect(formatMoney(s)).toBe(ref.format(Number(s)));
      }),
    );
    expect(formatMoney("1234.5")).toBe("1,234.50");
    expect(formatMoney("999")).toBe("999.00");
  });
});

describe("part numbers, stock and the pulley record's bounds", () => {
  it("a part number is 3–40 capitals, digits or dashes, upper-cased and trimmed", () => {
    expect(partNumberSchema.parse("  pw-bp-0340-8 ")).toBe("PW-BP-0340-8");
    expect(partNumberSchema.parse("A1-")).toBe("A1-");
    expect(partNumberSchema.parse("A".repeat(40))).toBe("A".repeat(40));
    for (const bad of ["AB", "-AB", "A".repeat(41), "PW BP", "PW_BP"]) expect(partNumberSchema.safeParse(bad).success, bad).toBe(false);
    expect(partNumberSchema.safeParse(undefined).error?.issues[0].message).toBe("Part number is required.");
  });

  it("stock is a whole number from 0 to 1 000 000", () => {
    expect(stockSchema.parse(0)).toBe(0);
    expect(stockSchema.parse(1_000_000)).toBe(1_000_000);
    for (const bad of [-1, 1.5, 1_000_001]) expect(stockSchema.safeParse(bad).success, String(bad)).toBe(false);
    expect(stockSchema.safeParse(1_000_001).error?.issues[0].message).toBe("Stock must be at most 1 000 000.");
    expect(stockSchema.safeParse(-1).error?.issues[0].message).toBe("Stock must be a whole number (0 or more).");
  });

  it("a pulley is 0.03–0.5 m across with 3–16 ribs; a belt minimum 0.02–0.3 m or none (author-chosen bounds)", () => {
    const base = { partNumber: "PW-T-1", position: "crank", diameter: 0.2, ribCount: 8, price: "1", stock: 0 };
    expect(pulleyRecordSchema.parse(base)).toEqual({ ...base, price: "1.00", minBeltDiameter: null, notes: "" });
    for (const [field, ok, bad] of [
      ["diameter", [0.03, 0.5], [0.0299, 0.5001]],
      ["ribCount", [3, 16], [2, 17, 8.5]],
      ["minBeltDiameter", [0.02, 0.3, null], [0.0199, 0.3001]],
    ] as const) {
      for (const v of ok) expect(pulleyRecordSchema.safeParse({ ...base, [field]: v }).success, `${field} ${v}`).toBe(true);
      for (const v of bad) expect(pulleyRecordSchema.safeParse({ ...base, [field]: v }).error?.issues[0].path, `${field} ${v}`).toEqual([field]);
    }
    expect(pulleyRecordSchema.safeParse({ ...base, diameter: 0.6 }).error?.issues[0].message).toBe("Diameter must be between 0.03 and 0.5 m.");
    expect(pulleyRecordSchema.safeParse({ ...base, position: "idler" }).error?.issues[0].message).toBe("Position must be crank or blower.");
  });

  it("the metric pulley form takes mm (1 mm = 0.001 m) and an empty or typed belt minimum", () => {
    const r = pulleyFormSchema("metric").parse({ partNumber: "PW-T-2", position: "crank", diameter: 200, ribCount: 8, minBeltDiameter: "71.5", price: "10", stock: 1, notes: "" });
    expect(r.diameter).toBeCloseTo(0.2, 12);
    expect(r.minBeltDiameter).toBeCloseTo(0.0715, 12);
    const words = pulleyFormSchema("metric").safeParse({ partNumber: "PW-T-2", position: "crank", diameter: "wide", ribCount: "x", minBeltDiameter: "y", price: "10", stock: "1", notes: "" });
    const byPath = Object.fromEntries(words.error!.issues.map((i) => [i.path.join("."), i.message]));
    expect(byPath.diameter).toBe("Diameter must be a number in mm.");
    expect(byPath.ribCount).toBe("Rib count must be a number.");
    expect(byPath.minBeltDiameter).toBe("Minimum belt diameter must be a number in mm, or left empty.");
  });

  it("the blower form turns percent into fractions and in³/rev into m³ (1 in³ = 16.387064 cm³, NIST SP 811, App. B)", () => {
    const r = blowerFormSchema("imperial").parse({
      partNumber: "PW-BL-T2", name: "Test", kind: "roots", displacementPerRev: "112", builtInVolumeRatio: "1", maxRpm: "14000",
      volumetricEfficiencyRef: "88", referenceRpm: "10000", internalEfficiency: "55", mechanicalEfficiency: "92", notes: "", price: "1", stock: "0",
    });
    expect(r.displacementPerRev).toBeCloseTo(112 * 16.387064e-6, 12);
    expect([r.volumetricEfficiencyRef, r.internalEfficiency, r.mechanicalEfficiency].map((v) => Math.round(v * 1e9) / 1e9)).toEqual([0.88, 0.55, 0.92]);
    expect(r.maxRpm).toBe(14000);
  });
});

describe("list queries", () => {
  it("defaults, flags and limits name the parameter", () => {
    expect(pulleyListQuerySchema.parse({})).toEqual({ dir: "asc", page: 1, pageSize: 25, inStock: false, sort: "diameter" });
    expect(blowerListQuerySchema.parse({}).sort).toBe("displacementPerRev");
    for (const [v, want] of [["1", true], ["true", true], [true, true], ["0", false], ["false", false], ["", false], [false, false]] as const) {
      expect(pulleyListQuerySchema.parse({ inStock: v }).inStock, String(v)).toBe(want);
    }
    expect(pulleyListQuerySchema.safeParse({ inStock: "yes" }).error?.issues[0].message).toBe("inStock must be 1 or 0.");
    expect(pulleyListQuerySchema.parse({ page: "3", pageSize: "200" })).toMatchObject({ page: 3, pageSize: 200 });
    expect(pulleyListQuerySchema.safeParse({ pageSize: "201" }).error?.issues[0].message).toBe("pageSize must be at most 200");
    expect(pulleyListQuerySchema.safeParse({ page: "0" }).error?.issues[0].message).toBe("page must be 1 or more");
    expect(pulleyListQuerySchema.safeParse({ dir: "up" }).error?.issues[0].message).toBe("dir must be asc or desc.");
    expect(pulleyListQuerySchema.safeParse({ ribCount: "2" }).success).toBe(false);
    expect(pulleyListQuerySchema.parse({ ribCount: "16" }).ribCount).toBe(16);
    expect(blowerListQuerySchema.safeParse({ kind: "centrifugal" }).error?.issues[0].message).toBe("kind must be roots or twin-screw.");
  });
});
