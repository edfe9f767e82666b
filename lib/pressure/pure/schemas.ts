import { SURFACES, type Surface } from "@/lib/conditions/pure/vocabulary";

export { SURFACES, type Surface };
/**
 * Schemas for the pressure engine: the public request (route body), the engine's own input
 * (with the day's conditions resolved per trail) and the ride-log feedback.
 * Strict objects: unknown keys are refused so a typo never passes silently.
 */
import { z } from "zod";
import { PRESSURE_UNITS } from "@/lib/shared/units";

export const FEATURES = ["berm", "jump", "drop", "rock-garden", "roots", "wooden-feature"] as const;
export const CASINGS = ["light", "trail", "reinforced", "downhill"] as const;
export const PACES = ["easy", "steady", "hard"] as const;
/** ISO 5775 bead-seat diameters (mm): 20", 24", 26", 27.5" (650B), 29" (700C); their names in WHEEL_SIZE_LABELS (lib/shared/units.ts). */
export const BEAD_SEAT_DIAMETERS_MM = [406, 507, 559, 584, 622] as const;
export const SYMPTOMS = ["squirm-in-berms", "rim-strike", "burp", "harsh", "sliding", "fine"] as const;

/** A number within [min, max] whose messages name the field and the unit. */
export const boundedNumber = (label: string, min: number, max: number, unit: string) =>
  z
    .number({ error: (issue) => (issue.input === undefined ? `${label} is required.` : `${label} must be a number.`) })
    .min(min, { error: `${label} must be at least ${min} ${unit}.` })
    .max(max, { error: `${label} must be at most ${max} ${unit}.` });

const uniqueList = <T extends z.ZodType>(item: T, label: string, max: number) =>
  z
    .array(item)
    .max(max, { error: `List at most ${max} ${label}.` })
    .refine((list) => new Set(list).size === list.length, { error: `Each ${label.replace(/s$/, "")} only once.` });

export const surfaceSchema = z.enum(SURFACES, { error: `Surface must be one of: ${SURFACES.join(", ")}.` });
export const featureSchema = z.enum(FEATURES, { error: `Feature must be one of: ${FEATURES.join(", ")}.` });
export const surfaceList = uniqueList(surfaceSchema, "surfaces", SURFACES.length);
const featureList = uniqueList(featureSchema, "features", FEATURES.length);

export const wheelSchema = z.strictObject({
  bsdMm: z.literal(BEAD_SEAT_DIAMETERS_MM, {
    error: `Bead-seat diameter must be one of ${BEAD_SEAT_DIAMETERS_MM.join(", ")} mm (ISO 5775: 20", 24", 26", 27.5", 29").`,
  }),
  widthMm: boundedNumber("Tyre width", 35, 120, "mm"),
  casing: z.enum(CASINGS, { error: `Casing must be one of: ${CASINGS.join(", ")}.` }),
  insert: z.boolean({ error: "Insert must be true or false." }),
  tubeless: z.boolean({ error: "Tubeless must be true or false." }),
  maxKpa: boundedNumber("The tyre's printed maximum", 100, 1100, "kPa"),
  rimMaxKpa: boundedNumber("The rim's printed maximum", 100, 1100, "kPa").optional(),
  /** The tyre's printed minimum, when it has one. */
  minKpa: boundedNumber("The tyre's printed minimum", 20, 1100, "kPa").optional(),
});

export const baselineSchema = z.strictObject({
  frontKpa: boundedNumber("Baseline front pressure", 20, 1100, "kPa"),
  rearKpa: boundedNumber("Baseline rear pressure", 20, 1100, "kPa"),
  surfaces: surfaceList.min(1, { error: "Name at least one surface the baseline was set on." }).default(["dry"]),
  /** Where the baseline was checked with a gauge (air temperature, elevation). */
  temperatureC: boundedNumber("Baseline temperature", -40, 50, "°C").optional(),
  elevationM: boundedNumber("Baseline elevation", -500, 5000, "m").optional(),
  /** What it was ridden in, when that differs from where it was checked. */
  rideTemperatureC: boundedNumber("Baseline ride temperature", -40, 50, "°C").optional(),
  rideElevationM: boundedNumber("Baseline ride elevation", -500, 5000, "m").optional(),
});

/** Air temperatures and elevations of the day; each optional (missing means "same as the other"). */
const airFields = {
  airTemperatureC: boundedNumber("Air temperature", -40, 50, "°C").optional(),
  pumpTemperatureC: boundedNumber("Pump temperature", -40, 50, "°C").optional(),
  rideElevationM: boundedNumber("Ride elevation", -500, 5000, "m").optional(),
  pumpElevationM: boundedNumber("Pump elevation", -500, 5000, "m").optional(),
  /** The highest point of the planned trails: the printed maximum is checked there too. */
  highestElevationM: boundedNumber("Highest elevation", -500, 5000, "m").optional(),
  /** The lowest point of the planned trails: the band widens with the span. */
  lowestElevationM: boundedNumber("Lowest elevation", -500, 5000, "m").optional(),
};

export const trailConditionsSchema = z.strictObject({
  name: z.string().trim().min(1, { error: "Trail name is required." }).max(120, { error: "Trail name is too long." }),
  surfaces: surfaceList,
  features: featureList,
  lastReportAgeHours: boundedNumber("Report age", 0, 24 * 365 * 10, "hours").nullable().optional(),
});

