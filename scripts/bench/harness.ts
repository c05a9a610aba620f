// Shared parts of the benchmark scripts: the private MariaDB, a production build served by
// `next start` on a bench port (test database), autocannon runs with exact percentiles, and one
// table format. Benchmarks print numbers; they never pass or fail on speed.
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { readFileSync } from "node:fs";
import { cpus, loadavg } from "node:os";
import { join } from "node:path";
import autocannon from "autocannon";
import { ROOT, loadEnv } from "../env.mjs";

loadEnv();

// Each checkout has its own APP_PORT; the bench serves beside it (BENCH_APP_PORT is the older name).
export const BENCH_PORT = Number(process.env.BENCH_PORT ?? process.env.BENCH_APP_PORT ?? Number(process.env.APP_PORT ?? 3000) + 200);
export const BENCH_URL = `http://localhost:${BENCH_PORT}`;

function must(cmd: string, args: string[], env: NodeJS.ProcessEnv, label: string) {
  const r = spawnSync(cmd, args, { cwd: ROOT, env, stdio: "inherit" });
  if (r.status !== 0) throw new Error(`${label} failed (${r.status ?? r.signal})`);
}

/** Starts MariaDB if needed and migrates the test database (kept, not wiped). */
export function prepareDatabase(): void {
  must("bash", ["db/mariadb.sh", "start"], process.env, "MariaDB");
  must(process.execPath, ["--import", "tsx", "db/cli.ts", "migrate"], { ...process.env, KNEX_ENV: "test" }, "migrations");
}

export interface RunningApp {
  url: string;
  /** The `next start` process, for reading its CPU time. */
  pid: number | undefined;
  stop: () => Promise<void>;
}

/** Builds into .next-bench (unless BENCH_SKIP_BUILD=1) and serves it on the bench port against the test database. */
export async function startApp(extraEnv: Record<string, string> = {}): Promise<RunningApp> {
  const env = {
    ...process.env,
    NEXT_TELEMETRY_DISABLED: "1",
    NEXT_DIST_DIR: ".next-bench",
    KNEX_ENV: "test",
    NODE_ENV: "production",
    APP_PORT: String(BENCH_PORT),
    APP_URL: BENCH_URL,
    ...extraEnv,
  };
  const next = join(ROOT, "node_modules", "next", "dist", "bin", "next");
  if (process.env.BENCH_SKIP_BUILD !== "1") must(process.execPath, [next, "build"], env, "next build");
  const child: ChildProcess = spawn(process.execPath, [next, "start", "-H", "127.0.0.1", "-p", String(BENCH_PORT)], { cwd: ROOT, env, stdio: ["ignore", "ignore", "inherit"] });
  const deadline = Date.now() + 60_000;
  for (;;) {
    try {
      if ((await fetch(`${BENCH_URL}/api/health`)).ok) break;
    } catch {
      /* starting */
    }
    if (Date.now() > deadline) throw new Error("bench app did not start");
    await new Promise((r) => setTimeout(r, 200));
  }
  return {
    url: BENCH_URL,
    pid: child.pid,
    stop: () =>
      new Promise((resolve) => {
        child.once("exit", () => resolve());
        child.kill("SIGTERM");
      }),
  };
}

export interface LoadResult {
  name: string;
  p50Ms: number;
  p95Ms: number;
  p99Ms: number;
  rps: number;
  requests: number;
  non2xx: number;
  errors: number;
  /** Every response time of the measured run, sorted (for merging runs). */
  timesMs: number[];
}

export function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return NaN;
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return sorted[i]!;
}

export interface LoadOptions {
  name: string;
  url: string;
  connections: number;
  durationSeconds?: number;
  method?: "GET" | "POST";
  headers?: Record<string, string>;
  body?: string;
  /** Called between the warm-up and the measured run (e.g. to read counters). */
  afterWarmUp?: () => Promise<void> | void;
  /** A fresh request per call (for bodies that must differ, e.g. webhook event ids). */
  setupRequest?: (req: { method?: string; path?: string; headers?: Record<string, string>; body?: string | Buffer }) => typeof req;
}

/** Runs autocannon after a short warm-up and reports exact p50/p95/p99 from every response time. */
export async function measure(o: LoadOptions): Promise<LoadResult> {
  const base = { url: o.url, connections: o.connections, method: o.method ?? "GET", headers: o.headers, body: o.body };
  await autocannon({ ...base, duration: 2, requests: o.setupRequest ? [{ setupRequest: o.setupRequest }] : undefined });
  await o.afterWarmUp?.();
  const times: number[] = [];
  const instance = autocannon({
    ...base,
    duration: o.durationSeconds ?? 10,
    requests: o.setupRequest ? [{ setupRequest: o.setupRequest }] : undefined,
  });
  instance.on("response", (_client: unknown, _status: number, _bytes: number, responseTime: number) => times.push(responseTime));
  const result = await instance;
  times.sort((a, b) => a - b);
  return {
    name: o.name,
    p50Ms: percentile(times, 50),
    p95Ms: percentile(times, 95),
    p99Ms: percentile(times, 99),
    rps: result.requests.average,
    requests: result.requests.total,
    non2xx: result.non2xx,
    errors: result.errors + result.timeouts,
    timesMs: times,
  };
}

/** One table for every benchmark: latency, throughput and the ratio to a floor measured in the same run. */
export function printTable(rows: Array<LoadResult & { floor?: LoadResult; target?: string }>): string {
  const header = ["benchmark", "p50 ms", "p95 ms", "req/s", "floor req/s", "ratio to floor", "non-2xx", "target"];
  const body = rows.map((r) => [
    r.name,
    r.p50Ms.toFixed(2),
    r.p95Ms.toFixed(2),
    r.rps.toFixed(0),
    r.floor ? r.floor.rps.toFixed(0) : "—",
    r.floor ? `${((100 * r.rps) / r.floor.rps).toFixed(0)} %` : "—",
    String(r.non2xx + r.errors),
    r.target ?? "",
  ]);
  const widths = header.map((h, i) => Math.max(h.length, ...body.map((b) => b[i]!.length)));
  const line = (cells: string[]) => `| ${cells.map((c, i) => c.padEnd(widths[i]!)).join(" | ")} |`;
  const out = [line(header), `|${widths.map((w) => "-".repeat(w + 2)).join("|")}|`, ...body.map(line)].join("\n");
  console.log(out);
  return out;
}

/** Other work on the machine moves the figures: the load to print beside them. */
export const loadText = () => `load ${loadavg()[0]!.toFixed(2)} on ${cpus().length} cores`;

/** CPU time (user + system, ms) a process has used so far, from /proc (Linux). */
export function cpuMs(pid: number | undefined): number {
  try {
    const fields = readFileSync(`/proc/${pid}/stat`, "utf8").split(") ")[1]!.split(" ");
    return ((Number(fields[11]) + Number(fields[12])) * 1000) / 100; // clock ticks at USER_HZ = 100
  } catch {
    return Number.NaN;
  }
}
