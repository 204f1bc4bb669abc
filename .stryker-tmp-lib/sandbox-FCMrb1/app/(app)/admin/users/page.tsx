// @ts-nocheck
import type { Metadata } from "next";
import { requirePageUser } from "@/app/_lib/session";
import { UserAccessControls } from "@/components/admin/user-access-controls";
import { DataTable } from "@/components/ui/data-table";
import { Pager } from "@/components/ui/pager";
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
      <DataTable
        caption={`Accounts, page ${page} of ${pages}`}
        density="roomy"
        headClassName="text-muted"
        rows={rows}
        rowKey={(r) => r.id}
        rowProps={() => ({ className: "align-top" })}
        empty={<>No account matches “{search}”.</>}
        columns={[
          { label: "Name", cell: (r) => r.name || <span className="text-muted">—</span> },
          { label: "E-mail", cell: (r) => r.email },
          { label: "Since", cellClassName: "whitespace-nowrap tabular-nums", cell: (r) => dateText(r.createdAt, locale) },
          {
            label: "Role and access",
            cell: (r) => (
              <UserAccessControls id={r.id} email={r.email} role={r.role} disabled={r.disabled} self={r.id === user.id} actions={{ setRole: setUserRoleAction, setDisabled: setUserDisabledAction }} />
            ),
          },
        ]}
      />
      <Pager label="Accounts" ariaLabel="Pages" page={page} pageSize={PAGE_SIZE} total={total} href={href} noun={["account", "accounts"]} />
    </div>
  );
}
