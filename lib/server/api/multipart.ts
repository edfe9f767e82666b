import "server-only";
import { AppError } from "@/lib/shared/errors";

export type MultipartBody = { fields: Record<string, string>; files: { field: string; name: string; bytes: Buffer }[] };

/** Reads at most `maxBytes` of the body, counting real bytes (a Content-Length can lie or be absent). */
async function readLimited(request: Request, maxBytes: number): Promise<Buffer> {
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > maxBytes) throw new AppError(413, `The upload is larger than ${Math.floor(maxBytes / 1024 / 1024)} MB in total.`);
  if (!request.body) return Buffer.alloc(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.length;
    if (total > maxBytes) {
      await reader.cancel();
      throw new AppError(413, `The upload is larger than ${Math.floor(maxBytes / 1024 / 1024)} MB in total.`);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}

/** A multipart/form-data body: text fields by name, files with their field name and bytes. */
export async function readMultipart(request: Request, maxBytes: number): Promise<MultipartBody> {
  const type = request.headers.get("content-type") ?? "";
  if (!type.startsWith("multipart/form-data")) throw new AppError(415, "Send the form as multipart/form-data.");
  const bytes = await readLimited(request, maxBytes);
  let form: FormData;
  try {
    form = await new Response(new Uint8Array(bytes), { headers: { "content-type": type } }).formData();
  } catch {
    throw new AppError(400, "The form could not be read.");
  }
  // No prototype: a field named "__proto__" or "constructor" is just an unknown field, refused by the schema.
  const fields: Record<string, string> = Object.create(null);
  const files: MultipartBody["files"] = [];
  for (const [field, value] of form.entries()) {
    if (typeof value === "string") {
      if (Object.hasOwn(fields, field)) throw new AppError(400, `The field ${field} was sent twice.`, field);
      fields[field] = value;
    } else if (value.size > 0 || value.name) {
      files.push({ field, name: value.name, bytes: Buffer.from(await value.arrayBuffer()) });
    }
  }
  return { fields, files };
}

/** A hazard form: its text fields, and files only under "photos". */
export async function readHazardForm(request: Request, maxBytes: number) {
  const { fields, files } = await readMultipart(request, maxBytes);
  const stray = files.find((f) => f.field !== "photos");
  if (stray) throw new AppError(400, `Send photos in the field "photos", not "${stray.field}".`, stray.field);
  return { fields, photos: files.map(({ name, bytes }) => ({ name, bytes })) };
}
