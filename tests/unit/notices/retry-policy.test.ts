import { describe, expect, it } from "vitest";
import { afterFailure, classifySendError, DEFAULT_RETRY_POLICY, retryDelayMs, type RetryPolicy } from "@/lib/notices/pure/retry-policy";

const policy: RetryPolicy = { maxAttempts: 6, baseDelayMs: 1000, maxDelayMs: 10_000 };
const now = new Date("2026-06-01T07:00:00Z");

describe("retry backoff", () => {
  it("doubles per attempt, between half and all of the step (equal jitter), capped", () => {
    expect([1, 2, 3, 4, 5].map((a) => retryDelayMs(a, policy, () => 1))).toEqual([1000, 2000, 4000, 8000, 10_000]);
    expect([1, 2, 3, 4, 5].map((a) => retryDelayMs(a, policy, () => 0))).toEqual([500, 1000, 2000, 4000, 5000]);
    expect(retryDelayMs(30, policy, () => 0.5)).toBe(7500);
  });

  it("the default spreads six attempts over roughly an hour", () => {
    const longest = [1, 2, 3, 4, 5].reduce((sum, a) => sum + retryDelayMs(a, DEFAULT_RETRY_POLICY, () => 1), 0);
    expect(longest).toBe((2 + 4 + 8 + 16 + 30) * 60_000);
    expect(DEFAULT_RETRY_POLICY.maxAttempts).toBe(6);
  });
});

describe("classifying send errors (SMTP reply classes, RFC 5321 §4.2.1)", () => {
  it("4yz replies and network errors are temporary; 5yz replies are permanent", () => {
    expect(classifySendError(Object.assign(new Error("Try again later"), { responseCode: 451 }))).toEqual({ permanent: false, summary: "SMTP 451: Try again later" });
    expect(classifySendError(Object.assign(new Error("No such user"), { responseCode: 550 })).permanent).toBe(true);
    expect(classifySendError(Object.assign(new Error("connect ECONNREFUSED 127.0.0.1:2526"), { code: "ESOCKET" }))).toEqual({
      permanent: false,
      summary: "ESOCKET: connect ECONNREFUSED 127.0.0.1:2526",
    });
    expect(classifySendError(undefined).permanent).toBe(false);
  });

  it("keeps the summary on one line and within the column's 500 characters", () => {
    const summary = classifySendError(new Error(`line one\r\nline two ${"x".repeat(900)}`)).summary;
    expect(summary).not.toMatch(/[\r\n]/);
    expect(summary.length).toBe(500);
  });
});

describe("after a failed attempt", () => {
  const temporary = { permanent: false, summary: "SMTP 451: busy" };
  it("schedules a retry while attempts remain", () => {
    expect(afterFailure(1, temporary, policy, now, () => 1)).toEqual({ state: "retrying", nextAttemptAt: new Date(now.getTime() + 1000), lastError: "SMTP 451: busy" });
    expect(afterFailure(5, temporary, policy, now, () => 1)).toMatchObject({ state: "retrying" });
  });

  it("fails the delivery on the last attempt, or at once when the refusal is permanent", () => {
    expect(afterFailure(6, temporary, policy, now)).toEqual({ state: "failed", lastError: "Gave up after 6 attempts. Last: SMTP 451: busy" });
    expect(afterFailure(1, { permanent: true, summary: "SMTP 550: no such user" }, policy, now)).toEqual({ state: "failed", lastError: "SMTP 550: no such user" });
  });
});
