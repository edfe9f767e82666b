import { bbox as turfBbox } from "@turf/turf";
import type { FeatureCollection, LineString, Position } from "geojson";
import { METRES_PER_DEGREE } from "@/lib/trails/pure/limits";
import { contourLines } from "@/lib/map/pure/contours";
import { hillElevationModel } from "./terrain";

/**
 * Contours and access roads for the FICTIONAL demo park, made from its park.json (boundary and
 * the summit and base landmarks). Invented data; deterministic, so the committed files in
 * data/demo-park/ can be checked against a fresh run (tests/unit/map/contours.test.ts).
 */
export type DemoParkFile = {
  mapLayers: { boundary: FeatureCollection; landmarks: FeatureCollection };
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
  const bbox = turfBbox(park.mapLayers.boundary) as [number, number, number, number];
  return contourLines({ bbox, cellSizeM: s.cellSizeM, intervalM: s.intervalM, indexEveryM: s.indexEveryM, elevationAt: demoElevationModel(park) });
}

/** Offsets in metres (east, north) from a point, as longitude and latitude rounded to 5 decimals. */
function offset(from: { lon: number; lat: number }, eastM: number, northM: number): Position {
  const cosLat = Math.cos((from.lat * Math.PI) / 180);
  const round = (x: number) => Math.round(x * 1e5) / 1e5;
  return [round(from.lon + eastM / (cosLat * METRES_PER_DEGREE)), round(from.lat + northM / METRES_PER_DEGREE)];
}

/** An access road to the base from the south-east, and a switchback service road to the summit. */
export function demoRoads(park: DemoParkFile): FeatureCollection<LineString> {
  const base = landmark(park, "Base area");
  const summit = landmark(park, "Summit");
  const access: Position[] = [offset(base, 950, -620), offset(base, 560, -330), offset(base, 230, -160), offset(base, 60, -40)];
  // Service road: legs that swing 300 m either side of the base→summit line, seven times.
  const legs = 7;
  const service: Position[] = [offset(base, 60, -40)];
  const cosLat = Math.cos((base.lat * Math.PI) / 180);
  const [dx, dy] = [(summit.lon - base.lon) * cosLat * METRES_PER_DEGREE, (summit.lat - base.lat) * METRES_PER_DEGREE];
  const length = Math.hypot(dx, dy);
  for (let i = 1; i < legs; i++) {
    const t = i / legs;
    const side = (i % 2 === 0 ? 1 : -1) * 300;
    service.push(offset(base, dx * t + (-dy / length) * side, dy * t + (dx / length) * side));
  }
  service.push(offset(summit, 40, -30));
  return {
    type: "FeatureCollection",
    features: [
      { type: "Feature", properties: { name: "Harrow Ridge Road (fictional)", kind: "access" }, geometry: { type: "LineString", coordinates: access } },
      { type: "Feature", properties: { name: "Summit service road (fictional)", kind: "service" }, geometry: { type: "LineString", coordinates: service } },
    ],
  };
}
