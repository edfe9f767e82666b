import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { randomUUID } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import { photoStorage, type BlobStorage } from "@/lib/server/storage";
import { localDriver } from "@/lib/server/storage/local-driver";

// The storage contract every driver keeps (lib/server/storage/types.ts). npm test runs this file
// twice: with the local driver, and with PHOTO_STORAGE=s3 against the fake S3 server.
const folder = mkdtemp(path.join(tmpdir(), "loamcast-storage-"));
afterAll(async () => rm(await folder, { recursive: true, force: true }));

const drivers: Array<[string, () => Promise<BlobStorage>]> = [
  [`the configured driver (PHOTO_STORAGE=${process.env.PHOTO_STORAGE ?? "local"})`, async () => photoStorage()],
  ["the local driver", async () => localDriver(await folder)],
];

describe.each(drivers)("%s", (_name, make) => {
  it("stores, reads back, lists and deletes an object", async () => {
    const storage = await make();
    const prefix = `contract/${randomUUID()}`;
    const bytes = Buffer.from([0xff, 0xd8, 0xff, 0xe0, 1, 2, 3, 250]);
    await storage.put(`${prefix}/full.jpg`, bytes, "image/jpeg");
    await storage.put(`${prefix}/thumb.jpg`, Buffer.from("small"), "image/jpeg");
    expect(await storage.get(`${prefix}/full.jpg`)).toEqual({ bytes, contentType: "image/jpeg" });
    expect(await storage.list(prefix)).toEqual([`${prefix}/full.jpg`, `${prefix}/thumb.jpg`]);
    await storage.put(`${prefix}/full.jpg`, Buffer.from("replaced"), "image/jpeg");
    expect((await storage.get(`${prefix}/full.jpg`))!.bytes.toString()).toBe("replaced");
    await storage.delete(`${prefix}/full.jpg`);
    await storage.delete(`${prefix}/thumb.jpg`);
    expect(await storage.get(`${prefix}/full.jpg`)).toBeNull();
    expect(await storage.list(prefix)).toEqual([]);
  });

  it("answers null for a missing object, deletes one quietly, and refuses keys outside the safe pattern", async () => {
    const storage = await make();
    expect(await storage.get(`contract/${randomUUID()}/none.jpg`)).toBeNull();
    await expect(storage.delete(`contract/${randomUUID()}/none.jpg`)).resolves.toBeUndefined();
    for (const key of ["../secrets.env", "/etc/passwd", "Hazards/UPPER.jpg", "a//b.jpg", ""]) {
      await expect(storage.put(key, Buffer.from("x"), "image/jpeg")).rejects.toThrow("Refusing storage key");
      await expect(storage.get(key)).rejects.toThrow("Refusing storage key");
    }
  });
});
