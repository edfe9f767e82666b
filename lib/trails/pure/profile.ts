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
  const full: ProfilePoint[] = [];
  let start = 0;
  for (const segment of segments) {
    const along = cumulativeDistancesM(segment);
    for (let i = 0; i < segment.length; i++) full.push({ dM: start + along[i], eleM: segment[i][2] });
    start += along[along.length - 1];
  }
  if (full.length <= maxPoints) return full.map((p) => ({ dM: tenth(p.dM), eleM: tenth(p.eleM) }));

  const total = full[full.length - 1].dM;
  const sampled: ProfilePoint[] = [];
  let j = 0;
  for (let k = 0; k < maxPoints; k++) {
    const target = (total * k) / (maxPoints - 1);
    while (j < full.length - 2 && full[j + 1].dM < target) j++;
    const a = full[j];
    const b = full[j + 1];
    const t = b.dM > a.dM ? Math.min(1, Math.max(0, (target - a.dM) / (b.dM - a.dM))) : 0;
    sampled.push({ dM: tenth(target), eleM: tenth(a.eleM + t * (b.eleM - a.eleM)) });
  }
  return sampled;
}
