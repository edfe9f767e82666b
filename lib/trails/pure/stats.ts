import { AppError } from "@/lib/shared/errors";
import type { TrailStats } from "@/lib/trails/pure/schemas";
import { cumulativeDistancesM } from "./geo";
import { climbAndDescent, steepestGradePct } from "./elevation";
import type { Position } from "./types";

export type { TrailStats };

/** True when every point carries an elevation; partial elevation is treated as none. */
export function hasElevation(segments: Position[][]): boolean {
  return segments.every((segment) => segment.every((p) => p.length > 2 && Number.isFinite(p[2])));
}

function boundingBox(segments: Position[][]): [number, number, number, number] {
  let [minLon, minLat, maxLon, maxLat] = [Infinity, Infinity, -Infinity, -Infinity];
  for (const segment of segments) {
    for (let i = 0; i < segment.length; i++) {
      const lon = segment[i][0];
      const lat = segment[i][1];
      if (lon < minLon) minLon = lon;
      if (lon > maxLon) maxLon = lon;
      if (lat < minLat) minLat = lat;
      if (lat > maxLat) maxLat = lat;
    }
  }
  return [minLon, minLat, maxLon, maxLat];
}

/**
 * Length, climb, descent, grades, elevation range, bounding box and point count of a trail.
 * Each segment is measured on its own (a GPX trkseg break is a signal loss, never bridged).
 * Average grade = max(ascent, descent) ÷ length × 100: the trail's total vertical in its main
 * direction over its length. Elevation figures are null, never 0, when the file has no elevation.
 */
export function computeTrailStats(segments: Position[][]): TrailStats {
  const pointCount = segments.reduce((n, s) => n + s.length, 0);
  if (pointCount === 0) throw new AppError(422, "A trail needs at least one line.", "file");
  const withElevation = hasElevation(segments);
  let lengthM = 0;
  let ascentM = 0;
  let descentM = 0;
  let maxGrade: number | null = null;
  let minElevationM = Infinity;
  let maxElevationM = -Infinity;

  for (const segment of segments) {
    const distances = cumulativeDistancesM(segment);
    lengthM += distances[distances.length - 1] ?? 0;
    if (!withElevation) continue;
    const elevations = segment.map((p) => p[2]);
    const change = climbAndDescent(elevations);
    ascentM += change.ascentM;
    descentM += change.descentM;
    const steepest = steepestGradePct(distances, elevations);
    if (steepest !== null) maxGrade = Math.max(maxGrade ?? 0, steepest);
    for (const e of elevations) {
      if (e < minElevationM) minElevationM = e;
      if (e > maxElevationM) maxElevationM = e;
    }
  }

  const bbox = boundingBox(segments);
  if (!withElevation) {
    return { lengthM, ascentM: null, descentM: null, avgGradePct: null, maxGradePct: null, minElevationM: null, maxElevationM: null, bbox, pointCount };
  }
  const avgGradePct = lengthM > 0 ? (Math.max(ascentM, descentM) / lengthM) * 100 : null;
  return { lengthM, ascentM, descentM, avgGradePct, maxGradePct: maxGrade, minElevationM, maxElevationM, bbox, pointCount };
}
