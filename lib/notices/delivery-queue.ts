import "server-only";
import { QueryTypes } from "sequelize";
import { sequelize } from "@/models";

/**
 * The deliveries table is the queue (transactional outbox): rows are committed with their
 * notice, and workers claim them with FOR UPDATE SKIP LOCKED, so several workers never
 * hold the same row. Every state change checks the claim, so a worker whose claim was
 * taken over (it stalled past the stale timeout) cannot overwrite the new owner's result.
 */
export type ClaimedDelivery = {
  id: string;
  noticeId: string;
  userId: string;
  email: string;
  attempts: number;
  messageId: string;
  channel: "email" | "push";
  /** Push only: the browser's subscription, null once it was removed. */
  pushSubscriptionId: string | null;
};

/**
 * Claims up to `limit` due rows: queued or retrying rows whose time has come, and rows left
 * in 'sending' longer than `staleMs` by a worker that died (a sent row is never claimed).
 * Each claim counts as an attempt, so a row that keeps crashing workers still runs out.
 */
export async function claimDue(workerId: string, limit: number, staleMs: number, maxAttempts: number): Promise<ClaimedDelivery[]> {
  return sequelize.query<ClaimedDelivery>(
    `UPDATE notice_deliveries d
        SET state = 'sending', claimed_by = $1, claimed_at = now(), attempts = d.attempts + 1, updated_at = now()
      WHERE d.id IN (
        SELECT id FROM notice_deliveries
         WHERE (state IN ('queued', 'retrying') AND next_attempt_at <= now())
            OR (state = 'sending' AND claimed_at < now() - make_interval(secs => $3::double precision / 1000) AND attempts < $4)
         ORDER BY next_attempt_at
         LIMIT $2
         FOR UPDATE SKIP LOCKED)
      RETURNING d.id, d.notice_id AS "noticeId", d.user_id AS "userId", d.email, d.attempts, d.message_id AS "messageId",
                d.channel, d.push_subscription_id AS "pushSubscriptionId"`,
    { bind: [workerId, limit, staleMs, maxAttempts], type: QueryTypes.SELECT },
  );
}

/** Stale claims that already used every attempt are failed, visibly, rather than left hanging. */
export async function failExhaustedStaleClaims(staleMs: number, maxAttempts: number): Promise<number> {
  const rows = await sequelize.query(
    `UPDATE notice_deliveries
        SET state = 'failed', claimed_by = NULL, updated_at = now(),
            last_error = 'A worker stopped while sending, ' || attempts || ' attempts in all; not resent.'
      WHERE state = 'sending' AND claimed_at < now() - make_interval(secs => $1::double precision / 1000) AND attempts >= $2
      RETURNING id`,
    { bind: [staleMs, maxAttempts], type: QueryTypes.SELECT },
  );
  return rows.length;
}

const settle = async (sql: string, bind: unknown[]) => {
  const rows = await sequelize.query(`${sql} RETURNING id`, { bind, type: QueryTypes.SELECT });
  return rows.length === 1;
};

export const markSent = (id: string, workerId: string) =>
  settle(`UPDATE notice_deliveries SET state = 'sent', sent_at = now(), last_error = NULL, updated_at = now() WHERE id = $1 AND state = 'sending' AND claimed_by = $2`, [id, workerId]);

export const markRetrying = (id: string, workerId: string, nextAttemptAt: Date, lastError: string) =>
  settle(
    `UPDATE notice_deliveries SET state = 'retrying', next_attempt_at = $3, last_error = $4, updated_at = now() WHERE id = $1 AND state = 'sending' AND claimed_by = $2`,
    [id, workerId, nextAttemptAt, lastError],
  );

export const markFailed = (id: string, workerId: string, lastError: string) =>
  settle(`UPDATE notice_deliveries SET state = 'failed', last_error = $3, updated_at = now() WHERE id = $1 AND state = 'sending' AND claimed_by = $2`, [id, workerId, lastError]);

/** Staff "retry failed": failed rows of one notice go back to the queue with fresh attempts. */
export async function requeueFailed(noticeId: string): Promise<number> {
  const rows = await sequelize.query(
    `UPDATE notice_deliveries SET state = 'queued', attempts = 0, next_attempt_at = now(), claimed_by = NULL, updated_at = now()
      WHERE notice_id = $1 AND state = 'failed' RETURNING id`,
    { bind: [noticeId], type: QueryTypes.SELECT },
  );
  return rows.length;
}
