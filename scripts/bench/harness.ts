// Shared parts of the benchmark scripts: the private MariaDB, a production build served by
// `next start` on a bench port (test database), the payments fake beside it, autocannon runs with
// exact percentiles, real-against-floor comparisons in alternating rounds, and the one table.
// Benchmarks print numbers; they never pass or fail on speed.
import { spawn, spawnSync } from "node:child_process";
import { readFileSync } from "node:fs";
import { cpus, loadavg } from "node:os";
import { join } from "node:path";
import autocannon from "autocannon";
import knexFactory, { type Knex } from "knex";
import config from "../../knexfile";
import { ROOT, loadEnv } from "../env.mjs";

loadEnv();

// Each checkout has its own APP_PORT; the bench serves beside it (BENCH_APP_PORT is the older name).
export const BENCH_PORT = Number(process.env.BENCH_PORT ?? process.env.BENCH_APP_PORT ?? Number(process.env.APP_PORT ?? 3000) + 200);
export const BENCH_URL = `http://localhost:${BENCH_PORT}`;
/** The payments fake of the webhook bench listens on the next port. */
export const BENCH_STRIPE_PORT = BENCH_PORT + 1;

const NEXT_BIN = join(ROOT, "node_modules", "next", "dist", "bin", "next");

function must(cmd: string, args: string[], env: NodeJS.ProcessEnv, label: string) {
  const r = spawnSync(cmd, args, { cwd: ROOT, env, stdio: "inherit" });
  if (r.status !== 0) throw new Error(`${label} failed (${r.status ?? r.signal})`);
}

/**
 * Starts MariaDB if needed and migrates the test database (kept, not wiped). Returns a function that
 * stops MariaDB again only if this run started it, so the bench leaves the machine as it found it.
 */
export function prepareDatabase(): () => void {
  const wasRunning = spawnSync("bash", ["db/mariadb.sh", "status"], { cwd: ROOT, env: process.env, stdio: "ignore" }).status === 0;
  must("bash", ["db/mariadb.sh", "start"], process.env, "MariaDB");
  must(process.execPath, ["--import", "tsx", "db/cli.ts", "migrate"], { ...process.env, KNEX_ENV: "test" }, "migrations");
  return () => {
    if (!wasRunning) spawnSync("bash", ["db/mariadb.sh", "stop"], { cwd: ROOT, env: process.env, stdio: "inherit" });
  };
}

/** A connection to the test database for fixtures and counters (closed by closeBenchDb). */
let benchKnex: Knex | undefined;
export function benchDb(): Knex {
  benchKnex ??= knexFactory({ ...config.test, pool: { min: 0, max: 2 } });
  return benchKnex;
}
export async function closeBenchDb(): Promise<void> {
  await benchKnex?.destroy();
  benchKnex = undefined;
}

/** Statements the database server has run so far (for statements per request). */
export async function statementCount(): Promise<number> {
  const [rows] = (await benchDb().raw("SHOW GLOBAL STATUS LIKE 'Questions'")) as [Array<{ Value: string }>];
  return Number(rows[0]!.Value);
}

const appEnv = (extraEnv: Record<string, string>) => ({
  ...process.env,
  NEXT_TELEMETRY_DISABLED: "1",
  NEXT_DIST_DIR: ".next-bench",
  KNEX_ENV: "test",
  NODE_ENV: "production" as const,
  APP_PORT: String(BENCH_PORT),
  APP_URL: BENCH_URL,
  ...extraEnv,
});

/** Builds the app into .next-bench, unless BENCH_SKIP_BUILD=1 (then the last build is reused). */
export function buildApp(): void {
  if (process.env.BENCH_SKIP_BUILD === "1") return;
  console.log("[bench] building the app into .next-bench (BENCH_SKIP_BUILD=1 skips this next time)");
  must(process.execPath, [NEXT_BIN, "build"], appEnv({}), "next build");
}

export interface RunningProcess {
  pid: number | undefined;
  stop: () => Promise<void>;
}

