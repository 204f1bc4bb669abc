// @ts-nocheck
// The parts shelf's rules without the database: money arithmetic (decimal.js), the zod schemas
// of blowers and pulleys (records, forms in the user's units, list queries) and the CSV layout.
// Forms in the browser import these; db/repo/shelf.ts applies them to the tables.
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
import Decimal from "decimal.js";
import { z } from "zod";
import { text } from "@/lib/validation/text";
import { blowerKindSchema, blowerSchema, fromSI, roundInward, toSI, type UnitSystem, unitLabel } from "@/calc";
import { digitsOf } from "@/lib/units/format";

// ---------------------------------------------------------------- money

/** Decimal arithmetic for prices: plenty of digits, half-up rounding to cents like a till. */
export const Money = Decimal.clone(stryMutAct_9fa48("4199") ? {} : (stryCov_9fa48("4199"), {
  precision: 40,
  rounding: Decimal.ROUND_HALF_UP
}));
export type MoneyValue = InstanceType<typeof Money>;
const MONEY_TEXT = stryMutAct_9fa48("4206") ? /^\d{1,10}(\.\D{1,2})?$/ : stryMutAct_9fa48("4205") ? /^\d{1,10}(\.\d)?$/ : stryMutAct_9fa48("4204") ? /^\d{1,10}(\.\d{1,2})$/ : stryMutAct_9fa48("4203") ? /^\D{1,10}(\.\d{1,2})?$/ : stryMutAct_9fa48("4202") ? /^\d(\.\d{1,2})?$/ : stryMutAct_9fa48("4201") ? /^\d{1,10}(\.\d{1,2})?/ : stryMutAct_9fa48("4200") ? /\d{1,10}(\.\d{1,2})?$/ : (stryCov_9fa48("4200", "4201", "4202", "4203", "4204", "4205", "4206"), /^\d{1,10}(\.\d{1,2})?$/);
export const MAX_PRICE = stryMutAct_9fa48("4207") ? "" : (stryCov_9fa48("4207"), "9999999999.99");

/** A price: "19.99" or 19.99 in, "19.99" out (two decimals, at most 9 999 999 999.99, not negative). */
export const moneySchema = z.union(stryMutAct_9fa48("4208") ? [] : (stryCov_9fa48("4208"), [z.string(), z.number()]), stryMutAct_9fa48("4209") ? {} : (stryCov_9fa48("4209"), {
  error: stryMutAct_9fa48("4210") ? "" : (stryCov_9fa48("4210"), "Price must be an amount like 19.99.")
})).transform((v, ctx) => {
  if (stryMutAct_9fa48("4211")) {
    {}
  } else {
    stryCov_9fa48("4211");
    const t = stryMutAct_9fa48("4212") ? (typeof v === "number" ? Number.isFinite(v) ? String(v) : "" : v).replace(/^\$/, "") : (stryCov_9fa48("4212"), ((stryMutAct_9fa48("4215") ? typeof v !== "number" : stryMutAct_9fa48("4214") ? false : stryMutAct_9fa48("4213") ? true : (stryCov_9fa48("4213", "4214", "4215"), typeof v === (stryMutAct_9fa48("4216") ? "" : (stryCov_9fa48("4216"), "number")))) ? Number.isFinite(v) ? String(v) : stryMutAct_9fa48("4217") ? "Stryker was here!" : (stryCov_9fa48("4217"), "") : v).trim().replace(stryMutAct_9fa48("4218") ? /\$/ : (stryCov_9fa48("4218"), /^\$/), stryMutAct_9fa48("4219") ? "Stryker was here!" : (stryCov_9fa48("4219"), "")));
    if (stryMutAct_9fa48("4222") ? false : stryMutAct_9fa48("4221") ? true : stryMutAct_9fa48("4220") ? MONEY_TEXT.test(t) : (stryCov_9fa48("4220", "4221", "4222"), !MONEY_TEXT.test(t))) {
      if (stryMutAct_9fa48("4223")) {
        {}
      } else {
        stryCov_9fa48("4223");
        ctx.addIssue(stryMutAct_9fa48("4224") ? {} : (stryCov_9fa48("4224"), {
          code: stryMutAct_9fa48("4225") ? "" : (stryCov_9fa48("4225"), "custom"),
          message: stryMutAct_9fa48("4226") ? "" : (stryCov_9fa48("4226"), "Price must be an amount with at most two decimals, like 19.99 (no minus sign).")
        }));
        return z.NEVER;
      }
    }
    return new Money(t).toFixed(2);
  }
});

/** Price × quantity, exact, as a two-decimal string. */
export function lineTotal(unitPrice: string, quantity: number): string {
  if (stryMutAct_9fa48("4227")) {
    {}
  } else {
    stryCov_9fa48("4227");
    return new Money(unitPrice).times(quantity).toDecimalPlaces(2).toFixed(2);
  }
}

/** Sum of amounts, exact, as a two-decimal string. */
export function sumMoney(amounts: readonly string[]): string {
  if (stryMutAct_9fa48("4228")) {
    {}
  } else {
    stryCov_9fa48("4228");
    return amounts.reduce(stryMutAct_9fa48("4229") ? () => undefined : (stryCov_9fa48("4229"), (acc, a) => acc.plus(new Money(a))), new Money(0)).toDecimalPlaces(2).toFixed(2);
  }
}

