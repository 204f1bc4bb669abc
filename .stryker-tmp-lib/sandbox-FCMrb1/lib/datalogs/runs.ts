// @ts-nocheck
// Calibration from several logs of one combination (calc.calibrate): each log is a run at the
// blower pulley of the revision it was logged with; logs at the same pulley pool their bins. With
// two or more pulley sizes the blower's slip is fitted as well as the VE curve. Pure: the page
// uses it live in the browser, the calibrate route on the server.
function stryNS_9fa48() {
  var g = typeof globalThis === 'object' && globalThis && globalThis.Math === Math && globalThis || new Function("return this")();
  var ns = g.__stryker__ || (g.__stryker__ = {});
  if (ns.activeMutant === undefined && g.process && g.process.env && g.process.env.__STRYKER_ACTIVE_MUTANT__) {
    ns.activeMutant = g.process.env.__STRYKER_ACTIVE_MUTANT__;
  }
  function retrieveNS() {
    return ns;
  }
  stryNS_9fa48 = retrieveNS;
  return retrieveNS();
}
stryNS_9fa48();
function stryCov_9fa48() {
  var ns = stryNS_9fa48();
  var cov = ns.mutantCoverage || (ns.mutantCoverage = {
    static: {},
    perTest: {}
  });
  function cover() {
    var c = cov.static;
    if (ns.currentTestId) {
      c = cov.perTest[ns.currentTestId] = cov.perTest[ns.currentTestId] || {};
    }
    var a = arguments;
    for (var i = 0; i < a.length; i++) {
      c[a[i]] = (c[a[i]] || 0) + 1;
    }
  }
  stryCov_9fa48 = cover;
  cover.apply(null, arguments);
}
function stryMutAct_9fa48(id) {
  var ns = stryNS_9fa48();
  function isActive(id) {
    if (ns.activeMutant === id) {
      if (ns.hitCount !== void 0 && ++ns.hitCount > ns.hitLimit) {
        throw new Error('Stryker: Hit count limit reached (' + ns.hitCount + ')');
      }
      return true;
    }
    return false;
  }
  stryMutAct_9fa48 = isActive;
  return isActive(id);
}
import { calibrate, pulleySweep, type CalibrationRun, type Combination, type FittedParameter, type RunResidual } from "@/calc";
import { withFittedVe } from "@/lib/datalogs/analysis";
import { binsToMeasured, type LogBin } from "@/lib/datalogs/parse";
export type LogRun = {
  id: string;
  name: string;
  blowerPulleyDiameter: number;
  bins: readonly LogBin[];
};

/**
 * One run per pulley size, its points the usable bins of every log at that size (a speed logged
 * twice is averaged). Boost only: the fit reads the charge temperature from the model, as fitVe does,
 * so the saved revision gives back the boost it was fitted to.
 */
