import { describe, expect, it } from "vitest";
import { readFormEntries } from "@/lib/server/api/body";
import { AppError } from "@/lib/shared/errors";

// multipart/form-data as RFC 7578 defines it: every part names its field in Content-Disposition
// (§4.2), a file part carries a filename (§4.2), parts are separated by the boundary (§4.1).
const BOUNDARY = "loamcast-test-boundary";
const part = (disposition: string, value: string, type?: string) =>
  `--${BOUNDARY}\r\nContent-Disposition: form-data; ${disposition}${type ? `\r\nContent-Type: ${type}` : ""}\r\n\r\n${value}\r\n`;
const end = `--${BOUNDARY}--\r\n`;
const request = (body: string | null, type = `multipart/form-data; boundary=${BOUNDARY}`) =>
  new Request("http://localhost/", { method: "POST", body, headers: { "content-type": type }, duplex: "half" } as RequestInit);

const tooLarge = () => new AppError(413, "too large");
const unreadable = () => new AppError(400, "unreadable");
const read = (r: Request, maxBytes = 1000) => readFormEntries(r, maxBytes, tooLarge, unreadable);
const refusal = async (r: Request, maxBytes?: number) => {
  try {
    await read(r, maxBytes);
  } catch (error) {
    return (error as AppError).status;
  }
  return "read";
};

describe("readFormEntries (a multipart form parsed as it arrives)", () => {
  it("gives fields and files in the order sent, with each file's name, type and bytes", async () => {
    const body = part('name="file"; filename="../tracks/Lower loop.gpx"', "<gpx/>", "application/gpx+xml") + part('name="name"', "Lower loop") + end;
    const entries = await read(request(body));
    expect(entries).toEqual([
      { field: "file", file: { name: "../tracks/Lower loop.gpx", type: "application/gpx+xml", bytes: Buffer.from("<gpx/>") } },
      { field: "name", value: "Lower loop" },
    ]);
  });

  it("reads a part without a file name as a text field, as Request.formData() does", async () => {
    const entries = await read(request(part('name="file"', "abc", "application/octet-stream") + end));
    expect(entries).toEqual([{ field: "file", value: "abc" }]);
    const form = await new Response(part('name="file"', "abc", "application/octet-stream") + end, { headers: { "content-type": `multipart/form-data; boundary=${BOUNDARY}` } }).formData();
    expect(form.get("file")).toBe("abc");
  });

  it("keeps a field sent twice twice (the caller refuses it)", async () => {
    const entries = await read(request(part('name="name"', "a") + part('name="name"', "b") + end));
    expect(entries.map((e) => e.field)).toEqual(["name", "name"]);
  });

  it("stops at the byte limit while reading (413)", async () => {
    expect(await refusal(request(part('name="file"; filename="a.gpx"', "x".repeat(2000)) + end))).toBe(413);
  });

  it.each([
    ["a part without a name (RFC 7578 §4.2)", part('filename="a.gpx"', "<gpx/>") + end],
    ["a body cut before its closing boundary", part('name="file"; filename="a.gpx"', "<gpx/>")],
    ["text that is not a form", "hello"],
    ["no body at all", null],
  ])("refuses %s as unreadable (400)", async (_, body) => {
    expect(await refusal(request(body))).toBe(400);
  });

  it("refuses a multipart type without a boundary as unreadable (400)", async () => {
    expect(await refusal(request("x", "multipart/form-data"))).toBe(400);
  });
});