/** "1234.5" → "1,234.50" for display (no currency symbol: the shop's currency is its own). */
export function formatMoney(amount: string): string {
  if (stryMutAct_9fa48("4230")) {
    {}
  } else {
    stryCov_9fa48("4230");
    const [whole, frac = stryMutAct_9fa48("4231") ? "Stryker was here!" : (stryCov_9fa48("4231"), "")] = new Money(amount).toFixed(2).split(stryMutAct_9fa48("4232") ? "" : (stryCov_9fa48("4232"), "."));
    return stryMutAct_9fa48("4233") ? `` : (stryCov_9fa48("4233"), `${whole.replace(stryMutAct_9fa48("4239") ? /\B(?=(\d{3})+(?!\D))/g : stryMutAct_9fa48("4238") ? /\B(?=(\d{3})+(?=\d))/g : stryMutAct_9fa48("4237") ? /\B(?=(\D{3})+(?!\d))/g : stryMutAct_9fa48("4236") ? /\B(?=(\d)+(?!\d))/g : stryMutAct_9fa48("4235") ? /\B(?=(\d{3})(?!\d))/g : stryMutAct_9fa48("4234") ? /\B(?!(\d{3})+(?!\d))/g : (stryCov_9fa48("4234", "4235", "4236", "4237", "4238", "4239"), /\B(?=(\d{3})+(?!\d))/g), stryMutAct_9fa48("4240") ? "" : (stryCov_9fa48("4240"), ","))}.${frac}`);
  }
}

// ---------------------------------------------------------------- records

/** Our own part numbers: capitals, digits and dashes, e.g. PW-BP-0340-8. */
export const partNumberSchema = stryMutAct_9fa48("4242") ? z.string({
  error: "Part number is required."
}).toUpperCase().regex(/^[A-Z0-9][A-Z0-9-]{2,39}$/, "Part number must be 3–40 capitals, digits or dashes, like PW-BP-0340-8.") : stryMutAct_9fa48("4241") ? z.string({
  error: "Part number is required."
}).trim().toLowerCase().regex(/^[A-Z0-9][A-Z0-9-]{2,39}$/, "Part number must be 3–40 capitals, digits or dashes, like PW-BP-0340-8.") : (stryCov_9fa48("4241", "4242"), z.string(stryMutAct_9fa48("4243") ? {} : (stryCov_9fa48("4243"), {
  error: stryMutAct_9fa48("4244") ? "" : (stryCov_9fa48("4244"), "Part number is required.")
})).trim().toUpperCase().regex(stryMutAct_9fa48("4249") ? /^[A-Z0-9][^A-Z0-9-]{2,39}$/ : stryMutAct_9fa48("4248") ? /^[A-Z0-9][A-Z0-9-]$/ : stryMutAct_9fa48("4247") ? /^[^A-Z0-9][A-Z0-9-]{2,39}$/ : stryMutAct_9fa48("4246") ? /^[A-Z0-9][A-Z0-9-]{2,39}/ : stryMutAct_9fa48("4245") ? /[A-Z0-9][A-Z0-9-]{2,39}$/ : (stryCov_9fa48("4245", "4246", "4247", "4248", "4249"), /^[A-Z0-9][A-Z0-9-]{2,39}$/), stryMutAct_9fa48("4250") ? "" : (stryCov_9fa48("4250"), "Part number must be 3–40 capitals, digits or dashes, like PW-BP-0340-8.")));
export const stockSchema = stryMutAct_9fa48("4252") ? z.number({
  error: "Stock must be a whole number (0 or more)."
}).int("Stock must be a whole number (0 or more).").max(0, "Stock must be a whole number (0 or more).").max(1_000_000, "Stock must be at most 1 000 000.") : stryMutAct_9fa48("4251") ? z.number({
  error: "Stock must be a whole number (0 or more)."
}).int("Stock must be a whole number (0 or more).").min(0, "Stock must be a whole number (0 or more).").min(1_000_000, "Stock must be at most 1 000 000.") : (stryCov_9fa48("4251", "4252"), z.number(stryMutAct_9fa48("4253") ? {} : (stryCov_9fa48("4253"), {
  error: stryMutAct_9fa48("4254") ? "" : (stryCov_9fa48("4254"), "Stock must be a whole number (0 or more).")
})).int(stryMutAct_9fa48("4255") ? "" : (stryCov_9fa48("4255"), "Stock must be a whole number (0 or more).")).min(0, stryMutAct_9fa48("4256") ? "" : (stryCov_9fa48("4256"), "Stock must be a whole number (0 or more).")).max(1_000_000, stryMutAct_9fa48("4257") ? "" : (stryCov_9fa48("4257"), "Stock must be at most 1 000 000.")));
function boundedSI(label: string, min: number, max: number, unit: string) {
  if (stryMutAct_9fa48("4258")) {
    {}
  } else {
    stryCov_9fa48("4258");
    const message = stryMutAct_9fa48("4259") ? `` : (stryCov_9fa48("4259"), `${label} must be between ${min} and ${max} ${unit}.`);
    return stryMutAct_9fa48("4261") ? z.number({
      error: message
    }).max(min, message).max(max, message) : stryMutAct_9fa48("4260") ? z.number({
      error: message
    }).min(min, message).min(max, message) : (stryCov_9fa48("4260", "4261"), z.number(stryMutAct_9fa48("4262") ? {} : (stryCov_9fa48("4262"), {
      error: message
    })).min(min, message).max(max, message));
  }
}

