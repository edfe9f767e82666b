/**
 * Trail reports, the morning check and the park-wide state: the shapes the API, the check
 * screen and the seeder all send. Strict objects: an unknown or misspelt key is refused.
 */
import { z } from "zod";
import { noteCheck } from "@/lib/shared/text";
import { FEATURE_STATES, PARK_STATES, STATUSES, SURFACES } from "@/lib/conditions/pure/vocabulary";

export { FEATURE_STATES, PARK_STATES, STATUSES, SURFACES };

// Control characters other than line breaks and tabs, and text-direction overrides, have no place in a note (lib/shared/text.ts).
const text = (label: string, max: number) =>
  z
    .string({ error: `${label} must be text.` })
    .trim()
    .max(max, { error: `${label}: use at most ${max} characters.` })
    .superRefine(noteCheck(label));

export const statusSchema = z.enum(STATUSES, { error: "Status must be open, caution or closed." });
export const surfaceSchema = z.enum(SURFACES, { error: `Surface must be one of: ${SURFACES.join(", ")}.` });

const featureState = <K extends keyof typeof FEATURE_STATES>(kind: K) =>
  z.enum(FEATURE_STATES[kind], { error: `${kind} must be one of: ${FEATURE_STATES[kind].join(", ")}.` }).optional();

export const featuresSchema = z
  .object({ berms: featureState("berms"), jumps: featureState("jumps"), wood: featureState("wood") })
  .strict();

const reportObject = z
  .object({
    status: statusSchema,
    reason: text("Reason", 200).optional().nullable(),
    surfaces: z
      .array(surfaceSchema)
      .max(SURFACES.length)
      .refine((list) => new Set(list).size === list.length, { error: "Name each surface only once." })
      .default([]),
    features: featuresSchema.default({}),
    note: text("Note", 1000).optional().nullable(),
  })
  .strict();

/** A reason is required for caution and closed, and only for them; empty text becomes null. */
function withReportRules<T extends z.ZodType<z.output<typeof reportObject>>>(schema: T) {
  return schema
    .superRefine((report, ctx) => {
      const hasReason = Boolean(report.reason);
      if (report.status !== "open" && !hasReason) {
        ctx.addIssue({ code: "custom", path: ["reason"], message: `Give a reason when a trail is ${report.status}.` });
      }
      if (report.status === "open" && hasReason) {
        ctx.addIssue({ code: "custom", path: ["reason"], message: "A reason is only for caution or closed; leave it empty when the trail is open." });
      }
    })
    .transform((report) => ({ ...report, reason: report.reason || null, note: report.note || null }));
}

/** One trail's inspection as staff send it: `{status, reason, surfaces, features, note}`. */
export const reportInputSchema = withReportRules(reportObject);

/** The revision the client started from: 0 (or absent) when no report existed for the day. */
export const baseRevisionSchema = z
  .number({ error: "baseRevision must be a whole number." })
  .int({ error: "baseRevision must be a whole number." })
  .min(0, { error: "baseRevision must be 0 or more." })
  .default(0);

/** POST /api/trails/{id}/reports: the report plus the revision the client started from. */
export const reportPostSchema = withReportRules(reportObject.extend({ baseRevision: baseRevisionSchema }));

const dateSchema = z.iso.date({ error: "Use a date like 2026-12-02." });

/** One trail in the morning check: either "unchanged" (keep the last values) or a report. */
export const checkEntrySchema = z
  .object({
    trailId: z.uuid({ error: "trailId must be a trail's id." }),
    baseRevision: baseRevisionSchema,
    unchanged: z.boolean().optional(),
    report: reportInputSchema.optional(),
  })
  .strict()
  .refine((entry) => Boolean(entry.unchanged) !== Boolean(entry.report), {
    error: "Send either unchanged: true or a report for each trail.",
    path: ["report"],
  });

export const morningCheckSchema = z
  .object({
    date: dateSchema.optional(),
    entries: z
      .array(checkEntrySchema)
      .min(1, { error: "Mark at least one trail before saving." })
      .max(500)
      .refine((list) => new Set(list.map((e) => e.trailId)).size === list.length, { error: "Each trail only once per check." }),
  })
  .strict();

/** POST /api/parks/{slug}/state. Times are ISO 8601 instants; no end means "until cleared". */
export const parkStateSchema = z
  .object({
    state: z.enum(PARK_STATES, { error: "State must be closed, delayed or advisory." }),
    message: text("Message", 300).min(1, { error: "Write the message riders will see." }),
    startsAt: z.iso.datetime({ offset: true, error: "startsAt must be a date and time." }).optional(),
    endsAt: z.iso.datetime({ offset: true, error: "endsAt must be a date and time." }).optional().nullable(),
  })
  .strict()
  .refine((s) => !s.endsAt || !s.startsAt || new Date(s.endsAt) > new Date(s.startsAt), {
    error: "The end must come after the start.",
    path: ["endsAt"],
  });

/** ?from=&to= for history and CSV: both optional, at most about a year apart. */
export const dateRangeSchema = z
  .object({ from: dateSchema.optional(), to: dateSchema.optional() })
  .refine((r) => !r.from || !r.to || r.from <= r.to, { error: "from must not be after to.", path: ["from"] });

export type { FeatureStates, ParkStateKind, ReportStatus, Surface } from "@/lib/conditions/pure/vocabulary";
export type ReportInput = z.infer<typeof reportInputSchema>;
export type ReportPost = z.infer<typeof reportPostSchema>;
export type CheckEntry = z.infer<typeof checkEntrySchema>;
export type MorningCheckInput = z.infer<typeof morningCheckSchema>;
export type ParkStateInput = z.infer<typeof parkStateSchema>;
