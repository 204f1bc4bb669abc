// The parts shelf's rules without the database: money arithmetic (decimal.js), the zod schemas
// of blowers and pulleys (records, forms in the user's units, list queries) and the CSV layout.
// Forms in the browser import these; db/repo/shelf.ts applies them to the tables.
import Decimal from "decimal.js";
import { z } from "zod";
import { text } from "@/lib/validation/text";
import { blowerKindSchema, blowerSchema, fromSI, roundInward, toSI, type UnitSystem, unitLabel } from "@/calc";
import { digitsOf } from "@/lib/units/format";

// ---------------------------------------------------------------- money

/** Decimal arithmetic for prices: plenty of digits, half-up rounding to cents like a till. */
export const Money = Decimal.clone({ precision: 40, rounding: Decimal.ROUND_HALF_UP });
export type MoneyValue = InstanceType<typeof Money>;

const MONEY_TEXT = /^\d{1,10}(\.\d{1,2})?$/;
export const MAX_PRICE = "9999999999.99";

/** A price: "19.99" or 19.99 in, "19.99" out (two decimals, at most 9 999 999 999.99, not negative). */
export const moneySchema = z
  .union([z.string(), z.number()], { error: "Price must be an amount like 19.99." })
  .transform((v, ctx) => {
    const t = (typeof v === "number" ? (Number.isFinite(v) ? String(v) : "") : v).trim().replace(/^\$/, "");
    if (!MONEY_TEXT.test(t)) {
      ctx.addIssue({ code: "custom", message: "Price must be an amount with at most two decimals, like 19.99 (no minus sign)." });
      return z.NEVER;
    }
    return new Money(t).toFixed(2);
  });

/** Price × quantity, exact, as a two-decimal string. */
export function lineTotal(unitPrice: string, quantity: number): string {
  return new Money(unitPrice).times(quantity).toDecimalPlaces(2).toFixed(2);
}

/** Sum of amounts, exact, as a two-decimal string. */
export function sumMoney(amounts: readonly string[]): string {
  return amounts.reduce((acc, a) => acc.plus(new Money(a)), new Money(0)).toDecimalPlaces(2).toFixed(2);
}

/** "1234.5" → "1,234.50" for display (no currency symbol: the shop's currency is its own). */
export function formatMoney(amount: string): string {
  const [whole, frac = ""] = new Money(amount).toFixed(2).split(".");
  return `${whole.replace(/\B(?=(\d{3})+(?!\d))/g, ",")}.${frac}`;
}

// ---------------------------------------------------------------- records


/** Our own part numbers: capitals, digits and dashes, e.g. PW-BP-0340-8. */
export const partNumberSchema = z
  .string({ error: "Part number is required." })
  .trim()
  .toUpperCase()
  .regex(/^[A-Z0-9][A-Z0-9-]{2,39}$/, "Part number must be 3–40 capitals, digits or dashes, like PW-BP-0340-8.");

export const stockSchema = z
  .number({ error: "Stock must be a whole number (0 or more)." })
  .int("Stock must be a whole number (0 or more).")
  .min(0, "Stock must be a whole number (0 or more).")
  .max(1_000_000, "Stock must be at most 1 000 000.");

function boundedSI(label: string, min: number, max: number, unit: string) {
  const message = `${label} must be between ${min} and ${max} ${unit}.`;
  return z.number({ error: message }).min(min, message).max(max, message);
}

/** A blower on the shelf (SI): the model's blower fields plus what the shop sells it as. */
export const blowerRecordSchema = blowerSchema.safeExtend({
  partNumber: partNumberSchema,
  name: text("Name", 120).min(1, "Give the blower a name, e.g. “Roots 1.9 L/rev”."),
  notes: text("Notes", 2000).default(""),
  price: moneySchema,
  stock: stockSchema,
});

export const PULLEY_DIAMETER_MIN = 0.03;
export const PULLEY_DIAMETER_MAX = 0.5;
export const BELT_MINIMUM_MIN = 0.02;
export const BELT_MINIMUM_MAX = 0.3;

/** A pulley on the shelf (SI: diameters in m). */
export const pulleyRecordSchema = z.object({
  partNumber: partNumberSchema,
  position: z.enum(["crank", "blower"], { error: "Position must be crank or blower." }),
  diameter: boundedSI("Diameter", PULLEY_DIAMETER_MIN, PULLEY_DIAMETER_MAX, "m"),
  ribCount: z.number({ error: "Rib count must be a whole number from 3 to 16." }).int("Rib count must be a whole number from 3 to 16.").min(3, "Rib count must be a whole number from 3 to 16.").max(16, "Rib count must be a whole number from 3 to 16."),
  minBeltDiameter: boundedSI("Minimum belt diameter", BELT_MINIMUM_MIN, BELT_MINIMUM_MAX, "m").nullable().default(null),
  price: moneySchema,
  stock: stockSchema,
  notes: text("Notes", 2000).default(""),
});

