// npm run bench:commissions — the commission list under load, measured (never asserted in tests):
//   1. seeds the workshop "bench-commissions" with 20,000 commissions into the TEST database (batch
//      inserts; reused when it is already there);
//   2. serves the app with `next start` on BENCH_PORT (build in .next-bench; BENCH_SKIP_BUILD=1 reuses
//      it), with a one-off BENCH_FLOOR_TOKEN so that the floor route answers in this server only;
//   3. signs in as the workshop's owner and measures, at 20 connections for 10 s each,
//      GET /api/workshops/bench-commissions/commissions?<LIST_QUERY> (a page of 50, filtered, sorted)
//      and the floor: GET /api/bench/commission-list with the same query — the same SQL with no
//      session, membership, settings or shaping;
//   4. prints p50/p95/p99, requests/s, server CPU and database statements per request, the ratio to
//      the floor and the targets: p95 ≤ 30 ms and at least 60 % of the floor's requests/s.
import { randomBytes } from "node:crypto";
import knexFactory from "knex";
import config from "../knexfile";
import { hashPassword } from "../lib/auth/password";
import { createBulkCommissionWorkshop } from "../db/fixtures/bulk-commissions";
import { commissionListQueries, stageSortLine } from "../lib/data/commissions";
import { commissionListQuerySchema } from "../lib/schemas/commission";
import { DEFAULT_BUILD_STAGES } from "../lib/workflow/stages";
import { cpuMs, loadText, measure, prepareDatabase, startApp, type LoadResult } from "./bench/harness";

const COUNT = 20_000;
const SLUG = "bench-commissions";
const PASSWORD = "bench-commissions-2027"; // test database only
const CONNECTIONS = 20;
const LIST_QUERY = "stage=finish&sort=-updated&page=2&pageSize=50";
const say = (s: string) => console.log(`[bench] ${s}`);

/** Signs in through the real credentials flow and returns the Cookie header of the session. */
async function signIn(base: string, email: string, password: string): Promise<string> {
  const jar = new Map<string, string>();
  const keep = (res: Response) => {
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const eq = pair!.indexOf("=");
      jar.set(pair!.slice(0, eq), pair!.slice(eq + 1));
    }
  };
  const cookie = () => [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
  const csrf = await fetch(`${base}/api/auth/csrf`);
  keep(csrf);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: cookie() },
    body: new URLSearchParams({ csrfToken, email, password, callbackUrl: `${base}/workshops` }),
  });
  keep(res);
  if (![...jar.keys()].some((k) => k.endsWith("authjs.session-token"))) throw new Error(`sign-in as ${email} failed (${res.status})`);
  return cookie();
}

