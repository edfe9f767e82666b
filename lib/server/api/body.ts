import "server-only";
import busboy from "busboy";
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

export type FormEntry = { field: string; value: string } | { field: string; file: { name: string; type: string; bytes: Buffer } };

/**
 * A multipart/form-data body parsed as it arrives (busboy), never more than `maxBytes`: its entries
 * in order, each file's bytes copied once, into one buffer (the whole body in one buffer, then
 * `Request.formData()`'s Blob, then read back out, copied a 14 MB trail file three times). As with
 * `Request.formData()`, a part without a file name is a text field, file names keep their path, and
 * a body that is not a well-formed form is refused (`unreadable`).
 */
export async function readFormEntries(request: Request, maxBytes: number, tooLarge: () => AppError, unreadable: () => AppError): Promise<FormEntry[]> {
  let parser: busboy.Busboy;
  try {
    parser = busboy({ headers: { "content-type": request.headers.get("content-type") ?? "" }, preservePath: true, defParamCharset: "utf8", limits: { fieldSize: maxBytes } });
  } catch {
    throw unreadable(); // no boundary, or not multipart at all
  }
  const entries: FormEntry[] = [];
  let failed = false;
  const parsed = new Promise<void>((resolve, reject) => {
    // A part without a name is malformed, as Request.formData() holds too.
    const nameless = (field: string | undefined) => {
      if (typeof field === "string") return false;
      parser.destroy(new Error("a form part without a name"));
      return true;
    };
    parser.on("field", (field, value) => {
      if (!nameless(field)) entries.push({ field, value });
    });
    parser.on("file", (field, stream, { filename, mimeType }) => {
      // The parser's own error (below) tells what went wrong; an unheard one here would end the process.
      stream.on("error", () => undefined);
      if (nameless(field)) return void stream.resume();
      const chunks: Buffer[] = [];
      const at = entries.push({ field, value: "" }) - 1;
      stream.on("data", (chunk: Buffer) => chunks.push(chunk));
      stream.on("end", () => {
        const bytes = Buffer.concat(chunks);
        entries[at] = filename === undefined ? { field, value: bytes.toString("utf8") } : { field, file: { name: filename, type: mimeType, bytes } };
      });
    });
    parser.on("close", resolve);
    parser.on("error", (error) => {
      failed = true;
      reject(error);
    });
  });
  parsed.catch(() => undefined); // awaited below; a parse error while still feeding is not unhandled

  if (request.body) {
    const reader = request.body.getReader();
    let total = 0;
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      total += value.byteLength;
      if (total > maxBytes) {
        await reader.cancel();
        parser.destroy();
        throw tooLarge();
      }
      if (failed) {
        await reader.cancel();
        break;
      }
      parser.write(value);
    }
  }
  if (!failed) parser.end();
  try {
    await parsed;
  } catch {
    throw unreadable();
  }
  return entries;
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
