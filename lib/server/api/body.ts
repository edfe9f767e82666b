import "server-only";
import { AppError } from "@/lib/shared/errors";

/**
 * Every request body is read here, and only here: never more than `maxBytes`, counted as the bytes
 * arrive (a Content-Length can lie or be absent), so an endless body costs at most the limit.
 */
export async function readBodyWithin(request: Request, maxBytes: number, tooLarge: () => AppError): Promise<Uint8Array<ArrayBuffer>> {
  if (!request.body) return new Uint8Array(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel();
      throw tooLarge();
    }
    chunks.push(value);
  }
  const body = new Uint8Array(total);
  let at = 0;
  for (const chunk of chunks) {
    body.set(chunk, at);
    at += chunk.byteLength;
  }
  return body;
}

/** Refuses a body whose declared Content-Length is already over the limit, before a byte is read. */
export function refuseDeclaredOver(request: Request, maxBytes: number, tooLarge: () => AppError) {
  const declared = Number(request.headers.get("content-length") ?? NaN);
  if (Number.isFinite(declared) && declared > maxBytes) throw tooLarge();
}

/** Bytes read as multipart/form-data; `unreadable` is what the sender is told when they are not a form. */
export async function formDataOf(bytes: Uint8Array<ArrayBuffer>, contentType: string, unreadable: string, field?: string): Promise<FormData> {
  try {
    return await new Response(bytes, { headers: { "content-type": contentType } }).formData();
  } catch {
    throw new AppError(400, unreadable, field);
  }
}

/** Reads a JSON body, refusing anything that is not JSON or too large. */
export async function readJson(request: Request, maxBytes = 1_000_000): Promise<unknown> {
  const type = request.headers.get("content-type") ?? "";
  if (!type.includes("application/json")) throw new AppError(415, "Send the body as application/json.");
  const tooLarge = () => new AppError(413, `The body is larger than ${maxBytes} bytes.`);
  refuseDeclaredOver(request, maxBytes, tooLarge);
  const text = new TextDecoder().decode(await readBodyWithin(request, maxBytes, tooLarge));
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new AppError(400, "The request body is not valid JSON.");
  }
  const where = pathOfNul(value);
  if (where !== null) throw new AppError(400, "Text may not contain the NUL character (\\u0000).", where || undefined);
  return value;
}

/**
 * Where a U+0000 hides in a parsed body (a key or a string), or null. PostgreSQL cannot store it
 * in text or jsonb, so it is refused here for every JSON route at once. Iterative: a deeply
 * nested body cannot exhaust the stack.
 */
function pathOfNul(root: unknown): string | null {
  const stack: { value: unknown; path: string }[] = [{ value: root, path: "" }];
  while (stack.length > 0) {
    const { value, path } = stack.pop()!;
    if (typeof value === "string") {
      if (value.includes("\u0000")) return path;
    } else if (value !== null && typeof value === "object") {
      for (const [key, child] of Object.entries(value)) {
        if (key.includes("\u0000")) return path;
        stack.push({ value: child, path: path ? `${path}.${key}` : key });
      }
    }
  }
  return null;
}

export type MultipartBody = { fields: Record<string, string>; files: { field: string; name: string; bytes: Buffer }[] };

/** A multipart/form-data body: text fields by name, files with their field name and bytes. */
export async function readMultipart(request: Request, maxBytes: number): Promise<MultipartBody> {
  const type = request.headers.get("content-type") ?? "";
  if (!type.startsWith("multipart/form-data")) throw new AppError(415, "Send the form as multipart/form-data.");
  const tooLarge = () => new AppError(413, `The upload is larger than ${Math.floor(maxBytes / 1024 / 1024)} MB in total.`);
  refuseDeclaredOver(request, maxBytes, tooLarge);
  const form = await formDataOf(await readBodyWithin(request, maxBytes, tooLarge), type, "The form could not be read.");
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
