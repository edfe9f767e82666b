import { randomUUID } from "node:crypto";
import pg from "pg";
import { afterAll, describe, expect, it } from "vitest";
import { boardAnswer } from "@/lib/conditions/board";
import { postTrailReport } from "@/lib/conditions/write-report";
import { hazardsGeoJsonAnswer, trailsGeoJsonAnswer } from "@/lib/map/map-queries";
import { cachedForPark, parkStamp } from "@/lib/parks/park-cache";
import { Hazard, Park, ParkState, Photo, Trail, TrailFeature, sequelize } from "@/models";
import { createTrail, parkWithTrails as makeParkWithTrails } from "../conditions/fixtures";

// The per-park cache (lib/parks/park-cache.ts) and the triggers that invalidate it
// (migrations/20261202-1601-park-versions.ts).
const madeParks: string[] = [];
const parkWithTrails: typeof makeParkWithTrails = async (...args) => {
  const made = await makeParkWithTrails(...args);
  madeParks.push(made.park.id);
  return made;
};
// A second connection, as another app instance (or psql) would write: nothing in this process hears of it.
const other = new pg.Client({ connectionString: process.env.DATABASE_URL });
const otherReady = other.connect();

afterAll(async () => {
  await other.end();
  await Park.destroy({ where: { id: madeParks } });
  await sequelize.close();
});

const versionOf = async (slug: string) => Number((await parkStamp(slug, new Date()))!.version);

describe("per-park cache", () => {
  it("answers from the cache until a write commits, then at once from the database", async () => {
    const { park, ranger, trails } = await parkWithTrails(2);
    const first = (await boardAnswer(park.slug))!;
    expect(await boardAnswer(park.slug)).toBe(first); // the same object: served from the cache

    const note = `Fresh note ${randomUUID().slice(0, 6)}`;
    await postTrailReport(ranger, trails[0].id, { status: "open", surfaces: ["tacky"], note, baseRevision: 0 });
    const afterReport = (await boardAnswer(park.slug))!;
    expect(afterReport).not.toBe(first);
    expect(afterReport.board.trails.find((t) => t.id === trails[0].id)).toMatchObject({ status: "open", note });
    expect(afterReport.etag).not.toBe(first.etag);
    expect(JSON.parse(afterReport.text)).toEqual(afterReport.board);

    // A write by another connection (another instance) invalidates this process's answer too.
    await otherReady;
    await other.query("UPDATE parks SET name = $1 WHERE id = $2", ["Renamed elsewhere", park.id]);
    expect((await boardAnswer(park.slug))!.board.park.name).toBe("Renamed elsewhere");
  });

  it("raises the park's version on every write the board or map shows, and only for that park", async () => {
    const { park, ranger, trails } = await parkWithTrails(1);
    const { park: bystander } = await parkWithTrails(1);
    const bystanderVersion = await versionOf(bystander.slug);
    const writes: Array<[string, () => Promise<unknown>]> = [
      ["a report", () => postTrailReport(ranger, trails[0].id, { status: "open", surfaces: [], baseRevision: 0 })],
      ["a park state", () => ParkState.create({ parkId: park.id, state: "delayed", message: "Fog", startsAt: new Date(), endsAt: null, createdBy: null })],
      ["a hazard", () => Hazard.create({ parkId: park.id, trailId: trails[0].id, kind: "tree-down", note: null, lon: park.centerLon, lat: park.centerLat, reportedBy: null })],
      ["a trail", () => createTrail(park, "Second line")],
      ["a trail's archive", () => Trail.update({ archivedAt: new Date() }, { where: { id: trails[0].id } })],
      ["the park's settings", () => park.update({ name: "Settings changed" })],
    ];
    for (const [what, write] of writes) {
      const before = await versionOf(park.slug);
      await write();
      expect(await versionOf(park.slug), what).toBeGreaterThan(before);
    }
    const hazard = (await Hazard.findOne({ where: { parkId: park.id } }))!;
    const trail = (await Trail.findOne({ where: { parkId: park.id, archivedAt: null } }))!;
    const more: Array<[string, () => Promise<unknown>]> = [
      ["a hazard photo", () => Photo.create({ hazardId: hazard.id, storageKey: `hazards/${hazard.id}/full.jpg`, thumbKey: `hazards/${hazard.id}/thumb.jpg`, contentType: "image/jpeg", width: 1, height: 1, bytes: 1, uploadedBy: null })],
      ["a trail feature", () => TrailFeature.create({ trailId: trail.id, kind: "berm", name: "Top berm", size: null, lon: park.centerLon, lat: park.centerLat, distanceAlongM: 10 })],
      ["a trail feature's removal", () => TrailFeature.destroy({ where: { trailId: trail.id } })],
    ];
    for (const [what, write] of more) {
      const before = await versionOf(park.slug);
      await write();
      expect(await versionOf(park.slug), what).toBeGreaterThan(before);
    }
    expect(await versionOf(bystander.slug)).toBe(bystanderVersion);
  });

  it("caches the map's trails and hazards GeoJSON the same way", async () => {
    const { park, trails } = await parkWithTrails(1);
    const trailsFirst = (await trailsGeoJsonAnswer(park.slug))!;
    const hazardsFirst = (await hazardsGeoJsonAnswer(park.slug))!;
    expect(await trailsGeoJsonAnswer(park.slug)).toBe(trailsFirst);
    expect(await hazardsGeoJsonAnswer(park.slug)).toBe(hazardsFirst);
    await Hazard.create({ parkId: park.id, trailId: trails[0].id, kind: "tree-down", note: "Across the line", lon: park.centerLon, lat: park.centerLat, reportedBy: null });
    const hazardsAfter = (await hazardsGeoJsonAnswer(park.slug))!;
    expect(JSON.parse(hazardsAfter.text).features).toHaveLength(JSON.parse(hazardsFirst.text).features.length + 1);
    expect(await trailsGeoJsonAnswer(park.slug)).not.toBe(trailsFirst);
    expect(await trailsGeoJsonAnswer("no-such-park-anywhere")).toBeNull();
  });

  it("expires at the park's midnight and when a scheduled park state starts, without any write", async () => {
    const { park } = await parkWithTrails(1);
    const now = new Date();
    const starts = new Date(now.getTime() + 60_000);
    await ParkState.create({ parkId: park.id, state: "closed", message: "Lift inspection", startsAt: starts, endsAt: null, createdBy: null });
    let computed = 0;
    const compute = async () => ++computed;
    await cachedForPark(park.slug, "probe", compute, now);
    await cachedForPark(park.slug, "probe", compute, new Date(now.getTime() + 30_000));
    expect(computed).toBe(1);
    await cachedForPark(park.slug, "probe", compute, new Date(starts.getTime() + 1));
    expect(computed).toBe(2);
    await cachedForPark(park.slug, "probe", compute, new Date(now.getTime() + 86_400_000));
    expect(computed).toBe(3);
  });

  it("keeps no failed computation", async () => {
    const { park } = await parkWithTrails(1);
    await expect(cachedForPark(park.slug, "failing", () => Promise.reject(new Error("database went away")))).rejects.toThrow("went away");
    expect(await cachedForPark(park.slug, "failing", async () => "recovered")).toBe("recovered");
  });
});
