import gjv from "geojson-validation";
import type { Feature, FeatureCollection, Geometry } from "geojson";
import { AppError } from "@/lib/shared/errors";
import { nameProblem } from "@/lib/shared/text";
import { decodeText } from "@/lib/trails/pure/decode-text";
import { distanceM, formatDistance } from "@/lib/trails/pure/geo";
import { TRAIL_LIMITS } from "@/lib/trails/pure/limits";

/**
 * A park's ground: the base layers a manager uploads as GeoJSON (RFC 7946), one file per layer.
 * Each layer takes certain geometries; every feature must lie within 50 km of the park's location.
 * What is kept of a feature is only what the map draws (name, elevation, kind), so nothing a file
 * smuggles in reaches the page.
 */
export const GROUND_LAYERS = ["boundary", "lifts", "roads", "landmarks", "contours"] as const;
export type GroundLayer = (typeof GROUND_LAYERS)[number];
export const isGroundLayer = (value: string): value is GroundLayer => (GROUND_LAYERS as readonly string[]).includes(value);

export const GROUND_LIMITS = {
  maxFileBytes: 5 * 1024 * 1024,
  maxFeatures: 5_000,
  maxPoints: TRAIL_LIMITS.maxPoints,
  maxDistanceFromParkM: TRAIL_LIMITS.maxDistanceFromParkM,
  maxNameLength: 80,
} as const;

export const GROUND_LAYER_INFO: Record<GroundLayer, { label: string; takes: string; geometries: Geometry["type"][] }> = {
  boundary: { label: "Boundary", takes: "the park's area as a Polygon or MultiPolygon", geometries: ["Polygon", "MultiPolygon"] },
  lifts: { label: "Lifts", takes: "lift and shuttle lines as LineStrings with a name", geometries: ["LineString", "MultiLineString"] },
  roads: { label: "Roads", takes: "roads and service tracks as LineStrings", geometries: ["LineString", "MultiLineString"] },
  landmarks: { label: "Landmarks", takes: "named Points: car park, base lodge, first aid, bike wash…", geometries: ["Point"] },
  contours: { label: "Contours", takes: "contour lines as LineStrings with an elevation property in metres", geometries: ["LineString", "MultiLineString"] },
};

type Json = Record<string, unknown>;
const isObject = (v: unknown): v is Json => typeof v === "object" && v !== null && !Array.isArray(v);
const fail = (message: string) => new AppError(422, message, "file");

/** Every [lon, lat] of a geometry, checked as numbers on Earth, counting towards the point limit. */
function positionsOf(geometry: Json, label: string, count: { points: number }): [number, number][] {
  const out: [number, number][] = [];
  const walk = (value: unknown, depth: number) => {
    if (!Array.isArray(value)) throw fail(`${label} has coordinates that are not arrays.`);
    if (depth === 0) {
      const [lon, lat] = value;
      if (typeof lon !== "number" || typeof lat !== "number" || !Number.isFinite(lon) || !Number.isFinite(lat)) throw fail(`${label} has a coordinate that is not a number.`);
      if (lon < -180 || lon > 180 || lat < -90 || lat > 90) throw fail(`${label} has a coordinate off the Earth (${lon}, ${lat}); GeoJSON is longitude, latitude in degrees.`);
      if (++count.points > GROUND_LIMITS.maxPoints) throw fail(`The file has more than ${GROUND_LIMITS.maxPoints.toLocaleString("en")} points. Simplify it first.`);
      out.push([lon, lat]);
      return;
    }
    for (const child of value) walk(child, depth - 1);
  };
  const depth: Record<string, number> = { Point: 0, LineString: 1, MultiLineString: 2, Polygon: 2, MultiPolygon: 3 };
  walk(geometry.coordinates, depth[geometry.type as string]);
  return out;
}

function cleanName(value: unknown, label: string): string | undefined {
  if (typeof value !== "string" || !value.trim()) return undefined;
  const name = value.trim().slice(0, GROUND_LIMITS.maxNameLength);
  const problem = nameProblem(name);
  if (problem) throw fail(`${label}: its name ${problem}.`);
  return name;
}

/** An elevation in metres from `elevationM`, `elevation`, `ele` or `elev` (the names GIS exports use). */
function elevationOf(props: Json): number | undefined {
  for (const key of ["elevationM", "elevation", "ele", "elev"]) {
    const raw = props[key];
    const value = typeof raw === "string" && raw.trim() !== "" ? Number(raw) : raw;
    if (typeof value === "number" && Number.isFinite(value)) return Math.round(value);
  }
  return undefined;
}

