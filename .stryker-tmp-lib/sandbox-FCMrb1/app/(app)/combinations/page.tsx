// @ts-nocheck
import type { Metadata } from "next";
import { requirePageUser } from "@/app/_lib/session";
import { CombinationsList } from "@/components/combinations/combinations-list";
import { Notice } from "@/components/ui/notice";
import {
  deleteCombinationAction,
  duplicateCombinationAction,
  importCombinationsAction,
  renameCombinationAction,
  undoDeleteAction,
} from "./actions";
import { personUnits } from "@/lib/units/person";
import { QueryProvider } from "@/components/query-provider";

const LIST_ACTIONS = {
  rename: renameCombinationAction,
  duplicate: duplicateCombinationAction,
  remove: deleteCombinationAction,
  undoDelete: undoDeleteAction,
  importFile: importCombinationsAction,
};

export const metadata: Metadata = { title: "Combinations" };

export default async function CombinationsPage({ searchParams }: { searchParams: Promise<{ denied?: string }> }) {
  const user = await requirePageUser();
  const { denied } = await searchParams;
  return (
    <div className="flex flex-col gap-4">
      {denied ? <Notice tone="warning">That page is not open to your role ({user.role}).</Notice> : null}
      <QueryProvider><CombinationsList role={user.role} unitSystem={personUnits(user)} actions={LIST_ACTIONS} /></QueryProvider>
    </div>
  );
}
