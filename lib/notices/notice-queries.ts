import "server-only";
import { QueryTypes } from "sequelize";
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { isUuid } from "@/lib/shared/ids";
import type { DeliveryChannel, DeliveryState } from "@/models/notice-delivery";
import { Notice, NoticeDelivery, Park, Trail, sequelize } from "@/models";

/** Reads for the notice pages and API, each checking the caller for the notice's park. */
export const DELIVERY_STATES: DeliveryState[] = ["queued", "sending", "retrying", "sent", "failed"];
export type DeliveryCounts = Record<DeliveryState, number>;

const emptyCounts = (): DeliveryCounts => ({ queued: 0, sending: 0, retrying: 0, sent: 0, failed: 0 });

export async function deliveryCounts(noticeIds: string[]): Promise<Map<string, DeliveryCounts>> {
  const counts = new Map(noticeIds.map((id) => [id, emptyCounts()]));
  if (noticeIds.length === 0) return counts;
  const rows = await sequelize.query<{ noticeId: string; state: DeliveryState; n: number }>(
    `SELECT notice_id AS "noticeId", state, count(*)::int AS n FROM notice_deliveries WHERE notice_id = ANY($1::uuid[]) GROUP BY notice_id, state`,
    { bind: [noticeIds], type: QueryTypes.SELECT },
  );
  for (const row of rows) counts.get(row.noticeId)![row.state] = row.n;
  return counts;
}

function noticeView(notice: Notice, counts: DeliveryCounts) {
  return {
    id: notice.id,
    kind: notice.kind,
    trailIds: notice.trailIds,
    subject: notice.subject,
    message: notice.message,
    closedUntil: notice.closedUntil,
    recipientCount: notice.recipientCount,
    createdAt: notice.createdAt,
    deliveries: counts,
  };
}

export async function listParkNotices(actor: Actor | null, parkId: string, limit = 50) {
  authorize(actor, "notice:read", { parkId });
  const notices = await Notice.findAll({ where: { parkId }, order: [["createdAt", "DESC"]], limit });
  const counts = await deliveryCounts(notices.map((n) => n.id));
  return notices.map((n) => noticeView(n, counts.get(n.id)!));
}

export async function getNotice(actor: Actor | null, noticeId: string) {
  const notice = isUuid(noticeId) ? await Notice.findByPk(noticeId, { include: [{ model: Park, as: "park" }] }) : null;
  if (!notice) throw new AppError(404, "Notice not found.");
  authorize(actor, "notice:read", { parkId: notice.parkId });
  const park = (notice as Notice & { park: Park }).park;
  const counts = (await deliveryCounts([notice.id])).get(notice.id)!;
  const trails = notice.trailIds ? await Trail.findAll({ where: { id: notice.trailIds }, attributes: ["id", "name"] }) : [];
  return {
    ...noticeView(notice, counts),
    park: { id: park.id, slug: park.slug, name: park.name, timeZone: park.timeZone },
    trails: trails.map((t) => ({ id: t.id, name: t.name })),
  };
}

/** Deliveries needing attention first (failed, retrying, in flight, queued), then sent. */
export async function listDeliveries(noticeId: string, limit = 200) {
  const rows = await NoticeDelivery.findAll({
    where: { noticeId },
    order: [
      [sequelize.literal(`CASE state WHEN 'failed' THEN 0 WHEN 'retrying' THEN 1 WHEN 'sending' THEN 2 WHEN 'queued' THEN 3 ELSE 4 END`), "ASC"],
      ["email", "ASC"],
    ],
    limit,
  });
  return rows.map((d) => ({ id: d.id, email: d.email, channel: d.channel as DeliveryChannel, state: d.state, attempts: d.attempts, lastError: d.lastError, sentAt: d.sentAt, nextAttemptAt: d.nextAttemptAt }));
}

/** The park's trails (not archived), for choosing in forms. */
export async function parkTrailChoices(parkId: string) {
  const trails = await Trail.findAll({ where: { parkId, archivedAt: null }, attributes: ["id", "name", "difficulty"], order: [["name", "ASC"]] });
  return trails.map((t) => ({ id: t.id, name: t.name, difficulty: t.difficulty }));
}
