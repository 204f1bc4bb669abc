// @ts-nocheck
import Link from "next/link";
import { requirePageUser } from "@/app/_lib/session";
import { HeaderBar } from "@/components/ui/header-bar";
import { NavLinks, type NavItem } from "@/components/nav-links";
import { CurrencyProvider } from "@/components/price";
import { LocaleProvider } from "@/components/locale";
import { requestLocale } from "@/app/_lib/locale";
import { SignOutButton } from "@/components/sign-out-button";
import { ThemeSwitch } from "@/components/theme-switch";
import { getDb } from "@/db/client";
import { getShopTerms } from "@/db/repo/shop";
import type { Role } from "@/db/schema";

const ALL: Role[] = ["member", "tuner", "sales", "instructor", "admin"];
const NAV: (NavItem & { roles: Role[] })[] = [
  { href: "/combinations", label: "Combinations", roles: ALL },
  { href: "/compare", label: "Side by side", roles: ALL },
  { href: "/datalogs", label: "Datalogs", roles: ALL },
  { href: "/shelf", label: "Parts shelf", roles: ALL },
  { href: "/recommendations", label: "Recommendations", roles: ["sales", "tuner", "admin"] },
  { href: "/orders", label: "Orders", roles: ["sales", "tuner", "admin"] },
  { href: "/lessons", label: "Lessons", roles: ALL },
  { href: "/admin/users", label: "Accounts", roles: ["admin"] },
  { href: "/admin/mail", label: "Mailbox", roles: ["admin"] },
];

const roleNames: Record<Role, string> = { member: "Member", tuner: "Tuner", sales: "Sales", instructor: "Instructor", admin: "Admin" };

export default async function AppLayout({ children }: { children: React.ReactNode }) {
  const [user, terms, locale] = await Promise.all([requirePageUser(), getShopTerms(getDb()), requestLocale()]);
  const items = NAV.filter((n) => n.roles.includes(user.role)).map(({ href, label }) => ({ href, label }));
  return (
    <div className="flex min-h-screen flex-col">
      <HeaderBar className="no-print border-b border-line bg-panel" innerClassName="mx-auto flex max-w-7xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-2" logoHref="/combinations" logoLabel="Pulleywright: your combinations">
        <NavLinks items={items} />
        <div className="ml-auto flex items-center gap-3 text-sm">
          <ThemeSwitch />
          <Link href="/settings" prefetch={false} className="hover:underline" title="Your settings">
            {user.name || user.email} <span className="text-muted">· {roleNames[user.role]}</span>
          </Link>
          <SignOutButton />
        </div>
      </HeaderBar>
      <main id="main" className="mx-auto w-full max-w-7xl flex-1 px-4 py-6">
        <CurrencyProvider currency={terms.currency}>
          <LocaleProvider locale={locale}>{children}</LocaleProvider>
        </CurrencyProvider>
      </main>
    </div>
  );
}
