import "server-only";
import { hostname } from "node:os";
import { randomBytes } from "node:crypto";
import type { Transporter } from "nodemailer";
import { env } from "@/lib/server/env";
import { Notice, Park, PushSubscription } from "@/models";
import { composeNoticeEmail, composeNoticePush } from "./compose";
import { claimDue, failExhaustedStaleClaims, markFailed, markRetrying, markSent, type ClaimedDelivery } from "./delivery-queue";
import { subscriptionLinks, unsubscribeToken } from "./link-tokens";
import { afterFailure, classifyPushError, classifySendError, DEFAULT_RETRY_POLICY, type RetryPolicy } from "./pure/retry-policy";
import { createPushSender, vapidFromEnv, type PushSender } from "./push-sender";

/**
 * Sends queued notice deliveries: claim a batch, send each (a few at a time), settle each
 * row right after its own send so a crash leaves as little as possible in doubt.
 */
export type WorkerOptions = {
  workerId: string;
  transport: Transporter;
  /** Sends push deliveries; by default signed with the VAPID keys of the environment. */
  push?: PushSender;
  batchSize: number;
  /** Messages in flight; the transport's pool holds those waiting for a connection. */
  concurrency: number;
  retry: RetryPolicy;
  /** A 'sending' claim older than this is taken to belong to a dead worker. */
  staleClaimMs: number;
  from?: string;
  appUrl?: string;
  random?: () => number;
};

export type BatchResult = { claimed: number; sent: number; retrying: number; failed: number; lost: number };

export const newWorkerId = () => `${hostname().slice(0, 32)}:${process.pid}:${randomBytes(4).toString("hex")}`;

export function workerDefaults(transport: Transporter, overrides: Partial<WorkerOptions> = {}): WorkerOptions {
  return { workerId: newWorkerId(), transport, batchSize: 100, concurrency: 16, retry: DEFAULT_RETRY_POLICY, staleClaimMs: 5 * 60_000, ...overrides };
}

type NoticeContext = { notice: Notice; park: Park };
const contextCache = new Map<string, NoticeContext>();

/** Notices never change once written, so their text and park are cached by id. */
async function loadContexts(noticeIds: string[]): Promise<Map<string, NoticeContext>> {
  const missing = noticeIds.filter((id) => !contextCache.has(id));
  if (missing.length > 0) {
    if (contextCache.size > 1000) contextCache.clear();
    // From the primary: the web app may have committed the notice a moment ago, and a notice not
    // found here fails its deliveries for good.
    const notices = await Notice.findAll({ where: { id: missing }, include: [{ model: Park, as: "park" }], useMaster: true });
    for (const notice of notices) contextCache.set(notice.id, { notice, park: (notice as Notice & { park: Park }).park });
  }
  return new Map(noticeIds.flatMap((id) => (contextCache.has(id) ? [[id, contextCache.get(id)!] as const] : [])));
}

async function sendEmail(row: ClaimedDelivery, context: NoticeContext, options: WorkerOptions) {
  const appUrl = options.appUrl ?? env().APP_URL;
  const links = subscriptionLinks(appUrl);
  const token = unsubscribeToken(row.userId, context.park.id);
  const email = composeNoticeEmail({
    park: context.park,
    subject: context.notice.subject,
    message: context.notice.message,
    closedUntil: context.notice.closedUntil,
    appUrl,
    unsubscribePageUrl: links.unsubscribePage(token),
    oneClickUrl: links.oneClick(token),
  });
  await options.transport.sendMail({
    from: options.from ?? env().MAIL_FROM,
    to: row.email,
    subject: email.subject,
    text: email.text,
    html: email.html,
    headers: email.headers,
    messageId: row.messageId,
  });
}

let pushFromEnv: PushSender | undefined;
function defaultPushSender(): PushSender {
  const vapid = vapidFromEnv();
  if (!vapid) throw Object.assign(new Error("Push alerts are not set up on this server (no VAPID keys)."), { statusCode: 500 });
  return (pushFromEnv ??= createPushSender(vapid));
}

/** A subscription removed before its push went out counts as gone (404): nothing left to send to. */
const subscriptionGone = () => Object.assign(new Error("This browser's alerts were turned off before the push went out."), { statusCode: 404 });

