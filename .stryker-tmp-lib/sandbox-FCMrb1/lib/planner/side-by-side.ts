// @ts-nocheck
// Side by side: the figures of each item at chosen engine speeds and their differences from
// the first item. Pure (calc only).
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
import { trySolvePoint, type Combination, type QuantityKind, type RangeReason } from "@/calc";

/**
 * Which way is better for a quantity: more net power and torque; a cooler charge and less power
 * taken to drive the blower. Boost itself is neither (it is the means, not the goal).
 */
export type BetterWhen = "higher" | "lower" | "neutral";
export type DeltaQuantity = {
  key: "boostGauge" | "netPower" | "torque" | "manifoldTemperature" | "drivePower";
  label: string;
  kind: QuantityKind;
  better: BetterWhen;
};
export const DELTA_QUANTITIES: readonly DeltaQuantity[] = stryMutAct_9fa48("3560") ? [] : (stryCov_9fa48("3560"), [stryMutAct_9fa48("3561") ? {} : (stryCov_9fa48("3561"), {
  key: stryMutAct_9fa48("3562") ? "" : (stryCov_9fa48("3562"), "boostGauge"),
  label: stryMutAct_9fa48("3563") ? "" : (stryCov_9fa48("3563"), "Boost"),
  kind: stryMutAct_9fa48("3564") ? "" : (stryCov_9fa48("3564"), "pressure"),
  better: stryMutAct_9fa48("3565") ? "" : (stryCov_9fa48("3565"), "neutral")
}), stryMutAct_9fa48("3566") ? {} : (stryCov_9fa48("3566"), {
  key: stryMutAct_9fa48("3567") ? "" : (stryCov_9fa48("3567"), "netPower"),
  label: stryMutAct_9fa48("3568") ? "" : (stryCov_9fa48("3568"), "Net power"),
  kind: stryMutAct_9fa48("3569") ? "" : (stryCov_9fa48("3569"), "power"),
  better: stryMutAct_9fa48("3570") ? "" : (stryCov_9fa48("3570"), "higher")
}), stryMutAct_9fa48("3571") ? {} : (stryCov_9fa48("3571"), {
  key: stryMutAct_9fa48("3572") ? "" : (stryCov_9fa48("3572"), "torque"),
  label: stryMutAct_9fa48("3573") ? "" : (stryCov_9fa48("3573"), "Net torque"),
  kind: stryMutAct_9fa48("3574") ? "" : (stryCov_9fa48("3574"), "torque"),
  better: stryMutAct_9fa48("3575") ? "" : (stryCov_9fa48("3575"), "higher")
}), stryMutAct_9fa48("3576") ? {} : (stryCov_9fa48("3576"), {
  key: stryMutAct_9fa48("3577") ? "" : (stryCov_9fa48("3577"), "manifoldTemperature"),
  label: stryMutAct_9fa48("3578") ? "" : (stryCov_9fa48("3578"), "Charge temperature"),
  kind: stryMutAct_9fa48("3579") ? "" : (stryCov_9fa48("3579"), "temperature"),
  better: stryMutAct_9fa48("3580") ? "" : (stryCov_9fa48("3580"), "lower")
}), stryMutAct_9fa48("3581") ? {} : (stryCov_9fa48("3581"), {
  key: stryMutAct_9fa48("3582") ? "" : (stryCov_9fa48("3582"), "drivePower"),
  label: stryMutAct_9fa48("3583") ? "" : (stryCov_9fa48("3583"), "Blower drive power"),
  kind: stryMutAct_9fa48("3584") ? "" : (stryCov_9fa48("3584"), "power"),
  better: stryMutAct_9fa48("3585") ? "" : (stryCov_9fa48("3585"), "lower")
})]);

