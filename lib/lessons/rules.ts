// Rules of a lesson's records, shared by the REST API, the server actions and the forms.
import { z } from "zod";
import { combinationSchema, type Combination } from "@/calc";
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

/** One item as a person picks it: a combination, a revision (or the current one), a label. */
export const stepItemInputSchema = z.object({
  combinationId: z.uuid({ error: "Pick a combination." }),
  revision: z.union([z.literal("current"), z.coerce.number({ error: "Revision must be a number or “current”." }).int().min(1, "Revision must be 1 or more.")], {
    error: "Revision must be a number or “current”.",
  }),
  label: text("Label", 40).min(1, "Give the item a short label."),
});

export const stepInputSchema = z.object({
  title: text("Step title", 120).min(1, "Give the step a title."),
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
export type StepItemSnapshot = { combinationId: string; revision: number; label: string; name: string; spec: Combination };
