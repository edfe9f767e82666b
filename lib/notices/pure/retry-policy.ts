/**
 * When a failed delivery is tried again, and when it is given up. Pure: the worker
 * passes in the attempt count and the error; tests pass their own policy and random.
 */
export type RetryPolicy = {
  /** Attempts in all, the first included; the last failure marks the delivery failed. */
  maxAttempts: number;
  /** Wait before the second attempt; doubles each time. */
  baseDelayMs: number;
  /** Longest wait between two attempts. */
  maxDelayMs: number;
};

/** Six attempts spread over about an hour (2, 4, 8, 16, 30 minutes apart, give or take). */
export const DEFAULT_RETRY_POLICY: RetryPolicy = { maxAttempts: 6, baseDelayMs: 120_000, maxDelayMs: 30 * 60_000 };

/**
 * Exponential backoff with "equal jitter": half the step is fixed, half random, so
 * workers that failed together during an outage do not all come back at the same instant.
 * `attempt` is the number of attempts made so far (1 after the first failure).
 */
export function retryDelayMs(attempt: number, policy: RetryPolicy, random: () => number = Math.random): number {
  const step = Math.min(policy.maxDelayMs, policy.baseDelayMs * 2 ** Math.max(0, attempt - 1));
  return Math.round(step / 2 + (step / 2) * random());
}

/** `gone`: the push service says the browser's subscription no longer exists (remove it). */
export type SendFailure = { permanent: boolean; summary: string; gone?: boolean };

/**
 * SMTP replies 5xx are permanent (the address or message is refused: retrying will not help);
 * 4xx replies and network errors (refused, reset, timeout) are temporary.
 */
export function classifySendError(error: unknown): SendFailure {
  const e = (error ?? {}) as { responseCode?: number; code?: string; message?: string };
  const code = typeof e.responseCode === "number" ? e.responseCode : undefined;
  const text = String(e.message ?? error ?? "unknown error").replace(/\s+/g, " ").trim();
  const summary = [code ? `SMTP ${code}` : e.code, text].filter(Boolean).join(": ").slice(0, 500);
  return { permanent: code !== undefined && code >= 500 && code < 600, summary };
}

/**
 * A push service's answer (RFC 8030 §5, §7.3; RFC 8292 §4): 404 or 410, the subscription is gone
 * (we remove it); 429 (too many requests) and 5xx are temporary; any other 4xx (a refused VAPID
 * token, a payload too large) is permanent, as is a push that could not be built (`permanent`).
 * No status: a network error, temporary.
 */
export function classifyPushError(error: unknown): SendFailure {
  const e = (error ?? {}) as { statusCode?: number; code?: string; message?: string; cause?: { code?: string }; permanent?: boolean };
  const status = typeof e.statusCode === "number" ? e.statusCode : undefined;
  const text = String(e.message ?? error ?? "unknown error").replace(/\s+/g, " ").trim();
  const summary = [status ? `Push ${status}` : (e.code ?? e.cause?.code), text].filter(Boolean).join(": ").slice(0, 500);
  if (e.permanent === true) return { permanent: true, summary };
  if (status === 404 || status === 410) return { permanent: true, gone: true, summary: `${summary.slice(0, 400)} (this browser's alerts have ended; it was removed)` };
  const temporary = status === undefined || status === 429 || status >= 500;
  return { permanent: !temporary, summary };
}

export type AfterFailure = { state: "retrying"; nextAttemptAt: Date; lastError: string } | { state: "failed"; lastError: string };

/** What becomes of a delivery whose attempt number `attempts` just failed. */
export function afterFailure(attempts: number, failure: SendFailure, policy: RetryPolicy, now: Date, random?: () => number): AfterFailure {
  if (failure.permanent) return { state: "failed", lastError: failure.summary };
  if (attempts >= policy.maxAttempts) return { state: "failed", lastError: `Gave up after ${attempts} attempts. Last: ${failure.summary}`.slice(0, 500) };
  return { state: "retrying", nextAttemptAt: new Date(now.getTime() + retryDelayMs(attempts, policy, random)), lastError: failure.summary };
}
