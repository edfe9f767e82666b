import "server-only";
import { notFound } from "next/navigation";
import { cache } from "react";
import { getActor } from "@/lib/server/auth/actor";
import { can, roleInPark, type Action, type Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { Park, ParkMembership, User } from "@/models";

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

export async function listParkStaff(parkId: string) {
  const rows = await ParkMembership.findAll({
    where: { parkId },
    include: [{ model: User, as: "user", attributes: ["name", "email", "disabledAt"] }],
    order: [["role", "ASC"]],
  });
  return rows.map((m) => {
    const user = (m as ParkMembership & { user: User }).user;
    return { userId: m.userId, role: m.role, name: user.name, email: user.email, disabled: Boolean(user.disabledAt) };
  });
}