export function runsFromLogs(logs: readonly LogRun[]): CalibrationRun[] {
  if (stryMutAct_9fa48("2334")) {
    {}
  } else {
    stryCov_9fa48("2334");
    const bySize = new Map<number, Map<number, number[]>>();
    for (const log of logs) {
      if (stryMutAct_9fa48("2335")) {
        {}
      } else {
        stryCov_9fa48("2335");
        const speeds = stryMutAct_9fa48("2336") ? bySize.get(log.blowerPulleyDiameter) && new Map<number, number[]>() : (stryCov_9fa48("2336"), bySize.get(log.blowerPulleyDiameter) ?? new Map<number, number[]>());
        for (const m of binsToMeasured(log.bins)) speeds.set(m.rpm, stryMutAct_9fa48("2337") ? [] : (stryCov_9fa48("2337"), [...(stryMutAct_9fa48("2338") ? speeds.get(m.rpm) && [] : (stryCov_9fa48("2338"), speeds.get(m.rpm) ?? (stryMutAct_9fa48("2339") ? ["Stryker was here"] : (stryCov_9fa48("2339"), [])))), m.boostGauge]));
        bySize.set(log.blowerPulleyDiameter, speeds);
      }
    }
    return stryMutAct_9fa48("2340") ? [...bySize.entries()].map(([d, speeds]) => ({
      blowerPulleyDiameter: d,
      measured: [...speeds.entries()].sort((a, b) => a[0] - b[0]).map(([rpm, boosts]) => ({
        rpm,
        boostGauge: boosts.reduce((s, b) => s + b, 0) / boosts.length
      }))
    })) : (stryCov_9fa48("2340"), (stryMutAct_9fa48("2341") ? [] : (stryCov_9fa48("2341"), [...bySize.entries()])).filter(stryMutAct_9fa48("2342") ? () => undefined : (stryCov_9fa48("2342"), ([, speeds]) => stryMutAct_9fa48("2346") ? speeds.size <= 0 : stryMutAct_9fa48("2345") ? speeds.size >= 0 : stryMutAct_9fa48("2344") ? false : stryMutAct_9fa48("2343") ? true : (stryCov_9fa48("2343", "2344", "2345", "2346"), speeds.size > 0))).map(stryMutAct_9fa48("2347") ? () => undefined : (stryCov_9fa48("2347"), ([d, speeds]) => stryMutAct_9fa48("2348") ? {} : (stryCov_9fa48("2348"), {
      blowerPulleyDiameter: d,
      measured: stryMutAct_9fa48("2349") ? [...speeds.entries()].map(([rpm, boosts]) => ({
        rpm,
        boostGauge: boosts.reduce((s, b) => s + b, 0) / boosts.length
      })) : (stryCov_9fa48("2349"), (stryMutAct_9fa48("2350") ? [] : (stryCov_9fa48("2350"), [...speeds.entries()])).sort(stryMutAct_9fa48("2351") ? () => undefined : (stryCov_9fa48("2351"), (a, b) => stryMutAct_9fa48("2352") ? a[0] + b[0] : (stryCov_9fa48("2352"), a[0] - b[0]))).map(stryMutAct_9fa48("2353") ? () => undefined : (stryCov_9fa48("2353"), ([rpm, boosts]) => stryMutAct_9fa48("2354") ? {} : (stryCov_9fa48("2354"), {
        rpm,
        boostGauge: stryMutAct_9fa48("2355") ? boosts.reduce((s, b) => s + b, 0) * boosts.length : (stryCov_9fa48("2355"), boosts.reduce(stryMutAct_9fa48("2356") ? () => undefined : (stryCov_9fa48("2356"), (s, b) => stryMutAct_9fa48("2357") ? s - b : (stryCov_9fa48("2357"), s + b)), 0) / boosts.length)
      }))))
    }))));
  }
}
export type RunsFit = {
  runs: CalibrationRun[];
  residuals: RunResidual[];
  fitted: FittedParameter[];
  /** The current spec with the fitted slip and VE (the stored shape kept outside the logged speeds, as withFittedVe). */
  calibrated: Combination;
};

