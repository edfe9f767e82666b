import { destination, multiLineString, nearestPointOnLine } from "@turf/turf";
import { describe, expect, it } from "vitest";
import { featureKind, snapFeatures } from "@/lib/trails/pure";
import { seededRandom, synthesizeTrail } from "@/scripts/demo/synthetic-trails";
import { meridianLine, metresToLatDegrees } from "./helpers";

describe("featureKind (case-insensitive keywords, type before name)", () => {
  it.each([
    [{ type: "berm" }, "berm"],
    [{ type: "Rock Garden" }, "rock-garden"],
    [{ type: "rock_garden" }, "rock-garden"],
    [{ type: "WOODEN-FEATURE" }, "wooden-feature"],
    [{ name: "Big Hemlock Berm" }, "berm"],
    [{ name: "Tabletop 3" }, "jump"],
    [{ name: "Step-up" }, "jump"],
    [{ name: "Root drop" }, "drop"],
    [{ name: "Creek bridge" }, "wooden-feature"],
    [{ name: "Knotted roots" }, "roots"],
    [{ name: "Boulder field" }, "rock-garden"],
    [{ name: "Viewpoint" }, "unknown"],
    [{ type: "flag", name: "Lower berm" }, "berm"],
    [{}, "unknown"],
  ] as const)("%o → %s", (waypoint, kind) => {
    expect(featureKind(waypoint)).toBe(kind);
  });
});

describe("snapFeatures (turf.nearestPointOnLine)", () => {
  it("gives distance along the line and offset from it, sorted along the trail", () => {
    const segment = meridianLine(101, 10); // 1 km due north
    const at = (dM: number, offsetM: number) =>
      destination([-121.94, 47.3 + metresToLatDegrees(dM)], offsetM, 90, { units: "meters" }).geometry.coordinates;
    const [lonA, latA] = at(600, 5);
    const [lonB, latB] = at(250, 3);
    const features = snapFeatures([{ name: "Upper drop", lon: lonA, lat: latA }, { name: "Lower berm", lon: lonB, lat: latB }], [segment]);
    expect(features.map((f) => f.kind)).toEqual(["berm", "drop"]);
    expect(features[0].distanceAlongM).toBeCloseTo(250, 1);
    expect(features[0].offsetM).toBeCloseTo(3, 2);
    expect(features[1].distanceAlongM).toBeCloseTo(600, 1);
    expect(features[1].offsetM).toBeCloseTo(5, 2);
  });

  it("measures along the trail without the gap between segments", () => {
    const first = meridianLine(11, 10); // 0–100 m
    const second = meridianLine(11, 10, undefined, 47.31); // next 100 m, after a ~1 km gap
    const [feature] = snapFeatures([{ type: "jump", lon: second[5][0], lat: second[5][1] }], [first, second]);
    expect(feature.distanceAlongM).toBeCloseTo(150, 6);
    expect(feature.offsetM).toBeCloseTo(0, 6);
  });

  it("agrees with turf.nearestPointOnLine run on the whole line (the reference library) for scattered waypoints", () => {
    const line = synthesizeTrail({
      seed: 5, start: [-121.95, 47.31], end: [-121.93, 47.29], startEleM: 1300, endEleM: 650, lengthM: 6000, bulgeM: 300, meanderM: 150,
      spacingM: 8, gradeVariation: 0.3, rollerM: 1, rollerWavelengthM: 60, noiseM: 0.3,
    });
    const segments = [line.slice(0, 400), line.slice(410)];
    const random = seededRandom(9);
    const waypoints = Array.from({ length: 25 }, () => ({ lon: -121.955 + random() * 0.03, lat: 47.285 + random() * 0.03 }));
    const reference = multiLineString(segments);
    const ours = snapFeatures(waypoints, segments);
    for (const w of waypoints) {
      const expected = nearestPointOnLine(reference, [w.lon, w.lat], { units: "meters" }).properties;
      const found = ours.find((f) => f.lon === w.lon && f.lat === w.lat)!;
      expect(found.offsetM).toBeCloseTo(expected.pointDistance, 6);
      expect(found.distanceAlongM).toBeCloseTo(expected.totalDistance, 3);
    }
  });
});
