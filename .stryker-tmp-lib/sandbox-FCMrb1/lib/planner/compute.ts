// @ts-nocheck
// What the planner computes from a valid combination, in the browser, on every change:
// curves for the current and neighbouring blower pulleys, the pulley ladder and the finder.
// Pure (calc only), so tests can run it in node.
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
import { CalcConvergenceError, CalcInputError, CalcTargetUnreachableError, inToM, pulleyForBoost, pulleySweep, trySolveCurve, type Combination, type OperatingPoint, type PulleyForBoostResult, type PulleySweepRow, type RangeReason, type UnitSystem, unitLabel } from "@/calc";
import { quantityText } from "@/lib/units/format";
import { calcErrorText } from "@/lib/units/caution-text";

/** A blower pulley on the parts shelf (diameter in m; price a decimal string). */
export type ShelfPulley = {
  id: string;
  partNumber: string;
  diameter: number;
  ribCount: number;
  price: string;
  stock: number;
};
/** A blower on the parts shelf with the fields calc needs (SI). */
export type ShelfBlower = Combination["blower"] & {
  id: string;
  partNumber: string;
  name: string;
  price: string;
  stock: number;
};
export type Shelf = {
  blowerPulleys: ShelfPulley[];
  blowers: ShelfBlower[];
};

/** Engine speeds of the curves: every 250 rpm from about the start of the VE curve to redline. */
export function rpmGrid(spec: Combination, step = 250): number[] {
  if (stryMutAct_9fa48("3263")) {
    {}
  } else {
    stryCov_9fa48("3263");
    const first = stryMutAct_9fa48("3264") ? Math.min(1000, Math.min(1500, spec.engine.veCurve[0].rpm)) : (stryCov_9fa48("3264"), Math.max(1000, stryMutAct_9fa48("3265") ? Math.max(1500, spec.engine.veCurve[0].rpm) : (stryCov_9fa48("3265"), Math.min(1500, spec.engine.veCurve[0].rpm))));
    const start = stryMutAct_9fa48("3266") ? Math.ceil(first / step) / step : (stryCov_9fa48("3266"), Math.ceil(stryMutAct_9fa48("3267") ? first * step : (stryCov_9fa48("3267"), first / step)) * step);
    const out: number[] = stryMutAct_9fa48("3268") ? ["Stryker was here"] : (stryCov_9fa48("3268"), []);
    for (let n = start; stryMutAct_9fa48("3271") ? n >= spec.engine.redlineRpm : stryMutAct_9fa48("3270") ? n <= spec.engine.redlineRpm : stryMutAct_9fa48("3269") ? false : (stryCov_9fa48("3269", "3270", "3271"), n < spec.engine.redlineRpm); stryMutAct_9fa48("3272") ? n -= step : (stryCov_9fa48("3272"), n += step)) out.push(n);
    out.push(spec.engine.redlineRpm);
    return out;
  }
}

/** The combination with another blower pulley (m). */
export const withPulley = stryMutAct_9fa48("3273") ? () => undefined : (stryCov_9fa48("3273"), (() => {
  const withPulley = (spec: Combination, diameter: number): Combination => stryMutAct_9fa48("3274") ? {} : (stryCov_9fa48("3274"), {
    ...spec,
    drive: stryMutAct_9fa48("3275") ? {} : (stryCov_9fa48("3275"), {
      ...spec.drive,
      blowerPulleyDiameter: diameter
    })
  });
  return withPulley;
})());

/** The curve at each speed; speeds with no balance (a blower too slow, say) are left out rather than failing the chart. */
export const safeCurve = stryMutAct_9fa48("3276") ? () => undefined : (stryCov_9fa48("3276"), (() => {
  const safeCurve = (spec: Combination, rpms: readonly number[]): OperatingPoint[] => trySolveCurve(spec, rpms);
  return safeCurve;
})());

