import { bbox as turfBbox } from "@turf/turf";
import type { FeatureCollection, LineString, Position } from "geojson";
import { METRES_PER_DEGREE } from "@/lib/trails/pure/limits";
import { contourLines } from "@/lib/map/pure/contours";
import { hillElevationModel } from "./terrain";
import { bowedLane, routeTrail } from "./trail-router";

/**
 * Contours and access roads for the FICTIONAL demo park, made from its park.json (boundary and
 * the summit and base landmarks). Invented data; deterministic, so the committed files in
 * data/demo-park/ can be checked against a fresh run (tests/unit/map/contours.test.ts).
 */
export type DemoParkFile = {
  mapLayers: { boundary?: FeatureCollection; landmarks: FeatureCollection };
};

export const DEMO_CONTOUR_SETTINGS = { cellSizeM: 40, intervalM: 20, indexEveryM: 100, floorM: 560, ridgeRatio: 0.62, gullyM: 28, seed: 4401 } as const;

function landmark(park: DemoParkFile, name: string) {
  const feature = park.mapLayers.landmarks.features.find((f) => f.properties?.name === name);
  if (!feature || feature.geometry.type !== "Point") throw new Error(`park.json has no landmark "${name}"`);
  const [lon, lat] = feature.geometry.coordinates;
  return { lon, lat, elevationM: Number(feature.properties?.elevationM) };
}

export function demoElevationModel(park: DemoParkFile) {
  const s = DEMO_CONTOUR_SETTINGS;
  return hillElevationModel({ summit: landmark(park, "Summit"), shoulder: landmark(park, "Meadow (tow top)"), base: landmark(park, "Base area"), floorM: s.floorM, ridgeRatio: s.ridgeRatio, gullyM: s.gullyM, seed: s.seed });
}

export function demoContours(park: DemoParkFile) {
  const s = DEMO_CONTOUR_SETTINGS;
  if (!park.mapLayers.boundary) throw new Error("park.json has no boundary");
  const bbox = turfBbox(park.mapLayers.boundary) as [number, number, number, number];
  return contourLines({ bbox, cellSizeM: s.cellSizeM, intervalM: s.intervalM, indexEveryM: s.indexEveryM, elevationAt: demoElevationModel(park) });
}

/** Offsets in metres (east, north) from a point, as longitude and latitude rounded to 5 decimals. */
function offset(from: { lon: number; lat: number }, eastM: number, northM: number): Position {
  const cosLat = Math.cos((from.lat * Math.PI) / 180);
  const round = (x: number) => Math.round(x * 1e5) / 1e5;
  return [round(from.lon + eastM / (cosLat * METRES_PER_DEGREE)), round(from.lat + northM / METRES_PER_DEGREE)];
}

/**
 * An access road to the base from the south-east, and a service road climbing to the summit,
 * laid on the terrain as the trails are: at most 10 % with hairpins of 12 m radius, on its own
 * lane south-west of the chairlift.
 */
export function demoRoads(park: DemoParkFile): FeatureCollection<LineString> {
  const base = landmark(park, "Base area");
  const summit = landmark(park, "Summit");
  const access: Position[] = [offset(base, 950, -620), offset(base, 560, -330), offset(base, 230, -160), offset(base, 60, -40)];
  const line = routeTrail(
    { seed: 77, lane: bowedLane([base.lon, base.lat], [summit.lon, summit.lat], 660), direction: "up", gradePct: 9, gradeVariation: 0.15, halfWidthM: 110, turnRadiusM: 12, bendRadiusM: 40, meanderDeg: 4, spacingM: 25, noiseM: 0, steepestPct: 12 },
    demoElevationModel(park),
  );
  const service = line.map(([lon, lat]) => [Math.round(lon * 1e5) / 1e5, Math.round(lat * 1e5) / 1e5]);
  return {
    type: "FeatureCollection",
    features: [
      { type: "Feature", properties: { name: "Harrow Ridge Road (fictional)", kind: "access" }, geometry: { type: "LineString", coordinates: access } },
      { type: "Feature", properties: { name: "Summit service road (fictional)", kind: "service" }, geometry: { type: "LineString", coordinates: service } },
    ],
  };
}
