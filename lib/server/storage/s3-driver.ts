import "server-only";
import { DeleteObjectCommand, GetObjectCommand, ListObjectsV2Command, NoSuchKey, PutObjectCommand, S3Client, S3ServiceException } from "@aws-sdk/client-s3";
import { checkKey, type BlobStorage, type StoredObject } from "./types";

export type S3Settings = {
  bucket: string;
  region: string;
  /** An S3-compatible store's address; unset for AWS itself. */
  endpoint?: string;
  forcePathStyle: boolean;
  /** Unset: the SDK's default chain (environment, shared files, instance role). */
  credentials?: { accessKeyId: string; secretAccessKey: string };
};

const missing = (error: unknown) => error instanceof NoSuchKey || (error instanceof S3ServiceException && error.$metadata.httpStatusCode === 404);

/**
 * Objects in one bucket through the S3 API. A PUT is atomic (readers see the old object or the
 * whole new one), so no temporary names are needed. Checksums are sent and checked only where the
 * API requires them: several S3-compatible stores refuse the SDK's newer default checksum headers.
 */
export function s3Driver(settings: S3Settings): BlobStorage {
  const client = new S3Client({
    region: settings.region,
    endpoint: settings.endpoint,
    forcePathStyle: settings.forcePathStyle,
    credentials: settings.credentials,
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
  const Bucket = settings.bucket;

  return {
    async put(key, bytes, contentType) {
      await client.send(new PutObjectCommand({ Bucket, Key: checkKey(key), Body: bytes, ContentType: contentType, ContentLength: bytes.length }));
    },
    async get(key): Promise<StoredObject | null> {
      try {
        const object = await client.send(new GetObjectCommand({ Bucket, Key: checkKey(key) }));
        const bytes = Buffer.from(await object.Body!.transformToByteArray());
        return { bytes, contentType: object.ContentType ?? "application/octet-stream" };
      } catch (error) {
        if (missing(error)) return null;
        throw error;
      }
    },
    async delete(key) {
      await client.send(new DeleteObjectCommand({ Bucket, Key: checkKey(key) }));
    },
    async list(prefix = "") {
      const keys: string[] = [];
      let ContinuationToken: string | undefined;
      do {
        const page = await client.send(new ListObjectsV2Command({ Bucket, Prefix: prefix || undefined, ContinuationToken }));
        for (const object of page.Contents ?? []) if (object.Key) keys.push(object.Key);
        ContinuationToken = page.IsTruncated ? page.NextContinuationToken : undefined;
      } while (ContinuationToken);
      return keys.sort();
    },
  };
}
