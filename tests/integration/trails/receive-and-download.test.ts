import { afterAll, describe, expect, it } from "vitest";
import { trailDownload } from "@/lib/trails/download";
import { AppError } from "@/lib/shared/errors";
import { TRAIL_LIMITS } from "@/lib/trails/pure";
import { previewTrailUpload } from "@/lib/trails/preview";
import { MULTIPART_MARGIN_BYTES, receiveTrailUpload } from "@/lib/trails/receive-upload";
import { createTrailFromUpload, replaceTrailLine } from "@/lib/trails/save-upload";
import { claimUploadSlot, UPLOAD_ATTEMPT_ACTION, UPLOADS_PER_HOUR } from "@/lib/trails/upload-quota";
import { AuditEvent, Trail, sequelize } from "@/models";
import { corpusFile, personIn, statusOf, trailPark } from "./fixtures";

afterAll(() => sequelize.close());

function multipart(file: { bytes: Buffer; filename: string; contentType?: string } | null, fields: Record<string, string> = {}) {
  const form = new FormData();
  if (file) form.set("file", new File([new Uint8Array(file.bytes)], file.filename, { type: file.contentType ?? "" }));
  for (const [key, value] of Object.entries(fields)) form.set(key, value);
  return new Request("http://localhost/api/parks/x/trails", { method: "POST", body: form });
}

describe("receiving a multipart upload", () => {
  it("returns the file's bytes and the metadata fields, blank fields as absent", async () => {
    const park = await trailPark();
    const ranger = await personIn(park.id, "ranger");
    const file = corpusFile("good-track.gpx");
    const received = await receiveTrailUpload(multipart(file, { name: "  Lower Loop ", difficulty: "easy", kind: "" }), ranger, park.id, "create");
    expect(Buffer.compare(received.file.bytes, file.bytes)).toBe(0);
    expect(received.file.filename).toBe("good-track.gpx");
    expect(received.fields).toEqual({ name: "Lower Loop", difficulty: "easy" });
  });

  it("refuses, before reading the body: anonymous 401, a rider 403, not multipart 415, a declared size over the limit 413", async () => {
    const park = await trailPark();
    const ranger = await personIn(park.id, "ranger");
    expect(await statusOf(receiveTrailUpload(multipart(corpusFile("good-track.gpx")), null, park.id, "create"))).toBe(401);
    expect(await statusOf(receiveTrailUpload(multipart(corpusFile("good-track.gpx")), await personIn(null), park.id, "create"))).toBe(403);
    const json = new Request("http://localhost/", { method: "POST", headers: { "content-type": "application/json" }, body: "{}" });
    expect(await statusOf(receiveTrailUpload(json, ranger, park.id, "create"))).toBe(415);
    const huge = new Request("http://localhost/", {
      method: "POST",
      headers: { "content-type": "multipart/form-data; boundary=x", "content-length": String(TRAIL_LIMITS.maxFileBytes + MULTIPART_MARGIN_BYTES + 1) },
      body: "--x--",
    });
    const error = (await receiveTrailUpload(huge, ranger, park.id, "create").catch((e) => e)) as AppError;
    expect([error.status, error.field]).toEqual([413, "file"]);
  });

  it("stops reading a body that grows past the limit even without a Content-Length", async () => {
    const park = await trailPark();
    const ranger = await personIn(park.id, "ranger");
    const chunk = new Uint8Array(1024 * 1024).fill(0x41);
    let sent = 0;
    const stream = new ReadableStream<Uint8Array>({
      pull(controller) {
        sent += chunk.byteLength;
        if (sent > TRAIL_LIMITS.maxFileBytes + 4 * chunk.byteLength) controller.close();
        else controller.enqueue(chunk);
      },
    });
    const request = new Request("http://localhost/", { method: "POST", headers: { "content-type": "multipart/form-data; boundary=x" }, body: stream, duplex: "half" } as RequestInit);
    expect(await statusOf(receiveTrailUpload(request, ranger, park.id, "create"))).toBe(413);
  });

  it("refuses a missing file (400) and a file that is not GPX or GeoJSON by name or type (415)", async () => {
    const park = await trailPark();
    const ranger = await personIn(park.id, "ranger");
    expect(await statusOf(receiveTrailUpload(multipart(null, { name: "x" }), ranger, park.id, "create"))).toBe(400);
    expect(await statusOf(receiveTrailUpload(multipart(corpusFile("track.kml")), ranger, park.id, "create"))).toBe(415);
    expect(await statusOf(receiveTrailUpload(multipart(corpusFile("sent-as-image.gpx", "image/png")), ranger, park.id, "create"))).toBe(415);
  });
});

