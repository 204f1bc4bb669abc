// @ts-nocheck
// A recommendation sheet's rules without the database: the zod schemas of what a person fills
// in (shared by the form in the browser and the API) and the statuses.
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
import { z } from "zod";
import { plainText } from "@/lib/validation/text";
import { pulleyDiameterSchema, rpmSchema } from "@/calc";
import { moneySchema, partNumberSchema } from "@/lib/shelf/rules";

// Multi-line: notes keep their line breaks; names refuse control and direction-override characters alike.
const text = stryMutAct_9fa48("3761") ? () => undefined : (stryCov_9fa48("3761"), (() => {
  const text = (label: string, max: number) => plainText(label, max, stryMutAct_9fa48("3762") ? {} : (stryCov_9fa48("3762"), {
    multiline: stryMutAct_9fa48("3763") ? false : (stryCov_9fa48("3763"), true)
  }));
  return text;
})());
export const MAX_PART_LINES = 40;

/** One line of the parts list: from the shelf (partNumber set; the shelf's price applies) or free. */
export const partLineSchema = z.object(stryMutAct_9fa48("3764") ? {} : (stryCov_9fa48("3764"), {
  partNumber: z.union(stryMutAct_9fa48("3765") ? [] : (stryCov_9fa48("3765"), [partNumberSchema, z.literal(stryMutAct_9fa48("3766") ? "Stryker was here!" : (stryCov_9fa48("3766"), "")), z.null()])).optional().transform(stryMutAct_9fa48("3767") ? () => undefined : (stryCov_9fa48("3767"), v => stryMutAct_9fa48("3770") ? v && null : stryMutAct_9fa48("3769") ? false : stryMutAct_9fa48("3768") ? true : (stryCov_9fa48("3768", "3769", "3770"), v || null))),
  description: stryMutAct_9fa48("3771") ? text("Description", 200).max(1, "Describe the part, e.g. “Belt, 8-rib”.") : (stryCov_9fa48("3771"), text(stryMutAct_9fa48("3772") ? "" : (stryCov_9fa48("3772"), "Description"), 200).min(1, stryMutAct_9fa48("3773") ? "" : (stryCov_9fa48("3773"), "Describe the part, e.g. “Belt, 8-rib”."))),
  unitPrice: moneySchema,
  quantity: z.union(stryMutAct_9fa48("3774") ? [] : (stryCov_9fa48("3774"), [z.number(), z.string()])).transform(stryMutAct_9fa48("3775") ? () => undefined : (stryCov_9fa48("3775"), v => (stryMutAct_9fa48("3778") ? typeof v !== "string" : stryMutAct_9fa48("3777") ? false : stryMutAct_9fa48("3776") ? true : (stryCov_9fa48("3776", "3777", "3778"), typeof v === (stryMutAct_9fa48("3779") ? "" : (stryCov_9fa48("3779"), "string")))) ? (stryMutAct_9fa48("3782") ? v.trim() !== "" : stryMutAct_9fa48("3781") ? false : stryMutAct_9fa48("3780") ? true : (stryCov_9fa48("3780", "3781", "3782"), (stryMutAct_9fa48("3783") ? v : (stryCov_9fa48("3783"), v.trim())) === (stryMutAct_9fa48("3784") ? "Stryker was here!" : (stryCov_9fa48("3784"), "")))) ? NaN : Number(v) : v)).pipe(stryMutAct_9fa48("3786") ? z.number({
    error: "Quantity must be a whole number from 1 to 999."
  }).int("Quantity must be a whole number from 1 to 999.").max(1, "Quantity must be a whole number from 1 to 999.").max(999, "Quantity must be a whole number from 1 to 999.") : stryMutAct_9fa48("3785") ? z.number({
    error: "Quantity must be a whole number from 1 to 999."
  }).int("Quantity must be a whole number from 1 to 999.").min(1, "Quantity must be a whole number from 1 to 999.").min(999, "Quantity must be a whole number from 1 to 999.") : (stryCov_9fa48("3785", "3786"), z.number(stryMutAct_9fa48("3787") ? {} : (stryCov_9fa48("3787"), {
    error: stryMutAct_9fa48("3788") ? "" : (stryCov_9fa48("3788"), "Quantity must be a whole number from 1 to 999.")
  })).int(stryMutAct_9fa48("3789") ? "" : (stryCov_9fa48("3789"), "Quantity must be a whole number from 1 to 999.")).min(1, stryMutAct_9fa48("3790") ? "" : (stryCov_9fa48("3790"), "Quantity must be a whole number from 1 to 999.")).max(999, stryMutAct_9fa48("3791") ? "" : (stryCov_9fa48("3791"), "Quantity must be a whole number from 1 to 999."))))
}));

