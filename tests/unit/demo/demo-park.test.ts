import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import gjv from "geojson-validation";
import { describe, expect, it } from "vitest";
import { processTrailUpload } from "@/lib/trails/pure";
import { trailMetadataSchema } from "@/lib/trails/pure/schemas";

// The demo park is invented (data/demo-park, made by scripts/generate-demo-trails.ts); these tests
// check that its files pass our own rules, not that they match any real place.
const DIR = path.resolve(__dirname, "../../../data/demo-park");
const park = JSON.parse(readFileSync(path.join(DIR, "park.json"), "utf8"));
const trails = (JSON.parse(readFileSync(path.join(DIR, "trails.json"), "utf8")) as Array<Record<string, string>>).map((t) => ({
  ...trailMetadataSchema.parse({ name: t.name, difficulty: t.difficulty, kind: t.kind, direction: t.direction }),
  file: t.file,
}));
const upload = (file: string) => processTrailUpload({ bytes: readFileSync(path.join(DIR, "trails", file)), filename: file, parkCenter: park.center });

describe("demo park: Harrow Ridge Bike Park (fictional)", () => {
  it("is labelled fictional and has valid RFC 7946 map layers", () => {
    expect(park).toMatchObject({ slug: "harrow-ridge", fictional: true, timeZone: "America/Los_Angeles", baseElevationM: 620, summitElevationM: 1340 });
    expect(park.name).toBe("Harrow Ridge Bike Park");
    for (const layer of ["boundary", "lifts", "landmarks"]) expect(gjv.valid(park.mapLayers[layer], true)).toEqual([]);
    expect(park.mapLayers.boundary.features[0].geometry.type).toBe("Polygon");
  });

  it("lists every trail file, half GPX and half GeoJSON, covering every difficulty and kind", () => {
    expect(trails.map((t) => t.file).sort()).toEqual(readdirSync(path.join(DIR, "trails")).sort());
    expect(trails.filter((t) => t.file.endsWith(".gpx"))).toHaveLength(trails.length / 2);
    expect(new Set(trails.map((t) => t.difficulty)).size).toBe(5);
    expect(new Set(trails.map((t) => t.kind)).size).toBe(6);
  });

  for (const trail of trails) {
    it(`${trail.file} passes parseTrailFile and runs between base and summit`, () => {
      const { parsed, stats, features } = upload(trail.file);
      expect(parsed.warnings).toEqual([]);
      expect(parsed.name).toBe(trail.name);
      expect(stats.minElevationM).toBeGreaterThanOrEqual(park.baseElevationM - 5);
      expect(stats.maxElevationM).toBeLessThanOrEqual(park.summitElevationM + 5);
      expect(features.length).toBeGreaterThan(0);
      expect(features.every((f) => f.kind !== "unknown" && f.offsetM < 10)).toBe(true);
      const [first, last] = [parsed.segments[0][0][2], parsed.segments.at(-1)!.at(-1)![2]];
      expect(trail.direction === "uphill" ? last > first : last < first).toBe(true);
    });
  }

  it("gets a suggested difficulty that mostly agrees with the intended rating (at least 8 of 10)", () => {
    const agreeing = trails.filter((t) => upload(t.file).suggestedDifficulty === t.difficulty);
    expect(agreeing.length).toBeGreaterThanOrEqual(8);
  });
});