/** A blower on the shelf (SI): the model's blower fields plus what the shop sells it as. */
export const blowerRecordSchema = blowerSchema.safeExtend(stryMutAct_9fa48("4263") ? {} : (stryCov_9fa48("4263"), {
  partNumber: partNumberSchema,
  name: stryMutAct_9fa48("4264") ? text("Name", 120).max(1, "Give the blower a name, e.g. “Roots 1.9 L/rev”.") : (stryCov_9fa48("4264"), text(stryMutAct_9fa48("4265") ? "" : (stryCov_9fa48("4265"), "Name"), 120).min(1, stryMutAct_9fa48("4266") ? "" : (stryCov_9fa48("4266"), "Give the blower a name, e.g. “Roots 1.9 L/rev”."))),
  notes: text(stryMutAct_9fa48("4267") ? "" : (stryCov_9fa48("4267"), "Notes"), 2000).default(stryMutAct_9fa48("4268") ? "Stryker was here!" : (stryCov_9fa48("4268"), "")),
  price: moneySchema,
  stock: stockSchema
}));
export const PULLEY_DIAMETER_MIN = 0.03;
export const PULLEY_DIAMETER_MAX = 0.5;
export const BELT_MINIMUM_MIN = 0.02;
export const BELT_MINIMUM_MAX = 0.3;

/** A pulley on the shelf (SI: diameters in m). */
export const pulleyRecordSchema = z.object(stryMutAct_9fa48("4269") ? {} : (stryCov_9fa48("4269"), {
  partNumber: partNumberSchema,
  position: z.enum(stryMutAct_9fa48("4270") ? [] : (stryCov_9fa48("4270"), [stryMutAct_9fa48("4271") ? "" : (stryCov_9fa48("4271"), "crank"), stryMutAct_9fa48("4272") ? "" : (stryCov_9fa48("4272"), "blower")]), stryMutAct_9fa48("4273") ? {} : (stryCov_9fa48("4273"), {
    error: stryMutAct_9fa48("4274") ? "" : (stryCov_9fa48("4274"), "Position must be crank or blower.")
  })),
  diameter: boundedSI(stryMutAct_9fa48("4275") ? "" : (stryCov_9fa48("4275"), "Diameter"), PULLEY_DIAMETER_MIN, PULLEY_DIAMETER_MAX, stryMutAct_9fa48("4276") ? "" : (stryCov_9fa48("4276"), "m")),
  ribCount: stryMutAct_9fa48("4278") ? z.number({
    error: "Rib count must be a whole number from 3 to 16."
  }).int("Rib count must be a whole number from 3 to 16.").max(3, "Rib count must be a whole number from 3 to 16.").max(16, "Rib count must be a whole number from 3 to 16.") : stryMutAct_9fa48("4277") ? z.number({
    error: "Rib count must be a whole number from 3 to 16."
  }).int("Rib count must be a whole number from 3 to 16.").min(3, "Rib count must be a whole number from 3 to 16.").min(16, "Rib count must be a whole number from 3 to 16.") : (stryCov_9fa48("4277", "4278"), z.number(stryMutAct_9fa48("4279") ? {} : (stryCov_9fa48("4279"), {
    error: stryMutAct_9fa48("4280") ? "" : (stryCov_9fa48("4280"), "Rib count must be a whole number from 3 to 16.")
  })).int(stryMutAct_9fa48("4281") ? "" : (stryCov_9fa48("4281"), "Rib count must be a whole number from 3 to 16.")).min(3, stryMutAct_9fa48("4282") ? "" : (stryCov_9fa48("4282"), "Rib count must be a whole number from 3 to 16.")).max(16, stryMutAct_9fa48("4283") ? "" : (stryCov_9fa48("4283"), "Rib count must be a whole number from 3 to 16."))),
  minBeltDiameter: boundedSI(stryMutAct_9fa48("4284") ? "" : (stryCov_9fa48("4284"), "Minimum belt diameter"), BELT_MINIMUM_MIN, BELT_MINIMUM_MAX, stryMutAct_9fa48("4285") ? "" : (stryCov_9fa48("4285"), "m")).nullable().default(null),
  price: moneySchema,
  stock: stockSchema,
  notes: text(stryMutAct_9fa48("4286") ? "" : (stryCov_9fa48("4286"), "Notes"), 2000).default(stryMutAct_9fa48("4287") ? "Stryker was here!" : (stryCov_9fa48("4287"), ""))
}));
export type BlowerRecordInput = z.input<typeof blowerRecordSchema>;
export type BlowerRecord = z.output<typeof blowerRecordSchema>;
export type PulleyRecordInput = z.input<typeof pulleyRecordSchema>;
export type PulleyRecord = z.output<typeof pulleyRecordSchema>;

