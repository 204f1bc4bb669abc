// @ts-nocheck
// Rules of a lesson's records, shared by the REST API, the server actions and the forms.
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
import { INTERCOOLER_DEMO_DEFAULTS, combinationSchema, pulleyDiameterSchema, type Combination } from "@/calc";
import { plainText } from "@/lib/validation/text";

// Multi-line: notes keep their line breaks; names refuse control and direction-override characters alike.
const text = stryMutAct_9fa48("2721") ? () => undefined : (stryCov_9fa48("2721"), (() => {
  const text = (label: string, max: number) => plainText(label, max, stryMutAct_9fa48("2722") ? {} : (stryCov_9fa48("2722"), {
    multiline: stryMutAct_9fa48("2723") ? false : (stryCov_9fa48("2723"), true)
  }));
  return text;
})());

/** Chart series a step may show. */
export const LESSON_SERIES = ["boost", "netPower", "torque", "chargeTemperature", "blowerSpeed"] as const;
export type LessonSeries = (typeof LESSON_SERIES)[number];
export const lessonMetaSchema = z.object(stryMutAct_9fa48("2724") ? {} : (stryCov_9fa48("2724"), {
  title: stryMutAct_9fa48("2725") ? text("Title", 120).max(1, "Give the lesson a title.") : (stryCov_9fa48("2725"), text(stryMutAct_9fa48("2726") ? "" : (stryCov_9fa48("2726"), "Title"), 120).min(1, stryMutAct_9fa48("2727") ? "" : (stryCov_9fa48("2727"), "Give the lesson a title."))),
  summary: text(stryMutAct_9fa48("2728") ? "" : (stryCov_9fa48("2728"), "Summary"), 500).optional().default(stryMutAct_9fa48("2729") ? "Stryker was here!" : (stryCov_9fa48("2729"), ""))
}));
export const updateLessonSchema = z.object(stryMutAct_9fa48("2730") ? {} : (stryCov_9fa48("2730"), {
  title: stryMutAct_9fa48("2731") ? text("Title", 120).max(1, "Give the lesson a title.").optional() : (stryCov_9fa48("2731"), text(stryMutAct_9fa48("2732") ? "" : (stryCov_9fa48("2732"), "Title"), 120).min(1, stryMutAct_9fa48("2733") ? "" : (stryCov_9fa48("2733"), "Give the lesson a title.")).optional()),
  summary: text(stryMutAct_9fa48("2734") ? "" : (stryCov_9fa48("2734"), "Summary"), 500).optional(),
  published: z.boolean(stryMutAct_9fa48("2735") ? {} : (stryCov_9fa48("2735"), {
    error: stryMutAct_9fa48("2736") ? "" : (stryCov_9fa48("2736"), "published must be true or false.")
  })).optional()
}));

/** VE scale bounds of a what-if (fraction of the VE as built): ±20 %, the author's choice. */
export const VE_SCALE_MIN = 0.8;
export const VE_SCALE_MAX = 1.2;
/** Altitude bounds of a what-if (m): the barometer stays inside the model's 30 kPa floor (author's choice). */
export const WHAT_IF_ALTITUDE_MIN = stryMutAct_9fa48("2737") ? +500 : (stryCov_9fa48("2737"), -500);
export const WHAT_IF_ALTITUDE_MAX = 6000;

/** A number in [min, max] with one message naming the field and its range. */
const within = (label: string, min: number, max: number, range: string) => {
  if (stryMutAct_9fa48("2738")) {
    {}
  } else {
    stryCov_9fa48("2738");
    const message = stryMutAct_9fa48("2739") ? `` : (stryCov_9fa48("2739"), `${label} must be between ${range}.`);
    return stryMutAct_9fa48("2741") ? z.number({
      error: message
    }).max(min, message).max(max, message) : stryMutAct_9fa48("2740") ? z.number({
      error: message
    }).min(min, message).min(max, message) : (stryCov_9fa48("2740", "2741"), z.number(stryMutAct_9fa48("2742") ? {} : (stryCov_9fa48("2742"), {
      error: message
    })).min(min, message).max(max, message));
  }
};

