import "server-only";
import { createHash } from "node:crypto";

export const GEOJSON_CONTENT_TYPE = "application/geo+json";

/**
 * JSON with an ETag, so a phone on a weak signal that already holds the current body gets a 304
 * with nothing in it instead of the whole body again. Statuses change during the day: caches
 * must check back every time.
 */
export function jsonWithEtag(body: unknown, request: Request | undefined, contentType: string, extraHeaders: Record<string, string> = {}): Response {
  const text = JSON.stringify(body);
  const etag = `"${createHash("sha1").update(text).digest("base64url")}"`;
  const headers = { "content-type": `${contentType}; charset=utf-8`, "cache-control": "public, max-age=0, must-revalidate", ...extraHeaders, etag };
  const known = request?.headers.get("if-none-match");
  if (known && known.split(",").some((tag) => tag.trim() === etag)) return new Response(null, { status: 304, headers });
  return new Response(text, { status: 200, headers });
}

/** A GeoJSON body with its registered media type (RFC 7946 §12). */
export const geoJsonResponse = (body: unknown, request?: Request) => jsonWithEtag(body, request, GEOJSON_CONTENT_TYPE);
