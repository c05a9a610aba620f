// npm run bench:compute — how fast the build math is, measured (never asserted in tests):
//   1. in-process computeSpec() calls per second on one core, for a fanned 8-string, 27 frets,
//      3 pickups (target ≥ 20,000/s), with and without schema parsing;
//   2. the DB rate limiter's own cost per hit (fixed and sliding window);
//   3. POST /api/compute latency p50/p95 at 10 connections against `next start` (target p95 ≤ 20 ms),
//      once with the limiter counting every request (limit set out of reach) and once with it off.
// It starts MariaDB (db/mariadb.sh) when it is not running, builds into .next-bench (skip with
// BENCH_SKIP_BUILD=1 once built), serves on BENCH_PORT (default APP_PORT + 200) and stops what it started.
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { join } from "node:path";
import autocannon from "autocannon";
import { cpuMs, loadText } from "./bench/harness";
import { ROOT, loadEnv } from "./env.mjs";

const env = loadEnv();
const say = (s: string) => console.log(`[bench] ${s}`);
const load1 = loadText;

async function inProcess() {
  const { computeSpec } = await import("../lib/lutherie/compute-spec");
  const { presetById } = await import("../lib/lutherie/presets");
  const { instrumentSpecSchema } = await import("../lib/schemas/instrument-spec");
  const raw = presetById("fanned-eight").spec;
  const spec = instrumentSpecSchema.parse(raw);
  const rate = (fn: () => void, ms: number) => {
    let n = 0;
    const t0 = performance.now();
    while (performance.now() - t0 < ms) {
      for (let i = 0; i < 100; i++) fn();
      n += 100;
    }
    return (n * 1000) / (performance.now() - t0);
  };
  rate(() => computeSpec(spec), 1500); // warm up the JIT
  const compute = [0, 1, 2].map(() => rate(() => computeSpec(spec), 2000)).sort((a, b) => a - b)[1]!;
  rate(() => computeSpec(instrumentSpecSchema.parse(raw)), 1000);
  const parseCompute = [0, 1, 2].map(() => rate(() => computeSpec(instrumentSpecSchema.parse(raw)), 2000)).sort((a, b) => a - b)[1]!;
  return { compute, parseCompute, bytes: JSON.stringify(computeSpec(spec)).length, body: JSON.stringify(raw) };
}

function run(cmd: string, args: string[], extra: Record<string, string> = {}) {
  const r = spawnSync(cmd, args, { cwd: ROOT, env: { ...process.env, ...extra }, stdio: "inherit" });
  if (r.status !== 0) throw new Error(`${cmd} ${args.join(" ")} failed (${r.status})`);
}

async function waitFor(url: string, ms = 60_000) {
  const end = Date.now() + ms;
  while (Date.now() < end) {
    try {
      if ((await fetch(url)).status < 500) return;
    } catch {
      /* not yet */
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`${url} did not answer`);
}

function startServer(port: number, limit: string): ChildProcess {
  const next = join(ROOT, "node_modules", "next", "dist", "bin", "next");
  return spawn(process.execPath, [next, "start", "-H", "127.0.0.1", "-p", String(port)], {
    cwd: ROOT,
    env: { ...process.env, NODE_ENV: "production", KNEX_ENV: "development", NEXT_DIST_DIR: ".next-bench", COMPUTE_RATE_LIMIT: limit, NEXT_TELEMETRY_DISABLED: "1" },
    stdio: ["ignore", "ignore", "inherit"],
  });
}

async function stopServer(child: ChildProcess) {
  if (child.exitCode !== null) return;
  const gone = new Promise((r) => child.once("exit", r));
  child.kill("SIGTERM");
  await Promise.race([gone, new Promise((r) => setTimeout(r, 5000))]);
  if (child.exitCode === null) child.kill("SIGKILL");
}

function percentile(sorted: number[], p: number) {
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]!;
}

