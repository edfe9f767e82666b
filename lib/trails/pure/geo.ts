import type { Position } from "./types";

const EARTH_RADIUS_M = 6_371_008.8;
/** As Turf's degreesToRadians (angle normalised to ±360° first), so results match it bit for bit. */
const radians = (degrees: number) => ((degrees % 360) * Math.PI) / 180;

/**
 * Great-circle distance in metres: the haversine formula on a sphere of R = 6 371 008.8 m, written
 * exactly as Turf's `distance` (tests/unit/trails/geo.test.ts checks they agree), without building
 * a point object per call: a large trail measures hundreds of thousands of steps.
 */
export function distanceM(a: Position, b: Position): number {
  const dLat = radians(b[1] - a[1]);
  const dLon = radians(b[0] - a[0]);
  const h = Math.pow(Math.sin(dLat / 2), 2) + Math.pow(Math.sin(dLon / 2), 2) * Math.cos(radians(a[1])) * Math.cos(radians(b[1]));
  return 2 * Math.atan2(Math.sqrt(h), Math.sqrt(1 - h)) * EARTH_RADIUS_M;
}

// Stats, profile and feature placement all need these; a segment's points never change once
// parsed, so each segment array is measured once.
const cumulativeBySegment = new WeakMap<Position[], Float64Array>();

/** Distance from the start of a segment to each of its points, in metres (computed once per segment array). */
export function cumulativeDistancesM(segment: Position[]): Float64Array {
  const known = cumulativeBySegment.get(segment);
  if (known && known.length === segment.length) return known;
  const out = new Float64Array(segment.length);
  for (let i = 1; i < segment.length; i++) out[i] = out[i - 1] + distanceM(segment[i - 1], segment[i]);
  cumulativeBySegment.set(segment, out);
  return out;
}

/**
 * "740 m", "2.4 km", "8,123 km": how far, in words a ranger reads at a glance. Pass Math.ceil
 * when the figure is over a limit, so 500.4 m never reads as the 500 m limit itself.
 */
export function formatDistance(metres: number, round: (x: number) => number = Math.round): string {
  if (metres < 1000) return `${round(metres)} m`;
  const km = metres / 1000;
  return km < 100 ? `${km.toFixed(1).replace(/\.0$/, "")} km` : `${Math.round(km).toLocaleString("en-US")} km`;
}
