// @ts-nocheck
// The planner's one sentence on why boost and power moved, from calc's explainChange, in the
// person's units. Pure, so the words a test expects and the words on screen agree.
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
import { explainChange, type ChangeDriver, type OperatingPoint, type UnitSystem } from "@/calc";
import { deltaText, figure } from "@/lib/units/format";

/** Shares smaller than this part of ln(Pm) are not worth a word (an author's bound). */
const NEGLIGIBLE_SHARE = 0.002;
function driverText(d: ChangeDriver, system: UnitSystem): string {
  if (stryMutAct_9fa48("3435")) {
    {}
  } else {
    stryCov_9fa48("3435");
    const pct = stryMutAct_9fa48("3436") ? () => undefined : (stryCov_9fa48("3436"), (() => {
      const pct = (x: number) => stryMutAct_9fa48("3437") ? `` : (stryCov_9fa48("3437"), `${(stryMutAct_9fa48("3441") ? x <= 0 : stryMutAct_9fa48("3440") ? x >= 0 : stryMutAct_9fa48("3439") ? false : stryMutAct_9fa48("3438") ? true : (stryCov_9fa48("3438", "3439", "3440", "3441"), x > 0)) ? stryMutAct_9fa48("3442") ? "" : (stryCov_9fa48("3442"), "+") : stryMutAct_9fa48("3443") ? "" : (stryCov_9fa48("3443"), "−")}${Math.abs(stryMutAct_9fa48("3444") ? x / 100 : (stryCov_9fa48("3444"), x * 100)).toFixed(1)} %`);
      return pct;
    })());
    switch (d.driver) {
      case stryMutAct_9fa48("3446") ? "" : (stryCov_9fa48("3446"), "blower-speed"):
        if (stryMutAct_9fa48("3445")) {} else {
          stryCov_9fa48("3445");
          return stryMutAct_9fa48("3447") ? `` : (stryCov_9fa48("3447"), `blower speed ${pct(d.change)}`);
        }
      case stryMutAct_9fa48("3449") ? "" : (stryCov_9fa48("3449"), "blower-slip"):
        if (stryMutAct_9fa48("3448")) {} else {
          stryCov_9fa48("3448");
          return stryMutAct_9fa48("3450") ? `` : (stryCov_9fa48("3450"), `blower slip ${(stryMutAct_9fa48("3454") ? d.change <= 0 : stryMutAct_9fa48("3453") ? d.change >= 0 : stryMutAct_9fa48("3452") ? false : stryMutAct_9fa48("3451") ? true : (stryCov_9fa48("3451", "3452", "3453", "3454"), d.change > 0)) ? stryMutAct_9fa48("3455") ? "" : (stryCov_9fa48("3455"), "down") : stryMutAct_9fa48("3456") ? "" : (stryCov_9fa48("3456"), "up")} ${Math.abs(stryMutAct_9fa48("3457") ? d.change / 100 : (stryCov_9fa48("3457"), d.change * 100)).toFixed(1)} points`);
        }
      case stryMutAct_9fa48("3459") ? "" : (stryCov_9fa48("3459"), "charge-temperature"):
        if (stryMutAct_9fa48("3458")) {} else {
          stryCov_9fa48("3458");
          return stryMutAct_9fa48("3460") ? `` : (stryCov_9fa48("3460"), `charge temperature ${deltaText(stryMutAct_9fa48("3461") ? "" : (stryCov_9fa48("3461"), "temperature"), d.change, system)}`);
        }
      case stryMutAct_9fa48("3463") ? "" : (stryCov_9fa48("3463"), "engine-breathing"):
        if (stryMutAct_9fa48("3462")) {} else {
          stryCov_9fa48("3462");
          return stryMutAct_9fa48("3464") ? `` : (stryCov_9fa48("3464"), `engine breathing (VE) ${pct(d.change)}`);
        }
      case stryMutAct_9fa48("3466") ? "" : (stryCov_9fa48("3466"), "engine-speed"):
        if (stryMutAct_9fa48("3465")) {} else {
          stryCov_9fa48("3465");
          return stryMutAct_9fa48("3467") ? `` : (stryCov_9fa48("3467"), `engine speed ${pct(d.change)}`);
        }
      case stryMutAct_9fa48("3469") ? "" : (stryCov_9fa48("3469"), "other"):
        if (stryMutAct_9fa48("3468")) {} else {
          stryCov_9fa48("3468");
          return stryMutAct_9fa48("3470") ? `` : (stryCov_9fa48("3470"), `inlet air and sizes ${pct(d.change)}`);
        }
    }
  }
}

