import "server-only";
import type { Transaction } from "sequelize";
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { isUuid } from "@/lib/shared/ids";
import { processTrailUpload, type TrailUploadResult } from "@/lib/trails/pure";
import { featuresForNewLine, MAX_FEATURE_OFFSET_M } from "@/lib/trails/pure/placement";
import { trailMetadataSchema, type TrailMetadata } from "@/lib/trails/pure/schemas";
import { recordAudit } from "@/lib/audit/record";
import { Park, Trail, TrailFeature, TrailVersion, sequelize } from "@/models";

export type UploadedFile = { bytes: Buffer; filename: string; contentType?: string };

function lineOf(result: TrailUploadResult): GeoJSON.LineString | GeoJSON.MultiLineString {
  const segments = result.parsed.segments;
  return segments.length === 1 ? { type: "LineString", coordinates: segments[0] } : { type: "MultiLineString", coordinates: segments };
}

/** The columns a trail row takes from a processed file. */
function geometryColumns(result: TrailUploadResult) {
  const { stats } = result;
  const [minLon, minLat, maxLon, maxLat] = stats.bbox;
  return {
    geometry: lineOf(result),
    simplified: result.simplified,
    profile: result.profile,
    lengthM: stats.lengthM,
    ascentM: stats.ascentM,
    descentM: stats.descentM,
    avgGradePct: stats.avgGradePct,
    maxGradePct: stats.maxGradePct,
    minElevationM: stats.minElevationM,
    maxElevationM: stats.maxElevationM,
    suggestedDifficulty: result.suggestedDifficulty,
    minLon,
    minLat,
    maxLon,
    maxLat,
    pointCount: stats.pointCount,
  };
}

async function writeVersion(trail: Trail, versionNo: number, file: UploadedFile, result: TrailUploadResult, actorId: string | null, transaction: Transaction) {
  await TrailVersion.create(
    {
      trailId: trail.id,
      versionNo,
      sourceFormat: result.parsed.sourceFormat,
      sourceFilename: file.filename.slice(0, 200),
      sourceBytes: file.bytes,
      geometry: lineOf(result),
      stats: { ...result.stats, suggestedDifficulty: result.suggestedDifficulty },
      uploadedBy: actorId,
    },
    { transaction },
  );
}

type NewFeature = { kind: string; name?: string; lon: number; lat: number; distanceAlongM: number };
const featureRows = (trailId: string, features: NewFeature[]) =>
  features.map((f) => ({ trailId, kind: f.kind, name: f.name ?? null, size: null, lon: f.lon, lat: f.lat, distanceAlongM: f.distanceAlongM }));

/**
 * Features already recorded (some placed or sized by hand) survive a new line: they are measured
 * again along it, and the new file's waypoints are added unless they repeat one of them.
 */
async function carryFeaturesOver(trail: Trail, result: TrailUploadResult, transaction: Transaction): Promise<string[]> {
  const existing = await TrailFeature.findAll({ where: { trailId: trail.id }, transaction });
  const merged = featuresForNewLine(existing, result.features, result.parsed.segments);
  for (const { id, distanceAlongM } of merged.remeasured) {
    await TrailFeature.update({ distanceAlongM }, { where: { id, trailId: trail.id }, transaction });
  }
  await TrailFeature.bulkCreate(featureRows(trail.id, merged.added), { transaction });
  const notes: string[] = [];
  if (existing.length > 0) notes.push(`${existing.length} recorded feature(s) kept and measured along the new line; ${merged.added.length} added from the file.`);
  if (merged.farFromLine > 0) notes.push(`${merged.farFromLine} feature(s) lie more than ${MAX_FEATURE_OFFSET_M} m from the new line: move or delete them on the edit page.`);
  return notes;
}

/** Processes the file first (pure, may refuse), then writes trail, version 1 and features in one transaction. */
export async function createTrailFromUpload(actor: Actor | null, park: Park, file: UploadedFile, metadata: Partial<TrailMetadata>) {
  authorize(actor, "trail:write", { parkId: park.id });
  const result = processTrailUpload({ ...file, parkCenter: { lon: park.centerLon, lat: park.centerLat } });
  const fields = trailMetadataSchema.parse({
    name: metadata.name ?? result.parsed.name,
    difficulty: metadata.difficulty ?? result.suggestedDifficulty ?? undefined,
    kind: metadata.kind ?? "flow",
    direction: metadata.direction ?? "downhill",
  });
  return sequelize.transaction(async (transaction) => {
    const trail = await Trail.create({ parkId: park.id, ...fields, ...geometryColumns(result), createdBy: actor.id }, { transaction });
    await writeVersion(trail, 1, file, result, actor.id, transaction);
    await TrailFeature.bulkCreate(featureRows(trail.id, result.features), { transaction });
    await recordAudit({ parkId: park.id, actorId: actor.id, action: "trail.create", subjectType: "trail", subjectId: trail.id, data: { name: trail.name } }, transaction);
    return { trail, result };
  });
}

/**
 * A new line for an existing trail: the earlier version and its file are kept. The trail row is
 * locked while the next version number is taken, so two replacements at once cannot collide.
 */
export async function replaceTrailLine(actor: Actor | null, trailId: string, file: UploadedFile) {
  const trail = isUuid(trailId) ? await Trail.findByPk(trailId, { include: [{ model: Park, as: "park" }] }) : null;
  if (!trail || trail.archivedAt) throw new AppError(404, "Trail not found.");
  authorize(actor, "trail:write", { parkId: trail.parkId });
  const park = (trail as Trail & { park: Park }).park;
  const result = processTrailUpload({ ...file, parkCenter: { lon: park.centerLon, lat: park.centerLat } });
  return sequelize.transaction(async (transaction) => {
    const locked = await Trail.findByPk(trail.id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!locked || locked.archivedAt) throw new AppError(404, "Trail not found.");
    const versionNo = locked.currentVersion + 1;
    await locked.update({ ...geometryColumns(result), currentVersion: versionNo }, { transaction });
    await writeVersion(locked, versionNo, file, result, actor.id, transaction);
    const notes = await carryFeaturesOver(locked, result, transaction);
    await recordAudit({ parkId: locked.parkId, actorId: actor.id, action: "trail.replace-line", subjectType: "trail", subjectId: locked.id, data: { versionNo } }, transaction);
    return { trail: locked, result, notes };
  });
}
