// @ts-nocheck
// Where an order stands, and which moves a person may make from there.
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
import { z } from "zod";
import { plainText } from "@/lib/validation/text";
export const ORDER_STATUSES = ["awaiting-payment", "paid", "parts-reserved", "back-ordered", "fitted", "cancelled", "refunded"] as const;
export type OrderStatus = (typeof ORDER_STATUSES)[number];
export const ORDER_STATUS_LABELS: Record<OrderStatus, string> = stryMutAct_9fa48("3201") ? {} : (stryCov_9fa48("3201"), {
  "awaiting-payment": stryMutAct_9fa48("3202") ? "" : (stryCov_9fa48("3202"), "Awaiting payment"),
  paid: stryMutAct_9fa48("3203") ? "" : (stryCov_9fa48("3203"), "Paid"),
  "parts-reserved": stryMutAct_9fa48("3204") ? "" : (stryCov_9fa48("3204"), "Parts reserved"),
  "back-ordered": stryMutAct_9fa48("3205") ? "" : (stryCov_9fa48("3205"), "Back-ordered"),
  fitted: stryMutAct_9fa48("3206") ? "" : (stryCov_9fa48("3206"), "Fitted"),
  cancelled: stryMutAct_9fa48("3207") ? "" : (stryCov_9fa48("3207"), "Cancelled"),
  refunded: stryMutAct_9fa48("3208") ? "" : (stryCov_9fa48("3208"), "Refunded")
});

/** Paid and not yet fitted, cancelled or refunded: the parts are (or will be) held for it. */
const PAID_OPEN: readonly OrderStatus[] = stryMutAct_9fa48("3209") ? [] : (stryCov_9fa48("3209"), [stryMutAct_9fa48("3210") ? "" : (stryCov_9fa48("3210"), "paid"), stryMutAct_9fa48("3211") ? "" : (stryCov_9fa48("3211"), "parts-reserved"), stryMutAct_9fa48("3212") ? "" : (stryCov_9fa48("3212"), "back-ordered")]);
export const isPaidOpen = stryMutAct_9fa48("3213") ? () => undefined : (stryCov_9fa48("3213"), (() => {
  const isPaidOpen = (s: OrderStatus) => PAID_OPEN.includes(s);
  return isPaidOpen;
})());
export const canMarkFitted = stryMutAct_9fa48("3214") ? () => undefined : (stryCov_9fa48("3214"), (() => {
  const canMarkFitted = (s: OrderStatus) => PAID_OPEN.includes(s);
  return canMarkFitted;
})());
/** Cancelling an unpaid order just closes it; a paid one is refunded and its parts released. */
export const canCancel = stryMutAct_9fa48("3215") ? () => undefined : (stryCov_9fa48("3215"), (() => {
  const canCancel = (s: OrderStatus) => stryMutAct_9fa48("3218") ? s === "awaiting-payment" && PAID_OPEN.includes(s) : stryMutAct_9fa48("3217") ? false : stryMutAct_9fa48("3216") ? true : (stryCov_9fa48("3216", "3217", "3218"), (stryMutAct_9fa48("3220") ? s !== "awaiting-payment" : stryMutAct_9fa48("3219") ? false : (stryCov_9fa48("3219", "3220"), s === (stryMutAct_9fa48("3221") ? "" : (stryCov_9fa48("3221"), "awaiting-payment")))) || PAID_OPEN.includes(s));
  return canCancel;
})());

/** After payment: reserved when the shelf covered every part, back-ordered when it fell short. */
export const statusAfterReservation = stryMutAct_9fa48("3222") ? () => undefined : (stryCov_9fa48("3222"), (() => {
  const statusAfterReservation = (backOrdered: number): OrderStatus => (stryMutAct_9fa48("3226") ? backOrdered <= 0 : stryMutAct_9fa48("3225") ? backOrdered >= 0 : stryMutAct_9fa48("3224") ? false : stryMutAct_9fa48("3223") ? true : (stryCov_9fa48("3223", "3224", "3225", "3226"), backOrdered > 0)) ? stryMutAct_9fa48("3227") ? "" : (stryCov_9fa48("3227"), "back-ordered") : stryMutAct_9fa48("3228") ? "" : (stryCov_9fa48("3228"), "parts-reserved");
  return statusAfterReservation;
})());

