import { describe, expect, it } from "vitest";
import { missingGroundLayers, parseGroundLayer } from "@/lib/parks/pure/ground-layers";

const PARK = { lon: 8.5, lat: 46.8 };
const bytes = (value: unknown) => new TextEncoder().encode(typeof value === "string" ? value : JSON.stringify(value));
const fc = (...features: unknown[]) => ({ type: "FeatureCollection", features });
const point = (lon: number, lat: number, properties: Record<string, unknown> = { name: "Base lodge" }) => ({ type: "Feature", properties, geometry: { type: "Point", coordinates: [lon, lat] } });
const line = (properties: Record<string, unknown> = {}) => ({ type: "Feature", properties, geometry: { type: "LineString", coordinates: [[8.5, 46.8], [8.51, 46.81]] } });
const refusal = (fn: () => unknown) => {
  try {
    fn();
  } catch (error) {
    return error as { status: number; message: string; field?: string };
  }
  throw new Error("expected a refusal");
};

describe("ground layer files", () => {
  it("keeps only what the map draws", () => {
    const layer = parseGroundLayer("landmarks", bytes(fc(point(8.5, 46.8, { name: "  First aid ", kind: "first-aid", onclick: "alert(1)", elevation: "1510.4" }))), PARK);
    expect(layer.features[0].properties).toEqual({ name: "First aid", kind: "first-aid", elevationM: 1510 });
  });

  it("gives contours an elevation and marks every 50 m line as an index contour", () => {
    const layer = parseGroundLayer("contours", bytes(fc(line({ ele: 1450 }), line({ elevationM: 1460 }))), PARK);
    expect(layer.features.map((f) => f.properties)).toEqual([{ elevationM: 1450, index: true }, { elevationM: 1460, index: false }]);
    expect(refusal(() => parseGroundLayer("contours", bytes(fc(line())), PARK)).message).toMatch(/^Feature 1 has no elevation/);
  });

  // RFC 7946 §3.1: each layer takes its geometry; a landmark needs a name to be shown.
  it("refuses the wrong geometry for the layer and unnamed landmarks, naming the feature", () => {
    expect(refusal(() => parseGroundLayer("boundary", bytes(fc(line())), PARK)).message).toMatch(/^Feature 1 is a LineString; the boundary layer takes/);
    expect(refusal(() => parseGroundLayer("lifts", bytes(fc(line(), point(8.5, 46.8))), PARK)).message).toMatch(/^Feature 2 is a Point/);
    expect(refusal(() => parseGroundLayer("landmarks", bytes(fc(point(8.5, 46.8, {}))), PARK)).message).toMatch(/^Feature 1 has no name/);
  });

  // 2° of longitude at 46.8° N is 2 × 111.195 km × cos 46.8° ≈ 152 km on Turf's sphere (R = 6 371 008.8 m).
  it("refuses a feature more than 50 km from the park", () => {
    const error = refusal(() => parseGroundLayer("landmarks", bytes(fc(point(8.5, 46.8), point(10.5, 46.8))), PARK));
    expect(error).toMatchObject({ status: 422, field: "file" });
    expect(error.message).toMatch(/^Feature 2 reaches 152 km from the park's location/);
  });

  it("refuses what is not RFC 7946 GeoJSON", () => {
    expect(refusal(() => parseGroundLayer("landmarks", bytes("{not json"), PARK)).status).toBe(422);
    expect(refusal(() => parseGroundLayer("landmarks", bytes({ ...fc(point(8.5, 46.8)), crs: { type: "name" } }), PARK)).message).toMatch(/crs/);
    expect(refusal(() => parseGroundLayer("landmarks", bytes({ type: "Point", coordinates: [8.5, 46.8] }), PARK)).message).toMatch(/FeatureCollection/);
    expect(refusal(() => parseGroundLayer("landmarks", bytes(fc()), PARK)).message).toMatch(/no features/);
    expect(refusal(() => parseGroundLayer("landmarks", bytes(fc(point(8.5, 95))), PARK)).message).toMatch(/off the Earth/);
    expect(refusal(() => parseGroundLayer("landmarks", new Uint8Array([0xff, 0x22, 0xc3]), PARK)).message).toMatch(/UTF-8/);
    const ring = { type: "Feature", properties: {}, geometry: { type: "Polygon", coordinates: [[[8.5, 46.8], [8.51, 46.8], [8.51, 46.81]]] } };
    expect(refusal(() => parseGroundLayer("boundary", bytes(fc(ring)), PARK)).message).toMatch(/RFC 7946/);
  });

  it("names the layers a park still lacks", () => {
    expect(missingGroundLayers({ boundary: fc(point(0, 0)) as never, lifts: fc() as never })).toEqual(["lifts", "roads", "landmarks", "contours"]);
  });
});
