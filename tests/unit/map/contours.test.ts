import { readFileSync } from "node:fs";
import path from "node:path";
import { distance } from "@turf/turf";
import gjv from "geojson-validation";
import { describe, expect, it } from "vitest";
import { contourLines } from "@/lib/map/pure/contours";
import { demoContours, demoElevationModel, demoRoads } from "@/scripts/demo/map-layers";
import { METRES_PER_DEGREE } from "@/lib/trails/pure/limits";

const DIR = path.resolve(__dirname, "../../../data/demo-park");
const park = JSON.parse(readFileSync(path.join(DIR, "park.json"), "utf8"));
const vertices = (fc: ReturnType<typeof contourLines>) => fc.features.flatMap((f) => f.geometry.coordinates.flat().map((p) => ({ level: f.properties.elevationM, p })));

describe("contour lines from an elevation model", () => {
  // Computed from the definition of a contour: on a plane rising 0.1 m per metre eastwards, the
  // 20 m contours are north–south lines 200 m apart, exactly where 1000 + 0.1·x equals the level.
  it("traces a tilted plane's contours as straight lines at the predicted places", () => {
    const [west, lat0] = [8.5, 46.8];
    const metresPerLon = METRES_PER_DEGREE * Math.cos((lat0 * Math.PI) / 180);
    const plane = (lon: number) => 1000 + 0.1 * (lon - west) * metresPerLon;
    const fc = contourLines({ bbox: [west, lat0, 8.52, 46.81], cellSizeM: 50, intervalM: 20, indexEveryM: 100, elevationAt: (lon) => plane(lon) });
    expect(fc.features.map((f) => f.properties.elevationM)).toEqual([1020, 1040, 1060, 1080, 1100, 1120, 1140]);
    for (const { level, p } of vertices(fc)) {
      const expectedLon = west + ((level - 1000) / 0.1) / metresPerLon;
      expect(Math.abs(p[0] - expectedLon) * metresPerLon).toBeLessThan(1.5); // coordinates kept to 1e-5°
    }
    expect(fc.features.filter((f) => f.properties.index).map((f) => f.properties.elevationM)).toEqual([1100]);
  });

  // Computed: on a cone z = 2000 − r, the contour at level L is the circle of radius 2000 − L.
  it("traces a cone's contours as circles of the predicted radius", () => {
    const centre: [number, number] = [8.51, 46.805];
    const fc = contourLines({ bbox: [8.497, 46.796, 8.523, 46.814], cellSizeM: 40, intervalM: 100, indexEveryM: 500, elevationAt: (lon, lat) => 2000 - distance(centre, [lon, lat], { units: "meters" }) });
    const radii = vertices(fc).filter(({ level }) => level <= 1800);
    expect(radii.length).toBeGreaterThan(100);
    for (const { level, p } of radii) expect(Math.abs(distance(centre, p, { units: "meters" }) - (2000 - level))).toBeLessThan(2);
  });
});

describe("the demo park's contours and roads (fictional, data/demo-park)", () => {
  const model = demoElevationModel(park);
  const fresh = demoContours(park);

  it("are deterministic, and the committed files are exactly what the generator makes", () => {
    expect(demoContours(park)).toEqual(fresh);
    expect(JSON.parse(readFileSync(path.join(DIR, "contours.geojson"), "utf8"))).toEqual(fresh);
    expect(JSON.parse(readFileSync(path.join(DIR, "roads.geojson"), "utf8"))).toEqual(demoRoads(park));
    expect(gjv.valid(fresh, true)).toEqual([]);
    expect(gjv.valid(demoRoads(park), true)).toEqual([]);
  });

  it("pass through the park's spot heights (summit, meadow, base)", () => {
    for (const feature of park.mapLayers.landmarks.features) {
      const [lon, lat] = feature.geometry.coordinates;
      expect(model(lon, lat)).toBeCloseTo(feature.properties.elevationM, 6);
    }
  });

  it("run every 20 m between base and summit, each line at its own height, every 100 m an index line", () => {
    const levels = fresh.features.map((f) => f.properties.elevationM);
    expect(levels.every((l) => l % 20 === 0)).toBe(true);
    expect(Math.max(...levels)).toBe(1320);
    expect(levels).toEqual([...levels].sort((a, b) => a - b));
    for (const f of fresh.features) expect(f.properties.index).toBe(f.properties.elevationM % 100 === 0);
    for (const { level, p } of vertices(fresh)) expect(Math.abs(model(p[0], p[1]) - level)).toBeLessThan(3);
  });
});
