import { describe, expect, it } from "vitest";
import { processTrailUpload } from "@/lib/trails/pure/process-upload";
import { SECOND_PARK_TRAILS, secondParkTrailFile } from "@/scripts/demo/second-park";

// The second demo park's ratings agree with the project's own difficulty advice (IMBA Trail
// Difficulty Rating System grades, lib/trails/pure/difficulty.ts), as a crew would check them.
describe("the second demo park's trails", () => {
  for (const [index, trail] of SECOND_PARK_TRAILS.entries()) {
    it(`${trail.name} reads as ${trail.difficulty} and is a plausible descent`, () => {
      const result = processTrailUpload({ ...secondParkTrailFile(trail, index), parkCenter: { lon: -105.61, lat: 39.02 } });
      expect(result.suggestedDifficulty).toBe(trail.difficulty);
      expect(result.stats.avgGradePct).toBeCloseTo(trail.gradePct, 0);
      expect(result.stats.descentM).toBeGreaterThan(500);
    });
  }
});
