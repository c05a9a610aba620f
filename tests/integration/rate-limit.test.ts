// Rate-limit counters on the real test MariaDB (lib/data/rate-limit.ts), with time passed in.
import { afterAll, describe, expect, it } from "vitest";
import { db } from "@/db/knex";
import { clearRateLimit, decide, flushRateLimits, hitRateLimit, pruneRateLimitCounters } from "@/lib/data/rate-limit";

const key = (name: string) => `test:${name}:${Date.now()}:${Math.random()}`;
const T0 = Date.UTC(2027, 0, 4, 12, 0, 0); // a window boundary for 60 s windows

afterAll(async () => {
  await db.destroy();
});

describe("fixed window", () => {
  it("counts hits per key in one statement each and refuses the one over the limit", async () => {
    const k = key("fixed");
    const rule = { limit: 3, windowSeconds: 60, algorithm: "fixed" as const };
    const counts = [];
    for (let i = 0; i < 4; i++) counts.push(await hitRateLimit(k, rule, T0 + 1000 * i));
    expect(counts.map((d) => d.count)).toEqual([1, 2, 3, 4]);
    expect(counts.map((d) => d.allowed)).toEqual([true, true, true, false]);
    expect(counts[3]!.retryAfterSeconds).toBe(57); // the window ends at T0 + 60 s
    const next = await hitRateLimit(k, rule, T0 + 60_000);
    expect(next).toMatchObject({ allowed: true, count: 1 });
    await clearRateLimit(k);
  });

  it("keeps keys apart, and hashes keys too long for the column", async () => {
    const a = key("a");
    const long = key("b".repeat(300));
    const rule = { limit: 1, windowSeconds: 60, algorithm: "fixed" as const };
    expect((await hitRateLimit(a, rule, T0)).allowed).toBe(true);
    expect((await hitRateLimit(long, rule, T0)).allowed).toBe(true);
    expect((await hitRateLimit(long, rule, T0)).allowed).toBe(false);
    await clearRateLimit(a);
    await clearRateLimit(long);
  });

  it("counts concurrent hits exactly (the upsert is atomic)", async () => {
    const k = key("race");
    const rule = { limit: 100, windowSeconds: 60, algorithm: "fixed" as const };
    const all = await Promise.all(Array.from({ length: 25 }, () => hitRateLimit(k, rule, T0)));
    expect(all.map((d) => d.count).sort((x, y) => x - y)).toEqual(Array.from({ length: 25 }, (_, i) => i + 1));
    await clearRateLimit(k);
  });
});

async function stored(k: string, windowStart: number): Promise<number> {
  const row = await db("rate_limit_counters").where({ bucket_key: k, window_start_ms: windowStart }).first("hits");
  return row ? Number(row.hits) : 0;
}

describe("batching (one commit per key per second while far from the limit)", () => {
  it("writes the first hit at once and the rest within a second, or on flush", async () => {
    const k = key("batch");
    const rule = { limit: 1000, windowSeconds: 60, algorithm: "fixed" as const };
    for (let i = 0; i < 5; i++) expect((await hitRateLimit(k, rule, T0 + i)).count).toBe(i + 1);
    expect(await stored(k, T0)).toBe(1);
    await flushRateLimits();
    expect(await stored(k, T0)).toBe(5);
    await clearRateLimit(k);
  });

  it("sees other processes' hits at the next sync, and syncs every hit near the limit", async () => {
    const k = key("shared");
    const rule = { limit: 10, windowSeconds: 60, algorithm: "fixed" as const };
    expect((await hitRateLimit(k, rule, T0)).count).toBe(1);
    // Another app process writes 8 hits to the same counter.
    await db("rate_limit_counters").where({ bucket_key: k, window_start_ms: T0 }).increment("hits", 8);
    const later = await hitRateLimit(k, rule, T0 + 1500); // a second on: this hit re-reads the total
    expect(later).toMatchObject({ count: 10, allowed: true });
    const over = await hitRateLimit(k, rule, T0 + 1501); // near the limit: written and re-read at once
    expect(over).toMatchObject({ count: 11, allowed: false });
    expect(await stored(k, T0)).toBe(11);
    await clearRateLimit(k);
  });

  it("writes every hit with exact: true", async () => {
    const k = key("exact");
    const rule = { limit: 1000, windowSeconds: 60, algorithm: "fixed" as const, exact: true };
    for (let i = 0; i < 3; i++) await hitRateLimit(k, rule, T0 + i);
    expect(await stored(k, T0)).toBe(3);
    await clearRateLimit(k);
  });
});

describe("sliding window", () => {
  it("weighs the previous window by its remaining overlap", async () => {
    const k = key("sliding");
    const rule = { limit: 10, windowSeconds: 60 };
    for (let i = 0; i < 8; i++) await hitRateLimit(k, rule, T0 + i);
    // A quarter into the next window: 8 · 0.75 + 1 = 7.
    const d = await hitRateLimit(k, rule, T0 + 75_000);
    expect(d.count).toBeCloseTo(7, 9);
    expect(d.allowed).toBe(true);
    await clearRateLimit(k);
  });

  it("says how long to wait: until the estimate leaves room for one more (pure decision)", () => {
    // 10 in the previous window, 5 now, limit 10, half-way: 10·0.5 + 5 = 10 allowed; one more is over.
    expect(decide({ limit: 10, windowSeconds: 60 }, 5, 10, 30_000).allowed).toBe(true);
    const over = decide({ limit: 10, windowSeconds: 60 }, 6, 10, 30_000);
    expect(over.allowed).toBe(false);
    // Next hit allowed when 10·(1 − e) + 6 + 1 ≤ 10 → e ≥ 0.7 → 42 s into the window, 12 s from now.
    expect(over.retryAfterSeconds).toBe(12);
    // This window alone over the limit: wait into the next one until 12·(1 − e') + 1 ≤ 10.
    const full = decide({ limit: 10, windowSeconds: 60 }, 12, 0, 30_000);
    expect(full.retryAfterSeconds).toBe(30 + 15);
  });
});

it("prunes expired counters", async () => {
  const k = key("prune");
  await hitRateLimit(k, { limit: 5, windowSeconds: 1, algorithm: "fixed" }, T0);
  expect(await pruneRateLimitCounters(T0 + 10_000)).toBeGreaterThanOrEqual(1);
  const left = await db("rate_limit_counters").where("bucket_key", k).count({ n: "*" }).first();
  expect(Number(left?.n)).toBe(0);
});