/**
 * E.g. "Against the saved revision at 5,500 rpm: boost +1.8 psi and net power +21 hp; boost
 * rose with blower speed +6.0 %, held back by charge temperature +14 °F; blower drive power +9 hp." Null when a or b is
 * missing or nothing moved.
 */
export function explainSentence(a: OperatingPoint | null, b: OperatingPoint | null, system: UnitSystem, against = stryMutAct_9fa48("3471") ? "" : (stryCov_9fa48("3471"), "the saved revision")): string | null {
  if (stryMutAct_9fa48("3472")) {
    {}
  } else {
    stryCov_9fa48("3472");
    if (stryMutAct_9fa48("3475") ? !a && !b : stryMutAct_9fa48("3474") ? false : stryMutAct_9fa48("3473") ? true : (stryCov_9fa48("3473", "3474", "3475"), (stryMutAct_9fa48("3476") ? a : (stryCov_9fa48("3476"), !a)) || (stryMutAct_9fa48("3477") ? b : (stryCov_9fa48("3477"), !b)))) return null;
    const e = explainChange(a, b);
    const lnTotal = Math.log(e.manifoldPressureRatio);
    const moved = stryMutAct_9fa48("3478") ? e.drivers : (stryCov_9fa48("3478"), e.drivers.filter(stryMutAct_9fa48("3479") ? () => undefined : (stryCov_9fa48("3479"), d => stryMutAct_9fa48("3483") ? Math.abs(d.manifoldPressureShare) < NEGLIGIBLE_SHARE : stryMutAct_9fa48("3482") ? Math.abs(d.manifoldPressureShare) > NEGLIGIBLE_SHARE : stryMutAct_9fa48("3481") ? false : stryMutAct_9fa48("3480") ? true : (stryCov_9fa48("3480", "3481", "3482", "3483"), Math.abs(d.manifoldPressureShare) >= NEGLIGIBLE_SHARE))));
    if (stryMutAct_9fa48("3486") ? !moved.length || Math.abs(e.netPowerChange) < 1 : stryMutAct_9fa48("3485") ? false : stryMutAct_9fa48("3484") ? true : (stryCov_9fa48("3484", "3485", "3486"), (stryMutAct_9fa48("3487") ? moved.length : (stryCov_9fa48("3487"), !moved.length)) && (stryMutAct_9fa48("3490") ? Math.abs(e.netPowerChange) >= 1 : stryMutAct_9fa48("3489") ? Math.abs(e.netPowerChange) <= 1 : stryMutAct_9fa48("3488") ? true : (stryCov_9fa48("3488", "3489", "3490"), Math.abs(e.netPowerChange) < 1)))) return null;
    const head = stryMutAct_9fa48("3491") ? `` : (stryCov_9fa48("3491"), `Against ${against} at ${figure(stryMutAct_9fa48("3492") ? "" : (stryCov_9fa48("3492"), "speed"), b.rpm, system)} rpm: boost ${deltaText(stryMutAct_9fa48("3493") ? "" : (stryCov_9fa48("3493"), "pressure"), e.boostChange, system)} and net power ${deltaText(stryMutAct_9fa48("3494") ? "" : (stryCov_9fa48("3494"), "power"), e.netPowerChange, system)}`);
    if (stryMutAct_9fa48("3497") ? false : stryMutAct_9fa48("3496") ? true : stryMutAct_9fa48("3495") ? moved.length : (stryCov_9fa48("3495", "3496", "3497"), !moved.length)) return stryMutAct_9fa48("3498") ? `` : (stryCov_9fa48("3498"), `${head}.`);
    const up = stryMutAct_9fa48("3502") ? lnTotal < 0 : stryMutAct_9fa48("3501") ? lnTotal > 0 : stryMutAct_9fa48("3500") ? false : stryMutAct_9fa48("3499") ? true : (stryCov_9fa48("3499", "3500", "3501", "3502"), lnTotal >= 0);
    const drivers = stryMutAct_9fa48("3503") ? moved : (stryCov_9fa48("3503"), moved.filter(stryMutAct_9fa48("3504") ? () => undefined : (stryCov_9fa48("3504"), d => stryMutAct_9fa48("3507") ? d.manifoldPressureShare >= 0 !== up : stryMutAct_9fa48("3506") ? false : stryMutAct_9fa48("3505") ? true : (stryCov_9fa48("3505", "3506", "3507"), (stryMutAct_9fa48("3511") ? d.manifoldPressureShare < 0 : stryMutAct_9fa48("3510") ? d.manifoldPressureShare > 0 : stryMutAct_9fa48("3509") ? false : stryMutAct_9fa48("3508") ? true : (stryCov_9fa48("3508", "3509", "3510", "3511"), d.manifoldPressureShare >= 0)) === up))));
    const against_ = stryMutAct_9fa48("3512") ? moved : (stryCov_9fa48("3512"), moved.filter(stryMutAct_9fa48("3513") ? () => undefined : (stryCov_9fa48("3513"), d => stryMutAct_9fa48("3516") ? d.manifoldPressureShare >= 0 === up : stryMutAct_9fa48("3515") ? false : stryMutAct_9fa48("3514") ? true : (stryCov_9fa48("3514", "3515", "3516"), (stryMutAct_9fa48("3520") ? d.manifoldPressureShare < 0 : stryMutAct_9fa48("3519") ? d.manifoldPressureShare > 0 : stryMutAct_9fa48("3518") ? false : stryMutAct_9fa48("3517") ? true : (stryCov_9fa48("3517", "3518", "3519", "3520"), d.manifoldPressureShare >= 0)) !== up))));
    const main = drivers.length ? stryMutAct_9fa48("3521") ? `` : (stryCov_9fa48("3521"), `; boost ${up ? stryMutAct_9fa48("3522") ? "" : (stryCov_9fa48("3522"), "rose") : stryMutAct_9fa48("3523") ? "" : (stryCov_9fa48("3523"), "fell")} with ${drivers.map(stryMutAct_9fa48("3524") ? () => undefined : (stryCov_9fa48("3524"), d => driverText(d, system))).join(stryMutAct_9fa48("3525") ? "" : (stryCov_9fa48("3525"), " and "))}`) : stryMutAct_9fa48("3526") ? "Stryker was here!" : (stryCov_9fa48("3526"), "");
    const offset = against_.length ? stryMutAct_9fa48("3527") ? `` : (stryCov_9fa48("3527"), `, held back by ${against_.map(stryMutAct_9fa48("3528") ? () => undefined : (stryCov_9fa48("3528"), d => driverText(d, system))).join(stryMutAct_9fa48("3529") ? "" : (stryCov_9fa48("3529"), " and "))}`) : stryMutAct_9fa48("3530") ? "Stryker was here!" : (stryCov_9fa48("3530"), "");
    const power = (stryMutAct_9fa48("3534") ? Math.abs(e.drivePowerChange) < 1 : stryMutAct_9fa48("3533") ? Math.abs(e.drivePowerChange) > 1 : stryMutAct_9fa48("3532") ? false : stryMutAct_9fa48("3531") ? true : (stryCov_9fa48("3531", "3532", "3533", "3534"), Math.abs(e.drivePowerChange) >= 1)) ? stryMutAct_9fa48("3535") ? `` : (stryCov_9fa48("3535"), `; blower drive power ${deltaText(stryMutAct_9fa48("3536") ? "" : (stryCov_9fa48("3536"), "power"), e.drivePowerChange, system)}`) : stryMutAct_9fa48("3537") ? "Stryker was here!" : (stryCov_9fa48("3537"), "");
    return stryMutAct_9fa48("3538") ? `` : (stryCov_9fa48("3538"), `${head}${main}${offset}${power}.`);
  }
}