import { describe, expect, it } from "vitest";
import { assertWithinPark, pointAlongTrail } from "@/lib/hazards/pure/hazard-place";
import { AppError } from "@/lib/shared/errors";

// Turf measures on a sphere of radius R = 6 371 008.8 m (packages/turf-helpers, earthRadius):
// one degree of arc along a meridian is 2πR/360 = 111 195.080 m (computed).
const DEGREE_M = (2 * Math.PI * 6_371_008.8) / 360;

describe("a point along a trail (turf.along)", () => {
  const meridian: GeoJSON.LineString = { type: "LineString", coordinates: [[0, 0], [0, 1]] };

  it("halfway along a one-degree meridian line is latitude 0.5°", () => {
    const p = pointAlongTrail(meridian, DEGREE_M / 2);
    expect(p.lon).toBeCloseTo(0, 9);
    expect(p.lat).toBeCloseTo(0.5, 6);
  });

  it("the start and the very end", () => {
    expect(pointAlongTrail(meridian, 0)).toEqual({ lon: 0, lat: 0 });
    expect(pointAlongTrail(meridian, DEGREE_M).lat).toBeCloseTo(1, 6);
  });

  it("does not bridge the gap between the parts of a MultiLineString", () => {
    const twoParts: GeoJSON.MultiLineString = { type: "MultiLineString", coordinates: [[[0, 0], [0, 1]], [[1, 5], [1, 6]]] };
    // 1.25 degrees of trail: all of the first part, then a quarter of the second.
    const p = pointAlongTrail(twoParts, DEGREE_M * 1.25);
    expect(p.lon).toBeCloseTo(1, 9);
    expect(p.lat).toBeCloseTo(5.25, 6);
  });

  it("refuses a distance beyond the end, naming the trail's length", () => {
    const error = (() => {
      try {
        pointAlongTrail(meridian, DEGREE_M + 50);
      } catch (e) {
        return e as AppError;
      }
    })();
    expect(error).toBeInstanceOf(AppError);
    expect(error).toMatchObject({ status: 422, field: "distanceAlongM" });
    expect(error!.message).toMatch(/is 111 km long/);
  });
});

describe("a pin must be near the park", () => {
  const center = { lon: -121.94, lat: 47.3 };
  it("accepts a point 19 km north and refuses one 21 km north", () => {
    expect(() => assertWithinPark({ lon: -121.94, lat: 47.3 + 19_000 / DEGREE_M }, center)).not.toThrow();
    expect(() => assertWithinPark({ lon: -121.94, lat: 47.3 + 21_000 / DEGREE_M }, center)).toThrow(/21 km from the park/);
  });
  it("refuses a far point with a hint about the order of the coordinates", () => {
    expect(() => assertWithinPark({ lon: 47.3, lat: -80 }, center)).toThrow(/longitude first/);
  });
});
