import gjv from "geojson-validation";
import { DOMParser } from "@xmldom/xmldom";
import { describe, expect, it } from "vitest";
import { escapeXml, parseTrailFile, toGeoJson, toGpx, TRAIL_LIMITS, type ExportableTrail } from "@/lib/trails/pure";
import { bytes, meridianLine } from "./helpers";

const trail: ExportableTrail = {
  name: `Tom & "Jerry's" <Line>`,
  segments: [meridianLine(20, 10, (i) => 900 - i * 1.25), meridianLine(20, 10, (i) => 870 - i, 47.31)],
  waypoints: [
    { name: "Berm <1>", type: "berm", lon: -121.94, lat: 47.3005, ele: 895.5 },
    { name: "Drop & roll", type: "drop", lon: -121.9401, lat: 47.3101 },
  ],
};

describe("toGpx (GPX 1.1 writer)", () => {
  it("writes the GPX 1.1 root (version and creator are required by the schema) with waypoints before the track", () => {
    const doc = new DOMParser().parseFromString(toGpx(trail), "text/xml");
    const root = doc.documentElement!;
    expect(root.getAttribute("version")).toBe("1.1");
    expect(root.getAttribute("creator")).toBe("Loamcast");
    expect(root.namespaceURI).toBe("http://www.topografix.com/GPX/1/1");
    const order = Array.from(root.childNodes).filter((n) => n.nodeType === 1).map((n) => n.nodeName);
    expect(order).toEqual(["metadata", "wpt", "wpt", "trk"]); // schema sequence: metadata, wpt*, rte*, trk*
  });

  it("round-trips through parseTrailFile: names escaped, segments kept apart, coordinates to 1e-7°", () => {
    const parsed = parseTrailFile({ bytes: bytes(toGpx(trail)), filename: "out.gpx", parkCenter: { lon: -121.94, lat: 47.3 } });
    expect(parsed.name).toBe(trail.name);
    expect(parsed.segments).toHaveLength(2);
    parsed.segments.forEach((segment, s) =>
      segment.forEach((p, i) => {
        expect(p[0]).toBeCloseTo(trail.segments[s][i][0], 7);
        expect(p[1]).toBeCloseTo(trail.segments[s][i][1], 7);
        expect(p[2]).toBeCloseTo(trail.segments[s][i][2], 2);
      }),
    );
    expect(parsed.waypoints).toEqual(trail.waypoints);
  });

  it("writes plain decimals (xsd:decimal has no exponent) and drops characters XML cannot hold", () => {
    const gpx = toGpx({ name: "Bell\u0007 line", segments: [[[1e-8, 3e-7], [-0.0000001, 0.5]]] });
    expect(gpx).not.toMatch(/\de-/);
    expect(gpx).toContain('lat="0.0000003" lon="0"');
    expect(gpx).toContain('lat="0.5" lon="-0.0000001"');
    expect(gpx).toContain("<name>Bell line</name>");
  });

  it("writes a trail at the point limit (200,000 points) without running out of stack", () => {
    const segment = meridianLine(TRAIL_LIMITS.maxPoints, 2, (i) => 900 - i * 0.01);
    const gpx = toGpx({ name: "Long", segments: [segment] });
    expect(gpx.match(/<trkpt /g)?.length).toBe(TRAIL_LIMITS.maxPoints);
  });

  it("escapes the five XML special characters", () => {
    expect(escapeXml(`<a href="x">Tom & Jerry's</a>`)).toBe("&lt;a href=&quot;x&quot;&gt;Tom &amp; Jerry&apos;s&lt;/a&gt;");
  });
});

describe("toGeoJson (RFC 7946 writer)", () => {
  it("is valid GeoJSON by geojson-validation, has no crs member, and round-trips", () => {
    const geojson = toGeoJson(trail, { difficulty: "intermediate" });
    expect(gjv.valid(geojson, true)).toEqual([]);
    expect(JSON.stringify(geojson)).not.toContain('"crs"');
    expect(geojson.features[0].geometry.type).toBe("MultiLineString");
    expect(geojson.features[0].properties).toMatchObject({ name: trail.name, difficulty: "intermediate" });
    const parsed = parseTrailFile({ bytes: bytes(JSON.stringify(geojson)), filename: "out.geojson" });
    expect(parsed.segments).toEqual(trail.segments);
    expect(parsed.waypoints).toEqual(trail.waypoints);
  });

  it("writes a single segment as a LineString", () => {
    expect(toGeoJson({ segments: [trail.segments[0]] }).features[0].geometry.type).toBe("LineString");
  });
});
