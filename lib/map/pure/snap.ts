import { nearestPointOnLine } from "@turf/turf";
import type { LineString, MultiLineString } from "geojson";

/** A built feature dragged further than this from its trail is refused rather than snapped. */
export const MAX_SNAP_OFFSET_M = 100;

export type SnappedPoint = { lon: number; lat: number; distanceAlongM: number; offsetM: number };

/**
 * The nearest point on a trail's line to where staff dropped a feature (turf.nearestPointOnLine,
 * great-circle distances on Turf's sphere), with its distance from the start of the trail. For a
 * line in several segments the gaps between them are not counted, as when the trail was uploaded.
 */
export function snapToTrail(line: LineString | MultiLineString, lon: number, lat: number): SnappedPoint {
  const nearest = nearestPointOnLine(line, [lon, lat], { units: "meters" });
  const [snappedLon, snappedLat] = nearest.geometry.coordinates;
  return { lon: snappedLon, lat: snappedLat, distanceAlongM: nearest.properties.totalDistance, offsetM: nearest.properties.pointDistance };
}
