import { AppError } from "@/lib/shared/errors";
import { cumulativeDistancesM, distanceM, formatDistance } from "./geo";
import { TRAIL_LIMITS } from "./limits";
import type { LonLat, Position, RawTrail, TrailWaypoint } from "./types";

const fail = (message: string) => new AppError(422, message, "file");

/** Whitespace collapsed and cut to the length a name is stored with. */
const tidyName = (name?: string) => name?.replace(/\s+/g, " ").trim().slice(0, TRAIL_LIMITS.maxNameLength).trim();

export function singlePointError(): AppError {
  return fail("The file holds a single point, not a trail. A trail needs a line of at least two points.");
}

export function tooManyPoints(): AppError {
  return new AppError(
    413,
    `The file has more than ${TRAIL_LIMITS.maxPoints.toLocaleString("en-US")} points. Thin the recording (one point every few metres is plenty) and upload it again.`,
    "file",
  );
}

function where(segment: number, point: number, segmentCount: number): string {
  return segmentCount > 1 ? `Point ${point + 1} of segment ${segment + 1}` : `Point ${point + 1}`;
}

const inRange = (lon: number, lat: number) => Math.abs(lat) <= 90 && Math.abs(lon) <= 180;

/**
 * What is wrong with a position ("has …"), or null. The caller names the point only on a refusal:
 * a large file has 200,000 points, and naming each one cost more than checking it.
 */
function positionProblem(lon: number, lat: number, ele: number | undefined): string | null {
  if (!Number.isFinite(lon) || !Number.isFinite(lat)) return "has a coordinate that is not a number.";
  if (!inRange(lon, lat)) {
    const swapHint = inRange(lat, lon) ? " Latitude and longitude look swapped (GeoJSON lists longitude first)." : "";
    const what = Math.abs(lat) > 90 ? `latitude ${lat}, outside −90…90` : `longitude ${lon}, outside −180…180`;
    return `has ${what}.${swapHint}`;
  }
  if (ele !== undefined) {
    if (!Number.isFinite(ele)) return "has an elevation that is not a number.";
    if (ele < TRAIL_LIMITS.minElevationM || ele > TRAIL_LIMITS.maxElevationM) {
      return `has elevation ${ele} m, which is not plausible (expected ${TRAIL_LIMITS.minElevationM}…${TRAIL_LIMITS.maxElevationM} m).`;
    }
  }
  return null;
}

function nearestDistanceM(segments: Position[][], center: LonLat, swap: boolean): number {
  const target = [center.lon, center.lat];
  let best = Infinity;
  for (const segment of segments) {
    for (const p of segment) {
      const d = distanceM(swap ? [p[1], p[0]] : p, target);
      if (d < best) best = d;
    }
  }
  return best;
}

/** Refuses a line far from the park, saying how far, and recognises latitude and longitude swapped. */
function checkNearPark(segments: Position[][], center: LonLat): void {
  const limit = TRAIL_LIMITS.maxDistanceFromParkM;
  // One point near enough settles it; the nearest distance is measured only to explain a refusal.
  const target = [center.lon, center.lat];
  if (segments.some((segment) => segment.some((p) => distanceM(p, target) <= limit))) return;
  const distance = nearestDistanceM(segments, center, false);
  const swappedFits = segments.every((s) => s.every((p) => inRange(p[1], p[0])));
  if (swappedFits && nearestDistanceM(segments, center, true) <= limit) {
    throw fail("Latitude and longitude look swapped: with them exchanged, the line lies in the park. Export the file again with longitude first (GeoJSON) or with lat and lon in their own attributes (GPX).");
  }
  throw fail(`The trail is ${formatDistance(distance)} from the park's location (the limit is ${formatDistance(limit)}). Check that this is the right file and that the park's location is set correctly.`);
}

/**
 * Refuses an impossible jump between neighbouring points; returns the line's whole length. Measured
 * with the cumulative distances stats, profile and features reuse (one pass over the points); a
 * step near the limit is measured again on its own, so the refusal and its figure are exact.
 */
