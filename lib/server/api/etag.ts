import "server-only";
import { createHash } from "node:crypto";

/**
 * JSON with an ETag, so a phone on a weak signal that already holds the current body gets a 304
 * with nothing in it instead of the whole body again. Statuses change during the day: caches must
 * check back every time. `tagOf` names what the tag is computed from, when parts of the body (a
 * generation time) change on every request without changing its meaning.
 */
export function jsonWithEtag(
  body: unknown,
  request: Request | undefined,
  { contentType = "application/json", tagOf = body }: { contentType?: string; tagOf?: unknown } = {},
): Response {
  const text = JSON.stringify(body);
  const etag = `"${createHash("sha1").update(tagOf === body ? text : JSON.stringify(tagOf)).digest("base64url")}"`;
  const headers = { "content-type": `${contentType}; charset=utf-8`, "cache-control": "public, max-age=0, must-revalidate", etag };
  const known = request?.headers.get("if-none-match");
  if (known && known.split(",").some((tag) => tag.trim() === etag)) return new Response(null, { status: 304, headers });
  return new Response(text, { status: 200, headers });
}
