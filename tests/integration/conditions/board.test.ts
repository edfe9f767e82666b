import { afterAll, describe, expect, it } from "vitest";
import { createHazard } from "@/lib/hazards/hazard-writes";
import { parkLocalInstant } from "@/lib/shared/park-clock";
import { clearParkState, setParkState } from "@/lib/conditions/park-state";
import { postTrailReport } from "@/lib/conditions/write-report";
import { boardForPark } from "@/lib/conditions/board";
import { Park, sequelize } from "@/models";
import { createTrail, parkWithTrails as makeParkWithTrails } from "./fixtures";
import { solidJpeg } from "./photos";

// The parks made here are removed at the end: a 40-trail park left behind would become the
// park with the most trails, which the pressure page offers first to the browser tests.
const madeParks: string[] = [];
const parkWithTrails: typeof makeParkWithTrails = async (...args) => {
  const made = await makeParkWithTrails(...args);
  madeParks.push(made.park.id);
  return made;
};

afterAll(async () => {
  await Park.destroy({ where: { id: madeParks } });
  await sequelize.close();
});

const ZONE = "America/Los_Angeles";
const at = (date: string, time: string) => parkLocalInstant(date, time, ZONE);

/** Counts every statement Sequelize sends while `fn` runs. */
async function countQueries(fn: () => Promise<unknown>): Promise<number> {
  let count = 0;
  sequelize.addHook("beforeQuery", "count-queries", () => {
    count += 1;
  });
  try {
    await fn();
  } finally {
    sequelize.removeHook("beforeQuery", "count-queries");
  }
  return count;
}

describe("the conditions board", () => {
  it("shows today's status, what changed since yesterday, inspection time and open hazards", async () => {
    const { park, ranger, trails } = await parkWithTrails(3, ZONE);
    const [a, b, c] = trails;
    await postTrailReport(ranger, a.id, { status: "open", surfaces: ["dry"] }, { now: at("2026-12-01", "06:40") });
    await postTrailReport(ranger, a.id, { status: "closed", reason: "Wet after rain", surfaces: ["muddy"] }, { now: at("2026-12-02", "06:42") });
    await postTrailReport(ranger, b.id, { status: "open", surfaces: ["tacky"] }, { now: at("2026-12-01", "06:50") });
    await postTrailReport(ranger, b.id, { status: "open", surfaces: ["tacky"], features: { berms: "soft" } }, { now: at("2026-12-02", "06:55") });
    await createHazard(ranger, park, { kind: "fallen-tree", trailId: c.id, distanceAlongM: 200 }, [{ name: "t.jpg", bytes: await solidJpeg() }], { now: at("2026-12-02", "07:00") });
    await createHazard(ranger, park, { kind: "machinery", lon: park.centerLon + 0.002, lat: park.centerLat }, [], { now: at("2026-12-02", "07:05") });

    const board = (await boardForPark(park.slug, at("2026-12-02", "08:00")))!;
    expect(board.date).toBe("2026-12-02");
    expect(board.inspectedCount).toBe(2);
    const byName = new Map(board.trails.map((t) => [t.name, t]));
    expect(byName.get("Trail 1")).toMatchObject({ status: "closed", reason: "Wet after rain", changedSinceYesterday: true, changes: { status: { from: "open", to: "closed" } }, lastReportAt: "2026-12-02T14:42:00.000Z" });
    expect(byName.get("Trail 2")).toMatchObject({ status: "open", changedSinceYesterday: false, features: { berms: "soft" } });
    expect(byName.get("Trail 3")).toMatchObject({ status: null, effectiveStatus: null, inspectedToday: false, lastReportAt: null });
    expect(byName.get("Trail 3")!.hazards).toHaveLength(1);
    expect(byName.get("Trail 3")!.hazards[0]).toMatchObject({ kind: "fallen-tree", trailId: c.id });
    expect(byName.get("Trail 3")!.hazards[0].photoIds).toHaveLength(1);
    expect(board.parkHazards.map((h) => h.kind)).toEqual(["machinery"]);

    // The next morning before inspection: yesterday's report is the latest, status null.
    const nextDay = (await boardForPark(park.slug, at("2026-12-03", "05:00")))!;
    expect(nextDay.trails.find((t) => t.id === a.id)).toMatchObject({ status: null, lastReportAt: "2026-12-02T14:42:00.000Z", yesterday: { status: "closed" } });
  });

  it("a park-wide closure overrides every trail's status while it lasts", async () => {
    const { park, ranger, trails } = await parkWithTrails(2, ZONE);
    await postTrailReport(ranger, trails[0].id, { status: "open", surfaces: ["dry"] }, { now: at("2026-12-02", "06:40") });
    await setParkState(ranger, park, { state: "closed", message: "Lightning: whole park closed" }, { now: at("2026-12-02", "12:00") });
    const closed = (await boardForPark(park.slug, at("2026-12-02", "12:05")))!;
    expect(closed.parkState).toMatchObject({ state: "closed", message: "Lightning: whole park closed" });
    expect(closed.trails.map((t) => t.effectiveStatus)).toEqual(["closed", "closed"]);
    expect(closed.trails[0].status).toBe("open");

    expect(await clearParkState(ranger, park, { now: at("2026-12-02", "13:00") })).toEqual({ cleared: 1 });
    const cleared = (await boardForPark(park.slug, at("2026-12-02", "13:05")))!;
    expect(cleared.parkState).toBeNull();
    expect(cleared.trails[0].effectiveStatus).toBe("open");
  });

  it("a state with an end time stops overriding at its end", async () => {
    const { park, ranger } = await parkWithTrails(1, ZONE);
    await setParkState(ranger, park, { state: "delayed", message: "Opens at 10:00", endsAt: at("2026-12-02", "10:00").toISOString() }, { now: at("2026-12-02", "06:00") });
    expect((await boardForPark(park.slug, at("2026-12-02", "09:59")))!.parkState?.state).toBe("delayed");
    expect((await boardForPark(park.slug, at("2026-12-02", "10:01")))!.parkState).toBeNull();
  });

  it("answers from one query whatever the number of trails", async () => {
    const small = await parkWithTrails(1, ZONE);
    const large = await parkWithTrails(1, ZONE);
    for (let i = 2; i <= 40; i++) {
      const trail = await createTrail(large.park, `Trail ${i}`);
      await postTrailReport(large.ranger, trail.id, { status: "caution", reason: "Soft", surfaces: ["damp"] }, { now: at("2026-12-02", "06:30") });
      if (i % 5 === 0) await createHazard(large.ranger, large.park, { kind: "other", trailId: trail.id, distanceAlongM: 10 }, []);
    }
    const now = at("2026-12-02", "08:00");
    const smallCount = await countQueries(() => boardForPark(small.park.slug, now));
    const largeCount = await countQueries(async () => expect((await boardForPark(large.park.slug, now))!.trails).toHaveLength(40));
    // Gone again (with everything on them): a 40-trail park left behind would become the pressure
    // page's default park ("the one with the most trails") in the browser tests that follow.
    await Promise.all([small.park.destroy(), large.park.destroy()]);
    expect(smallCount).toBe(1);
    expect(largeCount).toBe(1);
  });

  it("an unknown park is null (the API answers 404)", async () => {
    expect(await boardForPark("no-such-park-anywhere")).toBeNull();
  });
});
