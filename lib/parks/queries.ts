import "server-only";
import { AppError } from "@/lib/shared/errors";
import { Park, ParkMembership, User } from "@/models";

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
