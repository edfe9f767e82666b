import { photoStorage } from "@/lib/server/storage";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { createHazard, updateHazard } from "@/lib/hazards/hazard-writes";
import { PHOTO_LIMITS } from "@/lib/photos/pure/limits";
import { photoResponse } from "@/lib/photos/serve-photo";
import { AuditEvent, Hazard, Photo, sequelize } from "@/models";
import { createPark } from "../helpers";
import { parkWithTrails, refusal, staffOf, storedFiles } from "../conditions/fixtures";
import { hugeCanvasPng, jpegWithExif, oversizePng, solidJpeg } from "../conditions/photos";

afterAll(() => sequelize.close());

let hugeCanvas: Buffer;
beforeAll(async () => {
  hugeCanvas = await hugeCanvasPng();
}, 120_000);

const here = (park: { centerLon: number; centerLat: number }) => ({ lon: String(park.centerLon + 0.001), lat: String(park.centerLat + 0.001) });

describe("hazard photos (ASVS v5.0.0 5.2.1, 5.2.2, 5.3.2)", () => {
  it("stores a re-encoded JPEG with no EXIF, orientation applied, plus a thumbnail", async () => {
    const { park, ranger } = await parkWithTrails(0);
    const original = await jpegWithExif();
    expect((await sharp(original).metadata()).exif).toBeDefined();
    const hazard = await createHazard(ranger, park, { kind: "fallen-tree", note: "Across the lower berm", ...here(park) }, [{ name: "IMG_0042.jpg", bytes: original }]);
    expect(hazard.photoIds).toHaveLength(1);
    const photo = (await Photo.findByPk(hazard.photoIds[0]))!;
    expect(photo.storageKey).toBe(`hazards/${hazard.id}/${photo.id}.jpg`);
    expect(photo.storageKey).not.toContain("IMG_0042");

    expect(await storedFiles()).toEqual(expect.arrayContaining([photo.storageKey, photo.thumbKey]));
    const full = (await photoStorage().get(photo.storageKey))!.bytes;
    const meta = await sharp(full).metadata();
    expect(meta.format).toBe("jpeg");
    expect(meta.exif).toBeUndefined();
    expect(meta.xmp).toBeUndefined();
    expect(meta.orientation).toBeUndefined();
    // 300 × 120 with orientation 6 is shown 120 wide and 300 high.
    expect([meta.width, meta.height]).toEqual([120, 300]);
    expect(full.includes(Buffer.from("Test Person"))).toBe(false);

    const thumb = await photoResponse(photo.id, "thumb");
    expect(thumb.headers.get("content-type")).toBe("image/jpeg");
    expect(thumb.headers.get("x-content-type-options")).toBe("nosniff");
    expect(thumb.headers.get("content-disposition")).toBe(`inline; filename="hazard-${photo.id}.jpg"`);
    const thumbMeta = await sharp(Buffer.from(await thumb.arrayBuffer())).metadata();
    expect(Math.max(thumbMeta.width!, thumbMeta.height!)).toBeLessThanOrEqual(PHOTO_LIMITS.thumbMaxPx);
  });

  it("shrinks a large photo to at most 2048 px", async () => {
    const { park, ranger } = await parkWithTrails(0);
    const hazard = await createHazard(ranger, park, { kind: "washout", ...here(park) }, [{ name: "wide.jpg", bytes: await solidJpeg(3000, 1000) }]);
    const photo = (await Photo.findByPk(hazard.photoIds[0]))!;
    expect([photo.width, photo.height]).toEqual([2048, 683]);
  });

  const badPhotos: [string, () => Promise<Buffer>, number][] = [
    ["a text file named .jpg", async () => Buffer.from("These are not the pixels you are looking for.\n"), 415],
    ["an image over 8 MB", oversizePng, 413],
    ["a 20000 × 20000 PNG (400 megapixels)", async () => hugeCanvas, 413],
    ["a truncated JPEG", async () => (await solidJpeg()).subarray(0, 40), 422],
  ];
  for (const [what, make, status] of badPhotos) {
    it(`refuses ${what} beside a good photo, leaving no hazard row and no file`, async () => {
      const { park, ranger } = await parkWithTrails(0);
      const filesBefore = await storedFiles();
      const error = await refusal(
        createHazard(ranger, park, { kind: "other", ...here(park) }, [
          { name: "good.jpg", bytes: await solidJpeg() },
          { name: "photo.jpg", bytes: await make() },
        ]),
      );
      expect(error).toMatchObject({ status, field: "photos" });
      expect(error.message).toMatch(/^Photo 2 \(photo\.jpg\)/);
      expect(await Hazard.count({ where: { parkId: park.id } })).toBe(0);
      expect(await storedFiles()).toEqual(filesBefore);
    });
  }

  it("refuses more than 4 photos", async () => {
    const { park, ranger } = await parkWithTrails(0);
    const photo = { name: "p.jpg", bytes: await solidJpeg() };
    expect(await refusal(createHazard(ranger, park, { kind: "other", ...here(park) }, Array(5).fill(photo)))).toMatchObject({ status: 422, field: "photos" });
  });

  it("removes files already written when the transaction fails afterwards", async () => {
    const { park, ranger } = await parkWithTrails(0);
    const filesBefore = await storedFiles();
    const spy = vi.spyOn(AuditEvent, "create").mockRejectedValueOnce(new Error("database went away"));
    try {
      await expect(createHazard(ranger, park, { kind: "machinery", ...here(park) }, [{ name: "a.jpg", bytes: await solidJpeg() }])).rejects.toThrow("database went away");
    } finally {
      spy.mockRestore();
    }
    expect(await Hazard.count({ where: { parkId: park.id } })).toBe(0);
    expect(await storedFiles()).toEqual(filesBefore);
  });
});