/** Engine speed of highest net power on a curve (redline when the curve is empty). */
export function peakPowerRpm(points: readonly OperatingPoint[], fallback: number): number {
  if (stryMutAct_9fa48("3277")) {
    {}
  } else {
    stryCov_9fa48("3277");
    let best: OperatingPoint | null = null;
    for (const p of points) if (stryMutAct_9fa48("3280") ? !best && p.netPower > best.netPower : stryMutAct_9fa48("3279") ? false : stryMutAct_9fa48("3278") ? true : (stryCov_9fa48("3278", "3279", "3280"), (stryMutAct_9fa48("3281") ? best : (stryCov_9fa48("3281"), !best)) || (stryMutAct_9fa48("3284") ? p.netPower <= best.netPower : stryMutAct_9fa48("3283") ? p.netPower >= best.netPower : stryMutAct_9fa48("3282") ? false : (stryCov_9fa48("3282", "3283", "3284"), p.netPower > best.netPower)))) best = p;
    return best ? best.rpm : fallback;
  }
}
const near = stryMutAct_9fa48("3285") ? () => undefined : (stryCov_9fa48("3285"), (() => {
  const near = (a: number, b: number) => stryMutAct_9fa48("3289") ? Math.abs(a - b) >= 1e-6 : stryMutAct_9fa48("3288") ? Math.abs(a - b) <= 1e-6 : stryMutAct_9fa48("3287") ? false : stryMutAct_9fa48("3286") ? true : (stryCov_9fa48("3286", "3287", "3288", "3289"), Math.abs(stryMutAct_9fa48("3290") ? a + b : (stryCov_9fa48("3290"), a - b)) < 1e-6);
  return near;
})());

/** Step between neighbouring pulleys when the shelf has none: 0.1 in, or 2.5 mm. */
export const neighbourStep = stryMutAct_9fa48("3291") ? () => undefined : (stryCov_9fa48("3291"), (() => {
  const neighbourStep = (system: UnitSystem) => (stryMutAct_9fa48("3294") ? unitLabel("length-small", system) !== "in" : stryMutAct_9fa48("3293") ? false : stryMutAct_9fa48("3292") ? true : (stryCov_9fa48("3292", "3293", "3294"), unitLabel(stryMutAct_9fa48("3295") ? "" : (stryCov_9fa48("3295"), "length-small"), system) === (stryMutAct_9fa48("3296") ? "" : (stryCov_9fa48("3296"), "in")))) ? inToM(0.1) : 0.0025;
  return neighbourStep;
})());

/**
 * The next smaller and next larger blower pulleys to overlay: stocked sizes first, then any on
 * the shelf, else one step either side.
 */
