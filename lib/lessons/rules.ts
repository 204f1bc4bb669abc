// Rules of a lesson's records, shared by the REST API, the server actions and the forms.
import { z } from "zod";
import { INTERCOOLER_DEMO_DEFAULTS, combinationSchema, pulleyDiameterSchema, type Combination } from "@/calc";
import { plainText } from "@/lib/validation/text";

// Multi-line: notes keep their line breaks; names refuse control and direction-override characters alike.
const text = (label: string, max: number) => plainText(label, max, { multiline: true });

/** Chart series a step may show. */
export const LESSON_SERIES = ["boost", "netPower", "torque", "chargeTemperature", "blowerSpeed"] as const;
export type LessonSeries = (typeof LESSON_SERIES)[number];

export const lessonMetaSchema = z.object({
  title: text("Title", 120).min(1, "Give the lesson a title."),
  summary: text("Summary", 500).optional().default(""),
});

export const updateLessonSchema = z.object({
  title: text("Title", 120).min(1, "Give the lesson a title.").optional(),
  summary: text("Summary", 500).optional(),
  published: z.boolean({ error: "published must be true or false." }).optional(),
});

/** VE scale bounds of a what-if (fraction of the VE as built): ±20 %, the author's choice. */
export const VE_SCALE_MIN = 0.8;
export const VE_SCALE_MAX = 1.2;
/** Altitude bounds of a what-if (m): the barometer stays inside the model's 30 kPa floor (author's choice). */
export const WHAT_IF_ALTITUDE_MIN = -500;
export const WHAT_IF_ALTITUDE_MAX = 6000;

/** A number in [min, max] with one message naming the field and its range. */
const within = (label: string, min: number, max: number, range: string) => {
  const message = `${label} must be between ${range}.`;
  return z.number({ error: message }).min(min, message).max(max, message);
};

/**
 * A step's what-if on one item, stored with the step (SI): VE scaled (1.08 = VE +8 %), another
 * blower pulley (m), an intercooler added (effectiveness as a fraction, 0.3–0.95 by the author's
 * choice; pressure drop and coolant from calc's defaults), or the same car at another altitude (m;
 * the barometer follows the standard atmosphere). The classroom shows the item as built and changed.
 */
export const itemChangeSchema = z.discriminatedUnion(
  "kind",
  [
    z.object({ kind: z.literal("ve"), scale: within("VE scale", VE_SCALE_MIN, VE_SCALE_MAX, `${VE_SCALE_MIN} and ${VE_SCALE_MAX} (−20 % to +20 %)`) }),
    z.object({ kind: z.literal("pulley"), diameter: pulleyDiameterSchema }),
    z.object({ kind: z.literal("intercooler"), effectiveness: within("Intercooler effectiveness", 0.3, 0.95, "0.3 and 0.95 (as a fraction)").default(INTERCOOLER_DEMO_DEFAULTS.effectiveness) }),
    z.object({ kind: z.literal("altitude"), altitude: within("Altitude", WHAT_IF_ALTITUDE_MIN, WHAT_IF_ALTITUDE_MAX, `${WHAT_IF_ALTITUDE_MIN} and ${WHAT_IF_ALTITUDE_MAX} m`) }),
  ],
  { error: "A what-if kind must be ve, pulley, intercooler or altitude." },
);
export type ItemChange = z.output<typeof itemChangeSchema>;
export type ItemChangeInput = z.input<typeof itemChangeSchema>;

/** "1. Intro", "Step 2: Intro", "3) Intro" → "Intro": steps are numbered for you ("2.8 in pulley" is kept). */
export function stripStepNumber(title: string): string {
  return title.replace(/^(?:\s*(?:step\s*)?\d+\s*[.):\-–—](?=\s|$)\s*)+/i, "");
}

/** One item as a person picks it: a combination, a revision (or the current one), a label, an optional what-if. */
export const stepItemInputSchema = z.object({
  combinationId: z.uuid({ error: "Pick a combination." }),
  revision: z.union([z.literal("current"), z.coerce.number({ error: "Revision must be a number or “current”." }).int().min(1, "Revision must be 1 or more.")], {
    error: "Revision must be a number or “current”.",
  }),
  label: text("Label", 40).min(1, "Give the item a short label."),
  change: itemChangeSchema.nullable().optional().default(null),
});

export const stepInputSchema = z.object({
  title: text("Step title", 120)
    .transform(stripStepNumber)
    .pipe(z.string().min(1, "Give the step a title (without a number: steps are numbered for you).")),
  items: z
    .array(stepItemInputSchema, { error: "Items must be a list." })
    .min(2, "A step compares at least two items.")
    .max(4, "A step compares at most four items."),
  series: z
    .array(z.enum(LESSON_SERIES, { error: `Series must be one of ${LESSON_SERIES.join(", ")}.` }), { error: "Series must be a list." })
    .min(1, "Pick at least one chart series.")
    .transform((s) => [...new Set(s)]),
  note: text("Note", 5000).optional().default(""),
});

/** What a step stores per item: the resolved revision and the spec as it was when the step was saved. */
export const stepItemSnapshotSchema = z.object({
  combinationId: z.uuid(),
  revision: z.number().int().min(1),
  label: z.string(),
  name: z.string(),
  spec: combinationSchema,
  change: itemChangeSchema.nullable().optional(),
});

export const joinSchema = z.object({
  code: z
    .string({ error: "Type the class code." })
    .transform((s) => s.toUpperCase().replace(/[\s-]/g, ""))
    .pipe(z.string().min(4, "A class code has at least 4 characters.").max(12, "A class code has at most 12 characters.").regex(/^[A-Z0-9]+$/, "A class code has only letters and digits.")),
});

export const moveSchema = z.object({ direction: z.enum(["up", "down"], { error: "direction must be up or down." }) });
export const copySchema = z.object({ item: z.number({ error: "item must be the item's number (0 for the first)." }).int().min(0).max(3) });

export type LessonMetaInput = z.input<typeof lessonMetaSchema>;
export type UpdateLessonInput = z.input<typeof updateLessonSchema>;
export type StepInput = z.input<typeof stepInputSchema>;
export type StepItemSnapshot = { combinationId: string; revision: number; label: string; name: string; spec: Combination; change?: ItemChange | null };
