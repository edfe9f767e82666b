import type { Transaction } from "sequelize";
import { authorize, type Actor } from "@/lib/auth/permissions";
import { AppError } from "@/lib/errors";
import { processTrailUpload, type TrailUploadResult } from "@/lib/trails";
import { trailMetadataSchema, type TrailMetadata } from "@/lib/validations/trail";
import { AuditEvent, Park, Trail, TrailFeature, TrailVersion, sequelize } from "@/models";

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

async function writeVersionAndFeatures(trail: Trail, versionNo: number, file: UploadedFile, result: TrailUploadResult, actorId: string | null, transaction: Transaction) {
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
  await TrailFeature.destroy({ where: { trailId: trail.id }, transaction });
  await TrailFeature.bulkCreate(
    result.features.map((f) => ({ trailId: trail.id, kind: f.kind, name: f.name ?? null, size: null, lon: f.lon, lat: f.lat, distanceAlongM: f.distanceAlongM })),
    { transaction },
  );
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
    await writeVersionAndFeatures(trail, 1, file, result, actor.id, transaction);
    await AuditEvent.create({ parkId: park.id, actorId: actor.id, action: "trail.create", subjectType: "trail", subjectId: trail.id, data: { name: trail.name } }, { transaction });
    return { trail, result };
  });
}

/** A new line for an existing trail: the earlier version and its file are kept. */
export async function replaceTrailLine(actor: Actor | null, trailId: string, file: UploadedFile) {
  const trail = await Trail.findByPk(trailId, { include: [{ model: Park, as: "park" }] });
  if (!trail || trail.archivedAt) throw new AppError(404, "Trail not found.");
  authorize(actor, "trail:write", { parkId: trail.parkId });
  const park = (trail as Trail & { park: Park }).park;
  const result = processTrailUpload({ ...file, parkCenter: { lon: park.centerLon, lat: park.centerLat } });
  return sequelize.transaction(async (transaction) => {
    const versionNo = trail.currentVersion + 1;
    await trail.update({ ...geometryColumns(result), currentVersion: versionNo }, { transaction });
    await writeVersionAndFeatures(trail, versionNo, file, result, actor.id, transaction);
    await AuditEvent.create({ parkId: trail.parkId, actorId: actor.id, action: "trail.replace-line", subjectType: "trail", subjectId: trail.id, data: { versionNo } }, { transaction });
    return { trail, result };
  });
}