export function neighbourPulleys(current: number, shelf: readonly ShelfPulley[], system: UnitSystem): {
  smaller: number | null;
  larger: number | null;
} {
  if (stryMutAct_9fa48("3297")) {
    {}
  } else {
    stryCov_9fa48("3297");
    const pick = (list: readonly ShelfPulley[]) => {
      if (stryMutAct_9fa48("3298")) {
        {}
      } else {
        stryCov_9fa48("3298");
        const ds = stryMutAct_9fa48("3299") ? [...new Set(list.map(p => p.diameter))] : (stryCov_9fa48("3299"), (stryMutAct_9fa48("3300") ? [] : (stryCov_9fa48("3300"), [...new Set(list.map(stryMutAct_9fa48("3301") ? () => undefined : (stryCov_9fa48("3301"), p => p.diameter)))])).sort(stryMutAct_9fa48("3302") ? () => undefined : (stryCov_9fa48("3302"), (a, b) => stryMutAct_9fa48("3303") ? a + b : (stryCov_9fa48("3303"), a - b))));
        const smaller = stryMutAct_9fa48("3304") ? [...ds].reverse().find(d => d < current - 1e-6) && null : (stryCov_9fa48("3304"), (stryMutAct_9fa48("3305") ? [...ds].find(d => d < current - 1e-6) : (stryCov_9fa48("3305"), (stryMutAct_9fa48("3306") ? [] : (stryCov_9fa48("3306"), [...ds])).reverse().find(stryMutAct_9fa48("3307") ? () => undefined : (stryCov_9fa48("3307"), d => stryMutAct_9fa48("3311") ? d >= current - 1e-6 : stryMutAct_9fa48("3310") ? d <= current - 1e-6 : stryMutAct_9fa48("3309") ? false : stryMutAct_9fa48("3308") ? true : (stryCov_9fa48("3308", "3309", "3310", "3311"), d < (stryMutAct_9fa48("3312") ? current + 1e-6 : (stryCov_9fa48("3312"), current - 1e-6))))))) ?? null);
        const larger = stryMutAct_9fa48("3313") ? ds.find(d => d > current + 1e-6) && null : (stryCov_9fa48("3313"), ds.find(stryMutAct_9fa48("3314") ? () => undefined : (stryCov_9fa48("3314"), d => stryMutAct_9fa48("3318") ? d <= current + 1e-6 : stryMutAct_9fa48("3317") ? d >= current + 1e-6 : stryMutAct_9fa48("3316") ? false : stryMutAct_9fa48("3315") ? true : (stryCov_9fa48("3315", "3316", "3317", "3318"), d > (stryMutAct_9fa48("3319") ? current - 1e-6 : (stryCov_9fa48("3319"), current + 1e-6))))) ?? null);
        return stryMutAct_9fa48("3320") ? {} : (stryCov_9fa48("3320"), {
          smaller,
          larger
        });
      }
    };
    const stocked = pick(stryMutAct_9fa48("3321") ? shelf : (stryCov_9fa48("3321"), shelf.filter(stryMutAct_9fa48("3322") ? () => undefined : (stryCov_9fa48("3322"), p => stryMutAct_9fa48("3326") ? p.stock <= 0 : stryMutAct_9fa48("3325") ? p.stock >= 0 : stryMutAct_9fa48("3324") ? false : stryMutAct_9fa48("3323") ? true : (stryCov_9fa48("3323", "3324", "3325", "3326"), p.stock > 0)))));
    const any = pick(shelf);
    const step = neighbourStep(system);
    const fallbackSmaller = (stryMutAct_9fa48("3330") ? current - step < 0.03 : stryMutAct_9fa48("3329") ? current - step > 0.03 : stryMutAct_9fa48("3328") ? false : stryMutAct_9fa48("3327") ? true : (stryCov_9fa48("3327", "3328", "3329", "3330"), (stryMutAct_9fa48("3331") ? current + step : (stryCov_9fa48("3331"), current - step)) >= 0.03)) ? stryMutAct_9fa48("3332") ? current + step : (stryCov_9fa48("3332"), current - step) : null;
    const fallbackLarger = (stryMutAct_9fa48("3336") ? current + step > 0.5 : stryMutAct_9fa48("3335") ? current + step < 0.5 : stryMutAct_9fa48("3334") ? false : stryMutAct_9fa48("3333") ? true : (stryCov_9fa48("3333", "3334", "3335", "3336"), (stryMutAct_9fa48("3337") ? current - step : (stryCov_9fa48("3337"), current + step)) <= 0.5)) ? stryMutAct_9fa48("3338") ? current - step : (stryCov_9fa48("3338"), current + step) : null;
    return stryMutAct_9fa48("3339") ? {} : (stryCov_9fa48("3339"), {
      smaller: stryMutAct_9fa48("3340") ? (stocked.smaller ?? any.smaller) && fallbackSmaller : (stryCov_9fa48("3340"), (stryMutAct_9fa48("3341") ? stocked.smaller && any.smaller : (stryCov_9fa48("3341"), stocked.smaller ?? any.smaller)) ?? fallbackSmaller),
      larger: stryMutAct_9fa48("3342") ? (stocked.larger ?? any.larger) && fallbackLarger : (stryCov_9fa48("3342"), (stryMutAct_9fa48("3343") ? stocked.larger && any.larger : (stryCov_9fa48("3343"), stocked.larger ?? any.larger)) ?? fallbackLarger)
    });
  }
}

