import "server-only";
import { randomUUID } from "node:crypto";
import type { Transaction } from "sequelize";
import { photoStorage } from "@/lib/server/storage";
import { Photo } from "@/models";
import type { ProcessedPhoto } from "./process-photo";
import { requestLogger } from "@/lib/server/logger";

/**
 * Writes processed photos for one hazard: a Photo row per photo (inside the caller's
 * transaction) and its two files through the storage interface. Keys are new UUIDs, never
 * a file name. Returns the keys written so the caller can delete them if the transaction
 * does not commit: nothing half-written remains.
 */
export async function storeHazardPhotos(
  hazardId: string,
  photos: ProcessedPhoto[],
  uploadedBy: string | null,
  transaction: Transaction,
  written: string[],
): Promise<Photo[]> {
  const storage = photoStorage();
  const rows: Photo[] = [];
  for (const photo of photos) {
    const id = randomUUID();
    const storageKey = `hazards/${hazardId}/${id}.jpg`;
    const thumbKey = `hazards/${hazardId}/${id}-thumb.jpg`;
    rows.push(
      await Photo.create(
        { id, hazardId, storageKey, thumbKey, contentType: photo.contentType, width: photo.width, height: photo.height, bytes: photo.full.length, uploadedBy },
        { transaction },
      ),
    );
    written.push(storageKey);
    await storage.put(storageKey, photo.full, photo.contentType);
    written.push(thumbKey);
    await storage.put(thumbKey, photo.thumb, photo.contentType);
  }
  return rows;
}

/** Best effort: remove files of a write that did not commit. */
export async function deleteStored(keys: string[]): Promise<void> {
  const storage = photoStorage();
  const log = await requestLogger();
  await Promise.all(keys.map((key) => storage.delete(key).catch((error) => log.error({ err: error, key }, "could not delete a stored photo"))));
}
