import { along, destination, lineString, nearestPointOnLine } from "@turf/turf";
import { describe, expect, it } from "vitest";
import { featuresForNewLine, MAX_FEATURE_OFFSET_M, placeOnTrail, pointAtDistance, snapPointToTrail, trailLengthM } from "@/lib/trails/pure/placement";
import { expectAppError, meridianLine, metresToLatDegrees } from "./helpers";

const line = meridianLine(101, 10); // 1 km due north along lon −121.94
const east = (dM: number, offsetM: number) =>
  destination([-121.94, 47.3 + metresToLatDegrees(dM)], offsetM, 90, { units: "meters" }).geometry.coordinates as [number, number];

describe("pointAtDistance", () => {
  it("agrees with turf.along (the reference library) within a centimetre", () => {
    for (const d of [0, 5, 333.3, 999.9, 1000]) {
      const [lon, lat] = pointAtDistance([line], d);
      const expected = along(lineString(line), d, { units: "meters" }).geometry.coordinates;
      expect(Math.abs(lat - expected[1])).toBeLessThan(metresToLatDegrees(0.01));
      expect(Math.abs(lon - expected[0])).toBeLessThan(1e-7);
    }
  });

  it("skips the gap between segments, as distances along the trail do", () => {
    const second = meridianLine(11, 10, undefined, 47.31);
    expect(trailLengthM([line.slice(0, 11), second])).toBeCloseTo(200, 6);
    const [, lat] = pointAtDistance([line.slice(0, 11), second], 150);
    expect(lat).toBeCloseTo(second[5][1], 7);
  });

  it("refuses a distance beyond the trail's end with its length", () => {
    expectAppError(() => pointAtDistance([line], 1200), 422, "1 km long");
    expectAppError(() => pointAtDistance([line], -1), 422, "between 0");
  });
});

describe("snapPointToTrail", () => {
  it("moves a point 12 m off the line onto it (turf.nearestPointOnLine as reference)", () => {
    const [lon, lat] = east(420, 12);
    const placed = snapPointToTrail({ lon, lat }, [line]);
    const reference = nearestPointOnLine(lineString(line), [lon, lat], { units: "meters" });
    expect(placed.offsetM).toBeCloseTo(12, 2);
    expect(placed.distanceAlongM).toBeCloseTo(420, 1);
    expect(placed.lon).toBeCloseTo(reference.geometry.coordinates[0], 6);
    expect(placed.lat).toBeCloseTo(reference.geometry.coordinates[1], 6);
  });

  it(`refuses a point more than ${MAX_FEATURE_OFFSET_M} m from the line`, () => {
    const [lon, lat] = east(420, 230);
    expectAppError(() => snapPointToTrail({ lon, lat }, [line]), 422, "230 m from the trail");
  });

  it("places by distance from the start as well", () => {
    const placed = placeOnTrail({ distanceAlongM: 250 }, [line]);
    expect(placed.distanceAlongM).toBe(250);
    expect(placed.lat).toBeCloseTo(47.3 + metresToLatDegrees(250), 7);
  });
});

describe("featuresForNewLine", () => {
  it("keeps recorded features, measured again along the new line, and adds only new waypoints", () => {
    const [bermLon, bermLat] = east(300, 0);
    const kept = [{ id: "berm-1", kind: "berm", lon: bermLon, lat: bermLat }];
    const shifted = meridianLine(101, 10, undefined, 47.3 - metresToLatDegrees(100)); // new line starts 100 m further south
    const [dupLon, dupLat] = east(303, 2);
    const [jumpLon, jumpLat] = east(600, 1);
    const fromFile = [
      { kind: "berm" as const, lon: dupLon, lat: dupLat, distanceAlongM: 403, offsetM: 2 },
      { kind: "jump" as const, lon: jumpLon, lat: jumpLat, distanceAlongM: 700, offsetM: 1 },
    ];
    const result = featuresForNewLine(kept, fromFile, [shifted]);
    expect(result.remeasured).toHaveLength(1);
    expect(result.remeasured[0].id).toBe("berm-1");
    expect(result.remeasured[0].distanceAlongM).toBeCloseTo(400, 1);
    expect(result.added.map((f) => f.kind)).toEqual(["jump"]);
    expect(result.farFromLine).toBe(0);
  });
});
