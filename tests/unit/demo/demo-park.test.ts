import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import gjv from "geojson-validation";
import { describe, expect, it } from "vitest";
import { booleanPointInPolygon, distance, kinks, lineString } from "@turf/turf";
import { processTrailUpload } from "@/lib/trails/pure";
import { cumulativeDistancesM } from "@/lib/trails/pure/geo";
import { GRADE_WINDOW_M, METRES_PER_DEGREE } from "@/lib/trails/pure/limits";
import { tightTurns } from "@/lib/trails/pure/turns";
import { demoElevationModel, demoRoads } from "@/scripts/demo/map-layers";
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

  it("gets from the project's difficulty advice (IMBA Trail Difficulty Rating System grades) exactly its intended rating, every trail", () => {
    expect(trails.map((t) => [t.name, upload(t.file).suggestedDifficulty])).toEqual(trails.map((t) => [t.name, t.difficulty]));
  });
});

describe("demo park: trails laid along the terrain (fictional)", () => {
  const terrain = demoElevationModel(park);
  const boundary = park.mapLayers.boundary.features[0];
  const landmark = (name: string) => park.mapLayers.landmarks.features.find((f: { properties: { name: string } }) => f.properties.name === name).geometry.coordinates;
  const sideSlope = ([lon, lat]: number[]) => {
    const [dLon, dLat] = [2 / (METRES_PER_DEGREE * Math.cos((lat * Math.PI) / 180)), 2 / METRES_PER_DEGREE]; // 2 m either way
    return Math.hypot(terrain(lon + dLon, lat) - terrain(lon - dLon, lat), terrain(lon, lat + dLat) - terrain(lon, lat - dLat)) / 4;
  };

  for (const trail of trails) {
    const { parsed, stats, features } = upload(trail.file);
    it(`${trail.name}: far longer than the shortest trail accepted, inside the boundary, never crossing itself`, () => {
      expect(stats.lengthM).toBeGreaterThan(1000);
      for (const segment of parsed.segments) {
        expect(segment.every((p) => booleanPointInPolygon(p, boundary))).toBe(true);
        expect(kinks(lineString(segment)).features).toEqual([]);
      }
    });

    // Switchback radius: a few metres to about 10 m. Common practice, no published source.
    it(`${trail.name}: its switchbacks turn on a radius of a few metres (2 m at the tightest, nine in ten within 12 m)`, () => {
      const radii = parsed.segments.flatMap((s) => tightTurns(s)).map((t) => t.radiusM);
      if (trail.kind !== "downhill" || trail.difficulty !== "extreme") expect(radii.length).toBeGreaterThan(0);
      expect(radii.every((r) => r >= 2)).toBe(true);
      expect(radii.filter((r) => r <= 12).length).toBeGreaterThanOrEqual(0.9 * radii.length);
    });

    if (trail.kind === "flow" || trail.kind === "jump") {
      it(`${trail.name}: every berm stands at a turn of the trail`, () => {
        const turns = parsed.segments.flatMap((s) => tightTurns(s, { minAngleDeg: 60 })).map((t) => t.atM);
        const berms = features.filter((f) => f.kind === "berm");
        expect(berms.length).toBeGreaterThan(0);
        for (const berm of berms) expect(Math.min(...turns.map((at) => Math.abs(at - berm.distanceAlongM)))).toBeLessThan(15);
      });
    }

    if (trail.kind === "climb") {
      // IMBA, Trail Solutions (2004), sustainable grade: average grade ≤ 10 %, and the trail's grade
      // no more than half the grade of the side slope it crosses (the half rule).
      it(`${trail.name}: climbs at an average of at most 10 % and, over every 30 m, at most half the side slope`, () => {
        expect(stats.avgGradePct).toBeLessThanOrEqual(10);
        const line = parsed.segments[0];
        const along = cumulativeDistancesM(line);
        let checked = 0;
        for (let i = 0, j = 0; i < line.length; i++) {
          while (j < line.length - 1 && along[j] - along[i] < GRADE_WINDOW_M) j++;
          if (along[j] - along[i] < GRADE_WINDOW_M) break;
          const grade = (line[j][2] - line[i][2]) / (along[j] - along[i]);
          const slope = line.slice(i, j + 1).reduce((sum, p) => sum + sideSlope(p), 0) / (j - i + 1);
          expect(grade).toBeLessThanOrEqual(slope / 2);
          checked++;
        }
        expect(checked).toBeGreaterThan(100);
      });
    }
  }

  it("has its lifts from the base to the summit and to the meadow, and its service road inside the boundary up to the summit", () => {
    const lifts = Object.fromEntries(park.mapLayers.lifts.features.map((f: { properties: { name: string }; geometry: { coordinates: number[][] } }) => [f.properties.name, f.geometry.coordinates]));
    expect(lifts["Ridgeline Chair"]).toEqual([landmark("Base area"), landmark("Summit")]);
    expect(lifts["Meadow Tow"]).toEqual([landmark("Base area"), landmark("Meadow (tow top)")]);
    const service = demoRoads(park).features.find((f) => f.properties?.kind === "service")!.geometry.coordinates;
    expect(service.every((p) => booleanPointInPolygon(p, boundary))).toBe(true);
    expect(distance(service.at(-1)!, landmark("Summit"), { units: "meters" })).toBeLessThan(40);
  });
});