// Forms take lengths and volumes in the user's units and efficiencies in percent; their output is
// the SI record above, so the browser and the API apply the same rules. Fields that need no
// conversion use the record's own schemas, so every field's problem shows at once.
const numberIn = stryMutAct_9fa48("4288") ? () => undefined : (stryCov_9fa48("4288"), (() => {
  const numberIn = (label: string, unit: string) => z.union(stryMutAct_9fa48("4289") ? [] : (stryCov_9fa48("4289"), [z.string(), z.number()])).transform((v, ctx) => {
    if (stryMutAct_9fa48("4290")) {
      {}
    } else {
      stryCov_9fa48("4290");
      const n = (stryMutAct_9fa48("4293") ? typeof v !== "number" : stryMutAct_9fa48("4292") ? false : stryMutAct_9fa48("4291") ? true : (stryCov_9fa48("4291", "4292", "4293"), typeof v === (stryMutAct_9fa48("4294") ? "" : (stryCov_9fa48("4294"), "number")))) ? v : (stryMutAct_9fa48("4297") ? v.trim() !== "" : stryMutAct_9fa48("4296") ? false : stryMutAct_9fa48("4295") ? true : (stryCov_9fa48("4295", "4296", "4297"), (stryMutAct_9fa48("4298") ? v : (stryCov_9fa48("4298"), v.trim())) === (stryMutAct_9fa48("4299") ? "Stryker was here!" : (stryCov_9fa48("4299"), "")))) ? NaN : Number(stryMutAct_9fa48("4300") ? v : (stryCov_9fa48("4300"), v.trim()));
      if (stryMutAct_9fa48("4303") ? false : stryMutAct_9fa48("4302") ? true : stryMutAct_9fa48("4301") ? Number.isFinite(n) : (stryCov_9fa48("4301", "4302", "4303"), !Number.isFinite(n))) {
        if (stryMutAct_9fa48("4304")) {
          {}
        } else {
          stryCov_9fa48("4304");
          ctx.addIssue(stryMutAct_9fa48("4305") ? {} : (stryCov_9fa48("4305"), {
            code: stryMutAct_9fa48("4306") ? "" : (stryCov_9fa48("4306"), "custom"),
            message: stryMutAct_9fa48("4307") ? `` : (stryCov_9fa48("4307"), `${label} must be a number${unit ? stryMutAct_9fa48("4308") ? `` : (stryCov_9fa48("4308"), ` in ${unit}`) : stryMutAct_9fa48("4309") ? "Stryker was here!" : (stryCov_9fa48("4309"), "")}.`)
          }));
          return z.NEVER;
        }
      }
      return n;
    }
  });
  return numberIn;
})());
const optionalNumberIn = stryMutAct_9fa48("4310") ? () => undefined : (stryCov_9fa48("4310"), (() => {
  const optionalNumberIn = (label: string, unit: string) => z.union(stryMutAct_9fa48("4311") ? [] : (stryCov_9fa48("4311"), [z.string(), z.number(), z.null()])).transform((v, ctx) => {
    if (stryMutAct_9fa48("4312")) {
      {}
    } else {
      stryCov_9fa48("4312");
      if (stryMutAct_9fa48("4315") ? v === null && typeof v === "string" && v.trim() === "" : stryMutAct_9fa48("4314") ? false : stryMutAct_9fa48("4313") ? true : (stryCov_9fa48("4313", "4314", "4315"), (stryMutAct_9fa48("4317") ? v !== null : stryMutAct_9fa48("4316") ? false : (stryCov_9fa48("4316", "4317"), v === null)) || (stryMutAct_9fa48("4319") ? typeof v === "string" || v.trim() === "" : stryMutAct_9fa48("4318") ? false : (stryCov_9fa48("4318", "4319"), (stryMutAct_9fa48("4321") ? typeof v !== "string" : stryMutAct_9fa48("4320") ? true : (stryCov_9fa48("4320", "4321"), typeof v === (stryMutAct_9fa48("4322") ? "" : (stryCov_9fa48("4322"), "string")))) && (stryMutAct_9fa48("4324") ? v.trim() !== "" : stryMutAct_9fa48("4323") ? true : (stryCov_9fa48("4323", "4324"), (stryMutAct_9fa48("4325") ? v : (stryCov_9fa48("4325"), v.trim())) === (stryMutAct_9fa48("4326") ? "Stryker was here!" : (stryCov_9fa48("4326"), "")))))))) return null;
      const n = (stryMutAct_9fa48("4329") ? typeof v !== "number" : stryMutAct_9fa48("4328") ? false : stryMutAct_9fa48("4327") ? true : (stryCov_9fa48("4327", "4328", "4329"), typeof v === (stryMutAct_9fa48("4330") ? "" : (stryCov_9fa48("4330"), "number")))) ? v : Number(stryMutAct_9fa48("4331") ? v : (stryCov_9fa48("4331"), v.trim()));
      if (stryMutAct_9fa48("4334") ? false : stryMutAct_9fa48("4333") ? true : stryMutAct_9fa48("4332") ? Number.isFinite(n) : (stryCov_9fa48("4332", "4333", "4334"), !Number.isFinite(n))) {
        if (stryMutAct_9fa48("4335")) {
          {}
        } else {
          stryCov_9fa48("4335");
          ctx.addIssue(stryMutAct_9fa48("4336") ? {} : (stryCov_9fa48("4336"), {
            code: stryMutAct_9fa48("4337") ? "" : (stryCov_9fa48("4337"), "custom"),
            message: stryMutAct_9fa48("4338") ? `` : (stryCov_9fa48("4338"), `${label} must be a number in ${unit}, or left empty.`)
          }));
          return z.NEVER;
        }
      }
      return n;
    }
  });
  return optionalNumberIn;
})());

/** Validates a form's converted output with a record schema, keeping each issue on its field. */
function into<S extends z.ZodType>(schema: S) {
  if (stryMutAct_9fa48("4339")) {
    {}
  } else {
    stryCov_9fa48("4339");
    return (value: unknown, ctx: z.RefinementCtx): z.output<S> => {
      if (stryMutAct_9fa48("4340")) {
        {}
      } else {
        stryCov_9fa48("4340");
        const r = schema.safeParse(value);
        if (stryMutAct_9fa48("4342") ? false : stryMutAct_9fa48("4341") ? true : (stryCov_9fa48("4341", "4342"), r.success)) return r.data;
        for (const issue of r.error.issues) ctx.addIssue(stryMutAct_9fa48("4343") ? {} : (stryCov_9fa48("4343"), {
          code: stryMutAct_9fa48("4344") ? "" : (stryCov_9fa48("4344"), "custom"),
          path: issue.path as (string | number)[],
          message: issue.message
        }));
        return z.NEVER;
      }
    };
  }
}

/** calc's limits for one of the blower's fields (SI), so the form states them in the user's units. */
function blowerLimits(field: "displacementPerRev" | "volumetricEfficiencyRef" | "internalEfficiency" | "mechanicalEfficiency") {
  if (stryMutAct_9fa48("4345")) {
    {}
  } else {
    stryCov_9fa48("4345");
    const s = blowerSchema.shape[field];
    const n = s instanceof z.ZodDefault ? s.unwrap() as z.ZodNumber : s as z.ZodNumber;
    return stryMutAct_9fa48("4346") ? {} : (stryCov_9fa48("4346"), {
      min: n.minValue!,
      max: n.maxValue!
    });
  }
}

