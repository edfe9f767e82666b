import { distance } from "@turf/turf";
import type { Position } from "./types";

/** Great-circle distance in metres: Turf's haversine on a sphere of R = 6 371 008.8 m. */
export function distanceM(a: Position, b: Position): number {
  return distance(a, b, { units: "meters" });
}

/** Distance from the start of a segment to each of its points, in metres. */
export function cumulativeDistancesM(segment: Position[]): Float64Array {
  const out = new Float64Array(segment.length);
  for (let i = 1; i < segment.length; i++) out[i] = out[i - 1] + distanceM(segment[i - 1], segment[i]);
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
