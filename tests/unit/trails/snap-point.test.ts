import { destination, distance } from "@turf/turf";
import { describe, expect, it } from "vitest";
import { snapFeatures } from "@/lib/trails/pure/features";
import { snapPointToTrail } from "@/lib/trails/pure/placement";

// Reference values computed with Turf's own haversine distance (sphere of R = 6 371 008.8 m),
// the same measure trail lengths use.
const start: [number, number] = [8.5, 46.8];
const east = (metres: number) => destination(start, metres, 90, { units: "meters" }).geometry.coordinates;

describe("snapping a dropped feature onto its trail (the one snap: edit page and staff map)", () => {
  const line = [[start, east(500), east(1000)]];

  it("moves it to the nearest point of the line and measures the distance along it", () => {
    const dropped = destination(east(300), 40, 0, { units: "meters" }).geometry.coordinates;
    const snapped = snapPointToTrail({ lon: dropped[0], lat: dropped[1] }, line);
    expect(snapped.offsetM).toBeCloseTo(40, 0);
    expect(snapped.distanceAlongM).toBeCloseTo(300, 0);
    expect(distance([snapped.lon, snapped.lat], east(300), { units: "meters" })).toBeLessThan(1);
  });

  it("does not count the gap between the segments of a line recorded in two parts", () => {
    const gap = [[start, east(400)], [east(600), east(1000)]];
    const snapped = snapPointToTrail({ lon: east(800)[0], lat: east(800)[1] }, gap);
    expect(snapped.distanceAlongM).toBeCloseTo(400 + 200, 0);
    expect(snapped.offsetM).toBeLessThan(0.5);
  });

  it("measures a point beyond the end from the end, and refuses to move a feature there (more than 50 m off the line)", () => {
    const beyond = east(1100);
    const [snapped] = snapFeatures([{ lon: beyond[0], lat: beyond[1] }], line);
    expect(() => snapPointToTrail({ lon: beyond[0], lat: beyond[1] }, line, "Fern Gully")).toThrow(/^That point is 100 m from Fern Gully; a feature must lie within 50 m/);
    expect(snapped.distanceAlongM).toBeCloseTo(1000, 0);
    expect(snapped.offsetM).toBeCloseTo(100, 0);
  });
});