/**
 * A step's what-if on one item, stored with the step (SI): VE scaled (1.08 = VE +8 %), another
 * blower pulley (m), an intercooler added (effectiveness as a fraction, 0.3–0.95 by the author's
 * choice; pressure drop and coolant from calc's defaults), or the same car at another altitude (m;
 * the barometer follows the standard atmosphere). The classroom shows the item as built and changed.
 */
export const itemChangeSchema = z.discriminatedUnion(stryMutAct_9fa48("2743") ? "" : (stryCov_9fa48("2743"), "kind"), stryMutAct_9fa48("2744") ? [] : (stryCov_9fa48("2744"), [z.object(stryMutAct_9fa48("2745") ? {} : (stryCov_9fa48("2745"), {
  kind: z.literal(stryMutAct_9fa48("2746") ? "" : (stryCov_9fa48("2746"), "ve")),
  scale: within(stryMutAct_9fa48("2747") ? "" : (stryCov_9fa48("2747"), "VE scale"), VE_SCALE_MIN, VE_SCALE_MAX, stryMutAct_9fa48("2748") ? `` : (stryCov_9fa48("2748"), `${VE_SCALE_MIN} and ${VE_SCALE_MAX} (−20 % to +20 %)`))
})), z.object(stryMutAct_9fa48("2749") ? {} : (stryCov_9fa48("2749"), {
  kind: z.literal(stryMutAct_9fa48("2750") ? "" : (stryCov_9fa48("2750"), "pulley")),
  diameter: pulleyDiameterSchema
})), z.object(stryMutAct_9fa48("2751") ? {} : (stryCov_9fa48("2751"), {
  kind: z.literal(stryMutAct_9fa48("2752") ? "" : (stryCov_9fa48("2752"), "intercooler")),
  effectiveness: within(stryMutAct_9fa48("2753") ? "" : (stryCov_9fa48("2753"), "Intercooler effectiveness"), 0.3, 0.95, stryMutAct_9fa48("2754") ? "" : (stryCov_9fa48("2754"), "0.3 and 0.95 (as a fraction)")).default(INTERCOOLER_DEMO_DEFAULTS.effectiveness)
})), z.object(stryMutAct_9fa48("2755") ? {} : (stryCov_9fa48("2755"), {
  kind: z.literal(stryMutAct_9fa48("2756") ? "" : (stryCov_9fa48("2756"), "altitude")),
  altitude: within(stryMutAct_9fa48("2757") ? "" : (stryCov_9fa48("2757"), "Altitude"), WHAT_IF_ALTITUDE_MIN, WHAT_IF_ALTITUDE_MAX, stryMutAct_9fa48("2758") ? `` : (stryCov_9fa48("2758"), `${WHAT_IF_ALTITUDE_MIN} and ${WHAT_IF_ALTITUDE_MAX} m`))
}))]), stryMutAct_9fa48("2759") ? {} : (stryCov_9fa48("2759"), {
  error: stryMutAct_9fa48("2760") ? "" : (stryCov_9fa48("2760"), "A what-if kind must be ve, pulley, intercooler or altitude.")
}));
export type ItemChange = z.output<typeof itemChangeSchema>;
export type ItemChangeInput = z.input<typeof itemChangeSchema>;

