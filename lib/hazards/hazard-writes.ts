import "server-only";
/** Hazard pins with photos: created all-or-nothing, edited and resolved with optimistic locking. */
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { AppError, notFound } from "@/lib/shared/errors";
import { isUuid } from "@/lib/shared/ids";
import { PHOTO_LIMITS } from "@/lib/photos/pure/limits";
import { processPhoto, type PhotoUpload, type ProcessedPhoto } from "@/lib/photos/process-photo";
import { deleteStored, storeHazardPhotos } from "@/lib/photos/store-photos";
import { hazardInputSchema, hazardPatchSchema } from "@/lib/hazards/pure/schemas";
import { recordAudit } from "@/lib/audit/record";
import { unlessStale } from "@/lib/server/optimistic-lock";
import { Hazard, Photo, Trail, sequelize, type Park } from "@/models";
import { assertWithinPark, pointAlongTrail } from "./pure/hazard-place";

export type HazardView = {
  id: string;
  trailId: string | null;
  kind: string;
  note: string | null;
  lon: number;
  lat: number;
  reportedAt: string;
  resolvedAt: string | null;
  lockVersion: number;
  photoIds: string[];
};

export function hazardView(h: Hazard, photos: Pick<Photo, "id">[]): HazardView {
  return {
    id: h.id,
    trailId: h.trailId,
    kind: h.kind,
    note: h.note,
    lon: h.lon,
    lat: h.lat,
    reportedAt: new Date(h.reportedAt).toISOString(),
    resolvedAt: h.resolvedAt ? new Date(h.resolvedAt).toISOString() : null,
    lockVersion: h.lockVersion,
    photoIds: photos.map((p) => p.id),
  };
}

async function trailOfPark(park: Park, trailId: string): Promise<Trail> {
  const trail = await Trail.findOne({ where: { id: trailId, parkId: park.id, archivedAt: null } });
  if (!trail) throw new AppError(422, "Choose a trail of this park.", "trailId");
  return trail;
}

/**
 * POST /api/trails/{id}/hazards and /api/parks/{slug}/hazards. Every photo is checked and
 * re-encoded before anything is written; then the hazard, its photo rows and files are
 * written together, and files are removed again if the transaction does not commit.
 */
export async function createHazard(
  actor: Actor | null,
  park: Park,
  fields: Record<string, unknown>,
  uploads: PhotoUpload[],
  options: { now?: Date; trailIdFromPath?: string } = {},
): Promise<HazardView> {
  authorize(actor, "hazard:write", { parkId: park.id });
  if (options.trailIdFromPath && fields.trailId && fields.trailId !== options.trailIdFromPath) {
    throw new AppError(400, "The trail in the form differs from the trail in the address.", "trailId");
  }
  const input = hazardInputSchema.parse(options.trailIdFromPath ? { ...fields, trailId: options.trailIdFromPath } : fields);
  const trail = input.trailId ? await trailOfPark(park, input.trailId) : null;
  const point = input.distanceAlongM !== undefined && trail ? pointAlongTrail(trail.geometry, input.distanceAlongM) : { lon: input.lon!, lat: input.lat! };
  assertWithinPark(point, { lon: park.centerLon, lat: park.centerLat });
  if (uploads.length > PHOTO_LIMITS.maxPerHazard) throw new AppError(422, `Attach at most ${PHOTO_LIMITS.maxPerHazard} photos.`, "photos");

  // One at a time keeps memory flat on a small server.
  const processed: ProcessedPhoto[] = [];
  for (const [index, upload] of uploads.entries()) processed.push(await processPhoto(upload, index));

  const now = options.now ?? new Date();
  const written: string[] = [];
  try {
    return await sequelize.transaction(async (transaction) => {
      const hazard = await Hazard.create(
        { parkId: park.id, trailId: trail?.id ?? null, kind: input.kind, note: input.note || null, lon: point.lon, lat: point.lat, reportedBy: actor.id, reportedAt: now },
        { transaction },
      );
      const photos = await storeHazardPhotos(hazard.id, processed, actor.id, transaction, written);
      await recordAudit({ parkId: park.id, actorId: actor.id, action: "hazard.create", subjectType: "hazard", subjectId: hazard.id, data: { kind: input.kind, trailId: trail?.id ?? null, photos: photos.length } }, transaction);
      return hazardView(hazard, photos);
    });
  } catch (error) {
    await deleteStored(written);
    throw error;
  }
}

/** PATCH /api/hazards/{id}: resolve, reopen or edit, refused with 409 if someone changed it meanwhile. */
export async function updateHazard(actor: Actor | null, hazardId: string, body: unknown, options: { now?: Date } = {}): Promise<HazardView> {
  if (!isUuid(hazardId)) throw notFound("Hazard not found.");
  // Its lockVersion decides the write: read it from the primary (docs/operations.md, Scaling out).
  const hazard = await Hazard.findByPk(hazardId, { useMaster: true });
  if (!hazard) throw notFound("Hazard not found.");
  authorize(actor, "hazard:write", { parkId: hazard.parkId });
  const patch = hazardPatchSchema.parse(body);
  const photos = await Photo.findAll({ where: { hazardId }, attributes: ["id"], order: [["createdAt", "ASC"]] });
  const stale = () => new AppError(409, "Someone else changed this hazard first. Their version is shown; check it and try again.", "lockVersion", { current: hazardView(hazard, photos) });
  if (patch.lockVersion !== hazard.lockVersion) throw stale();

  const now = options.now ?? new Date();
  if (patch.kind !== undefined) hazard.kind = patch.kind;
  if (patch.note !== undefined) hazard.note = patch.note || null;
  if (patch.resolved !== undefined) {
    hazard.resolvedAt = patch.resolved ? (hazard.resolvedAt ?? now) : null;
    hazard.resolvedBy = patch.resolved ? actor.id : null;
  }
  const action = patch.resolved === true ? "hazard.resolve" : patch.resolved === false ? "hazard.reopen" : "hazard.edit";
  await unlessStale(
    () =>
      sequelize.transaction(async (transaction) => {
        await hazard.save({ transaction });
        await recordAudit({ parkId: hazard.parkId, actorId: actor.id, action, subjectType: "hazard", subjectId: hazard.id, data: { kind: hazard.kind } }, transaction);
      }),
    async () => {
      await hazard.reload({ useMaster: true });
      return stale();
    },
  );
  return hazardView(hazard, photos);
}
