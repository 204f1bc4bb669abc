import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { isShopStaff } from "@/db/policy";
import { listDatalogs } from "@/db/repo/datalogs";
import { toActor } from "@/db/repo/users";
import { dateText } from "@/lib/format/dates";
import { requestLocale } from "@/app/_lib/locale";

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
      {logs.length === 0 ? (
        <p className="rounded-md border border-line bg-panel p-4 text-sm">No logs yet. Upload one from a combination you own.</p>
      ) : (
        <div className="overflow-x-auto rounded-md border border-line bg-panel">
          <table className="w-full text-sm">
            <thead>
              <tr className="border-b border-line text-left text-muted">
                <th className="px-3 py-2 font-medium">Log</th>
                <th className="px-3 py-2 font-medium">Combination</th>
                <th className="px-3 py-2 font-medium">Revision as logged</th>
                <th className="px-3 py-2 text-right font-medium">Samples</th>
                {staff ? <th className="px-3 py-2 font-medium">Uploaded by</th> : null}
                <th className="px-3 py-2 font-medium">Uploaded</th>
              </tr>
            </thead>
            <tbody>
              {logs.map((l) => (
                <tr key={l.id} className="border-b border-line last:border-0">
                  <td className="px-3 py-2">
                    <Link href={`/datalogs/${l.id}`} className="font-medium underline-offset-2 hover:underline">
                      {l.name}
                    </Link>
                    <span className="block text-xs text-muted">{l.fileName}</span>
                  </td>
                  <td className="px-3 py-2">{l.combinationName}</td>
                  <td className="px-3 py-2">{l.revision}</td>
                  <td className="px-3 py-2 text-right">{l.pointCount.toLocaleString("en-US")}</td>
                  {staff ? <td className="px-3 py-2">{l.ownerName}</td> : null}
                  <td className="px-3 py-2">{dateText(l.createdAt, locale)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
