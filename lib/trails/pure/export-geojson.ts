import type { Feature, FeatureCollection, LineString, MultiLineString, Point } from "geojson";
import type { ExportableTrail } from "./export-gpx";

/**
 * RFC 7946 GeoJSON for download: the trail as one LineString (or MultiLineString when it has
 * several segments) followed by one Point per waypoint. No "crs" member (§4).
 */
export function toGeoJson(trail: ExportableTrail, properties: Record<string, unknown> = {}): FeatureCollection<LineString | MultiLineString | Point> {
  const geometry: LineString | MultiLineString =
    trail.segments.length === 1
      ? { type: "LineString", coordinates: trail.segments[0] }
      : { type: "MultiLineString", coordinates: trail.segments };
  const line: Feature<LineString | MultiLineString> = {
    type: "Feature",
    properties: { ...(trail.name ? { name: trail.name } : {}), ...(trail.description ? { description: trail.description } : {}), ...properties },
    geometry,
  };
  const points: Feature<Point>[] = (trail.waypoints ?? []).map((w) => ({
    type: "Feature",
    properties: { ...(w.name ? { name: w.name } : {}), ...(w.type ? { type: w.type } : {}) },
    geometry: { type: "Point", coordinates: w.ele === undefined ? [w.lon, w.lat] : [w.lon, w.lat, w.ele] },
  }));
  return { type: "FeatureCollection", features: [line, ...points] };
}
