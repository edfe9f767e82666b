import "server-only";
import type { Logger } from "pino";
import { logger } from "@/lib/server/logger";
import { drainDue, type BatchResult, type WorkerOptions } from "./delivery-worker";

/**
 * The long-running loop of `npm run worker`: drain what is due, sleep, repeat, until the
 * signal aborts. An abort lets the batch in hand finish (its rows are settled), then returns.
 */
export async function runWorkerLoop(
  options: WorkerOptions,
  { pollMs, signal, log = logger }: { pollMs: number; signal: AbortSignal; log?: Logger },
) {
  let errorStreak = 0;
  while (!signal.aborted) {
    let wait = pollMs;
    try {
      report(await drainDue(options, () => signal.aborted), log);
      errorStreak = 0;
    } catch (error) {
      // The database or the mail server is away: keep the process, back off, try again.
      errorStreak++;
      wait = Math.min(30_000, pollMs * 2 ** errorStreak);
      log.error({ err: error, retryInMs: wait }, `error, trying again in ${wait} ms`);
    }
    await sleep(wait, signal);
  }
}

export function report(result: BatchResult, log: Logger) {
  if (result.claimed === 0 && result.failed === 0) return;
  log.info({ ...result }, `claimed ${result.claimed}: sent ${result.sent}, retrying ${result.retrying}, failed ${result.failed}, lost claims ${result.lost}`);
}

function sleep(ms: number, signal: AbortSignal) {
  return new Promise<void>((resolve) => {
    if (signal.aborted) return resolve();
    const timer = setTimeout(done, ms);
    function done() {
      clearTimeout(timer);
      signal.removeEventListener("abort", done);
      resolve();
    }
    signal.addEventListener("abort", done, { once: true });
  });
}
