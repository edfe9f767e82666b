import { afterAll, describe, expect, it } from "vitest";
import { parkLocalInstant } from "@/lib/shared/park-clock";
import { saveMorningCheck } from "@/lib/conditions/morning-check";
import { postTrailReport } from "@/lib/conditions/write-report";
import { morningCheckStart } from "@/lib/conditions/morning-check-start";
import { TrailReport, sequelize } from "@/models";
import { createPark } from "../helpers";
import { parkWithTrails, refusal, staffOf } from "./fixtures";

afterAll(() => sequelize.close());

const ZONE = "Europe/Zurich";
const at = (date: string, time: string) => parkLocalInstant(date, time, ZONE);
const countReports = (trailIds: string[]) => TrailReport.count({ where: { trailId: trailIds } });

describe("the morning check", () => {
  it("offers yesterday's values as the start and saves unchanged and edited trails together", async () => {
    const { park, ranger, trails } = await parkWithTrails(3, ZONE);
    const [a, b, c] = trails;
    await postTrailReport(ranger, a.id, { status: "open", surfaces: ["tacky"], features: { berms: "firm" } }, { now: at("2026-12-01", "07:00") });
    await postTrailReport(ranger, b.id, { status: "caution", reason: "Soft landings", surfaces: ["damp"] }, { now: at("2026-11-29", "07:00") });

    const now = at("2026-12-02", "06:45");
    const start = await morningCheckStart(park, now);
    expect(start.date).toBe("2026-12-02");
    const byId = new Map(start.trails.map((t) => [t.id, t]));
    expect(byId.get(a.id)).toMatchObject({ baseRevision: 0, inspectedToday: false, startDate: "2026-12-01", start: { status: "open", surfaces: ["tacky"], features: { berms: "firm" } } });
    expect(byId.get(b.id)).toMatchObject({ startDate: "2026-11-29", start: { status: "caution", reason: "Soft landings" } });
    expect(byId.get(c.id)).toMatchObject({ start: null, startDate: null });

    const result = await saveMorningCheck(
      ranger,
      park,
      {
        date: "2026-12-02",
        entries: [
          { trailId: a.id, baseRevision: 0, unchanged: true },
          { trailId: b.id, baseRevision: 0, report: { status: "open", surfaces: ["dry"] } },
          { trailId: c.id, baseRevision: 0, report: { status: "closed", reason: "Wet after rain", surfaces: ["muddy"] } },
        ],
      },
      { now },
    );
    expect(result.saved).toHaveLength(3);
    const todayA = await TrailReport.findOne({ where: { trailId: a.id, reportDate: "2026-12-02", isCurrent: true } });
    expect(todayA).toMatchObject({ status: "open", surfaces: ["tacky"], features: { berms: "firm" }, revision: 1 });
    // Closing a trail offers a notice with the text written.
    const href = new URL(result.notices.closure!, "http://x.test");
    expect(href.pathname).toBe(`/staff/${park.slug}/notices/new`);
    expect(href.searchParams.get("trailIds")).toBe(c.id);
    expect(href.searchParams.get("message")).toContain("Trail 3 is closed: Wet after rain.");

    const after = await morningCheckStart(park, now);
    expect(after.trails.filter((t) => t.inspectedToday)).toHaveLength(3);
    expect(after.trails.find((t) => t.id === a.id)!.baseRevision).toBe(1);
  });

  it("offers a closure notice only for a new closure and a reopening notice for a trail that was closed", async () => {
    const { park, ranger, trails } = await parkWithTrails(3, ZONE);
    const [keptClosed, reopened, stillOpen] = trails;
    const yesterday = at("2026-12-01", "07:00");
    await postTrailReport(ranger, keptClosed.id, { status: "closed", reason: "Bridge out" }, { now: yesterday });
    await postTrailReport(ranger, reopened.id, { status: "closed", reason: "Flooded" }, { now: yesterday });
    await postTrailReport(ranger, stillOpen.id, { status: "open" }, { now: yesterday });
    const now = at("2026-12-02", "06:50");
    const result = await saveMorningCheck(
      ranger,
      park,
      {
        entries: [
          { trailId: keptClosed.id, baseRevision: 0, unchanged: true },
          { trailId: reopened.id, baseRevision: 0, report: { status: "open", surfaces: ["damp"] } },
          { trailId: stillOpen.id, baseRevision: 0, unchanged: true },
        ],
      },
      { now },
    );
    // Kept closed: its riders already had the closure notice, so none is offered again.
    expect(result.notices.closure).toBeNull();
    const reopening = new URL(result.notices.reopening!, "http://x.test");
    expect(reopening.searchParams.get("kind")).toBe("reopening");
    expect(reopening.searchParams.get("trailIds")).toBe(reopened.id);
    expect(reopening.searchParams.get("message")).toBe(`${park.name}: Trail 2 is open again.`);
  });

  it("is all or nothing: one invalid trail saves nothing and names the trail and field", async () => {
    const { park, ranger, trails } = await parkWithTrails(3, ZONE);
    const error = await refusal(
      saveMorningCheck(
        ranger,
        park,
        {
          entries: [
            { trailId: trails[0].id, report: { status: "open", surfaces: ["dry"] } },
            { trailId: trails[1].id, report: { status: "closed" } },
            { trailId: trails[2].id, report: { status: "open" } },
          ],
        },
        { now: at("2026-12-02", "07:00") },
      ),
    );
    expect(error).toMatchObject({ status: 400, message: "1 trail needs attention. Nothing was saved." });
    expect(error.details).toEqual({ problems: [{ trailId: trails[1].id, field: "reason", message: "Give a reason when a trail is closed." }] });
    expect(await countReports(trails.map((t) => t.id))).toBe(0);
  });

  it("is all or nothing when a trail fails inside the transaction (unchanged with nothing to keep)", async () => {
    const { park, ranger, trails } = await parkWithTrails(2, ZONE);
    const error = await refusal(
      saveMorningCheck(ranger, park, { entries: [{ trailId: trails[0].id, report: { status: "open" } }, { trailId: trails[1].id, unchanged: true }] }, { now: at("2026-12-02", "07:00") }),
    );
    expect(error).toMatchObject({ status: 400 });
    expect(error.details).toMatchObject({ problems: [{ trailId: trails[1].id, field: "unchanged" }] });
    expect(await countReports(trails.map((t) => t.id))).toBe(0);
  });

  it("reports every stale trail with its current values and saves none", async () => {
    const { park, ranger, trails } = await parkWithTrails(3, ZONE);
    const now = at("2026-12-02", "07:10");
    const colleague = await staffOf(park);
    await postTrailReport(colleague, trails[1].id, { status: "caution", reason: "Loose corners" }, { now });
    const error = await refusal(
      saveMorningCheck(
        ranger,
        park,
        { entries: trails.map((t) => ({ trailId: t.id, baseRevision: 0, report: { status: "open", surfaces: ["dry"] } })) },
        { now },
      ),
    );
    expect(error.status).toBe(409);
    expect(error.details).toMatchObject({ conflicts: [{ trailId: trails[1].id, trailName: "Trail 2", current: { revision: 1, status: "caution" } }] });
    expect(await countReports([trails[0].id, trails[2].id])).toBe(0);
    expect(await countReports([trails[1].id])).toBe(1);
  });

  it("refuses another park's trail, another park's ranger and a check for a day that has ended", async () => {
    const { park, ranger, trails } = await parkWithTrails(1, ZONE);
    const other = await parkWithTrails(1, ZONE);
    const now = at("2026-12-02", "07:00");
    const foreign = await refusal(saveMorningCheck(ranger, park, { entries: [{ trailId: other.trails[0].id, report: { status: "open" } }] }, { now }));
    expect(foreign).toMatchObject({ status: 400, details: { problems: [{ trailId: other.trails[0].id, field: "trailId" }] } });
    const stranger = await staffOf(await createPark());
    expect(await refusal(saveMorningCheck(stranger, park, { entries: [{ trailId: trails[0].id, report: { status: "open" } }] }, { now }))).toMatchObject({ status: 403 });
    expect(await refusal(saveMorningCheck(null, park, { entries: [{ trailId: trails[0].id, report: { status: "open" } }] }, { now }))).toMatchObject({ status: 401 });
    const stale = await refusal(saveMorningCheck(ranger, park, { date: "2026-12-01", entries: [{ trailId: trails[0].id, report: { status: "open" } }] }, { now }));
    expect(stale).toMatchObject({ status: 409, field: "date" });
    expect(await countReports([trails[0].id, other.trails[0].id])).toBe(0);
  });
});
