import { NextResponse, type NextRequest } from "next/server";

/**
 * An optimistic redirect only: pages and handlers do the real checks on the server.
 * Visitors without a session cookie are sent to sign in before private pages render.
 */
const PRIVATE = ["/staff", "/admin", "/me"];

export function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  if (!PRIVATE.some((p) => pathname === p || pathname.startsWith(`${p}/`))) return NextResponse.next();
  const hasSession = request.cookies.getAll().some((c) => c.name.endsWith("next-auth.session-token"));
  if (hasSession) return NextResponse.next();
  const url = request.nextUrl.clone();
  url.pathname = "/sign-in";
  url.search = `?callbackUrl=${encodeURIComponent(pathname + search)}`;
  return NextResponse.redirect(url);
}

export const config = { matcher: ["/staff/:path*", "/admin/:path*", "/me/:path*"] };
