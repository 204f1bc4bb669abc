// @ts-nocheck
// The demo order is made through the order rules themselves, and seeding again adds nothing.
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { seedDemo } from "@/db/seed";
import { demoPartNumber } from "@/db/seed/shelf";
import { orderEvents, orderReservations, orders, pulleys, recommendations } from "@/db/schema";
import { freshDatabase, type TestDb } from "../support/db";

describe("the demo order", () => {
  let t: TestDb;
  beforeAll(async () => {
    t = await freshDatabase();
  });
  afterAll(async () => {
    await t?.drop();
  });

  it("is a paid order whose pulley came off the shelf; a second seed changes nothing", async () => {
    await seedDemo(t.db);
    const part = demoPartNumber("blower", 4.0, 8);
    const [{ stock: after }] = await t.db.select({ stock: pulleys.stock }).from(pulleys).where(eq(pulleys.partNumber, part));
    await seedDemo(t.db);
    const all = await t.db.select().from(orders);
    expect(all).toHaveLength(1);
    const [o] = all;
    expect(["parts-reserved", "back-ordered"]).toContain(o.status);
    expect(o.paidAt).not.toBeNull();
    const [r] = await t.db.select().from(orderReservations).where(eq(orderReservations.orderId, o.id));
    expect(r).toMatchObject({ partNumber: part, quantity: 1 });
    expect(r.reserved + r.backOrdered).toBe(1);
    expect((await t.db.select({ stock: pulleys.stock }).from(pulleys).where(eq(pulleys.partNumber, part)))[0].stock).toBe(after);
    const [rec] = await t.db.select().from(recommendations).where(eq(recommendations.id, o.recommendationId));
    expect(rec.status).toBe("accepted");
    expect((await t.db.select().from(orderEvents).where(eq(orderEvents.orderId, o.id))).map((e) => e.kind)).toEqual(["checkout", "paid", o.status]);
  });
});
