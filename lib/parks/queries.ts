import "server-only";
import { notFound } from "next/navigation";
import { col, fn, Op } from "sequelize";
import { getActor } from "@/lib/server/auth/actor";
import { can, type Action } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { Park, ParkMembership, Subscription, Trail, TrailReport } from "@/models";

/** Public view of a park, as the API returns it. */
export function parkSummary(park: Park) {
  return {
    slug: park.slug,
    name: park.name,
    timeZone: park.timeZone,
    location: { lon: park.centerLon, lat: park.centerLat },
    baseElevationM: park.baseElevationM,
    summitElevationM: park.summitElevationM,
    fictional: park.fictional,
  };
}

/** What the settings form and `PATCH /api/parks/{slug}` work with: the public view, contact details and the lock. */
export function parkSettings(park: Park) {
  return { ...parkSummary(park), contactEmail: park.contactEmail ?? null, websiteUrl: park.websiteUrl ?? null, lockVersion: park.lockVersion };
}

export async function listParks() {
  const parks = await Park.findAll({ order: [["name", "ASC"]] });
  return parks.map(parkSummary);
}

export async function getParkBySlug(slug: string): Promise<Park> {
  const park = await Park.findOne({ where: { slug } });
  if (!park) throw new AppError(404, "Park not found.");
  return park;
}


/** Once a park has trails (archived ones too), its slug is fixed: links in e-mails and QR codes depend on it. */
export async function parkHasTrails(parkId: string): Promise<boolean> {
  return (await Trail.count({ where: { parkId } })) > 0;
}

/**
 * The page guard for a park's pages: the park, when it exists and the caller may take `action`
 * there; Next's notFound() otherwise, so a page never tells an outsider which parks have staff areas.
 */
export async function requireParkAccess(slug: string, action: Action): Promise<Park> {
  const [park, actor] = await Promise.all([Park.findOne({ where: { slug } }), getActor()]);
  if (!park || !can(actor, action, { parkId: park.id })) notFound();
  return park;
}

/** Every park for the site admin: trails, staff, subscribers and the last report, in four grouped reads. */
export async function listParksForAdmin() {
  const count = async (model: typeof Trail | typeof ParkMembership | typeof Subscription, where: Record<string, unknown> = {}) => {
    const rows = (await (model as typeof Trail).findAll({ attributes: ["parkId", [fn("count", col("id")), "n"]], where, group: ["parkId"], raw: true })) as unknown as { parkId: string; n: string }[];
    return new Map(rows.map((r) => [r.parkId, Number(r.n)]));
  };
  const [parks, trails, staff, subscribers, reports] = await Promise.all([
    Park.findAll({ order: [["name", "ASC"]] }),
    count(Trail, { archivedAt: null }),
    count(ParkMembership),
    count(Subscription, { confirmedAt: { [Op.ne]: null }, unsubscribedAt: null }),
    TrailReport.findAll({ attributes: ["parkId", [fn("max", col("reported_at")), "last"]], group: ["parkId"], raw: true }) as unknown as Promise<{ parkId: string; last: string | Date }[]>,
  ]);
  const lastReport = new Map(reports.map((r) => [r.parkId, new Date(r.last)]));
  return parks.map((park) => ({
    ...parkSummary(park),
    trails: trails.get(park.id) ?? 0,
    staff: staff.get(park.id) ?? 0,
    subscribers: subscribers.get(park.id) ?? 0,
    lastReportAt: lastReport.get(park.id)?.toISOString() ?? null,
  }));
}
