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

/**
 * Places one waypoint on the trail. A flat-map pass shortlists the nearest steps (cheap, so a
 * 100,000-point trail stays fast); turf.nearestPointOnLine then measures each shortlisted step on
 * the sphere, and the nearest wins (the earliest along the trail on a tie, as Turf itself does).
 */
function snapOne(w: TrailWaypoint, segments: Position[][], startsM: number[][]): { distanceAlongM: number; offsetM: number } {
  const scale = Math.cos((w.lat * Math.PI) / 180);
  // One flat pass: keep every step within the shortlist limit of the nearest found so far, then
  // drop those the final nearest puts out of reach.
  let nearestSquared = Infinity;
  let limit = Infinity;
  const candidates: Array<{ s: number; i: number; d: number }> = [];
  for (let s = 0; s < segments.length; s++) {
    const segment = segments[s];
    for (let i = 0; i < segment.length - 1; i++) {
      const a = segment[i];
      const b = segment[i + 1];
      const d = planarSquared((a[0] - w.lon) * scale, a[1] - w.lat, (b[0] - w.lon) * scale, b[1] - w.lat);
      if (d > limit) continue;
      if (d < nearestSquared) {
        nearestSquared = d;
        limit = (Math.sqrt(d) * SHORTLIST_FACTOR + SHORTLIST_SLACK_DEG) ** 2;
      }
      candidates.push({ s, i, d });
    }
  }

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
    const cumulative = Array.from(cumulativeDistancesM(segment), (d) => d + offset);
    offset = cumulative[cumulative.length - 1];
    return cumulative;
  });
  return waypoints
    .map((w) => ({ kind: featureKind(w), ...(w.name ? { name: w.name } : {}), lon: w.lon, lat: w.lat, ...snapOne(w, usable, startsM) }))
    .sort((a, b) => a.distanceAlongM - b.distanceAlongM);
}
