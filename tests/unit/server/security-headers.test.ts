import { describe, expect, it } from "vitest";
import { apiSecurityHeaders, contentSecurityPolicy, PROXY_FREE_API, staticSecurityHeaders } from "@/lib/server/security-headers";

describe("security headers (ASVS v5.0.0 3.4)", () => {
  it("allows scripts only with the nonce, never inline or eval in production", () => {
    const csp = contentSecurityPolicy("abc123");
    expect(csp).toContain("script-src 'self' 'nonce-abc123' 'strict-dynamic'");
    expect(csp).not.toContain("unsafe-eval");
    expect(csp).not.toMatch(/script-src[^;]*unsafe-inline/);
    expect(contentSecurityPolicy("n", { dev: true })).toContain("'unsafe-eval'");
  });
  it("sends HSTS only in production", () => {
    expect(staticSecurityHeaders({ production: true })["Strict-Transport-Security"]).toMatch(/max-age=\d+/);
    expect(staticSecurityHeaders({ production: false })["Strict-Transport-Security"]).toBeUndefined();
  });
});

describe("the API answers proxy.ts does not run for", () => {
  const paths = {
    skipped: ["/api/parks/harrow-ridge/board", "/api/parks/harrow-ridge/trails.geojson", "/api/parks/harrow-ridge/hazards.geojson"],
    proxied: ["/api/parks/harrow-ridge/board/x", "/api/parks/harrow-ridge/trails", "/api/parks/harrow-ridge/trails/preview", "/api/parks/harrow-ridge/hazards", "/api/parks/harrow-ridge/trailsXgeojson", "/parks/harrow-ridge", "/api/parks/harrow-ridge/state", "/staff/harrow-ridge"],
  };

  it("the proxy's matcher leaves out exactly the paths PROXY_FREE_API names", async () => {
    const { config } = await import("@/proxy");
    // The matcher's source is one regular expression over the whole path (Next.js anchors it).
    const proxied = new RegExp(`^${config.matcher[0].source}$`);
    for (const path of paths.skipped) expect([path, proxied.test(path), PROXY_FREE_API.test(path)]).toEqual([path, false, true]);
    for (const path of paths.proxied) expect([path, proxied.test(path), PROXY_FREE_API.test(path)]).toEqual([path, true, false]);
  });

  it("their answers carry the protective headers and a CSP that allows nothing", () => {
    const headers = apiSecurityHeaders();
    expect(headers["Content-Security-Policy"]).toBe("default-src 'none'; frame-ancestors 'none'");
    expect(headers).toMatchObject({ "X-Content-Type-Options": "nosniff", "X-Frame-Options": "DENY", "Referrer-Policy": "strict-origin-when-cross-origin" });
  });
});
