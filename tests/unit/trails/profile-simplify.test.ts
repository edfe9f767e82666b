import { pointToLineDistance } from "@turf/turf";
import type { LineString } from "geojson";
import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/shared/errors";
import { computeTrailStats, elevationProfile, simplifyLine } from "@/lib/trails/pure";
import { meridianLine, metresToLatDegrees, thrownBy } from "./helpers";

describe("elevationProfile", () => {
  it("returns every point when there are few", () => {
    const profile = elevationProfile([meridianLine(5, 10, (i) => 900 - i)]);
    expect(profile).toEqual([0, 10, 20, 30, 40].map((dM, i) => ({ dM, eleM: 900 - i })));
  });

  it("resamples a long trail to maxPoints, from 0 to the full length, without adding the gap between segments", () => {
    const segments = [meridianLine(800, 5, (i) => 1300 - i * 0.5), meridianLine(800, 5, (i) => 900 - i * 0.5, 47.4)];
    const profile = elevationProfile(segments, 300);
    const { lengthM } = computeTrailStats(segments);
    expect(profile).toHaveLength(300);
    expect(profile[0]).toEqual({ dM: 0, eleM: 1300 });
    expect(profile[299].dM).toBeCloseTo(lengthM, 0);
    expect(profile[299].eleM).toBeCloseTo(500.5, 1);
    for (let i = 1; i < profile.length; i++) expect(profile[i].dM).toBeGreaterThan(profile[i - 1].dM);
  });

  it("is empty without elevation and refuses fewer than two points", () => {
    expect(elevationProfile([meridianLine(5, 10)])).toEqual([]);
    expect(thrownBy(() => elevationProfile([meridianLine(5, 10, () => 1)], 1))).toBeInstanceOf(AppError);
  });
});

describe("simplifyLine", () => {
  it("reduces a straight line to its two ends", () => {
    const simplified = simplifyLine([meridianLine(1000, 5, (i) => 900 - i / 10)]) as LineString;
    expect(simplified.type).toBe("LineString");
    expect(simplified.coordinates).toHaveLength(2);
    expect(simplified.coordinates[1][2]).toBeCloseTo(900 - 99.9, 6); // elevation kept on the points that remain
  });

  it("stays within the tolerance of every original point (checked with turf.pointToLineDistance)", () => {
    const segment = meridianLine(2000, 2).map(([lon, lat], i) => [lon + metresToLatDegrees(15) * Math.sin(i / 40), lat]);
    const simplified = simplifyLine([segment], 2) as LineString;
    expect(simplified.coordinates.length).toBeLessThan(segment.length / 4);
    expect(simplified.coordinates.length).toBeGreaterThan(10);
    const worst = Math.max(...segment.map((p) => pointToLineDistance(p, simplified, { units: "meters" })));
    expect(worst).toBeLessThanOrEqual(2.0);
  });

  it("keeps segments apart as a MultiLineString", () => {
    const simplified = simplifyLine([meridianLine(50, 5), meridianLine(50, 5, undefined, 47.4)]);
    expect(simplified.type).toBe("MultiLineString");
    expect(simplified.coordinates).toHaveLength(2);
  });
});