/** Spawns a long-running child and waits until `readyUrl` answers below 500. */
async function startProcess(name: string, args: string[], env: NodeJS.ProcessEnv, readyUrl: string): Promise<RunningProcess> {
  const child = spawn(process.execPath, args, { cwd: ROOT, env, stdio: ["ignore", "ignore", "inherit"] });
  const stop = () =>
    new Promise<void>((resolve) => {
      if (child.exitCode !== null || child.signalCode !== null) return resolve();
      const killer = setTimeout(() => child.kill("SIGKILL"), 5000);
      child.once("exit", () => {
        clearTimeout(killer);
        resolve();
      });
      child.kill("SIGTERM");
    });
  const deadline = Date.now() + 90_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`${name} exited (${child.exitCode}) before it was ready`);
    try {
      if ((await fetch(readyUrl)).status < 500) break;
    } catch {
      /* starting */
    }
    if (Date.now() > deadline) {
      await stop();
      throw new Error(`${name} did not start`);
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  return { pid: child.pid, stop };
}

export interface RunningApp extends RunningProcess {
  /** http://localhost:PORT, as browsers and e-mails see it. */
  url: string;
  /** http://127.0.0.1:PORT: what load generators use (no name lookup, IPv4). */
  base: string;
}

/**
 * Serves the .next-bench build on the bench port against the test database (building it first
 * unless `build: false` or BENCH_SKIP_BUILD=1). `extraEnv` reaches only this server.
 */
export async function startApp(extraEnv: Record<string, string> = {}, opts: { build?: boolean } = {}): Promise<RunningApp> {
  if (opts.build !== false) buildApp();
  const proc = await startProcess("the bench app", [NEXT_BIN, "start", "-H", "127.0.0.1", "-p", String(BENCH_PORT)], appEnv(extraEnv), `${BENCH_URL}/api/health`);
  return { ...proc, url: BENCH_URL, base: BENCH_URL.replace("localhost", "127.0.0.1") };
}

/** The app's environment for talking to the bench's payments fake (pass to startApp). */
export const benchStripeEnv = (): Record<string, string> => ({ STRIPE_API_HOST: "127.0.0.1", STRIPE_API_PORT: String(BENCH_STRIPE_PORT), STRIPE_API_PROTOCOL: "http", FAKE_STRIPE_PORT: String(BENCH_STRIPE_PORT) });

/**
 * The payments fake (fakes/stripe) on BENCH_STRIPE_PORT, its state in .data/bench-fakes (emptied
 * first), sending its webhooks to the bench app.
 */
export async function startStripeFake(): Promise<RunningProcess & { url: string }> {
  const url = `http://127.0.0.1:${BENCH_STRIPE_PORT}`;
  const env = {
    ...process.env,
    ...benchStripeEnv(),
    FAKES_DATA_DIR: join(process.env.DATA_DIR ?? ".data", "bench-fakes"),
    STRIPE_WEBHOOK_URL: `${BENCH_URL.replace("localhost", "127.0.0.1")}/api/webhooks/stripe`,
  };
  const proc = await startProcess("the payments fake", ["--import", "tsx", "fakes/stripe/server.ts"], env, `${url}/health`);
  await fetch(`${url}/admin/reset`, { method: "POST" });
  return { ...proc, url };
}

/** The HTTP test helpers (tests/http) reach the app at TEST_APP_URL and the fake at FAKE_STRIPE_PORT: point them at the bench's. */
export function pointTestHelpersAt(app: RunningApp): void {
  process.env.TEST_APP_URL = app.url;
  process.env.FAKE_STRIPE_PORT = String(BENCH_STRIPE_PORT);
}

export function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return NaN;
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return sorted[i]!;
}

type AutocannonRequest = { method?: string; path?: string; headers?: Record<string, string>; body?: string | Buffer };

