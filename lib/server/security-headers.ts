import "server-only";
/**
 * Security headers for every response (ASVS v5.0.0 3.4.x). The page CSP carries a fresh
 * nonce per request; Next.js reads it from the request's CSP header and stamps its own scripts.
 */
export function contentSecurityPolicy(nonce: string, { dev = false } = {}): string {
  const directives = [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    // React style attributes and MapLibre's canvas containers set inline styles.
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "worker-src 'self' blob:",
    "child-src 'self' blob:",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ];
  return directives.join("; ");
}

/** Pages that set their own CSP and framing rules (the embeddable status card); proxy.ts leaves them be. */
export const SELF_FRAMED_PATHS = ["/embed/"];

/**
 * The status card's CSP: nothing loads but its own inline styles, and only the origins the
 * park listed may frame it (CSP Level 3 frame-ancestors; X-Frame-Options cannot list origins).
 */
export function embedContentSecurityPolicy(frameAncestors: string): string {
  return ["default-src 'none'", "style-src 'unsafe-inline'", "img-src 'self' data:", "base-uri 'none'", "form-action 'none'", `frame-ancestors ${frameAncestors}`].join("; ");
}

/** Served over HTTPS (APP_URL), so browsers are told to keep to it (HSTS). */
export const servedOverHttps = () => (process.env.APP_URL ?? "").startsWith("https://");

/**
 * Public read-only API answers that proxy.ts does not run for (its matcher leaves them out: the
 * board and the map's GeoJSON are the busiest requests, and they need neither a nonce nor a
 * redirect). Their answers carry these headers themselves (lib/server/api/etag.ts, errors.ts).
 */
export const PROXY_FREE_API = /^\/api\/parks\/[^/]+\/(board|trails\.geojson|hazards\.geojson)$/;

/** A JSON or GeoJSON answer runs no script and is framed by nobody. */
export const API_CONTENT_SECURITY_POLICY = "default-src 'none'; frame-ancestors 'none'";

/** The headers an API answer sends when the proxy has not set them. */
export function apiSecurityHeaders(): Record<string, string> {
  return { ...staticSecurityHeaders({ production: servedOverHttps() }), "Content-Security-Policy": API_CONTENT_SECURITY_POLICY };
}

export function staticSecurityHeaders({ production }: { production: boolean }): Record<string, string> {
  return {
    "X-Content-Type-Options": "nosniff",
    "Referrer-Policy": "strict-origin-when-cross-origin",
    "X-Frame-Options": "DENY",
    "Permissions-Policy": "camera=(), microphone=(), geolocation=(self)",
    ...(production ? { "Strict-Transport-Security": "max-age=63072000; includeSubDomains" } : {}),
  };
}
