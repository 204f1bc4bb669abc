// Zod schemas of every input of the computational core (calc/README.md), shared by forms,
// the REST API and the entry points. All values SI; messages name the field and its range.
import { z } from "zod";
import { CalcInputError, type FieldIssue } from "./errors";

/** A finite number within [min, max] with one human message for every way it can be wrong. */
function bounded(label: string, min: number, max: number, unit: string, hint = "") {
  const message = `${label} must be between ${min} and ${max}${unit ? ` ${unit}` : ""}${hint ? ` (${hint})` : ""}`;
  return z.number({ error: message }).min(min, { error: message }).max(max, { error: message });
}

/** A whole number within [min, max]. */
function boundedInt(label: string, min: number, max: number) {
  const message = `${label} must be a whole number between ${min} and ${max}`;
  return z.number({ error: message }).int({ error: message }).min(min, { error: message }).max(max, { error: message });
}

/** Engine speed (rev/min): 100–20 000. */
export const rpmSchema = bounded("Engine speed", 100, 20_000, "rpm");

/** One point of the volumetric-efficiency curve. */
export const vePointSchema = z.object({
  /** Engine speed (rev/min). */
  rpm: rpmSchema,
  /** Volumetric efficiency referenced to manifold conditions (fraction, 1 = 100 %). */
  ve: bounded("Volumetric efficiency", 0.2, 2, "", "as a fraction, 1 = 100 %"),
});

/** A VE curve: at least one point, no repeated engine speed; sorted by rpm on parse. */
export const veCurveSchema = z
  .array(vePointSchema, { error: "The VE curve must be a list of {rpm, ve} points" })
  .min(1, { error: "The VE curve needs at least one point" })
  .max(64, { error: "The VE curve may have at most 64 points" })
  .superRefine((points, ctx) => {
    const seen = new Set<number>();
    points.forEach((p, i) => {
      if (seen.has(p.rpm)) {
        ctx.addIssue({ code: "custom", path: [i, "rpm"], message: `The VE curve has ${p.rpm} rpm twice` });
      }
      seen.add(p.rpm);
    });
  })
  .transform((points) => [...points].sort((a, b) => a.rpm - b.rpm));

/** The engine: a four-stroke of the given displacement and breathing. */
export const engineSchema = z.object({
  /** Swept volume of all cylinders (m³). */
  displacement: bounded("Engine displacement", 0.0002, 0.02, "m³", "0.2–20 L"),
  /** Number of cylinders (count). */
  cylinders: boundedInt("Number of cylinders", 1, 16),
  /** Wide-open-throttle VE against engine speed, referenced to manifold conditions. */
  veCurve: veCurveSchema,
  /** Highest engine speed used (rev/min). */
  redlineRpm: bounded("Redline", 1000, 20_000, "rpm"),
  /**
   * Exponent n of the charge temperature in the mass the engine traps, ṁ ∝ Pm·Tm^−n at a
   * given VE curve (dimensionless), default 0.5: heat picked up in the port and cylinder makes
   * VE rise with a hotter charge (Heywood 1988, ch. 6; the square root of SAE J1349's
   * temperature correction). 1 is the plain ideal-gas density, as before this refinement.
   */
  chargeTemperatureExponent: bounded("Charge temperature exponent", 0, 1, "").optional(),
  /**
   * Geometric compression ratio (dimensionless), or null to leave residual gas out (default).
   * With it, VE follows Heywood's ideal-cycle relation 1 − (Pe/Pm − 1)/(γ·(rc − 1)) relative to
   * its value unboosted at ambient pressure.
   */
  compressionRatio: bounded("Compression ratio", 4, 20, "").nullable().optional(),
  /** Exhaust back pressure above ambient at the speeds of the curve (Pa, gauge), default 0. */
  exhaustBackPressure: bounded("Exhaust back pressure", 0, 100_000, "Pa", "gauge").optional(),
});

/** Kind of positive-displacement blower. */
export const blowerKindSchema = z.enum(["roots", "twin-screw"], {
  error: "Blower kind must be 'roots' or 'twin-screw'",
});

