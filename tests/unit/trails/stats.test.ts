import { length as turfLength, lineString } from "@turf/turf";
import { describe, expect, it } from "vitest";
import { climbAndDescent, computeTrailStats, steepestGradePct } from "@/lib/trails/pure";
import { seededRandom } from "@/scripts/demo/synthetic-trails";
import { R, meridianLine, metresToLatDegrees } from "./helpers";

const relativeError = (actual: number, expected: number) => Math.abs(actual - expected) / Math.abs(expected);

describe("trail length", () => {
  it("matches Turf's own distance fixture: [−75.343, 39.984] → [−75.534, 39.123] = 97.12922118967835 km", () => {
    // Source: Turf test suite, packages/turf-distance (published; pinned @turf/turf 7.4.0). 1e-9 relative.
    const stats = computeTrailStats([[[-75.343, 39.984], [-75.534, 39.123]]]);
    expect(relativeError(stats.lengthM, 97_129.22118967835)).toBeLessThan(1e-9);
  });

  it("equals R·Δφ along a meridian (haversine on R = 6 371 008.8 m, Turf's earthRadius)", () => {
    // Computed: 0.1° of latitude at R = 6 371 008.8 m is 11 119.4926… m; the haversine is exact on a meridian.
    const segment = Array.from({ length: 101 }, (_, i) => [-121.94, 47 + i * 0.001]);
    const expected = R * ((0.1 * Math.PI) / 180);
    expect(relativeError(computeTrailStats([segment]).lengthM, expected)).toBeLessThan(1e-9);
  });

  it("agrees with turf.length (a general-purpose reference library) on a winding line", () => {
    const random = seededRandom(7);
    const segment = Array.from({ length: 500 }, (_, i) => [-121.94 + 0.0001 * Math.sin(i / 5) + random() * 1e-5, 47.3 + i * 0.00005]);
    const reference = turfLength(lineString(segment), { units: "meters" });
    expect(relativeError(computeTrailStats([segment]).lengthM, reference)).toBeLessThan(1e-12);
  });

  it("does not bridge the gap between segments (GPX: a new trkseg means the signal was lost)", () => {
    const first = meridianLine(11, 10); // 100 m
    const second = meridianLine(11, 10, undefined, 47.31); // 100 m, about 1 km further north
    expect(computeTrailStats([first, second]).lengthM).toBeCloseTo(200, 6);
  });

  it("reports the bounding box as [minLon, minLat, maxLon, maxLat] (RFC 7946 §5) and counts points", () => {
    const stats = computeTrailStats([[[-121.95, 47.3], [-121.94, 47.31]], [[-121.93, 47.29], [-121.935, 47.295]]]);
    expect(stats.bbox).toEqual([-121.95, 47.29, -121.93, 47.31]);
    expect(stats.pointCount).toBe(4);
  });
});

describe("climb and descent with a noise threshold", () => {
  it("finds no climb on a flat trail with ±1 m GPS jitter (true climb is zero by construction)", () => {
    const random = seededRandom(42);
    const segment = meridianLine(2000, 5, () => 1000 + (random() * 2 - 1));
    const naive = segment.slice(1).reduce((sum, p, i) => sum + Math.max(0, p[2] - segment[i][2]), 0);
    const stats = computeTrailStats([segment]);
    expect(naive).toBeGreaterThan(300); // what summing every wiggle would report
    expect(stats.ascentM).toBeLessThan(2);
    expect(stats.descentM).toBeLessThan(2);
  });

  it("counts a real 100 m climb in full despite the jitter", () => {
    const random = seededRandom(3);
    const segment = meridianLine(1001, 2, (i) => 500 + i * 0.1 + (random() * 2 - 1));
    const { ascentM, descentM } = computeTrailStats([segment]);
    expect(ascentM).toBeGreaterThan(97);
    expect(ascentM).toBeLessThan(103);
    expect(descentM).toBeLessThan(3);
  });

  it("keeps ascent − descent equal to the net change of each segment", () => {
    const random = seededRandom(11);
    for (let trial = 0; trial < 20; trial++) {
      const elevations = Array.from({ length: 300 }, (_, i) => 800 + 20 * Math.sin(i / (5 + trial)) + 4 * random());
      const { ascentM, descentM } = climbAndDescent(elevations, 3);
      expect(ascentM - descentM).toBeCloseTo(elevations[299] - elevations[0], 9);
    }
  });

  it("ignores a bump smaller than the threshold but counts one at the threshold", () => {
    expect(climbAndDescent([100, 102.9, 100], 3)).toEqual({ ascentM: 0, descentM: 0 });
    expect(climbAndDescent([100, 103, 100], 3)).toEqual({ ascentM: 3, descentM: 3 });
  });
});

describe("grades", () => {
  it("gives 9.4 % for 1000 ft of climb over 2 miles (IMBA, Trail Solutions, 2004, worked example)", () => {
    // 304.8 m over 3 218.688 m (NIST SP 811: ft = 0.3048 m, mile = 1 609.344 m) = 9.47 %; IMBA quotes 9.4 %.
    const run = 3218.688;
    const segment = meridianLine(322, run / 321, (_, d) => 1000 + (304.8 * d) / run);
    const { avgGradePct, ascentM, lengthM } = computeTrailStats([segment]);
    expect(lengthM).toBeCloseTo(run, 6);
    expect(ascentM).toBeCloseTo(304.8, 6);
    expect(Math.floor(avgGradePct! * 10) / 10).toBe(9.4);
  });

  it("finds the steepest 30 m window: a 60 m pitch at 20 % between flat runs", () => {
    // Computed by construction: 1 m spacing; flat 200 m, 20 % for 60 m (12 m drop), flat 200 m.
    const ele = (_: number, d: number) => (d <= 200 ? 900 : d <= 260 ? 900 - 0.2 * (d - 200) : 888);
    const stats = computeTrailStats([meridianLine(461, 1, ele)]);
    expect(stats.maxGradePct).toBeCloseTo(20, 6);
    expect(stats.avgGradePct).toBeCloseTo((12 / 460) * 100, 6);
    expect(stats.minElevationM).toBe(888);
    expect(stats.maxElevationM).toBe(900);
  });

  it("measures a segment shorter than the window end to end", () => {
    expect(steepestGradePct([0, 10, 20], [100, 99, 98], 30)).toBeCloseTo(10, 9);
    expect(steepestGradePct([0], [100], 30)).toBeNull();
  });
});

describe("missing elevation", () => {
  it("gives null elevation figures, never 0, when the file has no elevation", () => {
    const stats = computeTrailStats([meridianLine(10, 10)]);
    expect(stats.lengthM).toBeGreaterThan(0);
    for (const key of ["ascentM", "descentM", "avgGradePct", "maxGradePct", "minElevationM", "maxElevationM"] as const) {
      expect(stats[key]).toBeNull();
    }
  });

  it("treats partial elevation as none", () => {
    const segment = meridianLine(10, 10, (i) => 900 - i);
    segment[4] = segment[4].slice(0, 2);
    expect(computeTrailStats([segment]).ascentM).toBeNull();
  });
});
