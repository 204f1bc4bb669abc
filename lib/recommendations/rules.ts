// A recommendation sheet's rules without the database: the zod schemas of what a person fills
// in (shared by the form in the browser and the API) and the statuses.
import { z } from "zod";
import { plainText } from "@/lib/validation/text";
import { pulleyDiameterSchema, rpmSchema } from "@/calc";
import { moneySchema, partNumberSchema } from "@/lib/shelf/rules";

// Multi-line: notes keep their line breaks; names refuse control and direction-override characters alike.
const text = (label: string, max: number) => plainText(label, max, { multiline: true });

export const MAX_PART_LINES = 40;

/** One line of the parts list: from the shelf (partNumber set; the shelf's price applies) or free. */
export const partLineSchema = z.object({
  partNumber: z.union([partNumberSchema, z.literal(""), z.null()]).optional().transform((v) => v || null),
  description: text("Description", 200).min(1, "Describe the part, e.g. “Belt, 8-rib”."),
  unitPrice: moneySchema,
  quantity: z
    .union([z.number(), z.string()])
    .transform((v) => (typeof v === "string" ? (v.trim() === "" ? NaN : Number(v)) : v))
    .pipe(z.number({ error: "Quantity must be a whole number from 1 to 999." }).int("Quantity must be a whole number from 1 to 999.").min(1, "Quantity must be a whole number from 1 to 999.").max(999, "Quantity must be a whole number from 1 to 999.")),
});

/** What a person fills in; the server adds the spec snapshot, line totals and the total. */
export const recommendationInputSchema = z.object({
  combinationId: z.uuid({ error: "Choose a combination." }),
  /** Which saved revision of the combination the sheet is for; the newest when left out. */
  revision: z.coerce.number({ error: "Revision must be a whole number." }).int("Revision must be a whole number.").min(1, "Revision must be 1 or more.").optional(),
  /** What the customer reads at the top of the sheet, e-mail and link; the combination's own name stays internal. */
  title: plainText("Title", 160).default(""),
  customerName: text("Customer name", 120).min(1, "Give the customer's name."),
  customerEmail: z
    .union([z.literal(""), z.null(), z.email({ error: "Customer e-mail must be an e-mail address like name@example.com." }).trim().toLowerCase().max(200)])
    .optional()
    .transform((v) => v || null),
  vehicleNotes: text("Vehicle notes", 2000).default(""),
  notes: text("Notes", 4000).default(""),
  /** The recommended blower pulley (m). */
  blowerPulleyDiameter: pulleyDiameterSchema,
  /** The engine speed (rpm) the boost was sold at: the sheet's headline boost is read there; redline when left out. */
  targetRpm: z.union([rpmSchema, z.literal(""), z.null()]).optional().transform((v) => (typeof v === "number" ? v : null)),
  parts: z.array(partLineSchema, { error: "Parts must be a list of lines." }).max(MAX_PART_LINES, `A sheet may have at most ${MAX_PART_LINES} part lines.`).default([]),
});

export const updateRecommendationSchema = recommendationInputSchema.omit({ combinationId: true, revision: true });

/** The title a sheet shows when none was given: never the combination's internal name. */
export const defaultSheetTitle = (customerName: string) => `Blower pulley recommendation for ${customerName}`;

export const STATUSES = ["draft", "sent", "accepted", "declined"] as const;
export type RecommendationStatus = (typeof STATUSES)[number];
/** Statuses a person sets with a button; "sent" is set only by a successful send. */
export const statusChangeSchema = z.object({ status: z.enum(["draft", "accepted", "declined"], { error: "Status must be draft, accepted or declined." }) });

export const recommendationListQuerySchema = z.object({
  search: text("Search", 100).optional(),
  status: z.enum(["draft", "sent", "accepted", "declined", ""], { error: "status must be draft, sent, accepted or declined." }).optional(),
  page: z.coerce.number().int().min(1, "page must be 1 or more").default(1),
  pageSize: z.coerce.number().int().min(1).max(100, "pageSize must be at most 100").default(20),
});

export type RecommendationInput = z.input<typeof recommendationInputSchema>;
export type PartLineInput = z.input<typeof partLineSchema>;
/** A stored line: what was quoted, frozen with the sheet. */
export type PartLine = { partNumber: string | null; description: string; unitPrice: string; quantity: number; lineTotal: string };