/** Candidate blower pulleys for the ladder (m): the shelf's sizes when it has any, else 2.5–4.5 in by 0.1 in; the current one always included. */
export function ladderDiameters(current: number, shelf: readonly ShelfPulley[]): number[] {
  if (stryMutAct_9fa48("3344")) {
    {}
  } else {
    stryCov_9fa48("3344");
    const base = shelf.length ? shelf.map(stryMutAct_9fa48("3345") ? () => undefined : (stryCov_9fa48("3345"), p => p.diameter)) : Array.from(stryMutAct_9fa48("3346") ? {} : (stryCov_9fa48("3346"), {
      length: 21
    }), stryMutAct_9fa48("3347") ? () => undefined : (stryCov_9fa48("3347"), (_, i) => inToM(stryMutAct_9fa48("3348") ? 2.5 - i * 0.1 : (stryCov_9fa48("3348"), 2.5 + (stryMutAct_9fa48("3349") ? i / 0.1 : (stryCov_9fa48("3349"), i * 0.1))))));
    // The current size itself (not a near copy), then every other size once.
    const out = stryMutAct_9fa48("3350") ? [] : (stryCov_9fa48("3350"), [current]);
    for (const d of base) if (stryMutAct_9fa48("3353") ? false : stryMutAct_9fa48("3352") ? true : stryMutAct_9fa48("3351") ? out.some(x => near(x, d)) : (stryCov_9fa48("3351", "3352", "3353"), !(stryMutAct_9fa48("3354") ? out.every(x => near(x, d)) : (stryCov_9fa48("3354"), out.some(stryMutAct_9fa48("3355") ? () => undefined : (stryCov_9fa48("3355"), x => near(x, d))))))) out.push(d);
    return stryMutAct_9fa48("3356") ? out : (stryCov_9fa48("3356"), out.sort(stryMutAct_9fa48("3357") ? () => undefined : (stryCov_9fa48("3357"), (a, b) => stryMutAct_9fa48("3358") ? a + b : (stryCov_9fa48("3358"), a - b))));
  }
}

/** One rung of the ladder as the planner shows it, all at one engine speed (`rpm`). */
export type LadderRow = {
  diameter: number;
  driveRatio: number;
  overdrive: number;
  rpm: number;
  /** Figures at `rpm`; null where there is no balance. Not to be shown when `withinRange` is false. */
  boost: number | null;
  netPower: number | null;
  chargeTemperature: number | null;
  blowerRpm: number;
  blowerRpmAtRedline: number;
  blowerMaxRpm: number;
  withinRange: boolean;
  rangeReasons: readonly RangeReason[];
  warnings: string[];
  current: boolean;
  stock: {
    inStock: boolean;
    price: string;
    partNumber: string;
  } | null;
};
function warningsOf(row: PulleySweepRow): string[] {
  if (stryMutAct_9fa48("3359")) {
    {}
  } else {
    stryCov_9fa48("3359");
    const w: string[] = stryMutAct_9fa48("3360") ? ["Stryker was here"] : (stryCov_9fa48("3360"), []);
    if (stryMutAct_9fa48("3362") ? false : stryMutAct_9fa48("3361") ? true : (stryCov_9fa48("3361", "3362"), row.overspeed)) w.push(stryMutAct_9fa48("3363") ? "" : (stryCov_9fa48("3363"), "Blower over its speed limit at redline"));
    if (stryMutAct_9fa48("3365") ? false : stryMutAct_9fa48("3364") ? true : (stryCov_9fa48("3364", "3365"), row.belowBeltMinimum)) w.push(stryMutAct_9fa48("3366") ? "" : (stryCov_9fa48("3366"), "Below belt minimum"));
    if (stryMutAct_9fa48("3368") ? false : stryMutAct_9fa48("3367") ? true : (stryCov_9fa48("3367", "3368"), row.chargeTemperatureHigh)) w.push(stryMutAct_9fa48("3369") ? "" : (stryCov_9fa48("3369"), "Hot charge"));
    if (stryMutAct_9fa48("3371") ? false : stryMutAct_9fa48("3370") ? true : (stryCov_9fa48("3370", "3371"), row.injectorDutyHigh)) w.push(stryMutAct_9fa48("3372") ? "" : (stryCov_9fa48("3372"), "Injectors at limit"));
    return w;
  }
}

/**
 * The pulley ladder at one engine speed, the same speed the finder uses, so that both give the
 * same boost for the same pulley: boost, power and charge at that speed, limits and stock.
 */