describe("hazard pins", () => {
  it("computes the point a distance along a trail, and refuses a point far from the park", async () => {
    const { park, ranger, trails } = await parkWithTrails(1);
    const hazard = await createHazard(ranger, park, { kind: "washout", trailId: trails[0].id, distanceAlongM: "500" }, []);
    expect(hazard.trailId).toBe(trails[0].id);
    expect(hazard.lon).toBeCloseTo(park.centerLon, 9);
    // 500 m north on Turf's sphere (R = 6 371 008.8 m): 500 / 111 195.08 degrees.
    expect(hazard.lat).toBeCloseTo(park.centerLat + 500 / 111_195.08, 7);
    const far = await refusal(createHazard(ranger, park, { kind: "washout", lon: park.centerLon, lat: park.centerLat + 0.3 }, []));
    expect(far).toMatchObject({ status: 422, field: "lon" });
  });

  it("refuses a trail of another park and callers who are not staff of this park", async () => {
    const { park, ranger } = await parkWithTrails(0);
    const other = await parkWithTrails(1);
    expect(await refusal(createHazard(ranger, park, { kind: "other", trailId: other.trails[0].id, ...here(park) }, []))).toMatchObject({ status: 422, field: "trailId" });
    expect(await refusal(createHazard(other.ranger, park, { kind: "other", ...here(park) }, []))).toMatchObject({ status: 403 });
    expect(await refusal(createHazard(null, park, { kind: "other", ...here(park) }, []))).toMatchObject({ status: 401 });
    expect(await Hazard.count({ where: { parkId: park.id } })).toBe(0);
  });

  it("resolving uses the lock version: a second edit from the same version gets 409 with the current hazard", async () => {
    const { park, ranger } = await parkWithTrails(0);
    const manager = await staffOf(park, "manager");
    const hazard = await createHazard(ranger, park, { kind: "wet-wooden-feature", ...here(park) }, []);
    const resolved = await updateHazard(ranger, hazard.id, { lockVersion: hazard.lockVersion, resolved: true });
    expect(resolved.resolvedAt).not.toBeNull();
    expect(resolved.lockVersion).toBe(hazard.lockVersion + 1);
    const stale = await refusal(updateHazard(manager, hazard.id, { lockVersion: hazard.lockVersion, note: "Dried out" }));
    expect(stale).toMatchObject({ status: 409, details: { current: { id: hazard.id, lockVersion: resolved.lockVersion } } });
    expect(await refusal(updateHazard(await staffOf(await createPark()), hazard.id, { lockVersion: 1, resolved: false }))).toMatchObject({ status: 403 });
  });
});
