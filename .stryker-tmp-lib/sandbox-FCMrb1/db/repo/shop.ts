// @ts-nocheck
// The shop's own details (one row), printed on every recommendation sheet, and its terms: the
// currency of every price and the deposit asked when a customer accepts a sheet.
import { eq } from "drizzle-orm";
import { shopTermsSchema, type DepositRule, type ShopTerms } from "@/lib/orders/deposit";
import type { DbOrTx } from "../connect";
import { assert, canEditShopTerms, type Actor } from "../policy";
import { shopSettings } from "../schema";

export type ShopDetails = { name: string; address: string; phone: string; email: string; website: string };

const DEFAULT_NAME = "Your engine shop";

/** Public details of the shop: anyone who may see a sheet may see them (no actor needed). */
export async function getShopDetails(db: DbOrTx): Promise<ShopDetails> {
  const [row] = await db.select().from(shopSettings).where(eq(shopSettings.id, 1));
  if (!row) return { name: DEFAULT_NAME, address: "", phone: "", email: "", website: "" };
  return { name: row.name, address: row.address, phone: row.phone, email: row.email, website: row.website };
}

/** The currency and deposit rule (public: the customer's checkout states them). */
export async function getShopTerms(db: DbOrTx): Promise<{ currency: string; deposit: DepositRule }> {
  const [row] = await db.select().from(shopSettings).where(eq(shopSettings.id, 1));
  return { currency: row?.currency ?? "USD", deposit: { kind: row?.depositKind ?? "percent", value: row?.depositValue ?? "25.00" } };
}

/** The admin changes the currency and the deposit rule; orders already made keep theirs. */
export async function updateShopTerms(db: DbOrTx, actor: Actor, input: unknown): Promise<ShopTerms> {
  assert(canEditShopTerms(actor), "Only the admin sets the shop's currency and deposit.");
  const v = shopTermsSchema.parse(input);
  await db
    .insert(shopSettings)
    .values({ id: 1, name: DEFAULT_NAME, ...v })
    .onConflictDoUpdate({ target: shopSettings.id, set: v });
  return v;
}
