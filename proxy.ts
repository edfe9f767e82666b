import { NextResponse, type NextRequest } from "next/server";
import { REQUEST_ID_HEADER, requestIdFrom } from "@/lib/server/request-id";
import { isCrossOriginWrite } from "@/lib/shared/same-origin";
import { contentSecurityPolicy, SELF_FRAMED_PATHS, servedOverHttps, staticSecurityHeaders } from "@/lib/server/security-headers";

/**
 * Runs before every page and API request but the busiest public reads (PROXY_FREE_API in
 * lib/server/security-headers.ts, left out by the matcher below), which set their headers
 * themselves. Four jobs only:
 * 1. security headers, with a per-request CSP nonce;
 * 2. an optimistic redirect to sign in for private pages without a session cookie;
 * 3. a request id (x-request-id) for the logs, passed on to the app and sent back in the response;
 * 4. a server action (any POST to a page) from a foreign origin gets 403 here: Next.js itself
 *    aborts it but answers 500 (docs/security.md).
 * Pages and handlers still do the real permission checks on the server.
 */
const PRIVATE = ["/staff", "/admin", "/me"];

export function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  const isPrivate = PRIVATE.some((p) => pathname === p || pathname.startsWith(`${p}/`));
  const hasSession = request.cookies.getAll().some((c) => c.name.endsWith("next-auth.session-token"));

  let response: NextResponse;
  const requestId = requestIdFrom(request.headers);
  if (!pathname.startsWith("/api/") && isCrossOriginWrite(request, process.env.APP_URL ?? request.nextUrl.origin)) {
    response = new NextResponse("Cross-site request refused.", { status: 403, headers: { "content-type": "text/plain; charset=utf-8" } });
    response.headers.set(REQUEST_ID_HEADER, requestId);
    for (const [name, value] of Object.entries(staticSecurityHeaders({ production: servedOverHttps() }))) response.headers.set(name, value);
    return response;
  }
  const nonce = Buffer.from(crypto.randomUUID()).toString("base64");
  const csp = contentSecurityPolicy(nonce, { dev: process.env.NODE_ENV === "development" });
  if (isPrivate && !hasSession) {
    const url = request.nextUrl.clone();
    url.pathname = "/sign-in";
    url.search = `?callbackUrl=${encodeURIComponent(pathname + search)}`;
    response = NextResponse.redirect(url);
  } else {
    const headers = new Headers(request.headers);
    headers.set("x-nonce", nonce);
    headers.set("content-security-policy", csp);
    headers.set(REQUEST_ID_HEADER, requestId);
    response = NextResponse.next({ request: { headers } });
  }
  response.headers.set(REQUEST_ID_HEADER, requestId);
  const production = servedOverHttps();
  // The embeddable card sends its own CSP with the park's frame-ancestors, and no X-Frame-Options.
  const selfFramed = SELF_FRAMED_PATHS.some((p) => pathname.startsWith(p));
  // A photo carries its own stricter policy (default-src 'none'; sandbox, lib/photos/serve-photo.ts),
  // and the embeddable card its own frame-ancestors: setting the page policy here would replace them.
  if (!selfFramed && !pathname.startsWith("/api/photos/")) response.headers.set("Content-Security-Policy", csp);
  for (const [name, value] of Object.entries(staticSecurityHeaders({ production }))) {
    if (!(selfFramed && name === "X-Frame-Options")) response.headers.set(name, value);
  }
  return response;
}

export const config = {
  // Everything but static build files, images, and the board and map GeoJSON of a park (the
  // matcher must be a literal: keep it in step with PROXY_FREE_API; a unit test compares them).
  matcher: [{ source: "/((?!_next/static|_next/image|favicon.ico|vendor/|api/parks/[^/]+/(?:board|trails\\.geojson|hazards\\.geojson)$).*)" }],
};
