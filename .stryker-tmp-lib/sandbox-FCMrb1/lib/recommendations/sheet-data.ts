// @ts-nocheck
// What a recommendation sheet shows, computed from its frozen spec: the curves, the key figures
// and the cautions. Pure, so the sheet, the print view, the share page and the e-mail agree.
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
import { blowerSpeed, cautions, driveRatio, overdrive, trySolvePoint, type Caution, type Combination, type OperatingPoint } from "@/calc";
import type { RangeOf } from "@/lib/planner/range-words";
export type KeyFigures = {
  crankPulleyDiameter: number;
  blowerPulleyDiameter: number;
  driveRatio: number;
  overdrive: number;
  redlineRpm: number;
  /** Peaks are read among the points within the model's range only. */
  peakPower: {
    rpm: number;
    netPower: number;
    boostGauge: number;
  } | null;
  peakTorque: {
    rpm: number;
    torque: number;
  } | null;
  /** Figures read at a fixed speed carry that point's range: not to be shown outside it. */
  atRedline: ({
    boostGauge: number;
    manifoldTemperature: number;
  } & RangeOf) | null;
  /** The headline: boost where it was sold (the target speed), or at redline when none was given. */
  headline: ({
    rpm: number;
    boostGauge: number;
    netPower: number;
    sold: boolean;
  } & RangeOf) | null;
  blowerRpmAtRedline: number;
  blowerMaxRpm: number;
  /** Read among all points: the hottest may be the one outside the range, and then it says so. */
  maxChargeTemperature: ({
    rpm: number;
    manifoldTemperature: number;
  } & RangeOf) | null;
};
export type SheetData = {
  points: OperatingPoint[];
  cautions: Caution[];
  figures: KeyFigures;
  skipped: number[];
};

/** Engine speeds of the curves: every 250 rpm from 1 500 (or the VE curve's first point) to redline. */
export function sheetRpms(spec: Combination): number[] {
  if (stryMutAct_9fa48("3859")) {
    {}
  } else {
    stryCov_9fa48("3859");
    const start = stryMutAct_9fa48("3860") ? Math.max(1500, spec.engine.veCurve[0]?.rpm ?? 1500) : (stryCov_9fa48("3860"), Math.min(1500, stryMutAct_9fa48("3861") ? spec.engine.veCurve[0]?.rpm && 1500 : (stryCov_9fa48("3861"), (stryMutAct_9fa48("3862") ? spec.engine.veCurve[0].rpm : (stryCov_9fa48("3862"), spec.engine.veCurve[0]?.rpm)) ?? 1500)));
    const top = spec.engine.redlineRpm;
    const out: number[] = stryMutAct_9fa48("3863") ? ["Stryker was here"] : (stryCov_9fa48("3863"), []);
    for (let n = stryMutAct_9fa48("3864") ? Math.ceil(start / 250) / 250 : (stryCov_9fa48("3864"), Math.ceil(stryMutAct_9fa48("3865") ? start * 250 : (stryCov_9fa48("3865"), start / 250)) * 250); stryMutAct_9fa48("3868") ? n >= top : stryMutAct_9fa48("3867") ? n <= top : stryMutAct_9fa48("3866") ? false : (stryCov_9fa48("3866", "3867", "3868"), n < top); stryMutAct_9fa48("3869") ? n -= 250 : (stryCov_9fa48("3869"), n += 250)) out.push(n);
    out.push(top);
    return out;
  }
}

