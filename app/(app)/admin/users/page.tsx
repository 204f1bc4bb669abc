import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/app/_lib/session";
import { UserAccessControls } from "@/components/admin/user-access-controls";
import { EmptyRow, HeadCells } from "@/components/ui/data-table";
import { setUserDisabledAction, setUserRoleAction } from "./actions";
import { getDb } from "@/db/client";
import { listUsers, toActor } from "@/db/repo/users";
import { dateText } from "@/lib/format/dates";
import { requestLocale } from "@/app/_lib/locale";

export const metadata: Metadata = { title: "Accounts" };

const PAGE_SIZE = 25;

export default async function AdminUsersPage({ searchParams }: { searchParams: Promise<{ q?: string; page?: string }> }) {
  const user = await requirePageUser(["admin"]);
  const locale = await requestLocale();
  const sp = await searchParams;
  const search = (sp.q ?? "").slice(0, 100);
  const page = Math.max(1, Math.min(10_000, Number.parseInt(sp.page ?? "1", 10) || 1));
  const { rows, total } = await listUsers(getDb(), toActor(user), { search: search || undefined, page, pageSize: PAGE_SIZE });
  const pages = Math.max(1, Math.ceil(total / PAGE_SIZE));
  const href = (p: number) => `/admin/users?${new URLSearchParams({ ...(search ? { q: search } : {}), page: String(p) })}`;

  return (
    <div className="flex flex-col gap-4">
      <div>
        <h1 className="text-2xl font-semibold">Accounts</h1>
        <p className="text-sm text-muted">
          Roles: a member keeps their own combinations; tuners and sales staff work on the shop&apos;s; instructors author
          lessons; admins keep the shelf and the accounts. A change applies on the person&apos;s next request.
        </p>
      </div>
      <form role="search" method="get" className="flex items-end gap-2">
        <label className="flex flex-col gap-1 text-sm font-medium">
          Search by name or e-mail
          <input type="search" name="q" defaultValue={search} maxLength={100} className="w-72 rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm font-normal" />
        </label>
        <button type="submit" className="rounded-md border border-line bg-panel px-3 py-1.5 text-sm font-medium hover:bg-bg">
          Search
        </button>
      </form>
      <div className="overflow-x-auto rounded-lg border border-line bg-panel">
        <table className="w-full text-sm">
          <caption className="sr-only">Accounts, page {page} of {pages}</caption>
          <thead className="border-b border-line text-left text-muted">
            <tr>
              <HeadCells cell="px-3 py-2 font-medium" columns={["Name", "E-mail", "Since", "Role and access"]} />
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.id} className="border-b border-line last:border-0 align-top">
                <td className="px-3 py-2">{r.name || <span className="text-muted">—</span>}</td>
                <td className="px-3 py-2">{r.email}</td>
                <td className="px-3 py-2 whitespace-nowrap tabular-nums">{dateText(r.createdAt, locale)}</td>
                <td className="px-3 py-2">
                  <UserAccessControls id={r.id} email={r.email} role={r.role} disabled={r.disabled} self={r.id === user.id} actions={{ setRole: setUserRoleAction, setDisabled: setUserDisabledAction }} />
                </td>
              </tr>
            ))}
            {rows.length === 0 ? (
              <EmptyRow colSpan={4}>No account matches “{search}”.</EmptyRow>
            ) : null}
          </tbody>
        </table>
      </div>
      <nav aria-label="Pages" className="flex items-center gap-3 text-sm">
        {page > 1 ? <Link href={href(page - 1)} className="underline">Previous</Link> : <span className="text-muted">Previous</span>}
        <span className="tabular-nums">
          Page {page} of {pages} · {total} account{total === 1 ? "" : "s"}
        </span>
        {page < pages ? <Link href={href(page + 1)} className="underline">Next</Link> : <span className="text-muted">Next</span>}
      </nav>
    </div>
  );
}