/** Takes what the shelf has, up to what is asked; the rest waits for stock. */
export function allocate(requested: number, onShelf: number): {
  reserved: number;
  backOrdered: number;
} {
  if (stryMutAct_9fa48("3229")) {
    {}
  } else {
    stryCov_9fa48("3229");
    const reserved = stryMutAct_9fa48("3230") ? Math.min(0, Math.min(requested, onShelf)) : (stryCov_9fa48("3230"), Math.max(0, stryMutAct_9fa48("3231") ? Math.max(requested, onShelf) : (stryCov_9fa48("3231"), Math.min(requested, onShelf))));
    return stryMutAct_9fa48("3232") ? {} : (stryCov_9fa48("3232"), {
      reserved,
      backOrdered: stryMutAct_9fa48("3233") ? requested + reserved : (stryCov_9fa48("3233"), requested - reserved)
    });
  }
}
export const orderListQuerySchema = z.object(stryMutAct_9fa48("3234") ? {} : (stryCov_9fa48("3234"), {
  status: z.enum(stryMutAct_9fa48("3235") ? [] : (stryCov_9fa48("3235"), [...ORDER_STATUSES, stryMutAct_9fa48("3236") ? "Stryker was here!" : (stryCov_9fa48("3236"), "")]), stryMutAct_9fa48("3237") ? {} : (stryCov_9fa48("3237"), {
    error: stryMutAct_9fa48("3238") ? `` : (stryCov_9fa48("3238"), `status must be one of ${ORDER_STATUSES.join(stryMutAct_9fa48("3239") ? "" : (stryCov_9fa48("3239"), ", "))}.`)
  })).optional(),
  search: plainText(stryMutAct_9fa48("3240") ? "" : (stryCov_9fa48("3240"), "Search"), 100).optional(),
  page: stryMutAct_9fa48("3241") ? z.coerce.number().int().max(1, "page must be 1 or more").default(1) : (stryCov_9fa48("3241"), z.coerce.number().int().min(1, stryMutAct_9fa48("3242") ? "" : (stryCov_9fa48("3242"), "page must be 1 or more")).default(1)),
  pageSize: stryMutAct_9fa48("3244") ? z.coerce.number().int().max(1).max(100, "pageSize must be at most 100").default(20) : stryMutAct_9fa48("3243") ? z.coerce.number().int().min(1).min(100, "pageSize must be at most 100").default(20) : (stryCov_9fa48("3243", "3244"), z.coerce.number().int().min(1).max(100, stryMutAct_9fa48("3245") ? "" : (stryCov_9fa48("3245"), "pageSize must be at most 100")).default(20))
}));
export const cancelOrderSchema = z.object(stryMutAct_9fa48("3246") ? {} : (stryCov_9fa48("3246"), {
  reason: plainText(stryMutAct_9fa48("3247") ? "" : (stryCov_9fa48("3247"), "Reason"), 500).default(stryMutAct_9fa48("3248") ? "Stryker was here!" : (stryCov_9fa48("3248"), ""))
}));
export const markFittedSchema = z.object(stryMutAct_9fa48("3249") ? {} : (stryCov_9fa48("3249"), {
  datalogId: z.union(stryMutAct_9fa48("3250") ? [] : (stryCov_9fa48("3250"), [z.uuid(stryMutAct_9fa48("3251") ? {} : (stryCov_9fa48("3251"), {
    error: stryMutAct_9fa48("3252") ? "" : (stryCov_9fa48("3252"), "datalogId must be the id of a datalog.")
  })), z.literal(stryMutAct_9fa48("3253") ? "Stryker was here!" : (stryCov_9fa48("3253"), "")), z.null()])).optional().transform(stryMutAct_9fa48("3254") ? () => undefined : (stryCov_9fa48("3254"), v => stryMutAct_9fa48("3257") ? v && null : stryMutAct_9fa48("3256") ? false : stryMutAct_9fa48("3255") ? true : (stryCov_9fa48("3255", "3256", "3257"), v || null)))
}));
export const declineSheetSchema = z.object(stryMutAct_9fa48("3258") ? {} : (stryCov_9fa48("3258"), {
  reason: plainText(stryMutAct_9fa48("3259") ? "" : (stryCov_9fa48("3259"), "Reason"), 1000, stryMutAct_9fa48("3260") ? {} : (stryCov_9fa48("3260"), {
    multiline: stryMutAct_9fa48("3261") ? false : (stryCov_9fa48("3261"), true)
  })).default(stryMutAct_9fa48("3262") ? "Stryker was here!" : (stryCov_9fa48("3262"), ""))
}));
export type OrderListQuery = z.input<typeof orderListQuerySchema>;