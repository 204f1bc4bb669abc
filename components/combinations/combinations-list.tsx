"use client";
// The combinations list: read through GET /api/combinations with react-query (paginated,
// searchable, sortable), changed through the server actions, which call the same repository.
import { keepPreviousData, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useEffect, useId, useState } from "react";
import { formatQuantity, type UnitSystem } from "@/calc";
import { ApiError, apiJson } from "@/components/client-json";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import type { Role } from "@/db/schema";
import type { ActionState } from "@/lib/action-state";
import { ImportCombinations } from "./import-combinations";

export type ListedCombination = {
  id: string;
  name: string;
  ownerId: string;
  ownerName: string;
  ownerEmail: string;
  customerName: string | null;
  customerContact: string | null;
  displacement: number;
  blowerKind: "roots" | "twin-screw";
  blowerPulleyDiameter: number;
  revision: number;
  isDemo: boolean;
  updatedAt: string;
};
type ListAnswer = { items: ListedCombination[]; total: number; page: number; pageSize: number };
type Sort = "updatedAt" | "name" | "displacement" | "blowerPulleyDiameter";
type Scope = "" | "mine" | "shop" | "demo";

type ActionResult<T> = { ok: true; data?: T } | { ok: false; message: string };

/** The server actions the list calls, passed in by the page. */
export type CombinationListActions = {
  rename: (id: string, name: string, baseRevision: number) => Promise<ActionState<{ revision: number }>>;
  duplicate: (id: string) => Promise<ActionState<{ id: string; name: string }>>;
  remove: (id: string) => Promise<ActionState>;
  undoDelete: (id: string) => Promise<ActionState>;
  importFile: (fileText: string) => Promise<ActionState<{ imported: number }>>;
};

const PAGE_SIZE = 20;
const STAFF: Role[] = ["tuner", "sales", "admin"];

async function fetchList(params: URLSearchParams): Promise<ListAnswer> {
  try {
    return await apiJson<ListAnswer>(`/api/combinations?${params}`, { headers: { accept: "application/json" } });
  } catch (e) {
    if (e instanceof ApiError) throw new Error(e.serverMessage ?? `The list could not be loaded (HTTP ${e.status}).`);
    throw e;
  }
}

/** Server actions answer { ok:false, message } instead of throwing; react-query wants a throw. */
async function must<T>(p: Promise<ActionResult<T>>): Promise<T | undefined> {
  const r = await p;
  if (!r.ok) throw new Error(r.message);
  return r.data;
}

