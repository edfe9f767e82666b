import "server-only";
import { QueryTypes, type Transaction } from "sequelize";
import type { NoticeKind } from "@/lib/notices/pure/schemas";
import { sequelize } from "@/models";

/**
 * Who receives a notice: confirmed, not unsubscribed riders of the park (accounts not
 * disabled) who asked for this kind, and whose trails overlap the notice's, by e-mail; and the
 * browsers subscribed to push alerts with the same choice. A whole-park notice reaches trail
 * subscribers too; a whole-park subscription gets every trail's notice. The same WHERE clauses
 * serve the preview count and the queueing insert, so they always agree.
 */
export type Audience = { parkId: string; kind: NoticeKind; trailIds: string[] | null };

/** What both channels ask of a subscription `s` and its rider `u`: the park, the kind, the trails. */
const MATCHES = `s.park_id = $1
    AND u.disabled_at IS NULL
    AND s.kinds @> jsonb_build_array($2::text)
    AND ($3::text[] IS NULL
         OR s.trail_ids IS NULL
         OR EXISTS (SELECT 1 FROM jsonb_array_elements_text(s.trail_ids) AS t(id) WHERE t.id = ANY($3::text[])))`;

/** E-mail: the address must be confirmed (double opt-in) and not unsubscribed. */
const EMAIL_AUDIENCE = `
  FROM subscriptions s
  JOIN users u ON u.id = s.user_id
  WHERE s.confirmed_at IS NOT NULL
    AND s.unsubscribed_at IS NULL
    AND ${MATCHES}`;

/** Push: a browser subscribed while its rider was signed in, and the push service has not said it is gone. */
const PUSH_AUDIENCE = `
  FROM push_subscriptions s
  JOIN users u ON u.id = s.user_id
  WHERE ${MATCHES}`;

const binds = (a: Audience) => [a.parkId, a.kind, a.trailIds];

export async function countAudience(audience: Audience, transaction?: Transaction): Promise<number> {
  const [row] = await sequelize.query<{ n: number }>(`SELECT (SELECT count(*) ${EMAIL_AUDIENCE})::int + (SELECT count(*) ${PUSH_AUDIENCE})::int AS n`, {
    bind: binds(audience),
    type: QueryTypes.SELECT,
    transaction,
  });
  return row?.n ?? 0;
}

/**
 * Writes one queued delivery per recipient and channel (inside the caller's transaction): an
 * e-mail per rider, with its deterministic Message-ID `prefix || user id || suffix`, and a push
 * per subscribed browser (id `prefix || 'push-' || subscription id || suffix`). Returns how many.
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
       ${EMAIL_AUDIENCE}
       ON CONFLICT (notice_id, user_id) WHERE channel = 'email' DO NOTHING
       RETURNING 1),
     pushes AS (
       INSERT INTO notice_deliveries (id, notice_id, user_id, email, channel, push_subscription_id, state, attempts, message_id, next_attempt_at, created_at, updated_at)
       SELECT gen_random_uuid(), $4, s.user_id, u.email, 'push', s.id, 'queued', 0, $5 || 'push-' || s.id::text || $6, now(), now(), now()
       ${PUSH_AUDIENCE}
       ON CONFLICT (notice_id, push_subscription_id) WHERE channel = 'push' DO NOTHING
       RETURNING 1)
     SELECT (SELECT count(*) FROM queued)::int + (SELECT count(*) FROM pushes)::int AS n`,
    { bind: [...binds(audience), noticeId, messageId.prefix, messageId.suffix], type: QueryTypes.SELECT, transaction },
  );
  return row?.n ?? 0;
}
