import "server-only";
import { z } from "zod";
import type { RetryPolicy } from "./pure/retry-policy";
import { DEFAULT_RETRY_POLICY } from "./pure/retry-policy";

/** Worker tuning from the environment, all optional (see .env.example, "Notice worker"). */
const schema = z.object({
  NOTICE_SMTP_CONNECTIONS: z.coerce.number().int().min(1).max(50).default(4),
  NOTICE_WORKER_CONCURRENCY: z.coerce.number().int().min(1).max(200).default(16),
  NOTICE_BATCH_SIZE: z.coerce.number().int().min(1).max(1000).default(100),
  NOTICE_POLL_MS: z.coerce.number().int().min(50).max(60_000).default(1000),
  NOTICE_MAX_ATTEMPTS: z.coerce.number().int().min(1).max(50).default(DEFAULT_RETRY_POLICY.maxAttempts),
  NOTICE_RETRY_BASE_MS: z.coerce.number().int().min(1).default(DEFAULT_RETRY_POLICY.baseDelayMs),
  NOTICE_RETRY_MAX_MS: z.coerce.number().int().min(1).default(DEFAULT_RETRY_POLICY.maxDelayMs),
  NOTICE_STALE_CLAIM_MS: z.coerce.number().int().min(1000).default(5 * 60_000),
});

/** `connections` SMTP connections; `concurrency` messages in flight (more than connections, so none idles while a row is settled). */
export type WorkerSettings = { connections: number; concurrency: number; batchSize: number; pollMs: number; retry: RetryPolicy; staleClaimMs: number };

export function workerSettings(source: Record<string, string | undefined> = process.env): WorkerSettings {
  const parsed = schema.safeParse(source);
  if (!parsed.success) {
    throw new Error(`Invalid notice worker settings: ${parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ")}`);
  }
  const e = parsed.data;
  return {
    connections: e.NOTICE_SMTP_CONNECTIONS,
    concurrency: e.NOTICE_WORKER_CONCURRENCY,
    batchSize: e.NOTICE_BATCH_SIZE,
    pollMs: e.NOTICE_POLL_MS,
    retry: { maxAttempts: e.NOTICE_MAX_ATTEMPTS, baseDelayMs: e.NOTICE_RETRY_BASE_MS, maxDelayMs: Math.max(e.NOTICE_RETRY_MAX_MS, e.NOTICE_RETRY_BASE_MS) },
    staleClaimMs: e.NOTICE_STALE_CLAIM_MS,
  };
}
