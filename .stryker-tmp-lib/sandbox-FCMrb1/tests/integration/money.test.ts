// @ts-nocheck
// Money is exact: decimal.js for arithmetic, numeric(12,2) in the database, strings in between.
// The reference is integer cents, which binary floating point cannot match (0.1 + 0.2 ≠ 0.3).
import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { exampleCombination } from "@/calc";
import { createCombination } from "@/db/repo/combinations";
import { createRecommendation, getRecommendation, priceLines } from "@/db/repo/recommendations";
import { formatMoney, lineTotal, moneySchema, sumMoney } from "@/lib/shelf/rules";
import { freshDatabase, makeUser, type TestDb } from "../support/db";

/** Integer-cents reference: "19.99" → 1999n, and back. */
const cents = (s: string) => {
  const [w, f = ""] = s.split(".");
  return BigInt(w) * 100n + BigInt((f + "00").slice(0, 2));
};
const fromCents = (c: bigint) => `${c / 100n}.${String(c % 100n).padStart(2, "0")}`;

describe("money", () => {
  it("3 × 19.99 + 0.01 is exactly 59.98, and 0.10 + 0.20 is 0.30 (where binary floating point drifts)", () => {
    // source: arithmetic in integer cents, 3 × 1999 + 1 = 5998; IEEE 754 doubles give 0.1 + 0.2 = 0.30000000000000004.
    expect(0.1 + 0.2).not.toBe(0.3);
    expect(sumMoney([lineTotal("19.99", 3), lineTotal("0.01", 1)])).toBe("59.98");
    expect(fromCents(3n * cents("19.99") + cents("0.01"))).toBe("59.98");
    expect(sumMoney(["0.10", "0.20"])).toBe("0.30");
  });

  it("line totals and sums agree with integer cents for any prices and quantities", () => {
    const price = fc.tuple(fc.bigInt({ min: 0n, max: 99_999_999n }), fc.integer({ min: 0, max: 99 })).map(([w, c]) => `${w}.${String(c).padStart(2, "0")}`);
    const line = fc.record({ price, qty: fc.integer({ min: 1, max: 999 }) });
    fc.assert(
      fc.property(fc.array(line, { maxLength: 40 }), (lines) => {
        const ours = sumMoney(lines.map((l) => lineTotal(l.price, l.qty)));
        const reference = fromCents(lines.reduce((acc, l) => acc + cents(l.price) * BigInt(l.qty), 0n));
        return ours === reference;
      }),
      { numRuns: 300 },
    );
  });

  it("prices are read as two-decimal strings and refuse negatives, three decimals and words", () => {
    expect(moneySchema.parse("19.9")).toBe("19.90");
    expect(moneySchema.parse(19.99)).toBe("19.99");
    expect(moneySchema.parse(" $7 ")).toBe("7.00");
    for (const bad of ["-1.00", "1.999", "ten", "", "1e3", "NaN"]) expect(moneySchema.safeParse(bad).success, bad).toBe(false);
    expect(formatMoney("1234567.5")).toBe("1,234,567.50");
  });

  describe("in the database", () => {
    let t: TestDb;
    beforeAll(async () => {
      t = await freshDatabase();
    });
    afterAll(async () => {
      await t?.drop();
    });

    it("a sheet's total is computed on the server and stored and read back exactly", async () => {
      const sales = await makeUser(t.db, "sales");
      const combo = await createCombination(t.db, sales, { name: "Money test", spec: exampleCombination() });
      const lines = [
        { partNumber: null, description: "Belt, 8-rib", unitPrice: "19.99", quantity: 3 },
        { partNumber: null, description: "Washer", unitPrice: "0.01", quantity: 1 },
        { partNumber: null, description: "Labour", unitPrice: "0.10", quantity: 7 },
      ];
      const rec = await createRecommendation(t.db, sales, { combinationId: combo.id, customerName: "A. Customer", blowerPulleyDiameter: 0.08, parts: lines });
      // source: integer cents, 5997 + 1 + 70 = 6068.
      expect(rec.total).toBe("60.68");
      const back = await getRecommendation(t.db, sales, rec.id);
      expect(back.total).toBe("60.68");
      expect(back.parts.map((p) => p.lineTotal)).toEqual(["59.97", "0.01", "0.70"]);
      expect(priceLines(lines).total).toBe(back.total);
    });
  });
});
