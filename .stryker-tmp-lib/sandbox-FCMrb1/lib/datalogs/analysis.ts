// @ts-nocheck
// From binned measurements to the model: the prediction for the combination as logged, the
// error per speed bin, the VE fit (calc.calibrateVe) and what a smaller pulley would give with
// the measured engine. Pure: the pages use it live in the browser, the calibrate route on the server.
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
import { calibrateVe, combinationSchema, pulleySweep, trySolvePoint, veAt, type CalibrationResidual, type Combination, type CombinationInput, type VePoint } from "@/calc";
import { binsToMeasured, type LogAmbient, type LogBin } from "@/lib/datalogs/parse";

/** The revision's spec with the ambient of the log (its pulley is the revision's own). */
export function specAsLogged(revisionSpec: CombinationInput, ambient: LogAmbient | null): Combination {
  if (stryMutAct_9fa48("1018")) {
    {}
  } else {
    stryCov_9fa48("1018");
    const c = combinationSchema.parse(revisionSpec);
    return ambient ? stryMutAct_9fa48("1019") ? {} : (stryCov_9fa48("1019"), {
      ...c,
      ambient: stryMutAct_9fa48("1020") ? {} : (stryCov_9fa48("1020"), {
        ...c.ambient,
        pressure: ambient.pressure,
        temperature: ambient.temperature
      })
    }) : c;
  }
}
export interface BinComparison {
  rpm: number;
  measured: number;
  predicted: number | null;
  /** Measured minus predicted (Pa). */
  difference: number | null;
  /** Difference as a percentage of the predicted boost; null when the prediction is near zero. */
  percent: number | null;
}

/** Measured against predicted boost (Pa gauge) per usable bin. */
export function compareBins(spec: Combination, bins: readonly LogBin[]): BinComparison[] {
  if (stryMutAct_9fa48("1021")) {
    {}
  } else {
    stryCov_9fa48("1021");
    return stryMutAct_9fa48("1022") ? bins.map(b => {
      const predicted = trySolvePoint(spec, b.rpm)?.boostGauge ?? null;
      const difference = predicted === null ? null : b.boostGauge - predicted;
      const percent = predicted === null || Math.abs(predicted) < 1000 ? null : 100 * (difference as number) / predicted;
      return {
        rpm: b.rpm,
        measured: b.boostGauge,
        predicted,
        difference,
        percent
      };
    }) : (stryCov_9fa48("1022"), bins.filter(stryMutAct_9fa48("1023") ? () => undefined : (stryCov_9fa48("1023"), b => b.usable)).map(b => {
      if (stryMutAct_9fa48("1024")) {
        {}
      } else {
        stryCov_9fa48("1024");
        const predicted = stryMutAct_9fa48("1025") ? trySolvePoint(spec, b.rpm)?.boostGauge && null : (stryCov_9fa48("1025"), (stryMutAct_9fa48("1026") ? trySolvePoint(spec, b.rpm).boostGauge : (stryCov_9fa48("1026"), trySolvePoint(spec, b.rpm)?.boostGauge)) ?? null);
        const difference = (stryMutAct_9fa48("1029") ? predicted !== null : stryMutAct_9fa48("1028") ? false : stryMutAct_9fa48("1027") ? true : (stryCov_9fa48("1027", "1028", "1029"), predicted === null)) ? null : stryMutAct_9fa48("1030") ? b.boostGauge + predicted : (stryCov_9fa48("1030"), b.boostGauge - predicted);
        const percent = (stryMutAct_9fa48("1033") ? predicted === null && Math.abs(predicted) < 1000 : stryMutAct_9fa48("1032") ? false : stryMutAct_9fa48("1031") ? true : (stryCov_9fa48("1031", "1032", "1033"), (stryMutAct_9fa48("1035") ? predicted !== null : stryMutAct_9fa48("1034") ? false : (stryCov_9fa48("1034", "1035"), predicted === null)) || (stryMutAct_9fa48("1038") ? Math.abs(predicted) >= 1000 : stryMutAct_9fa48("1037") ? Math.abs(predicted) <= 1000 : stryMutAct_9fa48("1036") ? false : (stryCov_9fa48("1036", "1037", "1038"), Math.abs(predicted) < 1000)))) ? null : stryMutAct_9fa48("1039") ? 100 * (difference as number) * predicted : (stryCov_9fa48("1039"), (stryMutAct_9fa48("1040") ? 100 / (difference as number) : (stryCov_9fa48("1040"), 100 * (difference as number))) / predicted);
        return stryMutAct_9fa48("1041") ? {} : (stryCov_9fa48("1041"), {
          rpm: b.rpm,
          measured: b.boostGauge,
          predicted,
          difference,
          percent
        });
      }
    }));
  }
}