function checkSteps(segments: Position[][]): number {
  let lengthM = 0;
  const maxStepM = TRAIL_LIMITS.maxStepM;
  segments.forEach((segment, s) => {
    const along = cumulativeDistancesM(segment);
    for (let i = 1; i < segment.length; i++) {
      if (along[i] - along[i - 1] <= maxStepM - 1e-6) continue;
      const step = distanceM(segment[i - 1], segment[i]);
      if (step > maxStepM) {
        throw fail(
          `Points ${i} and ${i + 1}${segments.length > 1 ? ` of segment ${s + 1}` : ""} are ${formatDistance(step, Math.ceil)} apart; a recording never jumps that far in one step (limit ${formatDistance(maxStepM)}). Remove the stray point or split the line there.`,
        );
      }
    }
    lengthM += along[along.length - 1];
  });
  return lengthM;
}

function refuseTooShort(lengthM: number): void {
  if (lengthM >= TRAIL_LIMITS.minTrailLengthM) return;
  throw fail(
    `The line is ${formatDistance(lengthM)} long, too short for a trail (the shortest accepted is ${formatDistance(TRAIL_LIMITS.minTrailLengthM)}). Check that the recording ran for the whole trail.`,
  );
}

/** A device without an altimeter writes 0 for every elevation: that is no elevation, not a flat trail. */
function dropZeroElevations(segments: Position[][], warnings: string[]): Position[][] {
  const allZero = segments.every((segment) => segment.every((p) => p.length > 2 && p[2] === 0));
  if (!allZero) return segments;
  warnings.push("Every elevation in the file is 0 m, as devices without an altimeter write; the trail was read without elevation.");
  return segments.map((segment) => segment.map((p) => [p[0], p[1]]));
}

function hasLength(segment: Position[]): boolean {
  return segment.some((p) => p[0] !== segment[0][0] || p[1] !== segment[0][1]);
}

function refuseMissingLine(waypoints: TrailWaypoint[]): never {
  if (waypoints.length === 1) throw singlePointError();
  if (waypoints.length > 1) throw fail(`The file has ${waypoints.length} waypoints but no line. Upload the recorded track (or route) of the trail.`);
  throw fail("The file has no line in it. Upload a GPX track or route, or a GeoJSON LineString.");
}

/**
 * The rules every trail file must pass, whatever its format. Returns the trail with segments
 * that have no length (every point identical) dropped, and a warning for each one dropped.
 */
export function checkTrailGeometry(raw: RawTrail, parkCenter?: LonLat): RawTrail {
  const pointCount = raw.segments.reduce((n, s) => n + s.length, 0) + raw.waypoints.length;
  if (pointCount > TRAIL_LIMITS.maxPoints) throw tooManyPoints();
  if (raw.segments.length === 0) refuseMissingLine(raw.waypoints);
  raw.segments.forEach((segment, s) => {
    if (segment.length < 2) throw fail(`${raw.segments.length > 1 ? `Segment ${s + 1}` : "The line"} has fewer than two points.`);
    for (let i = 0; i < segment.length; i++) {
      const problem = positionProblem(segment[i][0], segment[i][1], segment[i][2]);
      if (problem) throw fail(`${where(s, i, raw.segments.length)} ${problem}`);
    }
  });
  raw.waypoints.forEach((w, i) => {
    const problem = positionProblem(w.lon, w.lat, w.ele);
    if (problem) throw fail(`Waypoint ${i + 1}${w.name ? ` ("${w.name.slice(0, 40)}")` : ""} ${problem}`);
  });

  const warnings = [...raw.warnings];
  const segments = raw.segments.filter((segment, s) => {
    if (hasLength(segment)) return true;
    warnings.push(`Segment ${s + 1} has all its points in one place and was ignored.`);
    return false;
  });
  if (segments.length === 0) throw singlePointError();
  if (parkCenter) checkNearPark(segments, parkCenter);
  refuseTooShort(checkSteps(segments));

  const name = tidyName(raw.name);
  // Waypoint names become feature names, stored with the same length limit as a trail's name.
  const waypoints = raw.waypoints.map(({ name: waypointName, ...w }) => {
    const tidy = tidyName(waypointName);
    return tidy ? { name: tidy, ...w } : w;
  });
  return { ...(name ? { name } : {}), segments: dropZeroElevations(segments, warnings), waypoints, warnings };
}
