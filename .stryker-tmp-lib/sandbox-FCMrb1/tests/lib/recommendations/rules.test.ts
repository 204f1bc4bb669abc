// @ts-nocheck
// A recommendation sheet's input rules without a database: parts lines, the sheet's fields with
// the messages that name them, and the list query.
import { describe, expect, it } from "vitest";
import { MAX_PART_LINES, defaultSheetTitle, partLineSchema, recommendationInputSchema, recommendationListQuerySchema, statusChangeSchema, updateRecommendationSchema } from "@/lib/recommendations/rules";

const ID = "00000000-0000-4000-8000-000000000001";
const line = { description: "Belt, 8-rib", unitPrice: "39.5", quantity: "2" };
const sheet = { combinationId: ID, customerName: "Pat Example", blowerPulleyDiameter: 0.08 };
const first = (r: { error?: { issues: { path: PropertyKey[]; message: string }[] } }) => r.error?.issues[0];

describe("a parts line", () => {
  it("a free line has no part number; a shelf line's part number is upper-cased; price to cents, quantity 1–999", () => {
    expect(partLineSchema.parse(line)).toEqual({ partNumber: null, description: "Belt, 8-rib", unitPrice: "39.50", quantity: 2 });
    expect(partLineSchema.parse({ ...line, partNumber: "" }).partNumber).toBeNull();
    expect(partLineSchema.parse({ ...line, partNumber: "pw-bp-1" }).partNumber).toBe("PW-BP-1");
    expect(partLineSchema.parse({ ...line, quantity: 999 }).quantity).toBe(999);
    for (const q of [0, 1000, 1.5, "", "two"]) expect(first(partLineSchema.safeParse({ ...line, quantity: q }))?.message, String(q)).toBe("Quantity must be a whole number from 1 to 999.");
    expect(first(partLineSchema.safeParse({ ...line, description: " " }))?.message).toBe("Describe the part, e.g. “Belt, 8-rib”.");
    expect(first(partLineSchema.safeParse({ ...line, unitPrice: "-3" }))?.path).toEqual(["unitPrice"]);
  });
});

describe("the sheet", () => {
  it("fills its defaults: no title, e-mail, notes, target speed or parts", () => {
    expect(recommendationInputSchema.parse(sheet)).toEqual({ ...sheet, title: "", customerEmail: null, vehicleNotes: "", notes: "", targetRpm: null, parts: [] });
    expect(defaultSheetTitle("Pat Example")).toBe("Blower pulley recommendation for Pat Example");
  });

  it("reads a revision, an e-mail (lower-cased) and a target speed, and names each bad field", () => {
    const r = recommendationInputSchema.parse({ ...sheet, revision: "3", customerEmail: "Pat@Example.COM", targetRpm: 5000 });
    expect([r.revision, r.customerEmail, r.targetRpm]).toEqual([3, "pat@example.com", 5000]);
    expect(recommendationInputSchema.parse({ ...sheet, targetRpm: "" }).targetRpm).toBeNull();
    expect(first(recommendationInputSchema.safeParse({ ...sheet, combinationId: "x" }))).toMatchObject({ path: ["combinationId"], message: "Choose a combination." });
    expect(first(recommendationInputSchema.safeParse({ ...sheet, revision: "0" }))?.message).toBe("Revision must be 1 or more.");
    expect(first(recommendationInputSchema.safeParse({ ...sheet, revision: "1.5" }))?.message).toBe("Revision must be a whole number.");
    expect(first(recommendationInputSchema.safeParse({ ...sheet, customerName: "" }))?.message).toBe("Give the customer's name.");
    expect(first(recommendationInputSchema.safeParse({ ...sheet, customerEmail: "pat" }))?.message).toBe("Customer e-mail must be an e-mail address like name@example.com.");
    expect(first(recommendationInputSchema.safeParse({ ...sheet, blowerPulleyDiameter: 0.6 }))?.path).toEqual(["blowerPulleyDiameter"]);
    expect(first(recommendationInputSchema.safeParse({ ...sheet, targetRpm: 50 }))?.path).toEqual(["targetRpm"]);
    expect(first(recommendationInputSchema.safeParse({ ...sheet, title: "two\nlines" }))?.message).toBe("Title must not contain control characters.");
  });

  it(`holds at most ${MAX_PART_LINES} part lines`, () => {
    expect(MAX_PART_LINES).toBe(40);
    expect(recommendationInputSchema.safeParse({ ...sheet, parts: Array(40).fill(line) }).success).toBe(true);
    expect(first(recommendationInputSchema.safeParse({ ...sheet, parts: Array(41).fill(line) }))?.message).toBe("A sheet may have at most 40 part lines.");
    expect(first(recommendationInputSchema.safeParse({ ...sheet, parts: "belt" }))?.message).toBe("Parts must be a list of lines.");
  });

  it("an update carries neither the combination nor the revision", () => {
    const u = updateRecommendationSchema.parse({ ...sheet, revision: 2 });
    expect("combinationId" in u || "revision" in u).toBe(false);
  });
});

describe("statuses and the list", () => {
  it("a person sets draft, accepted or declined; sent is the send's alone", () => {
    for (const s of ["draft", "accepted", "declined"]) expect(statusChangeSchema.safeParse({ status: s }).success).toBe(true);
    expect(statusChangeSchema.safeParse({ status: "sent" }).error?.issues[0].message).toBe("Status must be draft, accepted or declined.");
  });

  it("the list query pages 20 by default, at most 100", () => {
    expect(recommendationListQuerySchema.parse({})).toEqual({ page: 1, pageSize: 20 });
    expect(recommendationListQuerySchema.parse({ pageSize: "100", status: "sent" })).toMatchObject({ pageSize: 100, status: "sent" });
    expect(recommendationListQuerySchema.safeParse({ pageSize: "101" }).error?.issues[0].message).toBe("pageSize must be at most 100");
    expect(recommendationListQuerySchema.safeParse({ page: "0" }).error?.issues[0].message).toBe("page must be 1 or more");
    expect(recommendationListQuerySchema.safeParse({ status: "lost" }).error?.issues[0].message).toBe("status must be draft, sent, accepted or declined.");
  });
});
