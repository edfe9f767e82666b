import "server-only";
import { createHash } from "node:crypto";
import { apiSecurityHeaders } from "@/lib/server/security-headers";

/** A body serialised once with its ETag, so a cached answer is neither re-serialised nor re-hashed. */
export type PreparedJson = { text: string; etag: string; bytes?: Uint8Array<ArrayBuffer> };

/**
 * `tagOf` names what the tag is computed from, when parts of the body (a generation time) change
 * on every request without changing its meaning.
 */
export function prepareJson(body: unknown, tagOf: unknown = body): PreparedJson {
  const text = JSON.stringify(body);
  const tagged = tagOf === body ? text : JSON.stringify(tagOf);
  // The UTF-8 bytes once, so a cached answer is not encoded again for every request.
  return { text, etag: `"${createHash("sha1").update(tagged).digest("base64url")}"`, bytes: new TextEncoder().encode(text) };
}

/**
 * JSON with an ETag, so a phone on a weak signal that already holds the current body gets a 304
 * with nothing in it instead of the whole body again. Statuses change during the day: caches must
 * check back every time.
 */
export function preparedResponse({ text, etag, bytes }: PreparedJson, request: Request | undefined, contentType = "application/json", extraHeaders: Record<string, string> = {}): Response {
  const headers = { ...apiSecurityHeaders(), "content-type": `${contentType}; charset=utf-8`, "cache-control": "public, max-age=0, must-revalidate", ...extraHeaders, etag };
  const known = request?.headers.get("if-none-match");
  if (known && known.split(",").some((tag) => tag.trim() === etag)) return new Response(null, { status: 304, headers });
  return new Response(bytes ?? text, { status: 200, headers });
}

export const jsonWithEtag = (body: unknown, request: Request | undefined, contentType?: string, extraHeaders?: Record<string, string>) =>
  preparedResponse(prepareJson(body), request, contentType, extraHeaders);
