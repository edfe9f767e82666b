import { bbox } from "@turf/turf";
import type { FeatureCollection } from "geojson";
export type Bounds = [[west: number, south: number], [east: number, north: number]];
type Box = { minLon: number; minLat: number; maxLon: number; maxLat: number };

/** The box around every trail (the map opens fitted to it), or null when the park has none yet. */
export function trailBounds(trails: Box[]): Bounds | null {
  if (trails.length === 0) return null;
  const west = Math.min(...trails.map((t) => t.minLon));
  const south = Math.min(...trails.map((t) => t.minLat));
  const east = Math.max(...trails.map((t) => t.maxLon));
  const north = Math.max(...trails.map((t) => t.maxLat));
  return [
    [west, south],
    [east, north],
  ];
}

/** Without trails, a box of about ±1 km around the park's centre. */
export function boundsAround(lon: number, lat: number, halfSpanDeg = 0.01): Bounds {
  return [
    [lon - halfSpanDeg / Math.cos((lat * Math.PI) / 180), lat - halfSpanDeg],
    [lon + halfSpanDeg / Math.cos((lat * Math.PI) / 180), lat + halfSpanDeg],
  ];
}

/** The box around a park's ground (boundary, lifts, landmarks…), or null when it has none: a new park's map opens on it. */
export function collectionBounds(collection: FeatureCollection): Bounds | null {
  if (collection.features.length === 0) return null;
  const [west, south, east, north] = bbox(collection);
  return [
    [west, south],
    [east, north],
  ];
}

/** The smallest box holding every box given (nulls skipped), or null when none is. */
export function unionBounds(...boxes: (Bounds | null)[]): Bounds | null {
  const present = boxes.filter((b): b is Bounds => b !== null);
  if (present.length === 0) return null;
  return [
    [Math.min(...present.map((b) => b[0][0])), Math.min(...present.map((b) => b[0][1]))],
    [Math.max(...present.map((b) => b[1][0])), Math.max(...present.map((b) => b[1][1]))],
  ];
}
