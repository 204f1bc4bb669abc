// @ts-nocheck
"use client";
// The shop's sheets, newest first, from GET /api/recommendations through react-query.
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import { fromSI, unitLabel, type UnitSystem } from "@/calc";
import { apiJson, queryString } from "@/components/client-json";
import { DataTable } from "@/components/ui/data-table";
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
      <DataTable
        caption="Recommendation sheets"
        rows={q.data?.rows}
        rowKey={(r) => r.id}
        loading={q.isFetching}
        empty="No sheets match."
        columns={[
          {
            label: "Customer",
            cell: (r) => (
              <>
                <Link href={`/recommendations/${r.id}`} className="font-medium underline">
                  {r.customerName}
                </Link>
                {r.title ? <span className="block text-xs">{r.title}</span> : null}
                {r.customerEmail ? <span className="block text-xs text-muted">{r.customerEmail}</span> : null}
              </>
            ),
          },
          {
            label: "Combination",
            cell: (r) => (
              <>
                {r.combinationName} <span className="text-xs text-muted">rev. {r.revision}</span>
              </>
            ),
          },
          { label: "Pulley", unit: unitLabel("length-small", unitSystem), align: "right", cell: (r) => fromSI("length-small", r.blowerPulleyDiameter, unitSystem).toFixed(digitsOf("length-small", unitSystem)) },
          { label: "Status", cellClassName: "capitalize", cell: (r) => r.status },
          { label: "Total", align: "right", cell: (r) => price(r.total) },
          { label: "Updated", cell: (r) => dates.date(r.updatedAt) },
          { label: "By", cell: (r) => r.authorName },
        ]}
      />
      {q.data ? <Pager label="Recommendations" page={page} pageSize={pageSize} total={q.data.total} onPage={setPage} /> : null}
    </div>
  );
}
