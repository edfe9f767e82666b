import "server-only";
import path from "node:path";
import { env } from "@/lib/server/env";
import { localDriver } from "./local-driver";
import type { BlobStorage } from "./types";

export type { BlobStorage, StoredObject } from "./types";

/** The folder photos are written to: PHOTO_STORAGE_DIR, relative to the app folder. */
export const photoStorageDir = () => path.resolve(/* turbopackIgnore: true */ process.cwd(), env().PHOTO_STORAGE_DIR);

let cached: BlobStorage | undefined;

/** The storage hazard photos go to (the local driver; swap the driver here for an object store). */
export function photoStorage(): BlobStorage {
  cached ??= localDriver(photoStorageDir());
  return cached;
}
