import { afterAll, describe, expect, it } from "vitest";
import { parkLocalInstant } from "@/lib/shared/park-clock";
import { postTrailReport } from "@/lib/conditions/write-report";
import { AppError } from "@/lib/shared/errors";
import { AuditEvent, TrailReport, sequelize } from "@/models";
import { parkWithTrails, refusal, riderActor, staffOf } from "./fixtures";
import { createPark } from "../helpers";

afterAll(() => sequelize.close());

const ZONE = "America/Los_Angeles";
const at = (date: string, time: string) => parkLocalInstant(date, time, ZONE);

describe("trail reports", () => {
  it("a report at 23:30 and one at 00:30 park time land on different park-local dates", async () => {
    const { ranger, trails } = await parkWithTrails(1, ZONE);
    const late = await postTrailReport(ranger, trails[0].id, { status: "open", surfaces: ["dry"] }, { now: at("2026-12-01", "23:30") });
    const early = await postTrailReport(ranger, trails[0].id, { status: "caution", reason: "Frost on the bridges", surfaces: ["frozen"] }, { now: at("2026-12-02", "00:30") });
    expect(late).toMatchObject({ date: "2026-12-01", revision: 1 });
    // A new day starts from no report: base revision 0, revision 1.
    expect(early).toMatchObject({ date: "2026-12-02", revision: 1 });
    // Both instants fall on 2026-12-02 in UTC (07:30Z and 08:30Z): the park's zone decided.
    expect(late.reportedAt.slice(0, 10)).toBe("2026-12-02");
  });

  it("a correction is a new revision; the earlier one stays in history, not current", async () => {
    const { ranger, trails } = await parkWithTrails(1, ZONE);
    const now = at("2026-12-03", "06:40");
    await postTrailReport(ranger, trails[0].id, { status: "open", surfaces: ["wet"] }, { now });
    const corrected = await postTrailReport(ranger, trails[0].id, { status: "caution", reason: "Slick roots", surfaces: ["wet"], baseRevision: 1 }, { now });
    expect(corrected).toMatchObject({ revision: 2, status: "caution", isCurrent: true });
    const rows = await TrailReport.findAll({ where: { trailId: trails[0].id }, order: [["revision", "ASC"]] });
    expect(rows.map((r) => [r.revision, r.status, r.isCurrent])).toEqual([
      [1, "open", false],
      [2, "caution", true],
    ]);
  });

  it("a stale base revision is refused with 409 and today's current values", async () => {
    const { ranger, trails } = await parkWithTrails(1, ZONE);
    const now = at("2026-12-03", "07:00");
    await postTrailReport(ranger, trails[0].id, { status: "open", surfaces: ["dry"] }, { now });
    const error = await refusal(postTrailReport(ranger, trails[0].id, { status: "closed", reason: "Tree down" }, { now }));
    expect(error).toBeInstanceOf(AppError);
    expect(error.status).toBe(409);
    expect(error.details).toMatchObject({ current: { revision: 1, status: "open", surfaces: ["dry"] } });
  });

  for (const base of [0, 1]) {
    it(`two staff saving at once from revision ${base}: one revision is written, the other gets 409`, async () => {
      const { park, ranger, trails } = await parkWithTrails(1, ZONE);
      const manager = await staffOf(park, "manager");
      const now = at("2026-12-04", "06:50");
      if (base === 1) await postTrailReport(ranger, trails[0].id, { status: "open", surfaces: ["tacky"] }, { now });
      const results = await Promise.allSettled([
        postTrailReport(ranger, trails[0].id, { status: "caution", reason: "Soft berms", baseRevision: base }, { now }),
        postTrailReport(manager, trails[0].id, { status: "closed", reason: "Washout at the bottom", baseRevision: base }, { now }),
      ]);
      const fulfilled = results.filter((r) => r.status === "fulfilled");
      const rejected = results.filter((r): r is PromiseRejectedResult => r.status === "rejected");
      expect(fulfilled).toHaveLength(1);
      expect(rejected).toHaveLength(1);
      expect(rejected[0].reason).toMatchObject({ status: 409 });
      const rows = await TrailReport.findAll({ where: { trailId: trails[0].id } });
      expect(rows).toHaveLength(base + 1);
      expect(rows.filter((r) => r.isCurrent)).toHaveLength(1);
      expect(rows.find((r) => r.isCurrent)!.revision).toBe(base + 1);
    });
  }

  it("every status change is in the audit log with from and to; an unchanged status is not", async () => {
    const { park, ranger, trails } = await parkWithTrails(1, ZONE);
    await postTrailReport(ranger, trails[0].id, { status: "open", surfaces: ["dry"] }, { now: at("2026-12-05", "06:30") });
    await postTrailReport(ranger, trails[0].id, { status: "open", surfaces: ["dusty"] }, { now: at("2026-12-06", "06:30") });
    await postTrailReport(ranger, trails[0].id, { status: "closed", reason: "Storm damage", baseRevision: 1 }, { now: at("2026-12-06", "09:00") });
    const events = await AuditEvent.findAll({ where: { parkId: park.id, action: "report.status-change" }, order: [["id", "ASC"]] });
    expect(events.map((e) => [e.data.from, e.data.to, e.data.date])).toEqual([
      [null, "open", "2026-12-05"],
      ["open", "closed", "2026-12-06"],
    ]);
    expect(events[1].actorId).toBe(ranger.id);
  });

  it("anonymous callers are refused with 401, riders and another park's ranger with 403; nothing is written", async () => {
    const { trails } = await parkWithTrails(1, ZONE);
    const otherRanger = await staffOf(await createPark());
    const body = { status: "open" };
    expect(await refusal(postTrailReport(null, trails[0].id, body))).toMatchObject({ status: 401 });
    expect(await refusal(postTrailReport(await riderActor(), trails[0].id, body))).toMatchObject({ status: 403 });
    expect(await refusal(postTrailReport(otherRanger, trails[0].id, body))).toMatchObject({ status: 403 });
    expect(await TrailReport.count({ where: { trailId: trails[0].id } })).toBe(0);
  });

  it("bad input is a 400 naming the field, and an unknown trail a 404", async () => {
    const { ranger, trails } = await parkWithTrails(1, ZONE);
    const error = await refusal(postTrailReport(ranger, trails[0].id, { status: "closed" }));
    expect(error).toMatchObject({ name: "ZodError" });
    expect(await refusal(postTrailReport(ranger, "00000000-0000-4000-8000-000000000000", { status: "open" }))).toMatchObject({ status: 404 });
    expect(await refusal(postTrailReport(ranger, "not-a-uuid", { status: "open" }))).toMatchObject({ status: 404 });
  });
});