/** The properties the map draws for one layer's feature; anything else in the file is dropped. */
function keptProperties(layer: GroundLayer, props: Json, label: string): Json {
  const name = cleanName(props.name, label);
  if (layer === "landmarks") {
    if (!name) throw fail(`${label} has no name: a landmark needs one (car park, base lodge, first aid…).`);
    const elevationM = elevationOf(props);
    const kind = cleanName(props.kind ?? props.type, label);
    return { name, ...(kind ? { kind } : {}), ...(elevationM === undefined ? {} : { elevationM }) };
  }
  if (layer === "contours") {
    const elevationM = elevationOf(props);
    if (elevationM === undefined) throw fail(`${label} has no elevation: give each contour an "elevationM" (or "elevation") property in metres.`);
    const index = typeof props.index === "boolean" ? props.index : elevationM % 50 === 0;
    return { elevationM, index };
  }
  return name ? { name } : {};
}

/**
 * Reads one uploaded layer file: UTF-8 JSON, a FeatureCollection or a single Feature, each feature
 * of the layer's geometry, valid RFC 7946 (checked with geojson-validation) and within 50 km of the
 * park. A refusal names the feature by its number in the file (1 = the first).
 */
export function parseGroundLayer(layer: GroundLayer, bytes: Uint8Array, park: { lon: number; lat: number }): FeatureCollection {
  if (bytes.byteLength > GROUND_LIMITS.maxFileBytes) throw new AppError(413, `The file is larger than ${GROUND_LIMITS.maxFileBytes / 1024 / 1024} MB. Simplify it first.`, "file");
  let root: unknown;
  try {
    root = JSON.parse(decodeText(bytes));
  } catch (error) {
    if (error instanceof AppError) throw error;
    throw fail("The file is not valid JSON, so it cannot be read as GeoJSON.");
  }
  if (!isObject(root)) throw fail("The file is JSON but not a GeoJSON object.");
  if ("crs" in root) throw fail('The GeoJSON has a "crs" member. RFC 7946 GeoJSON is always WGS 84 longitude and latitude: export it again without one.');
  const features: unknown[] = root.type === "FeatureCollection" ? (Array.isArray(root.features) ? root.features : []) : root.type === "Feature" ? [root] : [];
  if (root.type !== "FeatureCollection" && root.type !== "Feature") throw fail("Upload a GeoJSON FeatureCollection (or one Feature), so each shape can carry its name.");
  if (features.length === 0) throw fail("The file holds no features. To empty the layer, clear it instead.");
  if (features.length > GROUND_LIMITS.maxFeatures) throw fail(`The file has ${features.length} features; a layer takes at most ${GROUND_LIMITS.maxFeatures}.`);

  const info = GROUND_LAYER_INFO[layer];
  const count = { points: 0 };
  const kept: Feature[] = features.map((feature, i) => {
    const label = `Feature ${i + 1}`;
    if (!isObject(feature) || feature.type !== "Feature") throw fail(`${label} is not a GeoJSON Feature.`);
    const geometry = feature.geometry;
    if (!isObject(geometry)) throw fail(`${label} has no geometry.`);
    if (!info.geometries.includes(geometry.type as Geometry["type"])) {
      throw fail(`${label} is a ${String(geometry.type).slice(0, 30)}; the ${layer} layer takes ${info.takes}.`);
    }
    const problems = gjv.valid(feature, true);
    if (problems.length > 0) throw fail(`${label} does not follow RFC 7946: ${problems[0]}.`);
    const positions = positionsOf(geometry, label, count);
    const farthest = positions.reduce((far, p) => Math.max(far, distanceM(p, [park.lon, park.lat])), 0);
    if (farthest > GROUND_LIMITS.maxDistanceFromParkM) {
      throw fail(`${label} reaches ${formatDistance(farthest, Math.ceil)} from the park's location; shapes must lie within ${GROUND_LIMITS.maxDistanceFromParkM / 1000} km. Check the file is for this park, or correct the park's location.`);
    }
    const properties = keptProperties(layer, isObject(feature.properties) ? feature.properties : {}, label);
    return { type: "Feature", properties, geometry: { type: geometry.type, coordinates: geometry.coordinates } as Geometry };
  });
  return { type: "FeatureCollection", features: kept };
}

/** Which layers a park's map still lacks, for its staff (riders are never told). */
export function missingGroundLayers(mapLayers: Record<string, FeatureCollection | undefined>): GroundLayer[] {
  return GROUND_LAYERS.filter((layer) => !(mapLayers[layer]?.features.length));
}
