// @ts-nocheck
// A log whose columns were guessed from values and German headings, stored through the
// repository in a real database: every row kept in SI, a kelvin column read as kelvin, and a
// column picked twice refused with the field named (as the route answers it, 400 with a dotted path).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ZodError } from "zod";
import { toFailure } from "@/app/_lib/errors";
import type { Actor } from "@/db/policy";
import { createCombination } from "@/db/repo/combinations";
import { createDatalog, getDatalogPoints } from "@/db/repo/datalogs";
import { workTruckV6 } from "@/lib/combinations/demo-specs";
import { guessMapping } from "@/lib/datalogs/guess-mapping";
import { guessLayout } from "@/lib/datalogs/parse";
import { freshDatabase, makeUser, type TestDb } from "../support/db";

/** An invented pull: time (s), engine speed, boost (bar gauge, with noise), intake air in `unit`. */
function germanLog(unit: "C" | "K", rows = 40): string {
  const lines = ["Zeit;Drehzahl;Ladedruck;Ansauglufttemperatur"];
  for (let i = 0; i < rows; i++) {
    const air = 30 + (i % 5) * 0.4 + (unit === "K" ? 273.15 : 0);
    lines.push([(i * 0.05).toFixed(2), String(2000 + i * 75), (0.2 + (0.5 * i) / rows + [0, 0.02, -0.01][i % 3]).toFixed(3), air.toFixed(2)].map((f) => f.replace(".", ",")).join(";"));
  }
  return lines.join("\n") + "\n";
}

describe("logs mapped by their values", () => {
  let t: TestDb;
  let member: Actor;
  let combinationId: string;
  const upload = (text: string, mapping = guessMapping(guessLayout(text), text)) => createDatalog(t.db, member, { combinationId, name: "Zug", fileName: "zug.csv", text, mapping });

  beforeAll(async () => {
    t = await freshDatabase();
    member = await makeUser(t.db, "member");
    combinationId = (await createCombination(t.db, member, { name: "member car", spec: workTruckV6 })).id;
  });
  afterAll(async () => {
    await t?.drop();
  });

  it("stores every row of a German semicolon log with the guessed mapping, in SI", async () => {
    const log = await upload(germanLog("C"));
    const points = await getDatalogPoints(t.db, member, log.id);
    expect(points).toHaveLength(40);
    // First data line "0,00;2000;0,200;30,00" with the combination's barometer (101 325 Pa):
    // 0.2 bar = 20 000 Pa (source: NIST SP 811, 1 bar = 100 kPa exactly); 30 °C = 303.15 K.
    expect(points[0]).toMatchObject({ rpm: 2000, time: 0 });
    expect(points[0].manifoldPressure).toBeCloseTo(101_325 + 20_000, 3);
    expect(points[0].intakeTemperature).toBeCloseTo(303.15, 6);
  });

  it("reads a kelvin column as kelvin when the values say so", async () => {
    const text = germanLog("K");
    const mapping = guessMapping(guessLayout(text), text);
    expect(mapping.temperatureUnit).toBe("K");
    const points = await getDatalogPoints(t.db, member, (await upload(text, mapping)).id);
    expect(points[0].intakeTemperature).toBeCloseTo(303.15, 6);
  });

  it("refuses a column picked twice with both fields named, on the later field", async () => {
    const text = germanLog("C");
    const err = await upload(text, { ...guessMapping(guessLayout(text), text), time: 1 }).catch((e) => e);
    expect(err).toBeInstanceOf(ZodError);
    const failure = toFailure(err);
    expect(failure.status).toBe(400);
    expect(failure.fieldErrors).toEqual({ "mapping.time": ["Column 2 is already used for engine speed; pick another column for time"] });
  });
});
