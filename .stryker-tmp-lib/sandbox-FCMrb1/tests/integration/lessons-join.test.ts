// @ts-nocheck
// The join form's server action against a real database: a wrong or malformed class code comes
// back as an error on the code field (the form shows it beside the field and keeps the text),
// and nobody signed out gets past the session check.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Actor } from "@/db/policy";
import { mockSession } from "../support/session-mock";
import { freshDatabase, makeUser, type TestDb } from "../support/db";

const ctx = mockSession();
const { joinLessonAction } = await import("@/app/(app)/lessons/actions");

const form = (code: string) => {
  const f = new FormData();
  f.set("code", code);
  return f;
};

describe("joining a lesson with a class code", () => {
  let t: TestDb;
  let member: Actor;
  beforeAll(async () => {
    t = await freshDatabase();
    ctx.db = t.db;
    member = await makeUser(t.db, "member");
  });
  afterAll(async () => {
    await t?.drop();
  });

  it("answers a wrong code with an error on the code field that names it", async () => {
    ctx.userId = member.id;
    const wrong = await joinLessonAction(undefined, form("QQQQQQ"));
    expect(wrong.ok).toBe(false);
    if (wrong.ok) return;
    expect(wrong.status).toBe(400);
    expect(Object.keys(wrong.fieldErrors ?? {})).toEqual(["code"]);
    expect(wrong.fieldErrors?.code[0]).toMatch(/class code/i);
    const short = await joinLessonAction(undefined, form("ab"));
    expect(!short.ok && short.fieldErrors?.code[0]).toBe("A class code has at least 4 characters.");
  });

  it("refuses anyone signed out before looking the code up", async () => {
    ctx.userId = null;
    const r = await joinLessonAction(undefined, form("QQQQQQ"));
    expect(!r.ok && r.status).toBe(401);
  });
});
