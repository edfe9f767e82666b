import { describe, expect, it } from "vitest";
import { embedCardHtml, embedOriginsSchema, embedSnippet, frameAncestors } from "@/lib/reach/pure/embed";
import { statusFeed } from "@/lib/reach/pure/status-feed";
import { embedContentSecurityPolicy } from "@/lib/server/security-headers";

const board = {
  park: { slug: "pine-hollow", name: "Pine <Hollow>", timeZone: "Europe/Zurich" },
  date: "2026-12-02",
  parkState: { state: "advisory", message: "Lift 2 runs from 10:00 & not before", startsAt: "2026-12-02T06:00:00.000Z", endsAt: null },
  trails: [
    { id: "t1", name: "Root \"Canal\"", difficulty: "difficult", effectiveStatus: "caution" as const, status: "caution" as const, reason: "<script>alert(1)</script>", lastReportAt: "2026-12-02T05:42:00.000Z" },
    { id: "t2", name: "Fern Line", difficulty: "easy", effectiveStatus: null, status: null, reason: null, lastReportAt: null },
  ],
};

describe("which websites may frame the status card", () => {
  // CSP Level 3 §2.3.1 (source expressions): a host source is scheme://host[:port], no path.
  it("keeps origins, one per line or separated by commas, and drops duplicates", () => {
    expect(embedOriginsSchema.parse("https://www.pine-hollow.example\nhttps://shop.pine-hollow.example:8443, https://www.pine-hollow.example/")).toEqual([
      "https://www.pine-hollow.example",
      "https://shop.pine-hollow.example:8443",
    ]);
    expect(embedOriginsSchema.parse("  ")).toEqual([]);
    expect(embedOriginsSchema.parse("http://localhost:4000")).toEqual(["http://localhost:4000"]);
  });
  it.each([
    "http://www.pine-hollow.example", // plain http outside development
    "https://www.pine-hollow.example/status", // a path
    "https://www.pine-hollow.example; script-src *", // another directive smuggled in
    "'unsafe-inline'",
    "*",
    "https://user:pw@www.pine-hollow.example",
    "javascript:alert(1)",
  ])("refuses %s", (value) => {
    expect(embedOriginsSchema.safeParse(value).success).toBe(false);
  });
  it("refuses more than ten", () => {
    const many = Array.from({ length: 11 }, (_, i) => `https://site${i}.example`).join("\n");
    expect(embedOriginsSchema.safeParse(many).success).toBe(false);
  });
  it("builds frame-ancestors from our own origin and the listed ones, and nothing else loads", () => {
    const csp = embedContentSecurityPolicy(frameAncestors(["https://www.pine-hollow.example"]));
    expect(csp).toContain("frame-ancestors 'self' https://www.pine-hollow.example");
    expect(csp).toContain("default-src 'none'");
    expect(csp).not.toContain("script-src");
  });
});

describe("the status card", () => {
  const html = embedCardHtml(statusFeed(board, "https://loamcast.test"), new Date("2026-12-02T06:42:00Z"));
  it("escapes everything staff typed (OWASP XSS prevention, rule 1: HTML-encode element content)", () => {
    expect(html).not.toContain("<script>");
    expect(html).toContain("&lt;script&gt;alert(1)&lt;/script&gt;");
    expect(html).toContain("Pine &lt;Hollow&gt;");
    expect(html).toContain("Root &quot;Canal&quot;");
  });
  it("shows the counts, the park notice, park time and links that leave the frame", () => {
    expect(html).toContain("0 open</span><span>1 caution</span><span>0 closed</span><span>1 not inspected");
    expect(html).toContain("Lift 2 runs from 10:00 &amp; not before");
    expect(html).toContain("as of 07:42 park time"); // Zurich is UTC+1 in December (IANA tz database)
    expect(html).toContain('href="https://loamcast.test/trails/t1" target="_blank" rel="noopener"');
    expect(html).not.toMatch(/<script/i);
  });
  it("gives a snippet with the card's address and a title for screen readers", () => {
    expect(embedSnippet("https://loamcast.test/embed/parks/pine-hollow", "Pine <Hollow>")).toBe(
      '<iframe src="https://loamcast.test/embed/parks/pine-hollow" title="Trail status at Pine &lt;Hollow&gt;" width="360" height="480" style="border:0;max-width:100%" loading="lazy"></iframe>',
    );
  });
});
