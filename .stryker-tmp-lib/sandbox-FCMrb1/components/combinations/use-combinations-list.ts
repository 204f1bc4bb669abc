// @ts-nocheck
"use client";
// The combinations list's query and mutations: GET /api/combinations with react-query (paginated,
// searchable, sortable); changes through the server actions, which call the same repository.
import { keepPreviousData, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useEffect, useState } from "react";
import { ApiError, apiJson } from "@/components/client-json";
import type { Role } from "@/db/schema";
import type { ActionState } from "@/lib/action-state";

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
export type ListAnswer = { items: ListedCombination[]; total: number; page: number; pageSize: number };
export type Sort = "updatedAt" | "name" | "displacement" | "blowerPulleyDiameter";
export type Scope = "" | "mine" | "shop" | "demo";

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
export async function must<T>(p: Promise<ActionResult<T>>): Promise<T | undefined> {
  const r = await p;
  if (!r.ok) throw new Error(r.message);
  return r.data;
}

export function useCombinationsList(role: Role, actions: CombinationListActions) {
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

  return { staff, searchText, setSearchText, search, sort, setSort, dir, setDir, scope, setScope, page, setPage, notice, setNotice, list, refresh, duplicate, remove, undo, data, pages, scopes };
}