/** Fits the current combination to the chosen logs; throws calc's CalcInputError naming the run and point. */
export function fitRuns(current: Combination, logs: readonly LogRun[]): RunsFit {
  if (stryMutAct_9fa48("2358")) {
    {}
  } else {
    stryCov_9fa48("2358");
    const runs = runsFromLogs(logs);
    if (stryMutAct_9fa48("2361") ? runs.length !== 0 : stryMutAct_9fa48("2360") ? false : stryMutAct_9fa48("2359") ? true : (stryCov_9fa48("2359", "2360", "2361"), runs.length === 0)) throw new Error(stryMutAct_9fa48("2362") ? "" : (stryCov_9fa48("2362"), "None of the chosen logs has a usable speed bin. Loosen the cleaning or choose other logs."));
    const r = calibrate(current, runs);
    const ve = r.fitted.find(stryMutAct_9fa48("2363") ? () => undefined : (stryCov_9fa48("2363"), f => stryMutAct_9fa48("2366") ? f.parameter !== "engine.veCurve" : stryMutAct_9fa48("2365") ? false : stryMutAct_9fa48("2364") ? true : (stryCov_9fa48("2364", "2365", "2366"), f.parameter === (stryMutAct_9fa48("2367") ? "" : (stryCov_9fa48("2367"), "engine.veCurve")))));
    const slip = r.fitted.find(stryMutAct_9fa48("2368") ? () => undefined : (stryCov_9fa48("2368"), f => stryMutAct_9fa48("2371") ? f.parameter !== "blower.volumetricEfficiencyRef" : stryMutAct_9fa48("2370") ? false : stryMutAct_9fa48("2369") ? true : (stryCov_9fa48("2369", "2370", "2371"), f.parameter === (stryMutAct_9fa48("2372") ? "" : (stryCov_9fa48("2372"), "blower.volumetricEfficiencyRef")))));
    const withSlip: Combination = slip ? stryMutAct_9fa48("2373") ? {} : (stryCov_9fa48("2373"), {
      ...current,
      blower: stryMutAct_9fa48("2374") ? {} : (stryCov_9fa48("2374"), {
        ...current.blower,
        volumetricEfficiencyRef: slip.to
      })
    }) : current;
    const calibrated = ve ? withFittedVe(withSlip, ve.to) : withSlip;
    return stryMutAct_9fa48("2375") ? {} : (stryCov_9fa48("2375"), {
      runs,
      residuals: r.residuals,
      fitted: r.fitted,
      calibrated
    });
  }
}
export type NextPulley = {
  diameter: number;
  before: number | null;
  after: number | null;
  withinRange: boolean;
};

/** Boost at `rpm` on the next smaller pulley (0.1 in, 2.54 mm, below the smallest logged), before and after the fit. */
export function predictNextPulley(current: Combination, calibrated: Combination, runs: readonly CalibrationRun[], rpm: number): NextPulley {
  if (stryMutAct_9fa48("2376")) {
    {}
  } else {
    stryCov_9fa48("2376");
    const smallest = stryMutAct_9fa48("2377") ? Math.max(...runs.map(r => r.blowerPulleyDiameter)) : (stryCov_9fa48("2377"), Math.min(...runs.map(stryMutAct_9fa48("2378") ? () => undefined : (stryCov_9fa48("2378"), r => r.blowerPulleyDiameter))));
    const diameter = stryMutAct_9fa48("2379") ? Math.round((smallest - 0.00254) * 1e6) * 1e6 : (stryCov_9fa48("2379"), Math.round(stryMutAct_9fa48("2380") ? (smallest - 0.00254) / 1e6 : (stryCov_9fa48("2380"), (stryMutAct_9fa48("2381") ? smallest + 0.00254 : (stryCov_9fa48("2381"), smallest - 0.00254)) * 1e6)) / 1e6);
    const [before] = pulleySweep(current, rpm, stryMutAct_9fa48("2382") ? [] : (stryCov_9fa48("2382"), [diameter]));
    const [after] = pulleySweep(calibrated, rpm, stryMutAct_9fa48("2383") ? [] : (stryCov_9fa48("2383"), [diameter]));
    return stryMutAct_9fa48("2384") ? {} : (stryCov_9fa48("2384"), {
      diameter,
      before: stryMutAct_9fa48("2385") ? before.point?.boostGauge && null : (stryCov_9fa48("2385"), (stryMutAct_9fa48("2386") ? before.point.boostGauge : (stryCov_9fa48("2386"), before.point?.boostGauge)) ?? null),
      after: stryMutAct_9fa48("2387") ? after.point?.boostGauge && null : (stryCov_9fa48("2387"), (stryMutAct_9fa48("2388") ? after.point.boostGauge : (stryCov_9fa48("2388"), after.point?.boostGauge)) ?? null),
      withinRange: after.withinRange
    });
  }
}