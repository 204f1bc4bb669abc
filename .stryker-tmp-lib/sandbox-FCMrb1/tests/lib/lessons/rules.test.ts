// @ts-nocheck
// A lesson's input rules without a database: each message names its field, the limits on items
// and series hold on both sides, and a class code is read the way people type it.
import { describe, expect, it } from "vitest";
import { exampleCombination } from "@/calc";
import { LESSON_SERIES, copySchema, joinSchema, lessonMetaSchema, moveSchema, stepInputSchema, stepItemInputSchema, stepItemSnapshotSchema, updateLessonSchema } from "@/lib/lessons/rules";

const ID = "00000000-0000-4000-8000-000000000001";
const it1 = { combinationId: ID, revision: "current", label: "Stock" };
const it2 = { combinationId: ID, revision: "2", label: "Smaller pulley" };
const first = (r: { error?: { issues: { path: PropertyKey[]; message: string }[] } }) => r.error?.issues[0];

describe("lesson records", () => {
  it("a title is required and at most 120 characters; the summary defaults to empty, notes keep line breaks", () => {
    expect(lessonMetaSchema.parse({ title: " Pulleys " })).toEqual({ title: "Pulleys", summary: "" });
    expect(first(lessonMetaSchema.safeParse({ title: "" }))?.message).toBe("Give the lesson a title.");
    expect(lessonMetaSchema.safeParse({ title: "x".repeat(120) }).success).toBe(true);
    expect(first(lessonMetaSchema.safeParse({ title: "x".repeat(121) }))?.message).toBe("Title must be at most 120 characters.");
    expect(lessonMetaSchema.parse({ title: "T", summary: "two\nlines" }).summary).toBe("two\nlines");
    expect(first(lessonMetaSchema.safeParse({ title: "T\u0000" }))?.message).toBe("Title must not contain control characters.");
    expect(first(updateLessonSchema.safeParse({ published: "yes" }))?.message).toBe("published must be true or false.");
    expect(first(updateLessonSchema.safeParse({ title: "" }))?.message).toBe("Give the lesson a title.");
    expect(updateLessonSchema.parse({})).toEqual({});
  });

  it("an item is a combination id, a revision (a number from 1, or current) and a label of at most 40 characters", () => {
    // No what-if given: the item is shown as built (change null).
    expect(stepItemInputSchema.parse(it2)).toEqual({ ...it2, revision: 2, change: null });
    expect(stepItemInputSchema.parse(it1).revision).toBe("current");
    expect(first(stepItemInputSchema.safeParse({ ...it1, combinationId: "x" }))).toMatchObject({ path: ["combinationId"], message: "Pick a combination." });
    expect(first(stepItemInputSchema.safeParse({ ...it1, revision: "0" }))?.path).toEqual(["revision"]);
    expect(stepItemInputSchema.safeParse({ ...it1, revision: "1" }).success).toBe(true);
    expect(first(stepItemInputSchema.safeParse({ ...it1, label: "" }))?.message).toBe("Give the item a short label.");
    expect(stepItemInputSchema.safeParse({ ...it1, label: "x".repeat(40) }).success).toBe(true);
    expect(stepItemInputSchema.safeParse({ ...it1, label: "x".repeat(41) }).success).toBe(false);
  });

  it("a step compares two to four items, shows at least one series (repeats folded) and keeps its note", () => {
    const step = { title: "Pulleys", items: [it1, it2], series: ["boost", "boost", "torque"] };
    expect(stepInputSchema.parse(step)).toMatchObject({ series: ["boost", "torque"], note: "" });
    expect(stepInputSchema.safeParse({ ...step, items: [it1, it2, it1, it2] }).success).toBe(true);
    expect(first(stepInputSchema.safeParse({ ...step, items: [it1] }))).toMatchObject({ path: ["items"], message: "A step compares at least two items." });
    expect(first(stepInputSchema.safeParse({ ...step, items: [it1, it2, it1, it2, it1] }))?.message).toBe("A step compares at most four items.");
    expect(first(stepInputSchema.safeParse({ ...step, series: [] }))?.message).toBe("Pick at least one chart series.");
    expect(first(stepInputSchema.safeParse({ ...step, series: ["lap-time"] }))?.message).toBe(`Series must be one of ${LESSON_SERIES.join(", ")}.`);
    expect(first(stepInputSchema.safeParse({ ...step, title: "" }))?.message).toBe("Give the step a title (without a number: steps are numbered for you).");
  });

  it("a snapshot holds a valid spec and a revision from 1", () => {
    const snap = { combinationId: ID, revision: 1, label: "A", name: "A", spec: exampleCombination() };
    expect(stepItemSnapshotSchema.safeParse(snap).success).toBe(true);
    expect(stepItemSnapshotSchema.safeParse({ ...snap, revision: 0 }).success).toBe(false);
  });
});

describe("joining and moving", () => {
  it("a class code is read upper-cased without spaces or dashes, 4–12 letters and digits", () => {
    expect(joinSchema.parse({ code: "ab-12 cd" })).toEqual({ code: "AB12CD" });
    expect(joinSchema.safeParse({ code: "ab1" }).error?.issues[0].message).toBe("A class code has at least 4 characters.");
    expect(joinSchema.safeParse({ code: "abcd" }).success).toBe(true);
    expect(joinSchema.safeParse({ code: "a".repeat(12) }).success).toBe(true);
    expect(joinSchema.safeParse({ code: "a".repeat(13) }).error?.issues[0].message).toBe("A class code has at most 12 characters.");
    expect(joinSchema.safeParse({ code: "abc!" }).error?.issues[0].message).toBe("A class code has only letters and digits.");
    expect(joinSchema.safeParse({}).error?.issues[0].message).toBe("Type the class code.");
  });

  it("a step moves up or down; an item to copy is 0–3", () => {
    expect(moveSchema.parse({ direction: "up" })).toEqual({ direction: "up" });
    expect(moveSchema.safeParse({ direction: "left" }).error?.issues[0].message).toBe("direction must be up or down.");
    expect([0, 3].map((item) => copySchema.safeParse({ item }).success)).toEqual([true, true]);
    expect([-1, 4, 1.5].map((item) => copySchema.safeParse({ item }).success)).toEqual([false, false, false]);
    expect(copySchema.safeParse({ item: "1" }).error?.issues[0].message).toBe("item must be the item's number (0 for the first).");
  });
});
