import { destination, distance } from "@turf/turf";
import { describe, expect, it } from "vitest";
import { snapToTrail } from "@/lib/map/pure/snap";

// Reference values computed with Turf's own haversine distance (sphere of R = 6 371 008.8 m),
// the same measure trail lengths use.
const start: [number, number] = [8.5, 46.8];
const east = (metres: number) => destination(start, metres, 90, { units: "meters" }).geometry.coordinates;

describe("snapping a dropped feature onto its trail", () => {
  const line: GeoJSON.LineString = { type: "LineString", coordinates: [start, east(500), east(1000)] };

  it("moves it to the nearest point of the line and measures the distance along it", () => {
    const dropped = destination(east(300), 40, 0, { units: "meters" }).geometry.coordinates;
    const snapped = snapToTrail(line, dropped[0], dropped[1]);
    expect(snapped.offsetM).toBeCloseTo(40, 0);
    expect(snapped.distanceAlongM).toBeCloseTo(300, 0);
    expect(distance([snapped.lon, snapped.lat], east(300), { units: "meters" })).toBeLessThan(1);
  });

  it("does not count the gap between the segments of a line recorded in two parts", () => {
    const gap: GeoJSON.MultiLineString = { type: "MultiLineString", coordinates: [[start, east(400)], [east(600), east(1000)]] };
    const snapped = snapToTrail(gap, east(800)[0], east(800)[1]);
    expect(snapped.distanceAlongM).toBeCloseTo(400 + 200, 0);
    expect(snapped.offsetM).toBeLessThan(0.5);
  });

  it("snaps a point beyond the end to the end", () => {
    const beyond = east(1100);
    const snapped = snapToTrail(line, beyond[0], beyond[1]);
    expect(snapped.distanceAlongM).toBeCloseTo(1000, 0);
    expect(snapped.offsetM).toBeCloseTo(100, 0);
  });
});
