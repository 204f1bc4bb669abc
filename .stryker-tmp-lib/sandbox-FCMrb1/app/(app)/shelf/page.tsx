// @ts-nocheck
import type { Metadata } from "next";
import { requirePageUser } from "@/app/_lib/session";
import { ShelfTables } from "@/components/shelf/shelf-tables";
import { canEditShelf } from "@/db/policy";
import { toActor } from "@/db/repo/users";
import { personUnits } from "@/lib/units/person";
import { QueryProvider } from "@/components/query-provider";

export const metadata: Metadata = { title: "Parts shelf" };

export default async function ShelfPage() {
  const user = await requirePageUser();
  const isAdmin = canEditShelf(toActor(user));
  return (
    <div className="flex flex-col gap-4">
      <div>
        <h1 className="text-2xl font-semibold">Parts shelf</h1>
        <p className="text-sm text-muted">
          The shop&apos;s blowers and pulleys with price and stock. {isAdmin ? "You can edit the shelf and import or export it as CSV." : "Only the admin changes the shelf."}
        </p>
      </div>
      <QueryProvider><ShelfTables system={personUnits(user)} isAdmin={isAdmin} /></QueryProvider>
    </div>
  );
}
