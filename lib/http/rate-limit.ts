import { hitRateLimit, type RateLimitDecision, type RateLimitRule } from "@/lib/data/rate-limit";
import { clientIp } from "./client-ip";
import { AppError, isDatabaseUnavailable } from "./errors";

// Per-client rate limiting for public route handlers, on the counters in lib/data/rate-limit.ts.

/** RateLimit-* headers (IETF draft names) describing a decision. */
export function rateLimitHeaders(d: RateLimitDecision): Record<string, string> {
  return {
    "RateLimit-Limit": String(d.limit),
    "RateLimit-Remaining": String(d.remaining),
    "RateLimit-Reset": String(d.resetSeconds),
  };
}

/** The 429 error, carrying the decision so the response can say when the window resets. */
export class RateLimitedError extends AppError {
  constructor(readonly decision: RateLimitDecision, rule: RateLimitRule) {
    super(
      "rate_limited",
      `Too many requests: at most ${rule.limit} every ${rule.windowSeconds} s from one address. Try again in ${decision.retryAfterSeconds} s.`,
      undefined,
      decision.retryAfterSeconds,
    );
  }
}

export interface ClientLimit extends RateLimitRule {
  /** Names the counter ("compute"); the key is `${name}:ip:${ip}`. */
  name: string;
}

let lastFailureLog = 0;

/**
 * Counts this request against the client's limit and throws RateLimitedError (code "rate_limited",
 * with retryAfterSeconds) when it is over (errorResponse then sets Retry-After). A limit of 0 turns the
 * check off. When the counters cannot be read or written (database away, table trouble) the
 * request goes through and the failure is logged once a minute: a public calculation is worth more
 * than the limit, and it must never turn into a 500. Returns the decision (null when not counted).
 */
export async function enforceClientLimit(req: Request, rule: ClientLimit): Promise<RateLimitDecision | null> {
  if (!(rule.limit > 0)) return null;
  let decision: RateLimitDecision;
  try {
    decision = await hitRateLimit(`${rule.name}:ip:${clientIp(req.headers)}`, rule);
  } catch (err) {
    const now = Date.now();
    if (now - lastFailureLog > 60_000) {
      lastFailureLog = now;
      console.error(`[rate-limit] ${rule.name}: counters unavailable, letting requests through`, isDatabaseUnavailable(err) ? "(database unreachable)" : err);
    }
    return null;
  }
  if (!decision.allowed) throw new RateLimitedError(decision, rule);
  return decision;
}
