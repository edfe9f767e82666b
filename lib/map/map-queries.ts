import "server-only";
import { fn, col, Op } from "sequelize";
import { parkToday, currentReportsByTrail } from "@/lib/conditions/park-today";
import { hazardsCollection, trailFeaturesCollection, trailsCollection, type TodayReport } from "@/lib/map/pure/geojson";
import { parkLayersCollection } from "@/lib/map/pure/park-layers";
import { Hazard, Trail, TrailFeature, TrailReport, type Park } from "@/models";

/** Reads for the park map: one function per question, each scoped to one park. */

const TRAIL_MAP_COLUMNS = ["id", "name", "difficulty", "kind", "direction", "lengthM", "descentM", "maxGradePct", "simplified", "minLon", "minLat", "maxLon", "maxLat"] as const;

export async function mapTrails(parkId: string) {
  return Trail.findAll({ where: { parkId, archivedAt: null }, attributes: [...TRAIL_MAP_COLUMNS], order: [["name", "ASC"]] });
}

/** When each trail of the park was last inspected, any day (the newest current report). */
export async function lastReportTimes(parkId: string): Promise<Map<string, Date>> {
  const rows = (await TrailReport.findAll({
    attributes: ["trailId", [fn("max", col("reported_at")), "lastReportAt"]],
    where: { parkId, isCurrent: true },
    group: ["trailId"],
    raw: true,
  })) as unknown as { trailId: string; lastReportAt: Date | string }[];
  return new Map(rows.map((r) => [r.trailId, new Date(r.lastReportAt)]));
}

/** The park's trails as GeoJSON, each with today's status (null when nobody has inspected it yet). */
export async function parkTrailsGeoJson(park: Park, now = new Date()) {
  const [trails, today, last] = await Promise.all([mapTrails(park.id), currentReportsByTrail(park.id, parkToday(park, now)), lastReportTimes(park.id)]);
  const todayByTrail = new Map<string, TodayReport>([...today].map(([id, r]) => [id, { status: r.status, surfaces: r.surfaces ?? [] }]));
  return { trails, collection: trailsCollection(trails.map((t) => t.get({ plain: true })), todayByTrail, last) };
}

export async function openHazards(parkId: string) {
  return Hazard.findAll({ where: { parkId, resolvedAt: null }, order: [["reportedAt", "DESC"]] });
}

export async function parkHazardsGeoJson(parkId: string) {
  return hazardsCollection((await openHazards(parkId)).map((h) => h.get({ plain: true })));
}

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
