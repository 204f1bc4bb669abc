// runsFromLogs and fitRuns at their edges, on hand-made bins (boost figures invented): speeds in
// order whatever order the logs give them, a speed logged twice averaged, a pulley size with no
// usable bin left out, and a clear message when no log has anything to fit.
import { describe, expect, it } from "vitest";
import { combinationSchema, trySolvePoint } from "@/calc";
import { workTruckV6 } from "@/lib/combinations/demo-specs";
import type { LogBin } from "@/lib/datalogs/parse";
import { fitRuns, runsFromLogs, type LogRun } from "@/lib/datalogs/runs";

const bin = (rpm: number, boostGauge: number, usable = true): LogBin => ({ from: rpm - 125, to: rpm + 125, rpm, kept: 10, outliers: 0, boostGauge, intakeTemperature: 300, usable });
const log = (id: string, blowerPulleyDiameter: number, bins: LogBin[]): LogRun => ({ id, name: id, blowerPulleyDiameter, bins });

describe("runsFromLogs", () => {
  it("lists each run's speeds from low to high, whatever order the logs hold them in", () => {
    const runs = runsFromLogs([log("a", 0.08, [bin(4000, 40000), bin(3000, 30000)]), log("b", 0.08, [bin(3500, 35000), bin(2500, 25000)])]);
    expect(runs).toEqual([
      {
        blowerPulleyDiameter: 0.08,
        measured: [
          { rpm: 2500, boostGauge: 25000 },
          { rpm: 3000, boostGauge: 30000 },
          { rpm: 3500, boostGauge: 35000 },
          { rpm: 4000, boostGauge: 40000 },
        ],
      },
    ]);
  });

  it("averages a speed logged in two logs at the same pulley", () => {
    // (40,000 + 50,000) / 2 = 45,000 Pa; (20,000 + 30,000 + 40,000) / 3 = 30,000 Pa: by hand.
    const runs = runsFromLogs([
      log("a", 0.08, [bin(3000, 20000), bin(4000, 40000)]),
      log("b", 0.08, [bin(3000, 30000), bin(4000, 50000)]),
      log("c", 0.08, [bin(3000, 40000)]),
    ]);
    expect(runs).toEqual([
      {
        blowerPulleyDiameter: 0.08,
        measured: [
          { rpm: 3000, boostGauge: 30000 },
          { rpm: 4000, boostGauge: 45000 },
        ],
      },
    ]);
  });

  it("leaves out a pulley size whose logs have no usable bin, and keeps the sizes in the order first logged", () => {
    const runs = runsFromLogs([log("small", 0.075, [bin(3000, 50000)]), log("empty", 0.09, [bin(3000, 20000, false)]), log("large", 0.085, [bin(3000, 30000)])]);
    expect(runs).toEqual([
      { blowerPulleyDiameter: 0.075, measured: [{ rpm: 3000, boostGauge: 50000 }] },
      { blowerPulleyDiameter: 0.085, measured: [{ rpm: 3000, boostGauge: 30000 }] },
    ]);
    expect(runsFromLogs([log("empty", 0.09, [bin(3000, 20000, false)])])).toEqual([]);
    expect(runsFromLogs([])).toEqual([]);
  });
});

describe("fitRuns with nothing to fit", () => {
  it("says so in words before calling the fit", () => {
    const current = combinationSchema.parse(workTruckV6);
    const message = "None of the chosen logs has a usable speed bin. Loosen the cleaning or choose other logs.";
    expect(() => fitRuns(current, [])).toThrow(new Error(message));
    expect(() => fitRuns(current, [log("empty", 0.08, [bin(3000, 20000, false), bin(3500, 25000, false)])])).toThrow(new Error(message));
  });
});

describe("fitRuns at one pulley size", () => {
  it("fits the VE curve but leaves the blower as it was: slip needs two sizes to tell apart", () => {
    const current = combinationSchema.parse(workTruckV6);
    // Logs from an engine that breathes 5 % better than the spec says (invented), at the stored pulley.
    const truth = { ...current, engine: { ...current.engine, veCurve: current.engine.veCurve.map((p) => ({ rpm: p.rpm, ve: p.ve * 1.05 })) } };
    const bins = [2500, 3000, 3500, 4000, 4500].map((rpm) => bin(rpm, trySolvePoint(truth, rpm)!.boostGauge));
    const fit = fitRuns(current, [log("one", current.drive.blowerPulleyDiameter, bins)]);
    expect(fit.fitted.map((f) => f.parameter)).toEqual(["engine.veCurve"]);
    expect(fit.calibrated.blower).toEqual(current.blower);
    expect(fit.calibrated.engine.veCurve).not.toEqual(current.engine.veCurve);
  });
});