/** Predicted boost curve (Pa gauge) over a range of engine speeds, for the overlay. */
export function predictedCurve(spec: Combination, fromRpm: number, toRpm: number, steps = 40): {
  rpm: number;
  boost: number;
}[] {
  if (stryMutAct_9fa48("1042")) {
    {}
  } else {
    stryCov_9fa48("1042");
    const out: {
      rpm: number;
      boost: number;
    }[] = stryMutAct_9fa48("1043") ? ["Stryker was here"] : (stryCov_9fa48("1043"), []);
    const lo = stryMutAct_9fa48("1044") ? Math.min(100, fromRpm) : (stryCov_9fa48("1044"), Math.max(100, fromRpm));
    const hi = stryMutAct_9fa48("1045") ? Math.min(lo + 1, toRpm) : (stryCov_9fa48("1045"), Math.max(stryMutAct_9fa48("1046") ? lo - 1 : (stryCov_9fa48("1046"), lo + 1), toRpm));
    for (let i = 0; stryMutAct_9fa48("1049") ? i > steps : stryMutAct_9fa48("1048") ? i < steps : stryMutAct_9fa48("1047") ? false : (stryCov_9fa48("1047", "1048", "1049"), i <= steps); stryMutAct_9fa48("1050") ? i-- : (stryCov_9fa48("1050"), i++)) {
      if (stryMutAct_9fa48("1051")) {
        {}
      } else {
        stryCov_9fa48("1051");
        const rpm = stryMutAct_9fa48("1052") ? lo - (hi - lo) * i / steps : (stryCov_9fa48("1052"), lo + (stryMutAct_9fa48("1053") ? (hi - lo) * i * steps : (stryCov_9fa48("1053"), (stryMutAct_9fa48("1054") ? (hi - lo) / i : (stryCov_9fa48("1054"), (stryMutAct_9fa48("1055") ? hi + lo : (stryCov_9fa48("1055"), hi - lo)) * i)) / steps)));
        const point = trySolvePoint(spec, rpm);
        if (stryMutAct_9fa48("1057") ? false : stryMutAct_9fa48("1056") ? true : (stryCov_9fa48("1056", "1057"), point)) out.push(stryMutAct_9fa48("1058") ? {} : (stryCov_9fa48("1058"), {
          rpm,
          boost: point.boostGauge
        }));
      }
    }
    return out;
  }
}
export interface VeFit {
  veCurve: VePoint[];
  residuals: CalibrationResidual[];
  /** Per fitted point: the old curve's VE at the same speed. */
  rows: {
    rpm: number;
    oldVe: number;
    fittedVe: number;
  }[];
}

/** At most this many VE points: calc's VE curve schema holds 64. */
export const MAX_VE_POINTS = 64;

/**
 * Fits the VE curve to the usable bins with calc.calibrateVe. The fit uses the model's own charge
 * temperature, not the logged intake temperature: the saved curve is read back by the model with
 * its own temperature, so a VE fitted at the sensor's temperature would miss the very boost it was
 * fitted to (a sensor 20 °F off left 0.27 psi of bias). The logged temperature is kept for the
 * temperature residuals, where a disagreement belongs.
 */
