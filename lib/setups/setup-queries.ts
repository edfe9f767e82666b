import "server-only";
/** A rider's own setups. Another rider's setup is "not found" (404), never "forbidden": its existence is not revealed. */
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { suspensionSag } from "@/lib/pressure/pure/sag";
import type { SetupInput } from "@/lib/setups/pure/setup-schema";
import { isUuid } from "@/lib/shared/ids";
import { Setup } from "@/models";

/** The setup as the API returns it, with its sag check. */
export function setupView(setup: Setup) {
  const stored = storedSetup(setup);
  return {
    id: setup.id,
    ...stored,
    baseline: stored.baseline ?? null,
    suspension: stored.suspension ?? null,
    sag: suspensionSag(stored.suspension),
    lockVersion: setup.lockVersion,
    createdAt: setup.createdAt,
    updatedAt: setup.updatedAt,
  };
}
export type SetupView = ReturnType<typeof setupView>;

/** The stored columns in the shape of the setup schema (validated when written). */
export function storedSetup(setup: Setup): SetupInput {
  return {
    name: setup.name,
    riderMassKg: setup.riderMassKg,
    bikeMassKg: setup.bikeMassKg,
    pace: setup.pace as SetupInput["pace"],
    front: setup.front as SetupInput["front"],
    rear: setup.rear as SetupInput["rear"],
    baseline: (setup.baseline as SetupInput["baseline"]) ?? null,
    suspension: (setup.suspension as SetupInput["suspension"]) ?? null,
  };
}

export async function listSetups(actor: Actor | null): Promise<SetupView[]> {
  authorize(actor, "own:setups", { ownerId: actor?.id });
  const rows = await Setup.findAll({ where: { userId: actor.id }, order: [["name", "ASC"], ["createdAt", "ASC"]] });
  return rows.map(setupView);
}

/** One of the caller's setups; anyone else's, or none, is 404. */
export async function findOwnSetup(actor: Actor | null, id: unknown): Promise<Setup> {
  authorize(actor, "own:setups", { ownerId: actor?.id });
  const setup = isUuid(id) ? await Setup.findOne({ where: { id, userId: actor.id } }) : null;
  if (!setup) throw new AppError(404, "Setup not found.");
  authorize(actor, "own:setups", { ownerId: setup.userId });
  return setup;
}
