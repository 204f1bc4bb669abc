// @ts-nocheck
// Free-text fields: trimmed, bounded, control characters refused, each message naming the field.
// The rules are the product's own (no outside source); PostgreSQL text cannot hold NUL (its docs).
import { describe, expect, it } from "vitest";
import { plainText, text } from "@/lib/validation/text";

const message = (r: { success: boolean; error?: { issues: { message: string }[] } }) => r.error?.issues[0]?.message;

describe("text", () => {
  it("trims, then allows exactly max characters and refuses one more, naming the field", () => {
    const name = text("Name", 5);
    expect(name.parse("  abcde  ")).toBe("abcde");
    const long = name.safeParse("abcdef");
    expect(long.success).toBe(false);
    expect(message(long)).toBe("Name must be at most 5 characters.");
    expect(message(name.safeParse(42))).toBe("Name must be text.");
  });
});

describe("plainText", () => {
  it("refuses NUL, other control characters and DEL; line breaks only when multiline", () => {
    const one = plainText("Title", 50);
    for (const bad of ["a\u0000b", "a\u0008b", "a\u000Bb", "a\u001Fb", "a\u007Fb", "a\nb", "a\rb", "a\tb"]) {
      const r = one.safeParse(bad);
      expect(r.success, JSON.stringify(bad)).toBe(false);
      expect(message(r)).toBe("Title must not contain control characters.");
    }
    expect(one.parse("Ported heads, 8 psi")).toBe("Ported heads, 8 psi");
    const many = plainText("Note", 50, { multiline: true });
    expect(many.parse("line one\nline two\r\n\tindented")).toBe("line one\nline two\r\n\tindented");
    for (const bad of ["a\u0000b", "a\u0008b", "a\u000Bb", "a\u000Cb", "a\u000Eb", "a\u001Fb", "a\u007Fb"]) expect(many.safeParse(bad).success, JSON.stringify(bad)).toBe(false);
    expect(many.safeParse("x".repeat(51)).success).toBe(false);
    // source: Unicode TR #36 §2.1: direction overrides and isolates make text display out of order
    for (const bad of ["a\u202Ab", "a\u202Eb", "a\u2066b", "a\u2069b"]) {
      const r = many.safeParse(bad);
      expect(r.success, JSON.stringify(bad)).toBe(false);
      expect(message(r)).toBe("Note must not contain text-direction override characters.");
    }
    expect(many.parse("a\u2065b\u202Fc")).toBe("a\u2065b\u202Fc");
  });
});
