import { describe, expect, it } from "vitest";
import { DEFAULT_RETRY_POLICY } from "@/lib/notices/pure/retry-policy";
import { workerSettings } from "@/lib/notices/worker-settings";

describe("notice worker settings", () => {
  it("default to the production policy", () => {
    expect(workerSettings({})).toEqual({ connections: 4, concurrency: 16, batchSize: 100, pollMs: 1000, retry: DEFAULT_RETRY_POLICY, staleClaimMs: 300_000 });
  });

  it("read overrides from the environment", () => {
    const settings = workerSettings({ NOTICE_WORKER_CONCURRENCY: "8", NOTICE_MAX_ATTEMPTS: "3", NOTICE_RETRY_BASE_MS: "50", NOTICE_RETRY_MAX_MS: "10" });
    expect(settings.concurrency).toBe(8);
    expect(settings.retry).toEqual({ maxAttempts: 3, baseDelayMs: 50, maxDelayMs: 50 });
  });

  it("refuse nonsense with a message naming the variable", () => {
    expect(() => workerSettings({ NOTICE_BATCH_SIZE: "0" })).toThrow(/NOTICE_BATCH_SIZE/);
    expect(() => workerSettings({ NOTICE_POLL_MS: "soon" })).toThrow(/NOTICE_POLL_MS/);
  });
});