export function ladder(spec: Combination, rpm: number, shelf: readonly ShelfPulley[]): LadderRow[] {
  if (stryMutAct_9fa48("3373")) {
    {}
  } else {
    stryCov_9fa48("3373");
    const ds = ladderDiameters(spec.drive.blowerPulleyDiameter, shelf);
    const sweep = pulleySweep(spec, rpm, ds);
    return ds.map((d, i) => {
      if (stryMutAct_9fa48("3374")) {
        {}
      } else {
        stryCov_9fa48("3374");
        const r = sweep[i];
        const onShelf = stryMutAct_9fa48("3375") ? shelf : (stryCov_9fa48("3375"), shelf.filter(stryMutAct_9fa48("3376") ? () => undefined : (stryCov_9fa48("3376"), s => near(s.diameter, d))));
        const best = stryMutAct_9fa48("3377") ? onShelf.find(s => s.stock > 0) && onShelf[0] : (stryCov_9fa48("3377"), onShelf.find(stryMutAct_9fa48("3378") ? () => undefined : (stryCov_9fa48("3378"), s => stryMutAct_9fa48("3382") ? s.stock <= 0 : stryMutAct_9fa48("3381") ? s.stock >= 0 : stryMutAct_9fa48("3380") ? false : stryMutAct_9fa48("3379") ? true : (stryCov_9fa48("3379", "3380", "3381", "3382"), s.stock > 0))) ?? onShelf[0]);
        return stryMutAct_9fa48("3383") ? {} : (stryCov_9fa48("3383"), {
          diameter: d,
          driveRatio: r.driveRatio,
          overdrive: r.overdrive,
          rpm,
          boost: stryMutAct_9fa48("3384") ? r.point?.boostGauge && null : (stryCov_9fa48("3384"), (stryMutAct_9fa48("3385") ? r.point.boostGauge : (stryCov_9fa48("3385"), r.point?.boostGauge)) ?? null),
          netPower: stryMutAct_9fa48("3386") ? r.point?.netPower && null : (stryCov_9fa48("3386"), (stryMutAct_9fa48("3387") ? r.point.netPower : (stryCov_9fa48("3387"), r.point?.netPower)) ?? null),
          chargeTemperature: stryMutAct_9fa48("3388") ? r.point?.manifoldTemperature && null : (stryCov_9fa48("3388"), (stryMutAct_9fa48("3389") ? r.point.manifoldTemperature : (stryCov_9fa48("3389"), r.point?.manifoldTemperature)) ?? null),
          blowerRpm: r.blowerRpm,
          blowerRpmAtRedline: r.blowerRpmAtRedline,
          blowerMaxRpm: spec.blower.maxRpm,
          withinRange: r.withinRange,
          rangeReasons: r.rangeReasons,
          warnings: warningsOf(r),
          current: near(d, spec.drive.blowerPulleyDiameter),
          stock: best ? stryMutAct_9fa48("3390") ? {} : (stryCov_9fa48("3390"), {
            inStock: stryMutAct_9fa48("3394") ? best.stock <= 0 : stryMutAct_9fa48("3393") ? best.stock >= 0 : stryMutAct_9fa48("3392") ? false : stryMutAct_9fa48("3391") ? true : (stryCov_9fa48("3391", "3392", "3393", "3394"), best.stock > 0),
            price: best.price,
            partNumber: best.partNumber
          }) : null
        });
      }
    });
  }
}

/** The ladder and finder's default speed: the finder's target speed when given, else peak power speed. */
export const ladderSpeed = stryMutAct_9fa48("3395") ? () => undefined : (stryCov_9fa48("3395"), (() => {
  const ladderSpeed = (chosen: number | null, peakRpm: number): number => stryMutAct_9fa48("3396") ? chosen && peakRpm : (stryCov_9fa48("3396"), chosen ?? peakRpm);
  return ladderSpeed;
})());

/** Sizes the finder offers as "nearest in stock": only pulleys with stock on the shelf (an empty shelf offers none). */
export function finderStock(shelf: readonly ShelfPulley[]): number[] {
  if (stryMutAct_9fa48("3397")) {
    {}
  } else {
    stryCov_9fa48("3397");
    return stryMutAct_9fa48("3398") ? [] : (stryCov_9fa48("3398"), [...new Set(stryMutAct_9fa48("3399") ? shelf.map(p => p.diameter) : (stryCov_9fa48("3399"), shelf.filter(stryMutAct_9fa48("3400") ? () => undefined : (stryCov_9fa48("3400"), p => stryMutAct_9fa48("3404") ? p.stock <= 0 : stryMutAct_9fa48("3403") ? p.stock >= 0 : stryMutAct_9fa48("3402") ? false : stryMutAct_9fa48("3401") ? true : (stryCov_9fa48("3401", "3402", "3403", "3404"), p.stock > 0))).map(stryMutAct_9fa48("3405") ? () => undefined : (stryCov_9fa48("3405"), p => p.diameter))))]);
  }
}
export type FinderOutcome = {
  ok: true;
  result: PulleyForBoostResult;
} | {
  ok: false;
  message: string;
};

