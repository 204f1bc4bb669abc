import type { Metadata } from "next";
import Link from "next/link";
import { LinkRefused } from "@/components/recommendation/link-refused";
import { loadByToken } from "@/app/_lib/recommendation-load";
import { PrintButton } from "@/components/recommendation/print-button";
import { SheetView } from "@/components/recommendation/sheet-view";

/** A token with a broken %-escape is simply not a token (refused below), never an error. */
function safeDecode(s: string): string {
  try {
    return decodeURIComponent(s);
  } catch {
    return s;
  }
}

export const metadata: Metadata = { title: "Your recommendation", robots: { index: false, follow: false } };

type Props = { params: Promise<{ token: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

/** A customer's read-only view of one sheet, opened from the e-mailed link; no account needed. */
export default async function SharedSheetPage({ params, searchParams }: Props) {
  const [{ token }, sp] = await Promise.all([params, searchParams]);
  const loaded = await loadByToken(safeDecode(token), sp.units);
  if (!loaded.ok) return <LinkRefused reason={loaded.reason} />;
  const other = loaded.unitSystem === "metric" ? "imperial" : "metric";
  return (
    <div className="flex flex-col gap-4">
      <div className="no-print flex flex-wrap items-center gap-3 text-sm">
        <PrintButton />
        <Link href={`/share/${encodeURIComponent(token)}?units=${other}`} className="underline">
          Show in {other} units
        </Link>
        {loaded.expiresAt ? (
          <span className="text-muted">Read-only copy; this link works until {loaded.expiresAt.toLocaleDateString("en-GB", { year: "numeric", month: "long", day: "numeric" })}.</span>
        ) : null}
      </div>
      <SheetView sheet={loaded.sheet} shop={loaded.shop} unitSystem={loaded.unitSystem} />
    </div>
  );
}