/** One URL to load: a real route or page, or its floor. */
export interface LoadTarget {
  name: string;
  url: string;
  method?: "GET" | "POST";
  headers?: Record<string, string>;
  body?: string;
  /** A fresh request per call (for bodies that must differ, e.g. webhook event ids). */
  setupRequest?: (req: AutocannonRequest) => AutocannonRequest;
  /** The status every answer should have (default: any 2xx). */
  expectStatus?: number;
}

export interface LoadResult {
  name: string;
  p50Ms: number;
  p95Ms: number;
  p99Ms: number;
  rps: number;
  requests: number;
  /** Answers with another status than expected, plus connection errors and timeouts. */
  unexpected: number;
  /** Every response time of the measured run, sorted (for merging runs). */
  timesMs: number[];
}

export interface LoadOptions extends LoadTarget {
  connections: number;
  durationSeconds?: number;
  /** Unmeasured load first (default 2 s; 0 for none). */
  warmUpSeconds?: number;
  /** Called between the warm-up and the measured run (e.g. to read counters). */
  afterWarmUp?: () => Promise<void> | void;
}

/** Runs autocannon after a short warm-up and reports exact p50/p95/p99 from every response time. */
export async function measure(o: LoadOptions): Promise<LoadResult> {
  const base = { url: o.url, connections: o.connections, method: o.method ?? "GET", headers: o.headers, body: o.body, requests: o.setupRequest ? [{ setupRequest: o.setupRequest }] : undefined };
  const warm = o.warmUpSeconds ?? 2;
  if (warm > 0) await autocannon({ ...base, duration: warm });
  await o.afterWarmUp?.();
  const times: number[] = [];
  let unexpected = 0;
  const ok = (status: number) => (o.expectStatus === undefined ? status >= 200 && status < 300 : status === o.expectStatus);
  const instance = autocannon({ ...base, duration: o.durationSeconds ?? 10 });
  instance.on("response", (_client: unknown, status: number, _bytes: number, responseTime: number) => {
    times.push(responseTime);
    if (!ok(status)) unexpected += 1;
  });
  const result = await instance;
  times.sort((a, b) => a - b);
  return {
    name: o.name,
    p50Ms: percentile(times, 50),
    p95Ms: percentile(times, 95),
    p99Ms: percentile(times, 99),
    rps: result.requests.average,
    requests: result.requests.total,
    unexpected: unexpected + result.errors + result.timeouts,
    timesMs: times,
  };
}

/** A real route or page and the floor it is compared with, loaded at the same concurrency. */
export interface BenchGroup {
  floor?: LoadTarget;
  targets: LoadTarget[];
  connections: number;
  /** The goal printed beside each target row (e.g. "p95 ≤ 30 ms, ≥ 60 % of the floor"). */
  goal?: (row: BenchRow) => string;
}

/** How long to load: an unmeasured warm-up per URL, then alternating measured rounds. */
export interface LoadPlan {
  warmUpSeconds: number;
  rounds: number;
  roundSeconds: number;
}

/** One row of the table. */
export interface BenchRow {
  name: string;
  kind: "floor" | "measured";
  connections: number;
  p50Ms: number;
  p95Ms: number;
  p99Ms: number;
  rps: number;
  requests: number;
  unexpected: number;
  cpuMsPerRequest: number;
  statementsPerRequest: number;
  /** This row's requests/s over its floor's, and the same per round. */
  ratioToFloor?: number;
  roundRatios?: number[];
  goal?: string;
}

/**
 * Loads the group's URLs on the running app: each warmed up, then `rounds` rounds in which each URL
 * in turn is measured for `roundSeconds` (so other work on the machine weighs on all alike). Returns
 * the floor's row first, then one row per target with its ratio to the floor.
 */
