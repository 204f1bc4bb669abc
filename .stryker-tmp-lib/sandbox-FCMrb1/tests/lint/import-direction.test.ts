// @ts-nocheck
// The import direction (app → components → lib/db → calc) is enforced by eslint.config.mjs;
// these cases prove the rule fires where it must and stays quiet where imports are allowed.
import path from "node:path";
import { ESLint } from "eslint";
import { beforeAll, describe, expect, it } from "vitest";

const root = path.resolve(import.meta.dirname, "../..");
let eslint: ESLint;
beforeAll(() => {
  eslint = new ESLint({ cwd: root });
});

async function restricted(file: string, code: string): Promise<number> {
  const [result] = await eslint.lintText(code, { filePath: path.join(root, file) });
  return result.messages.filter((m) => m.ruleId === "no-restricted-imports").length;
}

describe("import direction", () => {
  it.each([
    ["components/x/probe.ts", 'import { act } from "@/app/_lib/action";'],
    ["db/repo/probe.ts", 'import { Button } from "@/components/ui/button";'],
    ["db/repo/probe.ts", 'import { requireActor } from "../../app/_lib/session";'],
    ["lib/x/probe.ts", 'import { getDb } from "@/db/client";'],
    ["lib/x/probe.ts", 'import { useState } from "react";'],
    ["lib/x/probe.ts", 'import { notFound } from "next/navigation";'],
    ["calc/probe.ts", 'import { text } from "@/lib/validation/text";'],
    ["calc/probe.ts", 'import Decimal from "decimal.js";'],
  ])("refuses %s → %s", async (file, code) => {
    expect(await restricted(file, code)).toBe(1);
  });

  it.each([
    ["app/x/probe.ts", 'import { Button } from "@/components/ui/button";'],
    ["components/x/probe.ts", 'import { figure } from "@/lib/units/format";'],
    ["db/repo/probe.ts", 'import { text } from "@/lib/validation/text";'],
    ["lib/x/probe.ts", 'import { solvePoint } from "@/calc";'],
    ["calc/probe.ts", 'import { z } from "zod";\nimport { solvePoint } from "./solve";'],
  ])("allows %s → %s", async (file, code) => {
    expect(await restricted(file, code)).toBe(0);
  });
});
