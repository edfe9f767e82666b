import { z } from "zod";
import { emailSchema } from "@/lib/accounts/pure/schemas";
import { nameCheck } from "@/lib/shared/text";

/**
 * A park's settings, for the create form, `POST /api/parks`, the settings form and
 * `PATCH /api/parks/{slug}`. The same schemas run in the browser and on the server.
 */
export const SLUG_PATTERN = /^[a-z0-9-]{3,60}$/;

/** IANA zone names as the runtime knows them (ECMA-402 `Intl.supportedValuesOf`), and UTC, which some runtimes leave out of that list. */
export const TIME_ZONES: readonly string[] = [...Intl.supportedValuesOf("timeZone"), "UTC"];
const isIanaZone = (zone: string) => TIME_ZONES.includes(zone);

/** A number sent as JSON or typed in a form; blank is missing, never zero. */
const numberOf = (number: z.ZodNumber) => z.preprocess((v) => (typeof v === "string" ? (v.trim() === "" ? undefined : Number(v)) : v), number);

const elevation = (label: string) =>
  numberOf(z.number({ message: `Enter the ${label} in metres.` }).int(`Round the ${label} to whole metres.`).min(-450, `The ${label} is below any land.`).max(9000, `The ${label} is above any summit.`));

const optionalText = <T extends z.ZodType<string>>(schema: T) =>
  z.preprocess((v) => (typeof v === "string" && v.trim() === "" ? null : v), schema.nullable().optional());

export const parkFieldShape = {
  name: z.string().trim().min(2, "Give the park a name.").max(100, "Use at most 100 characters.").superRefine(nameCheck("The name")),
  slug: z.string().trim().regex(SLUG_PATTERN, "Use 3 to 60 lower-case letters, digits and hyphens."),
  timeZone: z.string().trim().refine(isIanaZone, "Choose an IANA time zone, such as Europe/Zurich or America/Denver."),
  location: z
    .object({
      lon: numberOf(z.number({ message: "Enter the longitude in degrees." }).min(-180, "Longitude runs from -180 to 180.").max(180, "Longitude runs from -180 to 180.")),
      lat: numberOf(z.number({ message: "Enter the latitude in degrees." }).min(-90, "Latitude runs from -90 to 90.").max(90, "Latitude runs from -90 to 90.")),
    })
    .strict(),
  baseElevationM: elevation("base elevation"),
  summitElevationM: elevation("summit elevation"),
  contactEmail: optionalText(emailSchema),
  /** Rain in 24 h at which the morning check shows a caution (never a status change). */
  rainThresholdMm: numberOf(
    z.number({ message: "Enter the rain caution level in millimetres." }).min(0.5, "Use at least 0.5 mm: weather services report to 0.1 mm.").max(500, "Use at most 500 mm."),
  ).optional(),
  websiteUrl: optionalText(
    z.string().trim().max(300, "Use at most 300 characters.").url("Enter a full address starting with https://.").refine((u) => /^https?:\/\//i.test(u), "Enter a full address starting with https://."),
  ),
};

const summitAboveBase = (p: { baseElevationM?: number; summitElevationM?: number }) =>
  p.baseElevationM === undefined || p.summitElevationM === undefined || p.summitElevationM > p.baseElevationM;
const SUMMIT_MESSAGE = { message: "The summit must be higher than the base.", path: ["summitElevationM"] };

/** Creating a park: every setting, and the first manager's address (the invitation goes out in the same step). */
export const parkCreateSchema = z
  .object({ ...parkFieldShape, managerEmail: emailSchema })
  .strict()
  .refine(summitAboveBase, SUMMIT_MESSAGE);
export type ParkCreateInput = z.infer<typeof parkCreateSchema>;

/** Changing settings: any of them, with the lockVersion that was read. */
export const parkPatchSchema = z
  .object({
    name: parkFieldShape.name.optional(),
    slug: parkFieldShape.slug.optional(),
    timeZone: parkFieldShape.timeZone.optional(),
    location: parkFieldShape.location.optional(),
    baseElevationM: parkFieldShape.baseElevationM.optional(),
    summitElevationM: parkFieldShape.summitElevationM.optional(),
    contactEmail: parkFieldShape.contactEmail,
    websiteUrl: parkFieldShape.websiteUrl,
    rainThresholdMm: parkFieldShape.rainThresholdMm,
    lockVersion: z.number({ message: "Send the lockVersion you read." }).int().min(0),
  })
  .strict()
  .refine(summitAboveBase, SUMMIT_MESSAGE);
export type ParkPatchInput = z.infer<typeof parkPatchSchema>;

/** Parses settings; a refusal names its field ("location.lon", "timeZone"…) for the form and the API's 422. */
export function parseParkFields<T>(schema: z.ZodType<T>, input: unknown): { ok: true; data: T } | { ok: false; field?: string; message: string } {
  const result = schema.safeParse(input);
  if (result.success) return { ok: true, data: result.data };
  const issue = result.error.issues[0];
  return { ok: false, field: issue.path.map(String).join(".") || undefined, message: issue.message };
}

/** What the park forms hold: text as typed, so a refused form keeps every character. */
export type ParkFormValues = {
  name: string;
  slug: string;
  timeZone: string;
  lon: string;
  lat: string;
  baseElevationM: string;
  summitElevationM: string;
  contactEmail: string;
  websiteUrl: string;
};

/** The API body for the typed values: numbers stay text here, zod coerces and checks them. */
export const parkBodyOf = (v: ParkFormValues) => ({
  name: v.name,
  slug: v.slug,
  timeZone: v.timeZone,
  location: { lon: v.lon.trim(), lat: v.lat.trim() },
  baseElevationM: v.baseElevationM.trim(),
  summitElevationM: v.summitElevationM.trim(),
  contactEmail: v.contactEmail,
  websiteUrl: v.websiteUrl,
});

/** A slug suggested from the park's name: "Pine & Ash Ridge" → "pine-ash-ridge". */
export const slugFromName = (name: string) =>
  name.normalize("NFKD").replace(/[\u0300-\u036f]/g, "").toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-+|-+$/g, "").slice(0, 60);
