// @ts-nocheck
// Who may do what: the one place for the role rules. Every server action and route handler
// resolves the signed-in actor on the server and asks these functions before touching a row.
function stryNS_9fa48() {
  var g = typeof globalThis === 'object' && globalThis && globalThis.Math === Math && globalThis || new Function("return this")();
  var ns = g.__stryker__ || (g.__stryker__ = {});
  if (ns.activeMutant === undefined && g.process && g.process.env && g.process.env.__STRYKER_ACTIVE_MUTANT__) {
    ns.activeMutant = g.process.env.__STRYKER_ACTIVE_MUTANT__;
  }
  function retrieveNS() {
    return ns;
  }
  stryNS_9fa48 = retrieveNS;
  return retrieveNS();
}
stryNS_9fa48();
function stryCov_9fa48() {
  var ns = stryNS_9fa48();
  var cov = ns.mutantCoverage || (ns.mutantCoverage = {
    static: {},
    perTest: {}
  });
  function cover() {
    var c = cov.static;
    if (ns.currentTestId) {
      c = cov.perTest[ns.currentTestId] = cov.perTest[ns.currentTestId] || {};
    }
    var a = arguments;
    for (var i = 0; i < a.length; i++) {
      c[a[i]] = (c[a[i]] || 0) + 1;
    }
  }
  stryCov_9fa48 = cover;
  cover.apply(null, arguments);
}
function stryMutAct_9fa48(id) {
  var ns = stryNS_9fa48();
  function isActive(id) {
    if (ns.activeMutant === id) {
      if (ns.hitCount !== void 0 && ++ns.hitCount > ns.hitLimit) {
        throw new Error('Stryker: Hit count limit reached (' + ns.hitCount + ')');
      }
      return true;
    }
    return false;
  }
  stryMutAct_9fa48 = isActive;
  return isActive(id);
}
import type { Role } from "./schema";
import { ForbiddenError } from "@/lib/errors";
export type Actor = {
  id: string;
  role: Role;
  email: string;
  name: string;
};
export const ROLES: readonly Role[] = stryMutAct_9fa48("0") ? [] : (stryCov_9fa48("0"), [stryMutAct_9fa48("1") ? "" : (stryCov_9fa48("1"), "member"), stryMutAct_9fa48("2") ? "" : (stryCov_9fa48("2"), "tuner"), stryMutAct_9fa48("3") ? "" : (stryCov_9fa48("3"), "sales"), stryMutAct_9fa48("4") ? "" : (stryCov_9fa48("4"), "instructor"), stryMutAct_9fa48("5") ? "" : (stryCov_9fa48("5"), "admin")]);

/** Staff see and work on the shop's combinations (their customers'); members see only their own. */
export const isShopStaff = stryMutAct_9fa48("6") ? () => undefined : (stryCov_9fa48("6"), (() => {
  const isShopStaff = (a: Actor) => stryMutAct_9fa48("9") ? (a.role === "tuner" || a.role === "sales") && a.role === "admin" : stryMutAct_9fa48("8") ? false : stryMutAct_9fa48("7") ? true : (stryCov_9fa48("7", "8", "9"), (stryMutAct_9fa48("11") ? a.role === "tuner" && a.role === "sales" : stryMutAct_9fa48("10") ? false : (stryCov_9fa48("10", "11"), (stryMutAct_9fa48("13") ? a.role !== "tuner" : stryMutAct_9fa48("12") ? false : (stryCov_9fa48("12", "13"), a.role === (stryMutAct_9fa48("14") ? "" : (stryCov_9fa48("14"), "tuner")))) || (stryMutAct_9fa48("16") ? a.role !== "sales" : stryMutAct_9fa48("15") ? false : (stryCov_9fa48("15", "16"), a.role === (stryMutAct_9fa48("17") ? "" : (stryCov_9fa48("17"), "sales")))))) || (stryMutAct_9fa48("19") ? a.role !== "admin" : stryMutAct_9fa48("18") ? false : (stryCov_9fa48("18", "19"), a.role === (stryMutAct_9fa48("20") ? "" : (stryCov_9fa48("20"), "admin")))));
  return isShopStaff;
})());

