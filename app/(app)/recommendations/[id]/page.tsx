import type { Metadata } from "next";
import { loadForStaff } from "@/app/_lib/recommendation-load";
import { SheetActions } from "@/components/recommendation/sheet-actions";
import { SheetView } from "@/components/recommendation/sheet-view";
import { Breadcrumb } from "@/components/ui/breadcrumb";

export const metadata: Metadata = { title: "Recommendation sheet" };

export default async function RecommendationPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { sheet, shop, unitSystem } = await loadForStaff(id);
  return (
    <div className="flex flex-col gap-4">
      <Breadcrumb href="/recommendations" label="Recommendations" here={sheet.customerName} className="no-print text-sm" linkClassName="underline" />
      <SheetActions id={sheet.id} status={sheet.status} customerEmail={sheet.customerEmail} sentAt={sheet.sentAt ? sheet.sentAt.toISOString() : null} lastError={sheet.lastError} />
      <div className="rounded-md border border-line bg-panel p-4">
        <SheetView sheet={sheet} shop={shop} unitSystem={unitSystem} />
      </div>
    </div>
  );
}
