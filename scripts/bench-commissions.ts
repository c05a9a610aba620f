// npm run bench:commissions — the commission list under load, measured (never asserted in tests):
//   1. seeds the workshop "bench-commissions" with 20,000 commissions into the TEST database (batch
//      inserts; reused when it is already there);
//   2. serves the app with `next start` on BENCH_PORT (build in .next-bench; BENCH_SKIP_BUILD=1 reuses
//      it), with a one-off BENCH_FLOOR_TOKEN so that the floor route answers in this server only;
//   3. signs in as the workshop's owner, loads both for 17 s to warm the server up, then measures, at
//      20 connections, in 5 alternating rounds of 5 s,
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
import { cpuMs, loadText, measure, percentile, prepareDatabase, startApp, type LoadResult } from "./bench/harness";

const COUNT = 20_000;
const SLUG = "bench-commissions";
const PASSWORD = "bench-commissions-2027"; // test database only
const CONNECTIONS = 20;
const ROUNDS = 5;
const ROUND_SECONDS = 5;
const WARM_UP_SECONDS = 15;
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
  const sql = () => commissionListQueries(knex, knex("commissions as c").where("c.workshop_id", ws.id), query, { workshopId: ws.id, stageColumn: "c.stage", line: stageSortLine(DEFAULT_BUILD_STAGES) });
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

    // The two alternate in short rounds, so that other work on the machine weighs on both alike.
    const targets: Array<{ name: string; url: string; headers: Record<string, string> }> = [
      { name: "floor: same SQL, no auth, no shaping", url: floorUrl, headers: { "x-bench-token": token } },
      { name: "GET …/commissions as the owner", url: realUrl, headers: { cookie } },
    ];
    // A freshly started server keeps getting faster for half a minute (the JIT): load both first.
    for (const t of targets) await measure({ name: t.name, url: t.url, connections: CONNECTIONS, durationSeconds: WARM_UP_SECONDS, headers: t.headers });
    say(`warmed up: ${WARM_UP_SECONDS + 2} s of load on each (${loadText()})`);
    const totals = targets.map((t) => ({ name: t.name, times: [] as number[], requests: 0, seconds: 0, cpu: 0, stmts: 0, failed: 0, rounds: [] as number[] }));
    for (let round = 1; round <= ROUNDS; round++) {
      for (const [i, t] of targets.entries()) {
        let cpu0 = 0;
        let q0 = 0;
        const afterWarmUp = async () => {
          q0 = await statements();
          cpu0 = cpuMs(app.pid);
        };
        const r: LoadResult = await measure({ name: t.name, url: t.url, connections: CONNECTIONS, durationSeconds: ROUND_SECONDS, headers: t.headers, afterWarmUp });
        const sum = totals[i]!;
        sum.cpu += cpuMs(app.pid) - cpu0;
        sum.stmts += (await statements()) - q0 - 1;
        sum.times.push(...r.timesMs);
        sum.requests += r.requests;
        sum.seconds += ROUND_SECONDS;
        sum.failed += r.non2xx + r.errors;
        sum.rounds.push(r.requests / ROUND_SECONDS);
        say(`round ${round}, ${t.name}: p95 ${r.p95Ms.toFixed(1)} ms, ${(r.requests / ROUND_SECONDS).toFixed(0)} req/s (${loadText()})`);
      }
    }
    const rows = totals.map((x) => {
      const times = x.times.sort((a, b) => a - b);
      return { ...x, p50: percentile(times, 50), p95: percentile(times, 95), p99: percentile(times, 99), rps: x.requests / x.seconds };
    });
    const [f, m] = rows as [(typeof rows)[0], (typeof rows)[0]];
    const ratio = m.rps / f.rps;
    say(`summary: ${CONNECTIONS} connections, ${ROUNDS} alternating rounds of ${ROUND_SECONDS} s each (each after 2 s unmeasured); server CPU and database statements per request (${loadText()}):`);
    console.log("| run | p50 ms | p95 ms | p99 ms | req/s | server CPU ms | DB statements | failed |");
    console.log("|---|---|---|---|---|---|---|---|");
    for (const x of rows) {
      console.log(`| ${x.name} | ${x.p50.toFixed(1)} | ${x.p95.toFixed(1)} | ${x.p99.toFixed(1)} | ${x.rps.toFixed(0)} | ${(x.cpu / x.requests).toFixed(2)} | ${(x.stmts / x.requests).toFixed(1)} | ${x.failed} |`);
    }
    console.log(`  SQL alone: count ${sqlCount.toFixed(2)} ms, page ${sqlPage.toFixed(2)} ms`);
    console.log(`  ratio per round: ${m.rounds.map((r, k) => `${((100 * r) / f.rounds[k]!).toFixed(0)} %`).join(", ")}`);
    console.log(`  p95 ${m.p95.toFixed(1)} ms (target ≤ 30 ms: ${m.p95 <= 30 ? "met" : "NOT met"}); ${(100 * ratio).toFixed(0)} % of the floor's requests/s (target ≥ 60 %: ${ratio >= 0.6 ? "met" : "NOT met"})`);
  } finally {
    await app.stop();
    await knex.destroy();
  }
}

main().catch((err) => {
  console.error(`[bench] ${err instanceof Error ? err.message : err}`);
  process.exit(1);
});