export type BlowerRecordInput = z.input<typeof blowerRecordSchema>;
export type BlowerRecord = z.output<typeof blowerRecordSchema>;
export type PulleyRecordInput = z.input<typeof pulleyRecordSchema>;
export type PulleyRecord = z.output<typeof pulleyRecordSchema>;

// Forms take lengths and volumes in the user's units and efficiencies in percent; their output is
// the SI record above, so the browser and the API apply the same rules. Fields that need no
// conversion use the record's own schemas, so every field's problem shows at once.
const numberIn = (label: string, unit: string) =>
  z.union([z.string(), z.number()]).transform((v, ctx) => {
    const n = typeof v === "number" ? v : v.trim() === "" ? NaN : Number(v.trim());
    if (!Number.isFinite(n)) {
      ctx.addIssue({ code: "custom", message: `${label} must be a number${unit ? ` in ${unit}` : ""}.` });
      return z.NEVER;
    }
    return n;
  });
const optionalNumberIn = (label: string, unit: string) =>
  z.union([z.string(), z.number(), z.null()]).transform((v, ctx) => {
    if (v === null || (typeof v === "string" && v.trim() === "")) return null;
    const n = typeof v === "number" ? v : Number(v.trim());
    if (!Number.isFinite(n)) {
      ctx.addIssue({ code: "custom", message: `${label} must be a number in ${unit}, or left empty.` });
      return z.NEVER;
    }
    return n;
  });

/** Validates a form's converted output with a record schema, keeping each issue on its field. */
function into<S extends z.ZodType>(schema: S) {
  return (value: unknown, ctx: z.RefinementCtx): z.output<S> => {
    const r = schema.safeParse(value);
    if (r.success) return r.data;
    for (const issue of r.error.issues) ctx.addIssue({ code: "custom", path: issue.path as (string | number)[], message: issue.message });
    return z.NEVER;
  };
}

/** calc's limits for one of the blower's fields (SI), so the form states them in the user's units. */
function blowerLimits(field: "displacementPerRev" | "volumetricEfficiencyRef" | "internalEfficiency" | "mechanicalEfficiency") {
  const s = blowerSchema.shape[field];
  const n = s instanceof z.ZodDefault ? (s.unwrap() as z.ZodNumber) : (s as z.ZodNumber);
  return { min: n.minValue!, max: n.maxValue! };
}

/**
 * SI limits in the user's units, rounded inward to `digits` decimals so that every value inside
 * the stated range is accepted, and the message that states them.
 */
function limitsIn(label: string, unit: string, si: { min: number; max: number }, fromSi: (v: number) => number, digits: number) {
  const lo = roundInward(fromSi(si.min), -digits, "up");
  const hi = roundInward(fromSi(si.max), -digits, "down");
  return { inRange: (v: number | null) => v === null || (v >= lo && v <= hi), message: `${label} must be between ${lo} and ${hi} ${unit}.` };
}

/** A number in the user's units within SI limits, which the message states in those units. */
function withinIn(label: string, unit: string, si: { min: number; max: number }, fromSi: (v: number) => number, digits: number) {
  const { inRange, message } = limitsIn(label, unit, si, fromSi, digits);
  return numberIn(label, unit).refine(inRange, message);
}

/** The same, where an empty field means "not known" (null). */
function optionalWithinIn(label: string, unit: string, si: { min: number; max: number }, fromSi: (v: number) => number, digits: number) {
  const { inRange, message } = limitsIn(label, unit, si, fromSi, digits);
  return optionalNumberIn(label, unit).refine(inRange, message);
}

/** The pulley form in the user's units; parses to a SI pulley record. */
export function pulleyFormSchema(system: UnitSystem) {
  const unit = unitLabel("length-small", system);
  const length = (m: number) => fromSI("length-small", m, system);
  const digits = digitsOf("length-small", system);
  return z
    .object({
      partNumber: pulleyRecordSchema.shape.partNumber,
      position: pulleyRecordSchema.shape.position,
      diameter: withinIn("Diameter", unit, { min: PULLEY_DIAMETER_MIN, max: PULLEY_DIAMETER_MAX }, length, digits),
      ribCount: numberIn("Rib count", "").pipe(pulleyRecordSchema.shape.ribCount),
      minBeltDiameter: optionalWithinIn("Minimum belt diameter", unit, { min: BELT_MINIMUM_MIN, max: BELT_MINIMUM_MAX }, length, digits),
      price: moneySchema,
      stock: numberIn("Stock", "").pipe(stockSchema),
      notes: pulleyRecordSchema.shape.notes,
    })
    .transform((f) => ({
      ...f,
      diameter: toSI("length-small", f.diameter, system),
      minBeltDiameter: f.minBeltDiameter === null ? null : toSI("length-small", f.minBeltDiameter, system),
    }))
    .transform(into(pulleyRecordSchema));
}

