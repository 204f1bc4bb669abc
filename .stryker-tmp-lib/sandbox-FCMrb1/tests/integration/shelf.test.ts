// @ts-nocheck
// The parts shelf against a real database: CSV import is all-or-nothing with per-line errors,
// size and column checks; the admin alone edits; the demo shelf seeds idempotently.
import { count, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { FieldError, ForbiddenError } from "@/lib/errors";
import { createPulley, deleteBlower, deletePulley, listBlowers, listPulleys, updatePulley } from "@/db/repo/shelf";
import { exportShelfCsv, importShelfCsv } from "@/db/repo/shelf-csv";
import { parseShelfCsv } from "@/lib/shelf/csv";
import { MAX_CSV_ROWS, PULLEY_CSV_COLUMNS } from "@/lib/shelf/rules";
import { blowers, pulleys } from "@/db/schema";
import { seedShelf } from "@/db/seed/shelf";
import { freshDatabase, makeUser, type TestDb } from "../support/db";

const HEADER = PULLEY_CSV_COLUMNS.join(",");
const row = (pn: string, diameterMm: number | string, price = "89.00", extra: Partial<{ position: string; ribs: string; stock: string; notes: string; min: string }> = {}) =>
  [pn, extra.position ?? "blower", diameterMm, extra.ribs ?? "8", extra.min ?? "71.12", price, extra.stock ?? "3", extra.notes ?? ""].join(",");

describe("parts shelf", () => {
  let t: TestDb;
  let admin: Awaited<ReturnType<typeof makeUser>>;
  let member: Awaited<ReturnType<typeof makeUser>>;
  const counts = async () => {
    const [[p], [b]] = await Promise.all([t.db.select({ n: count() }).from(pulleys), t.db.select({ n: count() }).from(blowers)]);
    return { pulleys: p.n, blowers: b.n };
  };

  beforeAll(async () => {
    t = await freshDatabase();
    admin = await makeUser(t.db, "admin");
    member = await makeUser(t.db, "member");
  });
  afterAll(async () => {
    await t?.drop();
  });

  describe("demo seed", () => {
    it("adds the invented shelf once, and a second run adds nothing and keeps the admin's edits", async () => {
      await seedShelf(t.db);
      const first = await counts();
      expect(first.blowers).toBeGreaterThanOrEqual(3);
      expect(first.pulleys).toBeGreaterThan(20);
      const [p] = await t.db.select().from(pulleys).where(eq(pulleys.partNumber, "PW-BP-0340-8"));
      // 3.40 in is 86.36 mm exactly (1 in = 25.4 mm, source: NIST SP 811, App. B).
      expect(p.diameter).toBeCloseTo(0.08636, 9);
      await t.db.update(pulleys).set({ price: "1.23" }).where(eq(pulleys.id, p.id));
      await seedShelf(t.db);
      expect(await counts()).toEqual(first);
      const [again] = await t.db.select().from(pulleys).where(eq(pulleys.id, p.id));
      expect(again.price).toBe("1.23");
      // Some sizes are out of stock, as the demo scenario asks.
      const out = await listPulleys(t.db, member, { inStock: "0", pageSize: 200 });
      expect(out.rows.some((r) => r.stock === 0)).toBe(true);
      const inStock = await listPulleys(t.db, member, { inStock: "1", pageSize: 200 });
      expect(inStock.rows.every((r) => r.stock > 0)).toBe(true);
    });
  });

  describe("reading", () => {
    it("everyone signed in reads, with search, filters, sort and pages", async () => {
      const page1 = await listPulleys(t.db, member, { position: "blower", ribCount: "8", sort: "diameter", dir: "desc", pageSize: 5 });
      expect(page1.rows).toHaveLength(5);
      expect(page1.rows.every((r) => r.position === "blower" && r.ribCount === 8)).toBe(true);
      const ds = page1.rows.map((r) => r.diameter);
      expect([...ds].sort((a, b) => b - a)).toEqual(ds);
      const page2 = await listPulleys(t.db, member, { position: "blower", ribCount: "8", sort: "diameter", dir: "desc", pageSize: 5, page: 2 });
      expect(page2.rows[0].diameter).toBeLessThan(ds[4]);
      expect(page2.total).toBe(page1.total);
      const found = await listBlowers(t.db, member, { search: "twin-screw" });
      expect(found.rows.length).toBeGreaterThan(0);
      expect(found.rows.every((b) => b.kind === "twin-screw")).toBe(true);
    });

    it("a bad query names the parameter", async () => {
      await expect(listPulleys(t.db, member, { sort: "colour" as never })).rejects.toThrow(/sort must be/);
    });
  });

  describe("role rules", () => {
    // Every role but admin is refused every shelf write (db/policy.ts canEditShelf; design.md).
    for (const role of ["member", "tuner", "sales", "instructor"] as const) {
      it(`a ${role} may not add, change, delete or import a part, and nothing changes`, async () => {
        const actor = role === "member" ? member : await makeUser(t.db, role);
        const before = await counts();
        await expect(createPulley(t.db, actor, { partNumber: "PW-BP-9999-8", position: "blower", diameter: 0.08, ribCount: 8, price: "10.00", stock: 1 })).rejects.toBeInstanceOf(ForbiddenError);
        const [p] = await t.db.select().from(pulleys).limit(1);
        await expect(updatePulley(t.db, actor, p.id, { ...p, price: "0.01" })).rejects.toBeInstanceOf(ForbiddenError);
        await expect(deletePulley(t.db, actor, p.id)).rejects.toBeInstanceOf(ForbiddenError);
        const [b] = await t.db.select().from(blowers).limit(1);
        await expect(deleteBlower(t.db, actor, b.id)).rejects.toBeInstanceOf(ForbiddenError);
        await expect(importShelfCsv(t.db, actor, "pulleys", `${HEADER}\n${row("PW-BP-7777-8", 80)}`, { commit: true })).rejects.toBeInstanceOf(ForbiddenError);
        expect(await counts()).toEqual(before);
        const [same] = await t.db.select().from(pulleys).where(eq(pulleys.id, p.id));
        expect(same.price).toBe(p.price);
      });
    }

    it("the admin edits; prices come back as exact two-decimal strings", async () => {
      const [p] = await t.db.select().from(pulleys).where(eq(pulleys.partNumber, "PW-BP-0310-8"));
      const saved = await updatePulley(t.db, admin, p.id, { ...p, price: "104.1" });
      expect(saved.price).toBe("104.10");
      await expect(createPulley(t.db, admin, { partNumber: p.partNumber, position: "blower", diameter: 0.08, ribCount: 8, price: "1", stock: 0 })).rejects.toThrow(/already on the shelf/);
    });
  });

  describe("CSV import", () => {
    it("a good file: preview writes nothing, commit upserts every row by part number", async () => {
      const before = await counts();
      const csv = [HEADER, row("PW-BP-0275-8", 69.85, "99.50"), row("PW-BP-0285-8", 72.39, "98.00", { notes: '"Polished, with ""lip"""' }), row("PW-BP-0310-8", 78.74, "77.70")].join("\n");
      const preview = await importShelfCsv(t.db, admin, "pulleys", csv, { commit: false });
      expect(preview.errors).toEqual([]);
      expect(preview.rows.map((r) => r.line)).toEqual([2, 3, 4]);
      expect(preview.committed).toBe(false);
      expect(await counts()).toEqual(before);

      const done = await importShelfCsv(t.db, admin, "pulleys", csv, { commit: true });
      expect(done.committed).toBe(true);
      expect(done.inserted).toBe(2);
      expect(done.updated).toBe(1);
      expect((await counts()).pulleys).toBe(before.pulleys + 2);
      const [updated] = await t.db.select().from(pulleys).where(eq(pulleys.partNumber, "PW-BP-0310-8"));
      expect(updated.price).toBe("77.70");
      const [quoted] = await t.db.select().from(pulleys).where(eq(pulleys.partNumber, "PW-BP-0285-8"));
      expect(quoted.notes).toBe('Polished, with "lip"');
      expect(quoted.diameter).toBeCloseTo(0.07239, 12);
    });

    it("bad rows: every problem with its line number and column, and nothing is written", async () => {
      const before = await counts();
      const [snapshot] = await t.db.select().from(pulleys).where(eq(pulleys.partNumber, "PW-BP-0310-8"));
      const csv = [
        HEADER,
        row("PW-BP-0410-8", 104.14, "89.00"), // line 2: fine
        row("PW-BP-0420-8", 106.68, "12,50".replace(",", ";")), // line 3: bad price
        "", // line 4: blank, skipped
        row("PW-BP-0430-8", 2000, "89.00"), // line 5: 2 m pulley
        row("PW-BP-0440-8", 111.76, "89.00", { position: "idler" }), // line 6
        row("PW-BP-0410-8", 104.14, "89.00"), // line 7: duplicate of line 2
        row("PW-BP-0310-8", 78.74, "1.00", { stock: "-1" }), // line 8: would change an existing row
        '"PW-BP-0450-8",blower,114.3,8,,89.00,1,"two', // line 9-10: notes span two lines
        'lines"',
        row("PW-BP-0460-8", 116.84, "89.00", { ribs: "eight" }), // line 11
      ].join("\n");
      const preview = await importShelfCsv(t.db, admin, "pulleys", csv, { commit: false });
      const at = (line: number) => preview.errors.filter((e) => e.line === line);
      expect(at(3)[0]).toMatchObject({ column: "price" });
      expect(at(5)[0]).toMatchObject({ column: "diameter_mm" });
      expect(at(5)[0].message).toMatch(/30 and 500 mm/);
      expect(at(6)[0]).toMatchObject({ column: "position" });
      expect(at(7)[0].message).toMatch(/already on line 2/);
      expect(at(8)[0]).toMatchObject({ column: "stock" });
      expect(at(11)[0]).toMatchObject({ column: "rib_count" });
      expect(preview.errors.map((e) => e.line).sort((a, b) => a - b)).toEqual([3, 5, 6, 7, 8, 11]);
      expect(preview.rows.map((r) => r.line)).toEqual([2, 9]);

      const commit = await importShelfCsv(t.db, admin, "pulleys", csv, { commit: true });
      expect(commit.committed).toBe(false);
      expect(await counts()).toEqual(before);
      const [after] = await t.db.select().from(pulleys).where(eq(pulleys.partNumber, "PW-BP-0310-8"));
      expect(after).toEqual(snapshot);
    });

    it("a file over 1 MB or over the row limit is refused with a clear message, and nothing is written", async () => {
      const before = await counts();
      const big = HEADER + "\n" + Array.from({ length: 14_000 }, (_, i) => row(`PW-BIG-${i}`, 80, "10.00", { notes: "x".repeat(40) })).join("\n");
      expect(Buffer.byteLength(big)).toBeGreaterThan(1_000_000);
      const err = await importShelfCsv(t.db, admin, "pulleys", big, { commit: true }).catch((e) => e);
      expect(err).toBeInstanceOf(FieldError);
      expect(err.field).toBe("file");
      expect(err.message).toMatch(/limit is 1 MB/);
      const many = HEADER + "\n" + Array.from({ length: MAX_CSV_ROWS + 1 }, (_, i) => row(`PW-R-${i}`, 80)).join("\n");
      expect(Buffer.byteLength(many)).toBeLessThan(1_000_000);
      await expect(importShelfCsv(t.db, admin, "pulleys", many, { commit: true })).rejects.toThrow(/more than 5,000 rows/);
      expect(await counts()).toEqual(before);
    });

    it("wrong columns: the message lists what is missing, what is unknown and what is expected", async () => {
      const before = await counts();
      const err = await importShelfCsv(t.db, admin, "pulleys", "part,diameter_in,price\nPW-1,3.4,9.99", { commit: true }).catch((e) => e);
      expect(err).toBeInstanceOf(FieldError);
      expect(err.message).toMatch(/missing part_number, position, diameter_mm, rib_count, stock;/);
      expect(err.message).toMatch(/unknown part, diameter_in/);
      expect(err.message).toContain(`Expected columns: ${PULLEY_CSV_COLUMNS.join(", ")}`);
      // A blower file sent as pulleys is also a column problem, not a crash.
      await expect(importShelfCsv(t.db, admin, "blowers", csvOfPulleys(), { commit: false })).rejects.toThrow(/do not match a blower file/);
      expect(await counts()).toEqual(before);
    });

    it("export then import gives back the same shelf", async () => {
      const csv = await exportShelfCsv(t.db, member, "pulleys");
      const back = parseShelfCsv("pulleys", csv);
      expect(back.errors).toEqual([]);
      const rows = await t.db.select().from(pulleys);
      expect(back.rows).toHaveLength(rows.length);
      for (const r of back.rows) {
        const db = rows.find((x) => x.partNumber === r.record.partNumber)!;
        expect(r.record.price).toBe(db.price);
        expect(r.record.diameter).toBeCloseTo(db.diameter, 9);
        expect(r.record.stock).toBe(db.stock);
      }
      const blowerCsv = await exportShelfCsv(t.db, member, "blowers");
      const blowersBack = parseShelfCsv("blowers", blowerCsv);
      expect(blowersBack.errors).toEqual([]);
      expect(blowersBack.rows.length).toBe((await counts()).blowers);
    });

    it("a spreadsheet formula in the notes is defused on export and restored on import", async () => {
      const [p] = await t.db.select().from(pulleys).limit(1);
      await updatePulley(t.db, admin, p.id, { ...p, notes: "=HYPERLINK(1)" });
      const csv = await exportShelfCsv(t.db, admin, "pulleys");
      expect(csv).toContain("'=HYPERLINK(1)");
      const back = parseShelfCsv("pulleys", csv).rows.find((r) => r.record.partNumber === p.partNumber)!;
      expect(back.record.notes).toBe("=HYPERLINK(1)");
    });
  });
});

function csvOfPulleys() {
  return `${HEADER}\n${row("PW-BP-0500-8", 127)}`;
}
