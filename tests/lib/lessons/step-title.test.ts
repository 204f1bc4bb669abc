// Steps are numbered for the author: a typed leading "1." (or "Step 2:", "3)") is left out so the
// list never reads "1. 1."; a title that is only a number is refused; "2.8 in pulley" is kept.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { stepInputSchema, stripStepNumber } from "@/lib/lessons/rules";

const input = (title: string) => ({
  title,
  items: [
    { combinationId: "00000000-0000-4000-8000-000000000001", revision: "current", label: "A" },
    { combinationId: "00000000-0000-4000-8000-000000000002", revision: 1, label: "B" },
  ],
  series: ["boost"],
});

describe("step titles", () => {
  it("strip a typed leading number", () => {
    expect(stripStepNumber("1. Intro")).toBe("Intro");
    expect(stripStepNumber("1. 1. Intro")).toBe("Intro");
    expect(stripStepNumber("Step 2: smaller pulley")).toBe("smaller pulley");
    expect(stripStepNumber("3) Cam change")).toBe("Cam change");
    expect(stepInputSchema.parse(input(" 4. Heat")).title).toBe("Heat");
  });

  it("keep titles that only start with a figure", () => {
    for (const t of ["2.8 in pulley", "3.0 L engine", "4500 rpm", "1,000 ft higher", "Intro"]) expect(stripStepNumber(t)).toBe(t);
  });

  it("strip only at the very start, with spaces or none around the number and its mark", () => {
    // A number inside the title, or right after a word ("V8:"), is part of the title.
    for (const t of ["Try 2. pulleys", "Pulleys, part 2: smaller", "V8: more boost", "Lap3) again"]) expect(stripStepNumber(t)).toBe(t);
    expect(stripStepNumber("Step2: Intro")).toBe("Intro");
    expect(stripStepNumber("step   7 - Intro")).toBe("Intro");
    expect(stripStepNumber("3 - Cam change")).toBe("Cam change");
    expect(stripStepNumber("5 . Heat")).toBe("Heat");
    expect(stripStepNumber("6 — Heat")).toBe("Heat");
  });

  it("refuse a title that is only a number, naming the field", () => {
    const r = stepInputSchema.safeParse(input("1."));
    expect(r.success).toBe(false);
    expect(r.error?.issues[0].path).toEqual(["title"]);
    expect(r.error?.issues[0].message).toMatch(/numbered for you/);
  });

  it("strip at most the prefix: idempotent, and the rest of the title is kept", () => {
    fc.assert(
      fc.property(fc.nat(99), fc.string({ minLength: 1, maxLength: 30 }).filter((s) => /^[A-Za-z]/.test(s) && !/^step\s*\d/i.test(s)), (n, rest) => {
        expect(stripStepNumber(`${n}. ${rest}`)).toBe(rest);
        expect(stripStepNumber(stripStepNumber(`${n}. ${rest}`))).toBe(stripStepNumber(`${n}. ${rest}`));
      }),
    );
  });
});
