import "server-only";
import { Op } from "sequelize";
import type { Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { recordAudit } from "@/lib/audit/record";
import { AuditEvent, sequelize } from "@/models";

/**
 * Anti-automation for the costliest thing Loamcast does (ASVS v5.0.0 2.4.1): each person may
 * have at most this many trail files processed per hour. A preview and a save count one each,
 * so staff can still preview and save 30 trails an hour. Counted in PostgreSQL (audit events),
 * so the limit holds across app instances.
 */
export const UPLOADS_PER_HOUR = 60;
const WINDOW_MS = 60 * 60 * 1000;
export const UPLOAD_ATTEMPT_ACTION = "trail.upload-attempt";

export type UploadPurpose = "preview" | "create" | "replace-line";

/** Takes one upload slot for this person, or refuses with 429 and when to try again. */
export async function claimUploadSlot(actor: Actor, parkId: string, purpose: UploadPurpose, now = new Date()): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    // One person's claims queue behind each other, so parallel requests cannot overshoot the limit.
    await sequelize.query("SELECT pg_advisory_xact_lock(hashtext($1))", { bind: [`upload:${actor.id}`], transaction });
    const since = new Date(now.getTime() - WINDOW_MS);
    const recent = await AuditEvent.findAll({
      where: { actorId: actor.id, action: UPLOAD_ATTEMPT_ACTION, createdAt: { [Op.gt]: since } },
      attributes: ["createdAt"],
      order: [["createdAt", "ASC"]],
      limit: UPLOADS_PER_HOUR,
      transaction,
    });
    if (recent.length >= UPLOADS_PER_HOUR) {
      const minutes = Math.max(1, Math.ceil((recent[0].createdAt.getTime() + WINDOW_MS - now.getTime()) / 60_000));
      throw new AppError(429, `You have sent ${UPLOADS_PER_HOUR} trail files in the last hour, the most Loamcast processes for one person. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`, "file");
    }
    await recordAudit({ parkId, actorId: actor.id, action: UPLOAD_ATTEMPT_ACTION, subjectType: "park", subjectId: parkId, data: { purpose }, createdAt: now }, transaction);
  });
}
