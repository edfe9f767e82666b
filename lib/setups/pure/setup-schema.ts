/**
 * Saved setups as the API and the database hold them: SI units (kg, mm, kPa), wheels and
 * baseline reusing the pressure engine's schemas. Shared by the setup form (client), the route
 * handlers and the seeder. lib/setups/pure/setup-form.ts turns what a rider types into this shape.
 */
import { z } from "zod";
import { ceilingKpa } from "@/lib/pressure/pure/band";
import { baselineSchema, boundedNumber, pressureRequestSchema, wheelSchema } from "@/lib/pressure/pure/schemas";
import { nameCheck } from "@/lib/shared/text";

/** Shock stroke, not rear-wheel travel: sag is measured on the shock's shaft. */
export const SHOCK_STROKE_MM = { min: 20, max: 100 } as const;
export const FORK_TRAVEL_MM = { min: 40, max: 250 } as const;
export const MAX_SETUPS_PER_RIDER = 30;

export const suspensionSchema = z
  .strictObject({
    rearStrokeMm: boundedNumber("Shock stroke", SHOCK_STROKE_MM.min, SHOCK_STROKE_MM.max, "mm").optional(),
    rearSagMm: boundedNumber("Rear sag", 0, SHOCK_STROKE_MM.max, "mm").optional(),
    forkTravelMm: boundedNumber("Fork travel", FORK_TRAVEL_MM.min, FORK_TRAVEL_MM.max, "mm").optional(),
    frontSagMm: boundedNumber("Fork sag", 0, FORK_TRAVEL_MM.max, "mm").optional(),
  })
  .superRefine((s, ctx) => {
    const ends = [
      { sag: s.rearSagMm, stroke: s.rearStrokeMm, sagPath: "rearSagMm", strokePath: "rearStrokeMm", part: "shock stroke" },
      { sag: s.frontSagMm, stroke: s.forkTravelMm, sagPath: "frontSagMm", strokePath: "forkTravelMm", part: "fork travel" },
    ];
    for (const end of ends) {
      if (end.sag === undefined) continue;
      if (end.stroke === undefined) ctx.addIssue({ code: "custom", message: `Enter the ${end.part} to check this sag.`, path: [end.strokePath] });
      else if (end.sag > end.stroke) ctx.addIssue({ code: "custom", message: `Sag cannot be more than the ${end.part}.`, path: [end.sagPath] });
    }
  });

const request = pressureRequestSchema.shape;
const setupShape = {
  name: z
    .string({ error: "Give the setup a name." })
    .trim()
    .min(1, { error: "Give the setup a name." })
    .max(60, { error: "Use at most 60 characters for the name." })
    .superRefine(nameCheck("The name")),
  riderMassKg: request.riderMassKg,
  bikeMassKg: request.bikeMassKg,
  pace: request.pace,
  front: wheelSchema,
  rear: wheelSchema,
  baseline: baselineSchema.nullable().optional(),
  suspension: suspensionSchema.nullable().optional(),
};

/** A baseline above a printed maximum is refused: nothing is ever advised above it. */
function baselineWithinMaximum(setup: { front: z.infer<typeof wheelSchema>; rear: z.infer<typeof wheelSchema>; baseline?: z.infer<typeof baselineSchema> | null }, ctx: z.RefinementCtx) {
  if (!setup.baseline) return;
  for (const [wheel, key] of [["front", "frontKpa"], ["rear", "rearKpa"]] as const) {
    if (setup.baseline[key] > ceilingKpa(setup[wheel])) {
      ctx.addIssue({ code: "custom", message: `The ${wheel} baseline is above the printed maximum of the ${wheel} tyre or rim.`, path: ["baseline", key] });
    }
  }
}

/** A whole setup (create, and the result of every update). */
export const setupSchema = z.strictObject(setupShape).superRefine(baselineWithinMaximum);

/** PATCH: any subset of the fields plus the lockVersion the rider last saw. */
export const setupPatchSchema = z.strictObject({
  ...z.strictObject(setupShape).partial().shape,
  lockVersion: z.number({ error: "Send the lockVersion you last read." }).int().min(0),
});

export type Suspension = z.infer<typeof suspensionSchema>;
export type SetupInput = z.infer<typeof setupSchema>;
export type SetupInputRaw = z.input<typeof setupSchema>;
export type SetupPatch = z.infer<typeof setupPatchSchema>;
