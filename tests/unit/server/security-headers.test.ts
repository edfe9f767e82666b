import { describe, expect, it } from "vitest";
import { contentSecurityPolicy, staticSecurityHeaders } from "@/lib/server/security-headers";

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
