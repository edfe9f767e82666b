import "server-only";
import { Op } from "sequelize";
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { env } from "@/lib/server/env";
import { AppError } from "@/lib/shared/errors";
import { isUuid } from "@/lib/shared/ids";
import { noticeFields, type NoticeFields } from "@/lib/notices/pure/schemas";
import { recordAudit } from "@/lib/audit/record";
import { claimWithinLimit } from "@/lib/server/hourly-limit";
import { Notice, Park, Trail, sequelize } from "@/models";
import { countAudience, queueDeliveries } from "./audience";
import { requeueFailed } from "./delivery-queue";
import { composeNoticeEmail, noticeSubject } from "./compose";
import { messageIdDomain, messageIdParts } from "./pure/message-id";

/** Anti-automation on e-mail sending (ASVS v5.0.0 2.4.1): notices per park per rolling hour. */
export const NOTICES_PER_PARK_PER_HOUR = 20;

type Prepared = { park: Park; fields: NoticeFields; trailNames: string[] | null; subject: string };

/** Checks the caller, the input and that every trail belongs to this park. */
async function prepare(actor: Actor | null, parkId: string, input: unknown): Promise<Prepared & { actor: Actor }> {
  authorize(actor, "notice:send", { parkId });
  const fields = noticeFields.parse(input);
  const park = await Park.findByPk(parkId);
  if (!park) throw new AppError(404, "Park not found.");
  let trailNames: string[] | null = null;
  if (fields.trailIds) {
    const trails = await Trail.findAll({ where: { id: fields.trailIds, parkId, archivedAt: null }, attributes: ["id", "name"] });
    if (trails.length !== fields.trailIds.length) throw new AppError(422, "Choose trails of this park.", "trailIds");
    const byId = new Map(trails.map((t) => [t.id, t.name]));
    trailNames = fields.trailIds.map((id) => byId.get(id)!);
  }
  return { actor, park, fields, trailNames, subject: noticeSubject(park.name, fields.kind, trailNames) };
}

const audienceOf = (parkId: string, fields: NoticeFields) => ({ parkId, kind: fields.kind, trailIds: fields.trailIds });

/** What the e-mail will look like and how many riders would get it; nothing is written. */
export async function previewNotice(actor: Actor | null, parkId: string, input: unknown) {
  const { park, fields, subject, trailNames } = await prepare(actor, parkId, input);
  const sample = `${env().APP_URL}/unsubscribe?token=…`;
  const email = composeNoticeEmail({
    park,
    subject,
    message: fields.message,
    closedUntil: fields.closedUntil,
    appUrl: env().APP_URL,
    unsubscribePageUrl: sample,
    oneClickUrl: sample,
  });
  const recipientCount = await countAudience(audienceOf(parkId, fields));
  return { subject: email.subject, text: email.text, html: email.html, recipientCount, trailNames, fields };
}

/**
 * Records the notice, one queued delivery per recipient and the audit event in one
 * transaction: either all of it is committed (and the worker will send it), or none.
 */
export async function sendNotice(actor: Actor | null, parkId: string, input: unknown, limits = { perHour: NOTICES_PER_PARK_PER_HOUR }) {
  const prepared = await prepare(actor, parkId, input);
  const { fields, subject } = prepared;
  return sequelize.transaction(async (transaction) => {
    await claimWithinLimit(transaction, {
      key: `notice-send:${parkId}`,
      limit: limits.perHour,
      used: async (since) => {
        const where = { parkId, createdAt: { [Op.gt]: since } };
        const [count, oldest] = await Promise.all([Notice.count({ where, transaction }), Notice.min<Date, Notice>("createdAt", { where, transaction })]);
        return { count, oldest: oldest ?? null };
      },
      refuse: ({ count }) => new AppError(429, `This park has sent ${count} notices in the past hour, the most allowed. Wait a while, or combine updates into one notice.`),
    });
    const notice = await Notice.create(
      { parkId, kind: fields.kind, trailIds: fields.trailIds, subject, message: fields.message, closedUntil: fields.closedUntil, createdBy: prepared.actor.id },
      { transaction },
    );
    const recipientCount = await queueDeliveries(notice.id, audienceOf(parkId, fields), messageIdParts(notice.id, messageIdDomain(env().APP_URL)), transaction);
    await notice.update({ recipientCount }, { transaction });
    await recordAudit({ parkId, actorId: prepared.actor.id, action: "notice.send", subjectType: "notice", subjectId: notice.id, data: { kind: fields.kind, trailIds: fields.trailIds, recipientCount } }, transaction);
    return { id: notice.id, recipientCount };
  });
}

/** Staff "retry failed": the notice's failed deliveries go back to the queue with fresh attempts. */
export async function retryFailedDeliveries(actor: Actor | null, noticeId: string) {
  const notice = isUuid(noticeId) ? await Notice.findByPk(noticeId) : null;
  if (!notice) throw new AppError(404, "Notice not found.");
  authorize(actor, "notice:send", { parkId: notice.parkId });
  const requeued = await requeueFailed(notice.id);
  await recordAudit({ parkId: notice.parkId, actorId: actor.id, action: "notice.retry", subjectType: "notice", subjectId: notice.id, data: { requeued } });
  return { id: notice.id, requeued };
}
