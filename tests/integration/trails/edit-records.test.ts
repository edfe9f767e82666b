import { afterAll, describe, expect, it } from "vitest";
import { trailDownload } from "@/lib/trails/download";
import { getTrailDetail, listParkTrails } from "@/lib/trails/queries";
import { AppError } from "@/lib/shared/errors";
import { addTrailFeature, deleteTrailFeature, updateTrailFeature } from "@/lib/trails/edit-features";
import { archiveTrail, updateTrailMetadata } from "@/lib/trails/edit-trail";
import { createTrailFromUpload } from "@/lib/trails/save-upload";
import { Trail, TrailFeature, TrailVersion, sequelize } from "@/models";
import { corpusFile, personIn, trailPark } from "./fixtures";

afterAll(() => sequelize.close());

async function parkWithTrail() {
  const park = await trailPark();
  const manager = await personIn(park.id, "manager");
  const { trail } = await createTrailFromUpload(manager, park, corpusFile("good-track.gpx"), { name: "Edit Me", difficulty: "intermediate" });
  return { park, manager, trail };
}

describe("editing a trail's metadata (optimistic locking)", () => {
  it("saves with the lockVersion read, then refuses a stale one with 409 and the current values", async () => {
    const { manager, trail } = await parkWithTrail();
    const read = (await getTrailDetail(trail.id, manager)).lockVersion;
    const saved = await updateTrailMetadata(manager, trail.id, { name: "Edited", lockVersion: read });
    expect(saved).toMatchObject({ name: "Edited", lockVersion: read + 1 });

    const error = (await updateTrailMetadata(manager, trail.id, { difficulty: "extreme", lockVersion: read }).catch((e) => e)) as AppError;
    expect(error).toBeInstanceOf(AppError);
    expect(error.status).toBe(409);
    expect(error.details).toEqual({ current: { name: "Edited", difficulty: "intermediate", kind: "flow", direction: "downhill", lockVersion: read + 1 } });
    expect(await Trail.findByPk(trail.id)).toMatchObject({ difficulty: "intermediate", lockVersion: read + 1 });
  });

  it("refuses unknown fields (no mass assignment) and bad values with 400-style zod errors", async () => {
    const { manager, trail } = await parkWithTrail();
    await expect(updateTrailMetadata(manager, trail.id, { parkId: trail.parkId, lockVersion: 0 })).rejects.toThrow(/Unrecognized key/i);
    await expect(updateTrailMetadata(manager, trail.id, { difficulty: "black", lockVersion: 0 })).rejects.toThrow(/Choose a difficulty/);
    await expect(updateTrailMetadata(manager, trail.id, { name: "No lock" })).rejects.toThrow(/lockVersion/);
  });
});

describe("archiving", () => {
  it("hides the trail from the list and the public, and keeps versions, files and features", async () => {
    const { park, manager, trail } = await parkWithTrail();
    expect((await listParkTrails(park.id)).map((t) => t.id)).toContain(trail.id);
    await archiveTrail(manager, trail.id);

    expect((await listParkTrails(park.id)).map((t) => t.id)).not.toContain(trail.id);
    expect(((await getTrailDetail(trail.id, null).catch((e) => e)) as AppError).status).toBe(404);
    expect(((await trailDownload(trail.id, null, {}).catch((e) => e)) as AppError).status).toBe(404);
    // History stays: staff of the park still read it, with every version and feature.
    const detail = await getTrailDetail(trail.id, manager);
    expect(detail.archivedAt).not.toBeNull();
    expect(detail.versions).toHaveLength(1);
    expect(detail.features).toHaveLength(2);
    expect(await TrailVersion.count({ where: { trailId: trail.id } })).toBe(1);
    // An archived trail takes no more edits.
    expect(((await updateTrailMetadata(manager, trail.id, { name: "Ghost", lockVersion: detail.lockVersion }).catch((e) => e)) as AppError).status).toBe(404);
  });
});