export function fitVe(specLogged: Combination, bins: readonly LogBin[]): VeFit {
  if (stryMutAct_9fa48("1059")) {
    {}
  } else {
    stryCov_9fa48("1059");
    const measured = binsToMeasured(bins);
    if (stryMutAct_9fa48("1062") ? measured.length !== 0 : stryMutAct_9fa48("1061") ? false : stryMutAct_9fa48("1060") ? true : (stryCov_9fa48("1060", "1061", "1062"), measured.length === 0)) throw new NoUsableBinsError();
    if (stryMutAct_9fa48("1066") ? measured.length <= MAX_VE_POINTS : stryMutAct_9fa48("1065") ? measured.length >= MAX_VE_POINTS : stryMutAct_9fa48("1064") ? false : stryMutAct_9fa48("1063") ? true : (stryCov_9fa48("1063", "1064", "1065", "1066"), measured.length > MAX_VE_POINTS)) throw new TooManyBinsError(measured.length);
    const r = calibrateVe(specLogged, measured.map(stryMutAct_9fa48("1067") ? () => undefined : (stryCov_9fa48("1067"), m => stryMutAct_9fa48("1068") ? {} : (stryCov_9fa48("1068"), {
      rpm: m.rpm,
      boostGauge: m.boostGauge
    }))));
    const residuals = r.residuals.map(stryMutAct_9fa48("1069") ? () => undefined : (stryCov_9fa48("1069"), (res, i) => withMeasuredTemperature(res, measured[i].manifoldTemperature)));
    return stryMutAct_9fa48("1070") ? {} : (stryCov_9fa48("1070"), {
      veCurve: r.veCurve,
      residuals,
      rows: r.veCurve.map(stryMutAct_9fa48("1071") ? () => undefined : (stryCov_9fa48("1071"), p => stryMutAct_9fa48("1072") ? {} : (stryCov_9fa48("1072"), {
        rpm: p.rpm,
        oldVe: veAt(specLogged.engine.veCurve, p.rpm),
        fittedVe: p.ve
      })))
    });
  }
}

/** A residual with the logged temperature set beside the model's (both sorted by rpm already). */
export function withMeasuredTemperature(res: CalibrationResidual, measured: number | null): CalibrationResidual {
  if (stryMutAct_9fa48("1073")) {
    {}
  } else {
    stryCov_9fa48("1073");
    return stryMutAct_9fa48("1074") ? {} : (stryCov_9fa48("1074"), {
      ...res,
      measuredManifoldTemperature: measured,
      temperatureResidual: (stryMutAct_9fa48("1077") ? measured !== null : stryMutAct_9fa48("1076") ? false : stryMutAct_9fa48("1075") ? true : (stryCov_9fa48("1075", "1076", "1077"), measured === null)) ? null : stryMutAct_9fa48("1078") ? res.modelManifoldTemperature + measured : (stryCov_9fa48("1078"), res.modelManifoldTemperature - measured)
    });
  }
}
export class NoUsableBinsError extends Error {
  readonly field = stryMutAct_9fa48("1079") ? "" : (stryCov_9fa48("1079"), "binWidth");
  constructor() {
    super(stryMutAct_9fa48("1080") ? "" : (stryCov_9fa48("1080"), "No speed bin has enough wide-open-throttle samples to fit. Lower the minimum throttle or boost, or the samples per bin."));
  }
}
export class TooManyBinsError extends Error {
  readonly field = stryMutAct_9fa48("1081") ? "" : (stryCov_9fa48("1081"), "binWidth");
  constructor(n: number) {
    super(stryMutAct_9fa48("1082") ? `` : (stryCov_9fa48("1082"), `The log gives ${n} speed bins; a VE curve holds at most ${MAX_VE_POINTS} points. Make the bins wider.`));
  }
}

/**
 * The current spec with the fitted VE curve: the engine as measured, everything else as it is now.
 * Outside the logged speeds the log says nothing, so the stored curve's shape is kept there,
 * scaled to join the fit at its ends (holding the end value flat would, for a log that stops short
 * of redline, predict a boost at redline that nothing measured).
 */