/** The blower. */
export const blowerSchema = z
  .object({
    /** Roots or twin-screw. */
    kind: blowerKindSchema,
    /** Volume swept per revolution of the pulley shaft (m³/rev). */
    displacementPerRev: bounded("Blower displacement", 0.0001, 0.01, "m³/rev", "0.1–10 L/rev"),
    /** Built-in volume ratio: 1 for a Roots blower, above 1 for a twin-screw (dimensionless). */
    builtInVolumeRatio: bounded("Built-in volume ratio", 1, 4, ""),
    /** Pulley-shaft speed limit (rev/min). */
    maxRpm: bounded("Blower speed limit", 1000, 40_000, "rpm"),
    /** Volumetric efficiency at referenceRpm and pressure ratio 1.5 from 101 325 Pa (fraction). */
    volumetricEfficiencyRef: bounded("Blower reference volumetric efficiency", 0.3, 1, "", "as a fraction"),
    /** Pulley-shaft speed at which volumetricEfficiencyRef was measured (rev/min). */
    referenceRpm: bounded("Blower reference speed", 500, 40_000, "rpm"),
    /** Heating beyond the ideal cycle: friction, recirculation (fraction), default 0.85. */
    internalEfficiency: bounded("Blower internal efficiency", 0.3, 1, "", "as a fraction").default(0.85),
    /** Belt and gear efficiency of the drive (fraction), default 0.95. */
    mechanicalEfficiency: bounded("Drive mechanical efficiency", 0.5, 1, "", "as a fraction").default(0.95),
  })
  .superRefine((b, ctx) => {
    if (b.kind === "roots" && b.builtInVolumeRatio !== 1) {
      ctx.addIssue({
        code: "custom",
        path: ["builtInVolumeRatio"],
        message: "A Roots blower has no internal compression: its built-in volume ratio must be 1",
      });
    }
  });

/** The belt drive. */
export const driveSchema = z.object({
  /** Effective (pitch) diameter of the crank pulley (m). */
  crankPulleyDiameter: bounded("Crank pulley diameter", 0.03, 0.5, "m"),
  /** Effective (pitch) diameter of the blower pulley (m). */
  blowerPulleyDiameter: bounded("Blower pulley diameter", 0.03, 0.5, "m"),
  /** Fraction of speed lost to belt slip (fraction), default 0.02. */
  beltSlip: bounded("Belt slip", 0, 0.2, "", "as a fraction").default(0.02),
});

/**
 * Defaults of the model's optional refinements (SI). They are optional in the schema, not
 * defaulted there, so that every combination written before them keeps its type and parses.
 */
export const REFINEMENT_DEFAULTS = {
  /** Charge temperature exponent n (dimensionless): 0.5, see engineSchema. */
  chargeTemperatureExponent: 0.5,
  /** Compression ratio: null, residual gas left out. */
  compressionRatio: null,
  /** Exhaust back pressure (Pa, gauge): 0. */
  exhaustBackPressure: 0,
  /** Rating depression of an inlet restriction (Pa): 5079, 1.5 inHg, the usual four-barrel carburettor rating (common practice, no published source). */
  ratingDepression: 5079,
  /** Fractions of the fuel evaporated in the blower and in the port: 0. */
  evaporatedInBlower: 0,
  evaporatedInPort: 0,
} as const;

/** A throttle body or carburettor as the trade rates it: a flow at a rating depression. */
export const inletRestrictionSchema = z.object({
  /** Rated volume flow at the rating depression, at ambient density (m³/s). */
  ratedFlow: bounded("Rated inlet flow", 0.01, 2, "m³/s", "about 21–4200 cfm"),
  /** Depression at which the flow is rated (Pa), default 5079 (1.5 inHg, the usual four-barrel rating). */
  ratingDepression: bounded("Rating depression", 500, 30_000, "Pa").optional(),
});

/** The air the engine breathes. */
export const ambientSchema = z
  .object({
    /** Absolute ambient pressure (Pa). */
    pressure: bounded("Ambient pressure", 30_000, 110_000, "Pa"),
    /** Ambient temperature (K). */
    temperature: bounded("Ambient temperature", 220, 330, "K"),
    /** Pressure lost ahead of the blower: filter, throttle body, carburettor (Pa), default 0. */
    inletLoss: bounded("Inlet pressure loss", 0, 20_000, "Pa").default(0),
    /** A throttle body or carburettor ahead of the blower whose loss grows with flow, or null (default). */
    inletRestriction: inletRestrictionSchema.nullable().optional(),
  })
  .superRefine((a, ctx) => {
    if (a.inletLoss >= 0.5 * a.pressure) {
      ctx.addIssue({ code: "custom", path: ["inletLoss"], message: "Inlet pressure loss must be less than half the ambient pressure" });
    }
  });

