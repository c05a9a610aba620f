import { createHash } from "node:crypto";
import { db } from "@/db/knex";

// Rate-limit counters in MariaDB, keyed by any string ("compute:ip:203.0.113.7"), so every app
// process shares them.
//
// Why hits are batched: each counter write is an InnoDB commit, and commits wait for the redo log
// to reach the disk (innodb_flush_log_at_trx_commit=1), about 2 ms here — more than the whole
// computation it guards. So each process keeps its own tally per key and window and writes it
// with one upsert (`hits = LAST_INSERT_ID(hits + n)`, which also returns the shared total):
//   - on the first hit of a key in a window (to learn what other processes counted),
//   - at least once a second while hits keep coming (and a second after the last one),
//   - on every hit once the key is within 10 % of its limit, so decisions near the limit see
//     every process's count.
// Within one process the count is exact. Across processes, far from the limit, a process may not
// yet know up to a second of the others' hits; near the limit every hit is synchronised. Pass
// `exact: true` to write every hit (one commit per hit).

export type RateLimitAlgorithm = "fixed" | "sliding";

export interface RateLimitRule {
  /** Hits allowed per window. */
  limit: number;
  windowSeconds: number;
  /** "sliding" (default) weighs the previous window by how much of it still overlaps; "fixed" resets at each boundary. */
  algorithm?: RateLimitAlgorithm;
  /** Write every hit to the database instead of batching (see above). */
  exact?: boolean;
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
/** Share of windows that also delete expired rows, so the table stays small without a worker. */
const PRUNE_PROBABILITY = 0.02;
const SYNC_EVERY_MS = 1000;
const NEAR_LIMIT_SHARE = 0.1;
const MAX_BUCKETS = 20_000;

/** This process's view of one key in one window. */
interface Bucket {
  key: string;
  windowStart: number;
  expiresAt: number;
  /** Hits this process has counted in the window. */
  seq: number;
  /** Of those, how many are already in the database. */
  flushed: number;
  /** Hits other processes had written, as of the last sync. */
  others: number;
  known: boolean;
  lastSync: number;
  inflight: Promise<void> | null;
  timer: ReturnType<typeof setTimeout> | null;
  /** The previous window's total (sliding windows only). */
  previous: number;
  /** Settles once the previous window has been read. */
  ready: Promise<void>;
}

const buckets = new Map<string, Bucket>();

function storedKey(key: string): string {
  return key.length <= MAX_KEY ? key : `sha256:${createHash("sha256").update(key).digest("hex")}`;
}

/** Adds n hits to (key, window) and returns the window's total after it (n may be 0: just read). */
async function increment(key: string, windowStartMs: number, expiresAtMs: number, n: number): Promise<number> {
  const [res] = (await db.raw(
    `INSERT INTO ?? (bucket_key, window_start_ms, hits, expires_at_ms) VALUES (?, ?, LAST_INSERT_ID(?), ?)
     ON DUPLICATE KEY UPDATE hits = LAST_INSERT_ID(hits + ?)`,
    [TABLE, key, windowStartMs, n, expiresAtMs, n],
  )) as [{ insertId: number }];
  return Number(res.insertId);
}

async function countIn(key: string, windowStartMs: number): Promise<number> {
  const row = (await db(TABLE).where({ bucket_key: key, window_start_ms: windowStartMs }).first("hits")) as { hits: number } | undefined;
  return row ? Number(row.hits) : 0;
}

/**
 * Writes this process's unwritten hits of a bucket; with `refresh`, also when there are none, to
 * learn what the other processes counted.
 */
async function sync(b: Bucket, nowMs: number, refresh: boolean): Promise<void> {
  while (b.inflight) await b.inflight.catch(() => undefined);
  if (b.seq === b.flushed && !(refresh || !b.known)) return;
  const sending = b.seq;
  const delta = sending - b.flushed;
  b.flushed = sending;
  b.inflight = increment(b.key, b.windowStart, b.expiresAt, delta)
    .then((total) => {
      b.others = total - sending;
      b.known = true;
      if (refresh) b.lastSync = nowMs;
    })
    .catch((err: unknown) => {
      b.flushed -= delta; // not written: try again next time
      throw err;
    })
    .finally(() => {
      b.inflight = null;
    });
  await b.inflight;
}

/** Writes what is left a second after the last hit, so other processes see it. */
function scheduleFlush(b: Bucket): void {
  if (b.timer || b.seq === b.flushed) return;
  b.timer = setTimeout(() => {
    b.timer = null;
    void sync(b, b.lastSync, false).catch(() => undefined);
  }, SYNC_EVERY_MS);
  b.timer.unref?.();
}

async function bucketFor(key: string, rule: RateLimitRule, nowMs: number): Promise<Bucket> {
  const windowMs = rule.windowSeconds * 1000;
  const windowStart = Math.floor(nowMs / windowMs) * windowMs;
  const sliding = (rule.algorithm ?? "sliding") === "sliding";
  const id = `${key}\u0000${rule.windowSeconds}`;
  const old = buckets.get(id);
  if (old && old.windowStart === windowStart) {
    await old.ready;
    return old;
  }
  if (old?.timer) clearTimeout(old.timer);
  if (buckets.size >= MAX_BUCKETS) evictOldBuckets(nowMs);
  const b: Bucket = {
    key,
    windowStart,
    // A sliding window still reads this row during the next window.
    expiresAt: windowStart + (sliding ? 2 : 1) * windowMs,
    seq: 0,
    flushed: 0,
    others: 0,
    known: false,
    lastSync: 0,
    inflight: null,
    timer: null,
    previous: 0,
    ready: Promise.resolve(),
  };
  // Registered at once, so concurrent hits share it and wait for the same preparation.
  buckets.set(id, b);
  b.ready = (async () => {
    // A new window: write what the old one still holds, so the previous-window read includes it.
    if (old) await sync(old, nowMs, false).catch(() => undefined);
    if (sliding) b.previous = await countIn(key, windowStart - windowMs);
  })();
  try {
    await b.ready;
  } catch (err) {
    if (buckets.get(id) === b) buckets.delete(id); // retried by the next hit
    throw err;
  }
  if (Math.random() < PRUNE_PROBABILITY) void pruneRateLimitCounters(nowMs).catch(() => undefined);
  return b;
}

function evictOldBuckets(nowMs: number): void {
  for (const [id, b] of buckets) {
    if (b.expiresAt <= nowMs && b.seq === b.flushed) buckets.delete(id);
  }
  // Still full (a flood of new keys): forget written buckets, oldest first.
  for (const [id, b] of buckets) {
    if (buckets.size < MAX_BUCKETS) break;
    if (b.seq === b.flushed && !b.inflight) buckets.delete(id);
  }
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
  const b = await bucketFor(storedKey(key), rule, nowMs);
  const ordinal = ++b.seq;
  const windowMs = rule.windowSeconds * 1000;
  const elapsed = nowMs - b.windowStart;
  const overlap = (rule.algorithm ?? "sliding") === "sliding" ? 1 - elapsed / windowMs : 0;
  const estimate = () => b.previous * overlap + b.others + ordinal;
  const nearLimit = estimate() >= rule.limit * (1 - NEAR_LIMIT_SHARE) - 1;
  if (rule.exact || !b.known || nearLimit || nowMs - b.lastSync >= SYNC_EVERY_MS) await sync(b, nowMs, true);
  scheduleFlush(b);
  return decide(rule, b.others + ordinal, b.previous, elapsed);
}

/** Writes every batched hit of this process now (tests, and before a process exits). */
export async function flushRateLimits(): Promise<void> {
  await Promise.all([...buckets.values()].map((b) => sync(b, b.lastSync, false).catch(() => undefined)));
}

/** Deletes expired counters (at most `batch` rows); returns how many went. */
export async function pruneRateLimitCounters(nowMs = Date.now(), batch = 1000): Promise<number> {
  const [res] = (await db.raw("DELETE FROM ?? WHERE expires_at_ms < ? LIMIT ?", [TABLE, nowMs, batch])) as [{ affectedRows: number }];
  return Number(res.affectedRows);
}

/** Forgets every counter of a key, here and in the database (after a verified action, or in tests). */
export async function clearRateLimit(key: string): Promise<void> {
  const k = storedKey(key);
  for (const [id, b] of buckets) {
    if (b.key !== k) continue;
    if (b.timer) clearTimeout(b.timer);
    buckets.delete(id);
  }
  await db(TABLE).where({ bucket_key: k }).del();
}
