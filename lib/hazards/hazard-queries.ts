import "server-only";
import { hazardView, type HazardView } from "@/lib/hazards/hazard-writes";
import { snapFeatures } from "@/lib/trails/pure/features";
import { Hazard, Photo, Trail } from "@/models";

const segmentsOf = (line: Trail["geometry"]) => (line.type === "LineString" ? [line.coordinates] : line.coordinates);

/** `alongM`: how far along its trail the pin sits (nearest point of the line), for staff who think in trail metres, not coordinates. */
export type HazardListItem = HazardView & { trailName: string | null; alongM: number | null };

/** A park's open hazards, newest first, with trail names, distance along the trail and photo ids. */
export async function openHazards(parkId: string): Promise<HazardListItem[]> {
  const rows = await Hazard.findAll({
    where: { parkId, resolvedAt: null },
    include: [
      { model: Photo, as: "photos", attributes: ["id", "createdAt"] },
      { model: Trail, as: "trail", attributes: ["name", "geometry"] },
    ],
    order: [
      ["reportedAt", "DESC"],
      [{ model: Photo, as: "photos" }, "createdAt", "ASC"],
    ],
  });
  return rows.map((h) => {
    const joined = h as Hazard & { photos: Photo[]; trail: Trail | null };
    const alongM = joined.trail ? Math.round(snapFeatures([{ lon: h.lon, lat: h.lat }], segmentsOf(joined.trail.geometry))[0]?.distanceAlongM ?? 0) : null;
    return { ...hazardView(h, joined.photos), trailName: joined.trail?.name ?? null, alongM };
  });
}

/** The trails a hazard can be pinned to, with their lengths for "distance along". */
export async function trailChoices(parkId: string) {
  const trails = await Trail.findAll({ where: { parkId, archivedAt: null }, attributes: ["id", "name", "lengthM"], order: [["name", "ASC"]] });
  return trails.map((t) => ({ id: t.id, name: t.name, lengthM: Math.floor(t.lengthM) }));
}