/**
 * SI limits in the user's units, rounded inward to `digits` decimals so that every value inside
 * the stated range is accepted, and the message that states them.
 */
function limitsIn(label: string, unit: string, si: {
  min: number;
  max: number;
}, fromSi: (v: number) => number, digits: number) {
  if (stryMutAct_9fa48("4347")) {
    {}
  } else {
    stryCov_9fa48("4347");
    const lo = roundInward(fromSi(si.min), stryMutAct_9fa48("4348") ? +digits : (stryCov_9fa48("4348"), -digits), stryMutAct_9fa48("4349") ? "" : (stryCov_9fa48("4349"), "up"));
    const hi = roundInward(fromSi(si.max), stryMutAct_9fa48("4350") ? +digits : (stryCov_9fa48("4350"), -digits), stryMutAct_9fa48("4351") ? "" : (stryCov_9fa48("4351"), "down"));
    return stryMutAct_9fa48("4352") ? {} : (stryCov_9fa48("4352"), {
      inRange: stryMutAct_9fa48("4353") ? () => undefined : (stryCov_9fa48("4353"), (v: number | null) => stryMutAct_9fa48("4356") ? v === null && v >= lo && v <= hi : stryMutAct_9fa48("4355") ? false : stryMutAct_9fa48("4354") ? true : (stryCov_9fa48("4354", "4355", "4356"), (stryMutAct_9fa48("4358") ? v !== null : stryMutAct_9fa48("4357") ? false : (stryCov_9fa48("4357", "4358"), v === null)) || (stryMutAct_9fa48("4360") ? v >= lo || v <= hi : stryMutAct_9fa48("4359") ? false : (stryCov_9fa48("4359", "4360"), (stryMutAct_9fa48("4363") ? v < lo : stryMutAct_9fa48("4362") ? v > lo : stryMutAct_9fa48("4361") ? true : (stryCov_9fa48("4361", "4362", "4363"), v >= lo)) && (stryMutAct_9fa48("4366") ? v > hi : stryMutAct_9fa48("4365") ? v < hi : stryMutAct_9fa48("4364") ? true : (stryCov_9fa48("4364", "4365", "4366"), v <= hi)))))),
      message: stryMutAct_9fa48("4367") ? `` : (stryCov_9fa48("4367"), `${label} must be between ${lo} and ${hi} ${unit}.`)
    });
  }
}

/** A number in the user's units within SI limits, which the message states in those units. */
function withinIn(label: string, unit: string, si: {
  min: number;
  max: number;
}, fromSi: (v: number) => number, digits: number) {
  if (stryMutAct_9fa48("4368")) {
    {}
  } else {
    stryCov_9fa48("4368");
    const {
      inRange,
      message
    } = limitsIn(label, unit, si, fromSi, digits);
    return numberIn(label, unit).refine(inRange, message);
  }
}

/** The same, where an empty field means "not known" (null). */
function optionalWithinIn(label: string, unit: string, si: {
  min: number;
  max: number;
}, fromSi: (v: number) => number, digits: number) {
  if (stryMutAct_9fa48("4369")) {
    {}
  } else {
    stryCov_9fa48("4369");
    const {
      inRange,
      message
    } = limitsIn(label, unit, si, fromSi, digits);
    return optionalNumberIn(label, unit).refine(inRange, message);
  }
}

/** The pulley form in the user's units; parses to a SI pulley record. */
export function pulleyFormSchema(system: UnitSystem) {
  if (stryMutAct_9fa48("4370")) {
    {}
  } else {
    stryCov_9fa48("4370");
    const unit = unitLabel(stryMutAct_9fa48("4371") ? "" : (stryCov_9fa48("4371"), "length-small"), system);
    const length = stryMutAct_9fa48("4372") ? () => undefined : (stryCov_9fa48("4372"), (() => {
      const length = (m: number) => fromSI(stryMutAct_9fa48("4373") ? "" : (stryCov_9fa48("4373"), "length-small"), m, system);
      return length;
    })());
    const digits = digitsOf(stryMutAct_9fa48("4374") ? "" : (stryCov_9fa48("4374"), "length-small"), system);
    return z.object(stryMutAct_9fa48("4375") ? {} : (stryCov_9fa48("4375"), {
      partNumber: pulleyRecordSchema.shape.partNumber,
      position: pulleyRecordSchema.shape.position,
      diameter: withinIn(stryMutAct_9fa48("4376") ? "" : (stryCov_9fa48("4376"), "Diameter"), unit, stryMutAct_9fa48("4377") ? {} : (stryCov_9fa48("4377"), {
        min: PULLEY_DIAMETER_MIN,
        max: PULLEY_DIAMETER_MAX
      }), length, digits),
      ribCount: numberIn(stryMutAct_9fa48("4378") ? "" : (stryCov_9fa48("4378"), "Rib count"), stryMutAct_9fa48("4379") ? "Stryker was here!" : (stryCov_9fa48("4379"), "")).pipe(pulleyRecordSchema.shape.ribCount),
      minBeltDiameter: optionalWithinIn(stryMutAct_9fa48("4380") ? "" : (stryCov_9fa48("4380"), "Minimum belt diameter"), unit, stryMutAct_9fa48("4381") ? {} : (stryCov_9fa48("4381"), {
        min: BELT_MINIMUM_MIN,
        max: BELT_MINIMUM_MAX
      }), length, digits),
      price: moneySchema,
      stock: numberIn(stryMutAct_9fa48("4382") ? "" : (stryCov_9fa48("4382"), "Stock"), stryMutAct_9fa48("4383") ? "Stryker was here!" : (stryCov_9fa48("4383"), "")).pipe(stockSchema),
      notes: pulleyRecordSchema.shape.notes
    })).transform(stryMutAct_9fa48("4384") ? () => undefined : (stryCov_9fa48("4384"), f => stryMutAct_9fa48("4385") ? {} : (stryCov_9fa48("4385"), {
      ...f,
      diameter: toSI(stryMutAct_9fa48("4386") ? "" : (stryCov_9fa48("4386"), "length-small"), f.diameter, system),
      minBeltDiameter: (stryMutAct_9fa48("4389") ? f.minBeltDiameter !== null : stryMutAct_9fa48("4388") ? false : stryMutAct_9fa48("4387") ? true : (stryCov_9fa48("4387", "4388", "4389"), f.minBeltDiameter === null)) ? null : toSI(stryMutAct_9fa48("4390") ? "" : (stryCov_9fa48("4390"), "length-small"), f.minBeltDiameter, system)
    }))).transform(into(pulleyRecordSchema));
  }
}

