import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { gpx } from "@tmcw/togeojson";
import { DOMParser } from "@xmldom/xmldom";
import type { Position } from "geojson";
import { describe, expect, it } from "vitest";
import { parseGpx } from "@/lib/trails/pure/parse-gpx";

// Track points are read by our own pass over the document (lib/trails/pure/gpx-points.ts) instead of
// @tmcw/togeojson; the reference library must still agree with us on every file we accept.
function reference(text: string): { segments: Position[][]; name?: string } {
  const features = gpx(new DOMParser().parseFromString(text, "text/xml")).features;
  const tracks = features.filter((f) => f.properties?._gpxType === "trk");
  const lines = tracks.length > 0 ? tracks : features.filter((f) => f.properties?._gpxType === "rte");
  const segments = lines.flatMap((f) => (f.geometry?.type === "LineString" ? [f.geometry.coordinates] : f.geometry?.type === "MultiLineString" ? f.geometry.coordinates : []));
  const name = lines.map((f) => (typeof f.properties?.name === "string" ? f.properties.name.trim() : "")).find(Boolean);
  return { segments, name };
}

const corpus = path.resolve(__dirname, "../../fixtures/trails");
const demo = path.resolve(__dirname, "../../../data/demo-park/trails");
const files = [
  ...readdirSync(corpus).filter((f) => f.startsWith("good-") && f.endsWith(".gpx")).map((f) => path.join(corpus, f)),
  ...readdirSync(demo).filter((f) => f.endsWith(".gpx")).map((f) => path.join(demo, f)),
];

const twoTracks = `<?xml version="1.0"?>
<gpx version="1.1" creator="test" xmlns="http://www.topografix.com/GPX/1/1">
  <trk><trkseg><trkpt lat="47.3" lon="-121.94"/><trkpt lat=" 47.3001 " lon="-121.94"><ele> 901.5 </ele><time>2026-05-01T07:00:00Z</time></trkpt></trkseg>
    <trkseg><trkpt lat="47.3002" lon="-121.94"><ele>900</ele></trkpt></trkseg></trk>
  <trk><name>Second <![CDATA[& last]]></name>
    <trkseg><trkpt lat="47.3003" lon="-121.9401"><ele>899</ele><extensions><speed>3</speed></extensions></trkpt><trkpt lat="47.3004" lon="-121.9402"><ele>898</ele></trkpt></trkseg>
    <trkseg><trkpt lat="47.3005" lon="-121.9403"><ele>897</ele></trkpt><trkpt lat="47.3006" lon="-121.9404"><ele>896e0</ele></trkpt></trkseg>
  </trk>
</gpx>`;

describe("track reading agrees with @tmcw/togeojson (reference library)", () => {
  it.each(files.map((f) => [path.basename(f), f]))("%s", (_name, file) => {
    const text = readFileSync(file, "utf8").replace(/^\uFEFF/, "");
    const ours = parseGpx(text);
    const expected = reference(text);
    expect(ours.segments).toEqual(expected.segments);
    if (expected.name) expect(ours.name).toBe(expected.name); // unnamed lines fall back to <metadata><name>, which the converter does not read
  });

  it("keeps segments apart, skips one-point segments and takes the first named track's name", () => {
    const ours = parseGpx(twoTracks);
    const expected = reference(twoTracks);
    expect(ours.segments).toEqual(expected.segments);
    expect(ours.segments.map((s) => s.length)).toEqual([2, 2, 2]);
    expect(ours.segments[0]).toEqual([[-121.94, 47.3], [-121.94, 47.3001, 901.5]]);
    expect(ours.name).toBe("Second & last");
    expect(ours.name).toBe(expected.name);
  });
});