/** "1. Intro", "Step 2: Intro", "3) Intro" → "Intro": steps are numbered for you ("2.8 in pulley" is kept). */
export function stripStepNumber(title: string): string {
  if (stryMutAct_9fa48("2761")) {
    {}
  } else {
    stryCov_9fa48("2761");
    return title.replace(stryMutAct_9fa48("2778") ? /^(?:\s*(?:step\s*)?\d+\s*[.):\-–—](?=\s|$)\S*)+/i : stryMutAct_9fa48("2777") ? /^(?:\s*(?:step\s*)?\d+\s*[.):\-–—](?=\s|$)\s)+/i : stryMutAct_9fa48("2776") ? /^(?:\s*(?:step\s*)?\d+\s*[.):\-–—](?=\S|$)\s*)+/i : stryMutAct_9fa48("2775") ? /^(?:\s*(?:step\s*)?\d+\s*[.):\-–—](?=\s)\s*)+/i : stryMutAct_9fa48("2774") ? /^(?:\s*(?:step\s*)?\d+\s*[.):\-–—](?!\s|$)\s*)+/i : stryMutAct_9fa48("2773") ? /^(?:\s*(?:step\s*)?\d+\s*[^.):\-–—](?=\s|$)\s*)+/i : stryMutAct_9fa48("2772") ? /^(?:\s*(?:step\s*)?\d+\S*[.):\-–—](?=\s|$)\s*)+/i : stryMutAct_9fa48("2771") ? /^(?:\s*(?:step\s*)?\d+\s[.):\-–—](?=\s|$)\s*)+/i : stryMutAct_9fa48("2770") ? /^(?:\s*(?:step\s*)?\D+\s*[.):\-–—](?=\s|$)\s*)+/i : stryMutAct_9fa48("2769") ? /^(?:\s*(?:step\s*)?\d\s*[.):\-–—](?=\s|$)\s*)+/i : stryMutAct_9fa48("2768") ? /^(?:\s*(?:step\S*)?\d+\s*[.):\-–—](?=\s|$)\s*)+/i : stryMutAct_9fa48("2767") ? /^(?:\s*(?:step\s)?\d+\s*[.):\-–—](?=\s|$)\s*)+/i : stryMutAct_9fa48("2766") ? /^(?:\s*(?:step\s*)\d+\s*[.):\-–—](?=\s|$)\s*)+/i : stryMutAct_9fa48("2765") ? /^(?:\S*(?:step\s*)?\d+\s*[.):\-–—](?=\s|$)\s*)+/i : stryMutAct_9fa48("2764") ? /^(?:\s(?:step\s*)?\d+\s*[.):\-–—](?=\s|$)\s*)+/i : stryMutAct_9fa48("2763") ? /^(?:\s*(?:step\s*)?\d+\s*[.):\-–—](?=\s|$)\s*)/i : stryMutAct_9fa48("2762") ? /(?:\s*(?:step\s*)?\d+\s*[.):\-–—](?=\s|$)\s*)+/i : (stryCov_9fa48("2762", "2763", "2764", "2765", "2766", "2767", "2768", "2769", "2770", "2771", "2772", "2773", "2774", "2775", "2776", "2777", "2778"), /^(?:\s*(?:step\s*)?\d+\s*[.):\-–—](?=\s|$)\s*)+/i), stryMutAct_9fa48("2779") ? "Stryker was here!" : (stryCov_9fa48("2779"), ""));
  }
}