export function CombinationsList({ role, unitSystem, actions }: { role: Role; unitSystem: UnitSystem; actions: CombinationListActions }) {
  const staff = STAFF.includes(role);
  const qc = useQueryClient();
  const [searchText, setSearchText] = useState("");
  const [search, setSearch] = useState("");
  const [sort, setSort] = useState<Sort>("updatedAt");
  const [dir, setDir] = useState<"asc" | "desc">("desc");
  const [scope, setScope] = useState<Scope>("");
  const [page, setPage] = useState(1);
  const [notice, setNotice] = useState<{ tone: "ok" | "danger"; text: string; undoId?: string } | null>(null);

  // Search as you type, without a request per keystroke.
  useEffect(() => {
    const t = setTimeout(() => {
      setSearch(searchText.trim());
      setPage(1);
    }, 300);
    return () => clearTimeout(t);
  }, [searchText]);

  const params = new URLSearchParams({ sort, dir, page: String(page), pageSize: String(PAGE_SIZE) });
  if (search) params.set("search", search);
  if (scope) params.set("scope", scope);
  const list = useQuery({ queryKey: ["combinations", params.toString()], queryFn: () => fetchList(params), placeholderData: keepPreviousData });
  const refresh = () => qc.invalidateQueries({ queryKey: ["combinations"] });
  const fail = (e: Error) => setNotice({ tone: "danger", text: e.message });

  const duplicate = useMutation({
    mutationFn: (c: ListedCombination) => must(actions.duplicate(c.id)),
    onSuccess: (r) => {
      setNotice({ tone: "ok", text: r ? `Made a copy: “${r.name}”.` : "Made a copy." });
      void refresh();
    },
    onError: fail,
  });
  const remove = useMutation({
    mutationFn: (c: ListedCombination) => must(actions.remove(c.id)).then(() => c),
    onSuccess: (c) => {
      setNotice({ tone: "ok", text: `Deleted “${c.name}”.`, undoId: c.id });
      void refresh();
    },
    onError: fail,
  });
  const undo = useMutation({
    mutationFn: (id: string) => must(actions.undoDelete(id)),
    onSuccess: () => {
      setNotice({ tone: "ok", text: "Brought it back." });
      void refresh();
    },
    onError: fail,
  });

  const data = list.data;
  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;
  const scopes: { value: Scope; label: string }[] =
    role === "member"
      ? []
      : [
          { value: "", label: "Everything I can see" },
          { value: "mine", label: "Mine" },
          ...(staff ? [{ value: "shop" as Scope, label: "The shop's (customers)" }] : []),
          { value: "demo", label: "Demo examples" },
        ];

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
      ) : data && data.items.length === 0 ? (
        <div className="rounded-lg border border-line bg-panel p-6 text-sm">
          {search ? (
            <p>No combination matches “{search}”.</p>
          ) : (
            <p>
              Nothing saved yet. <Link href="/combinations/new" className="underline">Start a new combination</Link> from one of the demo engines, or import a JSON file.
            </p>
          )}
        </div>
      ) : data ? (
        <>
          <div className="overflow-x-auto rounded-lg border border-line bg-panel">
            <table className="w-full text-sm tabular-nums">
              <caption className="sr-only">Combinations, page {data.page} of {pages}</caption>
              <thead className="border-b border-line text-left text-muted">
                <tr>
                  <th scope="col" className="px-3 py-2 font-medium">Name</th>
                  {staff ? <th scope="col" className="px-3 py-2 font-medium">Customer</th> : null}
                  {role !== "member" ? <th scope="col" className="px-3 py-2 font-medium">Owner</th> : null}
                  <th scope="col" className="px-3 py-2 text-right font-medium">Engine</th>
                  <th scope="col" className="px-3 py-2 font-medium">Blower</th>
                  <th scope="col" className="px-3 py-2 text-right font-medium">Blower pulley</th>
                  <th scope="col" className="px-3 py-2 text-right font-medium">Revision</th>
                  <th scope="col" className="px-3 py-2 font-medium">Last saved</th>
                  <th scope="col" className="px-3 py-2 font-medium"><span className="sr-only">Actions</span></th>
                </tr>
              </thead>
              <tbody>
                {data.items.map((c) => (
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
                ))}
              </tbody>
            </table>
          </div>
          <nav aria-label="Pages" className="flex items-center gap-3 text-sm">
            <Button variant="secondary" disabled={page <= 1} onClick={() => setPage((p) => p - 1)}>
              Previous
            </Button>
            <span>
              Page {data.page} of {pages} · {data.total} combination{data.total === 1 ? "" : "s"}
              {list.isFetching ? <span className="ml-2 text-muted">updating…</span> : null}
            </span>
            <Button variant="secondary" disabled={page >= pages} onClick={() => setPage((p) => p + 1)}>
              Next
            </Button>
          </nav>
        </>
      ) : null}
    </section>
  );
}

