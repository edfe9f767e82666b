import { describe, expect, it } from "vitest";
import { nearestTrail } from "@/lib/map/pure/nearest-trail";

// Checked against plain geometry: two parallel north–south lines 0.0001° of longitude apart
// (about 7.6 m at 47° N: 0.0001 × 111 320 m × cos 47°, the length of a degree on the WGS 84 sphere).
const west = { id: "west", geometry: { type: "LineString" as const, coordinates: [[-121.9400, 47.30], [-121.9400, 47.31]] } };
const east = { id: "east", geometry: { type: "MultiLineString" as const, coordinates: [[[-121.9399, 47.30], [-121.9399, 47.305]], [[-121.9399, 47.305], [-121.9399, 47.31]]] } };

describe("the trail nearest to a tap", () => {
  it("picks the line under the finger, whatever order the renderer lists them in", () => {
    expect(nearestTrail(-121.94, 47.305, [east, west])).toBe("west");
    expect(nearestTrail(-121.9399, 47.305, [west, east])).toBe("east");
    expect(nearestTrail(-121.93993, 47.302, [west, east])).toBe("east");
    expect(nearestTrail(-121.93997, 47.302, [east, west])).toBe("west");
  });

  it("answers null when nothing was under the tap", () => {
    expect(nearestTrail(-121.94, 47.305, [])).toBeNull();
  });
});
