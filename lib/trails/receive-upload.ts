import "server-only";
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { readFormEntries, refuseDeclaredOver, type FormEntry } from "@/lib/server/api/body";
import { AppError } from "@/lib/shared/errors";
import { TRAIL_LIMITS } from "@/lib/trails/pure";
import { formatFromName } from "@/lib/trails/pure/file-type";
import { trailUploadFieldsSchema, type TrailUploadFields } from "@/lib/trails/pure/schemas";
import type { UploadedFile } from "./save-upload";
import { claimUploadSlot, type UploadPurpose } from "./upload-quota";

/** Room for the multipart boundaries and the metadata fields beside the file. */
export const MULTIPART_MARGIN_BYTES = 64 * 1024;
const MAX_BODY_BYTES = TRAIL_LIMITS.maxFileBytes + MULTIPART_MARGIN_BYTES;
const MEGABYTE = 1024 * 1024;

const tooLarge = () =>
  new AppError(413, `The upload is larger than the ${TRAIL_LIMITS.maxFileBytes / MEGABYTE} MB limit for a trail file. Thin the recording and upload it again.`, "file");

const FORM_FIELDS = new Set(["file", "name", "difficulty", "kind", "direction"]);

/** Only the fields we read, each once: an extra field (say "parkId") is refused, never silently dropped. */
function refuseUnexpectedFields(entries: FormEntry[]) {
  const seen = new Set<string>();
  for (const { field: key } of entries) {
    if (!FORM_FIELDS.has(key)) throw new AppError(400, `The upload form has no field "${key.slice(0, 40)}".`, key.slice(0, 40));
    if (seen.has(key)) throw new AppError(400, `The field ${key} was sent twice.`, key);
    seen.add(key);
  }
}

/**
 * The checks that cost nothing, in order: who is asking (401/403), multipart at all (415), the
 * declared size before a byte is read (413), then the hourly quota (429). Then the form is parsed
 * as it arrives, within the limit, and the file's name and type are checked (415) before any parsing.
 */
export async function receiveTrailUpload(request: Request, actor: Actor | null, parkId: string, purpose: UploadPurpose): Promise<{ file: UploadedFile; fields: TrailUploadFields }> {
  authorize(actor, "trail:write", { parkId });
  const type = request.headers.get("content-type") ?? "";
  if (!type.toLowerCase().startsWith("multipart/form-data")) {
    throw new AppError(415, "Send the trail as multipart/form-data, with the file in a field named \"file\".", "file");
  }
  refuseDeclaredOver(request, MAX_BODY_BYTES, tooLarge);
  await claimUploadSlot(actor, parkId, purpose);

  const entries = await readFormEntries(request, MAX_BODY_BYTES, tooLarge, () => new AppError(400, "The upload could not be read as a form. Choose the file again and retry.", "file"));
  refuseUnexpectedFields(entries);
  const entry = (name: string) => entries.find((e) => e.field === name);
  const sent = entry("file");
  const file = sent && "file" in sent ? sent.file : null;
  if (!file || (file.bytes.length === 0 && file.name === "")) throw new AppError(400, "Choose a GPX or GeoJSON file to upload.", "file");
  if (file.bytes.length > TRAIL_LIMITS.maxFileBytes) throw tooLarge();
  formatFromName(file.name, file.type);

  const text = (name: string) => {
    const value = entry(name);
    return value && "value" in value ? value.value : undefined;
  };
  const fields = trailUploadFieldsSchema.parse({ name: text("name"), difficulty: text("difficulty"), kind: text("kind"), direction: text("direction") });
  return { file: { bytes: file.bytes, filename: file.name, contentType: file.type || undefined }, fields };
}
