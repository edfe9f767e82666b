import { readFileSync } from "node:fs";
import { crc32, deflateSync } from "node:zlib";
import sharp from "sharp";
import type { HostileCase } from "./hostile-input-types";

/**
 * Hostile files: trail uploads (admin, POST /api/parks/harrow-ridge/trails) and hazard photos
 * (the park's ranger, POST /api/parks/harrow-ridge/hazards). Corpus files are the ones the
 * parser's unit tests use (tests/fixtures/trails/manifest.json); photos are made here.
 */
const corpus = (file: string) => readFileSync(`tests/fixtures/trails/${file}`);
const GPX = "application/gpx+xml";
const GEOJSON = "application/geo+json";
const upload = (name: string, buffer: Buffer, mimeType = GPX, fields: Record<string, string> = {}) => () => ({ ...fields, file: { name, mimeType, buffer } });
const TRAILS = () => "/api/parks/harrow-ridge/trails";
const HAZARDS = () => "/api/parks/harrow-ridge/hazards";
const LAYER = (layer: string) => () => `/api/parks/harrow-ridge/layers/${layer}`;
const lineFeature = { type: "Feature", properties: {}, geometry: { type: "LineString", coordinates: [[-121.94, 47.3], [-121.93, 47.31]] } };
const collection = (...features: unknown[]) => Buffer.from(JSON.stringify({ type: "FeatureCollection", features }));

/** A PNG whose header claims 50,000 × 50,000 pixels (2.5 gigapixels), with one row of data: refused before decoding. */
function pngClaimingHugeCanvas(): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type, "ascii"), data]);
    const length = Buffer.alloc(4);
    length.writeUInt32BE(data.length);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(body));
    return Buffer.concat([length, body, crc]);
  };
  const header = Buffer.alloc(13);
  header.writeUInt32BE(50_000, 0);
  header.writeUInt32BE(50_000, 4);
  header.set([8, 0, 0, 0, 0], 8); // 8-bit greyscale
  return Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), chunk("IHDR", header), chunk("IDAT", deflateSync(Buffer.alloc(50_001))), chunk("IEND", Buffer.alloc(0))]);
}

export const SCRIPT_PAYLOAD = "<script>alert(document.cookie)</script>";

/** A real JPEG that is also an HTML page: a comment segment and trailing bytes carry a script. */
export async function polyglotJpeg(): Promise<Buffer> {
  const jpeg = await sharp({ create: { width: 64, height: 48, channels: 3, background: "#557733" } }).jpeg().toBuffer();
  const comment = Buffer.from(`<html><body>${SCRIPT_PAYLOAD}`);
  const com = Buffer.concat([Buffer.from([0xff, 0xfe, (comment.length + 2) >> 8, (comment.length + 2) & 0xff]), comment]);
  return Buffer.concat([jpeg.subarray(0, 2), com, jpeg.subarray(2), Buffer.from(`${SCRIPT_PAYLOAD}</body></html>`)]);
}

const hazardFields = { kind: "other", note: "Hostile photo check", lon: "-121.94", lat: "47.3" };
const photo = (name: string, buffer: Buffer, mimeType: string, field = "photos") => () => ({ ...hazardFields, [field]: { name, mimeType, buffer } });
const photos = (count: number, buffer: Buffer) => async () => {
  const form = new FormData();
  for (const [k, v] of Object.entries(hazardFields)) form.append(k, v);
  for (let i = 0; i < count; i++) form.append("photos", new Blob([new Uint8Array(buffer)], { type: "image/jpeg" }), `photo-${i}.jpg`);
  return form;
};
const smallJpeg = () => sharp({ create: { width: 32, height: 32, channels: 3, background: "#335577" } }).jpeg().toBuffer();

