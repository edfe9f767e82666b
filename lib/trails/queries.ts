import "server-only";
import { can, type Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { isUuid } from "@/lib/shared/ids";
import { sortTrails } from "@/lib/trails/pure/sort";
import type { TrailSortKey } from "@/lib/trails/pure/schemas";
import { Park, Trail, TrailFeature, TrailVersion } from "@/models";

const tenth = (x: number | null) => (x === null ? null : Math.round(x * 10) / 10);

/** Columns of a list row: never the heavy geometry, profile or file. */
const SUMMARY_COLUMNS = [
  "id", "parkId", "name", "difficulty", "kind", "direction", "lengthM", "ascentM", "descentM", "avgGradePct", "maxGradePct",
  "minElevationM", "maxElevationM", "suggestedDifficulty", "pointCount", "currentVersion", "archivedAt", "updatedAt",
] as const;

/** The public figures of a trail, under the names the API documents. */
export function trailSummary(trail: Trail) {
  return {
    id: trail.id,
    name: trail.name,
    difficulty: trail.difficulty,
    kind: trail.kind,
    direction: trail.direction,
    lengthM: tenth(trail.lengthM)!,
    ascentM: tenth(trail.ascentM),
    descentM: tenth(trail.descentM),
    avgGradePct: tenth(trail.avgGradePct),
    maxGradePct: tenth(trail.maxGradePct),
    minElevationM: tenth(trail.minElevationM),
    maxElevationM: tenth(trail.maxElevationM),
    suggestedDifficulty: trail.suggestedDifficulty,
    pointCount: trail.pointCount,
    currentVersion: trail.currentVersion,
    updatedAt: trail.updatedAt.toISOString(),
  };
}
export type TrailSummary = ReturnType<typeof trailSummary>;

export function featureView(f: TrailFeature) {
  return { id: f.id, kind: f.kind, name: f.name, size: f.size, lon: f.lon, lat: f.lat, distanceAlongM: tenth(f.distanceAlongM)! };
}
export type TrailFeatureView = ReturnType<typeof featureView>;

/** A version as listed: what was uploaded, when, and its figures; never the file's bytes. */
export function versionView(v: TrailVersion) {
  const stats = v.stats as { lengthM?: number; descentM?: number | null };
  return {
    versionNo: v.versionNo,
    sourceFormat: v.sourceFormat,
    sourceFilename: v.sourceFilename,
    uploadedAt: v.createdAt.toISOString(),
    lengthM: tenth(stats.lengthM ?? null),
    descentM: tenth(stats.descentM ?? null),
  };
}
export type TrailVersionView = ReturnType<typeof versionView>;

/** A park's trails that are not archived, in the order asked for (difficulty, easiest first, by default). */
export async function listParkTrails(parkId: string, sort: TrailSortKey = "difficulty", dir: "asc" | "desc" = "asc"): Promise<TrailSummary[]> {
  const rows = await Trail.findAll({ where: { parkId, archivedAt: null }, attributes: [...SUMMARY_COLUMNS], order: [["name", "ASC"]] });
  return sortTrails(rows.map(trailSummary), sort, dir);
}

/**
 * One trail as its public page and GET /api/trails/{id} show it: figures, simplified line, profile,
 * features along it and its versions. An archived trail is visible to its park's staff only.
 */
export async function getTrailDetail(id: string, actor: Actor | null) {
  if (!isUuid(id)) throw new AppError(404, "Trail not found.");
  const trail = await Trail.findByPk(id, {
    attributes: { exclude: ["geometry"] },
    include: [{ model: Park, as: "park", attributes: ["id", "slug", "name", "timeZone"] }],
  });
  if (!trail || (trail.archivedAt && !can(actor, "trail:write", { parkId: trail.parkId }))) throw new AppError(404, "Trail not found.");
  const [features, versions] = await Promise.all([
    TrailFeature.findAll({ where: { trailId: id }, order: [["distanceAlongM", "ASC"]] }),
    TrailVersion.findAll({ where: { trailId: id }, attributes: { exclude: ["sourceBytes", "geometry"] }, order: [["versionNo", "DESC"]] }),
  ]);
  const park = (trail as Trail & { park: Park }).park;
  return {
    ...trailSummary(trail),
    park: { slug: park.slug, name: park.name, timeZone: park.timeZone },
    archivedAt: trail.archivedAt ? trail.archivedAt.toISOString() : null,
    lockVersion: trail.lockVersion,
    bbox: [trail.minLon, trail.minLat, trail.maxLon, trail.maxLat] as [number, number, number, number],
    line: trail.simplified,
    profile: trail.profile,
    features: features.map(featureView),
    versions: versions.map(versionView),
  };
}
export type TrailDetail = Awaited<ReturnType<typeof getTrailDetail>>;


/** The park of a live trail, so a write can be authorised before its body is read. */
export async function liveTrailParkId(id: string): Promise<string> {
  const trail = isUuid(id) ? await Trail.findByPk(id, { attributes: ["parkId", "archivedAt"] }) : null;
  if (!trail || trail.archivedAt) throw new AppError(404, "Trail not found.");
  return trail.parkId;
}
