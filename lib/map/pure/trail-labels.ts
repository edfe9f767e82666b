import { along, length, lineString } from "@turf/turf";
import type { Feature, FeatureCollection, LineString, MultiLineString, Point, Position } from "geojson";
import type { TrailMapProperties } from "@/lib/map/pure/schemas";
import { STATUS_LOOKS, statusKey, type TrailStatusKey } from "./status";

/**
 * Where a trail's words go on the map. Park trails wind in tight switchbacks, where a label set
 * along the line rarely fits at the zoom riders use; so each trail gets a name point at the middle
 * of its longest part, and statuses a rider must not miss get their word repeated at points along
 * the whole line. Pure; distances in metres on Turf's sphere.
 */
export const STATUS_MARK_SPACING_M = 400;

export type TrailLabelProperties = { trailId: string; role: "name" | "status"; name: string; status: TrailStatusKey; tag: string; difficulty: string };

function parts(geometry: LineString | MultiLineString): Position[][] {
  return (geometry.type === "LineString" ? [geometry.coordinates] : geometry.coordinates).filter((p) => p.length >= 2);
}

function pointAlong(part: Position[], metres: number): Position {
  return along(lineString(part), metres, { units: "meters" }).geometry.coordinates;
}

export function trailLabelPoints(trails: FeatureCollection<LineString | MultiLineString, TrailMapProperties>, spacingM = STATUS_MARK_SPACING_M): FeatureCollection<Point, TrailLabelProperties> {
  const features: Feature<Point, TrailLabelProperties>[] = [];
  for (const trail of trails.features) {
    const lines = parts(trail.geometry).map((part) => ({ part, metres: length(lineString(part), { units: "meters" }) }));
    if (lines.length === 0) continue;
    const status = statusKey(trail.properties.status);
    const look = STATUS_LOOKS[status];
    const base = { trailId: trail.properties.id, name: trail.properties.name, status, tag: look.tag, difficulty: trail.properties.difficulty };
    const longest = lines.reduce((a, b) => (b.metres > a.metres ? b : a));
    features.push({ type: "Feature", properties: { ...base, role: "name" }, geometry: { type: "Point", coordinates: pointAlong(longest.part, longest.metres / 2) } });
    if (!look.repeatTag) continue;
    for (const { part, metres } of lines) {
      for (let at = spacingM / 2; at < metres; at += spacingM) {
        features.push({ type: "Feature", properties: { ...base, role: "status" }, geometry: { type: "Point", coordinates: pointAlong(part, at) } });
      }
    }
  }
  return { type: "FeatureCollection", features };
}
