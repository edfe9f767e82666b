import { AppError } from "@/lib/shared/errors";
import { snapFeatures, type SnappedFeature } from "./features";
import { cumulativeDistancesM, distanceM, formatDistance } from "./geo";
import type { LonLat, Position } from "./types";

/** A feature further than this from the line is almost certainly misplaced (or on another trail). */
export const MAX_FEATURE_OFFSET_M = 50;

/** Two features of the same kind this close are the same one (a re-upload of a file with its waypoints). */
export const SAME_FEATURE_WITHIN_M = 10;

export type PlacedPoint = { lon: number; lat: number; distanceAlongM: number; offsetM: number };

const usableSegments = (segments: Position[][]) => segments.filter((s) => s.length >= 2);
const seven = (x: number) => Math.round(x * 1e7) / 1e7;

/** Length of the trail, segment after segment, gaps not counted (as snapFeatures measures). */
export function trailLengthM(segments: Position[][]): number {
  return usableSegments(segments).reduce((sum, s) => sum + (cumulativeDistancesM(s).at(-1) ?? 0), 0);
}

/**
 * The point at a distance from the trail's start (segment gaps not counted), interpolated
 * between the two fixes around it. Fixes are metres apart, so a straight step is exact enough.
 */
export function pointAtDistance(segments: Position[][], distanceAlongM: number): [number, number] {
  const usable = usableSegments(segments);
  const totalM = trailLengthM(usable);
  if (usable.length === 0) throw new AppError(422, "The trail has no line to place a feature on.", "distanceAlongM");
  if (!(distanceAlongM >= 0) || distanceAlongM > totalM + 0.5) {
    throw new AppError(422, `The trail is ${formatDistance(totalM)} long; choose a distance between 0 and that.`, "distanceAlongM");
  }
  let remaining = Math.min(distanceAlongM, totalM);
  for (const segment of usable) {
    const cumulative = cumulativeDistancesM(segment);
    const segmentM = cumulative[cumulative.length - 1];
    if (remaining > segmentM) {
      remaining -= segmentM;
      continue;
    }
    let i = 0;
    while (i < cumulative.length - 2 && cumulative[i + 1] < remaining) i++;
    const stepM = cumulative[i + 1] - cumulative[i];
    const t = stepM > 0 ? (remaining - cumulative[i]) / stepM : 0;
    const [a, b] = [segment[i], segment[i + 1]];
    return [seven(a[0] + t * (b[0] - a[0])), seven(a[1] + t * (b[1] - a[1]))];
  }
  const last = usable[usable.length - 1].at(-1)!;
  return [last[0], last[1]];
}

/** A point moved onto the trail: where it lands, how far along, and how far off the line it was. */
export function snapPointToTrail(point: LonLat, segments: Position[][], trailName = "the trail"): PlacedPoint {
  const [snapped] = snapFeatures([{ lon: point.lon, lat: point.lat }], segments);
  if (!snapped) throw new AppError(422, "The trail has no line to place a feature on.", "lon");
  if (snapped.offsetM > MAX_FEATURE_OFFSET_M) {
    throw new AppError(
      422,
      `That point is ${formatDistance(snapped.offsetM)} from ${trailName}; a feature must lie within ${MAX_FEATURE_OFFSET_M} m of the line.`,
      "lon",
    );
  }
  const [lon, lat] = pointAtDistance(segments, snapped.distanceAlongM);
  return { lon, lat, distanceAlongM: snapped.distanceAlongM, offsetM: snapped.offsetM };
}

/** A place given either as a point (snapped) or as a distance from the start. */
export function placeOnTrail(place: { lon?: number; lat?: number; distanceAlongM?: number }, segments: Position[][], trailName?: string): PlacedPoint {
  if (place.lon !== undefined && place.lat !== undefined) return snapPointToTrail({ lon: place.lon, lat: place.lat }, segments, trailName);
  const distanceAlongM = place.distanceAlongM ?? 0;
  const [lon, lat] = pointAtDistance(segments, distanceAlongM);
  return { lon, lat, distanceAlongM, offsetM: 0 };
}

export type KeptFeature = { id: string; kind: string; lon: number; lat: number };

/**
 * When a trail gets a new line, features already recorded (some placed by hand) are kept and
 * measured again along the new line; the new file's waypoints are added unless they repeat a
 * kept feature of the same kind within a few metres. Nothing staff entered is lost.
 */
export function featuresForNewLine(kept: KeptFeature[], fromFile: SnappedFeature[], segments: Position[][]) {
  const remeasured = snapFeatures(kept.map((f) => ({ lon: f.lon, lat: f.lat, name: f.id })), segments).map((s) => ({
    id: s.name!,
    distanceAlongM: s.distanceAlongM,
    offsetM: s.offsetM,
  }));
  const added = fromFile.filter(
    (f) => !kept.some((k) => k.kind === f.kind && distanceM([k.lon, k.lat], [f.lon, f.lat]) <= SAME_FEATURE_WITHIN_M),
  );
  const farFromLine = remeasured.filter((r) => r.offsetM > MAX_FEATURE_OFFSET_M).length;
  return { remeasured, added, farFromLine };
}
