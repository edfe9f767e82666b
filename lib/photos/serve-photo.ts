import "server-only";
import { notFound } from "@/lib/shared/errors";
import { isUuid } from "@/lib/shared/ids";
import { photoStorage } from "@/lib/server/storage";
import { Photo } from "@/models";

/**
 * A stored photo with the headers that keep it an image (ASVS v5.0.0 5.4.1, 3.2.1): its own
 * type, nosniff, inline with a file name of ours, and a long cache (an id's bytes never change).
 */
export async function photoResponse(id: string, size: string | null): Promise<Response> {
  if (!isUuid(id)) throw notFound("Photo not found.");
  if (size !== null && size !== "full" && size !== "thumb") throw notFound("Photo not found.");
  const photo = await Photo.findByPk(id);
  if (!photo) throw notFound("Photo not found.");
  const stored = await photoStorage().get(size === "thumb" ? photo.thumbKey : photo.storageKey);
  if (!stored) throw notFound("Photo not found.");
  return new Response(new Uint8Array(stored.bytes), {
    headers: {
      "Content-Type": photo.contentType,
      "Content-Length": String(stored.bytes.length),
      "X-Content-Type-Options": "nosniff",
      "Content-Disposition": `inline; filename="hazard-${photo.id}.jpg"`,
      "Content-Security-Policy": "default-src 'none'; sandbox",
      "Cache-Control": "public, max-age=31536000, immutable",
    },
  });
}
