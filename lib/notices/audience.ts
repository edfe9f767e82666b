import "server-only";
import { QueryTypes, type Transaction } from "sequelize";
import type { NoticeKind } from "@/lib/notices/pure/schemas";
import { sequelize } from "@/models";

/**
 * Who receives a notice: confirmed, not unsubscribed riders of the park (accounts not
 * disabled) who asked for this kind, and whose trails overlap the notice's. A whole-park
 * notice reaches trail subscribers too; a whole-park subscription gets every trail's notice.
 * One WHERE clause serves the preview count and the queueing insert, so they always agree.
 */
export type Audience = { parkId: string; kind: NoticeKind; trailIds: string[] | null };

const AUDIENCE = `
  FROM subscriptions s
  JOIN users u ON u.id = s.user_id
  WHERE s.park_id = $1
    AND s.confirmed_at IS NOT NULL
    AND s.unsubscribed_at IS NULL
    AND u.disabled_at IS NULL
    AND s.kinds @> jsonb_build_array($2::text)
    AND ($3::text[] IS NULL
         OR s.trail_ids IS NULL
         OR EXISTS (SELECT 1 FROM jsonb_array_elements_text(s.trail_ids) AS t(id) WHERE t.id = ANY($3::text[])))`;

const binds = (a: Audience) => [a.parkId, a.kind, a.trailIds];

export async function countAudience(audience: Audience, transaction?: Transaction): Promise<number> {
  const [row] = await sequelize.query<{ n: number }>(`SELECT count(*)::int AS n ${AUDIENCE}`, {
    bind: binds(audience),
    type: QueryTypes.SELECT,
    transaction,
  });
  return row?.n ?? 0;
}

/**
 * Writes one queued delivery per recipient (inside the caller's transaction), each with
 * its deterministic Message-ID built from `prefix || user id || suffix`. Returns how many.
 */
export async function queueDeliveries(
  noticeId: string,
  audience: Audience,
  messageId: { prefix: string; suffix: string },
  transaction: Transaction,
): Promise<number> {
  const [row] = await sequelize.query<{ n: number }>(
    `WITH queued AS (
       INSERT INTO notice_deliveries (id, notice_id, user_id, email, state, attempts, message_id, next_attempt_at, created_at, updated_at)
       SELECT gen_random_uuid(), $4, s.user_id, s.email, 'queued', 0, $5 || s.user_id::text || $6, now(), now(), now()
       ${AUDIENCE}
       ON CONFLICT (notice_id, user_id) DO NOTHING
       RETURNING 1)
     SELECT count(*)::int AS n FROM queued`,
    { bind: [...binds(audience), noticeId, messageId.prefix, messageId.suffix], type: QueryTypes.SELECT, transaction },
  );
  return row?.n ?? 0;
}
