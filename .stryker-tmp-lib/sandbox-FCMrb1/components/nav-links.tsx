// @ts-nocheck
"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";

export type NavItem = { href: string; label: string };

export function NavLinks({ items }: { items: NavItem[] }) {
  const path = usePathname();
  return (
    <nav aria-label="Main" className="flex flex-wrap gap-1 text-sm">
      {items.map((i) => {
        const active = path === i.href || path.startsWith(i.href + "/");
        return (
          <Link
            key={i.href}
            href={i.href}
            // Prefetching every section on every page load renders them all on the server for nothing.
            prefetch={false}
            aria-current={active ? "page" : undefined}
            className={`rounded-md px-2.5 py-1.5 ${active ? "bg-bg font-semibold text-accent" : "hover:bg-bg"}`}
          >
            {i.label}
          </Link>
        );
      })}
    </nav>
  );
}
