import { describe, expect, it } from "vitest";
import { composeNoticeEmail, escapeHtml, formatClosedUntil, noticeSubject, SUBJECT_MAX, trailList } from "@/lib/notices/compose";

const park = { name: "Harrow Ridge Bike Park", slug: "harrow-ridge", timeZone: "America/Los_Angeles" };
const base = {
  park,
  subject: "Harrow Ridge Bike Park: Ridgeback closed",
  message: "Closed after the storm.\nWe look again at noon.",
  closedUntil: null,
  appUrl: "https://conditions.example.test",
  unsubscribePageUrl: "https://conditions.example.test/unsubscribe?token=abc.def",
  oneClickUrl: "https://conditions.example.test/api/unsubscribe?token=abc.def",
};

describe("notice subjects are built by us", () => {
  it("names the park, the trails and what happened", () => {
    expect(noticeSubject(park.name, "closure", ["Ridgeback"])).toBe("Harrow Ridge Bike Park: Ridgeback closed");
    expect(noticeSubject(park.name, "reopening", ["Ridgeback", "Fernline"])).toBe("Harrow Ridge Bike Park: Ridgeback and Fernline reopened");
    expect(noticeSubject(park.name, "advisory", null)).toBe("Harrow Ridge Bike Park: advisory for all trails");
    expect(noticeSubject(park.name, "closure", null)).toBe("Harrow Ridge Bike Park: all trails closed");
  });

  it("lists up to three trails, then counts the rest", () => {
    expect(trailList(["A", "B", "C"])).toBe("A, B and C");
    expect(trailList(["A", "B", "C", "D", "E"])).toBe("A, B and 3 more trails");
  });

  it("neutralises CR and LF from names (ASVS v5.0.0 1.3.11) and stays within 150 characters", () => {
    const subject = noticeSubject("Harrow\r\nBcc: x@example.test", "closure", ["Ridge\nback"]);
    expect(subject).toBe("Harrow Bcc: x@example.test: Ridge back closed");
    const long = noticeSubject(park.name, "closure", ["N".repeat(200)]);
    expect(long.length).toBe(SUBJECT_MAX);
    expect(long.endsWith("…")).toBe(true);
  });
});

describe("the notice e-mail", () => {
  it("carries the RFC 8058 one-click headers exactly (RFC 8058 §3.1)", () => {
    const email = composeNoticeEmail(base);
    expect(email.headers).toEqual({
      "List-Unsubscribe": "<https://conditions.example.test/api/unsubscribe?token=abc.def>",
      "List-Unsubscribe-Post": "List-Unsubscribe=One-Click",
    });
  });

  it("has the message, the board link and the unsubscribe link in text and HTML", () => {
    const email = composeNoticeEmail(base);
    for (const body of [email.text, email.html]) {
      expect(body).toContain("https://conditions.example.test/parks/harrow-ridge");
      expect(body).toContain("https://conditions.example.test/unsubscribe?token=abc.def");
      expect(body).toContain("We look again at noon.");
    }
  });

  it("escapes staff text in HTML and neutralises a stored subject", () => {
    const email = composeNoticeEmail({ ...base, subject: "X\r\nBcc: y", message: `<img src=x onerror="alert(1)"> & 'quotes'` });
    expect(email.subject).toBe("X Bcc: y");
    expect(email.html).toContain("&lt;img src=x onerror=&quot;alert(1)&quot;&gt; &amp; &#39;quotes&#39;");
    expect(email.html).not.toContain("<img");
    expect(email.text).toContain(`<img src=x onerror="alert(1)">`); // plain text is not HTML
    expect(escapeHtml(`<&>"'`)).toBe("&lt;&amp;&gt;&quot;&#39;");
  });

  it("shows 'closed until' on the park's wall clock", () => {
    // 2026-06-14 17:00 UTC is 10:00 Pacific Daylight Time (UTC−7; IANA tz database, America/Los_Angeles).
    const until = new Date("2026-06-14T17:00:00Z");
    expect(formatClosedUntil(until, park.timeZone)).toBe("Sun 14 Jun 2026, 10:00, park time (America/Los_Angeles)");
    const email = composeNoticeEmail({ ...base, closedUntil: until });
    expect(email.text).toContain("Closed until: Sun 14 Jun 2026, 10:00, park time");
  });
});
