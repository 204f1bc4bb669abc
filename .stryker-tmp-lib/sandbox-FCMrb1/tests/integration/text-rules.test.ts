// @ts-nocheck
// Names and titles refuse bidirectional override and isolate characters (U+202A–U+202E,
// U+2066–U+2069; source: Unicode Technical Report #36 "Unicode Security Considerations" §2.1 and
// the Unicode Bidirectional Algorithm, UAX #9 §2), which make a name display as something else.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { exampleCombination } from "@/calc";
import { createCombinationSchema } from "@/db/repo/combinations";
import { lessonMetaSchema } from "@/lib/lessons/rules";
import { recommendationInputSchema } from "@/lib/recommendations/rules";
import { BIDI_CONTROL, plainText } from "@/lib/validation/text";

const OVERRIDES = ["\u202A", "\u202B", "\u202C", "\u202D", "\u202E", "\u2066", "\u2067", "\u2068", "\u2069"];

describe("direction-override characters", () => {
  it.each(OVERRIDES.map((c) => [`U+${c.codePointAt(0)!.toString(16).toUpperCase()}`, c]))("%s is refused in a combination name, a lesson title and a customer's name", (_code, c) => {
    const name = `invoice${c}fdp.exe`;
    expect(createCombinationSchema.safeParse({ name, spec: exampleCombination() }).success).toBe(false);
    expect(lessonMetaSchema.safeParse({ title: name }).success).toBe(false);
    const rec = recommendationInputSchema.safeParse({ combinationId: "0b6c7a3e-2f4d-4c1a-9a57-5f2e8d1c0b9a", customerName: name, blowerPulleyDiameter: 0.08 });
    expect(rec.success).toBe(false);
  });

  it("ordinary text in any script passes, including right-to-left letters (property)", () => {
    fc.assert(
      fc.property(fc.string({ unit: fc.constantFrom("a", "Z", " ", "é", "ß", "ø", "日", "ש", "ع", "-", "'", "1") , maxLength: 40 }), (s) => {
        expect(BIDI_CONTROL.test(s)).toBe(false);
        expect(plainText("Name", 100).safeParse(s).success).toBe(true);
      }),
    );
  });
});
