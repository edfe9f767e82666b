import "server-only";
/** A rider's display units, stored on their own account (User.units). */
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { parseInput } from "@/lib/shared/parse";
import { unitPrefsSchema, unitsOf, type UnitPrefs } from "@/lib/accounts/pure/units-schema";
import { User } from "@/models";

export async function unitsFor(actor: Actor | null): Promise<UnitPrefs> {
  if (!actor) return unitsOf(null);
  const user = await User.findByPk(actor.id, { attributes: ["units"] });
  return unitsOf(user?.units);
}

export async function updateUnits(actor: Actor | null, raw: unknown): Promise<UnitPrefs> {
  authorize(actor, "own:units", { ownerId: actor?.id });
  const units = parseInput(unitPrefsSchema, raw);
  await User.update({ units }, { where: { id: actor.id } });
  return units;
}
