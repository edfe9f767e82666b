import { z } from "zod";

/** The trade's five difficulty grades (circle / square / diamond scale), easiest first. */
export const difficultyValues = ["easiest", "easy", "intermediate", "difficult", "extreme"] as const;
export const trailKindValues = ["flow", "jump", "technical", "climb", "cross-country", "downhill"] as const;
export const trailDirectionValues = ["downhill", "uphill", "both"] as const;

export const difficultySchema = z.enum(difficultyValues, { message: "Choose a difficulty: easiest, easy, intermediate, difficult or extreme." });
export const trailKindSchema = z.enum(trailKindValues, { message: "Choose a kind: flow, jump, technical, climb, cross-country or downhill." });
export const trailDirectionSchema = z.enum(trailDirectionValues, { message: "Choose a direction: downhill, uphill or both." });

export const trailNameSchema = z.string().trim().min(1, "Enter the trail's name.").max(80, "Use at most 80 characters.");

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

/** Figures computed from a trail's geometry (lib/trails/stats.ts); elevation figures are null when the file has none. */
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
