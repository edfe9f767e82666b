import { destination, distance } from "@turf/turf";
import { ZodError } from "zod";
import { afterAll, describe, expect, it } from "vitest";
import { loadActor } from "@/lib/server/auth/actor";
import { AppError } from "@/lib/shared/errors";
import { moveHazard, moveTrailFeature } from "@/lib/map/move-pins";
import { AuditEvent, Hazard, TrailFeature, sequelize } from "@/models";
import { addStaff, createPark, createUser } from "../helpers";
import { createTrail } from "./fixtures";

afterAll(() => sequelize.close());

async function setting() {
  const [park, otherPark] = [await createPark(), await createPark()];
  const [ranger, rider, otherRanger] = [await createUser(), await createUser(), await createUser()];
  await addStaff(park.id, ranger.id, "ranger");
  await addStaff(otherPark.id, otherRanger.id, "ranger");
  const trail = await createTrail(park, "Fern Gully");
  const feature = await TrailFeature.create({ trailId: trail.id, kind: "berm", name: "Big Lean", size: null, lon: 8.505, lat: 46.8, distanceAlongM: 381 });
  const hazard = await Hazard.create({ parkId: park.id, trailId: trail.id, kind: "fallen-tree", note: null, lon: 8.506, lat: 46.8005, reportedBy: null });
  return { park, trail, feature, hazard, ranger: await loadActor(ranger.id), rider: await loadActor(rider.id), otherRanger: await loadActor(otherRanger.id) };
}

const status = (error: unknown) => (error instanceof AppError ? error.status : error instanceof ZodError ? 400 : error);

describe("moving a trail feature", () => {
  it("snaps the dropped point onto the trail, records the distance along it and an audit event", async () => {
    const { feature, ranger } = await setting();
    // 30 m north of the line's second leg, west→east along latitude 46.8 from 8.5 to 8.505.
    const dropped = destination([8.502, 46.8], 30, 0, { units: "meters" }).geometry.coordinates;
    const result = await moveTrailFeature(ranger, feature.id, { lon: dropped[0], lat: dropped[1] });
    expect(result.previous).toEqual({ lon: 8.505, lat: 46.8 });
    // Reference: Turf's haversine distance from the trail's start to the point on the line.
    expect(result.feature.distanceAlongM).toBeCloseTo(distance([8.5, 46.8], [8.502, 46.8], { units: "meters" }), 0);
    expect(distance([result.feature.lon, result.feature.lat], [8.502, 46.8], { units: "meters" })).toBeLessThan(1);
    const stored = await TrailFeature.findByPk(feature.id);
    expect(stored).toMatchObject({ lon: result.feature.lon, lat: result.feature.lat });
    expect(await AuditEvent.count({ where: { action: "trail-feature.move", subjectId: feature.id } })).toBe(1);

    // Undo: moving it back restores the original place.
    const undone = await moveTrailFeature(ranger, feature.id, result.previous);
    expect(distance([undone.feature.lon, undone.feature.lat], [8.505, 46.8], { units: "meters" })).toBeLessThan(0.01);
  });

  it("refuses anonymous callers, riders, other parks' rangers, far-away points and bad input, changing nothing", async () => {
    const { feature, rider, otherRanger, ranger } = await setting();
    const to = { lon: 8.503, lat: 46.8 };
    expect(await moveTrailFeature(null, feature.id, to).catch(status)).toBe(401);
    expect(await moveTrailFeature(rider, feature.id, to).catch(status)).toBe(403);
    expect(await moveTrailFeature(otherRanger, feature.id, to).catch(status)).toBe(403);
    const far = destination([8.503, 46.8], 250, 0, { units: "meters" }).geometry.coordinates;
    const refusal = await moveTrailFeature(ranger, feature.id, { lon: far[0], lat: far[1] }).catch((e) => e);
    expect(refusal).toBeInstanceOf(AppError);
    expect(refusal).toMatchObject({ status: 422, field: "lon" });
    expect(refusal.message).toMatch(/250 m from Fern Gully/);
    expect(await moveTrailFeature(ranger, feature.id, { lon: 200, lat: 46.8 }).catch(status)).toBe(400);
    expect(await moveTrailFeature(ranger, feature.id, { lon: 8.5, lat: 46.8, distanceAlongM: 5 }).catch(status)).toBe(400);
    expect(await moveTrailFeature(ranger, "not-a-uuid", to).catch(status)).toBe(404);
    expect(await moveTrailFeature(ranger, "6f1c2a43-5e0b-4c1f-9d7e-2a8b3c4d5e6f", to).catch(status)).toBe(404);
    expect(await TrailFeature.findByPk(feature.id)).toMatchObject({ lon: 8.505, lat: 46.8, distanceAlongM: 381 });
  });
});

describe("moving a hazard pin", () => {
  it("moves it where it was dropped, bumps its version, and refuses a move made from a stale map", async () => {
    const { hazard, ranger } = await setting();
    const first = await moveHazard(ranger, hazard.id, { lon: 8.5071, lat: 46.8011, lockVersion: 0 });
    expect(first.hazard).toMatchObject({ lon: 8.5071, lat: 46.8011, lockVersion: 1 });
    expect(first.previous).toEqual({ lon: 8.506, lat: 46.8005 });
    // A second ranger still holding version 0 is told to reload.
    const stale = await moveHazard(ranger, hazard.id, { lon: 8.508, lat: 46.801, lockVersion: 0 }).catch((e) => e);
    expect(stale).toMatchObject({ status: 409 });
    // Undo with the version the move produced.
    const undone = await moveHazard(ranger, hazard.id, { ...first.previous, lockVersion: first.hazard.lockVersion });
    expect(undone.hazard).toMatchObject({ lon: 8.506, lat: 46.8005, lockVersion: 2 });
    expect(await AuditEvent.count({ where: { action: "hazard.move", subjectId: hazard.id } })).toBe(2);
  });

  it("refuses other parks' staff, resolved hazards and spots far outside the park", async () => {
    const { hazard, otherRanger, rider, ranger } = await setting();
    expect(await moveHazard(rider, hazard.id, { lon: 8.5, lat: 46.8, lockVersion: 0 }).catch(status)).toBe(403);
    expect(await moveHazard(otherRanger, hazard.id, { lon: 8.5, lat: 46.8, lockVersion: 0 }).catch(status)).toBe(403);
    expect(await moveHazard(ranger, hazard.id, { lon: 9.5, lat: 46.8, lockVersion: 0 }).catch(status)).toBe(422);
    expect(await moveHazard(ranger, hazard.id, { lon: 8.5, lat: 46.8 }).catch(status)).toBe(400);
    await hazard.update({ resolvedAt: new Date() });
    expect(await moveHazard(ranger, hazard.id, { lon: 8.5, lat: 46.8, lockVersion: hazard.lockVersion }).catch(status)).toBe(409);
    expect(await Hazard.findByPk(hazard.id)).toMatchObject({ lon: 8.506, lat: 46.8005 });
  });
});
