import { afterAll, afterEach, describe, expect, it, vi } from "vitest";
import { getTrailDetail, listParkTrails } from "@/lib/trails/queries";
import { AppError } from "@/lib/shared/errors";
import { toGpx } from "@/lib/trails/pure";
import { createTrailFromUpload, replaceTrailLine } from "@/lib/trails/save-upload";
import { AuditEvent, Trail, TrailFeature, TrailVersion, sequelize } from "@/models";
import { corpusFile, demoFile, manifest, personIn, trailPark } from "./fixtures";

afterAll(() => sequelize.close());
afterEach(() => vi.restoreAllMocks());

async function rowsOf(parkId: string) {
  const trails = await Trail.findAll({ where: { parkId } });
  const ids = trails.map((t) => t.id);
  return {
    trails: trails.length,
    versions: await TrailVersion.count({ where: { trailId: ids } }),
    features: await TrailFeature.count({ where: { trailId: ids } }),
    audits: await AuditEvent.count({ where: { parkId, action: "trail.create" } }),
  };
}

describe("creating a trail from an upload", () => {
  it("stores the trail, version 1 with the original bytes, and the file's features", async () => {
    const park = await trailPark();
    const manager = await personIn(park.id, "manager");
    const file = corpusFile("good-track.gpx");
    const { trail } = await createTrailFromUpload(manager, park, file, { kind: "technical" });

    expect(trail).toMatchObject({ name: "Corpus Line", kind: "technical", direction: "downhill", currentVersion: 1, pointCount: 12 });
    // No difficulty was given: the suggestion from the grades is taken (22 m over ~220 m ≈ 10 %: intermediate, IMBA ≤ 10 %).
    expect(trail.difficulty).toBe(trail.suggestedDifficulty);
    const version = await TrailVersion.findOne({ where: { trailId: trail.id } });
    expect(version).toMatchObject({ versionNo: 1, sourceFormat: "gpx", sourceFilename: "good-track.gpx", uploadedBy: manager.id });
    expect(Buffer.compare(version!.sourceBytes, file.bytes)).toBe(0);
    const features = await TrailFeature.findAll({ where: { trailId: trail.id }, order: [["distanceAlongM", "ASC"]] });
    expect(features.map((f) => f.kind).sort()).toEqual(["berm", "wooden-feature"]);
    expect(await rowsOf(park.id)).toEqual({ trails: 1, versions: 1, features: 2, audits: 1 });
  });

  it("writes nothing when a step inside the transaction fails", async () => {
    const park = await trailPark();
    const manager = await personIn(park.id, "manager");
    vi.spyOn(TrailFeature, "bulkCreate").mockRejectedValueOnce(new Error("simulated failure while writing features"));
    await expect(createTrailFromUpload(manager, park, corpusFile("good-track.gpx"), {})).rejects.toThrow(/simulated failure/);
    expect(await rowsOf(park.id)).toEqual({ trails: 0, versions: 0, features: 0, audits: 0 });
  });

  it("refuses every bad file of the corpus with its status and stores nothing", async () => {
    const park = await trailPark();
    const ranger = await personIn(park.id, "ranger");
    const refusals = manifest.entries.filter((e) => e.status !== 200 && !e.parkCenter);
    expect(refusals.length).toBeGreaterThanOrEqual(25);
    for (const entry of refusals) {
      const error = await createTrailFromUpload(ranger, park, corpusFile(entry.file, entry.contentType), {}).catch((e) => e);
      expect(error, entry.file).toBeInstanceOf(AppError);
      expect({ file: entry.file, status: (error as AppError).status }).toEqual({ file: entry.file, status: entry.status });
      expect((error as AppError).message).toContain(entry.message);
    }
    expect(await rowsOf(park.id)).toEqual({ trails: 0, versions: 0, features: 0, audits: 0 });
  });

  it("stores waypoint names longer than a feature name may be, cut to 80 characters", async () => {
    const park = await trailPark();
    const manager = await personIn(park.id, "manager");
    const segment = Array.from({ length: 20 }, (_, i) => [-121.94, 47.3 + i * 0.0001, 900 - i]);
    const text = toGpx({ name: "Long names", segments: [segment], waypoints: [{ name: `Berm ${"x".repeat(200)}`, type: "berm", lon: -121.94, lat: 47.3005 }] });
    const { trail } = await createTrailFromUpload(manager, park, { bytes: Buffer.from(text), filename: "long-names.gpx" }, {});
    const [feature] = await TrailFeature.findAll({ where: { trailId: trail.id } });
    expect(feature.name).toHaveLength(80);
    expect(feature.kind).toBe("berm");
  });

  it("refuses a name that is too long before writing anything", async () => {
    const park = await trailPark();
    const manager = await personIn(park.id, "manager");
    await expect(createTrailFromUpload(manager, park, corpusFile("good-track.gpx"), { name: "x".repeat(81) })).rejects.toThrow(/80 characters/);
    expect((await rowsOf(park.id)).trails).toBe(0);
  });
});