describe("upload quota (ASVS v5.0.0 2.4.1)", () => {
  it(`allows ${UPLOADS_PER_HOUR} files per person per hour, then refuses with 429 and says when to retry`, async () => {
    const park = await trailPark();
    const ranger = await personIn(park.id, "ranger");
    const colleague = await personIn(park.id, "ranger");
    const start = new Date();
    for (let i = 0; i < UPLOADS_PER_HOUR; i++) await claimUploadSlot(ranger, park.id, "preview", new Date(start.getTime() + i * 1000));
    const error = (await claimUploadSlot(ranger, park.id, "create", new Date(start.getTime() + 120_000)).catch((e) => e)) as AppError;
    expect(error.status).toBe(429);
    expect(error.message).toMatch(/Try again in 58 minutes/);
    // Someone else is not held back, and the window slides: an hour after the first upload there is room again.
    await expect(claimUploadSlot(colleague, park.id, "create")).resolves.toBeUndefined();
    await expect(claimUploadSlot(ranger, park.id, "create", new Date(start.getTime() + 3_600_500))).resolves.toBeUndefined();
    expect(await AuditEvent.count({ where: { actorId: ranger.id, action: UPLOAD_ATTEMPT_ACTION } })).toBe(UPLOADS_PER_HOUR + 1);
  });
});

describe("preview", () => {
  it("computes the figures under their API names and stores nothing", async () => {
    const park = await trailPark();
    const ranger = await personIn(park.id, "ranger");
    const preview = previewTrailUpload(ranger, park, corpusFile("good-track.gpx"));
    expect(Object.keys(preview)).toEqual(expect.arrayContaining(["lengthM", "ascentM", "descentM", "avgGradePct", "maxGradePct", "minElevationM", "maxElevationM", "suggestedDifficulty"]));
    expect(preview).toMatchObject({ name: "Corpus Line", sourceFormat: "gpx", pointCount: 12, minElevationM: 878, maxElevationM: 900, descentM: 22 });
    expect(await Trail.count({ where: { parkId: park.id } })).toBe(0);
    expect(() => previewTrailUpload(null, park, corpusFile("good-track.gpx"))).toThrowError(AppError);
  });
});

describe("download", () => {
  it("returns the original bytes in their own format and a conversion in the other, with a safe file name", async () => {
    const park = await trailPark();
    const manager = await personIn(park.id, "manager");
    const file = corpusFile("good-track.gpx");
    const { trail } = await createTrailFromUpload(manager, park, file, { name: "Crête <du> Lièvre/../x" });
    const original = await trailDownload(trail.id, null, {});
    expect(original).toMatchObject({ contentType: "application/gpx+xml", filename: "crete-du-lievre-x-v1.gpx", original: true });
    expect(Buffer.compare(Buffer.from(original.body), file.bytes)).toBe(0);

    const converted = await trailDownload(trail.id, null, { format: "geojson" });
    expect(converted).toMatchObject({ contentType: "application/geo+json", filename: "crete-du-lievre-x-v1.geojson", original: false });
    const geojson = JSON.parse(String(converted.body));
    expect(geojson.type).toBe("FeatureCollection");
    expect(geojson.features[0].geometry.coordinates).toHaveLength(12);
    expect(geojson.features.filter((f: { geometry: { type: string } }) => f.geometry.type === "Point")).toHaveLength(2);

    await replaceTrailLine(manager, trail.id, corpusFile("good-linestring.geojson"));
    expect((await trailDownload(trail.id, null, {})).contentType).toBe("application/geo+json");
    const first = await trailDownload(trail.id, null, { version: 1 });
    expect(Buffer.compare(Buffer.from(first.body), file.bytes)).toBe(0);
    expect(await statusOf(trailDownload(trail.id, null, { version: 9 }))).toBe(404);
    expect(await statusOf(trailDownload("not-a-uuid", null, {}))).toBe(404);
  });
});
