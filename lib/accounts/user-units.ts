import "server-only";
import type { Actor } from "@/lib/server/auth/permissions";
import { distanceSystemOf, type DistanceSystem } from "@/lib/shared/units";
import { User } from "@/models";

/** The viewer's choice of m/km or ft/mi (User.units.distance); anonymous visitors read metric. */
export async function distanceSystemFor(actor: Pick<Actor, "id"> | null): Promise<DistanceSystem> {
  if (!actor) return "metric";
  const user = await User.findByPk(actor.id, { attributes: ["units"] });
  return distanceSystemOf(user?.units?.distance);
}
