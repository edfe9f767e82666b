import { AppError } from "@/lib/shared/errors";
import { cumulativeDistancesM } from "./geo";
import { hasElevation } from "./stats";
import type { Position } from "./types";

export type ProfilePoint = { dM: number; eleM: number };

const tenth = (x: number) => Math.round(x * 10) / 10;

/**
 * Elevation against distance along the trail, for a chart. Segments follow one another with no
 * distance added for the gap between them. Long trails are resampled at `maxPoints` evenly spaced
 * distances with linear interpolation. Empty when the trail has no elevation.
 */
export function elevationProfile(segments: Position[][], maxPoints = 300): ProfilePoint[] {
  if (!Number.isInteger(maxPoints) || maxPoints < 2) throw new AppError(400, "A profile needs at least two points.", "maxPoints");
  if (!hasElevation(segments)) return [];
  // Distance and elevation of every point in two flat arrays, not an object per point.
  const count = segments.reduce((n, segment) => n + segment.length, 0);
  const dM = new Float64Array(count);
  const eleM = new Float64Array(count);
  let start = 0;
  let at = 0;
  for (const segment of segments) {
    const along = cumulativeDistancesM(segment);
    for (let i = 0; i < segment.length; i++, at++) {
      dM[at] = start + along[i];
      eleM[at] = segment[i][2];
    }
    start += along[along.length - 1];
  }
  if (count <= maxPoints) return Array.from(dM, (d, i) => ({ dM: tenth(d), eleM: tenth(eleM[i]) }));

  const total = dM[count - 1];
  const sampled: ProfilePoint[] = [];
  let j = 0;
  for (let k = 0; k < maxPoints; k++) {
    const target = (total * k) / (maxPoints - 1);
    while (j < count - 2 && dM[j + 1] < target) j++;
    const t = dM[j + 1] > dM[j] ? Math.min(1, Math.max(0, (target - dM[j]) / (dM[j + 1] - dM[j]))) : 0;
    sampled.push({ dM: tenth(target), eleM: tenth(eleM[j] + t * (eleM[j + 1] - eleM[j])) });
  }
  return sampled;
}
