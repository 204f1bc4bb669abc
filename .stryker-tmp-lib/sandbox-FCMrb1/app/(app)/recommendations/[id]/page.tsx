// @ts-nocheck
import type { Metadata } from "next";
import { loadForStaff } from "@/app/_lib/recommendation-load";
import { requirePageUser } from "@/app/_lib/session";
import { sentVersionLink } from "@/app/_lib/share-url";
import { SheetActions } from "@/components/recommendation/sheet-actions";
import { SheetView } from "@/components/recommendation/sheet-view";
import { Breadcrumb } from "@/components/ui/breadcrumb";
import { getDb } from "@/db/client";
import { getLatestSentVersion } from "@/db/repo/sheet-versions";
import { toActor } from "@/db/repo/users";
import { SendPanel } from "./send-panel";
import { requestLocale } from "@/app/_lib/locale";

export const metadata: Metadata = { title: "Recommendation sheet" };

export default async function RecommendationPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { sheet, shop, currency, unitSystem } = await loadForStaff(id);
  const user = await requirePageUser(["sales", "tuner", "admin"]);
  const version = await getLatestSentVersion(getDb(), toActor(user), id);
  return (
    <div className="flex flex-col gap-4">
      <Breadcrumb href="/recommendations" label="Recommendations" here={`${sheet.customerName} · ${sheet.combinationName}, revision ${sheet.revision} (internal)`} className="no-print text-sm" linkClassName="underline" />
      <SendPanel id={sheet.id} status={sheet.status} customerEmail={sheet.customerEmail} shareUrl={version ? sentVersionLink(version, unitSystem).url : null} version={version?.version ?? null} />
      <SheetActions id={sheet.id} status={sheet.status} customerEmail={sheet.customerEmail} sentAt={sheet.sentAt ? sheet.sentAt.toISOString() : null} lastError={sheet.lastError} />
      <div className="rounded-md border border-line bg-panel p-4">
        <SheetView sheet={sheet} shop={shop} currency={currency} unitSystem={unitSystem} locale={await requestLocale()} />
      </div>
    </div>
  );
}
