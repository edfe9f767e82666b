import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/shared/errors";
import { processTrailUpload, type ParseTrailInput } from "@/lib/trails/pure";

// Property-based checks (shared/notes/security.md, reliability practice): whatever arrives, the
// parser returns a trail or throws AppError (413, 415 or 422), never anything else; what it
// returns stays within bounds, and the computations after it do not fail either.
const PARK = { lon: -121.94, lat: 47.3 };
const filenames = fc.constantFrom("t.gpx", "t.geojson", "t.json", "T.GPX", "t.kml", "t");

function checkOutcome(input: ParseTrailInput): void {
  let result;
  try {
    result = processTrailUpload(input);
  } catch (error) {
    expect(error).toBeInstanceOf(AppError);
    expect([413, 415, 422]).toContain((error as AppError).status);
    return;
  }
  expect(result.parsed.segments.length).toBeGreaterThan(0);
  for (const segment of result.parsed.segments) {
    expect(segment.length).toBeGreaterThanOrEqual(2);
    for (const [lon, lat] of segment) {
      expect(Math.abs(lon)).toBeLessThanOrEqual(180);
      expect(Math.abs(lat)).toBeLessThanOrEqual(90);
    }
  }
  expect(Number.isFinite(result.stats.lengthM) && result.stats.lengthM > 0).toBe(true);
  if (result.stats.avgGradePct !== null) expect(result.stats.avgGradePct).toBeGreaterThanOrEqual(0);
}

const XML_PIECES = [
  '<?xml version="1.0"?>', '<gpx version="1.1" creator="p">', '<gpx version="1.0">', "</gpx>", "<trk>", "</trk>", "<trkseg>", "</trkseg>",
  '<trkpt lat="47.3" lon="-121.94">', '<trkpt lat="47.3001" lon="-121.94"/>', '<trkpt lat="', '" lon="', '">', "</trkpt>", "<ele>", "</ele>",
  "900", "abc", "-", "1e999", "NaN", "<name>", "</name>", "&amp;", "&", "&lt;", "<![CDATA[", "]]>", "<!--", "-->", "<!DOCTYPE gpx>",
  '<wpt lat="47.3" lon="-121.94"/>', "<rte>", '<rtept lat="47.3002" lon="-121.94"/>', "</rte>", "<a:b/>", "\u0000", "\uFFFD", " ", "\n", "<kml>", "<metadata>", "</metadata>",
];

const position = fc.tuple(fc.double({ min: -121.95, max: -121.93, noNaN: true }), fc.double({ min: 47.29, max: 47.31, noNaN: true }));
const wildNumber = fc.oneof(fc.double(), fc.integer(), fc.constant(null), fc.string({ maxLength: 4 }));
const geometry = fc.record({
  type: fc.constantFrom("LineString", "MultiLineString", "Point", "MultiPoint", "Polygon", "GeometryCollection", "Nope"),
  coordinates: fc.oneof(
    fc.array(position, { maxLength: 30 }),
    fc.array(fc.array(position, { maxLength: 10 }), { maxLength: 3 }),
    position,
    fc.array(fc.array(wildNumber, { maxLength: 4 }), { maxLength: 6 }),
    fc.jsonValue({ maxDepth: 4 }),
  ),
});
const geojsonish = fc.oneof(
  geometry,
  fc.record({ type: fc.constant("Feature"), properties: fc.option(fc.dictionary(fc.string(), fc.jsonValue({ maxDepth: 2 }))), geometry: fc.option(geometry) }),
  fc.record({ type: fc.constant("FeatureCollection"), features: fc.array(fc.record({ type: fc.constant("Feature"), properties: fc.constant({}), geometry }), { maxLength: 4 }) }),
);

describe("parseTrailFile never throws anything but AppError", () => {
  it("on arbitrary bytes", () => {
    fc.assert(fc.property(fc.uint8Array({ maxLength: 3000 }), filenames, (data, filename) => checkOutcome({ bytes: data, filename })), { numRuns: 300 });
  });

  it("on arbitrary JSON", () => {
    fc.assert(fc.property(fc.json(), fc.boolean(), (text, withPark) => checkOutcome({ bytes: Buffer.from(text), filename: "t.geojson", parkCenter: withPark ? PARK : undefined })), { numRuns: 300 });
  });

  it("on GeoJSON-shaped objects with wild coordinates", () => {
    fc.assert(fc.property(geojsonish, fc.boolean(), (value, withPark) => checkOutcome({ bytes: Buffer.from(JSON.stringify(value)), filename: "t.geojson", parkCenter: withPark ? PARK : undefined })), { numRuns: 400 });
  });

  it("on XML-ish strings built from GPX fragments", () => {
    const xmlish = fc.array(fc.oneof(fc.constantFrom(...XML_PIECES), fc.string({ maxLength: 6 })), { maxLength: 60 }).map((parts) => parts.join(""));
    fc.assert(fc.property(xmlish, fc.boolean(), (text, withPark) => checkOutcome({ bytes: Buffer.from(text), filename: "t.gpx", parkCenter: withPark ? PARK : undefined })), { numRuns: 500 });
  });

  it("on well-formed GPX tracks with random points near the park", () => {
    // A random walk from a point near the park: steps mostly under the 500 m limit, some over.
    const step = fc.tuple(fc.double({ min: -0.004, max: 0.004, noNaN: true }), fc.double({ min: -0.004, max: 0.004, noNaN: true }));
    const elevation = fc.option(
      fc.oneof({ arbitrary: fc.double({ min: 500, max: 1500, noNaN: true }), weight: 19 }, { arbitrary: fc.double({ min: -1000, max: 10_000, noNaN: true }), weight: 1 }),
      { freq: 20 },
    );
    const track = fc.tuple(position, fc.array(fc.tuple(step, elevation), { maxLength: 40 })).map(([[lon0, lat0], steps]) => {
      let [lon, lat] = [lon0, lat0];
      const pts = steps.map(([[dLon, dLat], ele]) => {
        [lon, lat] = [lon + dLon, lat + dLat];
        return `<trkpt lat="${lat}" lon="${lon}">${ele === null ? "" : `<ele>${ele}</ele>`}</trkpt>`;
      });
      return `<gpx version="1.1" creator="p"><trk><trkseg>${pts.join("")}</trkseg></trk></gpx>`;
    });
    fc.assert(fc.property(track, (text) => checkOutcome({ bytes: Buffer.from(text), filename: "t.gpx", parkCenter: PARK })), { numRuns: 300 });
  });
});