/** The pulley finder, with an unreachable target explained in the user's units. */
export function findPulley(spec: Combination, rpm: number, targetBoostGauge: number, stock: readonly number[], system: UnitSystem): FinderOutcome {
  if (stryMutAct_9fa48("3406")) {
    {}
  } else {
    stryCov_9fa48("3406");
    try {
      if (stryMutAct_9fa48("3407")) {
        {}
      } else {
        stryCov_9fa48("3407");
        return stryMutAct_9fa48("3408") ? {} : (stryCov_9fa48("3408"), {
          ok: stryMutAct_9fa48("3409") ? false : (stryCov_9fa48("3409"), true),
          result: pulleyForBoost(spec, rpm, targetBoostGauge, stock)
        });
      }
    } catch (e) {
      if (stryMutAct_9fa48("3410")) {
        {}
      } else {
        stryCov_9fa48("3410");
        if (stryMutAct_9fa48("3412") ? false : stryMutAct_9fa48("3411") ? true : (stryCov_9fa48("3411", "3412"), e instanceof CalcTargetUnreachableError)) {
          if (stryMutAct_9fa48("3413")) {
            {}
          } else {
            stryCov_9fa48("3413");
            const lo = (stryMutAct_9fa48("3416") ? e.minimum !== null : stryMutAct_9fa48("3415") ? false : stryMutAct_9fa48("3414") ? true : (stryCov_9fa48("3414", "3415", "3416"), e.minimum === null)) ? stryMutAct_9fa48("3417") ? "" : (stryCov_9fa48("3417"), "no balance") : quantityText(stryMutAct_9fa48("3418") ? "" : (stryCov_9fa48("3418"), "pressure"), e.minimum, system);
            const hi = (stryMutAct_9fa48("3421") ? e.maximum !== null : stryMutAct_9fa48("3420") ? false : stryMutAct_9fa48("3419") ? true : (stryCov_9fa48("3419", "3420", "3421"), e.maximum === null)) ? stryMutAct_9fa48("3422") ? "" : (stryCov_9fa48("3422"), "no balance") : quantityText(stryMutAct_9fa48("3423") ? "" : (stryCov_9fa48("3423"), "pressure"), e.maximum, system);
            return stryMutAct_9fa48("3424") ? {} : (stryCov_9fa48("3424"), {
              ok: stryMutAct_9fa48("3425") ? true : (stryCov_9fa48("3425"), false),
              message: stryMutAct_9fa48("3426") ? `` : (stryCov_9fa48("3426"), `A boost of ${quantityText(stryMutAct_9fa48("3427") ? "" : (stryCov_9fa48("3427"), "pressure"), targetBoostGauge, system)} cannot be reached at ${Math.round(rpm)} rpm with any blower pulley from ${quantityText(stryMutAct_9fa48("3428") ? "" : (stryCov_9fa48("3428"), "length-small"), 0.03, system)} to ${quantityText(stryMutAct_9fa48("3429") ? "" : (stryCov_9fa48("3429"), "length-small"), 0.5, system)}. The reachable range there is ${lo} to ${hi}.`)
            });
          }
        }
        if (stryMutAct_9fa48("3432") ? e instanceof CalcConvergenceError && e instanceof CalcInputError : stryMutAct_9fa48("3431") ? false : stryMutAct_9fa48("3430") ? true : (stryCov_9fa48("3430", "3431", "3432"), e instanceof CalcConvergenceError || e instanceof CalcInputError)) return stryMutAct_9fa48("3433") ? {} : (stryCov_9fa48("3433"), {
          ok: stryMutAct_9fa48("3434") ? true : (stryCov_9fa48("3434"), false),
          message: calcErrorText(e, system)
        });
        throw e;
      }
    }
  }
}