function Row(props: {
  c: ListedCombination;
  role: Role;
  staff: boolean;
  unitSystem: UnitSystem;
  busy: boolean;
  rename: CombinationListActions["rename"];
  onRenamed: () => void;
  onDuplicate: () => void;
  onDelete: () => void;
}) {
  const { c, role, staff, unitSystem } = props;
  const [renaming, setRenaming] = useState(false);
  const [confirmDelete, setConfirmDelete] = useState(false);
  const [name, setName] = useState(c.name);
  const inputId = useId();
  const rename = useMutation({
    mutationFn: () => must(props.rename(c.id, name, c.revision)),
    onSuccess: () => {
      setRenaming(false);
      props.onRenamed();
    },
  });
  const eng = formatQuantity("displacement", c.displacement, unitSystem);
  const pulley = formatQuantity("length-small", c.blowerPulleyDiameter, unitSystem);
  // Instructors see the demo examples but may not change them: only duplicate.
  const writable = !(role === "instructor" && c.isDemo);

  return (
    <tr className="border-b border-line last:border-0 align-top">
      <td className="px-3 py-2">
        {renaming ? (
          <form
            className="flex flex-col gap-1"
            onSubmit={(e) => {
              e.preventDefault();
              rename.mutate();
            }}
          >
            <label htmlFor={inputId} className="sr-only">
              New name for {c.name}
            </label>
            <div className="flex gap-1">
              <input
                id={inputId}
                value={name}
                onChange={(e) => setName(e.target.value)}
                maxLength={120}
                required
                autoFocus
                aria-invalid={rename.isError || undefined}
                aria-describedby={rename.isError ? `${inputId}-error` : undefined}
                className="w-56 rounded-md border border-line bg-bg px-2 py-1"
                onKeyDown={(e) => e.key === "Escape" && setRenaming(false)}
              />
              <Button type="submit" disabled={rename.isPending}>
                Save name
              </Button>
              <Button type="button" variant="ghost" onClick={() => setRenaming(false)}>
                Cancel
              </Button>
            </div>
            {rename.isError ? (
              <p id={`${inputId}-error`} role="alert" className="text-xs text-danger">
                {rename.error.message}
              </p>
            ) : null}
          </form>
        ) : (
          <Link href={`/combinations/${c.id}`} className="font-medium text-accent underline underline-offset-2">
            {c.name}
          </Link>
        )}
        {c.isDemo ? <span className="ml-2 rounded border border-line px-1 text-xs text-muted">demo</span> : null}
      </td>
      {staff ? (
        <td className="px-3 py-2">
          {c.customerName ?? <span className="text-muted">—</span>}
          {c.customerContact ? <div className="text-xs text-muted">{c.customerContact}</div> : null}
        </td>
      ) : null}
      {role !== "member" ? <td className="px-3 py-2">{c.ownerName || c.ownerEmail}</td> : null}
      <td className="px-3 py-2 text-right">
        {eng.value.toFixed(unitSystem === "metric" ? 1 : 0)} {eng.unit}
      </td>
      <td className="px-3 py-2">{c.blowerKind === "roots" ? "Roots" : "Twin-screw"}</td>
      <td className="px-3 py-2 text-right">
        {pulley.value.toFixed(unitSystem === "metric" ? 0 : 2)} {pulley.unit}
      </td>
      <td className="px-3 py-2 text-right">
        <Link href={`/combinations/${c.id}/revisions`} className="hover:underline" title="History">
          {c.revision}
        </Link>
      </td>
      <td className="px-3 py-2 whitespace-nowrap">
        <time dateTime={c.updatedAt}>{new Date(c.updatedAt).toLocaleString()}</time>
      </td>
      <td className="px-3 py-2">
        <div className="flex flex-wrap justify-end gap-1">
          <Link href={`/combinations/${c.id}`} className="rounded-md px-2 py-1 hover:bg-bg" aria-label={`Open ${c.name}`}>
            Open
          </Link>
          <Link href={`/combinations/${c.id}/revisions`} className="rounded-md px-2 py-1 hover:bg-bg" aria-label={`History of ${c.name}`}>
            History
          </Link>
          {writable ? (
            <Button variant="ghost" onClick={() => (setName(c.name), setRenaming(true))} aria-label={`Rename ${c.name}`}>
              Rename
            </Button>
          ) : null}
          <Button variant="ghost" disabled={props.busy} onClick={props.onDuplicate} aria-label={`Duplicate ${c.name}`}>
            Duplicate
          </Button>
          <a href={`/api/combinations/export?ids=${c.id}`} download className="rounded-md px-2 py-1 hover:bg-bg" aria-label={`Export ${c.name} as JSON`}>
            Export
          </a>
          {writable ? (
            confirmDelete ? (
              <span className="flex items-center gap-1">
                <Button variant="danger" disabled={props.busy} onClick={() => (setConfirmDelete(false), props.onDelete())} aria-label={`Yes, delete ${c.name}`}>
                  Yes, delete
                </Button>
                <Button variant="ghost" onClick={() => setConfirmDelete(false)}>
                  Keep
                </Button>
              </span>
            ) : (
              <Button variant="ghost" className="text-danger" onClick={() => setConfirmDelete(true)} aria-label={`Delete ${c.name}`}>
                Delete
              </Button>
            )
          ) : null}
        </div>
      </td>
    </tr>
  );
}
