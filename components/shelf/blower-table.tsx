"use client";
// The shelf's blowers, fetched page by page from GET /api/shelf/blowers through react-query.
import { keepPreviousData, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { fromSI, type UnitSystem } from "@/calc";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { formatMoney } from "@/db/shelf-rules";
import { apiJson, queryString } from "./api";
import { BlowerForm, type BlowerJson } from "./blower-form";
import { Pager, SelectField, SortHeader, type SortState } from "./table-parts";

type Sort = "partNumber" | "name" | "displacementPerRev" | "maxRpm" | "price" | "stock";
type PageOf<T> = { rows: T[]; total: number; page: number; pageSize: number };

export function BlowerTable({ system, isAdmin }: { system: UnitSystem; isAdmin: boolean }) {
  const [search, setSearch] = useState("");
  const [kind, setKind] = useState("");
  const [inStock, setInStock] = useState(false);
  const [sort, setSort] = useState<SortState<Sort>>({ sort: "displacementPerRev", dir: "asc" });
  const [page, setPage] = useState(1);
  const [editing, setEditing] = useState<BlowerJson | "new" | null>(null);
  const [message, setMessage] = useState<{ tone: "ok" | "danger"; text: string } | null>(null);
  const qc = useQueryClient();
  const pageSize = 15;
  const params = { search: search.trim(), kind, inStock, sort: sort.sort, dir: sort.dir, page, pageSize };
  const q = useQuery({
    queryKey: ["shelf", "blowers", params],
    queryFn: () => apiJson<PageOf<BlowerJson>>(`/api/shelf/blowers${queryString(params)}`),
    placeholderData: keepPreviousData,
  });
  const unit = system === "metric" ? "L/rev" : "in³/rev";
  const reset = <T,>(set: (v: T) => void) => (v: T) => {
    set(v);
    setPage(1);
  };
  const pct = (f: number) => `${Math.round(f * 100)} %`;

  async function remove(row: BlowerJson) {
    if (!window.confirm(`Remove ${row.partNumber} from the shelf?`)) return;
    try {
      await apiJson(`/api/shelf/blowers/${row.id}`, { method: "DELETE" });
      await qc.invalidateQueries({ queryKey: ["shelf"] });
      setMessage({ tone: "ok", text: `Removed ${row.partNumber}.` });
    } catch (e) {
      setMessage({ tone: "danger", text: e instanceof Error ? e.message : "Could not remove it." });
    }
  }

  const cols = isAdmin ? 10 : 9;
  return (
    <section aria-labelledby="blowers-heading" className="flex flex-col gap-3">
      <h2 id="blowers-heading" className="sr-only">
        Blowers
      </h2>
      <div className="flex flex-wrap items-end gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor="blower-search" className="text-sm font-medium">
            Search blowers
          </label>
          <input id="blower-search" type="search" value={search} onChange={(e) => reset(setSearch)(e.target.value)} placeholder="Name, part number or notes" className="rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm" />
        </div>
        <SelectField id="blower-kind" label="Kind" value={kind} onChange={reset(setKind)} options={[["", "Roots and twin-screw"], ["roots", "Roots"], ["twin-screw", "Twin-screw"]]} />
        <label className="flex items-center gap-2 pb-1.5 text-sm">
          <input type="checkbox" checked={inStock} onChange={(e) => reset(setInStock)(e.target.checked)} /> In stock only
        </label>
        <div className="ml-auto flex gap-2">
          <a href="/api/shelf/export?kind=blowers" className="rounded-md border border-line bg-panel px-3 py-1.5 text-sm font-medium hover:bg-bg" download>
            Export CSV
          </a>
          {isAdmin ? (
            <Button type="button" onClick={() => setEditing("new")}>
              Add blower
            </Button>
          ) : null}
        </div>
      </div>
      {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
      {editing ? (
        <BlowerForm
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
          <caption className="sr-only">Blowers on the shelf</caption>
          <thead className="border-b border-line">
            <tr>
              <SortHeader label="Part number" column="partNumber" state={sort} onChange={reset(setSort)} />
              <SortHeader label="Name" column="name" state={sort} onChange={reset(setSort)} />
              <th scope="col" className="px-2 py-1.5 text-left font-medium">
                Kind
              </th>
              <SortHeader label="Displacement" unit={unit} column="displacementPerRev" state={sort} onChange={reset(setSort)} align="right" />
              <th scope="col" className="px-2 py-1.5 text-right font-medium">
                Volume ratio
              </th>
              <SortHeader label="Speed limit" unit="rpm" column="maxRpm" state={sort} onChange={reset(setSort)} align="right" />
              <th scope="col" className="px-2 py-1.5 text-right font-medium" title="Reference volumetric efficiency at the reference speed; internal and drive efficiencies">
                Efficiencies <span className="font-normal text-muted">(VE @ rpm / internal / drive)</span>
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
            {q.data?.rows.map((b) => (
              <tr key={b.id} className="border-b border-line align-top last:border-0" data-part={b.partNumber}>
                <td className="px-2 py-1.5 font-mono text-xs">{b.partNumber}</td>
                <td className="px-2 py-1.5">
                  {b.name}
                  {b.notes ? <span className="block text-xs text-muted">{b.notes}</span> : null}
                </td>
                <td className="px-2 py-1.5">{b.kind === "roots" ? "Roots" : "Twin-screw"}</td>
                <td className="px-2 py-1.5 text-right">{fromSI("blower-displacement", b.displacementPerRev, system).toFixed(system === "metric" ? 2 : 0)}</td>
                <td className="px-2 py-1.5 text-right">{b.builtInVolumeRatio.toFixed(2)}</td>
                <td className="px-2 py-1.5 text-right">{Math.round(b.maxRpm).toLocaleString("en-US")}</td>
                <td className="px-2 py-1.5 text-right">
                  {pct(b.volumetricEfficiencyRef)} @ {Math.round(b.referenceRpm).toLocaleString("en-US")} / {pct(b.internalEfficiency)} / {pct(b.mechanicalEfficiency)}
                </td>
                <td className="px-2 py-1.5 text-right" data-testid="price">
                  {formatMoney(b.price)}
                </td>
                <td className={`px-2 py-1.5 text-right ${b.stock === 0 ? "text-danger" : ""}`}>{b.stock === 0 ? "0 (out)" : b.stock}</td>
                {isAdmin ? (
                  <td className="whitespace-nowrap px-2 py-1.5 text-right">
                    <Button type="button" variant="ghost" onClick={() => setEditing(b)} aria-label={`Edit ${b.partNumber}`}>
                      Edit
                    </Button>
                    <Button type="button" variant="ghost" onClick={() => remove(b)} aria-label={`Remove ${b.partNumber}`}>
                      Remove
                    </Button>
                  </td>
                ) : null}
              </tr>
            ))}
            {q.data && q.data.rows.length === 0 ? (
              <tr>
                <td colSpan={cols} className="px-2 py-4 text-center text-muted">
                  No blowers match.
                </td>
              </tr>
            ) : null}
            {q.isPending ? (
              <tr>
                <td colSpan={cols} className="px-2 py-4 text-center text-muted">
                  Loading…
                </td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>
      {q.data ? <Pager label="Blowers" page={page} pageSize={pageSize} total={q.data.total} onPage={setPage} /> : null}
    </section>
  );
}
