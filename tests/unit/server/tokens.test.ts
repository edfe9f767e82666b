import { describe, expect, it } from "vitest";
import { hashToken, newToken, signToken, verifyToken } from "@/lib/server/auth/tokens";

describe("signed tokens", () => {
  it("round-trips a payload", () => {
    const token = signToken({ sub: "abc" }, 60);
    expect(verifyToken<{ sub: string }>(token)?.sub).toBe("abc");
  });
  it("refuses a tampered payload", () => {
    const token = signToken({ sub: "abc" }, 60);
    const [body, mac] = token.split(".");
    const forged = Buffer.from(JSON.stringify({ sub: "xyz", exp: 9_999_999_999 })).toString("base64url");
    expect(verifyToken(`${forged}.${mac}`)).toBeNull();
    expect(verifyToken(`${body}.${mac.slice(0, -2)}AA`)).toBeNull();
  });
  it("refuses an expired token", () => {
    expect(verifyToken(signToken({ sub: "abc" }, -1))).toBeNull();
  });
  it("stores only a SHA-256 of random tokens", () => {
    const token = newToken();
    expect(token.length).toBeGreaterThanOrEqual(43);
    // SHA-256 of "abc" (FIPS 180-2, Appendix B.1).
    expect(hashToken("abc")).toBe("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
  });
});
