"use client";
// The pager under every paged list.
import { Button } from "@/components/ui/button";

type PagerProps = {
  page: number;
  pageSize: number;
  total: number;
  onPage: (p: number) => void;
  /** Names the pager for assistive technology: "<label> pages", or `ariaLabel` as it is. */
  label: string;
  ariaLabel?: string;
  /** What is counted, singular and plural. */
  noun?: [string, string];
  /** Shown after the count (e.g. "updating…"). */
  children?: React.ReactNode;
};

/** Previous and Next with "Page N of M · T items" between them. */
export function Pager({ page, pageSize, total, onPage, label, ariaLabel, noun = ["item", "items"], children }: PagerProps) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  return (
    <nav aria-label={ariaLabel ?? `${label} pages`} className="flex items-center gap-3 text-sm">
      <Button type="button" variant="secondary" disabled={page <= 1} onClick={() => onPage(page - 1)}>
        Previous
      </Button>
      <span className="num">
        Page {Math.min(page, pages)} of {pages} · {total} {total === 1 ? noun[0] : noun[1]}
        {children}
      </span>
      <Button type="button" variant="secondary" disabled={page >= pages} onClick={() => onPage(page + 1)}>
        Next
      </Button>
    </nav>
  );
}
