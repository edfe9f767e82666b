import { contourLines } from "@/lib/map/pure/contours";
import { toGeoJson } from "@/lib/trails/pure/export-geojson";
import type { Difficulty, TrailKind } from "@/lib/trails/pure/schemas";
import { hillElevationModel } from "@/scripts/demo/terrain";
import { bowedLane, routeToAverage, routeTrail, type RouteSpec } from "@/scripts/demo/trail-router";

/** The second demo park's trails (fictional): from the shuttle drop to the car park. */
export const DROP = { lon: -105.622, lat: 39.031, ele: 2980 }; // where the shuttle leaves riders
export const LOT = { lon: -105.598, lat: 39.011, ele: 2450 }; // car park and pick-up
const SHOULDER = { lon: -105.6112, lat: 39.022, elevationM: 2740 }; // a spot height on the spur between them (invented)

/** Its synthetic ground (invented): a spur falling from the drop to the car park. */
export const secondParkTerrain = hillElevationModel({
  summit: { lon: DROP.lon, lat: DROP.lat, elevationM: DROP.ele }, shoulder: SHOULDER, base: { lon: LOT.lon, lat: LOT.lat, elevationM: LOT.ele },
  floorM: 2390, ridgeRatio: 0.7, gullyM: 18, seed: 3301,
});

type Lay = Pick<RouteSpec, "gradeVariation" | "halfWidthM" | "turnRadiusM" | "bendRadiusM" | "meanderDeg" | "steepestPct">;

/** Each rating is the one the upload's own difficulty advice gives the line (tests/unit/demo/second-park.test.ts). */
export const SECOND_PARK_TRAILS: { name: string; difficulty: Difficulty; kind: TrailKind; gradePct: number; bulgeM: number; lay: Lay }[] = [
  { name: "Ashfall Glide", difficulty: "easy", kind: "flow", gradePct: 4.2, bulgeM: 380, lay: { gradeVariation: 0.2, halfWidthM: 110, turnRadiusM: 7, bendRadiusM: 22, meanderDeg: 18, steepestPct: 12 } },
  { name: "Obsidian Rake", difficulty: "difficult", kind: "technical", gradePct: 13, bulgeM: -260, lay: { gradeVariation: 0.35, halfWidthM: 35, turnRadiusM: 4.5, bendRadiusM: 12, meanderDeg: 25, steepestPct: 30 } },
  { name: "Pumice Run", difficulty: "intermediate", kind: "jump", gradePct: 8.5, bulgeM: 90, lay: { gradeVariation: 0.3, halfWidthM: 50, turnRadiusM: 6, bendRadiusM: 18, meanderDeg: 20, steepestPct: 22 } },
];

/** One trail as the GeoJSON file a crew would upload, laid on the park's terrain (deterministic: seeded). */
export function secondParkTrailFile(trail: (typeof SECOND_PARK_TRAILS)[number], index: number) {
  const lane = bowedLane([DROP.lon, DROP.lat], [LOT.lon, LOT.lat], trail.bulgeM);
  const line = routeToAverage({ seed: 3100 + index, lane, direction: "down", spacingM: 5, noiseM: 0.1, ...trail.lay }, trail.gradePct, secondParkTerrain);
  const bytes = Buffer.from(JSON.stringify(toGeoJson({ name: trail.name, segments: [line], waypoints: [] })));
  return { bytes, filename: `${trail.name.toLowerCase().replace(/\s+/g, "-")}.geojson` };
}

/** The shuttle road from the car park to the drop, laid on the same terrain: at most 10 %, 12 m hairpins. */
export function secondParkRoad(): number[][] {
  const line = routeTrail(
    { seed: 3199, lane: bowedLane([LOT.lon, LOT.lat], [DROP.lon, DROP.lat], 520), direction: "up", gradePct: 9, gradeVariation: 0.15, halfWidthM: 110, turnRadiusM: 12, bendRadiusM: 40, meanderDeg: 4, spacingM: 25, noiseM: 0, steepestPct: 12 },
    secondParkTerrain,
  );
  return line.map(([lon, lat]) => [Math.round(lon * 1e5) / 1e5, Math.round(lat * 1e5) / 1e5]);
}

/** Its contours, from the same terrain, over the park's boundary box. */
export const secondParkContours = (bbox: [number, number, number, number]) =>
  contourLines({ bbox, cellSizeM: 40, intervalM: 20, indexEveryM: 100, elevationAt: secondParkTerrain });