/** What a person fills in; the server adds the spec snapshot, line totals and the total. */
export const recommendationInputSchema = z.object(stryMutAct_9fa48("3792") ? {} : (stryCov_9fa48("3792"), {
  combinationId: z.uuid(stryMutAct_9fa48("3793") ? {} : (stryCov_9fa48("3793"), {
    error: stryMutAct_9fa48("3794") ? "" : (stryCov_9fa48("3794"), "Choose a combination.")
  })),
  /** Which saved revision of the combination the sheet is for; the newest when left out. */
  revision: stryMutAct_9fa48("3795") ? z.coerce.number({
    error: "Revision must be a whole number."
  }).int("Revision must be a whole number.").max(1, "Revision must be 1 or more.").optional() : (stryCov_9fa48("3795"), z.coerce.number(stryMutAct_9fa48("3796") ? {} : (stryCov_9fa48("3796"), {
    error: stryMutAct_9fa48("3797") ? "" : (stryCov_9fa48("3797"), "Revision must be a whole number.")
  })).int(stryMutAct_9fa48("3798") ? "" : (stryCov_9fa48("3798"), "Revision must be a whole number.")).min(1, stryMutAct_9fa48("3799") ? "" : (stryCov_9fa48("3799"), "Revision must be 1 or more.")).optional()),
  /** What the customer reads at the top of the sheet, e-mail and link; the combination's own name stays internal. */
  title: plainText(stryMutAct_9fa48("3800") ? "" : (stryCov_9fa48("3800"), "Title"), 160).default(stryMutAct_9fa48("3801") ? "Stryker was here!" : (stryCov_9fa48("3801"), "")),
  customerName: stryMutAct_9fa48("3802") ? text("Customer name", 120).max(1, "Give the customer's name.") : (stryCov_9fa48("3802"), text(stryMutAct_9fa48("3803") ? "" : (stryCov_9fa48("3803"), "Customer name"), 120).min(1, stryMutAct_9fa48("3804") ? "" : (stryCov_9fa48("3804"), "Give the customer's name."))),
  customerEmail: z.union(stryMutAct_9fa48("3805") ? [] : (stryCov_9fa48("3805"), [z.literal(stryMutAct_9fa48("3806") ? "Stryker was here!" : (stryCov_9fa48("3806"), "")), z.null(), stryMutAct_9fa48("3809") ? z.email({
    error: "Customer e-mail must be an e-mail address like name@example.com."
  }).toLowerCase().max(200) : stryMutAct_9fa48("3808") ? z.email({
    error: "Customer e-mail must be an e-mail address like name@example.com."
  }).trim().toUpperCase().max(200) : stryMutAct_9fa48("3807") ? z.email({
    error: "Customer e-mail must be an e-mail address like name@example.com."
  }).trim().toLowerCase().min(200) : (stryCov_9fa48("3807", "3808", "3809"), z.email(stryMutAct_9fa48("3810") ? {} : (stryCov_9fa48("3810"), {
    error: stryMutAct_9fa48("3811") ? "" : (stryCov_9fa48("3811"), "Customer e-mail must be an e-mail address like name@example.com.")
  })).trim().toLowerCase().max(200))])).optional().transform(stryMutAct_9fa48("3812") ? () => undefined : (stryCov_9fa48("3812"), v => stryMutAct_9fa48("3815") ? v && null : stryMutAct_9fa48("3814") ? false : stryMutAct_9fa48("3813") ? true : (stryCov_9fa48("3813", "3814", "3815"), v || null))),
  vehicleNotes: text(stryMutAct_9fa48("3816") ? "" : (stryCov_9fa48("3816"), "Vehicle notes"), 2000).default(stryMutAct_9fa48("3817") ? "Stryker was here!" : (stryCov_9fa48("3817"), "")),
  notes: text(stryMutAct_9fa48("3818") ? "" : (stryCov_9fa48("3818"), "Notes"), 4000).default(stryMutAct_9fa48("3819") ? "Stryker was here!" : (stryCov_9fa48("3819"), "")),
  /** The recommended blower pulley (m). */
  blowerPulleyDiameter: pulleyDiameterSchema,
  /** The engine speed (rpm) the boost was sold at: the sheet's headline boost is read there; redline when left out. */
  targetRpm: z.union(stryMutAct_9fa48("3820") ? [] : (stryCov_9fa48("3820"), [rpmSchema, z.literal(stryMutAct_9fa48("3821") ? "Stryker was here!" : (stryCov_9fa48("3821"), "")), z.null()])).optional().transform(stryMutAct_9fa48("3822") ? () => undefined : (stryCov_9fa48("3822"), v => (stryMutAct_9fa48("3825") ? typeof v !== "number" : stryMutAct_9fa48("3824") ? false : stryMutAct_9fa48("3823") ? true : (stryCov_9fa48("3823", "3824", "3825"), typeof v === (stryMutAct_9fa48("3826") ? "" : (stryCov_9fa48("3826"), "number")))) ? v : null)),
  parts: stryMutAct_9fa48("3827") ? z.array(partLineSchema, {
    error: "Parts must be a list of lines."
  }).min(MAX_PART_LINES, `A sheet may have at most ${MAX_PART_LINES} part lines.`).default([]) : (stryCov_9fa48("3827"), z.array(partLineSchema, stryMutAct_9fa48("3828") ? {} : (stryCov_9fa48("3828"), {
    error: stryMutAct_9fa48("3829") ? "" : (stryCov_9fa48("3829"), "Parts must be a list of lines.")
  })).max(MAX_PART_LINES, stryMutAct_9fa48("3830") ? `` : (stryCov_9fa48("3830"), `A sheet may have at most ${MAX_PART_LINES} part lines.`)).default(stryMutAct_9fa48("3831") ? ["Stryker was here"] : (stryCov_9fa48("3831"), [])))
}));
export const updateRecommendationSchema = recommendationInputSchema.omit(stryMutAct_9fa48("3832") ? {} : (stryCov_9fa48("3832"), {
  combinationId: stryMutAct_9fa48("3833") ? false : (stryCov_9fa48("3833"), true),
  revision: stryMutAct_9fa48("3834") ? false : (stryCov_9fa48("3834"), true)
}));

