// @ts-nocheck
// The deposit a customer pays to accept a sheet: a percentage of its total or a fixed amount, as
// the shop owner sets it. Never more than the total, never negative, in the currency's minor unit.
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
import { Cash, currencySchema, roundToCurrency } from "./money";
export const DEPOSIT_KINDS = ["percent", "fixed"] as const;
export type DepositKind = (typeof DEPOSIT_KINDS)[number];
export type DepositRule = {
  kind: DepositKind;
  value: string;
};
const AMOUNT = stryMutAct_9fa48("3004") ? /^\d{1,10}(\.\D{1,2})?$/ : stryMutAct_9fa48("3003") ? /^\d{1,10}(\.\d)?$/ : stryMutAct_9fa48("3002") ? /^\d{1,10}(\.\d{1,2})$/ : stryMutAct_9fa48("3001") ? /^\D{1,10}(\.\d{1,2})?$/ : stryMutAct_9fa48("3000") ? /^\d(\.\d{1,2})?$/ : stryMutAct_9fa48("2999") ? /^\d{1,10}(\.\d{1,2})?/ : stryMutAct_9fa48("2998") ? /\d{1,10}(\.\d{1,2})?$/ : (stryCov_9fa48("2998", "2999", "3000", "3001", "3002", "3003", "3004"), /^\d{1,10}(\.\d{1,2})?$/);
export const depositRuleSchema = z.object(stryMutAct_9fa48("3005") ? {} : (stryCov_9fa48("3005"), {
  kind: z.enum(DEPOSIT_KINDS, stryMutAct_9fa48("3006") ? {} : (stryCov_9fa48("3006"), {
    error: stryMutAct_9fa48("3007") ? "" : (stryCov_9fa48("3007"), "Deposit kind must be percent or fixed.")
  })),
  value: z.union(stryMutAct_9fa48("3008") ? [] : (stryCov_9fa48("3008"), [z.string(), z.number()]), stryMutAct_9fa48("3009") ? {} : (stryCov_9fa48("3009"), {
    error: stryMutAct_9fa48("3010") ? "" : (stryCov_9fa48("3010"), "Deposit must be a number like 25 or 150.00.")
  })).transform(stryMutAct_9fa48("3011") ? () => undefined : (stryCov_9fa48("3011"), v => stryMutAct_9fa48("3012") ? String(v) : (stryCov_9fa48("3012"), String(v).trim()))).refine(stryMutAct_9fa48("3013") ? () => undefined : (stryCov_9fa48("3013"), v => AMOUNT.test(v)), stryMutAct_9fa48("3014") ? "" : (stryCov_9fa48("3014"), "Deposit must be a number with at most two decimals, like 25 or 150.00."))
})).superRefine((r, ctx) => {
  if (stryMutAct_9fa48("3015")) {
    {}
  } else {
    stryCov_9fa48("3015");
    const v = new Cash(AMOUNT.test(r.value) ? r.value : 0);
    if (stryMutAct_9fa48("3018") ? r.kind === "percent" || v.lte(0) || v.gt(100) : stryMutAct_9fa48("3017") ? false : stryMutAct_9fa48("3016") ? true : (stryCov_9fa48("3016", "3017", "3018"), (stryMutAct_9fa48("3020") ? r.kind !== "percent" : stryMutAct_9fa48("3019") ? true : (stryCov_9fa48("3019", "3020"), r.kind === (stryMutAct_9fa48("3021") ? "" : (stryCov_9fa48("3021"), "percent")))) && (stryMutAct_9fa48("3023") ? v.lte(0) && v.gt(100) : stryMutAct_9fa48("3022") ? true : (stryCov_9fa48("3022", "3023"), v.lte(0) || v.gt(100))))) ctx.addIssue(stryMutAct_9fa48("3024") ? {} : (stryCov_9fa48("3024"), {
      code: stryMutAct_9fa48("3025") ? "" : (stryCov_9fa48("3025"), "custom"),
      path: stryMutAct_9fa48("3026") ? [] : (stryCov_9fa48("3026"), [stryMutAct_9fa48("3027") ? "" : (stryCov_9fa48("3027"), "value")]),
      message: stryMutAct_9fa48("3028") ? "" : (stryCov_9fa48("3028"), "A percentage deposit must be more than 0 and at most 100.")
    }));
    if (stryMutAct_9fa48("3031") ? r.kind === "fixed" || v.lte(0) : stryMutAct_9fa48("3030") ? false : stryMutAct_9fa48("3029") ? true : (stryCov_9fa48("3029", "3030", "3031"), (stryMutAct_9fa48("3033") ? r.kind !== "fixed" : stryMutAct_9fa48("3032") ? true : (stryCov_9fa48("3032", "3033"), r.kind === (stryMutAct_9fa48("3034") ? "" : (stryCov_9fa48("3034"), "fixed")))) && v.lte(0))) ctx.addIssue(stryMutAct_9fa48("3035") ? {} : (stryCov_9fa48("3035"), {
      code: stryMutAct_9fa48("3036") ? "" : (stryCov_9fa48("3036"), "custom"),
      path: stryMutAct_9fa48("3037") ? [] : (stryCov_9fa48("3037"), [stryMutAct_9fa48("3038") ? "" : (stryCov_9fa48("3038"), "value")]),
      message: stryMutAct_9fa48("3039") ? "" : (stryCov_9fa48("3039"), "A fixed deposit must be more than 0.")
    }));
  }
});

