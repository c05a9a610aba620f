// Retry timing of the e-mail outbox: exponential backoff (delay doubles per failed attempt, capped),
// the textbook scheme; jitter only ever shortens the delay, by at most 20 %.
import { describe, expect, it } from "vitest";
import { isRetryable, nextDelayMs } from "@/lib/outbox/backoff";

const policy = { baseMs: 1000, maxMs: 60_000, maxAttempts: 10 };

describe("outbox backoff", () => {
  it("doubles the delay after each failed attempt", () => {
    const none = () => 0;
    expect([1, 2, 3, 4, 5].map((n) => nextDelayMs(n, policy, none))).toEqual([1000, 2000, 4000, 8000, 16000]);
  });

  it("caps the delay", () => {
    expect(nextDelayMs(20, policy, () => 0)).toBe(60_000);
  });

  it("takes off at most 20 % for jitter", () => {
    expect(nextDelayMs(3, policy, () => 1)).toBe(3200);
    for (let i = 0; i < 50; i++) {
      const d = nextDelayMs(3, policy);
      expect(d).toBeGreaterThanOrEqual(3200);
      expect(d).toBeLessThanOrEqual(4000);
    }
  });

  it("retries server errors, timeouts and rate limits, not validation errors", () => {
    // HTTP semantics (RFC 9110): 5xx, 408 and 429 are worth retrying; 400 and 422 are not.
    expect([null, 500, 502, 503, 408, 429, 409].map(isRetryable)).toEqual([true, true, true, true, true, true, true]);
    expect([400, 404, 422].map(isRetryable)).toEqual([false, false, false]);
  });
});
