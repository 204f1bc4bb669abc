// @ts-nocheck
// Calibration from several logs of one combination against the real database: logs made by the
// model from a known truth at two blower pulleys (two revisions), fitted together through the
// calibrate route's repository call; the new revision holds the fitted slip and gives back the
// logged boost. Tolerances from issue 14 (slip within 0.03), the author's.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { combinationSchema, trySolvePoint, type Combination } from "@/calc";
import type { Actor } from "@/db/policy";
import { createCombination, getCombination, listRevisions, saveCombination } from "@/db/repo/combinations";
import { calibrateFromDatalog, createDatalog } from "@/db/repo/datalogs";
import { DEMO_DATALOG_MAPPING } from "@/db/seed/datalogs";
import { workTruckV6 } from "@/lib/combinations/demo-specs";
import { freshDatabase, makeUser, type TestDb } from "../support/db";

// source: NIST SP 811, 1 psi = 6894.757 Pa
const PSI = 6894.757;
const base = combinationSchema.parse(workTruckV6);
const truth: Combination = { ...base, blower: { ...base.blower, volumetricEfficiencyRef: base.blower.volumetricEfficiencyRef - 0.08 } };
const d0 = base.drive.blowerPulleyDiameter;
const d1 = d0 - 0.00508;

/** A wide-open-throttle pull in the demo log's layout, boost from the truth at this pulley. */
function pullCsv(diameter: number): string {
  const spec = { ...truth, drive: { ...truth.drive, blowerPulleyDiameter: diameter } };
  const rows = ["Time (s),Engine speed (rpm),Throttle (%),Boost (psi),Intake air (°F)"];
  for (let i = 0, rpm = 2500; rpm <= 5000; rpm += 25, i++) rows.push(`${(i / 10).toFixed(2)},${rpm},99.0,${(trySolvePoint(spec, rpm)!.boostGauge / PSI).toFixed(4)},95.0`);
  return rows.join("\n") + "\n";
}

describe("calibrating from a combination's logs at two pulleys", () => {
  let t: TestDb;
  let member: Actor, other: Actor;
  beforeAll(async () => {
    t = await freshDatabase();
    [member, other] = await Promise.all([makeUser(t.db, "member"), makeUser(t.db, "member")]);
  });
  afterAll(async () => {
    await t?.drop();
  });

  it("fits the slip and VE, saves them with a note naming the logs, and refuses another combination's log", async () => {
    const combo = await createCombination(t.db, member, { name: "two pulleys", spec: base });
    const upload = (name: string, d: number) => createDatalog(t.db, member, { combinationId: combo.id, name, fileName: `${name}.csv`, text: pullCsv(d), mapping: { ...DEMO_DATALOG_MAPPING } });
    const a = await upload("big pulley", d0);
    await saveCombination(t.db, member, combo.id, { spec: { ...base, drive: { ...base.drive, blowerPulleyDiameter: d1 } }, baseRevision: 1 });
    const b = await upload("small pulley", d1);
    expect(b.revision).toBe(2);

    const strangerCombo = await createCombination(t.db, member, { name: "other car", spec: base });
    const stranger = await createDatalog(t.db, member, { combinationId: strangerCombo.id, name: "elsewhere", fileName: "x.csv", text: pullCsv(d0), mapping: { ...DEMO_DATALOG_MAPPING } });
    await expect(calibrateFromDatalog(t.db, member, a.id, { baseRevision: 2, logIds: [a.id, stranger.id] })).rejects.toMatchObject({ field: "logIds" });
    await expect(calibrateFromDatalog(t.db, other, a.id, { baseRevision: 2, logIds: [a.id, b.id] })).rejects.toThrow();

    const r = await calibrateFromDatalog(t.db, member, a.id, { baseRevision: 2, logIds: [a.id, b.id] });
    expect(r.revision).toBe(3);
    const saved = (await getCombination(t.db, member, combo.id)).spec;
    expect(Math.abs(saved.blower.volumetricEfficiencyRef - truth.blower.volumetricEfficiencyRef)).toBeLessThan(0.03);
    expect((await listRevisions(t.db, member, combo.id))[0].note).toBe("Slip and VE calibrated from logs “big pulley”, “small pulley”");
    // the saved revision gives back the boost logged at its own pulley (bound: the author's, 0.05 psi)
    for (const rpm of [3000, 4000, 4900]) {
      const expected = trySolvePoint({ ...truth, drive: { ...truth.drive, blowerPulleyDiameter: d1 } }, rpm)!.boostGauge;
      expect(Math.abs(trySolvePoint(combinationSchema.parse(saved), rpm)!.boostGauge - expected) / PSI).toBeLessThan(0.05);
    }
  });
});
