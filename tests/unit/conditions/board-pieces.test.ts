import { describe, expect, it } from "vitest";
import { filterHref, parseBoardFilters } from "@/lib/conditions/pure/board-filters";
import { filterTrails } from "@/lib/conditions/pure/filter-trails";
import { monthGrid, shiftMonth } from "@/lib/conditions/pure/calendar";
import { describeFeatures } from "@/lib/conditions/pure/labels";
import { closureNoticeHref, noticeKindFor } from "@/lib/conditions/pure/notice-link";
import { boardCounts, firstGlance } from "@/lib/conditions/pure/board-glance";

const trails = [
  { name: "A", difficulty: "easy", kind: "flow", effectiveStatus: "open" },
  { name: "B", difficulty: "difficult", kind: "technical", effectiveStatus: "closed" },
  { name: "C", difficulty: "easy", kind: "jump", effectiveStatus: null },
];

describe("board filters in the URL", () => {
  it("keeps known values and ignores the rest", () => {
    expect(parseBoardFilters({ status: "closed", difficulty: "easy", kind: "nope" })).toEqual({ status: "closed", difficulty: "easy", kind: undefined });
    expect(parseBoardFilters({ status: ["open", "closed"] }).status).toBe("open");
  });
  it("filters by status (including not inspected), difficulty and kind together", () => {
    expect(filterTrails(trails, { status: "closed" }).map((t) => t.name)).toEqual(["B"]);
    expect(filterTrails(trails, { status: "not-inspected" }).map((t) => t.name)).toEqual(["C"]);
    expect(filterTrails(trails, { difficulty: "easy", kind: "flow" }).map((t) => t.name)).toEqual(["A"]);
    expect(filterTrails(trails, {}).length).toBe(3);
  });
  it("links set one filter and keep the others", () => {
    expect(filterHref("/parks/x", { status: "open", kind: "flow" }, "difficulty", "easy")).toBe("/parks/x?status=open&difficulty=easy&kind=flow");
    expect(filterHref("/parks/x", { status: "open" }, "status", undefined)).toBe("/parks/x");
  });
});

describe("closure notice link", () => {
  it("prefills kind, the closed trails and an encoded message", () => {
    const href = closureNoticeHref("harrow-ridge", "Harrow Ridge", [
      { id: "11111111-1111-4111-8111-111111111111", name: "Gnarlroot", reason: "Saturated & slick" },
      { id: "22222222-2222-4222-8222-222222222222", name: "Plumbline", reason: null },
    ]);
    const url = new URL(href, "http://x.test");
    expect(url.pathname).toBe("/staff/harrow-ridge/notices/new");
    expect(href).toContain("trailIds=11111111-1111-4111-8111-111111111111,22222222-2222-4222-8222-222222222222&");
    expect(url.searchParams.get("kind")).toBe("closure");
    expect(url.searchParams.get("message")).toBe("Harrow Ridge: Gnarlroot is closed: Saturated & slick. Plumbline is closed.");
  });
});

describe("which notice a status change offers (common practice, no published source)", () => {
  it("a new closure offers a closure notice, a closed trail opening or easing offers a reopening, anything else none", () => {
    expect(noticeKindFor({ from: "open", to: "closed" })).toBe("closure");
    expect(noticeKindFor({ from: null, to: "closed" })).toBe("closure");
    expect(noticeKindFor({ from: "closed", to: "closed" })).toBeNull();
    expect(noticeKindFor({ from: "closed", to: "open" })).toBe("reopening");
    expect(noticeKindFor({ from: "closed", to: "caution" })).toBe("reopening");
    expect(noticeKindFor({ from: "open", to: "caution" })).toBeNull();
  });
});

describe("month at a glance", () => {
  it("lays December 2026 out Monday first (1 December 2026 is a Tuesday)", () => {
    const weeks = monthGrid("2026-12");
    expect(weeks[0]).toEqual([null, "2026-12-01", "2026-12-02", "2026-12-03", "2026-12-04", "2026-12-05", "2026-12-06"]);
    expect(weeks.at(-1)).toEqual(["2026-12-28", "2026-12-29", "2026-12-30", "2026-12-31", null, null, null]);
    expect(weeks.flat().filter(Boolean)).toHaveLength(31);
  });
  it("February 2028 has 29 days (a leap year) and months roll over years", () => {
    expect(monthGrid("2028-02").flat().filter(Boolean)).toHaveLength(29);
    expect(shiftMonth("2026-12", 1)).toBe("2027-01");
    expect(shiftMonth("2026-01", -1)).toBe("2025-12");
  });
});

describe("feature notes", () => {
  it("reads as one line in a fixed order", () => {
    expect(describeFeatures({ wood: "slick", berms: "soft" })).toBe("berms soft · wooden features slick");
    expect(describeFeatures({})).toBe("");
  });
});

describe("the board's first glance (common practice, no published source)", () => {
  const trail = (name: string, effectiveStatus: "open" | "caution" | "closed" | null, changedSinceYesterday = false) => ({ name, effectiveStatus, changedSinceYesterday });
  const trails = [trail("A", "open"), trail("B", "closed"), trail("C", "open", true), trail("D", null), trail("E", "caution"), trail("F", "open")];

  it("counts open, caution, closed and not yet checked", () => {
    expect(boardCounts(trails)).toEqual({ open: 3, caution: 1, closed: 1, notChecked: 1 });
  });

  it("puts changed and not-open trails first, each group in its order", () => {
    const { attention, rest } = firstGlance(trails);
    expect(attention.map((t) => t.name)).toEqual(["B", "C", "D", "E"]);
    expect(rest.map((t) => t.name)).toEqual(["A", "F"]);
  });
});
