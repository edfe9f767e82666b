import { describe, expect, it } from "vitest";
import { parseTrailFile, TRAIL_LIMITS } from "@/lib/trails/pure";
import { bytes, expectAppError, meridianLine } from "./helpers";

const PARK = { lon: -121.94, lat: 47.3 };
const trkpt = ([lon, lat, ele]: number[]) => `<trkpt lat="${lat}" lon="${lon}"><ele>${ele}</ele></trkpt>`;
const gpx = (inner: string, rootAttrs = 'version="1.1" creator="test"') => `<?xml version="1.0"?><gpx ${rootAttrs} xmlns="http://www.topografix.com/GPX/1/1">${inner}</gpx>`;
const line = meridianLine(10, 10, (i) => 900 - i);
const track = `<trk><trkseg>${line.map(trkpt).join("")}</trkseg></trk>`;

describe("size and point limits (ASVS v5.0.0-5.2.1), checked before parsing", () => {
  it("refuses a file over 20 MB with 413 before reading it", () => {
    const big = Buffer.alloc(TRAIL_LIMITS.maxFileBytes + 1, 0x20);
    expectAppError(() => parseTrailFile({ bytes: big, filename: "big.gpx" }), 413, "limit is 20 MB");
  });

  it("reads a file of exactly 20 MB (here all whitespace, so it is refused as empty, not as too big)", () => {
    const edge = Buffer.alloc(TRAIL_LIMITS.maxFileBytes, 0x20);
    expectAppError(() => parseTrailFile({ bytes: edge, filename: "edge.gpx" }), 422, "empty");
  });

  it("refuses more than 200,000 GPX points with 413 without building the document", () => {
    const point = '<trkpt lat="47.3" lon="-121.94"/>';
    const text = gpx(`<trk><trkseg>${point.repeat(TRAIL_LIMITS.maxPoints + 1)}</trkseg></trk>`);
    expectAppError(() => parseTrailFile({ bytes: bytes(text), filename: "many.gpx" }), 413, "200,000 points");
  });

  it("refuses more than 200,000 GeoJSON positions with 413 while walking the coordinates", () => {
    const coordinates = `[-121.94,47.3],`.repeat(TRAIL_LIMITS.maxPoints) + "[-121.94,47.3001]";
    const text = `{"type":"LineString","coordinates":[${coordinates}]}`;
    expectAppError(() => parseTrailFile({ bytes: bytes(text), filename: "many.geojson" }), 413, "200,000 points");
  });

  it("accepts exactly 200,000 points", () => {
    const coordinates = Array.from({ length: TRAIL_LIMITS.maxPoints }, (_, i) => `[-121.94,${(47 + i * 1e-5).toFixed(5)}]`).join(",");
    const trail = parseTrailFile({ bytes: bytes(`{"type":"LineString","coordinates":[${coordinates}]}`), filename: "edge.geojson" });
    expect(trail.segments[0]).toHaveLength(TRAIL_LIMITS.maxPoints);
  });
});

describe("names and content types", () => {
  it.each([
    ["TRAIL.GPX", undefined],
    ["trail.gpx", "application/gpx+xml; charset=utf-8"],
    ["trail.gpx", "application/octet-stream"],
    ["trail.gpx", "text/xml"],
    ["trail.gpx", ""],
    ["C:\\Users\\crew\\trail.gpx", undefined],
  ])("accepts %s sent as %s", (filename, contentType) => {
    expect(parseTrailFile({ bytes: bytes(gpx(track)), filename, contentType }).segments).toHaveLength(1);
  });

  it("accepts UTF-16 text announced by a byte-order mark", () => {
    const utf16 = Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(gpx(track), "utf16le")]);
    expect(parseTrailFile({ bytes: utf16, filename: "t.gpx" }).segments[0]).toHaveLength(10);
  });

  it("refuses a KML content type whatever the name", () => {
    expectAppError(() => parseTrailFile({ bytes: bytes(gpx(track)), filename: "t.gpx", contentType: "application/vnd.google-earth.kml+xml" }), 415, "KML");
  });
});

