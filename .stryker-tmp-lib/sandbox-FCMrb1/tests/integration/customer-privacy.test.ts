// @ts-nocheck
// Instructors read the shop's demo combinations to teach from, but the customers named on them are
// the shop's business: the name and contact are hidden from them in the list, the single read,
// the export, and a search on a customer's name finds nothing for them (a match would tell).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { exampleCombination } from "@/calc";
import { createCombination, exportCombinations, getCombination, listCombinations } from "@/db/repo/combinations";
import { freshDatabase, makeUser, type TestDb } from "../support/db";

let t: TestDb;
beforeAll(async () => {
  t = await freshDatabase();
});
afterAll(async () => {
  await t?.drop();
});

describe("customer details on shop combinations", () => {
  it("are hidden from instructors, shown to staff and to the owner", async () => {
    const tuner = await makeUser(t.db, "tuner");
    const instructor = await makeUser(t.db, "instructor");
    const row = await createCombination(t.db, tuner, { name: "Teaching example", customerName: "Quentin Quarry", customerContact: "quentin@example.com", spec: exampleCombination() }, { isDemo: true });

    const seenByInstructor = await getCombination(t.db, instructor, row.id);
    expect(seenByInstructor.name).toBe("Teaching example");
    expect(seenByInstructor.customerName).toBeNull();
    expect(seenByInstructor.customerContact).toBeNull();
    const listed = (await listCombinations(t.db, instructor, {})).items.find((i) => i.id === row.id);
    expect(listed).toBeTruthy();
    expect(listed).toMatchObject({ customerName: null, customerContact: null });
    expect((await listCombinations(t.db, instructor, { search: "Quarry" })).items).toEqual([]);
    expect((await listCombinations(t.db, instructor, { search: "quentin@" })).items).toEqual([]);
    const exported = await exportCombinations(t.db, instructor, [row.id]);
    expect(exported.combinations[0]).toMatchObject({ customerName: null, customerContact: null });

    const sales = await makeUser(t.db, "sales");
    expect(await getCombination(t.db, sales, row.id)).toMatchObject({ customerName: "Quentin Quarry", customerContact: "quentin@example.com" });
    expect((await listCombinations(t.db, sales, { search: "Quarry" })).items.map((i) => i.id)).toContain(row.id);
    expect(await getCombination(t.db, tuner, row.id)).toMatchObject({ customerName: "Quentin Quarry" });
  });
});
