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

const elevation = (label: string) =>
  z.coerce.number({ message: `Enter the ${label} in metres.` }).int(`Round the ${label} to whole metres.`).min(-450, `The ${label} is below any land.`).max(9000, `The ${label} is above any summit.`);

const optionalText = <T extends z.ZodType<string>>(schema: T) =>
  z.preprocess((v) => (typeof v === "string" && v.trim() === "" ? null : v), schema.nullable().optional());

export const parkFieldShape = {
  name: z.string().trim().min(2, "Give the park a name.").max(100, "Use at most 100 characters.").superRefine(nameCheck("The name")),
  slug: z.string().trim().regex(SLUG_PATTERN, "Use 3 to 60 lower-case letters, digits and hyphens."),
  timeZone: z.string().trim().refine(isIanaZone, "Choose an IANA time zone, such as Europe/Zurich or America/Denver."),
  location: z
    .object({
      lon: z.coerce.number({ message: "Enter the longitude." }).min(-180, "Longitude runs from -180 to 180.").max(180, "Longitude runs from -180 to 180."),
      lat: z.coerce.number({ message: "Enter the latitude." }).min(-90, "Latitude runs from -90 to 90.").max(90, "Latitude runs from -90 to 90."),
    })
    .strict(),
  baseElevationM: elevation("base elevation"),
  summitElevationM: elevation("summit elevation"),
  contactEmail: optionalText(emailSchema),
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
