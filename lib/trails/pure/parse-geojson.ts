import gjv from "geojson-validation";
import { AppError } from "@/lib/shared/errors";
import { tooManyPoints } from "./geometry-checks";
import { TRAIL_LIMITS } from "./limits";
import type { Position, RawTrail, TrailWaypoint } from "./types";

type Json = Record<string, unknown>;
const fail = (message: string) => new AppError(422, message, "file");
const isObject = (v: unknown): v is Json => typeof v === "object" && v !== null && !Array.isArray(v);
const lowerFirst = (s: string) => s[0].toLowerCase() + s.slice(1);
/** Shows a bad coordinate without serialising it (it may be a deeply nested array). */
function describe(v: unknown): string {
  if (typeof v === "string") return JSON.stringify(v.slice(0, 20));
  if (v === null) return "null";
  if (typeof v === "object") return Array.isArray(v) ? "an array" : "an object";
  return String(v);
}
const text = (v: unknown) => (typeof v === "string" && v.trim() ? v.trim() : undefined);

/** Collects lines and points while walking a GeoJSON object, counting points as it goes. */
class Collector {
  segments: Position[][] = [];
  waypoints: TrailWaypoint[] = [];
  lineNames: string[] = [];
  points = 0;

  position(value: unknown, label: string): Position {
    if (!Array.isArray(value) || value.length < 2) throw fail(`${label} is not a [longitude, latitude] pair.`);
    const numbers = value.slice(0, 3);
    if (!numbers.every((n) => typeof n === "number" && Number.isFinite(n))) {
      throw fail(`${label} has a coordinate that is not a number (${numbers.map(describe).join(", ")}).`);
    }
    if (++this.points > TRAIL_LIMITS.maxPoints) throw tooManyPoints();
    return numbers as Position;
  }

  line(coords: unknown, label: string): void {
    if (!Array.isArray(coords)) throw fail(`${label} has no coordinate array.`);
    if (coords.length < 2) throw fail(`${label} has ${coords.length === 1 ? "one point" : "no points"}; a LineString needs at least two (RFC 7946 §3.1.4).`);
    this.segments.push(coords.map((p, i) => this.position(p, `Point ${i + 1} of ${lowerFirst(label)}`)));
  }

  point(coords: unknown, props: Json, label: string): void {
    const [lon, lat, ele] = this.position(coords, label);
    const name = text(props.name) ?? text(props.title);
    const type = text(props.type) ?? text(props.kind);
    this.waypoints.push({ ...(name ? { name } : {}), ...(type ? { type } : {}), lon, lat, ...(ele === undefined ? {} : { ele }) });
  }

  geometry(geometry: unknown, props: Json, label: string): void {
    if (geometry === null) return; // RFC 7946 §3.2: an unlocated feature; nothing to read.
    if (geometry === undefined) throw fail(`${label} has no "geometry" member.`);
    if (!isObject(geometry)) throw fail(`${label} has a geometry that is not an object.`);
    if ("crs" in geometry) throw crsError();
    const coords = geometry.coordinates;
    switch (geometry.type) {
      case "LineString":
        this.line(coords, "The line");
        if (text(props.name)) this.lineNames.push(text(props.name)!);
        return;
      case "MultiLineString":
        if (!Array.isArray(coords)) throw fail("The MultiLineString has no coordinate array.");
        coords.forEach((line, i) => this.line(line, `Line ${i + 1} of the MultiLineString`));
        if (text(props.name)) this.lineNames.push(text(props.name)!);
        return;
      case "Point":
        return this.point(coords, props, "The point");
      case "MultiPoint":
        if (!Array.isArray(coords)) throw fail("The MultiPoint has no coordinate array.");
        coords.forEach((p, i) => this.point(p, props, `Point ${i + 1} of the MultiPoint`));
        return;
      case "Polygon":
      case "MultiPolygon":
        throw fail(`The file holds an area (${geometry.type}) where a trail line is expected. Upload the trail as a LineString or MultiLineString.`);
      case "GeometryCollection":
        throw fail("GeometryCollection is not supported. Put the trail line and its points in a FeatureCollection.");
      default:
        throw fail(`${label} has an unknown geometry type ${JSON.stringify(geometry.type)?.slice(0, 40)}.`);
    }
  }

  feature(feature: unknown, label: string): void {
    if (!isObject(feature) || feature.type !== "Feature") throw fail(`${label} is not a GeoJSON Feature.`);
    if ("crs" in feature) throw crsError();
    this.geometry(feature.geometry, isObject(feature.properties) ? feature.properties : {}, label);
  }
}

function crsError(): AppError {
  return fail('The GeoJSON has a "crs" member. RFC 7946 GeoJSON is always WGS 84 longitude and latitude in degrees: export it again without a coordinate reference system.');
}

function parseJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch (error) {
    const detail = error instanceof Error ? error.message.slice(0, 120) : "";
    throw fail(`The file is not valid JSON, so it cannot be read as GeoJSON (${detail}).`);
  }
}

/** Reads GeoJSON (RFC 7946): LineString, MultiLineString, Feature, FeatureCollection with lines and points. */
export function parseGeoJson(source: string): RawTrail {
  const root = parseJson(source);
  if (!isObject(root)) throw fail("The file is JSON but not a GeoJSON object.");
  if ("crs" in root) throw crsError();
  if (root.type === "Topology") throw new AppError(415, "This is TopoJSON, not GeoJSON. Convert it to GeoJSON first.", "file");

  const collector = new Collector();
  if (root.type === "FeatureCollection") {
    if (!Array.isArray(root.features)) throw fail('The FeatureCollection has no "features" array.');
    root.features.forEach((f, i) => collector.feature(f, `Feature ${i + 1}`));
  } else if (root.type === "Feature") {
    collector.feature(root, "The feature");
  } else if (typeof root.type === "string") {
    collector.geometry(root, {}, "The file");
  } else {
    throw fail('The file is JSON but not GeoJSON: it has no "type" member.');
  }

  // Our walk has already vouched for the shapes, so the reference validator cannot trip on them.
  const problems = gjv.valid(root, true);
  if (problems.length > 0) throw fail(`The GeoJSON does not follow RFC 7946: ${problems[0]}.`);

  const name = text(root.name) ?? collector.lineNames[0];
  return { ...(name ? { name } : {}), segments: collector.segments, waypoints: collector.waypoints, warnings: [] };
}
