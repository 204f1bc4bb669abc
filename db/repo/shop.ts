// The shop's own details (one row), printed on every recommendation sheet.
import { eq } from "drizzle-orm";
import type { DbOrTx } from "../connect";
import { shopSettings } from "../schema";

export type ShopDetails = { name: string; address: string; phone: string; email: string; website: string };

/** Public details of the shop: anyone who may see a sheet may see them (no actor needed). */
export async function getShopDetails(db: DbOrTx): Promise<ShopDetails> {
  const [row] = await db.select().from(shopSettings).where(eq(shopSettings.id, 1));
  if (!row) return { name: "Your engine shop", address: "", phone: "", email: "", website: "" };
  return { name: row.name, address: row.address, phone: row.phone, email: row.email, website: row.website };
}