/** An air-to-water or air-to-air intercooler after the blower. */
export const intercoolerSchema = z.object({
  /** Fraction of the temperature difference to the coolant removed (fraction). */
  effectiveness: bounded("Intercooler effectiveness", 0, 1, "", "as a fraction"),
  /** Pressure lost across the intercooler (Pa). */
  pressureDrop: bounded("Intercooler pressure drop", 0, 50_000, "Pa"),
  /** Temperature of the coolant (ambient air or water) (K). */
  coolantTemperature: bounded("Intercooler coolant temperature", 220, 400, "K"),
});

/** Fuel and injectors. */
export const fuelSchema = z
  .object({
    /** Air-fuel ratio by mass (dimensionless). */
    afr: bounded("Air-fuel ratio", 4, 25, ""),
    /** Brake specific fuel consumption of the engine itself, before the blower drive (kg/J). */
    bsfc: bounded("BSFC", 3e-8, 3e-7, "kg/J", "about 0.18–1.8 lb/(hp·h)"),
    /** Number of injectors (count), optional. */
    injectorCount: boundedInt("Number of injectors", 1, 32).nullable().optional(),
    /** Flow of one injector at its rated pressure (kg/s), optional. */
    injectorFlow: bounded("Injector flow", 1e-4, 0.05, "kg/s").nullable().optional(),
    /** Highest acceptable injector duty cycle (fraction), default 0.85. */
    maxDuty: bounded("Maximum injector duty", 0.1, 1, "", "as a fraction").default(0.85),
    /** Fraction of the fuel evaporated ahead of the blower (draw-through), cooling its inlet (fraction), default 0. */
    evaporatedBeforeBlower: bounded("Fuel evaporated before the blower", 0, 1, "", "as a fraction").default(0),
    /** Fraction of the fuel evaporated inside the blower while the charge is compressed (draw-through) (fraction), default 0. */
    evaporatedInBlower: bounded("Fuel evaporated in the blower", 0, 1, "", "as a fraction").optional(),
    /** Fraction of the fuel evaporated in the port after the manifold (port injection), cooling the trapped charge (fraction), default 0. */
    evaporatedInPort: bounded("Fuel evaporated in the port", 0, 1, "", "as a fraction").optional(),
  })
  .superRefine((f, ctx) => {
    if (f.evaporatedBeforeBlower + (f.evaporatedInBlower ?? 0) + (f.evaporatedInPort ?? 0) > 1 + 1e-12) {
      ctx.addIssue({
        code: "custom",
        path: ["evaporatedInPort"],
        message: "The fractions of fuel evaporated before the blower, in the blower and in the port add up to more than 1",
      });
    }
    const hasCount = f.injectorCount != null;
    const hasFlow = f.injectorFlow != null;
    if (hasCount !== hasFlow) {
      ctx.addIssue({
        code: "custom",
        path: [hasCount ? "injectorFlow" : "injectorCount"],
        message: "Give both the number of injectors and the flow of one injector, or neither",
      });
    }
  });

/** A whole combination: engine, blower, drive, ambient, intercooler (or null) and fuel. */
export const combinationSchema = z.object({
  /** The engine. */
  engine: engineSchema,
  /** The blower. */
  blower: blowerSchema,
  /** The belt drive. */
  drive: driveSchema,
  /** The ambient air. */
  ambient: ambientSchema,
  /** The intercooler, or null without one. */
  intercooler: intercoolerSchema.nullable().default(null),
  /** Fuel and injectors. */
  fuel: fuelSchema,
});

/** A combination after validation and defaults (SI). */
export type Combination = z.output<typeof combinationSchema>;
/** A combination as a form or the API may give it (defaults optional). */
export type CombinationInput = z.input<typeof combinationSchema>;
/** One VE point. */
export type VePoint = z.output<typeof vePointSchema>;
/** Roots or twin-screw. */
export type BlowerKind = z.output<typeof blowerKindSchema>;
/** Intercooler parameters. */
export type Intercooler = z.output<typeof intercoolerSchema>;

/** A list of engine speeds for a boost curve (rev/min). */
export const rpmListSchema = z
  .array(rpmSchema, { error: "Engine speeds must be a list of numbers" })
  .min(1, { error: "Give at least one engine speed" })
  .max(2000, { error: "Give at most 2000 engine speeds" });

