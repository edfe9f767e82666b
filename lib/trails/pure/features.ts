import { lineString, nearestPointOnLine } from "@turf/turf";
import { featureKindValues } from "@/lib/trails/pure/schemas";
import { cumulativeDistancesM } from "./geo";
import type { Position, TrailWaypoint } from "./types";

/** The kinds live with the schema (lib/trails/pure/schemas.ts) so forms and handlers share them. */
export const FEATURE_KINDS = featureKindValues;
export type FeatureKind = (typeof FEATURE_KINDS)[number];

export type SnappedFeature = {
  kind: FeatureKind;
  name?: string;
  lon: number;
  lat: number;
  /** Distance from the start of the trail to the nearest point on it (segment gaps not counted). */
  distanceAlongM: number;
  /** How far the waypoint lies from the line. */
  offsetM: number;
};

/** Keywords, checked in this order (a "root drop" is a drop; a "wooden drop" is a drop). */
const KEYWORDS: Array<[FeatureKind, RegExp]> = [
  ["drop", /\bdrop/],
  ["jump", /\b(jump|kicker|table ?top|step[ -]?(up|down)|hip|gap)/],
  ["berm", /\b(berm|banked)/],
  ["rock-garden", /\b(rock|boulder|slab|scree)/],
  ["roots", /\broot/],
  ["wooden-feature", /\b(wood|bridge|boardwalk|ladder|skinny|north ?shore|wall ?ride)/],
];

/** The kind of feature a waypoint marks, from its type first, then its name (case-insensitive). */
export function featureKind(waypoint: Pick<TrailWaypoint, "name" | "type">): FeatureKind {
  for (const text of [waypoint.type, waypoint.name]) {
    if (!text) continue;
    const lower = text.toLowerCase().replace(/_/g, " ");
    const exact = FEATURE_KINDS.find((kind) => kind !== "unknown" && lower.trim() === kind.replace("-", " "));
    if (exact) return exact;
    const match = KEYWORDS.find(([, pattern]) => pattern.test(lower));
    if (match) return match[0];
  }
  return "unknown";
}

/** Squared planar distance (degrees, longitude scaled by cos latitude) from (0, 0) to segment a–b. */
function planarSquared(ax: number, ay: number, bx: number, by: number): number {
  const dx = bx - ax;
  const dy = by - ay;
  const lengthSquared = dx * dx + dy * dy;
  const t = lengthSquared > 0 ? Math.min(1, Math.max(0, -(ax * dx + ay * dy) / lengthSquared)) : 0;
  const x = ax + t * dx;
  const y = ay + t * dy;
  return x * x + y * y;
}

/** Slack when shortlisting: 2 % plus about 2 m, far more than the flat-map error at trail scale. */
const SHORTLIST_FACTOR = 1.02;
const SHORTLIST_SLACK_DEG = 2 / 111_195;
/** Steps per box of the index below: small enough to skip most of a long line, large enough to be cheap. */
const STEPS_PER_BOX = 64;

/** Bounding boxes (lon/lat) of runs of STEPS_PER_BOX steps, so a waypoint looks only at the runs near it. */
type StepBoxes = { s: number; first: number; last: number; minLon: number; minLat: number; maxLon: number; maxLat: number }[];

function stepBoxes(segments: Position[][]): StepBoxes {
  const boxes: StepBoxes = [];
  segments.forEach((segment, s) => {
    for (let first = 0; first < segment.length - 1; first += STEPS_PER_BOX) {
      const last = Math.min(first + STEPS_PER_BOX, segment.length - 1) - 1;
      let [minLon, minLat, maxLon, maxLat] = [Infinity, Infinity, -Infinity, -Infinity];
      // Step i runs from point i to point i + 1, so the box holds points first … last + 1.
      for (let i = first; i <= last + 1; i++) {
        const [lon, lat] = segment[i];
        if (lon < minLon) minLon = lon;
        if (lon > maxLon) maxLon = lon;
        if (lat < minLat) minLat = lat;
        if (lat > maxLat) maxLat = lat;
      }
      boxes.push({ s, first, last, minLon, minLat, maxLon, maxLat });
    }
  });
  return boxes;
}

