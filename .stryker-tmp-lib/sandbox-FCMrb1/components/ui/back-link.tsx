// @ts-nocheck
import Link from "next/link";

type BackLinkProps = { href: string; label: string; className?: string; linkClassName?: string };

/** "← Somewhere" above a page's heading. */
export function BackLink({ href, label, className = "text-sm", linkClassName = "text-muted hover:underline" }: BackLinkProps) {
  return (
    <p className={className}>
      <Link href={href} className={linkClassName}>
        ← {label}
      </Link>
    </p>
  );
}