/** The deposit for a sheet total: percent of it (half-up to the minor unit) or the fixed amount, capped at the total. */
export function depositFor(total: string, rule: DepositRule, currency: string): string {
  if (stryMutAct_9fa48("3040")) {
    {}
  } else {
    stryCov_9fa48("3040");
    const t = new Cash(total);
    const raw = (stryMutAct_9fa48("3043") ? rule.kind !== "percent" : stryMutAct_9fa48("3042") ? false : stryMutAct_9fa48("3041") ? true : (stryCov_9fa48("3041", "3042", "3043"), rule.kind === (stryMutAct_9fa48("3044") ? "" : (stryCov_9fa48("3044"), "percent")))) ? t.times(rule.value).div(100) : stryMutAct_9fa48("3045") ? Cash.max(new Cash(rule.value), t) : (stryCov_9fa48("3045"), Cash.min(new Cash(rule.value), t));
    return roundToCurrency(stryMutAct_9fa48("3046") ? Cash.min(0, Cash.min(raw, t)) : (stryCov_9fa48("3046"), Cash.max(0, stryMutAct_9fa48("3047") ? Cash.max(raw, t) : (stryCov_9fa48("3047"), Cash.min(raw, t)))), currency);
  }
}

/** How the rule reads to a person: "25% of the total" or "$150.00". */
export function describeDeposit(rule: DepositRule, format: (amount: string) => string): string {
  if (stryMutAct_9fa48("3048")) {
    {}
  } else {
    stryCov_9fa48("3048");
    return (stryMutAct_9fa48("3051") ? rule.kind !== "percent" : stryMutAct_9fa48("3050") ? false : stryMutAct_9fa48("3049") ? true : (stryCov_9fa48("3049", "3050", "3051"), rule.kind === (stryMutAct_9fa48("3052") ? "" : (stryCov_9fa48("3052"), "percent")))) ? stryMutAct_9fa48("3053") ? `` : (stryCov_9fa48("3053"), `${new Cash(rule.value).toString()}% of the total`) : stryMutAct_9fa48("3054") ? `` : (stryCov_9fa48("3054"), `${format(rule.value)} (or the total, when less)`);
  }
}

/** What the admin sets for every order: the currency and the deposit rule. */
export const shopTermsSchema = z.object(stryMutAct_9fa48("3055") ? {} : (stryCov_9fa48("3055"), {
  currency: z.string(stryMutAct_9fa48("3056") ? {} : (stryCov_9fa48("3056"), {
    error: stryMutAct_9fa48("3057") ? "" : (stryCov_9fa48("3057"), "Currency must be a three-letter code like USD.")
  })).pipe(currencySchema),
  depositKind: z.enum(DEPOSIT_KINDS, stryMutAct_9fa48("3058") ? {} : (stryCov_9fa48("3058"), {
    error: stryMutAct_9fa48("3059") ? "" : (stryCov_9fa48("3059"), "Deposit kind must be percent or fixed.")
  })),
  depositValue: z.union(stryMutAct_9fa48("3060") ? [] : (stryCov_9fa48("3060"), [z.string(), z.number()]))
})).transform((v, ctx) => {
  if (stryMutAct_9fa48("3061")) {
    {}
  } else {
    stryCov_9fa48("3061");
    const rule = depositRuleSchema.safeParse(stryMutAct_9fa48("3062") ? {} : (stryCov_9fa48("3062"), {
      kind: v.depositKind,
      value: v.depositValue
    }));
    if (stryMutAct_9fa48("3065") ? false : stryMutAct_9fa48("3064") ? true : stryMutAct_9fa48("3063") ? rule.success : (stryCov_9fa48("3063", "3064", "3065"), !rule.success)) {
      if (stryMutAct_9fa48("3066")) {
        {}
      } else {
        stryCov_9fa48("3066");
        for (const i of rule.error.issues) ctx.addIssue(stryMutAct_9fa48("3067") ? {} : (stryCov_9fa48("3067"), {
          code: stryMutAct_9fa48("3068") ? "" : (stryCov_9fa48("3068"), "custom"),
          path: stryMutAct_9fa48("3069") ? [] : (stryCov_9fa48("3069"), [(stryMutAct_9fa48("3072") ? i.path[0] !== "kind" : stryMutAct_9fa48("3071") ? false : stryMutAct_9fa48("3070") ? true : (stryCov_9fa48("3070", "3071", "3072"), i.path[0] === (stryMutAct_9fa48("3073") ? "" : (stryCov_9fa48("3073"), "kind")))) ? stryMutAct_9fa48("3074") ? "" : (stryCov_9fa48("3074"), "depositKind") : stryMutAct_9fa48("3075") ? "" : (stryCov_9fa48("3075"), "depositValue")]),
          message: i.message
        }));
        return z.NEVER;
      }
    }
    return stryMutAct_9fa48("3076") ? {} : (stryCov_9fa48("3076"), {
      currency: v.currency,
      depositKind: rule.data.kind,
      depositValue: new Cash(rule.data.value).toFixed(2)
    });
  }
});
export type ShopTerms = z.output<typeof shopTermsSchema>;