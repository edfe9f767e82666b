import "server-only";
import path from "node:path";
import { env } from "@/lib/server/env";
import { localDriver } from "./local-driver";
import { s3Driver } from "./s3-driver";
import type { BlobStorage } from "./types";

export type { BlobStorage, StoredObject } from "./types";

/** The folder photos are written to by the local driver: PHOTO_STORAGE_DIR, relative to the app folder. */
export const photoStorageDir = () => path.resolve(/* turbopackIgnore: true */ process.cwd(), env().PHOTO_STORAGE_DIR);

let cached: BlobStorage | undefined;

/**
 * The storage hazard photos go to: a folder on this machine (PHOTO_STORAGE=local, the default
 * for one machine), or a bucket of an S3-compatible store (PHOTO_STORAGE=s3), which every
 * instance shares. docs/operations.md says how to choose.
 */
export function photoStorage(): BlobStorage {
  if (cached) return cached;
  const e = env();
  if (e.PHOTO_STORAGE === "s3") {
    const credentials = e.S3_ACCESS_KEY_ID && e.S3_SECRET_ACCESS_KEY ? { accessKeyId: e.S3_ACCESS_KEY_ID, secretAccessKey: e.S3_SECRET_ACCESS_KEY } : undefined;
    cached = s3Driver({ bucket: e.S3_BUCKET!, region: e.S3_REGION, endpoint: e.S3_ENDPOINT, forcePathStyle: e.S3_FORCE_PATH_STYLE === "true", credentials });
  } else {
    cached = localDriver(photoStorageDir());
  }
  return cached;
}
