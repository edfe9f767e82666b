import "server-only";
import { createHash } from "node:crypto";

export const GEOJSON_CONTENT_TYPE = "application/geo+json";

/** A body serialised once with its ETag, so a cached answer is neither re-serialised nor re-hashed. */
export type PreparedJson = { text: string; etag: string };

export function prepareJson(body: unknown): PreparedJson {
  const text = JSON.stringify(body);
  return { text, etag: `"${createHash("sha1").update(text).digest("base64url")}"` };
}

/**
 * JSON with an ETag, so a phone on a weak signal that already holds the current body gets a 304
 * with nothing in it instead of the whole body again. Statuses change during the day: caches
 * must check back every time.
 */
export function preparedResponse({ text, etag }: PreparedJson, request: Request | undefined, contentType: string): Response {
  const headers = { "content-type": `${contentType}; charset=utf-8`, "cache-control": "public, max-age=0, must-revalidate", etag };
  const known = request?.headers.get("if-none-match");
  if (known && known.split(",").some((tag) => tag.trim() === etag)) return new Response(null, { status: 304, headers });
  return new Response(text, { status: 200, headers });
}

export const jsonWithEtag = (body: unknown, request: Request | undefined, contentType: string) => preparedResponse(prepareJson(body), request, contentType);

/** A GeoJSON body with its registered media type (RFC 7946 §12). */
export const geoJsonResponse = (body: unknown, request?: Request) => jsonWithEtag(body, request, GEOJSON_CONTENT_TYPE);