/** Squared planar distance from (0, 0) to a box, the least any step inside it can have. */
function boxSquared(minX: number, minY: number, maxX: number, maxY: number): number {
  const x = minX > 0 ? minX : maxX < 0 ? maxX : 0;
  const y = minY > 0 ? minY : maxY < 0 ? maxY : 0;
  return x * x + y * y;
}

/** The least squared planar distance any step in `box` can have from waypoint `w`. */
const boxDistance = (box: StepBoxes[number], w: TrailWaypoint, scale: number) =>
  boxSquared((box.minLon - w.lon) * scale, box.minLat - w.lat, (box.maxLon - w.lon) * scale, box.maxLat - w.lat);

/**
 * Places one waypoint on the trail. A flat-map pass shortlists the nearest steps (cheap, so a
 * 200,000-point trail stays fast): the nearest box sets the shortlist limit first, then the pass
 * runs along the trail skipping every box beyond the limit, since no step inside it can be nearer
 * than the box. turf.nearestPointOnLine then measures each shortlisted step on the sphere, and the
 * nearest wins (the earliest along the trail on a tie, as Turf itself does).
 */
function snapOne(w: TrailWaypoint, segments: Position[][], startsM: Float64Array[], boxes: StepBoxes): { distanceAlongM: number; offsetM: number } {
  const scale = Math.cos((w.lat * Math.PI) / 180);
  // Keep every step within the shortlist limit of the nearest found so far, then drop those the
  // final nearest puts out of reach. The limit only shrinks, so a box beyond it (with a margin for
  // rounding between a box and its steps) holds no step the final shortlist keeps.
  let nearestSquared = Infinity;
  let limit = Infinity;
  const candidates: Array<{ s: number; i: number; d: number }> = [];
  const visit = (box: StepBoxes[number], keep: boolean) => {
    const segment = segments[box.s];
    for (let i = box.first; i <= box.last; i++) {
      const a = segment[i];
      const b = segment[i + 1];
      const d = planarSquared((a[0] - w.lon) * scale, a[1] - w.lat, (b[0] - w.lon) * scale, b[1] - w.lat);
      if (d > limit) continue;
      if (d < nearestSquared) {
        nearestSquared = d;
        limit = (Math.sqrt(d) * SHORTLIST_FACTOR + SHORTLIST_SLACK_DEG) ** 2;
      }
      if (keep) candidates.push({ s: box.s, i, d });
    }
  };
  let nearestBox = boxes[0];
  for (const box of boxes) if (boxDistance(box, w, scale) < boxDistance(nearestBox, w, scale)) nearestBox = box;
  visit(nearestBox, false);
  for (const box of boxes) if (boxDistance(box, w, scale) * (1 - 1e-9) <= limit) visit(box, true);

  let best = { distanceAlongM: 0, offsetM: Infinity };
  for (const { s, i, d } of candidates) {
    if (d > limit) continue;
    const step = lineString([segments[s][i], segments[s][i + 1]]);
    const { pointDistance, totalDistance } = nearestPointOnLine(step, [w.lon, w.lat], { units: "meters" }).properties;
    if (pointDistance < best.offsetM) best = { distanceAlongM: startsM[s][i] + totalDistance, offsetM: pointDistance };
  }
  return best;
}

/** Places each waypoint on the trail (distance along it and offset from it), ordered along the trail. */
export function snapFeatures(waypoints: TrailWaypoint[], segments: Position[][]): SnappedFeature[] {
  const usable = segments.filter((segment) => segment.length >= 2);
  if (usable.length === 0) return [];
  // Distance from the trail's start to each point, segment after segment, gaps not counted.
  let offset = 0;
  const startsM = usable.map((segment) => {
    const along = cumulativeDistancesM(segment);
    const cumulative = new Float64Array(along.length);
    for (let i = 0; i < along.length; i++) cumulative[i] = along[i] + offset;
    offset = cumulative[cumulative.length - 1];
    return cumulative;
  });
  const boxes = waypoints.length > 0 ? stepBoxes(usable) : [];
  return waypoints
    .map((w) => ({ kind: featureKind(w), ...(w.name ? { name: w.name } : {}), lon: w.lon, lat: w.lat, ...snapOne(w, usable, startsM, boxes) }))
    .sort((a, b) => a.distanceAlongM - b.distanceAlongM);
}
