import "server-only";
import type { Transaction } from "sequelize";
import type { Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { isUuid } from "@/lib/shared/ids";
import { placeOnTrail } from "@/lib/trails/pure/placement";
import { trailFeatureCreateSchema, trailFeatureUpdateSchema } from "@/lib/trails/pure/schemas";
import { recordAudit } from "@/lib/audit/record";
import { Trail, TrailFeature, sequelize } from "@/models";
import { lockTrailForWrite } from "./edit-trail";

const segmentsOf = (trail: Trail) => (trail.geometry.type === "LineString" ? [trail.geometry.coordinates] : trail.geometry.coordinates);

async function audit(actor: Actor, trail: Trail, action: string, featureId: string, data: Record<string, unknown>, transaction: Transaction) {
  await recordAudit({ parkId: trail.parkId, actorId: actor.id, action, subjectType: "trail-feature", subjectId: featureId, data: { trailId: trail.id, ...data } }, transaction);
}

/** Adds a feature, placed on the line by a point (snapped) or by its distance from the start. */
export async function addTrailFeature(actor: Actor | null, trailId: string, input: unknown) {
  return sequelize.transaction(async (transaction) => {
    const trail = await lockTrailForWrite(actor, trailId, transaction);
    const { kind, size, name, ...place } = trailFeatureCreateSchema.parse(input);
    const placed = placeOnTrail(place, segmentsOf(trail), trail.name);
    const feature = await TrailFeature.create(
      { trailId: trail.id, kind, size: size ?? null, name: name || null, lon: placed.lon, lat: placed.lat, distanceAlongM: placed.distanceAlongM },
      { transaction },
    );
    await audit(actor!, trail, "trail-feature.create", feature.id, { kind, offsetM: Math.round(placed.offsetM) }, transaction);
    return feature;
  });
}

/**
 * The feature and its (live) trail, locked, after checking the caller may write to the trail's
 * park. The trail is locked before the feature, the same order as a line replacement, so the two never deadlock.
 */
async function lockFeature(actor: Actor | null, featureId: string, transaction: Transaction) {
  const found = isUuid(featureId) ? await TrailFeature.findByPk(featureId, { attributes: ["trailId"], transaction }) : null;
  if (!found) throw new AppError(404, "Feature not found.");
  const trail = await lockTrailForWrite(actor, found.trailId, transaction);
  const feature = await TrailFeature.findByPk(featureId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!feature || feature.trailId !== trail.id) throw new AppError(404, "Feature not found.");
  return { feature, trail };
}

/**
 * Moves, retypes, renames or resizes a feature: the one write path for a feature, used by the edit
 * page (PATCH /api/trail-features/{id}) and the staff map's drag and undo (…/position). A move is
 * snapped onto the line within MAX_FEATURE_OFFSET_M and audited as "trail-feature.move"; the
 * previous position comes back so the map can offer an undo (which is simply another move).
 */
export async function updateTrailFeature(actor: Actor | null, featureId: string, input: unknown) {
  return sequelize.transaction(async (transaction) => {
    const { feature, trail } = await lockFeature(actor, featureId, transaction);
    const { lon, lat, distanceAlongM, ...fields } = trailFeatureUpdateSchema.parse(input);
    const moved = lon !== undefined || distanceAlongM !== undefined;
    const placed = moved ? placeOnTrail({ lon, lat, distanceAlongM }, segmentsOf(trail), trail.name) : null;
    const previous = { lon: feature.lon, lat: feature.lat };
    await feature.update(
      {
        ...(fields.kind !== undefined ? { kind: fields.kind } : {}),
        ...(fields.size !== undefined ? { size: fields.size } : {}),
        ...(fields.name !== undefined ? { name: fields.name || null } : {}),
        ...(placed ? { lon: placed.lon, lat: placed.lat, distanceAlongM: placed.distanceAlongM } : {}),
      },
      { transaction },
    );
    const data = placed ? { ...fields, from: previous, to: { lon: placed.lon, lat: placed.lat, distanceAlongM: placed.distanceAlongM } } : fields;
    await audit(actor!, trail, placed ? "trail-feature.move" : "trail-feature.update", feature.id, data, transaction);
    return { feature, previous };
  });
}

export async function deleteTrailFeature(actor: Actor | null, featureId: string) {
  return sequelize.transaction(async (transaction) => {
    const { feature, trail } = await lockFeature(actor, featureId, transaction);
    await feature.destroy({ transaction });
    await audit(actor!, trail, "trail-feature.delete", feature.id, { kind: feature.kind }, transaction);
  });
}
