import "server-only";
import type { Transaction } from "sequelize";
import { unlessStale } from "@/lib/server/optimistic-lock";
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { isUuid } from "@/lib/shared/ids";
import { trailPatchSchema } from "@/lib/trails/pure/schemas";
import { recordAudit } from "@/lib/audit/record";
import { Trail, sequelize } from "@/models";

/** What an editor needs to see when someone else saved first. */
const currentValues = (t: Trail) => ({ name: t.name, difficulty: t.difficulty, kind: t.kind, direction: t.direction, lockVersion: t.lockVersion });

/** A live (not archived) trail, locked for this transaction, after checking the caller may write to its park. */
export async function lockTrailForWrite(actor: Actor | null, trailId: string, transaction: Transaction): Promise<Trail> {
  const trail = isUuid(trailId) ? await Trail.findByPk(trailId, { transaction, lock: transaction.LOCK.UPDATE }) : null;
  if (!trail || trail.archivedAt) throw new AppError(404, "Trail not found.");
  authorize(actor, "trail:write", { parkId: trail.parkId });
  return trail;
}

/**
 * Changes a trail's name, difficulty, kind or direction. The caller sends the lockVersion it read;
 * if someone saved in between, nothing changes and the 409 carries the current values.
 */
export async function updateTrailMetadata(actor: Actor | null, trailId: string, input: unknown) {
  return unlessStale(
    () =>
      sequelize.transaction(async (transaction) => {
        const trail = await lockTrailForWrite(actor, trailId, transaction);
        const { lockVersion, ...changes } = trailPatchSchema.parse(input);
        if (trail.lockVersion !== lockVersion) {
          throw new AppError(409, "Someone else changed this trail since you opened it. Their values are shown; check them and save again.", undefined, { current: currentValues(trail) });
        }
        const changed = Object.fromEntries(Object.entries(changes).filter(([key, value]) => trail.get(key as keyof Trail) !== value));
        if (Object.keys(changed).length === 0) return trail;
        await trail.update(changed, { transaction });
        await recordAudit({ parkId: trail.parkId, actorId: actor!.id, action: "trail.update", subjectType: "trail", subjectId: trail.id, data: { changed } }, transaction);
        return trail;
      }),
    // Only reachable if a writer slipped past the row lock; answer the same way.
    async () => {
      const fresh = await Trail.findByPk(trailId, { useMaster: true });
      return new AppError(409, "Someone else changed this trail since you opened it. Check the values and save again.", undefined, { current: fresh ? currentValues(fresh) : null });
    },
  );
}

/** Archives a trail: it leaves every list and the map, and its versions, files and features are kept. */
export async function archiveTrail(actor: Actor | null, trailId: string) {
  return sequelize.transaction(async (transaction) => {
    const trail = await lockTrailForWrite(actor, trailId, transaction);
    await trail.update({ archivedAt: new Date() }, { transaction });
    await recordAudit({ parkId: trail.parkId, actorId: actor!.id, action: "trail.archive", subjectType: "trail", subjectId: trail.id, data: { name: trail.name } }, transaction);
    return trail;
  });
}
