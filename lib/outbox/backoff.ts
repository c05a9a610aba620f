// When to try a message again. Pure, so it is tested directly.

export interface BackoffPolicy {
  baseMs: number;
  maxMs: number;
  maxAttempts: number;
}

export function backoffPolicyFromEnv(env: Record<string, string | undefined> = process.env): BackoffPolicy {
  const n = (name: string, fallback: number) => {
    const v = Number(env[name]);
    return Number.isFinite(v) && v > 0 ? v : fallback;
  };
  return { baseMs: n("OUTBOX_BACKOFF_BASE_MS", 2000), maxMs: n("OUTBOX_BACKOFF_MAX_MS", 15 * 60_000), maxAttempts: n("OUTBOX_MAX_ATTEMPTS", 12) };
}

/**
 * Delay before the next attempt after `attempts` failed ones: base·2^(attempts−1), capped, with
 * up to 20 % random jitter taken off so many messages failing together do not retry in lockstep.
 */
export function nextDelayMs(attempts: number, policy: BackoffPolicy, random: () => number = Math.random): number {
  const exp = policy.baseMs * 2 ** Math.max(0, attempts - 1);
  const capped = Math.min(exp, policy.maxMs);
  return Math.round(capped * (1 - 0.2 * random()));
}

/** Which provider answers are worth retrying: network trouble, rate limits, conflicts, server errors. */
export function isRetryable(statusCode: number | null | undefined): boolean {
  if (statusCode === null || statusCode === undefined) return true;
  if (statusCode >= 500) return true;
  // 401/403: a wrong or revoked API key is fixed by configuration; keep the message until then.
  return [401, 403, 408, 409, 429].includes(statusCode);
}
