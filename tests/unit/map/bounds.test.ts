import { describe, expect, it } from "vitest";
import { boundsAround, collectionBounds, trailBounds, unionBounds } from "@/lib/map/pure/bounds";

// Bounding boxes as RFC 7946 §5 defines them: [west, south], [east, north] in degrees.
describe("where the park map opens", () => {
  it("takes the box of a park's ground (Turf bbox) and joins it with the trails' box", () => {
    const ground = { type: "FeatureCollection" as const, features: [{ type: "Feature" as const, properties: {}, geometry: { type: "Polygon" as const, coordinates: [[[8.4, 46.7], [8.6, 46.7], [8.6, 46.9], [8.4, 46.7]]] } }] };
    const trails = trailBounds([{ minLon: 8.5, minLat: 46.8, maxLon: 8.7, maxLat: 46.85 }]);
    expect(collectionBounds(ground)).toEqual([[8.4, 46.7], [8.6, 46.9]]);
    expect(unionBounds(trails, collectionBounds(ground))).toEqual([[8.4, 46.7], [8.7, 46.9]]);
  });

  it("has nothing to offer for a park with neither, so the map falls back to the park's location", () => {
    expect(unionBounds(trailBounds([]), collectionBounds({ type: "FeatureCollection", features: [] }))).toBeNull();
    // ±0.01° of latitude; longitude widened by 1/cos(lat) so the box is square on the ground.
    const [[w], [e]] = boundsAround(8.5, 60);
    expect(e - w).toBeCloseTo(0.04, 10);
  });
});