/** One item as a person picks it: a combination, a revision (or the current one), a label, an optional what-if. */
export const stepItemInputSchema = z.object(stryMutAct_9fa48("2780") ? {} : (stryCov_9fa48("2780"), {
  combinationId: z.uuid(stryMutAct_9fa48("2781") ? {} : (stryCov_9fa48("2781"), {
    error: stryMutAct_9fa48("2782") ? "" : (stryCov_9fa48("2782"), "Pick a combination.")
  })),
  revision: z.union(stryMutAct_9fa48("2783") ? [] : (stryCov_9fa48("2783"), [z.literal(stryMutAct_9fa48("2784") ? "" : (stryCov_9fa48("2784"), "current")), stryMutAct_9fa48("2785") ? z.coerce.number({
    error: "Revision must be a number or “current”."
  }).int().max(1, "Revision must be 1 or more.") : (stryCov_9fa48("2785"), z.coerce.number(stryMutAct_9fa48("2786") ? {} : (stryCov_9fa48("2786"), {
    error: stryMutAct_9fa48("2787") ? "" : (stryCov_9fa48("2787"), "Revision must be a number or “current”.")
  })).int().min(1, stryMutAct_9fa48("2788") ? "" : (stryCov_9fa48("2788"), "Revision must be 1 or more.")))]), stryMutAct_9fa48("2789") ? {} : (stryCov_9fa48("2789"), {
    error: stryMutAct_9fa48("2790") ? "" : (stryCov_9fa48("2790"), "Revision must be a number or “current”.")
  })),
  label: stryMutAct_9fa48("2791") ? text("Label", 40).max(1, "Give the item a short label.") : (stryCov_9fa48("2791"), text(stryMutAct_9fa48("2792") ? "" : (stryCov_9fa48("2792"), "Label"), 40).min(1, stryMutAct_9fa48("2793") ? "" : (stryCov_9fa48("2793"), "Give the item a short label."))),
  change: itemChangeSchema.nullable().optional().default(null)
}));
export const stepInputSchema = z.object(stryMutAct_9fa48("2794") ? {} : (stryCov_9fa48("2794"), {
  title: text(stryMutAct_9fa48("2795") ? "" : (stryCov_9fa48("2795"), "Step title"), 120).transform(stripStepNumber).pipe(stryMutAct_9fa48("2796") ? z.string().max(1, "Give the step a title (without a number: steps are numbered for you).") : (stryCov_9fa48("2796"), z.string().min(1, stryMutAct_9fa48("2797") ? "" : (stryCov_9fa48("2797"), "Give the step a title (without a number: steps are numbered for you).")))),
  items: stryMutAct_9fa48("2799") ? z.array(stepItemInputSchema, {
    error: "Items must be a list."
  }).max(2, "A step compares at least two items.").max(4, "A step compares at most four items.") : stryMutAct_9fa48("2798") ? z.array(stepItemInputSchema, {
    error: "Items must be a list."
  }).min(2, "A step compares at least two items.").min(4, "A step compares at most four items.") : (stryCov_9fa48("2798", "2799"), z.array(stepItemInputSchema, stryMutAct_9fa48("2800") ? {} : (stryCov_9fa48("2800"), {
    error: stryMutAct_9fa48("2801") ? "" : (stryCov_9fa48("2801"), "Items must be a list.")
  })).min(2, stryMutAct_9fa48("2802") ? "" : (stryCov_9fa48("2802"), "A step compares at least two items.")).max(4, stryMutAct_9fa48("2803") ? "" : (stryCov_9fa48("2803"), "A step compares at most four items."))),
  series: stryMutAct_9fa48("2804") ? z.array(z.enum(LESSON_SERIES, {
    error: `Series must be one of ${LESSON_SERIES.join(", ")}.`
  }), {
    error: "Series must be a list."
  }).max(1, "Pick at least one chart series.").transform(s => [...new Set(s)]) : (stryCov_9fa48("2804"), z.array(z.enum(LESSON_SERIES, stryMutAct_9fa48("2805") ? {} : (stryCov_9fa48("2805"), {
    error: stryMutAct_9fa48("2806") ? `` : (stryCov_9fa48("2806"), `Series must be one of ${LESSON_SERIES.join(stryMutAct_9fa48("2807") ? "" : (stryCov_9fa48("2807"), ", "))}.`)
  })), stryMutAct_9fa48("2808") ? {} : (stryCov_9fa48("2808"), {
    error: stryMutAct_9fa48("2809") ? "" : (stryCov_9fa48("2809"), "Series must be a list.")
  })).min(1, stryMutAct_9fa48("2810") ? "" : (stryCov_9fa48("2810"), "Pick at least one chart series.")).transform(stryMutAct_9fa48("2811") ? () => undefined : (stryCov_9fa48("2811"), s => stryMutAct_9fa48("2812") ? [] : (stryCov_9fa48("2812"), [...new Set(s)])))),
  note: text(stryMutAct_9fa48("2813") ? "" : (stryCov_9fa48("2813"), "Note"), 5000).optional().default(stryMutAct_9fa48("2814") ? "Stryker was here!" : (stryCov_9fa48("2814"), ""))
}));

