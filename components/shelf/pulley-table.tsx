"use client";
// The shelf's pulleys, fetched page by page from GET /api/shelf/pulleys through react-query.
import { keepPreviousData, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { fromSI, type UnitSystem } from "@/calc";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { formatMoney } from "@/db/shelf-rules";
import { apiJson, queryString } from "./api";
import { PulleyForm, type PulleyJson } from "./pulley-form";
import { Pager, SelectField, SortHeader, type SortState } from "./table-parts";

type Sort = "partNumber" | "diameter" | "ribCount" | "price" | "stock";
type PageOf<T> = { rows: T[]; total: number; page: number; pageSize: number };

export function PulleyTable({ system, isAdmin }: { system: UnitSystem; isAdmin: boolean }) {
  const [search, setSearch] = useState("");
  const [position, setPosition] = useState("");
  const [ribCount, setRibCount] = useState("");
  const [inStock, setInStock] = useState(false);
  const [sort, setSort] = useState<SortState<Sort>>({ sort: "diameter", dir: "asc" });
  const [page, setPage] = useState(1);
  const [editing, setEditing] = useState<PulleyJson | "new" | null>(null);
  const [message, setMessage] = useState<{ tone: "ok" | "danger"; text: string } | null>(null);
  const qc = useQueryClient();
  const pageSize = 15;
  const params = { search: search.trim(), position, ribCount, inStock, sort: sort.sort, dir: sort.dir, page, pageSize };
  const q = useQuery({
    queryKey: ["shelf", "pulleys", params],
    queryFn: () => apiJson<PageOf<PulleyJson>>(`/api/shelf/pulleys${queryString(params)}`),
    placeholderData: keepPreviousData,
  });
  const unit = system === "metric" ? "mm" : "in";
  const len = (m: number) => fromSI("length-small", m, system).toFixed(system === "metric" ? 1 : 2);
  const reset = <T,>(set: (v: T) => void) => (v: T) => {
    set(v);
    setPage(1);
  };

  async function remove(row: PulleyJson) {
    if (!window.confirm(`Remove ${row.partNumber} from the shelf?`)) return;
    try {
      await apiJson(`/api/shelf/pulleys/${row.id}`, { method: "DELETE" });
      await qc.invalidateQueries({ queryKey: ["shelf"] });
      setMessage({ tone: "ok", text: `Removed ${row.partNumber}.` });
    } catch (e) {
      setMessage({ tone: "danger", text: e instanceof Error ? e.message : "Could not remove it." });
    }
  }

  return (
    <section aria-labelledby="pulleys-heading" className="flex flex-col gap-3">
      <h2 id="pulleys-heading" className="sr-only">
        Pulleys
      </h2>
      <div className="flex flex-wrap items-end gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor="pulley-search" className="text-sm font-medium">
            Search pulleys
          </label>
          <input id="pulley-search" type="search" value={search} onChange={(e) => reset(setSearch)(e.target.value)} placeholder="Part number or notes" className="rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm" />
        </div>
        <SelectField id="pulley-position" label="Position" value={position} onChange={reset(setPosition)} options={[["", "Crank and blower"], ["blower", "Blower"], ["crank", "Crank"]]} />
        <SelectField id="pulley-ribs" label="Ribs" value={ribCount} onChange={reset(setRibCount)} options={[["", "Any"], ["6", "6-rib"], ["8", "8-rib"], ["10", "10-rib"]]} />
        <label className="flex items-center gap-2 pb-1.5 text-sm">
          <input type="checkbox" checked={inStock} onChange={(e) => reset(setInStock)(e.target.checked)} /> In stock only
        </label>
        <div className="ml-auto flex gap-2">
          <a href="/api/shelf/export?kind=pulleys" className="rounded-md border border-line bg-panel px-3 py-1.5 text-sm font-medium hover:bg-bg" download>
            Export CSV
          </a>
          {isAdmin ? (
            <Button type="button" onClick={() => setEditing("new")}>
              Add pulley
            </Button>
          ) : null}
        </div>
      </div>
      {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
      {editing ? (
        <PulleyForm
          key={editing === "new" ? "new" : editing.id}
          system={system}
          row={editing === "new" ? undefined : editing}
          onCancel={() => setEditing(null)}
          onDone={(text) => {
            setEditing(null);
            setMessage({ tone: "ok", text });
          }}
        />
      ) : null}
      {q.isError ? <Notice tone="danger">{q.error.message}</Notice> : null}
      <div className="overflow-x-auto rounded-md border border-line bg-panel">
        <table className="w-full text-sm" aria-busy={q.isFetching}>
          <caption className="sr-only">Pulleys on the shelf</caption>
          <thead className="border-b border-line">
            <tr>
              <SortHeader label="Part number" column="partNumber" state={sort} onChange={reset(setSort)} />
              <th scope="col" className="px-2 py-1.5 text-left font-medium">
                Position
              </th>
              <SortHeader label="Diameter" unit={unit} column="diameter" state={sort} onChange={reset(setSort)} align="right" />
              <SortHeader label="Ribs" column="ribCount" state={sort} onChange={reset(setSort)} align="right" />
              <th scope="col" className="px-2 py-1.5 text-right font-medium">
                Belt minimum <span className="font-normal text-muted">({unit})</span>
              </th>
              <SortHeader label="Price" column="price" state={sort} onChange={reset(setSort)} align="right" />
              <SortHeader label="Stock" column="stock" state={sort} onChange={reset(setSort)} align="right" />
              {isAdmin ? (
                <th scope="col" className="px-2 py-1.5">
                  <span className="sr-only">Actions</span>
                </th>
              ) : null}
            </tr>
          </thead>
          <tbody>
            {q.data?.rows.map((p) => (
              <tr key={p.id} className="border-b border-line last:border-0" data-part={p.partNumber}>
                <td className="px-2 py-1.5 font-mono text-xs">{p.partNumber}</td>
                <td className="px-2 py-1.5">{p.position === "crank" ? "Crank" : "Blower"}</td>
                <td className="px-2 py-1.5 text-right">{len(p.diameter)}</td>
                <td className="px-2 py-1.5 text-right">{p.ribCount}</td>
                <td className="px-2 py-1.5 text-right">{p.minBeltDiameter === null ? "–" : len(p.minBeltDiameter)}</td>
                <td className="px-2 py-1.5 text-right" data-testid="price">
                  {formatMoney(p.price)}
                </td>
                <td className={`px-2 py-1.5 text-right ${p.stock === 0 ? "text-danger" : ""}`}>{p.stock === 0 ? "0 (out)" : p.stock}</td>
                {isAdmin ? (
                  <td className="whitespace-nowrap px-2 py-1.5 text-right">
                    <Button type="button" variant="ghost" onClick={() => setEditing(p)} aria-label={`Edit ${p.partNumber}`}>
                      Edit
                    </Button>
                    <Button type="button" variant="ghost" onClick={() => remove(p)} aria-label={`Remove ${p.partNumber}`}>
                      Remove
                    </Button>
                  </td>
                ) : null}
              </tr>
            ))}
            {q.data && q.data.rows.length === 0 ? (
              <tr>
                <td colSpan={isAdmin ? 8 : 7} className="px-2 py-4 text-center text-muted">
                  No pulleys match.
                </td>
              </tr>
            ) : null}
            {q.isPending ? (
              <tr>
                <td colSpan={isAdmin ? 8 : 7} className="px-2 py-4 text-center text-muted">
                  Loading…
                </td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>
      {q.data ? <Pager label="Pulleys" page={page} pageSize={pageSize} total={q.data.total} onPage={setPage} /> : null}
    </section>
  );
}
