// @ts-nocheck
// A save cut off in the middle of its transaction leaves no partial rows: the combination row and
// its first revision are written together or not at all.
import { eq } from "drizzle-orm";
import pg from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { exampleCombination } from "@/calc";
import { createCombination } from "@/db/repo/combinations";
import { combinationRevisions, combinations } from "@/db/schema";
import { freshDatabase, makeUser, type TestDb } from "../support/db";

describe("interrupted saves", () => {
  let t: TestDb;
  beforeAll(async () => {
    t = await freshDatabase();
  });
  afterAll(async () => {
    await t?.drop();
  });

  it("a create whose connection dies mid-transaction leaves neither the combination nor a revision", async () => {
    const owner = await makeUser(t.db, "tuner");
    const blocker = new pg.Client({ connectionString: t.url });
    await blocker.connect();
    // Hold the revisions table so the save stops between its two inserts.
    await blocker.query("BEGIN");
    await blocker.query("LOCK TABLE combination_revisions IN ACCESS EXCLUSIVE MODE");
    const name = "interrupted-" + Date.now();
    const save = createCombination(t.db, owner, { name, spec: exampleCombination() });
    const saveOutcome = save.then(
      () => "saved",
      (e: Error) => e.message,
    );
    // Wait until the save is stuck on the lock, then kill its connection.
    let pid: number | undefined;
    for (let i = 0; i < 100 && !pid; i++) {
      const r = await blocker.query(
        "SELECT pid FROM pg_stat_activity WHERE datname = current_database() AND wait_event_type = 'Lock' AND pid <> pg_backend_pid()",
      );
      pid = r.rows[0]?.pid;
      if (!pid) await new Promise((r) => setTimeout(r, 50));
    }
    expect(pid, "the save should be waiting on the lock").toBeTypeOf("number");
    await blocker.query("SELECT pg_terminate_backend($1)", [pid]);
    await blocker.query("ROLLBACK");
    await blocker.end();
    expect(await saveOutcome).not.toBe("saved");

    const rows = await t.db.select().from(combinations).where(eq(combinations.name, name));
    expect(rows).toHaveLength(0);
    const revs = await t.db.select().from(combinationRevisions).where(eq(combinationRevisions.name, name));
    expect(revs).toHaveLength(0);

    // The pool recovers: the next save works.
    const ok = await createCombination(t.db, owner, { name: name + "-retry", spec: exampleCombination() });
    expect(ok.revision).toBe(1);
  });
});
