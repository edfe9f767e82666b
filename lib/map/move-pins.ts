import "server-only";
import { distance } from "@turf/turf";
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { AppError, conflict, notFound, unauthorized } from "@/lib/shared/errors";
import { isUuid } from "@/lib/shared/ids";
import { updateTrailFeature } from "@/lib/trails/edit-features";
import { unlessStale } from "@/lib/server/optimistic-lock";
import { TRAIL_LIMITS } from "@/lib/trails/pure/limits";
import { moveHazardSchema, moveTrailFeatureSchema } from "@/lib/map/pure/schemas";
import { recordAudit } from "@/lib/audit/record";
import { Hazard, Park, Trail, TrailFeature, sequelize } from "@/models";

/**
 * Staff moving pins on the map. Each move is validated, checked against the caller's park role,
 * written with its audit event in one transaction, and returns the previous position so the
 * page can offer an undo (which is simply another move).
 */
type Position = { lon: number; lat: number };

/** A feature dragged on the staff map: only its point is taken (never a distance), then the one feature write path. */
export async function moveTrailFeature(actor: Actor | null, featureId: string, body: unknown) {
  if (!actor) throw unauthorized();
  const to = moveTrailFeatureSchema.parse(body);
  const { feature, previous } = await updateTrailFeature(actor, featureId, to);
  return {
    feature: { id: feature.id, trailId: feature.trailId, kind: feature.kind, lon: feature.lon, lat: feature.lat, distanceAlongM: feature.distanceAlongM },
    previous,
  };
}

export async function moveHazard(actor: Actor | null, hazardId: string, body: unknown) {
  if (!actor) throw unauthorized();
  const to = moveHazardSchema.parse(body);
  if (!isUuid(hazardId)) throw notFound("Hazard not found.");
  // Its lockVersion decides the write: read it from the primary (docs/operations.md, Scaling out).
  const hazard = await Hazard.findByPk(hazardId, { useMaster: true });
  if (!hazard) throw notFound("Hazard not found.");
  authorize(actor, "hazard:write", { parkId: hazard.parkId });
  if (hazard.resolvedAt) throw conflict("This hazard has been resolved; it can no longer be moved.");
  if (hazard.lockVersion !== to.lockVersion) throw conflict("Someone else changed this hazard since you loaded the map. Reload and try again.", { lockVersion: hazard.lockVersion });

  const park = await Park.findByPk(hazard.parkId, { attributes: ["centerLon", "centerLat"] });
  const fromCentreM = distance([park!.centerLon, park!.centerLat], [to.lon, to.lat], { units: "meters" });
  if (fromCentreM > TRAIL_LIMITS.maxDistanceFromParkM) throw new AppError(422, "That spot is far outside the park. Drop the pin where the hazard is.", "lon");

  const previous: Position = { lon: hazard.lon, lat: hazard.lat };
  await unlessStale(
    () =>
      sequelize.transaction(async (transaction) => {
        await hazard.update({ lon: to.lon, lat: to.lat }, { transaction });
        await recordAudit({ parkId: hazard.parkId, actorId: actor.id, action: "hazard.move", subjectType: "hazard", subjectId: hazard.id, data: { from: previous, to: { lon: to.lon, lat: to.lat } } }, transaction);
      }),
    () => conflict("Someone else changed this hazard a moment ago. Reload and try again."),
  );
  return { hazard: { id: hazard.id, lon: hazard.lon, lat: hazard.lat, lockVersion: hazard.lockVersion }, previous };
}