export function withFittedVe(current: CombinationInput, veCurve: readonly VePoint[]): Combination {
  if (stryMutAct_9fa48("1083")) {
    {}
  } else {
    stryCov_9fa48("1083");
    const c = combinationSchema.parse(current);
    const fitted = stryMutAct_9fa48("1084") ? [...veCurve] : (stryCov_9fa48("1084"), (stryMutAct_9fa48("1085") ? [] : (stryCov_9fa48("1085"), [...veCurve])).sort(stryMutAct_9fa48("1086") ? () => undefined : (stryCov_9fa48("1086"), (a, b) => stryMutAct_9fa48("1087") ? a.rpm + b.rpm : (stryCov_9fa48("1087"), a.rpm - b.rpm))));
    if (stryMutAct_9fa48("1090") ? fitted.length !== 0 : stryMutAct_9fa48("1089") ? false : stryMutAct_9fa48("1088") ? true : (stryCov_9fa48("1088", "1089", "1090"), fitted.length === 0)) return c;
    const first = fitted[0];
    const last = fitted[stryMutAct_9fa48("1091") ? fitted.length + 1 : (stryCov_9fa48("1091"), fitted.length - 1)];
    const old = c.engine.veCurve;
    const lowScale = stryMutAct_9fa48("1092") ? first.ve * veAt(old, first.rpm) : (stryCov_9fa48("1092"), first.ve / veAt(old, first.rpm));
    const highScale = stryMutAct_9fa48("1093") ? last.ve * veAt(old, last.rpm) : (stryCov_9fa48("1093"), last.ve / veAt(old, last.rpm));
    const below = stryMutAct_9fa48("1094") ? old.map(p => ({
      rpm: p.rpm,
      ve: p.ve * lowScale
    })) : (stryCov_9fa48("1094"), old.filter(stryMutAct_9fa48("1095") ? () => undefined : (stryCov_9fa48("1095"), p => stryMutAct_9fa48("1099") ? p.rpm >= first.rpm : stryMutAct_9fa48("1098") ? p.rpm <= first.rpm : stryMutAct_9fa48("1097") ? false : stryMutAct_9fa48("1096") ? true : (stryCov_9fa48("1096", "1097", "1098", "1099"), p.rpm < first.rpm))).map(stryMutAct_9fa48("1100") ? () => undefined : (stryCov_9fa48("1100"), p => stryMutAct_9fa48("1101") ? {} : (stryCov_9fa48("1101"), {
      rpm: p.rpm,
      ve: stryMutAct_9fa48("1102") ? p.ve / lowScale : (stryCov_9fa48("1102"), p.ve * lowScale)
    }))));
    const above = stryMutAct_9fa48("1103") ? old.map(p => ({
      rpm: p.rpm,
      ve: p.ve * highScale
    })) : (stryCov_9fa48("1103"), old.filter(stryMutAct_9fa48("1104") ? () => undefined : (stryCov_9fa48("1104"), p => stryMutAct_9fa48("1108") ? p.rpm <= last.rpm : stryMutAct_9fa48("1107") ? p.rpm >= last.rpm : stryMutAct_9fa48("1106") ? false : stryMutAct_9fa48("1105") ? true : (stryCov_9fa48("1105", "1106", "1107", "1108"), p.rpm > last.rpm))).map(stryMutAct_9fa48("1109") ? () => undefined : (stryCov_9fa48("1109"), p => stryMutAct_9fa48("1110") ? {} : (stryCov_9fa48("1110"), {
      rpm: p.rpm,
      ve: stryMutAct_9fa48("1111") ? p.ve / highScale : (stryCov_9fa48("1111"), p.ve * highScale)
    }))));
    const room = stryMutAct_9fa48("1112") ? MAX_VE_POINTS + fitted.length : (stryCov_9fa48("1112"), MAX_VE_POINTS - fitted.length);
    const merged = stryMutAct_9fa48("1113") ? [] : (stryCov_9fa48("1113"), [...(stryMutAct_9fa48("1114") ? below : (stryCov_9fa48("1114"), below.slice(stryMutAct_9fa48("1115") ? +Math.max(0, Math.floor(room / 2)) : (stryCov_9fa48("1115"), -(stryMutAct_9fa48("1116") ? Math.min(0, Math.floor(room / 2)) : (stryCov_9fa48("1116"), Math.max(0, Math.floor(stryMutAct_9fa48("1117") ? room * 2 : (stryCov_9fa48("1117"), room / 2))))))))), ...fitted.map(stryMutAct_9fa48("1118") ? () => undefined : (stryCov_9fa48("1118"), p => stryMutAct_9fa48("1119") ? {} : (stryCov_9fa48("1119"), {
      rpm: p.rpm,
      ve: p.ve
    }))), ...(stryMutAct_9fa48("1120") ? above : (stryCov_9fa48("1120"), above.slice(0, stryMutAct_9fa48("1121") ? Math.min(0, Math.ceil(room / 2)) : (stryCov_9fa48("1121"), Math.max(0, Math.ceil(stryMutAct_9fa48("1122") ? room * 2 : (stryCov_9fa48("1122"), room / 2)))))))]);
    return stryMutAct_9fa48("1123") ? {} : (stryCov_9fa48("1123"), {
      ...c,
      engine: stryMutAct_9fa48("1124") ? {} : (stryCov_9fa48("1124"), {
        ...c.engine,
        veCurve: merged.map(stryMutAct_9fa48("1125") ? () => undefined : (stryCov_9fa48("1125"), p => stryMutAct_9fa48("1126") ? {} : (stryCov_9fa48("1126"), {
          rpm: p.rpm,
          ve: stryMutAct_9fa48("1127") ? Math.max(2, Math.max(0.2, p.ve)) : (stryCov_9fa48("1127"), Math.min(2, stryMutAct_9fa48("1128") ? Math.min(0.2, p.ve) : (stryCov_9fa48("1128"), Math.max(0.2, p.ve))))
        })))
      })
    });
  }
}