/** The blower form in the user's units (displacement per rev) and percent (efficiencies). */
export function blowerFormSchema(system: UnitSystem) {
  if (stryMutAct_9fa48("4391")) {
    {}
  } else {
    stryCov_9fa48("4391");
    const unit = unitLabel(stryMutAct_9fa48("4392") ? "" : (stryCov_9fa48("4392"), "blower-displacement"), system);
    const displacement = stryMutAct_9fa48("4393") ? () => undefined : (stryCov_9fa48("4393"), (() => {
      const displacement = (m3: number) => fromSI(stryMutAct_9fa48("4394") ? "" : (stryCov_9fa48("4394"), "blower-displacement"), m3, system);
      return displacement;
    })());
    const percent = stryMutAct_9fa48("4395") ? () => undefined : (stryCov_9fa48("4395"), (() => {
      const percent = (f: number) => stryMutAct_9fa48("4396") ? f / 100 : (stryCov_9fa48("4396"), f * 100);
      return percent;
    })());
    return z.object(stryMutAct_9fa48("4397") ? {} : (stryCov_9fa48("4397"), {
      partNumber: blowerRecordSchema.shape.partNumber,
      name: blowerRecordSchema.shape.name,
      kind: blowerKindSchema,
      displacementPerRev: withinIn(stryMutAct_9fa48("4398") ? "" : (stryCov_9fa48("4398"), "Blower displacement"), unit, blowerLimits(stryMutAct_9fa48("4399") ? "" : (stryCov_9fa48("4399"), "displacementPerRev")), displacement, stryMutAct_9fa48("4400") ? Math.min(1, digitsOf("blower-displacement", system)) : (stryCov_9fa48("4400"), Math.max(1, digitsOf(stryMutAct_9fa48("4401") ? "" : (stryCov_9fa48("4401"), "blower-displacement"), system)))),
      builtInVolumeRatio: numberIn(stryMutAct_9fa48("4402") ? "" : (stryCov_9fa48("4402"), "Built-in volume ratio"), stryMutAct_9fa48("4403") ? "Stryker was here!" : (stryCov_9fa48("4403"), "")).pipe(blowerSchema.shape.builtInVolumeRatio),
      maxRpm: numberIn(stryMutAct_9fa48("4404") ? "" : (stryCov_9fa48("4404"), "Blower speed limit"), stryMutAct_9fa48("4405") ? "" : (stryCov_9fa48("4405"), "rpm")).pipe(blowerSchema.shape.maxRpm),
      volumetricEfficiencyRef: withinIn(stryMutAct_9fa48("4406") ? "" : (stryCov_9fa48("4406"), "Reference volumetric efficiency"), stryMutAct_9fa48("4407") ? "" : (stryCov_9fa48("4407"), "%"), blowerLimits(stryMutAct_9fa48("4408") ? "" : (stryCov_9fa48("4408"), "volumetricEfficiencyRef")), percent, 0),
      referenceRpm: numberIn(stryMutAct_9fa48("4409") ? "" : (stryCov_9fa48("4409"), "Reference speed"), stryMutAct_9fa48("4410") ? "" : (stryCov_9fa48("4410"), "rpm")).pipe(blowerSchema.shape.referenceRpm),
      internalEfficiency: withinIn(stryMutAct_9fa48("4411") ? "" : (stryCov_9fa48("4411"), "Internal efficiency"), stryMutAct_9fa48("4412") ? "" : (stryCov_9fa48("4412"), "%"), blowerLimits(stryMutAct_9fa48("4413") ? "" : (stryCov_9fa48("4413"), "internalEfficiency")), percent, 0),
      mechanicalEfficiency: withinIn(stryMutAct_9fa48("4414") ? "" : (stryCov_9fa48("4414"), "Drive mechanical efficiency"), stryMutAct_9fa48("4415") ? "" : (stryCov_9fa48("4415"), "%"), blowerLimits(stryMutAct_9fa48("4416") ? "" : (stryCov_9fa48("4416"), "mechanicalEfficiency")), percent, 0),
      notes: blowerRecordSchema.shape.notes,
      price: moneySchema,
      stock: numberIn(stryMutAct_9fa48("4417") ? "" : (stryCov_9fa48("4417"), "Stock"), stryMutAct_9fa48("4418") ? "Stryker was here!" : (stryCov_9fa48("4418"), "")).pipe(stockSchema)
    })).transform(stryMutAct_9fa48("4419") ? () => undefined : (stryCov_9fa48("4419"), f => stryMutAct_9fa48("4420") ? {} : (stryCov_9fa48("4420"), {
      ...f,
      displacementPerRev: toSI(stryMutAct_9fa48("4421") ? "" : (stryCov_9fa48("4421"), "blower-displacement"), f.displacementPerRev, system),
      volumetricEfficiencyRef: stryMutAct_9fa48("4422") ? f.volumetricEfficiencyRef * 100 : (stryCov_9fa48("4422"), f.volumetricEfficiencyRef / 100),
      internalEfficiency: stryMutAct_9fa48("4423") ? f.internalEfficiency * 100 : (stryCov_9fa48("4423"), f.internalEfficiency / 100),
      mechanicalEfficiency: stryMutAct_9fa48("4424") ? f.mechanicalEfficiency * 100 : (stryCov_9fa48("4424"), f.mechanicalEfficiency / 100)
    }))).transform(into(blowerRecordSchema));
  }
}

