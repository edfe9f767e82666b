import { distance } from "@turf/turf";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { cumulativeDistancesM, distanceM } from "@/lib/trails/pure/geo";

// Reference library: Turf's `distance` (packages/turf-distance, haversine on R = 6 371 008.8 m).
describe("distanceM is Turf's haversine, bit for bit", () => {
  const position = fc.tuple(fc.double({ min: -180, max: 180, noNaN: true }), fc.double({ min: -90, max: 90, noNaN: true }));
  it("agrees with @turf/distance on any two positions", () => {
    fc.assert(fc.property(position, position, (a, b) => distanceM(a, b) === distance(a, b, { units: "meters" })));
  });

  it("measures one degree of latitude as 2πR/360 = 111 195.08 m (Turf's sphere)", () => {
    expect(distanceM([0, 0], [0, 1])).toBeCloseTo((2 * Math.PI * 6_371_008.8) / 360, 6);
  });

  it("accumulates a segment's steps, and measures a segment array once", () => {
    const segment = [[-121.94, 47.3], [-121.94, 47.301], [-121.941, 47.301]];
    const along = cumulativeDistancesM(segment);
    expect(Array.from(along)).toEqual([0, distanceM(segment[0], segment[1]), distanceM(segment[0], segment[1]) + distanceM(segment[1], segment[2])]);
    expect(cumulativeDistancesM(segment)).toBe(along);
  });
});
