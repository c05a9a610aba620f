import { createHash } from "node:crypto";
import { db } from "@/db/knex";

// Rate-limit counters in MariaDB, keyed by any string ("compute:ip:203.0.113.7"), so every app
// process shares them. One round trip per hit for a fixed window (the upsert returns the new count
// through LAST_INSERT_ID(expr)); a sliding window adds a read of the previous window, in parallel.

export type RateLimitAlgorithm = "fixed" | "sliding";

export interface RateLimitRule {
  /** Hits allowed per window. */
  limit: number;
  windowSeconds: number;
  /** "sliding" (default) weighs the previous window by how much of it still overlaps; "fixed" resets at each boundary. */
  algorithm?: RateLimitAlgorithm;
}

export interface RateLimitDecision {
  allowed: boolean;
  limit: number;
  /** Hits counted in the window, this one included (weighted estimate for a sliding window). */
  count: number;
  remaining: number;
  /** Seconds until the current window ends. */
  resetSeconds: number;
  /** Seconds to wait before the next hit would be allowed; 0 when this one was allowed. */
  retryAfterSeconds: number;
}

const TABLE = "rate_limit_counters";
const MAX_KEY = 191;
/** Share of hits that also delete expired rows, so the table stays small without a worker. */
const PRUNE_PROBABILITY = 0.01;

function storedKey(key: string): string {
  return key.length <= MAX_KEY ? key : `sha256:${createHash("sha256").update(key).digest("hex")}`;
}

/** Adds one hit to (key, window) and returns the window's count after it. */
async function increment(key: string, windowStartMs: number, expiresAtMs: number): Promise<number> {
  const [res] = (await db.raw(
    `INSERT INTO ${TABLE} (bucket_key, window_start_ms, hits, expires_at_ms) VALUES (?, ?, LAST_INSERT_ID(1), ?)
     ON DUPLICATE KEY UPDATE hits = LAST_INSERT_ID(hits + 1)`,
    [key, windowStartMs, expiresAtMs],
  )) as [{ insertId: number }];
  return Number(res.insertId);
}

async function countIn(key: string, windowStartMs: number): Promise<number> {
  const row = (await db(TABLE).where({ bucket_key: key, window_start_ms: windowStartMs }).first("hits")) as { hits: number } | undefined;
  return row ? Number(row.hits) : 0;
}

/**
 * The decision for a hit, given the counts (pure). For a sliding window the estimate is
 * previous · (1 − elapsed share) + current; the wait is until that estimate leaves room for one more.
 */
export function decide(rule: RateLimitRule, current: number, previous: number, elapsedMs: number): RateLimitDecision {
  const windowMs = rule.windowSeconds * 1000;
  const sliding = (rule.algorithm ?? "sliding") === "sliding";
  const overlap = sliding ? 1 - elapsedMs / windowMs : 0;
  const count = previous * overlap + current;
  const allowed = count <= rule.limit;
  const resetSeconds = Math.max(1, Math.ceil((windowMs - elapsedMs) / 1000));
  let retryAfterMs = 0;
  if (!allowed) {
    if (!sliding) retryAfterMs = windowMs - elapsedMs;
    else if (current + 1 <= rule.limit && previous > 0) {
      // Still in this window: wait until previous·(1 − e) + current + 1 ≤ limit.
      const e = 1 - (rule.limit - current - 1) / previous;
      retryAfterMs = e * windowMs - elapsedMs;
    } else {
      // This window alone is over: in the next one, current·(1 − e') + 1 ≤ limit.
      const e2 = current > 0 ? Math.max(0, 1 - (rule.limit - 1) / current) : 0;
      retryAfterMs = windowMs - elapsedMs + e2 * windowMs;
    }
  }
  return {
    allowed,
    limit: rule.limit,
    count,
    remaining: Math.max(0, Math.floor(rule.limit - count)),
    resetSeconds,
    retryAfterSeconds: allowed ? 0 : Math.max(1, Math.ceil(retryAfterMs / 1000)),
  };
}

/** Counts one hit on `key` and says whether it is within the rule. Every hit counts, refused ones too. */
export async function hitRateLimit(key: string, rule: RateLimitRule, nowMs = Date.now()): Promise<RateLimitDecision> {
  const k = storedKey(key);
  const windowMs = rule.windowSeconds * 1000;
  const windowStart = Math.floor(nowMs / windowMs) * windowMs;
  const sliding = (rule.algorithm ?? "sliding") === "sliding";
  // A sliding window still reads this row during the next window.
  const expiresAt = windowStart + (sliding ? 2 : 1) * windowMs;
  const [current, previous] = await Promise.all([
    increment(k, windowStart, expiresAt),
    sliding ? countIn(k, windowStart - windowMs) : Promise.resolve(0),
  ]);
  if (Math.random() < PRUNE_PROBABILITY) void pruneRateLimitCounters(nowMs).catch(() => undefined);
  return decide(rule, current, previous, nowMs - windowStart);
}

/** Deletes expired counters (at most `batch` rows); returns how many went. */
export async function pruneRateLimitCounters(nowMs = Date.now(), batch = 1000): Promise<number> {
  return Number(await db.raw(`DELETE FROM ${TABLE} WHERE expires_at_ms < ? LIMIT ?`, [nowMs, batch]).then(([r]) => (r as { affectedRows: number }).affectedRows));
}

/** Forgets every counter of a key (after an account is verified, or in tests). */
export async function clearRateLimit(key: string): Promise<void> {
  await db(TABLE).where({ bucket_key: storedKey(key) }).del();
}