// ---------------------------------------------------------------- lists

const flag = z.union(stryMutAct_9fa48("4425") ? [] : (stryCov_9fa48("4425"), [z.boolean(), z.enum(stryMutAct_9fa48("4426") ? [] : (stryCov_9fa48("4426"), [stryMutAct_9fa48("4427") ? "" : (stryCov_9fa48("4427"), "1"), stryMutAct_9fa48("4428") ? "" : (stryCov_9fa48("4428"), "0"), stryMutAct_9fa48("4429") ? "" : (stryCov_9fa48("4429"), "true"), stryMutAct_9fa48("4430") ? "" : (stryCov_9fa48("4430"), "false"), stryMutAct_9fa48("4431") ? "Stryker was here!" : (stryCov_9fa48("4431"), "")]))]), stryMutAct_9fa48("4432") ? {} : (stryCov_9fa48("4432"), {
  error: stryMutAct_9fa48("4433") ? "" : (stryCov_9fa48("4433"), "inStock must be 1 or 0.")
})).optional().transform(stryMutAct_9fa48("4434") ? () => undefined : (stryCov_9fa48("4434"), v => stryMutAct_9fa48("4437") ? (v === true || v === "1") && v === "true" : stryMutAct_9fa48("4436") ? false : stryMutAct_9fa48("4435") ? true : (stryCov_9fa48("4435", "4436", "4437"), (stryMutAct_9fa48("4439") ? v === true && v === "1" : stryMutAct_9fa48("4438") ? false : (stryCov_9fa48("4438", "4439"), (stryMutAct_9fa48("4441") ? v !== true : stryMutAct_9fa48("4440") ? false : (stryCov_9fa48("4440", "4441"), v === (stryMutAct_9fa48("4442") ? false : (stryCov_9fa48("4442"), true)))) || (stryMutAct_9fa48("4444") ? v !== "1" : stryMutAct_9fa48("4443") ? false : (stryCov_9fa48("4443", "4444"), v === (stryMutAct_9fa48("4445") ? "" : (stryCov_9fa48("4445"), "1")))))) || (stryMutAct_9fa48("4447") ? v !== "true" : stryMutAct_9fa48("4446") ? false : (stryCov_9fa48("4446", "4447"), v === (stryMutAct_9fa48("4448") ? "" : (stryCov_9fa48("4448"), "true")))))));
const listBase = stryMutAct_9fa48("4449") ? {} : (stryCov_9fa48("4449"), {
  search: text(stryMutAct_9fa48("4450") ? "" : (stryCov_9fa48("4450"), "Search"), 100).optional(),
  dir: z.enum(stryMutAct_9fa48("4451") ? [] : (stryCov_9fa48("4451"), [stryMutAct_9fa48("4452") ? "" : (stryCov_9fa48("4452"), "asc"), stryMutAct_9fa48("4453") ? "" : (stryCov_9fa48("4453"), "desc")]), stryMutAct_9fa48("4454") ? {} : (stryCov_9fa48("4454"), {
    error: stryMutAct_9fa48("4455") ? "" : (stryCov_9fa48("4455"), "dir must be asc or desc.")
  })).default(stryMutAct_9fa48("4456") ? "" : (stryCov_9fa48("4456"), "asc")),
  page: stryMutAct_9fa48("4457") ? z.coerce.number().int().max(1, "page must be 1 or more").default(1) : (stryCov_9fa48("4457"), z.coerce.number().int().min(1, stryMutAct_9fa48("4458") ? "" : (stryCov_9fa48("4458"), "page must be 1 or more")).default(1)),
  pageSize: stryMutAct_9fa48("4460") ? z.coerce.number().int().max(1).max(200, "pageSize must be at most 200").default(25) : stryMutAct_9fa48("4459") ? z.coerce.number().int().min(1).min(200, "pageSize must be at most 200").default(25) : (stryCov_9fa48("4459", "4460"), z.coerce.number().int().min(1).max(200, stryMutAct_9fa48("4461") ? "" : (stryCov_9fa48("4461"), "pageSize must be at most 200")).default(25)),
  inStock: flag
});
export const pulleyListQuerySchema = z.object(stryMutAct_9fa48("4462") ? {} : (stryCov_9fa48("4462"), {
  ...listBase,
  position: z.enum(stryMutAct_9fa48("4463") ? [] : (stryCov_9fa48("4463"), [stryMutAct_9fa48("4464") ? "" : (stryCov_9fa48("4464"), "crank"), stryMutAct_9fa48("4465") ? "" : (stryCov_9fa48("4465"), "blower"), stryMutAct_9fa48("4466") ? "Stryker was here!" : (stryCov_9fa48("4466"), "")]), stryMutAct_9fa48("4467") ? {} : (stryCov_9fa48("4467"), {
    error: stryMutAct_9fa48("4468") ? "" : (stryCov_9fa48("4468"), "position must be crank or blower.")
  })).optional(),
  ribCount: z.union(stryMutAct_9fa48("4469") ? [] : (stryCov_9fa48("4469"), [z.literal(stryMutAct_9fa48("4470") ? "Stryker was here!" : (stryCov_9fa48("4470"), "")), stryMutAct_9fa48("4472") ? z.coerce.number().int().max(3).max(16) : stryMutAct_9fa48("4471") ? z.coerce.number().int().min(3).min(16) : (stryCov_9fa48("4471", "4472"), z.coerce.number().int().min(3).max(16))]), stryMutAct_9fa48("4473") ? {} : (stryCov_9fa48("4473"), {
    error: stryMutAct_9fa48("4474") ? "" : (stryCov_9fa48("4474"), "ribCount must be a whole number from 3 to 16.")
  })).optional(),
  sort: z.enum(stryMutAct_9fa48("4475") ? [] : (stryCov_9fa48("4475"), [stryMutAct_9fa48("4476") ? "" : (stryCov_9fa48("4476"), "partNumber"), stryMutAct_9fa48("4477") ? "" : (stryCov_9fa48("4477"), "diameter"), stryMutAct_9fa48("4478") ? "" : (stryCov_9fa48("4478"), "ribCount"), stryMutAct_9fa48("4479") ? "" : (stryCov_9fa48("4479"), "price"), stryMutAct_9fa48("4480") ? "" : (stryCov_9fa48("4480"), "stock")]), stryMutAct_9fa48("4481") ? {} : (stryCov_9fa48("4481"), {
    error: stryMutAct_9fa48("4482") ? "" : (stryCov_9fa48("4482"), "sort must be partNumber, diameter, ribCount, price or stock.")
  })).default(stryMutAct_9fa48("4483") ? "" : (stryCov_9fa48("4483"), "diameter"))
}));
export const blowerListQuerySchema = z.object(stryMutAct_9fa48("4484") ? {} : (stryCov_9fa48("4484"), {
  ...listBase,
  kind: z.enum(stryMutAct_9fa48("4485") ? [] : (stryCov_9fa48("4485"), [stryMutAct_9fa48("4486") ? "" : (stryCov_9fa48("4486"), "roots"), stryMutAct_9fa48("4487") ? "" : (stryCov_9fa48("4487"), "twin-screw"), stryMutAct_9fa48("4488") ? "Stryker was here!" : (stryCov_9fa48("4488"), "")]), stryMutAct_9fa48("4489") ? {} : (stryCov_9fa48("4489"), {
    error: stryMutAct_9fa48("4490") ? "" : (stryCov_9fa48("4490"), "kind must be roots or twin-screw.")
  })).optional(),
  sort: z.enum(stryMutAct_9fa48("4491") ? [] : (stryCov_9fa48("4491"), [stryMutAct_9fa48("4492") ? "" : (stryCov_9fa48("4492"), "partNumber"), stryMutAct_9fa48("4493") ? "" : (stryCov_9fa48("4493"), "name"), stryMutAct_9fa48("4494") ? "" : (stryCov_9fa48("4494"), "displacementPerRev"), stryMutAct_9fa48("4495") ? "" : (stryCov_9fa48("4495"), "maxRpm"), stryMutAct_9fa48("4496") ? "" : (stryCov_9fa48("4496"), "price"), stryMutAct_9fa48("4497") ? "" : (stryCov_9fa48("4497"), "stock")]), stryMutAct_9fa48("4498") ? {} : (stryCov_9fa48("4498"), {
    error: stryMutAct_9fa48("4499") ? "" : (stryCov_9fa48("4499"), "sort must be partNumber, name, displacementPerRev, maxRpm, price or stock.")
  })).default(stryMutAct_9fa48("4500") ? "" : (stryCov_9fa48("4500"), "displacementPerRev"))
}));
export type PulleyListQuery = z.input<typeof pulleyListQuerySchema>;
export type BlowerListQuery = z.input<typeof blowerListQuerySchema>;
export type Page<T> = {
  rows: T[];
  total: number;
  page: number;
  pageSize: number;
};
export type ShelfKind = "pulleys" | "blowers";
export const shelfKindSchema = z.enum(stryMutAct_9fa48("4501") ? [] : (stryCov_9fa48("4501"), [stryMutAct_9fa48("4502") ? "" : (stryCov_9fa48("4502"), "pulleys"), stryMutAct_9fa48("4503") ? "" : (stryCov_9fa48("4503"), "blowers")]), stryMutAct_9fa48("4504") ? {} : (stryCov_9fa48("4504"), {
  error: stryMutAct_9fa48("4505") ? "" : (stryCov_9fa48("4505"), "kind must be pulleys or blowers.")
}));

/** Largest CSV accepted, in bytes and in data rows. */
export const MAX_CSV_BYTES = 1_000_000;
export const MAX_CSV_ROWS = 5_000;

// Column names carry their unit so a file means the same thing to everyone who opens it.
export const PULLEY_CSV_COLUMNS = ["part_number", "position", "diameter_mm", "rib_count", "min_belt_diameter_mm", "price", "stock", "notes"] as const;
export const BLOWER_CSV_COLUMNS = ["part_number", "name", "kind", "displacement_l_per_rev", "built_in_volume_ratio", "max_rpm", "volumetric_efficiency_ref", "reference_rpm", "internal_efficiency", "mechanical_efficiency", "price", "stock", "notes"] as const;
export type CsvRowError = {
  line: number;
  column: string;
  message: string;
};
export type CsvPreviewRow<T> = {
  line: number;
  record: T;
};
export type CsvParseResult<T> = {
  rows: CsvPreviewRow<T>[];
  errors: CsvRowError[];
};