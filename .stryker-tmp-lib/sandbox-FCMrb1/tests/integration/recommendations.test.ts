// @ts-nocheck
// Recommendation sheets against a real database: who may read and write them, the spec frozen
// at the revision it was made from, shelf prices, statuses, and the e-mail's escaping.
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { exampleCombination, type Combination } from "@/calc";
import { buildSheetEmail } from "@/app/_lib/recommendation-email";
import { computeSheet } from "@/lib/recommendations/sheet-data";
import { ConflictError, FieldError, ForbiddenError } from "@/lib/errors";
import { createCombination, saveCombination } from "@/db/repo/combinations";
import {
  createRecommendation,
  getRecommendation,
  listRecommendations,
  markRecommendationSent,
  recordSendFailure,
  setRecommendationStatus,
  updateRecommendation,
} from "@/db/repo/recommendations";
import { recommendations } from "@/db/schema";
import { seedShelf } from "@/db/seed/shelf";
import { freshDatabase, makeUser, type TestDb } from "../support/db";

describe("recommendation sheets", () => {
  let t: TestDb;
  let sales: Awaited<ReturnType<typeof makeUser>>;
  let tuner: Awaited<ReturnType<typeof makeUser>>;
  let member: Awaited<ReturnType<typeof makeUser>>;
  let instructor: Awaited<ReturnType<typeof makeUser>>;
  let comboId: string;
  const spec = exampleCombination();

  beforeAll(async () => {
    t = await freshDatabase();
    await seedShelf(t.db);
    [sales, tuner, member, instructor] = await Promise.all([makeUser(t.db, "sales"), makeUser(t.db, "tuner"), makeUser(t.db, "member"), makeUser(t.db, "instructor")]);
    comboId = (await createCombination(t.db, tuner, { name: "Customer engine", spec, customerName: "Pat Example" })).id;
  });
  afterAll(async () => {
    await t?.drop();
  });

  const input = (over: Record<string, unknown> = {}) => ({
    combinationId: comboId,
    customerName: "Pat Example",
    customerEmail: "pat@example.com",
    blowerPulleyDiameter: 3.1 * 0.0254,
    parts: [
      { partNumber: "PW-BP-0310-8", description: "ignored: the shelf names it", unitPrice: "0.01", quantity: 1 },
      { partNumber: null, description: "Belt, 8-rib", unitPrice: "38.50", quantity: 1 },
    ],
    ...over,
  });

  it("sales makes a sheet: spec copied with the chosen pulley, revision kept, shelf price and description used", async () => {
    const rec = await createRecommendation(t.db, sales, input());
    expect(rec.status).toBe("draft");
    expect(rec.revision).toBe(1);
    expect(rec.spec.drive.blowerPulleyDiameter).toBeCloseTo(3.1 * 0.0254, 12);
    expect(rec.spec.engine).toEqual(spec.engine);
    const shelfLine = rec.parts[0];
    expect(shelfLine.description).toMatch(/^Blower pulley 3\.10 in/);
    expect(shelfLine.unitPrice).not.toBe("0.01");
    // Reference in integer cents: the shelf line plus 38.50.
    const [w, f] = shelfLine.unitPrice.split(".");
    const totalCents = Number(w) * 100 + Number(f) + 3850;
    expect(rec.total).toBe(`${Math.floor(totalCents / 100)}.${String(totalCents % 100).padStart(2, "0")}`);
  });

  it("a later save of the combination does not change a sheet already made", async () => {
    const rec = await createRecommendation(t.db, sales, input());
    const changed: Combination = { ...spec, engine: { ...spec.engine, displacement: 0.0062 } };
    await saveCombination(t.db, tuner, comboId, { spec: changed, baseRevision: 1, note: "bigger engine" });
    const again = await getRecommendation(t.db, sales, rec.id);
    expect(again.spec.engine.displacement).toBe(spec.engine.displacement);
    expect(again.revision).toBe(1);
    const fresh = await createRecommendation(t.db, sales, input());
    expect(fresh.revision).toBe(2);
    expect(fresh.spec.engine.displacement).toBe(0.0062);
  });

  it("members and instructors can neither read, list nor write sheets", async () => {
    const rec = await createRecommendation(t.db, tuner, input());
    for (const who of [member, instructor]) {
      await expect(getRecommendation(t.db, who, rec.id)).rejects.toBeInstanceOf(ForbiddenError);
      await expect(listRecommendations(t.db, who)).rejects.toBeInstanceOf(ForbiddenError);
      await expect(createRecommendation(t.db, who, input())).rejects.toBeInstanceOf(ForbiddenError);
      await expect(setRecommendationStatus(t.db, who, rec.id, { status: "draft" })).rejects.toBeInstanceOf(ForbiddenError);
    }
    // Shop staff share the shop's sheets.
    expect((await getRecommendation(t.db, sales, rec.id)).id).toBe(rec.id);
    const list = await listRecommendations(t.db, sales, { search: "pat" });
    expect(list.rows.some((r) => r.id === rec.id)).toBe(true);
  });

  it("a member's own combination is not the shop's to quote from unless staff may see it; an unknown one names the field", async () => {
    await expect(createRecommendation(t.db, sales, input({ combinationId: "00000000-0000-4000-8000-000000000000" }))).rejects.toMatchObject({ field: "combinationId" });
    await expect(createRecommendation(t.db, sales, input({ parts: [{ partNumber: "PW-NOPE-1", description: "x", unitPrice: "1", quantity: 1 }] }))).rejects.toBeInstanceOf(FieldError);
    const bad = await createRecommendation(t.db, sales, input({ customerEmail: "not-an-address" })).catch((e) => e);
    expect(bad.issues?.[0]?.path).toEqual(["customerEmail"]);
    const qty = await createRecommendation(t.db, sales, input({ parts: [{ description: "Belt", unitPrice: "1.00", quantity: 0 }] })).catch((e) => e);
    expect(qty.issues?.[0]?.path).toEqual(["parts", 0, "quantity"]);
  });

  it("statuses: draft → sent by sending; accepted/declined only after; a sent sheet is frozen until set back to draft", async () => {
    const rec = await createRecommendation(t.db, sales, input());
    await expect(setRecommendationStatus(t.db, sales, rec.id, { status: "accepted" })).rejects.toBeInstanceOf(ConflictError);
    await recordSendFailure(t.db, sales, rec.id, "SMTP said no");
    let row = await getRecommendation(t.db, sales, rec.id);
    expect(row.status).toBe("draft");
    expect(row.lastError).toBe("SMTP said no");
    expect(row.sentAt).toBeNull();
    await markRecommendationSent(t.db, sales, rec.id);
    row = await getRecommendation(t.db, sales, rec.id);
    expect(row.status).toBe("sent");
    expect(row.sentAt).toBeInstanceOf(Date);
    expect(row.lastError).toBeNull();
    await expect(updateRecommendation(t.db, sales, rec.id, { ...input(), customerName: "Changed" })).rejects.toBeInstanceOf(ConflictError);
    expect((await setRecommendationStatus(t.db, sales, rec.id, { status: "accepted" })).status).toBe("accepted");
    await setRecommendationStatus(t.db, sales, rec.id, { status: "draft" });
    const edited = await updateRecommendation(t.db, sales, rec.id, { ...input(), customerName: "Changed", blowerPulleyDiameter: 0.09 });
    expect(edited.customerName).toBe("Changed");
    expect(edited.spec.drive.blowerPulleyDiameter).toBe(0.09);
    const [raw] = await t.db.select().from(recommendations).where(eq(recommendations.id, rec.id));
    expect(raw.blowerPulleyDiameter).toBe(0.09);
  });

  it("the sheet's key figures follow the trade's rule: a smaller blower pulley gives more boost at redline", async () => {
    const small = computeSheet({ ...spec, drive: { ...spec.drive, blowerPulleyDiameter: 0.075 } }).figures;
    const large = computeSheet({ ...spec, drive: { ...spec.drive, blowerPulleyDiameter: 0.09 } }).figures;
    // Common practice, no published source: smaller blower pulley → faster blower → more boost.
    expect(small.atRedline!.boostGauge).toBeGreaterThan(large.atRedline!.boostGauge);
    // Drive ratio is crank over blower pulley diameter (common practice, no published source).
    expect(small.driveRatio).toBeCloseTo(spec.drive.crankPulleyDiameter / 0.075, 12);
    expect(small.blowerRpmAtRedline).toBeCloseTo(spec.engine.redlineRpm * (spec.drive.crankPulleyDiameter / 0.075) * (1 - spec.drive.beltSlip), 6);
  });

  it("the e-mail escapes everything a person typed in its HTML and carries the link in both bodies", async () => {
    const rec = await createRecommendation(t.db, sales, input({ customerName: `<img src=x onerror="alert(1)">`, notes: "Fits & runs <b>well</b>" }));
    const link = "https://shop.example/share/abc.123.def";
    const mail = buildSheetEmail({ sheet: rec, shop: { name: "Shop & Co <demo>", address: "", phone: "", email: "", website: "" }, currency: "USD", unitSystem: "imperial", link, expiresAt: new Date("2030-05-01T00:00:00Z") });
    expect(mail.html).not.toContain("<img");
    expect(mail.html).toContain("&lt;img src=x onerror=&quot;alert(1)&quot;&gt;");
    expect(mail.html).toContain("Fits &amp; runs &lt;b&gt;well&lt;/b&gt;");
    expect(mail.html).toContain("Shop &amp; Co &lt;demo&gt;");
    expect(mail.text).toContain(link);
    expect(mail.html).toContain(`href="${link}"`);
    expect(mail.text).toContain("Predictions are estimates");
  });

  it("the headline boost is the one at the speed that was sold, not the redline figure", () => {
    const f = computeSheet(spec, 4000).figures;
    const pointAt4000 = computeSheet(spec).points.find((p) => p.rpm === 4000)!;
    expect(f.headline).toEqual({ rpm: 4000, boostGauge: pointAt4000.boostGauge, netPower: pointAt4000.netPower, sold: true, withinRange: pointAt4000.withinRange, rangeReasons: pointAt4000.rangeReasons });
    // Common practice, no published source: a Roots blower's boost rises with engine speed, so
    // the sold figure below redline is the smaller one.
    expect(f.headline!.boostGauge).toBeLessThan(f.atRedline!.boostGauge);
    expect(computeSheet(spec).figures.headline).toMatchObject({ rpm: spec.engine.redlineRpm, sold: false });
  });

  it("a new customer's sheet carries its own title; the combination's internal name reaches neither e-mail nor sheet", async () => {
    const internal = (await createCombination(t.db, tuner, { name: "Smith small-block (internal)", spec, customerName: "Smith" })).id;
    const rec = await createRecommendation(t.db, sales, { ...input({ customerName: "Alex New" }), combinationId: internal, title: "Street pulley for the red coupe", targetRpm: 4500 });
    expect(rec.title).toBe("Street pulley for the red coupe");
    const mail = buildSheetEmail({ sheet: rec, shop: { name: "Shop", address: "", phone: "", email: "", website: "" }, currency: "EUR", unitSystem: "metric", link: "https://x.example/s", expiresAt: new Date("2030-01-01T00:00:00Z") });
    expect(mail.text).not.toContain("Smith");
    expect(mail.html).not.toContain("Smith");
    expect(mail.subject).toContain("Street pulley for the red coupe");
    expect(mail.text).toMatch(/Predicted boost: [\d.]+ kPa at 4500 rpm\n/);
    expect(mail.text).toContain("Total: €");
    await expect(createRecommendation(t.db, sales, { ...input(), targetRpm: spec.engine.redlineRpm + 500 })).rejects.toMatchObject({ field: "targetRpm" });
  });

  it("a sheet can be made from an older revision of the combination, whose spec it then keeps", async () => {
    const id = (await createCombination(t.db, tuner, { name: "Revised engine", spec })).id;
    await saveCombination(t.db, tuner, id, { spec: { ...spec, engine: { ...spec.engine, redlineRpm: spec.engine.redlineRpm + 500 } }, baseRevision: 1 });
    const old = await createRecommendation(t.db, sales, { ...input(), combinationId: id, revision: 1 });
    expect(old.revision).toBe(1);
    expect(old.spec.engine.redlineRpm).toBe(spec.engine.redlineRpm);
    const newest = await createRecommendation(t.db, sales, { ...input(), combinationId: id });
    expect(newest.revision).toBe(2);
    await expect(createRecommendation(t.db, sales, { ...input(), combinationId: id, revision: 7 })).rejects.toMatchObject({ field: "revision" });
  });
});
