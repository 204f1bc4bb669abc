// @ts-nocheck
// The pager under every paged list: buttons for a client list (`onPage`), links for a server page
// (`href`). No hooks, so server pages may use it with `href`.
import Link from "next/link";
import { Button } from "@/components/ui/button";

type PagerProps = {
  page: number;
  pageSize: number;
  total: number;
  /** Names the pager for assistive technology: "<label> pages", or `ariaLabel` as it is. */
  label: string;
  ariaLabel?: string;
  /** What is counted, singular and plural. */
  noun?: [string, string];
  /** Shown after the count (e.g. "updating…"). */
  children?: React.ReactNode;
} & ({ onPage: (p: number) => void; href?: never } | { href: (p: number) => string; onPage?: never });

const linkLook = "inline-flex items-center justify-center rounded-md border border-line bg-panel px-3 py-1.5 text-sm font-medium hover:bg-bg";

/** Previous and Next with "Page N of M · T items" between them. */
export function Pager({ page, pageSize, total, onPage, href, label, ariaLabel, noun = ["item", "items"], children }: PagerProps) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const step = (to: number, text: string, enabled: boolean) =>
    href ? (
      enabled ? (
        <Link href={href(to)} className={linkLook}>
          {text}
        </Link>
      ) : (
        <span className={`${linkLook} cursor-not-allowed opacity-50`} aria-disabled="true">
          {text}
        </span>
      )
    ) : (
      <Button type="button" variant="secondary" disabled={!enabled} onClick={() => onPage?.(to)}>
        {text}
      </Button>
    );
  return (
    <nav aria-label={ariaLabel ?? `${label} pages`} className="flex items-center gap-3 text-sm">
      {step(page - 1, "Previous", page > 1)}
      <span className="num">
        Page {Math.min(page, pages)} of {pages} · {total} {total === 1 ? noun[0] : noun[1]}
        {children}
      </span>
      {step(page + 1, "Next", page < pages)}
    </nav>
  );
}