/** The current blower pulley and the next smaller sizes, in 0.1 in (2.54 mm) steps (m). */
export function smallerPulleys(current: number, count = 3, step = 0.00254): number[] {
  if (stryMutAct_9fa48("1129")) {
    {}
  } else {
    stryCov_9fa48("1129");
    const out = stryMutAct_9fa48("1130") ? [] : (stryCov_9fa48("1130"), [current]);
    for (let i = 1; stryMutAct_9fa48("1133") ? i > count : stryMutAct_9fa48("1132") ? i < count : stryMutAct_9fa48("1131") ? false : (stryCov_9fa48("1131", "1132", "1133"), i <= count); stryMutAct_9fa48("1134") ? i-- : (stryCov_9fa48("1134"), i++)) {
      if (stryMutAct_9fa48("1135")) {
        {}
      } else {
        stryCov_9fa48("1135");
        const d = stryMutAct_9fa48("1136") ? Math.round((current - i * step) * 1e6) * 1e6 : (stryCov_9fa48("1136"), Math.round(stryMutAct_9fa48("1137") ? (current - i * step) / 1e6 : (stryCov_9fa48("1137"), (stryMutAct_9fa48("1138") ? current + i * step : (stryCov_9fa48("1138"), current - (stryMutAct_9fa48("1139") ? i / step : (stryCov_9fa48("1139"), i * step)))) * 1e6)) / 1e6);
        if (stryMutAct_9fa48("1143") ? d < 0.03 : stryMutAct_9fa48("1142") ? d > 0.03 : stryMutAct_9fa48("1141") ? false : stryMutAct_9fa48("1140") ? true : (stryCov_9fa48("1140", "1141", "1142", "1143"), d >= 0.03)) out.push(d);
      }
    }
    return out;
  }
}
export interface PulleyComparisonRow {
  diameter: number;
  oldBoost: number | null;
  measuredBoost: number | null;
  blowerRpm: number;
  overspeed: boolean;
  belowBeltMinimum: boolean;
}

/** Boost at `rpm` per pulley with the old VE curve and with the calibrated one. */
export function pulleyComparison(oldSpec: Combination, calibratedSpec: Combination, rpm: number, diameters: readonly number[]): PulleyComparisonRow[] {
  if (stryMutAct_9fa48("1144")) {
    {}
  } else {
    stryCov_9fa48("1144");
    const before = pulleySweep(oldSpec, rpm, diameters);
    const after = pulleySweep(calibratedSpec, rpm, diameters);
    return diameters.map(stryMutAct_9fa48("1145") ? () => undefined : (stryCov_9fa48("1145"), (d, i) => stryMutAct_9fa48("1146") ? {} : (stryCov_9fa48("1146"), {
      diameter: d,
      oldBoost: stryMutAct_9fa48("1147") ? before[i].point?.boostGauge && null : (stryCov_9fa48("1147"), (stryMutAct_9fa48("1148") ? before[i].point.boostGauge : (stryCov_9fa48("1148"), before[i].point?.boostGauge)) ?? null),
      measuredBoost: stryMutAct_9fa48("1149") ? after[i].point?.boostGauge && null : (stryCov_9fa48("1149"), (stryMutAct_9fa48("1150") ? after[i].point.boostGauge : (stryCov_9fa48("1150"), after[i].point?.boostGauge)) ?? null),
      blowerRpm: after[i].blowerRpm,
      overspeed: after[i].overspeed,
      belowBeltMinimum: after[i].belowBeltMinimum
    })));
  }
}