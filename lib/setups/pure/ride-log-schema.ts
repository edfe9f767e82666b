/** A ride log as the API takes it: what was run (kPa), how each tyre felt, where and when. */
import { z } from "zod";
import { boundedNumber, rideSymptomsSchema, surfaceList, todayRequestSchema } from "@/lib/pressure/pure/schemas";
import { noteCheck } from "@/lib/shared/text";

/** "Felt fine" cannot sit beside a problem on the same wheel. */
const symptomsSchema = rideSymptomsSchema.superRefine((s, ctx) => {
  for (const wheel of ["front", "rear"] as const) {
    if (s[wheel].includes("fine") && s[wheel].length > 1) {
      ctx.addIssue({ code: "custom", message: "“Felt fine” cannot go together with a problem.", path: [wheel] });
    }
  }
});

export const rideLogSchema = z.strictObject({
  setupId: z.uuid({ error: "Choose one of your setups." }),
  riddenOn: z.iso.date({ error: "Enter the date as YYYY-MM-DD." }),
  parkSlug: todayRequestSchema.shape.parkSlug,
  trailIds: todayRequestSchema.shape.trailIds,
  frontKpa: boundedNumber("Front pressure you ran", 20, 1100, "kPa"),
  rearKpa: boundedNumber("Rear pressure you ran", 20, 1100, "kPa"),
  symptoms: symptomsSchema,
  /** The ground it was ridden on; becomes the baseline's reference if the setup has none yet. */
  surfaces: surfaceList.optional(),
  note: z.string({ error: "The note must be text." }).trim().max(1000, { error: "Keep the note under 1000 characters." }).superRefine(noteCheck("The note")).optional(),
});

export type RideLogInput = z.infer<typeof rideLogSchema>;
export type RideLogInputRaw = z.input<typeof rideLogSchema>;