/** A pulley diameter for the ladder or the shelf (m). */
export const pulleyDiameterSchema = bounded("Blower pulley diameter", 0.03, 0.5, "m");
/** A list of candidate blower pulley diameters (m). */
export const pulleyDiameterListSchema = z
  .array(pulleyDiameterSchema, { error: "Pulley diameters must be a list of numbers" })
  .max(500, { error: "Give at most 500 pulley diameters" });

/** A target boost for the pulley finder, gauge (Pa). */
export const targetBoostSchema = bounded("Target boost", -50_000, 400_000, "Pa", "gauge");

/** Options of the cautions and of the pulley ladder's limit flags. */
export const cautionOptionsSchema = z
  .object({
    /** Smallest blower pulley the belt may wrap (m), default 0.076 (a demo default). */
    beltMinimumDiameter: bounded("Belt minimum pulley diameter", 0.02, 0.3, "m").optional(),
    /** Manifold (charge) temperature above which to warn (K), default 333.15 (60 °C). */
    chargeTemperatureLimit: bounded("Charge temperature limit", 280, 450, "K").optional(),
    /** Highest pressure ratio the model is meant for (dimensionless), default 2.5. */
    maxModelPressureRatio: bounded("Model pressure ratio limit", 1.1, 5, "").optional(),
  })
  .default({});
/** Options of the cautions. */
export type CautionOptions = z.input<typeof cautionOptionsSchema>;

/** One measured point from a datalog or dyno sheet. */
export const measuredPointSchema = z.object({
  /** Engine speed (rev/min). */
  rpm: rpmSchema,
  /** Measured boost, gauge (Pa). */
  boostGauge: bounded("Measured boost", -50_000, 400_000, "Pa", "gauge"),
  /** Measured manifold (charge) temperature (K), optional. */
  manifoldTemperature: bounded("Measured manifold temperature", 220, 500, "K").nullable().optional(),
});
/** Measured points for VE calibration: at least one, no repeated engine speed. */
export const measuredListSchema = z
  .array(measuredPointSchema, { error: "Measurements must be a list of {rpm, boostGauge} points" })
  .min(1, { error: "Give at least one measured point" })
  .max(500, { error: "Give at most 500 measured points" })
  .superRefine((points, ctx) => {
    const seen = new Set<number>();
    points.forEach((p, i) => {
      if (seen.has(p.rpm)) ctx.addIssue({ code: "custom", path: [i, "rpm"], message: `${p.rpm} rpm is measured twice` });
      seen.add(p.rpm);
    });
  });
/** One measured point as given. */
export type MeasuredPoint = z.input<typeof measuredPointSchema>;

/** Geometric altitude for the standard atmosphere (m): −1000 to 11 000 (troposphere). */
export const altitudeSchema = bounded("Altitude", -1000, 11_000, "m", "troposphere");

/** A plain positive finite number for small helpers, in a named unit. */
export function positiveSchema(label: string, unit: string) {
  // The schema-level message also serves `.positive()` (Zod 4 takes the schema's error for its checks).
  const message = `${label} must be a positive number in ${unit}`;
  return z.number({ error: message }).positive();
}

/** Parse `value` with `schema` or throw a `CalcInputError` naming each failing field under `prefix`. */
export function parseOrThrow<S extends z.ZodType>(schema: S, value: unknown, prefix = ""): z.output<S> {
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  const issues: FieldIssue[] = result.error.issues.map((issue) => ({
    field: [prefix, ...issue.path.map(String)].filter((s) => s !== "").join("."),
    message: issue.message,
  }));
  throw new CalcInputError(issues);
}

/** The logs of one blower pulley size: its diameter and the points measured with it. */
export const calibrationRunSchema = z.object({
  /** Blower pulley diameter the run was logged with (m). */
  blowerPulleyDiameter: pulleyDiameterSchema,
  /** Points measured with it. */
  measured: measuredListSchema,
});
/** Runs for calibration: one per pulley size logged (1–10). */
export const calibrationRunsSchema = z
  .array(calibrationRunSchema, { error: "Runs must be a list of {blowerPulleyDiameter, measured} entries" })
  .min(1, { error: "Give at least one run" })
  .max(10, { error: "Give at most 10 runs" });
/** One run as given. */
export type CalibrationRun = z.input<typeof calibrationRunSchema>;
