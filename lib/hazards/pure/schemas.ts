/**
 * Hazard pins. The form sends multipart fields (strings), the API may send numbers: both
 * pass through the same schema with z.coerce for the numbers.
 */
import { z } from "zod";
import { noteCheck } from "@/lib/shared/text";

export const HAZARD_KINDS = ["fallen-tree", "washout", "damaged-feature", "wet-wooden-feature", "machinery", "other"] as const;

const emptyToUndefined = (v: unknown) => (v === "" || v === null ? undefined : v);

const coordinate = (label: string, min: number, max: number) =>
  z.preprocess(
    emptyToUndefined,
    z.coerce
      .number({ error: `${label} must be a number.` })
      .refine(Number.isFinite, { error: `${label} must be a number.` })
      .min(min, { error: `${label} must be between ${min} and ${max}.` })
      .max(max, { error: `${label} must be between ${min} and ${max}.` })
      .optional(),
  );

export const hazardKindSchema = z.enum(HAZARD_KINDS, { error: `Kind must be one of: ${HAZARD_KINDS.join(", ")}.` });
export const hazardNoteSchema = z
  .string()
  .trim()
  .max(1000, { error: "Note: use at most 1000 characters." })
  .superRefine(noteCheck("The note")); // controls and text-direction overrides (lib/shared/text.ts)

/**
 * Where and what. A point is given either as lon/lat, or as a trail plus a distance along
 * it (the server computes the point on the trail's line).
 */
export const hazardInputSchema = z
  .object({
    kind: hazardKindSchema,
    note: z.preprocess(emptyToUndefined, hazardNoteSchema.optional()),
    lon: coordinate("Longitude", -180, 180),
    lat: coordinate("Latitude", -90, 90),
    trailId: z.preprocess(emptyToUndefined, z.uuid({ error: "Choose a trail of this park." }).optional()),
    distanceAlongM: z.preprocess(
      emptyToUndefined,
      z.coerce.number({ error: "Distance along the trail must be a number of metres." }).min(0, { error: "Distance along the trail cannot be negative." }).optional(),
    ),
  })
  .strict()
  .superRefine((h, ctx) => {
    const hasPoint = h.lon !== undefined && h.lat !== undefined;
    const along = h.distanceAlongM !== undefined;
    if ((h.lon === undefined) !== (h.lat === undefined)) {
      ctx.addIssue({ code: "custom", path: [h.lon === undefined ? "lon" : "lat"], message: "Give both longitude and latitude." });
    } else if (along && !h.trailId) {
      ctx.addIssue({ code: "custom", path: ["trailId"], message: "Choose the trail the distance is measured along." });
    } else if (!hasPoint && !along) {
      ctx.addIssue({ code: "custom", path: ["lon"], message: "Give the hazard's position: tap the map, use your location, type the coordinates, or choose a trail and a distance along it." });
    } else if (hasPoint && along) {
      ctx.addIssue({ code: "custom", path: ["distanceAlongM"], message: "Give coordinates or a distance along the trail, not both." });
    }
  });

/** PATCH /api/hazards/{id}: resolve or edit, from the lockVersion the client read. */
export const hazardPatchSchema = z
  .object({
    lockVersion: z.number({ error: "lockVersion must be a whole number." }).int().min(0),
    resolved: z.boolean().optional(),
    kind: hazardKindSchema.optional(),
    note: hazardNoteSchema.nullable().optional(),
  })
  .strict()
  .refine((p) => p.resolved !== undefined || p.kind !== undefined || p.note !== undefined, { error: "Nothing to change.", path: ["resolved"] });

export type HazardKind = z.infer<typeof hazardKindSchema>;
export type HazardInput = z.infer<typeof hazardInputSchema>;
export type HazardPatch = z.infer<typeof hazardPatchSchema>;
