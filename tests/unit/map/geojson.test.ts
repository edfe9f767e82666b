import { length, lineString, pointToLineDistance } from "@turf/turf";
import gjv from "geojson-validation";
import { describe, expect, it } from "vitest";
import { hazardsCollection, trailFeaturesCollection, trailsCollection, type TrailRowForMap } from "@/lib/map/pure/geojson";
import { parkLayersCollection } from "@/lib/map/pure/park-layers";
import { trailLabelPoints } from "@/lib/map/pure/trail-labels";
import { trailMapPropertiesSchema } from "@/lib/map/pure/schemas";

// Invented rows (a scenario of our own); RFC 7946 validity is checked by geojson-validation.
const line: GeoJSON.LineString = { type: "LineString", coordinates: [[8.5, 46.8, 1500], [8.51, 46.8, 1450], [8.51, 46.81, 1400]] };
const row = (id: string, extra: Partial<TrailRowForMap> = {}): TrailRowForMap => ({
  id,
  name: `Trail ${id}`,
  difficulty: "intermediate",
  kind: "flow",
  direction: "downhill",
  lengthM: 1876.44,
  descentM: 99.6,
  maxGradePct: 12.345,
  simplified: line,
  ...extra,
});

describe("trails.geojson serializer", () => {
  const reportedAt = new Date("2026-12-01T15:10:00Z");
  const collection = trailsCollection(
    [row("a"), row("b", { descentM: null, maxGradePct: null })],
    new Map([["a", { status: "caution" as const, surfaces: ["wet", "rocky"] }]]),
    new Map([["a", reportedAt]]),
  );

  it("is an RFC 7946 FeatureCollection of the trails' simplified lines", () => {
    expect(gjv.valid(collection, true)).toEqual([]);
    expect(collection.features.map((f) => f.geometry)).toEqual([line, line]);
  });

  it("carries exactly the documented properties, rounded for reading", () => {
    const strict = trailMapPropertiesSchema.strict();
    for (const f of collection.features) expect(() => strict.parse(f.properties)).not.toThrow();
    expect(collection.features[0].properties).toEqual({
      id: "a",
      name: "Trail a",
      difficulty: "intermediate",
      kind: "flow",
      direction: "downhill",
      lengthM: 1876,
      descentM: 100,
      maxGradePct: 12.3,
      status: "caution",
      statusLabel: "Caution",
      surfaces: ["wet", "rocky"],
      lastReportAt: "2026-12-01T15:10:00.000Z",
    });
  });

  it("says 'not inspected today' when there is no report today", () => {
    expect(collection.features[1].properties).toMatchObject({ status: null, statusLabel: "Not inspected today", surfaces: [], lastReportAt: null, descentM: null, maxGradePct: null });
  });
});

describe("hazard and feature serializers", () => {
  it("writes open hazards as points with their kind in words", () => {
    const fc = hazardsCollection([{ id: "h1", trailId: "a", kind: "fallen-tree", note: "Across the line", lon: 8.505, lat: 46.8, reportedAt: new Date("2026-12-01T14:00:00Z") }]);
    expect(gjv.valid(fc, true)).toEqual([]);
    expect(fc.features[0]).toEqual({
      type: "Feature",
      properties: { id: "h1", trailId: "a", kind: "fallen-tree", kindLabel: "fallen tree", note: "Across the line", reportedAt: "2026-12-01T14:00:00.000Z" },
      geometry: { type: "Point", coordinates: [8.505, 46.8] },
    });
  });

  it("writes built features as points named with their kind and trail", () => {
    const fc = trailFeaturesCollection(
      [
        { id: "f1", trailId: "a", kind: "rock-garden", name: "Scatter", size: null, lon: 8.51, lat: 46.805, distanceAlongM: 1000.4 },
        { id: "f2", trailId: "a", kind: "berm", name: null, size: "large", lon: 8.505, lat: 46.8, distanceAlongM: 380 },
      ],
      new Map([["a", "Gnarly"]]),
    );
    expect(gjv.valid(fc, true)).toEqual([]);
    expect(fc.features.map((f) => [f.properties.featureKind, f.properties.label, f.properties.trailName, f.properties.distanceAlongM])).toEqual([
      ["rock-garden", "rock garden: Scatter", "Gnarly", 1000],
      ["berm", "berm", "Gnarly", 380],
    ]);
  });

  it("merges the park's base layers into one collection tagged by layer, leaving out unknown ones", () => {
    const point = (name: string): GeoJSON.Feature => ({ type: "Feature", properties: { name }, geometry: { type: "Point", coordinates: [8.5, 46.8] } });
    const fc = parkLayersCollection({
      landmarks: { type: "FeatureCollection", features: [point("Summit")] },
      lifts: { type: "FeatureCollection", features: [{ type: "Feature", properties: { name: "Chair" }, geometry: line }] },
      somethingElse: { type: "FeatureCollection", features: [point("ignored")] },
    });
    expect(gjv.valid(fc, true)).toEqual([]);
    expect(fc.features.map((f) => [f.properties?.layer, f.properties?.name])).toEqual([
      ["lift", "Chair"],
      ["landmark", "Summit"],
    ]);
  });
});

describe("trail label points", () => {
  const trails = trailsCollection(
    [row("open"), row("closed"), row("split", { simplified: { type: "MultiLineString", coordinates: [line.coordinates.slice(0, 2), line.coordinates.slice(1)] } })],
    new Map([
      ["open", { status: "open" as const, surfaces: [] }],
      ["closed", { status: "closed" as const, surfaces: [] }],
      ["split", { status: "caution" as const, surfaces: [] }],
    ]),
    new Map(),
  );
  const labels = trailLabelPoints(trails, 400);
  const of = (id: string, role: string) => labels.features.filter((f) => f.properties.trailId === id && f.properties.role === role);

  it("puts one name point per trail on its line, carrying the status word", () => {
    for (const id of ["open", "closed", "split"]) {
      const [name, ...more] = of(id, "name");
      expect(more).toEqual([]);
      expect(pointToLineDistance(name.geometry.coordinates, lineString(line.coordinates), { units: "meters" })).toBeLessThan(0.5);
    }
    expect(of("open", "name")[0].properties.tag).toBe("OPEN");
    expect(of("closed", "name")[0].properties.tag).toBe("CLOSED");
  });

  it("repeats CLOSED and CAUTION every 400 m along each part of the line, and nothing for open", () => {
    // Counts computed from Turf's own lengths: marks at 200, 600, 1000… m while inside the part.
    const marks = (metres: number) => Math.floor((metres - 200) / 400) + 1;
    const whole = length(lineString(line.coordinates), { units: "meters" });
    const [first, second] = [lineString(line.coordinates.slice(0, 2)), lineString(line.coordinates.slice(1))].map((l) => length(l, { units: "meters" }));
    expect(of("open", "status")).toEqual([]);
    expect(of("closed", "status")).toHaveLength(marks(whole));
    expect(of("split", "status")).toHaveLength(marks(first) + marks(second));
    expect(of("split", "status").every((f) => f.properties.tag === "CAUTION")).toBe(true);
  });
});
