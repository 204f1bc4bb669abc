// @ts-nocheck
import type { Metadata } from "next";
import Link from "next/link";
import { LinkRefused } from "@/components/recommendation/link-refused";
import { loadByToken, loadForStaff } from "@/app/_lib/recommendation-load";
import { PrintButton } from "@/components/recommendation/print-button";
import { SheetView } from "@/components/recommendation/sheet-view";
import { requestLocale } from "@/app/_lib/locale";
import { resolveLocale } from "@/lib/format/dates";

export const metadata: Metadata = { title: "Print recommendation", robots: { index: false, follow: false } };

type Props = { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

/** The sheet on one page. Staff open it signed in; the server's PDF renderer opens it with a short-lived token. */
export default async function PrintRecommendationPage({ params, searchParams }: Props) {
  const [{ id }, sp] = await Promise.all([params, searchParams]);
  const token = typeof sp.t === "string" ? sp.t : undefined;
  const loaded = token ? await loadByToken(token, sp.units, id) : await loadForStaff(id);
  if (!loaded.ok) return <LinkRefused reason={loaded.reason} />;
  // The server's PDF renderer passes the requester's locale; a person printing sends their own.
  const locale = typeof sp.lang === "string" ? resolveLocale(sp.lang) : await requestLocale();
  return (
    <div className="print-sheet">
      {token ? null : (
        <div className="no-print mb-4 flex items-center gap-3">
          <PrintButton />
          <Link href={`/recommendations/${id}`} className="text-sm underline">
            Back to the sheet
          </Link>
          <span className="text-xs text-muted">Fits one A4 or Letter page.</span>
        </div>
      )}
      <SheetView sheet={loaded.sheet} shop={loaded.shop} currency={loaded.currency} unitSystem={loaded.unitSystem} locale={locale} print />
    </div>
  );
}
