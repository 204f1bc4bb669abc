// @ts-nocheck
import Link from "next/link";
import { Logo } from "@/components/logo";

type HeaderBarProps = { className: string; innerClassName: string; logoHref: string; logoLabel: string; children: React.ReactNode };

/** The bar at the top of a layout: the logo as a link, then whatever the layout puts beside it. */
export function HeaderBar({ className, innerClassName, logoHref, logoLabel, children }: HeaderBarProps) {
  return (
    <header className={className}>
      <div className={innerClassName}>
        <Link href={logoHref} aria-label={logoLabel}>
          <Logo />
        </Link>
        {children}
      </div>
    </header>
  );
}