describe("features", () => {
  it("adds a feature by distance or by a point snapped onto the line, then retypes, resizes, moves and deletes it", async () => {
    const { manager, trail } = await parkWithTrail();
    const byDistance = await addTrailFeature(manager, trail.id, { kind: "jump", size: "medium", distanceAlongM: 100 });
    expect(byDistance.distanceAlongM).toBe(100);
    expect(byDistance.lon).toBeCloseTo(-121.94, 7); // the corpus line runs along the meridian −121.94

    // 5 m east of the line at ~110 m along (1e-5° of latitude ≈ 1.11 m; 6.6e-5° of longitude ≈ 5 m at 47.3°).
    const snapped = await addTrailFeature(manager, trail.id, { kind: "berm", lon: -121.94 + 6.6e-5, lat: 47.299, name: "Lower berm" });
    expect(snapped.lon).toBeCloseTo(-121.94, 7);
    expect(snapped.lat).toBeCloseTo(47.299, 6);
    expect(snapped.distanceAlongM).toBeCloseTo(111.2, 0);

    const far = (await addTrailFeature(manager, trail.id, { kind: "drop", lon: -121.93, lat: 47.299 }).catch((e) => e)) as AppError;
    expect(far.status).toBe(422);
    expect(far.message).toContain(`from ${trail.name};`);
    const beyond = (await addTrailFeature(manager, trail.id, { kind: "drop", distanceAlongM: 5000 }).catch((e) => e)) as AppError;
    expect(beyond.status).toBe(422);

    const { feature: updated } = await updateTrailFeature(manager, byDistance.id, { kind: "drop", size: "large", distanceAlongM: 50 });
    expect(updated).toMatchObject({ kind: "drop", size: "large", distanceAlongM: 50 });
    await deleteTrailFeature(manager, byDistance.id);
    expect(await TrailFeature.findByPk(byDistance.id)).toBeNull();
    expect(await TrailFeature.count({ where: { trailId: trail.id } })).toBe(3); // two from the file + the berm
  });
});

describe("who may write (ASVS v5.0.0 8.2.1, 8.2.2)", () => {
  it("refuses a ranger of another park and a rider with 403, anonymous with 401, and changes nothing", async () => {
    const { park, manager, trail } = await parkWithTrail();
    const feature = await addTrailFeature(manager, trail.id, { kind: "berm", distanceAlongM: 20 });
    const otherPark = await trailPark();
    const callers = { otherRanger: await personIn(otherPark.id, "ranger"), rider: await personIn(null), anonymous: null };
    const expected = { otherRanger: 403, rider: 403, anonymous: 401 };

    for (const [who, actor] of Object.entries(callers)) {
      const attempts = {
        create: () => createTrailFromUpload(actor, park, corpusFile("good-track.gpx"), {}),
        update: () => updateTrailMetadata(actor, trail.id, { name: "Hijacked", lockVersion: trail.lockVersion }),
        archive: () => archiveTrail(actor, trail.id),
        addFeature: () => addTrailFeature(actor, trail.id, { kind: "jump", distanceAlongM: 10 }),
        moveFeature: () => updateTrailFeature(actor, feature.id, { size: "large" }),
        deleteFeature: () => deleteTrailFeature(actor, feature.id),
      };
      for (const [what, attempt] of Object.entries(attempts)) {
        const error = (await attempt().catch((e) => e)) as AppError;
        expect({ who, what, status: error.status }).toEqual({ who, what, status: expected[who as keyof typeof expected] });
      }
    }
    expect(await Trail.count({ where: { parkId: park.id } })).toBe(1);
    expect(await Trail.findByPk(trail.id)).toMatchObject({ name: "Edit Me", archivedAt: null });
    expect(await TrailFeature.findByPk(feature.id)).toMatchObject({ size: null });
  });

  it("lets a ranger of the park edit, as a manager can", async () => {
    const { park, trail } = await parkWithTrail();
    const ranger = await personIn(park.id, "ranger");
    await expect(updateTrailMetadata(ranger, trail.id, { kind: "jump", lockVersion: trail.lockVersion })).resolves.toMatchObject({ kind: "jump" });
  });
});