async function sendPush(row: ClaimedDelivery, context: NoticeContext, target: PushSubscription | undefined, options: WorkerOptions) {
  if (!target) throw subscriptionGone();
  const { notice, park } = context;
  const payload = composeNoticePush({ park, subject: notice.subject, message: notice.message, closedUntil: notice.closedUntil, appUrl: options.appUrl ?? env().APP_URL, noticeId: notice.id });
  await (options.push ?? defaultPushSender())(target, JSON.stringify(payload));
}

/** The browsers of the push rows in a batch, by subscription id (a removed one is simply absent). */
async function loadPushTargets(rows: ClaimedDelivery[]): Promise<Map<string, PushSubscription>> {
  const ids = rows.flatMap((r) => (r.channel === "push" && r.pushSubscriptionId ? [r.pushSubscriptionId] : []));
  if (ids.length === 0) return new Map();
  const subs = await PushSubscription.findAll({ where: { id: ids }, useMaster: true });
  return new Map(subs.map((s) => [s.id, s]));
}

/** Runs `work` over `items` with at most `limit` in flight; rethrows the first error once all lanes stop. */
async function eachLimited<T>(items: T[], limit: number, work: (item: T) => Promise<void>) {
  let next = 0;
  const lane = async () => {
    while (next < items.length) await work(items[next++]);
  };
  const lanes = await Promise.allSettled(Array.from({ length: Math.max(1, Math.min(limit, items.length)) }, lane));
  const broken = lanes.find((l): l is PromiseRejectedResult => l.status === "rejected");
  if (broken) throw broken.reason;
}

/** Claims and sends one batch. `lost` counts rows whose claim another worker took over meanwhile. */
export async function processBatch(options: WorkerOptions): Promise<BatchResult> {
  const result: BatchResult = { claimed: 0, sent: 0, retrying: 0, failed: 0, lost: 0 };
  result.failed += await failExhaustedStaleClaims(options.staleClaimMs, options.retry.maxAttempts);
  const rows = await claimDue(options.workerId, options.batchSize, options.staleClaimMs, options.retry.maxAttempts);
  result.claimed = rows.length;
  if (rows.length === 0) return result;
  const [contexts, pushTargets] = await Promise.all([loadContexts([...new Set(rows.map((r) => r.noticeId))]), loadPushTargets(rows)]);

  await eachLimited(rows, options.concurrency, async (row) => {
    const context = contexts.get(row.noticeId);
    let sendError: unknown = null;
    try {
      if (!context) throw Object.assign(new Error("The notice no longer exists."), { responseCode: 550, statusCode: 404 });
      if (row.channel === "push") await sendPush(row, context, pushTargets.get(row.pushSubscriptionId ?? ""), options);
      else await sendEmail(row, context, options);
    } catch (error) {
      sendError = error ?? new Error("unknown send error");
    }
    // A database error while settling propagates: the row stays claimed and is only
    // taken up again after the stale timeout (the one window for a duplicate; see DEVELOPERS.md).
    if (sendError === null) {
      if (await markSent(row.id, options.workerId)) result.sent++;
      else result.lost++;
      return;
    }
    const failure = row.channel === "push" ? classifyPushError(sendError) : classifySendError(sendError);
    // 404/410: the browser unsubscribed or its subscription expired (RFC 8030 §7.3); forget it, so
    // no later notice tries it again. Its deliveries stay, failed, for staff to see.
    if (failure.gone && row.pushSubscriptionId) await PushSubscription.destroy({ where: { id: row.pushSubscriptionId } });
    const outcome = afterFailure(row.attempts, failure, options.retry, new Date(), options.random);
    const settled =
      outcome.state === "failed"
        ? await markFailed(row.id, options.workerId, outcome.lastError)
        : await markRetrying(row.id, options.workerId, outcome.nextAttemptAt, outcome.lastError);
    if (!settled) result.lost++;
    else if (outcome.state === "failed") result.failed++;
    else result.retrying++;
  });
  return result;
}

/** Sends batches until nothing is due (retries scheduled for later stay queued), or `stop()` says so. */
export async function drainDue(options: WorkerOptions, stop: () => boolean = () => false): Promise<BatchResult> {
  const total: BatchResult = { claimed: 0, sent: 0, retrying: 0, failed: 0, lost: 0 };
  while (!stop()) {
    const batch = await processBatch(options);
    for (const key of Object.keys(total) as (keyof BatchResult)[]) total[key] += batch[key];
    if (batch.claimed === 0) break;
  }
  return total;
}
