import { kinks, lineString } from "@turf/turf";
import { describe, expect, it } from "vitest";
import { processTrailUpload } from "@/lib/trails/pure/process-upload";
import { tightTurns } from "@/lib/trails/pure/turns";
import { SECOND_PARK_TRAILS, secondParkRoad, secondParkTrailFile, secondParkTerrain } from "@/scripts/demo/second-park";
import { DROP } from "@/scripts/demo/second-park";

// The second demo park's ratings agree with the project's own difficulty advice (IMBA Trail
// Difficulty Rating System grades, lib/trails/pure/difficulty.ts), as a crew would check them.
describe("the second demo park's trails, laid on its terrain", () => {
  for (const [index, trail] of SECOND_PARK_TRAILS.entries()) {
    it(`${trail.name} reads as ${trail.difficulty} and is a plausible descent`, () => {
      const result = processTrailUpload({ ...secondParkTrailFile(trail, index), parkCenter: { lon: -105.61, lat: 39.02 } });
      const [line] = result.parsed.segments;
      expect(result.suggestedDifficulty).toBe(trail.difficulty);
      expect(result.stats.avgGradePct).toBeCloseTo(trail.gradePct, 0);
      expect(result.stats.descentM).toBeGreaterThan(500);
      expect(result.stats.lengthM).toBeGreaterThan(1000);
      expect(kinks(lineString(line)).features).toEqual([]);
      // Switchback radius: a few metres to about 10 m. Common practice, no published source.
      const radii = tightTurns(line).map((t) => t.radiusM);
      expect(radii.length).toBeGreaterThan(0);
      expect(radii.every((r) => r >= 2)).toBe(true);
      expect(radii.filter((r) => r <= 12).length).toBeGreaterThanOrEqual(0.9 * radii.length);
      // The elevations are the terrain's (graded within a few metres), so contours drawn from it agree.
      expect(Math.max(...line.map((p) => Math.abs(p[2] - secondParkTerrain(p[0], p[1]))))).toBeLessThan(6);
    });
  }

  it("has a shuttle road from the car park up to the drop, never crossing itself", () => {
    const road = secondParkRoad();
    expect(Math.hypot((road.at(-1)![0] - DROP.lon) * 86_500, (road.at(-1)![1] - DROP.lat) * 111_195)).toBeLessThan(40);
    expect(kinks(lineString(road)).features).toEqual([]);
  });
});
