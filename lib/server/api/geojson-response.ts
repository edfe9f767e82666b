import "server-only";
import { jsonWithEtag } from "./etag";

export const GEOJSON_CONTENT_TYPE = "application/geo+json";

/** A GeoJSON body with its registered media type (RFC 7946 §12) and an ETag. */
export const geoJsonResponse = (body: unknown, request?: Request) => jsonWithEtag(body, request, GEOJSON_CONTENT_TYPE);
