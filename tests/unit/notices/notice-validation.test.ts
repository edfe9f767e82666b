import { describe, expect, it } from "vitest";
import { noticeFields, subscriptionFields } from "@/lib/notices/pure/schemas";

const trail = "6f1c2a52-3d4e-4f60-8a7b-9c0d1e2f3a4b";
const inAnHour = () => new Date(Date.now() + 3_600_000).toISOString();
const firstPath = (input: unknown) => {
  const result = noticeFields.safeParse(input);
  return result.success ? null : result.error.issues[0].path.join(".");
};

describe("notice input", () => {
  it("accepts a closure of chosen trails with a future 'closed until', dropping repeated trails", () => {
    const parsed = noticeFields.parse({ kind: "closure", trailIds: [trail, trail], message: "  Closed.  ", closedUntil: inAnHour() });
    expect(parsed.trailIds).toEqual([trail]);
    expect(parsed.message).toBe("Closed.");
    expect(parsed.closedUntil).toBeInstanceOf(Date);
  });

  it("means the whole park when no trails are given", () => {
    expect(noticeFields.parse({ kind: "advisory", message: "Wind." })).toMatchObject({ trailIds: null, closedUntil: null });
  });

  it("refuses unknown keys, so a caller cannot supply a subject or headers", () => {
    const result = noticeFields.safeParse({ kind: "closure", message: "x", subject: "a\r\nBcc: b" });
    expect(result.success).toBe(false);
    expect(result.error!.issues[0].code).toBe("unrecognized_keys");
  });

  it("refuses a past 'closed until', one on a reopening, an empty trail list and stray control characters", () => {
    expect(firstPath({ kind: "closure", message: "x", closedUntil: "2020-01-01T00:00:00Z" })).toBe("closedUntil");
    expect(firstPath({ kind: "reopening", message: "x", closedUntil: inAnHour() })).toBe("closedUntil");
    expect(firstPath({ kind: "closure", message: "x", closedUntil: "next week" })).toBe("closedUntil");
    expect(firstPath({ kind: "closure", message: "x", trailIds: [] })).toBe("trailIds");
    expect(firstPath({ kind: "closure", message: "a\u0000b" })).toBe("message");
    expect(firstPath({ kind: "closure", message: "line\r\nline\ttab" })).toBeNull();
  });
});

describe("subscription input", () => {
  it("keeps kinds in one order without repeats, and needs at least one", () => {
    expect(subscriptionFields.parse({ parkSlug: "harrow-ridge", kinds: ["advisory", "closure", "closure"] }).kinds).toEqual(["closure", "advisory"]);
    expect(subscriptionFields.safeParse({ parkSlug: "harrow-ridge", kinds: [] }).success).toBe(false);
    expect(subscriptionFields.safeParse({ parkSlug: "harrow-ridge", kinds: ["closure"], confirmedAt: "2026-01-01" }).success).toBe(false);
  });
});
