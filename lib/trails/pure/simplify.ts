import { simplify } from "@turf/turf";
import type { LineString, MultiLineString } from "geojson";
import { METRES_PER_DEGREE, SIMPLIFY_TOLERANCE_M } from "./limits";
import type { Position } from "./types";

/**
 * A lighter line for the map (Douglas–Peucker through turf.simplify, elevation kept on the points
 * that remain). Turf works in degrees, so the tolerance is converted with the length of a degree
 * of latitude; east–west a degree is shorter (× cos latitude), so the real tolerance there is
 * smaller, never larger, than asked. Expects segments as parseTrailFile returns them.
 */
export function simplifyLine(segments: Position[][], toleranceM = SIMPLIFY_TOLERANCE_M): LineString | MultiLineString {
  // Turf rewrites the coordinate arrays it is given (mutate) but never the positions in them, so
  // copying the arrays is enough; cloning every position of a large trail cost more than simplifying.
  const geometry: LineString | MultiLineString =
    segments.length === 1 ? { type: "LineString", coordinates: segments[0].slice() } : { type: "MultiLineString", coordinates: segments.map((s) => s.slice()) };
  return simplify(geometry, { tolerance: toleranceM / METRES_PER_DEGREE, highQuality: false, mutate: true });
}
