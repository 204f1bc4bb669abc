// @ts-nocheck
import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { isShopStaff } from "@/db/policy";
import { listDatalogs } from "@/db/repo/datalogs";
import { toActor } from "@/db/repo/users";
import { dateText } from "@/lib/format/dates";
import { requestLocale } from "@/app/_lib/locale";
import { DataTable } from "@/components/ui/data-table";

export const metadata: Metadata = { title: "Datalogs" };

export default async function DatalogsPage() {
  const user = await requirePageUser();
  const locale = await requestLocale();
  const actor = toActor(user);
  const logs = await listDatalogs(getDb(), actor);
  const staff = isShopStaff(actor);
  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-2xl font-semibold">Datalogs</h1>
        <Link href="/datalogs/new" className="ml-auto rounded-md bg-accent px-3 py-1.5 text-sm font-medium text-accent-fg hover:opacity-90">
          Upload a log
        </Link>
      </div>
      <p className="max-w-3xl text-sm text-muted">
        Measured boost from the dyno or the street, laid over the prediction for the combination as it was logged. A log can calibrate the engine&rsquo;s
        volumetric efficiency, so the pulley ladder predicts from what was measured. {staff ? "You see the shop's logs." : "You see your own logs."}
      </p>
      <DataTable
        caption="Datalogs"
        density="roomy"
        headClassName="text-muted"
        rows={logs}
        rowKey={(l) => l.id}
        empty="No logs yet. Upload one from a combination you own."
        columns={[
          {
            label: "Log",
            cell: (l) => (
              <>
                <Link href={`/datalogs/${l.id}`} className="font-medium underline-offset-2 hover:underline">
                  {l.name}
                </Link>
                <span className="block text-xs text-muted">{l.fileName}</span>
              </>
            ),
          },
          { label: "Combination", cell: (l) => l.combinationName },
          { label: "Revision as logged", cell: (l) => l.revision },
          { label: "Samples", align: "right", cell: (l) => l.pointCount.toLocaleString("en-US") },
          staff && { label: "Uploaded by", cell: (l) => l.ownerName },
          { label: "Uploaded", cell: (l) => dateText(l.createdAt, locale) },
        ]}
      />
    </div>
  );
}
