// @ts-nocheck
// Starting shapes for the VE table, named for what they look like: where the curve peaks (as a
// share of redline) and how broad the peak is. Invented, generic curves for a first guess only
// (not measured on any engine): the tuner replaces them with their own figures.

/** A VE shape: points of (engine speed as a fraction of redline, VE as a fraction). */function stryNS_9fa48() {
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
export type VeShape = {
  id: string;
  label: string;
  points: readonly (readonly [number, number])[];
};
export const VE_SHAPES: readonly VeShape[] = stryMutAct_9fa48("3658") ? [] : (stryCov_9fa48("3658"), [stryMutAct_9fa48("3659") ? {} : (stryCov_9fa48("3659"), {
  id: stryMutAct_9fa48("3660") ? "" : (stryCov_9fa48("3660"), "peak-65-broad"),
  label: stryMutAct_9fa48("3661") ? "" : (stryCov_9fa48("3661"), "Peak at 65 % of redline, broad and flat"),
  points: stryMutAct_9fa48("3662") ? [] : (stryCov_9fa48("3662"), [stryMutAct_9fa48("3663") ? [] : (stryCov_9fa48("3663"), [0.2, 0.78]), stryMutAct_9fa48("3664") ? [] : (stryCov_9fa48("3664"), [0.45, 0.86]), stryMutAct_9fa48("3665") ? [] : (stryCov_9fa48("3665"), [0.65, 0.87]), stryMutAct_9fa48("3666") ? [] : (stryCov_9fa48("3666"), [0.85, 0.83]), stryMutAct_9fa48("3667") ? [] : (stryCov_9fa48("3667"), [1, 0.77])])
}), stryMutAct_9fa48("3668") ? {} : (stryCov_9fa48("3668"), {
  id: stryMutAct_9fa48("3669") ? "" : (stryCov_9fa48("3669"), "peak-70-plateau"),
  label: stryMutAct_9fa48("3670") ? "" : (stryCov_9fa48("3670"), "Peak at 70 % of redline, held to 85 %"),
  points: stryMutAct_9fa48("3671") ? [] : (stryCov_9fa48("3671"), [stryMutAct_9fa48("3672") ? [] : (stryCov_9fa48("3672"), [0.2, 0.74]), stryMutAct_9fa48("3673") ? [] : (stryCov_9fa48("3673"), [0.45, 0.85]), stryMutAct_9fa48("3674") ? [] : (stryCov_9fa48("3674"), [0.7, 0.92]), stryMutAct_9fa48("3675") ? [] : (stryCov_9fa48("3675"), [0.85, 0.91]), stryMutAct_9fa48("3676") ? [] : (stryCov_9fa48("3676"), [1, 0.86])])
}), stryMutAct_9fa48("3677") ? {} : (stryCov_9fa48("3677"), {
  id: stryMutAct_9fa48("3678") ? "" : (stryCov_9fa48("3678"), "peak-88-late"),
  label: stryMutAct_9fa48("3679") ? "" : (stryCov_9fa48("3679"), "Peak at 88 % of redline, low at the bottom"),
  points: stryMutAct_9fa48("3680") ? [] : (stryCov_9fa48("3680"), [stryMutAct_9fa48("3681") ? [] : (stryCov_9fa48("3681"), [0.2, 0.66]), stryMutAct_9fa48("3682") ? [] : (stryCov_9fa48("3682"), [0.45, 0.8]), stryMutAct_9fa48("3683") ? [] : (stryCov_9fa48("3683"), [0.7, 0.94]), stryMutAct_9fa48("3684") ? [] : (stryCov_9fa48("3684"), [0.88, 0.99]), stryMutAct_9fa48("3685") ? [] : (stryCov_9fa48("3685"), [1, 0.95])])
}), stryMutAct_9fa48("3686") ? {} : (stryCov_9fa48("3686"), {
  id: stryMutAct_9fa48("3687") ? "" : (stryCov_9fa48("3687"), "peak-92-narrow"),
  label: stryMutAct_9fa48("3688") ? "" : (stryCov_9fa48("3688"), "Peak at 92 % of redline, narrow"),
  points: stryMutAct_9fa48("3689") ? [] : (stryCov_9fa48("3689"), [stryMutAct_9fa48("3690") ? [] : (stryCov_9fa48("3690"), [0.2, 0.6]), stryMutAct_9fa48("3691") ? [] : (stryCov_9fa48("3691"), [0.5, 0.78]), stryMutAct_9fa48("3692") ? [] : (stryCov_9fa48("3692"), [0.75, 0.96]), stryMutAct_9fa48("3693") ? [] : (stryCov_9fa48("3693"), [0.92, 1.04]), stryMutAct_9fa48("3694") ? [] : (stryCov_9fa48("3694"), [1, 1.01])])
})]);

/** VE (fraction) of a shape at a fraction of redline, piecewise-linear and flat outside. */
export function shapeAt(shape: VeShape, x: number): number {
  if (stryMutAct_9fa48("3695")) {
    {}
  } else {
    stryCov_9fa48("3695");
    const p = shape.points;
    if (stryMutAct_9fa48("3699") ? x > p[0][0] : stryMutAct_9fa48("3698") ? x < p[0][0] : stryMutAct_9fa48("3697") ? false : stryMutAct_9fa48("3696") ? true : (stryCov_9fa48("3696", "3697", "3698", "3699"), x <= p[0][0])) return p[0][1];
    for (let i = 1; stryMutAct_9fa48("3702") ? i >= p.length : stryMutAct_9fa48("3701") ? i <= p.length : stryMutAct_9fa48("3700") ? false : (stryCov_9fa48("3700", "3701", "3702"), i < p.length); stryMutAct_9fa48("3703") ? i-- : (stryCov_9fa48("3703"), i++)) {
      if (stryMutAct_9fa48("3704")) {
        {}
      } else {
        stryCov_9fa48("3704");
        if (stryMutAct_9fa48("3708") ? x > p[i][0] : stryMutAct_9fa48("3707") ? x < p[i][0] : stryMutAct_9fa48("3706") ? false : stryMutAct_9fa48("3705") ? true : (stryCov_9fa48("3705", "3706", "3707", "3708"), x <= p[i][0])) {
          if (stryMutAct_9fa48("3709")) {
            {}
          } else {
            stryCov_9fa48("3709");
            const t = stryMutAct_9fa48("3710") ? (x - p[i - 1][0]) * (p[i][0] - p[i - 1][0]) : (stryCov_9fa48("3710"), (stryMutAct_9fa48("3711") ? x + p[i - 1][0] : (stryCov_9fa48("3711"), x - p[stryMutAct_9fa48("3712") ? i + 1 : (stryCov_9fa48("3712"), i - 1)][0])) / (stryMutAct_9fa48("3713") ? p[i][0] + p[i - 1][0] : (stryCov_9fa48("3713"), p[i][0] - p[stryMutAct_9fa48("3714") ? i + 1 : (stryCov_9fa48("3714"), i - 1)][0])));
            return stryMutAct_9fa48("3715") ? p[i - 1][1] - t * (p[i][1] - p[i - 1][1]) : (stryCov_9fa48("3715"), p[stryMutAct_9fa48("3716") ? i + 1 : (stryCov_9fa48("3716"), i - 1)][1] + (stryMutAct_9fa48("3717") ? t / (p[i][1] - p[i - 1][1]) : (stryCov_9fa48("3717"), t * (stryMutAct_9fa48("3718") ? p[i][1] + p[i - 1][1] : (stryCov_9fa48("3718"), p[i][1] - p[stryMutAct_9fa48("3719") ? i + 1 : (stryCov_9fa48("3719"), i - 1)][1])))));
          }
        }
      }
    }
    return p[stryMutAct_9fa48("3720") ? p.length + 1 : (stryCov_9fa48("3720"), p.length - 1)][1];
  }
}

/**
 * The VE table re-filled from a shape for this redline: the rows' own engine speeds when there
 * are at least three distinct ones, else six speeds from a quarter of redline to redline.
 */
export function applyShape(shape: VeShape, redlineRpm: number, rows: readonly {
  rpm: number;
}[]): {
  rpm: number;
  ve: number;
}[] {
  if (stryMutAct_9fa48("3721")) {
    {}
  } else {
    stryCov_9fa48("3721");
    const speeds = stryMutAct_9fa48("3722") ? [...new Set(rows.map(r => r.rpm).filter(n => Number.isFinite(n) && n > 0))] : (stryCov_9fa48("3722"), (stryMutAct_9fa48("3723") ? [] : (stryCov_9fa48("3723"), [...new Set(stryMutAct_9fa48("3724") ? rows.map(r => r.rpm) : (stryCov_9fa48("3724"), rows.map(stryMutAct_9fa48("3725") ? () => undefined : (stryCov_9fa48("3725"), r => r.rpm)).filter(stryMutAct_9fa48("3726") ? () => undefined : (stryCov_9fa48("3726"), n => stryMutAct_9fa48("3729") ? Number.isFinite(n) || n > 0 : stryMutAct_9fa48("3728") ? false : stryMutAct_9fa48("3727") ? true : (stryCov_9fa48("3727", "3728", "3729"), Number.isFinite(n) && (stryMutAct_9fa48("3732") ? n <= 0 : stryMutAct_9fa48("3731") ? n >= 0 : stryMutAct_9fa48("3730") ? true : (stryCov_9fa48("3730", "3731", "3732"), n > 0)))))))])).sort(stryMutAct_9fa48("3733") ? () => undefined : (stryCov_9fa48("3733"), (a, b) => stryMutAct_9fa48("3734") ? a + b : (stryCov_9fa48("3734"), a - b))));
    const grid = (stryMutAct_9fa48("3738") ? speeds.length < 3 : stryMutAct_9fa48("3737") ? speeds.length > 3 : stryMutAct_9fa48("3736") ? false : stryMutAct_9fa48("3735") ? true : (stryCov_9fa48("3735", "3736", "3737", "3738"), speeds.length >= 3)) ? speeds : Array.from(stryMutAct_9fa48("3739") ? {} : (stryCov_9fa48("3739"), {
      length: 6
    }), stryMutAct_9fa48("3740") ? () => undefined : (stryCov_9fa48("3740"), (_, i) => stryMutAct_9fa48("3741") ? Math.round(redlineRpm * (0.25 + 0.75 * i / 5) / 100) / 100 : (stryCov_9fa48("3741"), Math.round(stryMutAct_9fa48("3742") ? redlineRpm * (0.25 + 0.75 * i / 5) * 100 : (stryCov_9fa48("3742"), (stryMutAct_9fa48("3743") ? redlineRpm / (0.25 + 0.75 * i / 5) : (stryCov_9fa48("3743"), redlineRpm * (stryMutAct_9fa48("3744") ? 0.25 - 0.75 * i / 5 : (stryCov_9fa48("3744"), 0.25 + (stryMutAct_9fa48("3745") ? 0.75 * i * 5 : (stryCov_9fa48("3745"), (stryMutAct_9fa48("3746") ? 0.75 / i : (stryCov_9fa48("3746"), 0.75 * i)) / 5)))))) / 100)) * 100)));
    return grid.map(stryMutAct_9fa48("3747") ? () => undefined : (stryCov_9fa48("3747"), rpm => stryMutAct_9fa48("3748") ? {} : (stryCov_9fa48("3748"), {
      rpm,
      ve: stryMutAct_9fa48("3749") ? Math.round(shapeAt(shape, rpm / redlineRpm) * 1000) * 10 : (stryCov_9fa48("3749"), Math.round(stryMutAct_9fa48("3750") ? shapeAt(shape, rpm / redlineRpm) / 1000 : (stryCov_9fa48("3750"), shapeAt(shape, stryMutAct_9fa48("3751") ? rpm * redlineRpm : (stryCov_9fa48("3751"), rpm / redlineRpm)) * 1000)) / 10)
    })));
  }
}

/**
 * The whole VE curve scaled by a percentage ("+8 % with the new heads"): each VE (in %) times
 * (1 + percent/100), to 0.1 %. Speeds stay; rows not yet filled in stay as they are.
 */
export function scaleVe<R extends {
  rpm: number;
  ve: number;
}>(rows: readonly R[], percent: number): R[] {
  if (stryMutAct_9fa48("3752")) {
    {}
  } else {
    stryCov_9fa48("3752");
    const f = stryMutAct_9fa48("3753") ? 1 - percent / 100 : (stryCov_9fa48("3753"), 1 + (stryMutAct_9fa48("3754") ? percent * 100 : (stryCov_9fa48("3754"), percent / 100)));
    return rows.map(stryMutAct_9fa48("3755") ? () => undefined : (stryCov_9fa48("3755"), r => Number.isFinite(r.ve) ? stryMutAct_9fa48("3756") ? {} : (stryCov_9fa48("3756"), {
      ...r,
      ve: stryMutAct_9fa48("3757") ? Math.round(r.ve * f * 10) * 10 : (stryCov_9fa48("3757"), Math.round(stryMutAct_9fa48("3758") ? r.ve * f / 10 : (stryCov_9fa48("3758"), (stryMutAct_9fa48("3759") ? r.ve / f : (stryCov_9fa48("3759"), r.ve * f)) * 10)) / 10)
    }) : stryMutAct_9fa48("3760") ? {} : (stryCov_9fa48("3760"), {
      ...r
    })));
  }
}