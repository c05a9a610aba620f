// npm run bench — every benchmark in one run, measured (never asserted in tests), one table:
//   1. prepares the test database (MariaDB started if needed, migrations) and the workshop
//      "bench-commissions" with 20,000 commissions (scripts/bench/commissions.ts);
//   2. builds the app into .next-bench (BENCH_SKIP_BUILD=1 reuses the last build) and serves it with
//      `next start` on loopback (BENCH_PORT, default APP_PORT + 200) beside the payments fake on the
//      next port, with a one-off BENCH_FLOOR_TOKEN so the floors (app/api/bench/**) answer there only;
//   3. loads each real route or page with autocannon against its floor, in alternating rounds after a
//      warm-up: POST /api/compute, the commission list API, the owner's overview page (a workshop of
//      500 commissions; the 20,000 one's overview is timed one request at a time), a commission's
//      page, the payment webhook (scripts/bench/{compute,commissions,pages,webhook}.ts);
//   4. weighs the first-load JavaScript (gzipped) of every main page of that build against the
//      180 kB budget (scripts/bench/first-load-js.ts, tests/http/main-pages.ts);
//   5. prints the table: p50/p95 latency, requests/s, ratio to the floor, server CPU and database
//      statements per request, first-load kB, and the machine's load (uptime) before and after.
// BENCH_ROUNDS / BENCH_ROUND_SECONDS / BENCH_WARM_UP_SECONDS change the plan (default 3 × 4 s after 5 s).
import { execFileSync } from "node:child_process";
import { randomBytes } from "node:crypto";
import { closeTestDb } from "../tests/setup/test-db";
import { prepareMainPages } from "../tests/http/main-pages";
import { benchCommissionList, bulkOwnerCookie, prepareBulkWorkshop } from "./bench/commissions";
import { benchCompute, computeInProcess } from "./bench/compute";
import { FIRST_LOAD_BUDGET_KB, weighPage } from "./bench/first-load-js";
import { BENCH_COLUMNS, benchCells, benchStripeEnv, closeBenchDb, formatTable, loadText, pointTestHelpersAt, prepareDatabase, startApp, startStripeFake, type BenchRow, type LoadPlan } from "./bench/harness";
import { benchCommissionPage, benchOverviewPage, sequentialMs } from "./bench/pages";
import { benchWebhook, preparePaidCheckout } from "./bench/webhook";

const say = (s: string) => console.log(`[bench] ${s}`);
const uptime = () => execFileSync("uptime", { encoding: "utf8" }).trim();
const num = (name: string, fallback: number) => Number(process.env[name] ?? fallback);

/** The overview page is loaded on a workshop of this size (the 20,000 one is timed alone). */
const OVERVIEW_SLUG = "bench-overview";
const OVERVIEW_COUNT = 500;

const plan: LoadPlan = { warmUpSeconds: num("BENCH_WARM_UP_SECONDS", 5), rounds: num("BENCH_ROUNDS", 3), roundSeconds: num("BENCH_ROUND_SECONDS", 4) };

interface PageRow {
  label: string;
  path: string;
  gzipKb: number;
  status: number;
}

function table(rows: BenchRow[], pages: PageRow[]): string {
  const body = [
    ...rows.map((r) => [...benchCells(r), "", r.goal ?? ""]),
    ...pages.map((p) => [
      `first load: ${p.label}`,
      ...Array<string>(7).fill(""),
      p.status === 200 ? "0" : `HTTP ${p.status}`,
      `${p.gzipKb.toFixed(1)} kB`,
      `≤ ${FIRST_LOAD_BUDGET_KB} kB: ${p.gzipKb <= FIRST_LOAD_BUDGET_KB ? "met" : "NOT met"}`,
    ]),
  ];
  return formatTable([...BENCH_COLUMNS, "first-load JS gz", "goal"], body);
}

async function main() {
  const before = uptime();
  say(`start: ${before}`);
  const inproc = computeInProcess(1000);
  say(`computeSpec in process: ${Math.round(inproc.compute).toLocaleString("en")}/s (with the zod parse ${Math.round(inproc.parseCompute).toLocaleString("en")}/s)`);
  const releaseDatabase = prepareDatabase();
  const ws = await prepareBulkWorkshop();
  const mid = await prepareBulkWorkshop(OVERVIEW_SLUG, OVERVIEW_COUNT);
  say(`workshops ${ws.slug}: ${ws.count.toLocaleString("en")} commissions, ${mid.slug}: ${mid.count} commissions`);

  const token = randomBytes(24).toString("hex");
  const fake = await startStripeFake();
  const app = await startApp({ BENCH_FLOOR_TOKEN: token, COMPUTE_RATE_LIMIT: "1000000000", ...benchStripeEnv() });
  pointTestHelpersAt(app);
  Object.assign(process.env, benchStripeEnv()); // the SDK client of the test helpers, too
  const rows: BenchRow[] = [];
  const pages: PageRow[] = [];
  const notes: string[] = [];
  try {
    const cookie = await bulkOwnerCookie(ws);
    const midCookie = await bulkOwnerCookie(mid);
    // The overview of 20,000 commissions is too slow to load with 10 connections: timed alone.
    const bigOverviewMs = await sequentialMs(`${app.base}/${ws.slug}/overview`, { cookie });
    say(`overview page of ${ws.count.toLocaleString("en")} commissions, one request at a time: median ${bigOverviewMs.toFixed(0)} ms`);
    notes.push(`overview page of ${ws.count.toLocaleString("en")} commissions, one request at a time (median of 3): ${bigOverviewMs.toFixed(0)} ms`);
    const sessionId = await preparePaidCheckout();
    say(`plan: ${plan.warmUpSeconds} s warm-up per URL, then ${plan.rounds} alternating rounds of ${plan.roundSeconds} s (${loadText()})`);
    const groups: Array<[string, () => Promise<BenchRow[]>]> = [
      ["compute", () => benchCompute(app, plan)],
      ["commission list", () => benchCommissionList(app, ws, cookie, token, plan)],
      ["overview page", () => benchOverviewPage(app, mid, midCookie, token, plan)],
      ["commission page", () => benchCommissionPage(app, ws, cookie, token, plan)],
      ["webhook", () => benchWebhook(app, sessionId, token, plan)],
    ];
    for (const [name, run] of groups) {
      rows.push(...(await run()));
      say(`${name} measured (${loadText()})`);
    }
    const fx = await prepareMainPages();
    const cache = new Map<string, Buffer>();
    for (const p of fx.pages) {
      const w = await weighPage(app.base, p.path, fx.cookieOf(p.as), cache);
      pages.push({ label: p.label, path: p.path, gzipKb: w.gzipKb, status: w.status });
    }
  } finally {
    await app.stop();
    await fake.stop();
    await closeBenchDb();
    await closeTestDb();
    releaseDatabase();
  }
  const after = uptime();
  console.log("");
  console.log(table(rows, pages));
  console.log("");
  for (const n of notes) console.log(n);
  console.log(`computeSpec in process: ${Math.round(inproc.compute)}/s (goal ≥ 20000/s); with the zod parse: ${Math.round(inproc.parseCompute)}/s`);
  console.log(`machine load before: ${before}`);
  console.log(`machine load after:  ${after}`);
}

main().catch((err) => {
  console.error(`[bench] ${err instanceof Error ? (err.stack ?? err.message) : err}`);
  process.exit(1);
});
