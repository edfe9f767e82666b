/**
 * CSRF origin rule for state changes (ASVS v5.0.0 3.5.1–3.5.3), shared by the route-handler
 * wrapper and the proxy (server actions): a browser's unsafe request must come from our own
 * origin. Requests without browser headers (scripts, curl) carry no ambient cookies to abuse.
 */
const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

export function isCrossOriginWrite(request: { method: string; url: string; headers: Headers }, appUrl: string): boolean {
  if (SAFE_METHODS.has(request.method)) return false;
  const site = request.headers.get("sec-fetch-site");
  if (site && site !== "same-origin" && site !== "none") return true;
  const origin = request.headers.get("origin");
  if (!origin) return false;
  const url = new URL(request.url);
  const allowed = new Set([new URL(appUrl).origin, url.origin]);
  const host = request.headers.get("host");
  if (host) allowed.add(`${url.protocol}//${host}`);
  return !allowed.has(origin);
}
