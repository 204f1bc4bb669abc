"use client";
// The shop's sheets, newest first, from GET /api/recommendations through react-query.
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import { fromSI, unitLabel, type UnitSystem } from "@/calc";
import { apiJson, queryString } from "@/components/client-json";
import { EmptyRow, HeadCells } from "@/components/ui/data-table";
import { Pager } from "@/components/ui/pager";
import { SelectField } from "@/components/ui/select-field";
import { Notice } from "@/components/ui/notice";
import { usePrice } from "@/components/price";
import { digitsOf } from "@/lib/units/format";
import { useDates } from "@/components/locale";

type Row = {
  id: string;
  title: string;
  customerName: string;
  customerEmail: string | null;
  status: string;
  total: string;
  blowerPulleyDiameter: number;
  revision: number;
  sentAt: string | null;
  updatedAt: string;
  combinationName: string;
  authorName: string;
};

export function RecommendationsList({ unitSystem }: { unitSystem: UnitSystem }) {
  const dates = useDates();
  const price = usePrice();
  const [search, setSearch] = useState("");
  const [status, setStatus] = useState("");
  const [page, setPage] = useState(1);
  const pageSize = 20;
  const params = { search: search.trim(), status, page, pageSize };
  const q = useQuery({
    queryKey: ["recommendations", params],
    queryFn: () => apiJson<{ rows: Row[]; total: number }>(`/api/recommendations${queryString(params)}`),
    placeholderData: keepPreviousData,
  });
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor="rec-search" className="text-sm font-medium">
            Search
          </label>
          <input
            id="rec-search"
            type="search"
            value={search}
            placeholder="Customer, title or combination"
            onChange={(e) => {
              setSearch(e.target.value);
              setPage(1);
            }}
            className="rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm"
          />
        </div>
        <SelectField
          id="rec-status"
          label="Status"
          value={status}
          onChange={(v) => {
            setStatus(v);
            setPage(1);
          }}
          options={[["", "Any"], ["draft", "Draft"], ["sent", "Sent"], ["accepted", "Accepted"], ["declined", "Declined"]]}
        />
      </div>
      {q.isError ? <Notice tone="danger">{q.error.message}</Notice> : null}
      <div className="relative overflow-x-auto rounded-md border border-line bg-panel">
        <table className="w-full text-sm" aria-busy={q.isFetching}>
          <caption className="sr-only">Recommendation sheets</caption>
          <thead className="border-b border-line text-left">
            <tr>
              <th scope="col" className="px-2 py-1.5 font-medium">Customer</th>
              <th scope="col" className="px-2 py-1.5 font-medium">Combination</th>
              <th scope="col" className="px-2 py-1.5 text-right font-medium">
                Pulley <span className="font-normal text-muted">({unitLabel("length-small", unitSystem)})</span>
              </th>
              <HeadCells cell="px-2 py-1.5 font-medium" columns={["Status", { label: "Total", right: true }, "Updated", "By"]} />
            </tr>
          </thead>
          <tbody>
            {q.data?.rows.map((r) => (
              <tr key={r.id} className="border-b border-line last:border-0">
                <td className="px-2 py-1.5">
                  <Link href={`/recommendations/${r.id}`} className="font-medium underline">
                    {r.customerName}
                  </Link>
                  {r.title ? <span className="block text-xs">{r.title}</span> : null}
                  {r.customerEmail ? <span className="block text-xs text-muted">{r.customerEmail}</span> : null}
                </td>
                <td className="px-2 py-1.5">
                  {r.combinationName} <span className="text-xs text-muted">rev. {r.revision}</span>
                </td>
                <td className="px-2 py-1.5 text-right">{fromSI("length-small", r.blowerPulleyDiameter, unitSystem).toFixed(digitsOf("length-small", unitSystem))}</td>
                <td className="px-2 py-1.5 capitalize">{r.status}</td>
                <td className="px-2 py-1.5 text-right">{price(r.total)}</td>
                <td className="px-2 py-1.5">{dates.date(r.updatedAt)}</td>
                <td className="px-2 py-1.5">{r.authorName}</td>
              </tr>
            ))}
            {q.data && q.data.rows.length === 0 ? (
              <EmptyRow colSpan={7} className="px-2 py-4 text-center text-muted">
                No sheets match.
              </EmptyRow>
            ) : null}
          </tbody>
        </table>
      </div>
      {q.data ? <Pager label="Recommendations" page={page} pageSize={pageSize} total={q.data.total} onPage={setPage} /> : null}
    </div>
  );
}