/** Whether a difference is better, worse or neither for its quantity. */
export function deltaTone(better: BetterWhen, delta: number): "better" | "worse" | "neutral" {
  if (stryMutAct_9fa48("3586")) {
    {}
  } else {
    stryCov_9fa48("3586");
    if (stryMutAct_9fa48("3589") ? better === "neutral" && delta === 0 : stryMutAct_9fa48("3588") ? false : stryMutAct_9fa48("3587") ? true : (stryCov_9fa48("3587", "3588", "3589"), (stryMutAct_9fa48("3591") ? better !== "neutral" : stryMutAct_9fa48("3590") ? false : (stryCov_9fa48("3590", "3591"), better === (stryMutAct_9fa48("3592") ? "" : (stryCov_9fa48("3592"), "neutral")))) || (stryMutAct_9fa48("3594") ? delta !== 0 : stryMutAct_9fa48("3593") ? false : (stryCov_9fa48("3593", "3594"), delta === 0)))) return stryMutAct_9fa48("3595") ? "" : (stryCov_9fa48("3595"), "neutral");
    return (stryMutAct_9fa48("3598") ? delta > 0 !== (better === "higher") : stryMutAct_9fa48("3597") ? false : stryMutAct_9fa48("3596") ? true : (stryCov_9fa48("3596", "3597", "3598"), (stryMutAct_9fa48("3602") ? delta <= 0 : stryMutAct_9fa48("3601") ? delta >= 0 : stryMutAct_9fa48("3600") ? false : stryMutAct_9fa48("3599") ? true : (stryCov_9fa48("3599", "3600", "3601", "3602"), delta > 0)) === (stryMutAct_9fa48("3605") ? better !== "higher" : stryMutAct_9fa48("3604") ? false : stryMutAct_9fa48("3603") ? true : (stryCov_9fa48("3603", "3604", "3605"), better === (stryMutAct_9fa48("3606") ? "" : (stryCov_9fa48("3606"), "higher")))))) ? stryMutAct_9fa48("3607") ? "" : (stryCov_9fa48("3607"), "better") : stryMutAct_9fa48("3608") ? "" : (stryCov_9fa48("3608"), "worse");
  }
}

/** A cell's value (SI) and difference from the first item; null figures where there is none or the point is outside the model's range (`outside` says why). */
export type DeltaCell = {
  value: number | null;
  delta: number | null;
  outside: readonly RangeReason[] | null;
};
export type DeltaRow = {
  quantity: DeltaQuantity;
  rpm: number;
  cells: DeltaCell[];
};

/** One row per quantity and speed; each cell holds the item's value (SI) and its difference from the first item. */
export function deltaRows(specs: readonly Combination[], speeds: readonly number[]): DeltaRow[] {
  if (stryMutAct_9fa48("3609")) {
    {}
  } else {
    stryCov_9fa48("3609");
    const solved = specs.map(stryMutAct_9fa48("3610") ? () => undefined : (stryCov_9fa48("3610"), s => speeds.map(stryMutAct_9fa48("3611") ? () => undefined : (stryCov_9fa48("3611"), n => trySolvePoint(s, n)))));
    // Points outside the model's range give no figures (and no differences).
    const points = solved.map(stryMutAct_9fa48("3612") ? () => undefined : (stryCov_9fa48("3612"), ps => ps.map(stryMutAct_9fa48("3613") ? () => undefined : (stryCov_9fa48("3613"), p => (stryMutAct_9fa48("3614") ? p.withinRange : (stryCov_9fa48("3614"), p?.withinRange)) ? p : null))));
    const outsideOf = (i: number, j: number): readonly RangeReason[] | null => {
      if (stryMutAct_9fa48("3615")) {
        {}
      } else {
        stryCov_9fa48("3615");
        const p = solved[i][j];
        return (stryMutAct_9fa48("3618") ? p !== null : stryMutAct_9fa48("3617") ? false : stryMutAct_9fa48("3616") ? true : (stryCov_9fa48("3616", "3617", "3618"), p === null)) ? stryMutAct_9fa48("3619") ? [] : (stryCov_9fa48("3619"), [stryMutAct_9fa48("3620") ? "" : (stryCov_9fa48("3620"), "no-balance")]) : p.withinRange ? null : p.rangeReasons;
      }
    };
    const rows: DeltaRow[] = stryMutAct_9fa48("3621") ? ["Stryker was here"] : (stryCov_9fa48("3621"), []);
    for (const quantity of DELTA_QUANTITIES) {
      if (stryMutAct_9fa48("3622")) {
        {}
      } else {
        stryCov_9fa48("3622");
        speeds.forEach((rpm, j) => {
          if (stryMutAct_9fa48("3623")) {
            {}
          } else {
            stryCov_9fa48("3623");
            const first = stryMutAct_9fa48("3624") ? points[0]?.[j]?.[quantity.key] && null : (stryCov_9fa48("3624"), (stryMutAct_9fa48("3626") ? points[0][j]?.[quantity.key] : stryMutAct_9fa48("3625") ? points[0]?.[j][quantity.key] : (stryCov_9fa48("3625", "3626"), points[0]?.[j]?.[quantity.key])) ?? null);
            rows.push(stryMutAct_9fa48("3627") ? {} : (stryCov_9fa48("3627"), {
              quantity,
              rpm,
              cells: points.map((ps, i) => {
                if (stryMutAct_9fa48("3628")) {
                  {}
                } else {
                  stryCov_9fa48("3628");
                  const v = stryMutAct_9fa48("3629") ? ps[j]?.[quantity.key] && null : (stryCov_9fa48("3629"), (stryMutAct_9fa48("3630") ? ps[j][quantity.key] : (stryCov_9fa48("3630"), ps[j]?.[quantity.key])) ?? null);
                  return stryMutAct_9fa48("3631") ? {} : (stryCov_9fa48("3631"), {
                    value: v,
                    delta: (stryMutAct_9fa48("3634") ? v === null && first === null : stryMutAct_9fa48("3633") ? false : stryMutAct_9fa48("3632") ? true : (stryCov_9fa48("3632", "3633", "3634"), (stryMutAct_9fa48("3636") ? v !== null : stryMutAct_9fa48("3635") ? false : (stryCov_9fa48("3635", "3636"), v === null)) || (stryMutAct_9fa48("3638") ? first !== null : stryMutAct_9fa48("3637") ? false : (stryCov_9fa48("3637", "3638"), first === null)))) ? null : stryMutAct_9fa48("3639") ? v + first : (stryCov_9fa48("3639"), v - first),
                    outside: outsideOf(i, j)
                  });
                }
              })
            }));
          }
        });
      }
    }
    return rows;
  }
}