async function main() {
  say(`start: ${loadText()}`);
  prepareDatabase();
  const knex = knexFactory({ ...config.test, pool: { min: 0, max: 2 } });
  const statements = async () => Number(((await knex.raw("SHOW GLOBAL STATUS LIKE 'Questions'")) as [Array<{ Value: string }>])[0][0]!.Value);
  const t0 = performance.now();
  const ws = await createBulkCommissionWorkshop(knex, { slug: SLUG, count: COUNT, passwordHash: await hashPassword(PASSWORD) });
  say(`workshop ${SLUG}: ${COUNT.toLocaleString("en")} commissions ready in ${((performance.now() - t0) / 1000).toFixed(1)} s`);

  // The SQL alone, one query at a time, before any HTTP: what the database itself costs.
  const query = commissionListQuerySchema.parse(Object.fromEntries(new URLSearchParams(LIST_QUERY)));
  const sql = () => commissionListQueries(knex, knex("commissions as c").where("c.workshop_id", ws.id), query, { stageColumn: "c.stage", line: stageSortLine(DEFAULT_BUILD_STAGES) });
  const median = async (run: () => PromiseLike<unknown>) => {
    const times: number[] = [];
    for (let i = 0; i < 60; i++) {
      const t = performance.now();
      await run();
      if (i >= 10) times.push(performance.now() - t);
    }
    return times.sort((x, y) => x - y)[times.length >> 1]!;
  };
  const sqlCount = await median(() => sql().count);
  const sqlPage = await median(() => sql().rows);
  say(`SQL alone, sequential, median of 50: count ${sqlCount.toFixed(2)} ms, page ${sqlPage.toFixed(2)} ms (${loadText()})`);

  const token = randomBytes(24).toString("hex");
  const app = await startApp({ BENCH_FLOOR_TOKEN: token });
  const base = app.url.replace("localhost", "127.0.0.1");
  try {
    const cookie = await signIn(base, ws.owner.email, PASSWORD);
    const realUrl = `${base}/api/workshops/${SLUG}/commissions?${LIST_QUERY}`;
    const floorUrl = `${base}/api/bench/commission-list?workshopId=${ws.id}&${LIST_QUERY}`;
    // Both answer the same page before anything is timed.
    const real = (await (await fetch(realUrl, { headers: { cookie } })).json()) as { total: number; items: Array<{ id: number }> };
    const floor = (await (await fetch(floorUrl, { headers: { "x-bench-token": token } })).json()) as { total: number; rows: Array<{ id: number }> };
    if (real.total !== floor.total || real.items.map((i) => i.id).join() !== floor.rows.map((r) => r.id).join()) {
      throw new Error(`the route and the floor disagree: ${real.total} vs ${floor.total}`);
    }
    if ((await fetch(floorUrl)).status !== 404) throw new Error("the floor route answered without its token");
    say(`page 2 of ${real.total} commissions in stage "finish", 50 a page, newest first`);

    const runs: Array<{ r: LoadResult; cpu: number; stmts: number; load: string }> = [];
    for (const [name, url, headers] of [
      ["floor: same SQL, no auth, no shaping", floorUrl, { "x-bench-token": token }],
      ["GET …/commissions as the owner", realUrl, { cookie }],
    ] as const) {
      let cpu0 = 0;
      let q0 = 0;
      const afterWarmUp = async () => {
        q0 = await statements();
        cpu0 = cpuMs(app.pid);
      };
      const r = await measure({ name, url, connections: CONNECTIONS, durationSeconds: 10, headers, afterWarmUp });
      runs.push({ r, cpu: (cpuMs(app.pid) - cpu0) / r.requests, stmts: ((await statements()) - q0 - 1) / r.requests, load: loadText() });
      say(`${name}: p50 ${r.p50Ms.toFixed(1)} ms, p95 ${r.p95Ms.toFixed(1)} ms, p99 ${r.p99Ms.toFixed(1)} ms, ${r.rps.toFixed(0)} req/s, non-2xx ${r.non2xx + r.errors} (${loadText()})`);
    }
    const [f, m] = runs as [(typeof runs)[0], (typeof runs)[0]];
    const ratio = m.r.rps / f.r.rps;
    say("summary (20 connections, 10 s each after a 2 s warm-up; server CPU and database statements per request):");
    console.log("| run | p50 ms | p95 ms | p99 ms | req/s | server CPU ms | DB statements | load |");
    console.log("|---|---|---|---|---|---|---|---|");
    for (const x of [f, m]) {
      console.log(`| ${x.r.name} | ${x.r.p50Ms.toFixed(1)} | ${x.r.p95Ms.toFixed(1)} | ${x.r.p99Ms.toFixed(1)} | ${x.r.rps.toFixed(0)} | ${x.cpu.toFixed(2)} | ${x.stmts.toFixed(1)} | ${x.load} |`);
    }
    console.log(`  SQL alone: count ${sqlCount.toFixed(2)} ms, page ${sqlPage.toFixed(2)} ms`);
    console.log(`  p95 ${m.r.p95Ms.toFixed(1)} ms (target ≤ 30 ms: ${m.r.p95Ms <= 30 ? "met" : "NOT met"}); ${(100 * ratio).toFixed(0)} % of the floor's requests/s (target ≥ 60 %: ${ratio >= 0.6 ? "met" : "NOT met"})`);
  } finally {
    await app.stop();
    await knex.destroy();
  }
}

main().catch((err) => {
  console.error(`[bench] ${err instanceof Error ? err.message : err}`);
  process.exit(1);
});
