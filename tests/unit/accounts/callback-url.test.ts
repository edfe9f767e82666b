import { describe, expect, it } from "vitest";
import { safeCallbackUrl } from "@/lib/accounts/pure/callback-url";

const APP = "http://localhost:3100";

/**
 * Issue #12 finding 2 (ASVS v5.0.0 3.7.2 — no open redirect). Cases from the WHATWG URL Standard's
 * parsing rules: a backslash counts as a slash in special schemes, and tab/newline are stripped
 * before parsing (URL Standard §4.4 "basic URL parser"), so "/\host" and "/\t/host" are other hosts.
 */
describe("safeCallbackUrl", () => {
  it.each([
    ["/\\127.0.0.1:3999/stolen", "backslash (passed the old startsWith check)"],
    ["/\t/127.0.0.1:3999/stolen", "tab between the slashes"],
    ["/\n/evil.example", "newline between the slashes"],
    ["//evil.example/x", "protocol-relative"],
    ["https://evil.example/", "absolute, another origin"],
    ["javascript:alert(1)", "javascript: scheme"],
    ["http://localhost:3999/", "same host, another port"],
    ["\\\\evil.example", "two backslashes"],
    ["", "empty"],
    ["%ZZ", "not a path (next-auth answered it with a 500)"],
    ["staff", "a relative path without its slash"],
  ])("refuses %j (%s)", (value) => {
    expect(safeCallbackUrl(value, APP)).toBe("/");
  });

  it.each([
    ["/staff", "/staff"],
    ["/me/setups?x=1#top", "/me/setups?x=1#top"],
    [`${APP}/pressure`, "/pressure"],
    ["/%2F%2Fevil.example", "/%2F%2Fevil.example"], // an encoded slash stays a path on our origin
  ])("keeps a same-origin path %j", (value, expected) => {
    expect(safeCallbackUrl(value, APP)).toBe(expected);
  });

  it("takes the first of repeated parameters and ignores non-strings", () => {
    expect(safeCallbackUrl(["/a", "//evil.example"], APP)).toBe("/a");
    expect(safeCallbackUrl(undefined, APP)).toBe("/");
    expect(safeCallbackUrl(42, APP)).toBe("/");
  });
});
