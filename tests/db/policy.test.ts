// The role rules of db/policy.ts, every role × every rule, written out independently from
// design.md's "who may do what" (the product's own rules, no external source). The database and
// route tests (tests/integration) check that handlers ask these rules; this file pins the rules
// themselves so a flipped role or operator fails here in milliseconds.
import { describe, expect, it } from "vitest";
import { ForbiddenError } from "@/lib/errors";
import * as policy from "@/db/policy";
import type { Actor } from "@/db/policy";

type Role = Actor["role"];
const ALL: Role[] = ["member", "tuner", "sales", "instructor", "admin"];
const actor = (role: Role, id = `${role}-1`): Actor => ({ id, role, email: `${role}@example.com`, name: role });

/** Each rule with the roles it lets through; every other role must be refused. */
const RULES: [string, (a: Actor) => boolean, Role[]][] = [
  ["isShopStaff", policy.isShopStaff, ["tuner", "sales", "admin"]],
  ["canCreateForCustomer", policy.canCreateForCustomer, ["tuner", "sales", "admin"]],
  ["canEditShelf", policy.canEditShelf, ["admin"]],
  ["canSeeShelf", policy.canSeeShelf, ALL],
  ["canWriteRecommendations", policy.canWriteRecommendations, ["tuner", "sales", "admin"]],
  ["canAuthorLessons", policy.canAuthorLessons, ["instructor", "admin"]],
  ["canManageUsers", policy.canManageUsers, ["admin"]],
  // Orders (DEVELOPERS.md, "Orders"): staff follow them; refunds only admin and sales; terms only admin.
  ["canSeeOrders", policy.canSeeOrders, ["tuner", "sales", "admin"]],
  ["canRefundOrders", policy.canRefundOrders, ["sales", "admin"]],
  ["canEditShopTerms", policy.canEditShopTerms, ["admin"]],
];

describe("role rules", () => {
  it("lists every role once", () => {
    expect([...policy.ROLES].sort()).toEqual([...ALL].sort());
  });

  for (const [name, rule, allowed] of RULES) {
    for (const role of ALL) {
      const want = allowed.includes(role);
      it(`${name}: ${role} is ${want ? "allowed" : "refused"}`, () => {
        expect(rule(actor(role))).toBe(want);
      });
    }
  }
});

describe("owned rows", () => {
  for (const role of ALL) {
    const staff = role === "tuner" || role === "sales" || role === "admin";
    it(`${role} reads and writes their own row`, () => {
      const a = actor(role);
      expect(policy.canReadOwned(a, a.id)).toBe(true);
      expect(policy.canWriteOwned(a, a.id)).toBe(true);
    });
    it(`${role} ${staff ? "may" : "may not"} read or write another's row`, () => {
      const a = actor(role);
      expect(policy.canReadOwned(a, "someone-else")).toBe(staff);
      expect(policy.canReadOwned(a, "someone-else", {})).toBe(staff);
      expect(policy.canReadOwned(a, "someone-else", { isDemo: false })).toBe(staff);
      expect(policy.canWriteOwned(a, "someone-else")).toBe(staff);
    });
    it(`${role} ${staff || role === "instructor" ? "may" : "may not"} read the shop's demo rows`, () => {
      expect(policy.canReadOwned(actor(role), "shop", { isDemo: true })).toBe(staff || role === "instructor");
    });
    it(`${role} ${staff ? "sees" : "does not see"} the customer on another's combination, and always on their own`, () => {
      const a = actor(role);
      expect(policy.canSeeCustomer(a, a.id)).toBe(true);
      expect(policy.canSeeCustomer(a, "someone-else")).toBe(staff);
    });
    it(`${role} ${staff ? "may" : "may not"} change the shop's demo rows`, () => {
      expect(policy.canWriteOwned(actor(role), "shop")).toBe(staff);
    });
  }
});

describe("assert", () => {
  it("passes when allowed and throws ForbiddenError with the message when not", () => {
    expect(() => policy.assert(true, "no")).not.toThrow();
    expect(() => policy.assert(false, "Only admins may edit the shelf.")).toThrow(ForbiddenError);
    expect(() => policy.assert(false, "Only admins may edit the shelf.")).toThrow("Only admins may edit the shelf.");
    expect(() => policy.assert(false)).toThrow("You do not have permission to do that.");
  });
});
