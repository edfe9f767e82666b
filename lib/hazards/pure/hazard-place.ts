/**
 * Where a hazard is: a point checked against the park's area, or a point computed a given
 * distance along a trail's line (turf.along, haversine on Turf's sphere).
 */
import { along, distance, length, lineString } from "@turf/turf";
import { AppError } from "@/lib/shared/errors";
import { formatDistance } from "@/lib/trails/pure/geo";
import type { LonLat } from "@/lib/trails/pure/types";

/** A pin further than this from the park's centre is refused as a typo or swapped coordinates. */
export const MAX_HAZARD_DISTANCE_FROM_PARK_M = 20_000;

const END_TOLERANCE_M = 1;

export type { LonLat };

export function assertWithinPark(point: LonLat, center: LonLat, maxM = MAX_HAZARD_DISTANCE_FROM_PARK_M): void {
  const away = distance([center.lon, center.lat], [point.lon, point.lat], { units: "meters" });
  if (away > maxM) {
    throw new AppError(422, `That point is ${formatDistance(away, Math.ceil)} from the park; a hazard must be within ${formatDistance(maxM)} of it. Check the coordinates (longitude first, then latitude).`, "lon");
  }
}

/**
 * The point `distanceM` metres from the start of a trail's line. Segments of a MultiLineString
 * follow one another without bridging the gap between them (a lost GPS signal is no trail).
 */
export function pointAlongTrail(geometry: GeoJSON.LineString | GeoJSON.MultiLineString, distanceM: number): LonLat {
  const segments = geometry.type === "LineString" ? [geometry.coordinates] : geometry.coordinates;
  let remaining = distanceM;
  let total = 0;
  for (const coordinates of segments) {
    if (coordinates.length < 2) continue;
    const line = lineString(coordinates.map((c) => [c[0], c[1]]));
    const segmentM = length(line, { units: "meters" });
    total += segmentM;
    if (remaining <= segmentM) {
      const [lon, lat] = along(line, remaining, { units: "meters" }).geometry.coordinates;
      return { lon, lat };
    }
    remaining -= segmentM;
  }
  // Within a metre of the end (rounding in the caller's figure) is the end.
  const last = segments.at(-1)?.at(-1);
  if (last && remaining <= END_TOLERANCE_M) return { lon: last[0], lat: last[1] };
  throw new AppError(422, `The trail is ${formatDistance(total)} long; choose a distance up to that.`, "distanceAlongM");
}