export async function runGroup(app: RunningApp, group: BenchGroup, plan: LoadPlan): Promise<BenchRow[]> {
  const all = [...(group.floor ? [group.floor] : []), ...group.targets];
  for (const t of all) await measure({ ...t, connections: group.connections, durationSeconds: plan.warmUpSeconds, warmUpSeconds: 0 });
  const sums = all.map(() => ({ times: [] as number[], requests: 0, seconds: 0, cpu: 0, statements: 0, unexpected: 0, rounds: [] as number[] }));
  for (let round = 1; round <= plan.rounds; round++) {
    for (const [i, t] of all.entries()) {
      let cpu0 = 0;
      let q0 = 0;
      const afterWarmUp = async () => {
        q0 = await statementCount();
        cpu0 = cpuMs(app.pid);
      };
      const r = await measure({ ...t, connections: group.connections, durationSeconds: plan.roundSeconds, warmUpSeconds: 1, afterWarmUp });
      const cpu1 = cpuMs(app.pid);
      const sum = sums[i]!;
      sum.statements += (await statementCount()) - q0 - 1; // less the counter's own statement
      sum.cpu += cpu1 - cpu0;
      sum.times.push(...r.timesMs);
      sum.requests += r.requests;
      sum.seconds += plan.roundSeconds;
      sum.unexpected += r.unexpected;
      sum.rounds.push(r.requests / plan.roundSeconds);
    }
  }
  const rows: BenchRow[] = all.map((t, i) => {
    const s = sums[i]!;
    const times = s.times.sort((a, b) => a - b);
    return {
      name: t.name,
      kind: group.floor && i === 0 ? "floor" : "measured",
      connections: group.connections,
      p50Ms: percentile(times, 50),
      p95Ms: percentile(times, 95),
      p99Ms: percentile(times, 99),
      rps: s.requests / s.seconds,
      requests: s.requests,
      unexpected: s.unexpected,
      cpuMsPerRequest: s.cpu / Math.max(1, s.requests),
      statementsPerRequest: s.statements / Math.max(1, s.requests),
    };
  });
  if (group.floor) {
    const floor = rows[0]!;
    for (const [i, row] of rows.entries()) {
      if (i === 0) continue;
      row.ratioToFloor = row.rps / floor.rps;
      row.roundRatios = sums[i]!.rounds.map((r, k) => r / sums[0]!.rounds[k]!);
    }
  }
  for (const row of rows) if (row.kind === "measured" && group.goal) row.goal = group.goal(row);
  return rows;
}

/** A Markdown table, columns padded to line up in a terminal. */
export function formatTable(header: string[], body: string[][]): string {
  const widths = header.map((h, i) => Math.max(h.length, ...body.map((b) => (b[i] ?? "").length)));
  const line = (cells: string[]) => `| ${cells.map((c, i) => (c ?? "").padEnd(widths[i]!)).join(" | ")} |`;
  return [line(header), `|${widths.map((w) => "-".repeat(w + 2)).join("|")}|`, ...body.map(line)].join("\n");
}

/** The measured columns of a row (the goal and any extra column come after). */
export const BENCH_COLUMNS = ["benchmark", "conns", "p50 ms", "p95 ms", "req/s", "vs floor", "server CPU ms/req", "DB statements/req", "failed"];

/** A latency, or "none" when no answer came within a round. */
const ms = (v: number) => (Number.isFinite(v) ? v.toFixed(1) : "none");

export function benchCells(r: BenchRow): string[] {
  return [
    r.kind === "floor" ? `  floor: ${r.name}` : r.name,
    String(r.connections),
    ms(r.p50Ms),
    ms(r.p95Ms),
    r.rps.toFixed(0),
    r.ratioToFloor === undefined || !Number.isFinite(r.ratioToFloor) ? "—" : `${(100 * r.ratioToFloor).toFixed(0)} %`,
    r.cpuMsPerRequest.toFixed(2),
    r.statementsPerRequest.toFixed(1),
    String(r.unexpected),
  ];
}

/** The one table for every benchmark: latency, throughput, cost per request and the ratio to its floor. */
export function printTable(rows: BenchRow[]): string {
  const out = formatTable([...BENCH_COLUMNS, "goal"], rows.map((r) => [...benchCells(r), r.goal ?? ""]));
  console.log(out);
  return out;
}

/** "met" / "NOT met" for a goal line. */
export const met = (ok: boolean) => (ok ? "met" : "NOT met");

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
