// The commission list's benchmark: the workshop "bench-commissions" with 20,000 commissions in the
// TEST database, the list's SQL timed alone, and GET …/commissions (a page of 50, filtered, sorted)
// as the owner against its floor, GET /api/bench/commission-list (the same SQL, no session,
// membership, settings or shaping). Used by `npm run bench:commissions` and `npm run bench`; the
// workshop also serves the overview and commission page benchmarks (pages.ts).
import { createBulkCommissionWorkshop, type BulkWorkshop } from "../../db/fixtures/bulk-commissions";
import { hashPassword } from "../../lib/auth/password";
import { commissionListQueries, stageSortLine } from "../../lib/data/commissions";
import { commissionListQuerySchema } from "../../lib/schemas/commission";
import { DEFAULT_BUILD_STAGES } from "../../lib/workflow/stages";
import { signIn } from "../../tests/http/session";
import { benchDb, met, runGroup, type BenchRow, type LoadPlan, type RunningApp } from "./harness";

export const BULK_SLUG = "bench-commissions";
export const BULK_COUNT = 20_000;
const PASSWORD = "bench-commissions-2027"; // test database only
export const LIST_QUERY = "stage=finish&sort=-updated&page=2&pageSize=50";

/** The 20,000-commission workshop, or another bulk one (made once, batch-inserted; reused while it holds that many). */
export async function prepareBulkWorkshop(slug = BULK_SLUG, count = BULK_COUNT): Promise<BulkWorkshop> {
  return createBulkCommissionWorkshop(benchDb(), { slug, count, passwordHash: await hashPassword(PASSWORD) });
}

/** The Cookie header of the bulk workshop's owner, signed in through the real credentials flow (TEST_APP_URL: pointTestHelpersAt). */
export async function bulkOwnerCookie(ws: BulkWorkshop): Promise<string> {
  const session = await signIn({ email: ws.owner.email, password: PASSWORD });
  return [...session.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
}

/** The list's count and page SQL alone, sequential, median of 50 after 10 unmeasured (ms). */
export async function listSqlAlone(ws: BulkWorkshop): Promise<{ countMs: number; pageMs: number }> {
  const knex = benchDb();
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
  return { countMs: await median(() => sql().count), pageMs: await median(() => sql().rows) };
}

/** GET …/commissions as the owner against its floor, at 20 connections (the floor needs BENCH_FLOOR_TOKEN = `token` in the app). */
export async function benchCommissionList(app: RunningApp, ws: BulkWorkshop, cookie: string, token: string, plan: LoadPlan): Promise<BenchRow[]> {
  const realUrl = `${app.base}/api/workshops/${ws.slug}/commissions?${LIST_QUERY}`;
  const floorUrl = `${app.base}/api/bench/commission-list?workshopId=${ws.id}&${LIST_QUERY}`;
  // Both answer the same page before anything is timed, and the floor is shut without its token.
  const real = (await (await fetch(realUrl, { headers: { cookie } })).json()) as { total: number; items: Array<{ id: number }> };
  const floor = (await (await fetch(floorUrl, { headers: { "x-bench-token": token } })).json()) as { total: number; rows: Array<{ id: number }> };
  if (real.total !== floor.total || real.items.map((i) => i.id).join() !== floor.rows.map((r) => r.id).join()) {
    throw new Error(`the list route and its floor disagree: ${real.total} vs ${floor.total}`);
  }
  if ((await fetch(floorUrl)).status !== 404) throw new Error("the commission-list floor answered without its token");
  return runGroup(
    app,
    {
      connections: 20,
      floor: { name: "commission list: same SQL, no auth, no shaping", url: floorUrl, headers: { "x-bench-token": token } },
      targets: [{ name: `GET …/commissions, page 2 of ${real.total} (owner)`, url: realUrl, headers: { cookie } }],
      goal: (r) => `p95 ≤ 30 ms: ${met(r.p95Ms <= 30)}; ≥ 60 % of floor: ${met((r.ratioToFloor ?? 0) >= 0.6)}`,
    },
    plan,
  );
}
