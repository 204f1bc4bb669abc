// The e-mails a paid deposit sends and the order list's rules, without a database.
import { describe, expect, it } from "vitest";
import { customerReceipt, shopNotice } from "@/lib/orders/receipt";
import { ORDER_STATUSES, allocate, canCancel, canMarkFitted, isPaidOpen, markFittedSchema, orderListQuerySchema } from "@/lib/orders/status";

const order = { id: "ord-1", customerName: "Pat Example", currency: "USD", deposit: "45.13", total: "1180.5", status: "back-ordered" as const, paymentIntentId: "pi_1" };
const held = [
  { partNumber: "PW-BP-1", description: "Blower pulley", quantity: 1, reserved: 1, backOrdered: 0 },
  { partNumber: "PW-BT-2", description: "Belt", quantity: 2, reserved: 0, backOrdered: 2 },
  { partNumber: "PW-ID-3", description: "Idler", quantity: 3, reserved: 1, backOrdered: 2 },
];

describe("deposit e-mails", () => {
  it("the receipt states the deposit and total in the shop's currency and each part's state", () => {
    const m = customerReceipt({ order, title: "Truck pulley", reservations: held, shopName: "Demo Shop" });
    expect(m.subject).toBe("Deposit received: Truck pulley");
    expect(m.text).toContain('we received your deposit of $45.13 for "Truck pulley".');
    expect(m.text).toContain("The quoted total is $1,180.50;");
    expect(m.text).toContain("  1 × Blower pulley (PW-BP-1): reserved for you");
    expect(m.text).toContain("  2 × Belt (PW-BT-2): ordered in for you");
    expect(m.text).toContain("  3 × Idler (PW-ID-3): 1 reserved, 2 ordered in");
    expect(m.text).toContain("Payment reference: pi_1");
    expect(m.text).toBe(
      [
        "Hello Pat Example,",
        "",
        'thank you: we received your deposit of $45.13 for "Truck pulley".',
        "The quoted total is $1,180.50; the rest is due when the work is done.",
        "",
        "Your parts:",
        "  1 × Blower pulley (PW-BP-1): reserved for you",
        "  2 × Belt (PW-BT-2): ordered in for you",
        "  3 × Idler (PW-ID-3): 1 reserved, 2 ordered in",
        "",
        "Payment reference: pi_1",
        "Order: ord-1",
        "",
        "We will be in touch to book the fitting and the dyno session.",
        "",
        "Demo Shop",
      ].join("\n"),
    );
    const bare = customerReceipt({ order: { ...order, paymentIntentId: null }, title: "T", reservations: [], shopName: "S" });
    expect(bare.text).toBe(
      [
        "Hello Pat Example,",
        "",
        'thank you: we received your deposit of $45.13 for "T".',
        "The quoted total is $1,180.50; the rest is due when the work is done.",
        "",
        "Payment reference: –",
        "Order: ord-1",
        "",
        "We will be in touch to book the fitting and the dyno session.",
        "",
        "S",
      ].join("\n"),
    );
  });

  it("the shop's notice lists what to order in and says so in its subject", () => {
    const m = shopNotice({ order, title: "Truck pulley", reservations: held, orderUrl: "https://shop.example/orders/ord-1" });
    expect(m.subject).toBe("Back-order needed: Pat Example");
    expect(m.text).toContain("Status: Back-ordered.");
    expect(m.text).toContain("To order in: 2 × PW-BT-2, 2 × PW-ID-3.");
    expect(m.text).toBe(
      [
        'Pat Example paid a deposit of $45.13 (total $1,180.50) for "Truck pulley".',
        "Status: Back-ordered.",
        "",
        "Parts:",
        "  1 × Blower pulley (PW-BP-1): reserved for you",
        "  2 × Belt (PW-BT-2): ordered in for you",
        "  3 × Idler (PW-ID-3): 1 reserved, 2 ordered in",
        "",
        "To order in: 2 × PW-BT-2, 2 × PW-ID-3.",
        "",
        "Open the order: https://shop.example/orders/ord-1",
      ].join("\n"),
    );
    const covered = shopNotice({ order: { ...order, status: "parts-reserved" }, title: "T", reservations: held.slice(0, 1), orderUrl: "u" });
    expect(covered.subject).toBe("Deposit paid: Pat Example");
    expect(covered.text).not.toContain("To order in");
    expect(shopNotice({ order, title: "T", reservations: [], orderUrl: "u" }).text).toBe('Pat Example paid a deposit of $45.13 (total $1,180.50) for "T".\nStatus: Back-ordered.\n\nOpen the order: u');
  });
});

describe("order states", () => {
  it("paid and open: paid, parts reserved, back-ordered; an unpaid order may be cancelled but not fitted", () => {
    expect(ORDER_STATUSES.filter(isPaidOpen)).toEqual(["paid", "parts-reserved", "back-ordered"]);
    expect(ORDER_STATUSES.filter(canMarkFitted)).toEqual(["paid", "parts-reserved", "back-ordered"]);
    expect(ORDER_STATUSES.filter(canCancel)).toEqual(["awaiting-payment", "paid", "parts-reserved", "back-ordered"]);
    expect(allocate(3, -2)).toEqual({ reserved: 0, backOrdered: 3 });
  });

  it("the list and the fitted mark name their parameter", () => {
    expect(orderListQuerySchema.parse({})).toEqual({ page: 1, pageSize: 20 });
    expect(orderListQuerySchema.safeParse({ status: "lost" }).error?.issues[0].message).toBe(`status must be one of ${ORDER_STATUSES.join(", ")}.`);
    expect(orderListQuerySchema.safeParse({ pageSize: 101 }).error?.issues[0].message).toBe("pageSize must be at most 100");
    expect(orderListQuerySchema.safeParse({ page: 0 }).error?.issues[0].message).toBe("page must be 1 or more");
    expect(markFittedSchema.parse({ datalogId: "" })).toEqual({ datalogId: null });
    expect(markFittedSchema.safeParse({ datalogId: "x" }).error?.issues[0].message).toBe("datalogId must be the id of a datalog.");
  });
});