describe("replacing a trail's line", () => {
  it("keeps version 1 and its bytes, adds version 2, and keeps the features recorded by hand", async () => {
    const park = await trailPark();
    const manager = await personIn(park.id, "manager");
    const first = corpusFile("good-track.gpx");
    const { trail } = await createTrailFromUpload(manager, park, first, { name: "Replaced Line" });
    const handPlaced = await TrailFeature.create({ trailId: trail.id, kind: "drop", name: "Ledge", size: "large", lon: -121.94, lat: 47.2985, distanceAlongM: 0 });

    const second = corpusFile("good-linestring.geojson");
    const { notes } = await replaceTrailLine(manager, trail.id, second);
    const versions = await TrailVersion.findAll({ where: { trailId: trail.id }, order: [["versionNo", "ASC"]] });
    expect(versions.map((v) => [v.versionNo, v.sourceFormat])).toEqual([[1, "gpx"], [2, "geojson"]]);
    expect(Buffer.compare(versions[0].sourceBytes, first.bytes)).toBe(0);
    expect(Buffer.compare(versions[1].sourceBytes, second.bytes)).toBe(0);
    const reloaded = await Trail.findByPk(trail.id);
    expect(reloaded).toMatchObject({ currentVersion: 2, name: "Replaced Line" });
    expect(await TrailFeature.findByPk(handPlaced.id)).toMatchObject({ kind: "drop", size: "large", name: "Ledge" });
    expect(notes.join(" ")).toContain("kept");
    expect((await getTrailDetail(trail.id, null)).versions.map((v) => v.versionNo)).toEqual([2, 1]);
  });

  it("leaves the trail and its versions as they were when the new file is refused", async () => {
    const park = await trailPark();
    const ranger = await personIn(park.id, "ranger");
    const { trail } = await createTrailFromUpload(ranger, park, corpusFile("good-track.gpx"), {});
    const error = await replaceTrailLine(ranger, trail.id, corpusFile("far-from-park.gpx")).catch((e) => e);
    expect((error as AppError).status).toBe(422);
    expect(await TrailVersion.count({ where: { trailId: trail.id } })).toBe(1);
    expect(await Trail.findByPk(trail.id)).toMatchObject({ currentVersion: 1, lengthM: trail.lengthM });
  });

  it("numbers two replacements sent at once 2 and 3 (the trail row is locked)", async () => {
    const park = await trailPark();
    const manager = await personIn(park.id, "manager");
    const { trail } = await createTrailFromUpload(manager, park, demoFile("gnarlroot.gpx"), {});
    await Promise.all([replaceTrailLine(manager, trail.id, demoFile("scree-stairs.gpx")), replaceTrailLine(manager, trail.id, corpusFile("good-track.gpx"))]);
    const numbers = (await TrailVersion.findAll({ where: { trailId: trail.id } })).map((v) => v.versionNo).sort();
    expect(numbers).toEqual([1, 2, 3]);
    expect((await listParkTrails(park.id))[0].currentVersion).toBe(3);
  });
});
