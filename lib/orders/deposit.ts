// The deposit a customer pays to accept a sheet: a percentage of its total or a fixed amount, as
// the shop owner sets it. Never more than the total, never negative, in the currency's minor unit.
import { z } from "zod";
import { Cash, currencySchema, roundToCurrency } from "./money";

export const DEPOSIT_KINDS = ["percent", "fixed"] as const;
export type DepositKind = (typeof DEPOSIT_KINDS)[number];
export type DepositRule = { kind: DepositKind; value: string };

const AMOUNT = /^\d{1,10}(\.\d{1,2})?$/;

export const depositRuleSchema = z
  .object({
    kind: z.enum(DEPOSIT_KINDS, { error: "Deposit kind must be percent or fixed." }),
    value: z
      .union([z.string(), z.number()], { error: "Deposit must be a number like 25 or 150.00." })
      .transform((v) => String(v).trim())
      .refine((v) => AMOUNT.test(v), "Deposit must be a number with at most two decimals, like 25 or 150.00."),
  })
  .superRefine((r, ctx) => {
    const v = new Cash(AMOUNT.test(r.value) ? r.value : 0);
    if (r.kind === "percent" && (v.lte(0) || v.gt(100))) ctx.addIssue({ code: "custom", path: ["value"], message: "A percentage deposit must be more than 0 and at most 100." });
    if (r.kind === "fixed" && v.lte(0)) ctx.addIssue({ code: "custom", path: ["value"], message: "A fixed deposit must be more than 0." });
  });

/** The deposit for a sheet total: percent of it (half-up to the minor unit) or the fixed amount, capped at the total. */
export function depositFor(total: string, rule: DepositRule, currency: string): string {
  const t = new Cash(total);
  const raw = rule.kind === "percent" ? t.times(rule.value).div(100) : Cash.min(new Cash(rule.value), t);
  return roundToCurrency(Cash.max(0, Cash.min(raw, t)), currency);
}

/** How the rule reads to a person: "25% of the total" or "$150.00". */
export function describeDeposit(rule: DepositRule, format: (amount: string) => string): string {
  return rule.kind === "percent" ? `${new Cash(rule.value).toString()}% of the total` : `${format(rule.value)} (or the total, when less)`;
}

/** What the admin sets for every order: the currency and the deposit rule. */
export const shopTermsSchema = z.object({
  currency: z.string({ error: "Currency must be a three-letter code like USD." }).pipe(currencySchema),
  depositKind: z.enum(DEPOSIT_KINDS, { error: "Deposit kind must be percent or fixed." }),
  depositValue: z.union([z.string(), z.number()]),
}).transform((v, ctx) => {
  const rule = depositRuleSchema.safeParse({ kind: v.depositKind, value: v.depositValue });
  if (!rule.success) {
    // The kind passed its own enum above, so only the value can fail here.
    for (const i of rule.error.issues) ctx.addIssue({ code: "custom", path: ["depositValue"], message: i.message });
    return z.NEVER;
  }
  return { currency: v.currency, depositKind: rule.data.kind, depositValue: new Cash(rule.data.value).toFixed(2) };
});
export type ShopTerms = z.output<typeof shopTermsSchema>;
