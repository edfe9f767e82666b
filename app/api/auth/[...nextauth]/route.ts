// next-auth's own endpoints (sign-in, sign-out, session, CSRF token).
import NextAuth from "next-auth";
import { sameOriginPath } from "@/lib/accounts/pure/callback-url";
import { authOptions } from "@/lib/server/auth/options";
import { env } from "@/lib/server/env";

const auth = NextAuth(authOptions);

/**
 * next-auth answers a callbackUrl it cannot use (`javascript:…`, a malformed `%ZZ`) with a 500;
 * such a request is the caller's mistake, so it gets a 400 before next-auth sees it.
 */
function refuseBadCallback(request: Request): Response | null {
  const url = new URL(request.url);
  let malformed = false;
  try {
    decodeURIComponent(url.search);
  } catch {
    malformed = true;
  }
  const callback = url.searchParams.get("callbackUrl");
  if (!malformed && (callback === null || sameOriginPath(callback, env().APP_URL) !== null)) return null;
  return Response.json({ error: { message: "That return address is not a page of this site.", field: "callbackUrl" } }, { status: 400 });
}

type Context = { params: Promise<{ nextauth: string[] }> };
const guarded = (request: Request, context: Context) => refuseBadCallback(request) ?? auth(request, context);

export { guarded as GET, guarded as POST };