/** The blower form in the user's units (displacement per rev) and percent (efficiencies). */
export function blowerFormSchema(system: UnitSystem) {
  const unit = unitLabel("blower-displacement", system);
  const displacement = (m3: number) => fromSI("blower-displacement", m3, system);
  const percent = (f: number) => f * 100;
  return z
    .object({
      partNumber: blowerRecordSchema.shape.partNumber,
      name: blowerRecordSchema.shape.name,
      kind: blowerKindSchema,
      displacementPerRev: withinIn("Blower displacement", unit, blowerLimits("displacementPerRev"), displacement, Math.max(1, digitsOf("blower-displacement", system))),
      builtInVolumeRatio: numberIn("Built-in volume ratio", "").pipe(blowerSchema.shape.builtInVolumeRatio),
      maxRpm: numberIn("Blower speed limit", "rpm").pipe(blowerSchema.shape.maxRpm),
      volumetricEfficiencyRef: withinIn("Reference volumetric efficiency", "%", blowerLimits("volumetricEfficiencyRef"), percent, 0),
      referenceRpm: numberIn("Reference speed", "rpm").pipe(blowerSchema.shape.referenceRpm),
      internalEfficiency: withinIn("Internal efficiency", "%", blowerLimits("internalEfficiency"), percent, 0),
      mechanicalEfficiency: withinIn("Drive mechanical efficiency", "%", blowerLimits("mechanicalEfficiency"), percent, 0),
      notes: blowerRecordSchema.shape.notes,
      price: moneySchema,
      stock: numberIn("Stock", "").pipe(stockSchema),
    })
    .transform((f) => ({
      ...f,
      displacementPerRev: toSI("blower-displacement", f.displacementPerRev, system),
      volumetricEfficiencyRef: f.volumetricEfficiencyRef / 100,
      internalEfficiency: f.internalEfficiency / 100,
      mechanicalEfficiency: f.mechanicalEfficiency / 100,
    }))
    .transform(into(blowerRecordSchema));
}

// ---------------------------------------------------------------- lists

const flag = z
  .union([z.boolean(), z.enum(["1", "0", "true", "false", ""])], { error: "inStock must be 1 or 0." })
  .optional()
  .transform((v) => v === true || v === "1" || v === "true");

const listBase = {
  search: text("Search", 100).optional(),
  dir: z.enum(["asc", "desc"], { error: "dir must be asc or desc." }).default("asc"),
  page: z.coerce.number().int().min(1, "page must be 1 or more").default(1),
  pageSize: z.coerce.number().int().min(1).max(200, "pageSize must be at most 200").default(25),
  inStock: flag,
};

export const pulleyListQuerySchema = z.object({
  ...listBase,
  position: z.enum(["crank", "blower", ""], { error: "position must be crank or blower." }).optional(),
  ribCount: z.union([z.literal(""), z.coerce.number().int().min(3).max(16)], { error: "ribCount must be a whole number from 3 to 16." }).optional(),
  sort: z.enum(["partNumber", "diameter", "ribCount", "price", "stock"], { error: "sort must be partNumber, diameter, ribCount, price or stock." }).default("diameter"),
});

export const blowerListQuerySchema = z.object({
  ...listBase,
  kind: z.enum(["roots", "twin-screw", ""], { error: "kind must be roots or twin-screw." }).optional(),
  sort: z.enum(["partNumber", "name", "displacementPerRev", "maxRpm", "price", "stock"], { error: "sort must be partNumber, name, displacementPerRev, maxRpm, price or stock." }).default("displacementPerRev"),
});

export type PulleyListQuery = z.input<typeof pulleyListQuerySchema>;
export type BlowerListQuery = z.input<typeof blowerListQuerySchema>;
export type Page<T> = { rows: T[]; total: number; page: number; pageSize: number };


export type ShelfKind = "pulleys" | "blowers";
export const shelfKindSchema = z.enum(["pulleys", "blowers"], { error: "kind must be pulleys or blowers." });

/** Largest CSV accepted, in bytes and in data rows. */
export const MAX_CSV_BYTES = 1_000_000;
export const MAX_CSV_ROWS = 5_000;

// Column names carry their unit so a file means the same thing to everyone who opens it.
export const PULLEY_CSV_COLUMNS = ["part_number", "position", "diameter_mm", "rib_count", "min_belt_diameter_mm", "price", "stock", "notes"] as const;
export const BLOWER_CSV_COLUMNS = [
  "part_number",
  "name",
  "kind",
  "displacement_l_per_rev",
  "built_in_volume_ratio",
  "max_rpm",
  "volumetric_efficiency_ref",
  "reference_rpm",
  "internal_efficiency",
  "mechanical_efficiency",
  "price",
  "stock",
  "notes",
] as const;
export type CsvRowError = { line: number; column: string; message: string };
export type CsvPreviewRow<T> = { line: number; record: T };
export type CsvParseResult<T> = { rows: CsvPreviewRow<T>[]; errors: CsvRowError[] };
