import "server-only";
/**
 * A park's current trails as the pressure band sees them today: status and surfaces from
 * today's report (park-local date), features from the trail's mapped features. Three queries.
 */
import { Op } from "sequelize";
import { AppError } from "@/lib/shared/errors";
import { FEATURES, SURFACES, type Feature, type Surface, type TrailConditions } from "@/lib/pressure/pure/schemas";
import { isUuid } from "@/lib/shared/ids";
import { Park, Trail, TrailFeature } from "@/models";
import { currentReportsByTrail, parkToday } from "@/lib/conditions/park-today";

export type TrailStatus = "open" | "caution" | "closed";
export type TrailToday = {
  id: string;
  name: string;
  difficulty: string;
  /** Null when nobody has reported the trail today. */
  status: TrailStatus | null;
  surfaces: Surface[];
  features: Feature[];
  reportedAt: Date | null;
  /** Mapped elevation range, when the trail's line has heights. */
  minElevationM: number | null;
  maxElevationM: number | null;
};
export type ParkToday = { reportDate: string; trails: TrailToday[]; anyReport: boolean };

const known = <T extends string>(allowed: readonly T[], values: unknown): T[] =>
  Array.isArray(values) ? [...new Set(values.filter((v): v is T => allowed.includes(v as T)))] : [];

export async function trailsToday(park: Park, now = new Date()): Promise<ParkToday> {
  const reportDate = parkToday(park, now);
  const trails = await Trail.findAll({
    where: { parkId: park.id, archivedAt: { [Op.is]: null } },
    attributes: ["id", "name", "difficulty", "minElevationM", "maxElevationM"],
    order: [["name", "ASC"]],
  });
  const [features, reports] = await Promise.all([
    TrailFeature.findAll({ where: { trailId: trails.map((t) => t.id) }, attributes: ["trailId", "kind"] }),
    currentReportsByTrail(park.id, reportDate),
  ]);
  const kinds = new Map<string, string[]>();
  for (const f of features) kinds.set(f.trailId, [...(kinds.get(f.trailId) ?? []), f.kind]);
  return {
    reportDate,
    anyReport: trails.some((t) => reports.has(t.id)),
    trails: trails.map((t) => {
      const report = reports.get(t.id);
      return {
        id: t.id,
        name: t.name,
        difficulty: t.difficulty,
        status: report?.status ?? null,
        surfaces: known(SURFACES, report?.surfaces),
        features: known(FEATURES, kinds.get(t.id)),
        reportedAt: report?.reportedAt ?? null,
        minElevationM: t.minElevationM ?? null,
        maxElevationM: t.maxElevationM ?? null,
      };
    }),
  };
}

/** Every trail open (or open with caution) today; with no report at all yet, every trail. */
export function defaultTrailIds(today: ParkToday): string[] {
  const chosen = today.anyReport ? today.trails.filter((t) => t.status === "open" || t.status === "caution") : today.trails;
  return chosen.map((t) => t.id);
}

/** The chosen trails, all of which must be current trails of this park (422 otherwise). */
export function pickTrails(today: ParkToday, ids: readonly string[], field: string): TrailToday[] {
  const byId = new Map(today.trails.map((t) => [t.id, t]));
  return ids.map((id) => {
    const trail = isUuid(id) ? byId.get(id) : undefined;
    if (!trail) throw new AppError(422, "One of the chosen trails is not a current trail of this park.", field);
    return trail;
  });
}

/** What the engine needs to know about one trail today. */
export function trailConditions(trail: TrailToday, now = new Date()): TrailConditions {
  return {
    name: trail.name,
    surfaces: trail.surfaces,
    features: trail.features,
    lastReportAgeHours: trail.reportedAt ? Math.max(0, (now.getTime() - trail.reportedAt.getTime()) / 3_600_000) : null,
  };
}

/** The park named in a request body; unknown is 422 (the body is wrong, not the address). */
export async function parkForRequest(slug: string, field: string): Promise<Park> {
  const park = await Park.findOne({ where: { slug } });
  if (!park) throw new AppError(422, "No park with that name.", field);
  return park;
}