/** May read a row owned by `ownerId`? `isDemo` rows are the shop's examples, readable by staff and instructors. */
export function canReadOwned(actor: Actor, ownerId: string, opts: {
  isDemo?: boolean;
} = {}): boolean {
  if (stryMutAct_9fa48("21")) {
    {}
  } else {
    stryCov_9fa48("21");
    if (stryMutAct_9fa48("24") ? actor.id !== ownerId : stryMutAct_9fa48("23") ? false : stryMutAct_9fa48("22") ? true : (stryCov_9fa48("22", "23", "24"), actor.id === ownerId)) return stryMutAct_9fa48("25") ? false : (stryCov_9fa48("25"), true);
    if (stryMutAct_9fa48("27") ? false : stryMutAct_9fa48("26") ? true : (stryCov_9fa48("26", "27"), isShopStaff(actor))) return stryMutAct_9fa48("28") ? false : (stryCov_9fa48("28"), true);
    if (stryMutAct_9fa48("31") ? opts.isDemo || actor.role === "instructor" : stryMutAct_9fa48("30") ? false : stryMutAct_9fa48("29") ? true : (stryCov_9fa48("29", "30", "31"), opts.isDemo && (stryMutAct_9fa48("33") ? actor.role !== "instructor" : stryMutAct_9fa48("32") ? true : (stryCov_9fa48("32", "33"), actor.role === (stryMutAct_9fa48("34") ? "" : (stryCov_9fa48("34"), "instructor")))))) return stryMutAct_9fa48("35") ? false : (stryCov_9fa48("35"), true);
    return stryMutAct_9fa48("36") ? true : (stryCov_9fa48("36"), false);
  }
}

/** May change a row owned by `ownerId`? Staff may change the shop's rows; nobody else's but their own. */
export function canWriteOwned(actor: Actor, ownerId: string): boolean {
  if (stryMutAct_9fa48("37")) {
    {}
  } else {
    stryCov_9fa48("37");
    return stryMutAct_9fa48("40") ? actor.id === ownerId && isShopStaff(actor) : stryMutAct_9fa48("39") ? false : stryMutAct_9fa48("38") ? true : (stryCov_9fa48("38", "39", "40"), (stryMutAct_9fa48("42") ? actor.id !== ownerId : stryMutAct_9fa48("41") ? false : (stryCov_9fa48("41", "42"), actor.id === ownerId)) || isShopStaff(actor));
  }
}
export const canCreateForCustomer = isShopStaff;
/** Customer names and contacts on a combination: for the shop's staff and the row's owner only (not instructors). */
export const canSeeCustomer = stryMutAct_9fa48("43") ? () => undefined : (stryCov_9fa48("43"), (() => {
  const canSeeCustomer = (a: Actor, ownerId: string) => stryMutAct_9fa48("46") ? a.id === ownerId && isShopStaff(a) : stryMutAct_9fa48("45") ? false : stryMutAct_9fa48("44") ? true : (stryCov_9fa48("44", "45", "46"), (stryMutAct_9fa48("48") ? a.id !== ownerId : stryMutAct_9fa48("47") ? false : (stryCov_9fa48("47", "48"), a.id === ownerId)) || isShopStaff(a));
  return canSeeCustomer;
})());
export const canEditShelf = stryMutAct_9fa48("49") ? () => undefined : (stryCov_9fa48("49"), (() => {
  const canEditShelf = (a: Actor) => stryMutAct_9fa48("52") ? a.role !== "admin" : stryMutAct_9fa48("51") ? false : stryMutAct_9fa48("50") ? true : (stryCov_9fa48("50", "51", "52"), a.role === (stryMutAct_9fa48("53") ? "" : (stryCov_9fa48("53"), "admin")));
  return canEditShelf;
})());
export const canSeeShelf = stryMutAct_9fa48("54") ? () => undefined : (stryCov_9fa48("54"), (() => {
  const canSeeShelf = (_a: Actor) => stryMutAct_9fa48("55") ? false : (stryCov_9fa48("55"), true);
  return canSeeShelf;
})());
export const canWriteRecommendations = stryMutAct_9fa48("56") ? () => undefined : (stryCov_9fa48("56"), (() => {
  const canWriteRecommendations = (a: Actor) => stryMutAct_9fa48("59") ? (a.role === "sales" || a.role === "tuner") && a.role === "admin" : stryMutAct_9fa48("58") ? false : stryMutAct_9fa48("57") ? true : (stryCov_9fa48("57", "58", "59"), (stryMutAct_9fa48("61") ? a.role === "sales" && a.role === "tuner" : stryMutAct_9fa48("60") ? false : (stryCov_9fa48("60", "61"), (stryMutAct_9fa48("63") ? a.role !== "sales" : stryMutAct_9fa48("62") ? false : (stryCov_9fa48("62", "63"), a.role === (stryMutAct_9fa48("64") ? "" : (stryCov_9fa48("64"), "sales")))) || (stryMutAct_9fa48("66") ? a.role !== "tuner" : stryMutAct_9fa48("65") ? false : (stryCov_9fa48("65", "66"), a.role === (stryMutAct_9fa48("67") ? "" : (stryCov_9fa48("67"), "tuner")))))) || (stryMutAct_9fa48("69") ? a.role !== "admin" : stryMutAct_9fa48("68") ? false : (stryCov_9fa48("68", "69"), a.role === (stryMutAct_9fa48("70") ? "" : (stryCov_9fa48("70"), "admin")))));
  return canWriteRecommendations;
})());
export const canAuthorLessons = stryMutAct_9fa48("71") ? () => undefined : (stryCov_9fa48("71"), (() => {
  const canAuthorLessons = (a: Actor) => stryMutAct_9fa48("74") ? a.role === "instructor" && a.role === "admin" : stryMutAct_9fa48("73") ? false : stryMutAct_9fa48("72") ? true : (stryCov_9fa48("72", "73", "74"), (stryMutAct_9fa48("76") ? a.role !== "instructor" : stryMutAct_9fa48("75") ? false : (stryCov_9fa48("75", "76"), a.role === (stryMutAct_9fa48("77") ? "" : (stryCov_9fa48("77"), "instructor")))) || (stryMutAct_9fa48("79") ? a.role !== "admin" : stryMutAct_9fa48("78") ? false : (stryCov_9fa48("78", "79"), a.role === (stryMutAct_9fa48("80") ? "" : (stryCov_9fa48("80"), "admin")))));
  return canAuthorLessons;
})());
export const canManageUsers = stryMutAct_9fa48("81") ? () => undefined : (stryCov_9fa48("81"), (() => {
  const canManageUsers = (a: Actor) => stryMutAct_9fa48("84") ? a.role !== "admin" : stryMutAct_9fa48("83") ? false : stryMutAct_9fa48("82") ? true : (stryCov_9fa48("82", "83", "84"), a.role === (stryMutAct_9fa48("85") ? "" : (stryCov_9fa48("85"), "admin")));
  return canManageUsers;
})());
export function assert(allowed: boolean, message?: string): asserts allowed {
  if (stryMutAct_9fa48("86")) {
    {}
  } else {
    stryCov_9fa48("86");
    if (stryMutAct_9fa48("89") ? false : stryMutAct_9fa48("88") ? true : stryMutAct_9fa48("87") ? allowed : (stryCov_9fa48("87", "88", "89"), !allowed)) throw new ForbiddenError(message);
  }
}

