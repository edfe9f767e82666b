import { afterAll, describe, expect, it } from "vitest";
import { parkLocalInstant } from "@/lib/shared/park-clock";
import { reportsCsv } from "@/lib/conditions/pure/report-csv";
import { postTrailReport } from "@/lib/conditions/write-report";
import { statusChanges } from "@/lib/audit/activity";
import { parkReportsForExport, resolveRange, trailReportHistory } from "@/lib/conditions/history";
import { sequelize } from "@/models";
import { parkWithTrails } from "./fixtures";

afterAll(() => sequelize.close());

const ZONE = "America/Los_Angeles";
const at = (date: string, time: string) => parkLocalInstant(date, time, ZONE);

describe("report history, export and activity", () => {
  it("history lists current revisions in a range, or every revision when asked", async () => {
    const { park, ranger, trails } = await parkWithTrails(2, ZONE);
    const [a, b] = trails;
    await postTrailReport(ranger, a.id, { status: "open", surfaces: ["dry"] }, { now: at("2026-11-30", "06:30") });
    await postTrailReport(ranger, a.id, { status: "open", surfaces: ["wet"] }, { now: at("2026-12-01", "06:30") });
    await postTrailReport(ranger, a.id, { status: "closed", reason: "=1+1 washout", surfaces: ["muddy"], baseRevision: 1 }, { now: at("2026-12-01", "09:15") });
    await postTrailReport(ranger, b.id, { status: "caution", reason: "Soft, rutted landings", surfaces: ["damp"] }, { now: at("2026-12-01", "06:45") });

    const range = { from: "2026-12-01", to: "2026-12-01" };
    const current = await trailReportHistory(a.id, range, false, true);
    expect(current.map((r) => [r.date, r.revision, r.status])).toEqual([["2026-12-01", 2, "closed"]]);
    expect(current[0].reporterName).toBe("Test Person");
    // The public history names nobody (issue #12 finding 7): no reporter name, no user id.
    const published = await trailReportHistory(a.id, range);
    expect(published.map((r) => [r.reporterName, r.reporterId])).toEqual([[null, null]]);
    const every = await trailReportHistory(a.id, range, true);
    expect(every.map((r) => [r.revision, r.isCurrent])).toEqual([
      [2, true],
      [1, false],
    ]);

    const rows = await parkReportsForExport(park.id, { from: "2026-11-30", to: "2026-12-01" });
    expect(rows.map((r) => [r.date, r.trailName, r.status])).toEqual([
      ["2026-11-30", "Trail 1", "open"],
      ["2026-12-01", "Trail 1", "closed"],
      ["2026-12-01", "Trail 2", "caution"],
    ]);
    const csv = reportsCsv(rows, ZONE).split("\r\n");
    expect(csv[2]).toBe("2026-12-01,Trail 1,intermediate,closed,'=1+1 washout,muddy,,,,,Test Person,09:15,2");
    expect(csv[3]).toBe('2026-12-01,Trail 2,intermediate,caution,"Soft, rutted landings",damp,,,,,Test Person,06:45,1');

    const { changes } = await statusChanges(park.id);
    expect(changes.map((c) => [c.trailName, c.from, c.to])).toEqual([
      ["Trail 2", null, "caution"],
      ["Trail 1", "open", "closed"],
      ["Trail 1", null, "open"],
    ]);
  });

  it("ranges default to the last 30 days at the park and are capped at a year", () => {
    const park = { timeZone: ZONE };
    expect(resolveRange({}, park, at("2026-12-02", "00:10"))).toEqual({ from: "2026-11-03", to: "2026-12-02" });
    expect(resolveRange({ from: "2026-01-01", to: "2026-12-31" }, park)).toEqual({ from: "2026-01-01", to: "2026-12-31" });
    expect(() => resolveRange({ from: "2025-01-01", to: "2026-12-31" }, park)).toThrow(/at most 366 days/);
    expect(() => resolveRange({ from: "2026-12-05", to: "2026-12-01" }, park)).toThrow();
    expect(() => resolveRange({ from: "yesterday" }, park)).toThrow();
  });
});