/** `targetRpm`: the engine speed the boost was sold at (rpm); the headline figures are read there. */
export function computeSheet(spec: Combination, targetRpm: number | null = null): SheetData {
  if (stryMutAct_9fa48("3870")) {
    {}
  } else {
    stryCov_9fa48("3870");
    const points: OperatingPoint[] = stryMutAct_9fa48("3871") ? ["Stryker was here"] : (stryCov_9fa48("3871"), []);
    const skipped: number[] = stryMutAct_9fa48("3872") ? ["Stryker was here"] : (stryCov_9fa48("3872"), []);
    // A slow, leaky blower can fail to balance at the lowest speeds; the sheet shows the rest.
    for (const rpm of sheetRpms(spec)) {
      if (stryMutAct_9fa48("3873")) {
        {}
      } else {
        stryCov_9fa48("3873");
        const point = trySolvePoint(spec, rpm);
        if (stryMutAct_9fa48("3875") ? false : stryMutAct_9fa48("3874") ? true : (stryCov_9fa48("3874", "3875"), point)) points.push(point);else skipped.push(rpm);
      }
    }
    const redline = spec.engine.redlineRpm;
    const trusted = stryMutAct_9fa48("3876") ? points : (stryCov_9fa48("3876"), points.filter(stryMutAct_9fa48("3877") ? () => undefined : (stryCov_9fa48("3877"), p => p.withinRange)));
    const best = stryMutAct_9fa48("3878") ? () => undefined : (stryCov_9fa48("3878"), (() => {
      const best = <K extends keyof OperatingPoint,>(key: K, among: OperatingPoint[]) => among.reduce<OperatingPoint | null>(stryMutAct_9fa48("3879") ? () => undefined : (stryCov_9fa48("3879"), (m, p) => (stryMutAct_9fa48("3882") ? m === null && p[key] as number > (m[key] as number) : stryMutAct_9fa48("3881") ? false : stryMutAct_9fa48("3880") ? true : (stryCov_9fa48("3880", "3881", "3882"), (stryMutAct_9fa48("3884") ? m !== null : stryMutAct_9fa48("3883") ? false : (stryCov_9fa48("3883", "3884"), m === null)) || (stryMutAct_9fa48("3887") ? (p[key] as number) <= (m[key] as number) : stryMutAct_9fa48("3886") ? p[key] as number >= (m[key] as number) : stryMutAct_9fa48("3885") ? false : (stryCov_9fa48("3885", "3886", "3887"), p[key] as number > (m[key] as number))))) ? p : m), null);
      return best;
    })());
    // A "peak" beyond the model's range is no peak: an out-of-range point's figures are not trusted.
    const power = best(stryMutAct_9fa48("3888") ? "" : (stryCov_9fa48("3888"), "netPower"), trusted);
    const torque = best(stryMutAct_9fa48("3889") ? "" : (stryCov_9fa48("3889"), "torque"), trusted);
    const hot = best(stryMutAct_9fa48("3890") ? "" : (stryCov_9fa48("3890"), "manifoldTemperature"), points);
    const range = stryMutAct_9fa48("3891") ? () => undefined : (stryCov_9fa48("3891"), (() => {
      const range = (p: OperatingPoint): RangeOf => stryMutAct_9fa48("3892") ? {} : (stryCov_9fa48("3892"), {
        withinRange: p.withinRange,
        rangeReasons: p.rangeReasons
      });
      return range;
    })());
    const top = stryMutAct_9fa48("3893") ? points.find(p => p.rpm === redline) && null : (stryCov_9fa48("3893"), points.find(stryMutAct_9fa48("3894") ? () => undefined : (stryCov_9fa48("3894"), p => stryMutAct_9fa48("3897") ? p.rpm !== redline : stryMutAct_9fa48("3896") ? false : stryMutAct_9fa48("3895") ? true : (stryCov_9fa48("3895", "3896", "3897"), p.rpm === redline))) ?? null);
    const sold = (stryMutAct_9fa48("3900") ? targetRpm !== null : stryMutAct_9fa48("3899") ? false : stryMutAct_9fa48("3898") ? true : (stryCov_9fa48("3898", "3899", "3900"), targetRpm === null)) ? null : stryMutAct_9fa48("3901") ? points.find(p => p.rpm === targetRpm) && trySolvePoint(spec, targetRpm) : (stryCov_9fa48("3901"), points.find(stryMutAct_9fa48("3902") ? () => undefined : (stryCov_9fa48("3902"), p => stryMutAct_9fa48("3905") ? p.rpm !== targetRpm : stryMutAct_9fa48("3904") ? false : stryMutAct_9fa48("3903") ? true : (stryCov_9fa48("3903", "3904", "3905"), p.rpm === targetRpm))) ?? trySolvePoint(spec, targetRpm));
    const head = stryMutAct_9fa48("3906") ? sold && top : (stryCov_9fa48("3906"), sold ?? top);
    const ratio = driveRatio(spec.drive.crankPulleyDiameter, spec.drive.blowerPulleyDiameter);
    return stryMutAct_9fa48("3907") ? {} : (stryCov_9fa48("3907"), {
      points,
      skipped,
      cautions: cautions(spec, points),
      figures: stryMutAct_9fa48("3908") ? {} : (stryCov_9fa48("3908"), {
        crankPulleyDiameter: spec.drive.crankPulleyDiameter,
        blowerPulleyDiameter: spec.drive.blowerPulleyDiameter,
        driveRatio: ratio,
        overdrive: overdrive(ratio),
        redlineRpm: redline,
        peakPower: stryMutAct_9fa48("3911") ? power || {
          rpm: power.rpm,
          netPower: power.netPower,
          boostGauge: power.boostGauge
        } : stryMutAct_9fa48("3910") ? false : stryMutAct_9fa48("3909") ? true : (stryCov_9fa48("3909", "3910", "3911"), power && (stryMutAct_9fa48("3912") ? {} : (stryCov_9fa48("3912"), {
          rpm: power.rpm,
          netPower: power.netPower,
          boostGauge: power.boostGauge
        }))),
        peakTorque: stryMutAct_9fa48("3915") ? torque || {
          rpm: torque.rpm,
          torque: torque.torque
        } : stryMutAct_9fa48("3914") ? false : stryMutAct_9fa48("3913") ? true : (stryCov_9fa48("3913", "3914", "3915"), torque && (stryMutAct_9fa48("3916") ? {} : (stryCov_9fa48("3916"), {
          rpm: torque.rpm,
          torque: torque.torque
        }))),
        atRedline: stryMutAct_9fa48("3919") ? top || {
          boostGauge: top.boostGauge,
          manifoldTemperature: top.manifoldTemperature,
          ...range(top)
        } : stryMutAct_9fa48("3918") ? false : stryMutAct_9fa48("3917") ? true : (stryCov_9fa48("3917", "3918", "3919"), top && (stryMutAct_9fa48("3920") ? {} : (stryCov_9fa48("3920"), {
          boostGauge: top.boostGauge,
          manifoldTemperature: top.manifoldTemperature,
          ...range(top)
        }))),
        headline: stryMutAct_9fa48("3923") ? head || {
          rpm: head.rpm,
          boostGauge: head.boostGauge,
          netPower: head.netPower,
          sold: sold !== null,
          ...range(head)
        } : stryMutAct_9fa48("3922") ? false : stryMutAct_9fa48("3921") ? true : (stryCov_9fa48("3921", "3922", "3923"), head && (stryMutAct_9fa48("3924") ? {} : (stryCov_9fa48("3924"), {
          rpm: head.rpm,
          boostGauge: head.boostGauge,
          netPower: head.netPower,
          sold: stryMutAct_9fa48("3927") ? sold === null : stryMutAct_9fa48("3926") ? false : stryMutAct_9fa48("3925") ? true : (stryCov_9fa48("3925", "3926", "3927"), sold !== null),
          ...range(head)
        }))),
        blowerRpmAtRedline: blowerSpeed(spec, redline),
        blowerMaxRpm: spec.blower.maxRpm,
        maxChargeTemperature: stryMutAct_9fa48("3930") ? hot || {
          rpm: hot.rpm,
          manifoldTemperature: hot.manifoldTemperature,
          ...range(hot)
        } : stryMutAct_9fa48("3929") ? false : stryMutAct_9fa48("3928") ? true : (stryCov_9fa48("3928", "3929", "3930"), hot && (stryMutAct_9fa48("3931") ? {} : (stryCov_9fa48("3931"), {
          rpm: hot.rpm,
          manifoldTemperature: hot.manifoldTemperature,
          ...range(hot)
        })))
      })
    });
  }
}