/** What a step stores per item: the resolved revision and the spec as it was when the step was saved. */
export const stepItemSnapshotSchema = z.object(stryMutAct_9fa48("2815") ? {} : (stryCov_9fa48("2815"), {
  combinationId: z.uuid(),
  revision: stryMutAct_9fa48("2816") ? z.number().int().max(1) : (stryCov_9fa48("2816"), z.number().int().min(1)),
  label: z.string(),
  name: z.string(),
  spec: combinationSchema,
  change: itemChangeSchema.nullable().optional()
}));
export const joinSchema = z.object(stryMutAct_9fa48("2817") ? {} : (stryCov_9fa48("2817"), {
  code: z.string(stryMutAct_9fa48("2818") ? {} : (stryCov_9fa48("2818"), {
    error: stryMutAct_9fa48("2819") ? "" : (stryCov_9fa48("2819"), "Type the class code.")
  })).transform(stryMutAct_9fa48("2820") ? () => undefined : (stryCov_9fa48("2820"), s => stryMutAct_9fa48("2821") ? s.toLowerCase().replace(/[\s-]/g, "") : (stryCov_9fa48("2821"), s.toUpperCase().replace(stryMutAct_9fa48("2823") ? /[\S-]/g : stryMutAct_9fa48("2822") ? /[^\s-]/g : (stryCov_9fa48("2822", "2823"), /[\s-]/g), stryMutAct_9fa48("2824") ? "Stryker was here!" : (stryCov_9fa48("2824"), ""))))).pipe(stryMutAct_9fa48("2826") ? z.string().max(4, "A class code has at least 4 characters.").max(12, "A class code has at most 12 characters.").regex(/^[A-Z0-9]+$/, "A class code has only letters and digits.") : stryMutAct_9fa48("2825") ? z.string().min(4, "A class code has at least 4 characters.").min(12, "A class code has at most 12 characters.").regex(/^[A-Z0-9]+$/, "A class code has only letters and digits.") : (stryCov_9fa48("2825", "2826"), z.string().min(4, stryMutAct_9fa48("2827") ? "" : (stryCov_9fa48("2827"), "A class code has at least 4 characters.")).max(12, stryMutAct_9fa48("2828") ? "" : (stryCov_9fa48("2828"), "A class code has at most 12 characters.")).regex(stryMutAct_9fa48("2832") ? /^[^A-Z0-9]+$/ : stryMutAct_9fa48("2831") ? /^[A-Z0-9]$/ : stryMutAct_9fa48("2830") ? /^[A-Z0-9]+/ : stryMutAct_9fa48("2829") ? /[A-Z0-9]+$/ : (stryCov_9fa48("2829", "2830", "2831", "2832"), /^[A-Z0-9]+$/), stryMutAct_9fa48("2833") ? "" : (stryCov_9fa48("2833"), "A class code has only letters and digits."))))
}));
export const moveSchema = z.object(stryMutAct_9fa48("2834") ? {} : (stryCov_9fa48("2834"), {
  direction: z.enum(stryMutAct_9fa48("2835") ? [] : (stryCov_9fa48("2835"), [stryMutAct_9fa48("2836") ? "" : (stryCov_9fa48("2836"), "up"), stryMutAct_9fa48("2837") ? "" : (stryCov_9fa48("2837"), "down")]), stryMutAct_9fa48("2838") ? {} : (stryCov_9fa48("2838"), {
    error: stryMutAct_9fa48("2839") ? "" : (stryCov_9fa48("2839"), "direction must be up or down.")
  }))
}));
export const copySchema = z.object(stryMutAct_9fa48("2840") ? {} : (stryCov_9fa48("2840"), {
  item: stryMutAct_9fa48("2842") ? z.number({
    error: "item must be the item's number (0 for the first)."
  }).int().max(0).max(3) : stryMutAct_9fa48("2841") ? z.number({
    error: "item must be the item's number (0 for the first)."
  }).int().min(0).min(3) : (stryCov_9fa48("2841", "2842"), z.number(stryMutAct_9fa48("2843") ? {} : (stryCov_9fa48("2843"), {
    error: stryMutAct_9fa48("2844") ? "" : (stryCov_9fa48("2844"), "item must be the item's number (0 for the first).")
  })).int().min(0).max(3))
}));
export type LessonMetaInput = z.input<typeof lessonMetaSchema>;
export type UpdateLessonInput = z.input<typeof updateLessonSchema>;
export type StepInput = z.input<typeof stepInputSchema>;
export type StepItemSnapshot = {
  combinationId: string;
  revision: number;
  label: string;
  name: string;
  spec: Combination;
  change?: ItemChange | null;
};