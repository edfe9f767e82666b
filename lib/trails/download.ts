import "server-only";
import { can, type Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { isUuid } from "@/lib/shared/ids";
import { toGeoJson, toGpx, type ExportableTrail } from "@/lib/trails/pure";
import type { TrailDownloadQuery } from "@/lib/trails/pure/schemas";
import { Trail, TrailFeature, TrailVersion } from "@/models";

export const CONTENT_TYPES = { gpx: "application/gpx+xml", geojson: "application/geo+json" } as const;

/** A file name made on the server from the trail's name (ASVS 5.3.2): lower-case ASCII, digits and hyphens only. */
export function downloadFilename(trailName: string, versionNo: number, format: "gpx" | "geojson"): string {
  const base = trailName
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 60)
    .replace(/-+$/, "");
  return `${base || "trail"}-v${versionNo}.${format}`;
}

/**
 * A trail's file for download: the original bytes when the format asked for is the one uploaded,
 * otherwise the line converted (the current version carries its features as waypoints).
 */
export async function trailDownload(trailId: string, actor: Actor | null, query: TrailDownloadQuery) {
  const trail = isUuid(trailId) ? await Trail.findByPk(trailId, { attributes: ["id", "parkId", "name", "currentVersion", "archivedAt"] }) : null;
  if (!trail || (trail.archivedAt && !can(actor, "trail:write", { parkId: trail.parkId }))) throw new AppError(404, "Trail not found.");
  const versionNo = query.version ?? trail.currentVersion;
  const version = await TrailVersion.findOne({ where: { trailId, versionNo } });
  if (!version) throw new AppError(404, `Version ${versionNo} of this trail does not exist.`, "version");
  const format = query.format ?? version.sourceFormat;
  const filename = downloadFilename(trail.name, versionNo, format);
  if (format === version.sourceFormat) return { body: version.sourceBytes, contentType: CONTENT_TYPES[format], filename, original: true };

  const geometry = version.geometry;
  const exportable: ExportableTrail = { name: trail.name, segments: geometry.type === "LineString" ? [geometry.coordinates] : geometry.coordinates };
  if (versionNo === trail.currentVersion) {
    const features = await TrailFeature.findAll({ where: { trailId }, order: [["distanceAlongM", "ASC"]] });
    exportable.waypoints = features.map((f) => ({ name: f.name ?? f.kind, type: f.kind, lon: f.lon, lat: f.lat }));
  }
  const body = format === "gpx" ? toGpx(exportable) : JSON.stringify(toGeoJson(exportable));
  return { body, contentType: CONTENT_TYPES[format], filename, original: false };
}
