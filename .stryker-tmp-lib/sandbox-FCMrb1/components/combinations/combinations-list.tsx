// @ts-nocheck
"use client";
// The combinations list: filters, notices, the table and its pages (state in use-combinations-list).
import Link from "next/link";
import type { UnitSystem } from "@/calc";
import { Button } from "@/components/ui/button";
import { ACTIONS_COLUMN, DataTable } from "@/components/ui/data-table";
import { Notice } from "@/components/ui/notice";
import { Pager } from "@/components/ui/pager";
import type { Role } from "@/db/schema";
import { CombinationRow as Row } from "./combination-row";
import { ImportCombinations } from "./import-combinations";
import { useCombinationsList, type CombinationListActions, type Scope, type Sort } from "./use-combinations-list";

export function CombinationsList({ role, unitSystem, actions }: { role: Role; unitSystem: UnitSystem; actions: CombinationListActions }) {
  const { staff, searchText, setSearchText, search, sort, setSort, dir, setDir, scope, setScope, page, setPage, notice, setNotice, list, refresh, duplicate, remove, undo, data, pages, scopes } =
    useCombinationsList(role, actions);
  return (
    <section aria-labelledby="combinations-title" className="flex flex-col gap-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 id="combinations-title" className="text-2xl font-semibold">
            Combinations
          </h1>
          <p className="text-sm text-muted">
            {role === "member" ? "Your saved engine, blower and pulley combinations." : "Combinations you can see, with their history."}
          </p>
        </div>
        <div className="flex flex-wrap items-center gap-2">
          <Link href="/combinations/new" className="rounded-md bg-accent px-3 py-1.5 text-sm font-medium text-accent-fg">
            New combination
          </Link>
          <a href="/api/combinations/export" download className="rounded-md border border-line bg-panel px-3 py-1.5 text-sm font-medium">
            Export all of mine (JSON)
          </a>
          <ImportCombinations
            importAction={actions.importFile}
            onImported={(n) => {
              setNotice({ tone: "ok", text: `Imported ${n} combination${n === 1 ? "" : "s"}.` });
              void refresh();
            }}
          />
        </div>
      </div>

      <form role="search" className="flex flex-wrap items-end gap-3" onSubmit={(e) => e.preventDefault()}>
        <label className="flex flex-col gap-1 text-sm font-medium">
          Search
          <input
            type="search"
            value={searchText}
            onChange={(e) => setSearchText(e.target.value)}
            placeholder={staff ? "Name, customer or contact" : "Name"}
            maxLength={100}
            className="w-64 rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm font-normal"
          />
        </label>
        <label className="flex flex-col gap-1 text-sm font-medium">
          Sort by
          <select value={sort} onChange={(e) => (setSort(e.target.value as Sort), setPage(1))} className="rounded-md border border-line bg-panel px-2 py-1.5 text-sm font-normal">
            <option value="updatedAt">Last saved</option>
            <option value="name">Name</option>
            <option value="displacement">Engine displacement</option>
            <option value="blowerPulleyDiameter">Blower pulley diameter</option>
          </select>
        </label>
        <label className="flex flex-col gap-1 text-sm font-medium">
          Order
          <select value={dir} onChange={(e) => (setDir(e.target.value as "asc" | "desc"), setPage(1))} className="rounded-md border border-line bg-panel px-2 py-1.5 text-sm font-normal">
            <option value="desc">{sort === "name" ? "Z to A" : "Largest / newest first"}</option>
            <option value="asc">{sort === "name" ? "A to Z" : "Smallest / oldest first"}</option>
          </select>
        </label>
        {scopes.length ? (
          <label className="flex flex-col gap-1 text-sm font-medium">
            Show
            <select value={scope} onChange={(e) => (setScope(e.target.value as Scope), setPage(1))} className="rounded-md border border-line bg-panel px-2 py-1.5 text-sm font-normal">
              {scopes.map((s) => (
                <option key={s.value} value={s.value}>
                  {s.label}
                </option>
              ))}
            </select>
          </label>
        ) : null}
      </form>

      <div aria-live="polite">
        {notice ? (
          <Notice tone={notice.tone}>
            <span>{notice.text}</span>
            {notice.undoId ? (
              <Button variant="secondary" className="ml-3" disabled={undo.isPending} onClick={() => undo.mutate(notice.undoId!)}>
                Undo
              </Button>
            ) : null}
            <Button variant="ghost" className="ml-1" onClick={() => setNotice(null)} aria-label="Dismiss this message">
              ×
            </Button>
          </Notice>
        ) : null}
      </div>

      {list.isPending ? (
        <div role="status" className="rounded-lg border border-line bg-panel p-6 text-sm text-muted">
          Loading combinations…
        </div>
      ) : list.isError ? (
        <Notice tone="danger" title="The list could not be loaded.">
          <p>{list.error.message}</p>
          <Button variant="secondary" className="mt-2" onClick={() => void list.refetch()}>
            Try again
          </Button>
        </Notice>
      ) : data ? (
        <>
          <DataTable
            caption={`Combinations, page ${data.page} of ${pages}`}
            density="roomy"
            className="tabular-nums"
            headClassName="text-muted"
            rows={data.items}
            rowKey={(c) => c.id}
            empty={
              search ? (
                <>No combination matches “{search}”.</>
              ) : (
                <>
                  Nothing saved yet. <Link href="/combinations/new" className="underline">Start a new combination</Link> from one of the demo engines, or import a JSON file.
                </>
              )
            }
            columns={[
              { label: "Name" },
              staff && { label: "Customer" },
              role !== "member" && { label: "Owner" },
              { label: "Engine", align: "right" },
              { label: "Blower" },
              { label: "Blower pulley", align: "right" },
              { label: "Revision", align: "right" },
              { label: "Last saved" },
              ACTIONS_COLUMN,
            ]}
            renderRow={(c) => (
              <Row
                key={c.id}
                c={c}
                role={role}
                staff={staff}
                unitSystem={unitSystem}
                rename={actions.rename}
                onRenamed={() => void refresh()}
                onDuplicate={() => duplicate.mutate(c)}
                onDelete={() => remove.mutate(c)}
                busy={(duplicate.isPending && duplicate.variables?.id === c.id) || (remove.isPending && remove.variables?.id === c.id)}
              />
            )}
          />
          <Pager label="Combinations" ariaLabel="Pages" page={page} pageSize={data.pageSize} total={data.total} onPage={setPage} noun={["combination", "combinations"]}>
            {list.isFetching ? <span className="ml-2 text-muted">updating…</span> : null}
          </Pager>
        </>
      ) : null}
    </section>
  );
}
