import "server-only";
import { Op } from "sequelize";
import type { Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { recordAudit } from "@/lib/audit/record";
import { claimWithinLimit } from "@/lib/server/hourly-limit";
import { AuditEvent, sequelize } from "@/models";

/**
 * Anti-automation for the costliest thing Loamcast does: each person may have at most this many
 * trail files processed per hour. A preview and a save count one each, so staff can still preview
 * and save 30 trails an hour. Counted as audit events.
 */
export const UPLOADS_PER_HOUR = 60;
export const UPLOAD_ATTEMPT_ACTION = "trail.upload-attempt";

export type UploadPurpose = "preview" | "create" | "replace-line";

/** Takes one upload slot for this person, or refuses with 429 and when to try again. */
export async function claimUploadSlot(actor: Actor, parkId: string, purpose: UploadPurpose, now = new Date()): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    await claimWithinLimit(transaction, {
      key: `upload:${actor.id}`,
      limit: UPLOADS_PER_HOUR,
      now,
      used: async (since) => {
        const where = { actorId: actor.id, action: UPLOAD_ATTEMPT_ACTION, createdAt: { [Op.gt]: since } };
        const [count, oldest] = await Promise.all([AuditEvent.count({ where, transaction }), AuditEvent.min<Date, AuditEvent>("createdAt", { where, transaction })]);
        return { count, oldest: oldest ?? null };
      },
      refuse: ({ retryInMinutes: m }) =>
        new AppError(429, `You have sent ${UPLOADS_PER_HOUR} trail files in the last hour, the most Loamcast processes for one person. Try again in ${m} minute${m === 1 ? "" : "s"}.`, "file"),
    });
    await recordAudit({ parkId, actorId: actor.id, action: UPLOAD_ATTEMPT_ACTION, subjectType: "park", subjectId: parkId, data: { purpose }, createdAt: now }, transaction);
  });
}
