// @ts-nocheck
import type { Metadata } from "next";
import { requirePageUser } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { getShopTerms } from "@/db/repo/shop";
import { ShopTermsForm } from "./shop-terms-form";
import { SignOutEverywhere } from "./sign-out-everywhere";
import { UnitsForm } from "./units-form";

export const metadata: Metadata = { title: "Settings" };

export default async function SettingsPage() {
  const user = await requirePageUser();
  return (
    <div className="max-w-lg">
      <h1 className="mb-4 text-2xl font-semibold">Settings</h1>
      <dl className="mb-6 grid grid-cols-[8rem_1fr] gap-y-1 text-sm">
        <dt className="text-muted">Name</dt>
        <dd>{user.name}</dd>
        <dt className="text-muted">E-mail</dt>
        <dd>{user.email}</dd>
        <dt className="text-muted">Role</dt>
        <dd>{user.role}</dd>
      </dl>
      <UnitsForm preset={user.unitSystem} choices={user.unitChoices} />
      {user.role === "admin" ? <ShopTerms /> : null}
      <SignOutEverywhere />
    </div>
  );
}

async function ShopTerms() {
  const t = await getShopTerms(getDb());
  return <ShopTermsForm initial={{ currency: t.currency, depositKind: t.deposit.kind, depositValue: t.deposit.value }} />;
}
