// @ts-nocheck
// The one data table and the one pager, rendered to markup: what every list relies on (caption,
// hidden columns, the empty row, sort state for screen readers, links or buttons in the pager).
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { DataTable, type Column } from "@/components/ui/data-table";
import { Pager } from "@/components/ui/pager";

type Row = { id: string; name: string; size: number };
const rows: Row[] = [
  { id: "a", name: "First", size: 3.4 },
  { id: "b", name: "Second", size: 2.9 },
];
const columns = (staff: boolean): (Column<Row, "name" | "size"> | false)[] => [
  { label: "Name", sortBy: "name", cell: (r) => r.name },
  staff && { label: "Owner", cell: () => "shop" },
  { label: "Size", unit: "in", align: "right", sortBy: "size", cell: (r) => r.size.toFixed(2), testId: "size" },
];
/** Markup with React's text separators taken out, so the checks read as the page does. */
const markup = (el: Parameters<typeof renderToStaticMarkup>[0]) => renderToStaticMarkup(el).replace(/<!-- -->/g, "");
const html = (props: Parameters<typeof DataTable<Row, "name" | "size">>[0]) => markup(createElement(DataTable<Row, "name" | "size">, props));
const base = { rows, rowKey: (r: Row) => r.id, caption: "Pulleys on the shelf", empty: "Nothing matches." };

describe("DataTable", () => {
  it("renders a caption, one header per visible column and one cell per row and column", () => {
    const out = html({ ...base, columns: columns(false) });
    expect(out).toContain('<caption class="sr-only">Pulleys on the shelf</caption>');
    expect(out.match(/<th /g)).toHaveLength(2);
    expect(out).not.toContain("Owner");
    expect(out.match(/<tr /g)?.length ?? 0).toBe(2);
    expect(out).toContain('data-testid="size">3.40</td>');
    expect(out).toContain("(in)");
    expect(html({ ...base, columns: columns(true) }).match(/<th /g)).toHaveLength(3);
  });

  it("shows the empty state across every column, and a loading row before the first rows arrive", () => {
    const empty = html({ ...base, rows: [], columns: columns(true) });
    expect(empty).toMatch(/<td colSpan="3"[^>]*>Nothing matches\.<\/td>/);
    const loading = html({ ...base, rows: undefined, loading: true, columns: columns(true) });
    expect(loading).toContain("Loading…");
    expect(loading).toContain('aria-busy="true"');
    expect(html({ ...base, columns: columns(true) })).not.toContain("Nothing matches.");
  });

  it("makes sortable headers buttons with aria-sort only when the table is given a sort", () => {
    const plain = html({ ...base, columns: columns(false) });
    expect(plain).not.toContain("aria-sort");
    const sorted = html({ ...base, columns: columns(false), sort: { state: { sort: "size", dir: "desc" }, onChange: () => {} } });
    expect(sorted).toContain('aria-sort="descending"');
    expect(sorted).toContain('aria-sort="none"');
    expect(sorted.match(/<button/g)).toHaveLength(2);
  });

  it("lets rows with their own state lay out their <tr>, and passes row attributes through", () => {
    const own = html({ ...base, columns: columns(false), renderRow: (r) => createElement("tr", { key: r.id, "data-own": r.id }) });
    expect(own).toContain('data-own="a"');
    expect(own).not.toContain("3.40");
    const attrs = html({ ...base, columns: columns(false), rowProps: (r) => ({ "data-part": r.id, className: "align-top" }) });
    expect(attrs).toMatch(/<tr data-part="b" class="[^"]*align-top"/);
  });
});

describe("Pager", () => {
  it("counts pages and items, and links the neighbours on a server page", () => {
    const out = markup(createElement(Pager, { label: "Orders", page: 2, pageSize: 10, total: 25, href: (p: number) => `/orders?page=${p}`, noun: ["order", "orders"] }));
    expect(out).toContain('aria-label="Orders pages"');
    expect(out).toContain("Page 2 of 3 · 25 orders");
    expect(out).toContain('href="/orders?page=1"');
    expect(out).toContain('href="/orders?page=3"');
  });

  it("disables the step past either end", () => {
    const links = markup(createElement(Pager, { label: "Accounts", page: 1, pageSize: 25, total: 1, href: (p: number) => `?page=${p}`, noun: ["account", "accounts"] }));
    expect(links).not.toContain("href=");
    expect(links.match(/aria-disabled="true"/g)).toHaveLength(2);
    expect(links).toContain("1 account");
    const buttons = markup(createElement(Pager, { label: "Sheets", page: 3, pageSize: 10, total: 30, onPage: () => {} }));
    expect(buttons.match(/<button[^>]*disabled=""/g)).toHaveLength(1);
  });
});
