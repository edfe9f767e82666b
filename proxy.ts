import { NextResponse, type NextRequest } from "next/server";
import { contentSecurityPolicy, staticSecurityHeaders } from "@/lib/server/security-headers";

/**
 * Runs before every page and API request. Two jobs only:
 * 1. security headers, with a per-request CSP nonce;
 * 2. an optimistic redirect to sign in for private pages without a session cookie.
 * Pages and handlers still do the real permission checks on the server.
 */
const PRIVATE = ["/staff", "/admin", "/me"];

export function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  const isPrivate = PRIVATE.some((p) => pathname === p || pathname.startsWith(`${p}/`));
  const hasSession = request.cookies.getAll().some((c) => c.name.endsWith("next-auth.session-token"));

  let response: NextResponse;
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
    response = NextResponse.next({ request: { headers } });
  }
  // A photo carries its own stricter policy (default-src 'none'; sandbox, lib/photos/serve-photo.ts):
  // setting the page policy here would replace it.
  if (!pathname.startsWith("/api/photos/")) response.headers.set("Content-Security-Policy", csp);
  const production = (process.env.APP_URL ?? "").startsWith("https://");
  for (const [name, value] of Object.entries(staticSecurityHeaders({ production }))) response.headers.set(name, value);
  return response;
}

export const config = {
  // Everything but static build files and images.
  matcher: [{ source: "/((?!_next/static|_next/image|favicon.ico|vendor/).*)" }],
};
