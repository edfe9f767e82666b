import "server-only";
import { fn, col, literal, Op } from "sequelize";
import { parkToday, currentReportsByTrail } from "@/lib/conditions/park-today";
import { hazardsCollection, trailFeaturesCollection, trailsCollection, type TodayReport } from "@/lib/map/pure/geojson";
import { parkLayersCollection } from "@/lib/map/pure/park-layers";
import { cachedForPark } from "@/lib/parks/park-cache";
import { prepareJson } from "@/lib/server/api/etag";
import { Hazard, Trail, TrailFeature, TrailReport, type Park } from "@/models";

/** Reads for the park map: one function per question, each scoped to one park. */

const TRAIL_MAP_COLUMNS = ["id", "name", "difficulty", "kind", "direction", "lengthM", "descentM", "maxGradePct", "simplified", "minLon", "minLat", "maxLon", "maxLat"] as const;

/** Where a read goes: `useMaster` sends it to the primary (a cached answer must not come from a lagging replica). */
export type ReadFrom = { useMaster?: boolean };

export async function mapTrails(parkId: string, read: ReadFrom = {}) {
  return Trail.findAll({ where: { parkId, archivedAt: null }, attributes: [...TRAIL_MAP_COLUMNS], order: [["name", "ASC"]], ...read });
}

/** When each trail of the park was last inspected, any day (the newest current report). */
export async function lastReportTimes(parkId: string, read: ReadFrom = {}): Promise<Map<string, Date>> {
  const rows = (await TrailReport.findAll({
    attributes: ["trailId", [fn("max", col("reported_at")), "lastReportAt"]],
    where: { parkId, isCurrent: true },
    group: ["trailId"],
    raw: true,
    ...read,
  })) as unknown as { trailId: string; lastReportAt: Date | string }[];
  return new Map(rows.map((r) => [r.trailId, new Date(r.lastReportAt)]));
}

/** The park's trails as GeoJSON, each with the status of `today` (null when nobody has inspected it yet). */
async function trailsOnDay(parkId: string, today: string, read: ReadFrom = {}) {
  const [trails, reports, last] = await Promise.all([mapTrails(parkId, read), currentReportsByTrail(parkId, today, read), lastReportTimes(parkId, read)]);
  const todayByTrail = new Map<string, TodayReport>([...reports].map(([id, r]) => [id, { status: r.status, surfaces: r.surfaces ?? [] }]));
  return { trails, collection: trailsCollection(trails.map((t) => t.get({ plain: true })), todayByTrail, last) };
}

/** The park's trails as GeoJSON, each with today's status. */
export const parkTrailsGeoJson = (park: Park, now = new Date()) => trailsOnDay(park.id, parkToday(park, now));

/** A park's open hazards; the staff map keeps those of archived trails so they can still be resolved. */
export async function openHazards(parkId: string, read: ReadFrom = {}, onlyLiveTrails = false) {
  // Pinned off any trail, or on a trail not archived (the archive bumps park_versions, so cached layers follow).
  const live = onlyLiveTrails ? { [Op.or]: [{ trailId: null }, { trailId: { [Op.in]: literal("(SELECT id FROM trails WHERE archived_at IS NULL)") } }] } : {};
  return Hazard.findAll({ where: { parkId, resolvedAt: null, ...live }, order: [["reportedAt", "DESC"]], ...read });
}

/** The public hazard layer: an archived trail's open hazards leave it with the trail. */
export async function parkHazardsGeoJson(parkId: string, read: ReadFrom = {}) {
  return hazardsCollection((await openHazards(parkId, read, true)).map((h) => h.get({ plain: true })));
}

/** trails.geojson, serialised, from the per-park cache (lib/parks/park-cache.ts); null when there is no such park. */
export const trailsGeoJsonAnswer = (slug: string) =>
  cachedForPark(slug, "trails.geojson", async ({ parkId, today }) => prepareJson((await trailsOnDay(parkId, today, { useMaster: true })).collection));

/** hazards.geojson, serialised, from the per-park cache; null when there is no such park. */
export const hazardsGeoJsonAnswer = (slug: string) => cachedForPark(slug, "hazards.geojson", async ({ parkId }) => prepareJson(await parkHazardsGeoJson(parkId, { useMaster: true })));

export async function parkTrailFeatures(parkId: string) {
  const trails = await Trail.findAll({ where: { parkId, archivedAt: null }, attributes: ["id", "name"] });
  const features = await TrailFeature.findAll({ where: { trailId: { [Op.in]: trails.map((t) => t.id) } }, order: [["trailId", "ASC"], ["distanceAlongM", "ASC"]] });
  return { features, trailNames: new Map(trails.map((t) => [t.id, t.name])) };
}

export async function parkFeaturesGeoJson(parkId: string) {
  const { features, trailNames } = await parkTrailFeatures(parkId);
  return trailFeaturesCollection(features.map((f) => f.get({ plain: true })), trailNames);
}

export const parkBaseLayersGeoJson = (park: Park) => parkLayersCollection(park.mapLayers ?? {});
