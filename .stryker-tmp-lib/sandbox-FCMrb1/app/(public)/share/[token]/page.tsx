// @ts-nocheck
import type { Metadata } from "next";
import Link from "next/link";
import { LinkRefused } from "@/components/recommendation/link-refused";
import { PrintButton } from "@/components/recommendation/print-button";
import { SheetView } from "@/components/recommendation/sheet-view";
import { Notice } from "@/components/ui/notice";
import { formatPrice } from "@/lib/orders/money";
import { ORDER_STATUS_LABELS } from "@/lib/orders/status";
import { AnswerSheet } from "./answer-sheet";
import { loadSentSheet, type CustomerAnswer } from "./sent-sheet";
import { presetOf } from "@/calc";
import { dateText } from "@/lib/format/dates";
import { requestLocale } from "@/app/_lib/locale";

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

function AnswerState({ answer, token, justPaid, cancelled }: { answer: CustomerAnswer; token: string; justPaid: boolean; cancelled: boolean }) {
  switch (answer.kind) {
    case "open":
      return (
        <>
          {justPaid ? <Notice tone="info">Thank you: the payment service is confirming your payment. This page shows it once it arrives; reload in a moment.</Notice> : null}
          {cancelled ? <Notice tone="info">The checkout was cancelled; nothing was charged. You can accept again below whenever you like.</Notice> : null}
          <AnswerSheet token={token} deposit={formatPrice(answer.deposit, answer.currency)} />
        </>
      );
    case "ordered":
      return (
        <Notice tone="ok" title={answer.paid ? "Accepted: deposit received" : "Accepted"}>
          <span data-testid="customer-order-status">
            {answer.paid ? `Your deposit of ${formatPrice(answer.deposit, answer.currency)} was received. ` : ""}Your order: {ORDER_STATUS_LABELS[answer.status].toLowerCase()}. A receipt was e-mailed to you.
          </span>
        </Notice>
      );
    case "superseded":
      return <Notice tone="warning" title="A newer version was sent">The shop sent you an updated version of this sheet; open the link in the newest e-mail to accept it. This copy stays as it was sent.</Notice>;
    case "declined":
      return <Notice tone="info" title="Declined">You declined this recommendation. Thank you for letting us know; ask the shop if you change your mind.</Notice>;
    default:
      return null;
  }
}

/** A customer's view of one sheet as it was sent, opened from the e-mailed link; no account needed. */
export default async function SharedSheetPage({ params, searchParams }: Props) {
  const [{ token: raw }, sp] = await Promise.all([params, searchParams]);
  const locale = await requestLocale();
  const token = safeDecode(raw);
  const loaded = await loadSentSheet(token, sp.units);
  if (!loaded.ok) return <LinkRefused reason={loaded.reason} />;
  const other = presetOf(loaded.unitSystem) === "imperial" ? "metric" : "imperial";
  return (
    <div className="flex min-w-0 flex-col gap-4">
      <div className="no-print flex flex-wrap items-center gap-3 text-sm">
        <PrintButton />
        <Link href={`/share/${encodeURIComponent(token)}?units=${other}`} className="underline">
          Show in {other} units
        </Link>
        <span className="text-muted">
          {loaded.version ? `Version ${loaded.version}, as sent. ` : ""}This link works until {dateText(loaded.expiresAt, locale)}.
        </span>
      </div>
      <AnswerState answer={loaded.answer} token={token} justPaid={sp.paid === "1"} cancelled={sp.checkout === "cancelled"} />
      <SheetView sheet={loaded.sheet} shop={loaded.shop} currency={loaded.currency} unitSystem={loaded.unitSystem} locale={locale} />
    </div>
  );
}