/** Default speeds for the table: 3000 and 4500 rpm and the lowest redline, within every engine's range. */
export function defaultSpeeds(specs: readonly Combination[]): number[] {
  if (stryMutAct_9fa48("3640")) {
    {}
  } else {
    stryCov_9fa48("3640");
    if (stryMutAct_9fa48("3643") ? false : stryMutAct_9fa48("3642") ? true : stryMutAct_9fa48("3641") ? specs.length : (stryCov_9fa48("3641", "3642", "3643"), !specs.length)) return stryMutAct_9fa48("3644") ? [] : (stryCov_9fa48("3644"), [3000, 4500, 6000]);
    const top = stryMutAct_9fa48("3645") ? Math.max(...specs.map(s => s.engine.redlineRpm)) : (stryCov_9fa48("3645"), Math.min(...specs.map(stryMutAct_9fa48("3646") ? () => undefined : (stryCov_9fa48("3646"), s => s.engine.redlineRpm))));
    return stryMutAct_9fa48("3647") ? [...new Set([3000, 4500, top].filter(n => n <= top))] : (stryCov_9fa48("3647"), (stryMutAct_9fa48("3648") ? [] : (stryCov_9fa48("3648"), [...new Set(stryMutAct_9fa48("3649") ? [3000, 4500, top] : (stryCov_9fa48("3649"), (stryMutAct_9fa48("3650") ? [] : (stryCov_9fa48("3650"), [3000, 4500, top])).filter(stryMutAct_9fa48("3651") ? () => undefined : (stryCov_9fa48("3651"), n => stryMutAct_9fa48("3655") ? n > top : stryMutAct_9fa48("3654") ? n < top : stryMutAct_9fa48("3653") ? false : stryMutAct_9fa48("3652") ? true : (stryCov_9fa48("3652", "3653", "3654", "3655"), n <= top)))))])).sort(stryMutAct_9fa48("3656") ? () => undefined : (stryCov_9fa48("3656"), (a, b) => stryMutAct_9fa48("3657") ? a + b : (stryCov_9fa48("3657"), a - b))));
  }
}