// npm run bench:compute — how fast the build math is, measured (never asserted in tests):
//   1. in-process computeSpec() calls per second on one core, for a fanned 8-string, 27 frets,
//      3 pickups (target ≥ 20,000/s), with and without schema parsing;
//   2. the DB rate limiter's own cost per hit (fixed and sliding window);
//   3. POST /api/compute latency p50/p95 at 10 connections against `next start` (target p95 ≤ 20 ms),
//      once with the limiter counting every request (limit set out of reach) and once with it off,
//      each against its floor: the same route refusing `{}` with 422 (scripts/bench/compute.ts).
// It starts MariaDB (db/mariadb.sh) when it is not running, builds into .next-bench (skip with
// BENCH_SKIP_BUILD=1 once built), serves on BENCH_PORT (default APP_PORT + 200) against the test
// database and stops what it started.
import { benchCompute, computeInProcess } from "./bench/compute";
import { closeBenchDb, loadText, prepareDatabase, printTable, startApp, type BenchRow } from "./bench/harness";

const say = (s: string) => console.log(`[bench] ${s}`);

async function limiterCost() {
  const { hitRateLimit, clearRateLimit } = await import("../lib/data/rate-limit");
  const { db } = await import("../db/knex");
  const out: Record<string, number> = {};
  for (const [label, exact] of [["batched", false], ["exact", true]] as const) {
    for (const algorithm of ["fixed", "sliding"] as const) {
      const key = `bench:${label}:${algorithm}:${Date.now()}`;
      const rule = { limit: 1e9, windowSeconds: 60, algorithm, exact };
      for (let i = 0; i < 50; i++) await hitRateLimit(key, rule);
      const n = exact ? 500 : 20_000;
      const t0 = performance.now();
      for (let i = 0; i < n; i++) await hitRateLimit(key, rule);
      out[`${label} ${algorithm}`] = (performance.now() - t0) / n;
      await clearRateLimit(key);
    }
  }
  await db.destroy();
  return out;
}

async function main() {
  process.env.KNEX_ENV = "test"; // the limiter's counters go to the test database, like the bench app's
  say(`start: ${loadText()}`);
  const inproc = computeInProcess();
  say(`in-process, fanned 8-string / 27 frets / 3 pickups: ${Math.round(inproc.compute).toLocaleString("en")} computeSpec/s, ${Math.round(inproc.parseCompute).toLocaleString("en")} parse+compute/s (result ${inproc.resultBytes} bytes of JSON)`);
  const releaseDatabase = prepareDatabase();
  const cost = await limiterCost();
  const costText = Object.entries(cost).map(([k, v]) => `${k} ${v.toFixed(3)} ms`).join(", ");
  say(`rate limiter, mean time per hit, sequential, against MariaDB: ${costText}`);

  const rows: BenchRow[] = [];
  for (const [label, limit] of [[", limiter on (every request counted)", "1000000000"], [", limiter off", "0"]] as const) {
    const app = await startApp({ COMPUTE_RATE_LIMIT: limit }, { build: rows.length === 0 });
    try {
      rows.push(...(await benchCompute(app, { warmUpSeconds: 3, rounds: 2, roundSeconds: 5 }, label)));
      say(`measured${label} (${loadText()})`);
    } finally {
      await app.stop();
    }
  }
  await closeBenchDb();
  releaseDatabase();
  say(`summary (${loadText()}):`);
  console.log(`  computeSpec in process: ${Math.round(inproc.compute)}/s (target ≥ 20000/s); with zod parse: ${Math.round(inproc.parseCompute)}/s`);
  console.log(`  limiter per hit: ${costText}`);
  printTable(rows);
}

main().catch((err) => {
  console.error(`[bench] ${err instanceof Error ? err.message : err}`);
  process.exit(1);
});
