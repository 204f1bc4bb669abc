// @ts-nocheck
import Link from "next/link";

type BreadcrumbProps = { href: string; label: string; here: string; className: string; linkClassName: string; markCurrent?: boolean };

/** "Parent / this page" above a page's content. */
export function Breadcrumb({ href, label, here, className, linkClassName, markCurrent }: BreadcrumbProps) {
  return (
    <nav aria-label="Breadcrumb" className={className}>
      <Link href={href} className={linkClassName}>
        {label}
      </Link>{" "}
      / {markCurrent ? <span aria-current="page">{here}</span> : here}
    </nav>
  );
}