/** What the engine knows about today: per-trail conditions and/or whole-day surfaces and features. */
export const dayConditionsSchema = z.strictObject({
  trails: z.array(trailConditionsSchema).max(60, { error: "Plan at most 60 trails." }).optional(),
  surfaces: surfaceList.optional(),
  features: featureList.optional(),
  ...airFields,
});

/** Today as the rider sends it: the route layer resolves parkSlug + trailIds into trails. */
export const todayRequestSchema = z.strictObject({
  parkSlug: z
    .string()
    .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, { error: "Park slug must be lower-case words joined by hyphens." })
    .max(80, { error: "Park slug is too long." })
    .optional(),
  trailIds: uniqueList(z.string().min(1).max(100), "trail ids", 60).optional(),
  /** Park-local hours of riding (both included) whose forecast stands for the trail's air when no temperature is typed; default 10–14. */
  rideHours: z
    .strictObject({
      from: z.number({ error: "Ride hours: give the first hour (0–23)." }).int({ error: "Ride hours are whole hours." }).min(0, { error: "Ride hours run from 0 to 23." }).max(23, { error: "Ride hours run from 0 to 23." }),
      to: z.number({ error: "Ride hours: give the last hour (0–23)." }).int({ error: "Ride hours are whole hours." }).min(0, { error: "Ride hours run from 0 to 23." }).max(23, { error: "Ride hours run from 0 to 23." }),
    })
    .refine((h) => h.from <= h.to, { error: "Ride hours: the first hour must not be after the last.", path: ["to"] })
    .optional(),
  surfaces: surfaceList.optional(),
  features: featureList.optional(),
  ...airFields,
});

const setupFields = {
  riderMassKg: boundedNumber("Rider mass (with kit)", 10, 200, "kg"),
  bikeMassKg: boundedNumber("Bike mass", 3, 60, "kg"),
  pace: z.enum(PACES, { error: `Pace must be one of: ${PACES.join(", ")}.` }),
  front: wheelSchema,
  rear: wheelSchema,
  baseline: baselineSchema.optional(),
  unit: z.enum(PRESSURE_UNITS, { error: `Unit must be one of: ${PRESSURE_UNITS.join(", ")}.` }).default("psi"),
};

export const pressureRequestSchema = z.strictObject({ ...setupFields, today: todayRequestSchema.optional() });
/** The same request for a signed-in rider's saved setup (own setups only); unit defaults to the rider's choice. */
export const savedSetupPressureRequestSchema = z.strictObject({
  setupId: z.uuid({ error: "Choose one of your saved setups." }),
  unit: setupFields.unit.unwrap().optional(),
  today: todayRequestSchema.optional(),
});
/** What one ride log tells the engine (learning.ts): what was run and how each tyre felt, on what ground. */
export const rideEvidenceSchema = z.strictObject({
  frontKpa: boundedNumber("Front pressure you ran", 20, 1100, "kPa"),
  rearKpa: boundedNumber("Rear pressure you ran", 20, 1100, "kPa"),
  symptoms: z.strictObject({ front: z.array(z.enum(SYMPTOMS)).max(SYMPTOMS.length), rear: z.array(z.enum(SYMPTOMS)).max(SYMPTOMS.length) }),
  surfaces: surfaceList.default([]),
});

export const pressureInputSchema = z.strictObject({
  ...setupFields,
  today: dayConditionsSchema.optional(),
  /** This setup's ride logs, newest first (saved setups only). */
  rides: z.array(rideEvidenceSchema).max(100).optional(),
});

export const wheelSymptomsSchema = uniqueList(
  z.enum(SYMPTOMS, { error: `Symptom must be one of: ${SYMPTOMS.join(", ")}.` }),
  "symptoms",
  SYMPTOMS.length,
);
export const rideSymptomsSchema = z.strictObject({ front: wheelSymptomsSchema, rear: wheelSymptomsSchema });

export const sagInputSchema = z
  .strictObject({
    end: z.enum(["rear", "fork"], { error: "Sag is measured on the rear shock or the fork." }),
    sagMm: boundedNumber("Sag", 0, 400, "mm"),
    strokeMm: boundedNumber("Stroke or travel", 10, 400, "mm"),
  })
  .refine((v) => v.sagMm <= v.strokeMm, { error: "Sag cannot exceed the stroke or travel.", path: ["sagMm"] });

export type Feature = z.infer<typeof featureSchema>;
export type Casing = (typeof CASINGS)[number];
export type Pace = (typeof PACES)[number];
export type Symptom = (typeof SYMPTOMS)[number];
export type WheelSetup = z.infer<typeof wheelSchema>;
export type Baseline = z.infer<typeof baselineSchema>;
export type TrailConditions = z.infer<typeof trailConditionsSchema>;
export type DayConditions = z.infer<typeof dayConditionsSchema>;
export type PressureRequest = z.infer<typeof pressureRequestSchema>;
export type SavedSetupPressureRequest = z.infer<typeof savedSetupPressureRequestSchema>;
export type PressureRequestInput = z.input<typeof pressureRequestSchema>;
export type PressureInput = z.infer<typeof pressureInputSchema>;
export type PressureInputRaw = z.input<typeof pressureInputSchema>;
export type RideSymptoms = z.infer<typeof rideSymptomsSchema>;
export type RideEvidence = z.infer<typeof rideEvidenceSchema>;
export type SagInput = z.infer<typeof sagInputSchema>;
