import { z } from "zod";
import { difficultySchema, trailDirectionSchema, trailKindSchema } from "@/lib/trails/pure/schemas";

/** A position on the map, as staff drop it: WGS84 longitude and latitude (RFC 7946 §4). */
export const lonLatSchema = z
  .object({
    lon: z.number({ message: "Give the longitude as a number." }).finite().min(-180, "Longitude is between -180 and 180.").max(180, "Longitude is between -180 and 180."),
    lat: z.number({ message: "Give the latitude as a number." }).finite().min(-90, "Latitude is between -90 and 90.").max(90, "Latitude is between -90 and 90."),
  })
  .strict();

export const moveTrailFeatureSchema = lonLatSchema;

/** A hazard move names the version it was read at, so two rangers never overwrite each other. */
export const moveHazardSchema = lonLatSchema.extend({ lockVersion: z.number().int().nonnegative() }).strict();

export const reportedStatusSchema = z.enum(["open", "caution", "closed"]);

/** Properties of each trail line in trails.geojson (what the map, its card and its list read). */
export const trailMapPropertiesSchema = z.object({
  id: z.string(),
  name: z.string(),
  difficulty: difficultySchema,
  kind: trailKindSchema,
  direction: trailDirectionSchema,
  lengthM: z.number(),
  descentM: z.number().nullable(),
  maxGradePct: z.number().nullable(),
  status: reportedStatusSchema.nullable(),
  statusLabel: z.string(),
  surfaces: z.array(z.string()),
  lastReportAt: z.string().nullable(),
});

export type LonLatInput = z.infer<typeof lonLatSchema>;
export type MoveHazardInput = z.infer<typeof moveHazardSchema>;
export type TrailMapProperties = z.infer<typeof trailMapPropertiesSchema>;