/** The title a sheet shows when none was given: never the combination's internal name. */
export const defaultSheetTitle = stryMutAct_9fa48("3835") ? () => undefined : (stryCov_9fa48("3835"), (() => {
  const defaultSheetTitle = (customerName: string) => stryMutAct_9fa48("3836") ? `` : (stryCov_9fa48("3836"), `Blower pulley recommendation for ${customerName}`);
  return defaultSheetTitle;
})());
export const STATUSES = ["draft", "sent", "accepted", "declined"] as const;
export type RecommendationStatus = (typeof STATUSES)[number];
/** Statuses a person sets with a button; "sent" is set only by a successful send. */
export const statusChangeSchema = z.object(stryMutAct_9fa48("3837") ? {} : (stryCov_9fa48("3837"), {
  status: z.enum(stryMutAct_9fa48("3838") ? [] : (stryCov_9fa48("3838"), [stryMutAct_9fa48("3839") ? "" : (stryCov_9fa48("3839"), "draft"), stryMutAct_9fa48("3840") ? "" : (stryCov_9fa48("3840"), "accepted"), stryMutAct_9fa48("3841") ? "" : (stryCov_9fa48("3841"), "declined")]), stryMutAct_9fa48("3842") ? {} : (stryCov_9fa48("3842"), {
    error: stryMutAct_9fa48("3843") ? "" : (stryCov_9fa48("3843"), "Status must be draft, accepted or declined.")
  }))
}));
export const recommendationListQuerySchema = z.object(stryMutAct_9fa48("3844") ? {} : (stryCov_9fa48("3844"), {
  search: text(stryMutAct_9fa48("3845") ? "" : (stryCov_9fa48("3845"), "Search"), 100).optional(),
  status: z.enum(stryMutAct_9fa48("3846") ? [] : (stryCov_9fa48("3846"), [stryMutAct_9fa48("3847") ? "" : (stryCov_9fa48("3847"), "draft"), stryMutAct_9fa48("3848") ? "" : (stryCov_9fa48("3848"), "sent"), stryMutAct_9fa48("3849") ? "" : (stryCov_9fa48("3849"), "accepted"), stryMutAct_9fa48("3850") ? "" : (stryCov_9fa48("3850"), "declined"), stryMutAct_9fa48("3851") ? "Stryker was here!" : (stryCov_9fa48("3851"), "")]), stryMutAct_9fa48("3852") ? {} : (stryCov_9fa48("3852"), {
    error: stryMutAct_9fa48("3853") ? "" : (stryCov_9fa48("3853"), "status must be draft, sent, accepted or declined.")
  })).optional(),
  page: stryMutAct_9fa48("3854") ? z.coerce.number().int().max(1, "page must be 1 or more").default(1) : (stryCov_9fa48("3854"), z.coerce.number().int().min(1, stryMutAct_9fa48("3855") ? "" : (stryCov_9fa48("3855"), "page must be 1 or more")).default(1)),
  pageSize: stryMutAct_9fa48("3857") ? z.coerce.number().int().max(1).max(100, "pageSize must be at most 100").default(20) : stryMutAct_9fa48("3856") ? z.coerce.number().int().min(1).min(100, "pageSize must be at most 100").default(20) : (stryCov_9fa48("3856", "3857"), z.coerce.number().int().min(1).max(100, stryMutAct_9fa48("3858") ? "" : (stryCov_9fa48("3858"), "pageSize must be at most 100")).default(20))
}));
export type RecommendationInput = z.input<typeof recommendationInputSchema>;
export type PartLineInput = z.input<typeof partLineSchema>;
/** A stored line: what was quoted, frozen with the sheet. */
export type PartLine = {
  partNumber: string | null;
  description: string;
  unitPrice: string;
  quantity: number;
  lineTotal: string;
};