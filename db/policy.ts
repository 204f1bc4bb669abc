// Who may do what: the one place for the role rules. Every server action and route handler
// resolves the signed-in actor on the server and asks these functions before touching a row.
import type { Role } from "./schema";
import { ForbiddenError } from "@/lib/errors";

export type Actor = { id: string; role: Role; email: string; name: string };

export const ROLES: readonly Role[] = ["member", "tuner", "sales", "instructor", "admin"];

/** Staff see and work on the shop's combinations (their customers'); members see only their own. */
export const isShopStaff = (a: Actor) => a.role === "tuner" || a.role === "sales" || a.role === "admin";

/** May read a row owned by `ownerId`? `isDemo` rows are the shop's examples, readable by staff and instructors. */
export function canReadOwned(actor: Actor, ownerId: string, opts: { isDemo?: boolean } = {}): boolean {
  if (actor.id === ownerId) return true;
  if (isShopStaff(actor)) return true;
  if (opts.isDemo && actor.role === "instructor") return true;
  return false;
}

/** May change a row owned by `ownerId`? Staff may change the shop's rows; nobody else's but their own. */
export function canWriteOwned(actor: Actor, ownerId: string): boolean {
  return actor.id === ownerId || isShopStaff(actor);
}

export const canCreateForCustomer = isShopStaff;
/** Customer names and contacts on a combination: for the shop's staff and the row's owner only (not instructors). */
export const canSeeCustomer = (a: Actor, ownerId: string) => a.id === ownerId || isShopStaff(a);
export const canEditShelf = (a: Actor) => a.role === "admin";
export const canSeeShelf = (_a: Actor) => true;
export const canWriteRecommendations = (a: Actor) => a.role === "sales" || a.role === "tuner" || a.role === "admin";
export const canAuthorLessons = (a: Actor) => a.role === "instructor" || a.role === "admin";
export const canManageUsers = (a: Actor) => a.role === "admin";

export function assert(allowed: boolean, message?: string): asserts allowed {
  if (!allowed) throw new ForbiddenError(message);
}

/** Orders: the shop's staff follow them; refunds (money back) only the admin and sales. */
export const canSeeOrders = isShopStaff;
export const canRefundOrders = (a: Actor) => a.role === "admin" || a.role === "sales";
export const canEditShopTerms = (a: Actor) => a.role === "admin";
