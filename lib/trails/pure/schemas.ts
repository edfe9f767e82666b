import { z } from "zod";
import { nameCheck } from "@/lib/shared/text";

/** The trade's five difficulty grades (circle / square / diamond scale), easiest first. */
export const difficultyValues = ["easiest", "easy", "intermediate", "difficult", "extreme"] as const;
export const trailKindValues = ["flow", "jump", "technical", "climb", "cross-country", "downhill"] as const;
export const trailDirectionValues = ["downhill", "uphill", "both"] as const;

export const difficultySchema = z.enum(difficultyValues, { message: "Choose a difficulty: easiest, easy, intermediate, difficult or extreme." });
export const trailKindSchema = z.enum(trailKindValues, { message: "Choose a kind: flow, jump, technical, climb, cross-country or downhill." });
export const trailDirectionSchema = z.enum(trailDirectionValues, { message: "Choose a direction: downhill, uphill or both." });

export const trailNameSchema = z.string().trim().min(1, "Enter the trail's name.").max(80, "Use at most 80 characters.").superRefine(nameCheck("The name"));

/** What staff type about a trail when uploading or editing it. */
export const trailMetadataSchema = z
  .object({
    name: trailNameSchema,
    difficulty: difficultySchema,
    kind: trailKindSchema,
    direction: trailDirectionSchema,
  })
  .strict();

export const trailMetadataUpdateSchema = trailMetadataSchema.partial().strict();

/** Figures computed from a trail's geometry (lib/trails/pure/stats.ts); elevation figures are null when the file has none. */
export const trailStatsSchema = z.object({
  lengthM: z.number().nonnegative(),
  ascentM: z.number().nonnegative().nullable(),
  descentM: z.number().nonnegative().nullable(),
  avgGradePct: z.number().nonnegative().nullable(),
  maxGradePct: z.number().nonnegative().nullable(),
  minElevationM: z.number().nullable(),
  maxElevationM: z.number().nullable(),
  bbox: z.tuple([z.number(), z.number(), z.number(), z.number()]),
  pointCount: z.number().int().positive(),
});

export type Difficulty = z.infer<typeof difficultySchema>;
export type TrailKind = z.infer<typeof trailKindSchema>;
export type TrailDirection = z.infer<typeof trailDirectionSchema>;
export type TrailMetadata = z.infer<typeof trailMetadataSchema>;
export type TrailStats = z.infer<typeof trailStatsSchema>;

/** Metadata sent beside an uploaded file (multipart fields): all optional, empty fields count as absent. */
const blankIsAbsent = (value: unknown) => (typeof value === "string" && value.trim() === "" ? undefined : value);
export const trailUploadFieldsSchema = z
  .object({
    name: z.preprocess(blankIsAbsent, trailNameSchema.optional()),
    difficulty: z.preprocess(blankIsAbsent, difficultySchema.optional()),
    kind: z.preprocess(blankIsAbsent, trailKindSchema.optional()),
    direction: z.preprocess(blankIsAbsent, trailDirectionSchema.optional()),
  })
  .strict();

/** PATCH /api/trails/{id}: changed metadata plus the lockVersion the editor started from (optimistic locking). */
export const trailPatchSchema = trailMetadataUpdateSchema.extend({
  lockVersion: z.number({ message: "Send the lockVersion you read with the trail." }).int().nonnegative(),
});

export const featureKindValues = ["berm", "jump", "drop", "rock-garden", "roots", "wooden-feature", "unknown"] as const;
export const featureSizeValues = ["small", "medium", "large"] as const;
export const featureKindSchema = z.enum(featureKindValues, { message: "Choose a feature: berm, jump, drop, rock-garden, roots, wooden-feature or unknown." });
export const featureSizeSchema = z.enum(featureSizeValues, { message: "Choose a size: small, medium or large." });

const longitude = z.number({ message: "Longitude must be a number." }).min(-180, "Longitude is −180…180.").max(180, "Longitude is −180…180.");
const latitude = z.number({ message: "Latitude must be a number." }).min(-90, "Latitude is −90…90.").max(90, "Latitude is −90…90.");
const distanceAlong = z.number({ message: "Distance along the trail must be a number of metres." }).nonnegative("Distance along the trail cannot be negative.");
const featureName = z.string().trim().max(80, "Use at most 80 characters.").superRefine(nameCheck("The name")).nullable();

const lonLatTogether = (p: { lon?: number; lat?: number }) => (p.lon === undefined) === (p.lat === undefined);
const together = { message: "Send longitude and latitude together.", path: ["lat"] };
const onePlacement = (p: { lon?: number; distanceAlongM?: number }) => p.lon === undefined || p.distanceAlongM === undefined;
const onlyOne = { message: "Send either a distance along the trail or longitude and latitude, not both.", path: ["distanceAlongM"] };

/** A new feature: its kind and size, and where it sits: a point (snapped onto the line) or a distance from the start. */
const featureFields = z.strictObject({
  kind: featureKindSchema,
  size: featureSizeSchema.nullable().optional(),
  name: featureName.optional(),
  lon: longitude.optional(),
  lat: latitude.optional(),
  distanceAlongM: distanceAlong.optional(),
});

export const trailFeatureCreateSchema = featureFields
  .refine(lonLatTogether, together)
  .refine((p) => p.lon !== undefined || p.distanceAlongM !== undefined, {
    message: "Say where the feature is: a distance from the trail's start, or longitude and latitude.",
    path: ["distanceAlongM"],
  })
  .refine(onePlacement, onlyOne);

/** Move, retype or resize a feature; nothing else may change. */
export const trailFeatureUpdateSchema = featureFields
  .extend({ kind: featureKindSchema.optional() })
  .refine(lonLatTogether, together)
  .refine(onePlacement, onlyOne);

export const trailDownloadQuerySchema = z
  .object({
    format: z.enum(["gpx", "geojson"], { message: "Choose format=gpx or format=geojson." }).optional(),
    version: z.coerce.number({ message: "version must be a whole number." }).int("version must be a whole number.").positive("version starts at 1.").optional(),
  })
  .strict();

/** Sorting the park's trail list (page search params); anything unknown falls back to the default. */
export const trailSortKeys = ["difficulty", "name", "kind", "length", "descent", "grade"] as const;
export const trailListQuerySchema = z.object({
  sort: z.enum(trailSortKeys).catch("difficulty"),
  dir: z.enum(["asc", "desc"]).catch("asc"),
});

export type TrailSortKey = z.infer<typeof trailListQuerySchema>["sort"];
export type TrailUploadFields = z.infer<typeof trailUploadFieldsSchema>;
export type TrailPatch = z.infer<typeof trailPatchSchema>;
export type FeatureKindValue = z.infer<typeof featureKindSchema>;
export type FeatureSize = z.infer<typeof featureSizeSchema>;
export type TrailFeatureCreate = z.infer<typeof trailFeatureCreateSchema>;
export type TrailFeatureUpdate = z.infer<typeof trailFeatureUpdateSchema>;
export type TrailDownloadQuery = z.infer<typeof trailDownloadQuerySchema>;