export async function fileCases(): Promise<HostileCase[]> {
  const jpeg = await smallJpeg();
  return [
    // Trail files.
    { name: "a trail file over 20 MB", as: "admin", method: "POST", path: TRAILS, multipart: upload("huge.gpx", Buffer.alloc(20 * 1024 * 1024 + 64 * 1024 + 1, 0x20)), expect: 413 },
    { name: "KML by name", as: "admin", method: "POST", path: TRAILS, multipart: upload("track.kml", corpus("track.kml"), "application/vnd.google-earth.kml+xml"), expect: 415 },
    { name: "a ZIP (KMZ) renamed .gpx", as: "admin", method: "POST", path: TRAILS, multipart: upload("track.gpx", corpus("kmz-renamed.gpx")), expect: 415 },
    { name: "an HTML page renamed .gpx", as: "admin", method: "POST", path: TRAILS, multipart: upload("page.gpx", corpus("web-page.gpx")), expect: 415 },
    { name: "a GPX sent as image/png", as: "admin", method: "POST", path: TRAILS, multipart: upload("line.gpx", corpus("sent-as-image.gpx"), "image/png"), expect: 415 },
    { name: "billion laughs (DOCTYPE with nested entities)", as: "admin", method: "POST", path: TRAILS, multipart: upload("laughs.gpx", corpus("billion-laughs.gpx")), expect: 422 },
    { name: "an external entity reading a local file", as: "admin", method: "POST", path: TRAILS, multipart: upload("xxe.gpx", corpus("external-entity.gpx")), expect: 422 },
    { name: "a GeoJSON polygon instead of a line", as: "admin", method: "POST", path: TRAILS, multipart: upload("area.geojson", corpus("polygon.geojson"), GEOJSON), expect: 422 },
    { name: "swapped coordinates (latitude first)", as: "admin", method: "POST", path: TRAILS, multipart: upload("swapped.geojson", corpus("swapped-out-of-range.geojson"), GEOJSON), expect: 422 },
    { name: "NaN latitude", as: "admin", method: "POST", path: TRAILS, multipart: upload("nan.gpx", corpus("nan-latitude.gpx")), expect: 422 },
    { name: "a coordinate that overflows to Infinity (1e999)", as: "admin", method: "POST", path: TRAILS, multipart: upload("overflow.geojson", corpus("overflow-number.geojson"), GEOJSON), expect: 422 },
    { name: "an empty file", as: "admin", method: "POST", path: TRAILS, multipart: upload("empty.gpx", Buffer.alloc(0)), expect: 422 },
    { name: "a path-traversal file name without an extension", as: "admin", method: "POST", path: TRAILS, multipart: upload("../../etc/passwd", corpus("good-track.gpx")), expect: 415 },
    { name: "an extra form field (parkId) beside the file", as: "admin", method: "POST", path: TRAILS, multipart: upload("line.gpx", corpus("good-track.gpx"), GPX, { parkId: "00000000-0000-4000-8000-000000000000" }), expect: 400, field: "parkId" },
    { name: "CR/LF and a header in the trail name", as: "admin", method: "POST", path: TRAILS, multipart: upload("line.gpx", corpus("good-track.gpx"), GPX, { name: "Lower Loop\r\nBcc: everyone@evil.example" }), expect: 400, field: "name" },
    { name: "a right-to-left override in the trail name", as: "admin", method: "POST", path: TRAILS, multipart: upload("line.gpx", corpus("good-track.gpx"), GPX, { name: "Loop \u202Expg.exe" }), expect: 400, field: "name" },

    // Hazard photos.
    { name: "a text file renamed .jpg", as: "parkRanger", method: "POST", path: HAZARDS, multipart: photo("photo.jpg", Buffer.from("just some text, not a photo\n"), "image/jpeg"), expect: 415, field: "photos" },
    { name: "an SVG with a script", as: "parkRanger", method: "POST", path: HAZARDS, multipart: photo("tree.svg", Buffer.from(`<svg xmlns="http://www.w3.org/2000/svg">${SCRIPT_PAYLOAD}</svg>`), "image/svg+xml"), expect: 415, field: "photos" },
    { name: "an SVG renamed .jpg and sent as image/jpeg", as: "parkRanger", method: "POST", path: HAZARDS, multipart: photo("tree.jpg", Buffer.from(`<svg xmlns="http://www.w3.org/2000/svg">${SCRIPT_PAYLOAD}</svg>`), "image/jpeg"), expect: 415, field: "photos" },
    { name: "a GIF", as: "parkRanger", method: "POST", path: HAZARDS, multipart: photo("tree.gif", Buffer.from("GIF89a\x01\x00\x01\x00\x00\x00\x00;", "latin1"), "image/gif"), expect: 415, field: "photos" },
    { name: "a photo over 8 MB", as: "parkRanger", method: "POST", path: HAZARDS, multipart: photo("big.jpg", Buffer.concat([jpeg, Buffer.alloc(8 * 1024 * 1024)]), "image/jpeg"), expect: 413, field: "photos" },
    { name: "a PNG claiming 2.5 gigapixels", as: "parkRanger", method: "POST", path: HAZARDS, multipart: photo("bomb.png", pngClaimingHugeCanvas(), "image/png"), expect: 413, field: "photos" },
    { name: "five photos (four at most)", as: "parkRanger", method: "POST", path: HAZARDS, multipart: photos(5, jpeg), expect: 422, field: "photos" },
    { name: "a photo in a field other than photos", as: "parkRanger", method: "POST", path: HAZARDS, multipart: photo("tree.jpg", jpeg, "image/jpeg", "file"), expect: 400, field: "file" },

    // Ground layers (the park's manager, PUT /api/parks/harrow-ridge/layers/…): a refusal leaves the layer as it was.
    { name: "a ground layer over 5 MB", as: "manager", method: "PUT", path: LAYER("boundary"), multipart: upload("huge.geojson", Buffer.alloc(5 * 1024 * 1024 + 64 * 1024 + 1, 0x20), GEOJSON), expect: 413 },
    { name: "a GPX as a ground layer", as: "manager", method: "PUT", path: LAYER("lifts"), multipart: upload("line.gpx", corpus("good-track.gpx")), expect: 415, field: "file" },
    { name: "a line in the boundary layer", as: "manager", method: "PUT", path: LAYER("boundary"), multipart: upload("line.geojson", collection(lineFeature)), expect: 422, field: "file" },
    { name: "a landmark 146 km away", as: "manager", method: "PUT", path: LAYER("landmarks"), multipart: upload("far.geojson", collection({ type: "Feature", properties: { name: "Far away" }, geometry: { type: "Point", coordinates: [-120, 47.3] } })), expect: 422, field: "file" },
    { name: "a ground layer with a crs member", as: "manager", method: "PUT", path: LAYER("roads"), multipart: upload("crs.geojson", Buffer.from(JSON.stringify({ type: "FeatureCollection", crs: { type: "name", properties: { name: "EPSG:3857" } }, features: [lineFeature] })), GEOJSON), expect: 422, field: "file" },
    { name: "a landmark named with a right-to-left override", as: "manager", method: "PUT", path: LAYER("landmarks"), multipart: upload("rtl.geojson", collection({ type: "Feature", properties: { name: "Lodge \u202Eexe.gpj" }, geometry: { type: "Point", coordinates: [-121.94, 47.3] } })), expect: 422, field: "file" },
    { name: "an extra form field beside the layer file", as: "manager", method: "PUT", path: LAYER("roads"), multipart: upload("roads.geojson", collection(lineFeature), GEOJSON, { parkId: "00000000-0000-4000-8000-000000000000" }), expect: 400, field: "parkId" },
  ];
}
