import "server-only";
import { notFound } from "next/navigation";
import { col, fn, Op } from "sequelize";
import { cache } from "react";
import { getActor } from "@/lib/server/auth/actor";
import { can, roleInPark, type Action, type Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { Park, ParkMembership, Subscription, Trail, TrailReport } from "@/models";

export type { Park };

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
  return { ...parkSummary(park), contactEmail: park.contactEmail ?? null, websiteUrl: park.websiteUrl ?? null, rainThresholdMm: park.rainThresholdMm ?? 10, lockVersion: park.lockVersion };
}

export async function listParks() {
  const parks = await Park.findAll({ order: [["name", "ASC"]] });
  return parks.map(parkSummary);
}

/** A park by its slug, or null; read once per request however many components ask. */
export const findParkBySlug = cache(async (slug: string): Promise<Park | null> => Park.findOne({ where: { slug } }));

/**
 * What a page may ask of the caller: an action on the park, any of several, "member" (any role in the
 * park, or admin), or nothing (a public page). A page asks with requireParkAccess(slug, …).
 */
export type ParkAccess = Action | Action[] | "member" | "public";

export function allows(actor: Actor | null, park: Park, access: ParkAccess): boolean {
  if (access === "public") return true;
  if (access === "member") return roleInPark(actor, park.id) !== null;
  return (Array.isArray(access) ? access : [access]).some((action) => can(actor, action, { parkId: park.id }));
}

/**
 * The page-side guard: the park, or Next's notFound() when there is no such park or the caller may not
 * do what the page is for (a forbidden staff page reads exactly like a missing one). Route handlers use
 * getParkBySlug and authorize instead, which answer in the API's JSON error shape.
 */
export async function requireParkAccess(slug: string, access: ParkAccess = "public"): Promise<Park> {
  const [park, actor] = await Promise.all([findParkBySlug(slug), access === "public" ? null : getActor()]);
  if (!park || !allows(actor, park, access)) notFound();
  return park;
}

/** The parks a staff member works at (every park for an admin), by name. */
export async function listParksFor(actor: Actor): Promise<Park[]> {
  const where = actor.siteRole === "admin" ? {} : { id: actor.memberships.map((m) => m.parkId) };
  return Park.findAll({ where, order: [["name", "ASC"]] });
}

/** Every park as a model, by name (pages that need more than the public summary). */
export async function listParkRecords(): Promise<Park[]> {
  return Park.findAll({ order: [["name", "ASC"]] });
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
