import "server-only";
/** Writes to a rider's own setups: create, update with optimistic locking, delete. */
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { findOwnSetup, setupView, storedSetup } from "@/lib/setups/setup-queries";
import { parseInput } from "@/lib/shared/parse";
import { MAX_SETUPS_PER_RIDER, setupPatchSchema, setupSchema, type SetupInput } from "@/lib/setups/pure/setup-schema";
import { unlessStale } from "@/lib/server/optimistic-lock";
import { Setup } from "@/models";

const columns = (s: SetupInput) => ({ ...s, baseline: s.baseline ?? null, suspension: s.suspension ?? null });

export async function createSetup(actor: Actor | null, raw: unknown) {
  authorize(actor, "own:setups", { ownerId: actor?.id });
  const input = parseInput(setupSchema, raw);
  if ((await Setup.count({ where: { userId: actor.id } })) >= MAX_SETUPS_PER_RIDER) {
    throw new AppError(422, `You can keep at most ${MAX_SETUPS_PER_RIDER} setups; delete one first.`);
  }
  return setupView(await Setup.create({ userId: actor.id, ...columns(input) }));
}

export const staleSetup = (current: number) =>
  new AppError(409, "This setup was changed elsewhere since you opened it. Reload it, then make your change again.", "lockVersion", { lockVersion: current });

/**
 * PATCH: the fields sent replace the stored ones (a wheel, the baseline or the suspension as a
 * whole; null removes the baseline or suspension). The merged setup is validated as a whole.
 */
export async function updateSetup(actor: Actor | null, id: unknown, raw: unknown) {
  const setup = await findOwnSetup(actor, id);
  const { lockVersion, ...patch } = parseInput(setupPatchSchema, raw);
  if (lockVersion !== setup.lockVersion) throw staleSetup(setup.lockVersion);
  const merged = parseInput(setupSchema, { ...storedSetup(setup), ...patch });
  await unlessStale(
    () => setup.update(columns(merged)),
    async () => staleSetup((await Setup.findByPk(setup.id, { useMaster: true }))?.lockVersion ?? lockVersion + 1),
  );
  return setupView(setup);
}

/** Ride logs of a deleted setup are kept; they lose the link (ON DELETE SET NULL). */
export async function deleteSetup(actor: Actor | null, id: unknown) {
  const setup = await findOwnSetup(actor, id);
  await setup.destroy();
}