/** Orders: the shop's staff follow them; refunds (money back) only the admin and sales. */
export const canSeeOrders = isShopStaff;
export const canRefundOrders = stryMutAct_9fa48("90") ? () => undefined : (stryCov_9fa48("90"), (() => {
  const canRefundOrders = (a: Actor) => stryMutAct_9fa48("93") ? a.role === "admin" && a.role === "sales" : stryMutAct_9fa48("92") ? false : stryMutAct_9fa48("91") ? true : (stryCov_9fa48("91", "92", "93"), (stryMutAct_9fa48("95") ? a.role !== "admin" : stryMutAct_9fa48("94") ? false : (stryCov_9fa48("94", "95"), a.role === (stryMutAct_9fa48("96") ? "" : (stryCov_9fa48("96"), "admin")))) || (stryMutAct_9fa48("98") ? a.role !== "sales" : stryMutAct_9fa48("97") ? false : (stryCov_9fa48("97", "98"), a.role === (stryMutAct_9fa48("99") ? "" : (stryCov_9fa48("99"), "sales")))));
  return canRefundOrders;
})());
export const canEditShopTerms = stryMutAct_9fa48("100") ? () => undefined : (stryCov_9fa48("100"), (() => {
  const canEditShopTerms = (a: Actor) => stryMutAct_9fa48("103") ? a.role !== "admin" : stryMutAct_9fa48("102") ? false : stryMutAct_9fa48("101") ? true : (stryCov_9fa48("101", "102", "103"), a.role === (stryMutAct_9fa48("104") ? "" : (stryCov_9fa48("104"), "admin")));
  return canEditShopTerms;
})());