async function load(url: string, body: string, seconds: number) {
  const times: number[] = [];
  const statuses = new Map<number, number>();
  const instance = autocannon({ url, method: "POST", connections: 10, duration: seconds, headers: { "content-type": "application/json" }, body });
  instance.on("response", (_c: unknown, status: number, _b: number, ms: number) => {
    times.push(ms);
    statuses.set(status, (statuses.get(status) ?? 0) + 1);
  });
  const result = await instance;
  times.sort((a, b) => a - b);
  return { p50: percentile(times, 50), p95: percentile(times, 95), p99: percentile(times, 99), rps: result.requests.average, statuses: Object.fromEntries(statuses) };
}

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
  say(`start: ${load1()}`);
  const inproc = await inProcess();
  say(`in-process, fanned 8-string / 27 frets / 3 pickups: ${Math.round(inproc.compute).toLocaleString("en")} computeSpec/s, ${Math.round(inproc.parseCompute).toLocaleString("en")} parse+compute/s (result ${inproc.bytes} bytes of JSON)`);

  const dbWasUp = spawnSync("bash", ["db/mariadb.sh", "status"], { cwd: ROOT, env: process.env, stdio: "ignore" }).status === 0;
  run("bash", ["db/mariadb.sh", "start"]);
  const port = Number(process.env.BENCH_PORT ?? Number(env.APP_PORT ?? 3000) + 200);
  try {
    run(process.execPath, ["--import", "tsx", "db/cli.ts", "migrate"], { KNEX_ENV: "development" });
    const cost = await limiterCost();
    const costText = Object.entries(cost).map(([k, v]) => `${k} ${v.toFixed(3)} ms`).join(", ");
    say(`rate limiter, mean time per hit, sequential, against MariaDB: ${costText}`);

    if (process.env.BENCH_SKIP_BUILD !== "1") {
      say("building the app into .next-bench (BENCH_SKIP_BUILD=1 skips this next time)");
      run(process.execPath, [join(ROOT, "node_modules", "next", "dist", "bin", "next"), "build"], { NODE_ENV: "production", NEXT_DIST_DIR: ".next-bench", NEXT_TELEMETRY_DISABLED: "1" });
    }
    const url = `http://127.0.0.1:${port}/api/compute`;
    const rows: string[] = [];
    const runs = [
      ["limiter on (every request counted)", "1000000000", inproc.body],
      ["limiter off", "0", inproc.body],
      ["framework baseline: body {} → 422, limiter off", "0", "{}"],
    ] as const;
    for (const [label, limit, body] of runs) {
      const server = startServer(port, limit);
      try {
        await waitFor(`http://127.0.0.1:${port}/api/health`);
        await load(url, body, 3); // warm-up
        const before = load1();
        const cpu0 = cpuMs(server.pid);
        const r = await load(url, body, 10);
        const requests = Object.values(r.statuses).reduce((a, b) => a + b, 0);
        const cpuPerRequest = (cpuMs(server.pid) - cpu0) / requests;
        const line =
          `POST /api/compute, 10 connections, 10 s, ${label}: p50 ${r.p50.toFixed(2)} ms, p95 ${r.p95.toFixed(2)} ms, p99 ${r.p99.toFixed(2)} ms, ` +
          `${Math.round(r.rps)} req/s, server CPU ${cpuPerRequest.toFixed(2)} ms/request, statuses ${JSON.stringify(r.statuses)} (${before} before, ${load1()} after)`;
        say(line);
        rows.push(line);
      } finally {
        await stopServer(server);
      }
    }
    say("summary:");
    console.log(`  computeSpec in process: ${Math.round(inproc.compute)}/s (target ≥ 20000/s); with zod parse: ${Math.round(inproc.parseCompute)}/s`);
    console.log(`  limiter per hit: ${costText}`);
    for (const r of rows) console.log(`  ${r}`);
  } finally {
    if (!dbWasUp) run("bash", ["db/mariadb.sh", "stop"]);
  }
}

main().catch((err) => {
  console.error(`[bench] ${err instanceof Error ? err.message : err}`);
  process.exit(1);
});