describe("GPX details (GPX 1.1 schema: gpx › trk › trkseg › trkpt, rte › rtept, wpt)", () => {
  it("warns about a missing creator (required by GPX 1.1) but reads the file", () => {
    const trail = parseTrailFile({ bytes: bytes(gpx(track, 'version="1.1"')), filename: "t.gpx" });
    expect(trail.warnings.join(" ")).toContain("creator");
  });

  it("refuses a root with no version", () => {
    expectAppError(() => parseTrailFile({ bytes: bytes(gpx(track, 'creator="x"')), filename: "t.gpx" }), 422, "no version");
  });

  it("drops a one-point trkseg with a warning and keeps the rest", () => {
    const text = gpx(`<trk><trkseg>${trkpt(line[0])}</trkseg><trkseg>${line.map(trkpt).join("")}</trkseg></trk>`);
    const trail = parseTrailFile({ bytes: bytes(text), filename: "t.gpx" });
    expect(trail.segments).toHaveLength(1);
    expect(trail.warnings.join(" ")).toContain("single point");
  });

  it("reads waypoint name, type (or sym) and elevation", () => {
    const text = gpx(`<wpt lat="47.3001" lon="-121.94"><ele>899</ele><name>Upper berm</name><type>berm</type></wpt><wpt lat="47.3002" lon="-121.94"><sym>Bridge</sym></wpt>${track}`);
    expect(parseTrailFile({ bytes: bytes(text), filename: "t.gpx" }).waypoints).toEqual([
      { name: "Upper berm", type: "berm", lon: -121.94, lat: 47.3001, ele: 899 },
      { type: "Bridge", lon: -121.94, lat: 47.3002 },
    ]);
  });

  it("refuses a waypoint out of range", () => {
    const text = gpx(`<wpt lat="-91" lon="-121.94"><name>Lost</name></wpt>${track}`);
    expectAppError(() => parseTrailFile({ bytes: bytes(text), filename: "t.gpx" }), 422, 'Waypoint 1 ("Lost") has latitude -91');
  });

  it("collapses whitespace in the name and cuts it to 80 characters", () => {
    const text = gpx(`<trk><name>  Long\n   ${"x".repeat(120)}  </name><trkseg>${line.map(trkpt).join("")}</trkseg></trk>`);
    const name = parseTrailFile({ bytes: bytes(text), filename: "t.gpx" }).name!;
    expect(name.startsWith("Long x")).toBe(true);
    expect(name).toHaveLength(80);
  });
});

describe("where the line lies", () => {
  it("names the step and segment of an impossible jump", () => {
    const second = meridianLine(5, 10, (i) => 800 - i, 47.31);
    second[3] = [-121.9, second[3][1], 797];
    const text = gpx(`<trk><trkseg>${line.map(trkpt).join("")}</trkseg><trkseg>${second.map(trkpt).join("")}</trkseg></trk>`);
    expectAppError(() => parseTrailFile({ bytes: bytes(text), filename: "t.gpx" }), 422, "Points 3 and 4 of segment 2 are 3 km apart");
  });

  it("does not judge distance or swapping without the park's location", () => {
    // About 235 m long: a real trail's length, above the 50 m minimum.
    const far = JSON.stringify({ type: "LineString", coordinates: [[40, 20], [40.002, 20.001]] });
    expect(parseTrailFile({ bytes: bytes(far), filename: "t.geojson" }).segments).toHaveLength(1);
    expectAppError(() => parseTrailFile({ bytes: bytes(far), filename: "t.geojson", parkCenter: PARK }), 422, "km from the park");
  });

  it("refuses a line within 50 km of the park only when it is further", () => {
    const near = JSON.stringify({ type: "LineString", coordinates: [[-121.3, 47.3], [-121.3, 47.3005]] }); // about 48 km east
    expect(parseTrailFile({ bytes: bytes(near), filename: "t.geojson", parkCenter: PARK }).segments).toHaveLength(1);
  });
});
