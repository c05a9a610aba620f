// npm run bench:commissions — the commission list under load, measured (never asserted in tests):
//   1. seeds the workshop "bench-commissions" with 20,000 commissions into the TEST database (batch
//      inserts; reused when it is already there) and times the list's SQL alone;
//   2. serves the app with `next start` on BENCH_PORT (build in .next-bench; BENCH_SKIP_BUILD=1 reuses
//      it), with a one-off BENCH_FLOOR_TOKEN so that the floor route answers in this server only;
//   3. signs in as the workshop's owner, loads both for 17 s to warm the server up, then measures, at
//      20 connections, in 5 alternating rounds of 5 s, GET /api/workshops/bench-commissions/commissions
//      (a page of 50, filtered, sorted) and its floor GET /api/bench/commission-list (scripts/bench/commissions.ts);
//   4. prints p50/p95, requests/s, server CPU and database statements per request, the ratio to
//      the floor per round and the targets: p95 ≤ 30 ms and at least 60 % of the floor's requests/s.
import { randomBytes } from "node:crypto";
import { closeTestDb } from "../tests/setup/test-db";
import { benchCommissionList, bulkOwnerCookie, listSqlAlone, prepareBulkWorkshop } from "./bench/commissions";
import { closeBenchDb, loadText, pointTestHelpersAt, prepareDatabase, printTable, startApp } from "./bench/harness";

const say = (s: string) => console.log(`[bench] ${s}`);

async function main() {
  say(`start: ${loadText()}`);
  const releaseDatabase = prepareDatabase();
  const t0 = performance.now();
  const ws = await prepareBulkWorkshop();
  say(`workshop ${ws.slug}: ${ws.count.toLocaleString("en")} commissions ready in ${((performance.now() - t0) / 1000).toFixed(1)} s`);
  const sql = await listSqlAlone(ws);
  say(`SQL alone, sequential, median of 50: count ${sql.countMs.toFixed(2)} ms, page ${sql.pageMs.toFixed(2)} ms (${loadText()})`);

  const token = randomBytes(24).toString("hex");
  const app = await startApp({ BENCH_FLOOR_TOKEN: token });
  pointTestHelpersAt(app);
  try {
    const cookie = await bulkOwnerCookie(ws);
    const rows = await benchCommissionList(app, ws, cookie, token, { warmUpSeconds: 17, rounds: 5, roundSeconds: 5 });
    say(`summary: 5 alternating rounds of 5 s each (each after 1 s unmeasured); server CPU and database statements per request (${loadText()}):`);
    printTable(rows);
    console.log(`  SQL alone: count ${sql.countMs.toFixed(2)} ms, page ${sql.pageMs.toFixed(2)} ms`);
    console.log(`  ratio to the floor per round: ${rows[1]!.roundRatios!.map((r) => `${(100 * r).toFixed(0)} %`).join(", ")}`);
  } finally {
    await app.stop();
    await closeBenchDb();
    await closeTestDb();
    releaseDatabase();
  }
}

main().catch((err) => {
  console.error(`[bench] ${err instanceof Error ? err.message : err}`);
  process.exit(1);
});
