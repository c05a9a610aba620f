// The dashboard pages' benchmarks on bulk workshops (commissions.ts): the owner's overview page (on
// a workshop of 500 commissions) and a commission's page (in the 20,000-commission workshop), each
// as server-rendered HTML for the signed-in owner,
// against its floor, the same data functions as the workshop's owner with no session, membership
// check or rendering (GET /api/bench/overview, GET /api/bench/commission-summary). Used by `npm run bench`.
import type { BulkWorkshop } from "../../db/fixtures/bulk-commissions";
import { benchDb, met, runGroup, type BenchRow, type LoadPlan, type RunningApp } from "./harness";

/** GET /{slug}/overview as the owner against its floor, at 10 connections. */
export async function benchOverviewPage(app: RunningApp, ws: BulkWorkshop, cookie: string, token: string, plan: LoadPlan): Promise<BenchRow[]> {
  const pageUrl = `${app.base}/${ws.slug}/overview`;
  const floorUrl = `${app.base}/api/bench/overview?workshopId=${ws.id}`;
  await expectAnswers(pageUrl, { cookie }, floorUrl, token);
  return runGroup(
    app,
    {
      connections: 10,
      floor: { name: "overview: same data functions, no auth, no rendering", url: floorUrl, headers: { "x-bench-token": token } },
      targets: [{ name: `GET /${ws.slug}/overview, HTML (owner)`, url: pageUrl, headers: { cookie } }],
      goal: (r) => `p95 ≤ 250 ms: ${met(r.p95Ms <= 250)}`,
    },
    plan,
  );
}

/** GET /{slug}/commissions/{id} (the commission's overview tab) as the owner against its floor, at 10 connections. */
export async function benchCommissionPage(app: RunningApp, ws: BulkWorkshop, cookie: string, token: string, plan: LoadPlan): Promise<BenchRow[]> {
  const row = (await benchDb()("commissions").where({ workshop_id: ws.id }).orderBy("id", "desc").first("id")) as { id: number } | undefined;
  if (!row) throw new Error(`workshop ${ws.slug} has no commissions`);
  const pageUrl = `${app.base}/${ws.slug}/commissions/${row.id}`;
  const floorUrl = `${app.base}/api/bench/commission-summary?workshopId=${ws.id}&id=${row.id}`;
  await expectAnswers(pageUrl, { cookie }, floorUrl, token);
  return runGroup(
    app,
    {
      connections: 10,
      floor: { name: "commission page: its summary read, no auth, no rendering", url: floorUrl, headers: { "x-bench-token": token } },
      targets: [{ name: `GET /${ws.slug}/commissions/:id, HTML (owner)`, url: pageUrl, headers: { cookie } }],
      goal: (r) => `p95 ≤ 150 ms: ${met(r.p95Ms <= 150)}`,
    },
    plan,
  );
}

/** One request at a time, after one unmeasured: the median of `n` (ms), for pages too slow to load with autocannon. */
export async function sequentialMs(url: string, headers: Record<string, string>, n = 3): Promise<number> {
  const once = async () => {
    const t = performance.now();
    const res = await fetch(url, { headers, redirect: "manual" });
    await res.arrayBuffer();
    if (res.status !== 200) throw new Error(`${url} answered ${res.status}`);
    return performance.now() - t;
  };
  await once();
  const times: number[] = [];
  for (let i = 0; i < n; i++) times.push(await once());
  return times.sort((a, b) => a - b)[n >> 1]!;
}

/** Both answer 200 before anything is timed, and the floor is shut without its token. */
async function expectAnswers(pageUrl: string, pageHeaders: Record<string, string>, floorUrl: string, token: string): Promise<void> {
  const page = await fetch(pageUrl, { headers: pageHeaders, redirect: "manual" });
  if (page.status !== 200) throw new Error(`${pageUrl} answered ${page.status}`);
  const floor = await fetch(floorUrl, { headers: { "x-bench-token": token } });
  if (floor.status !== 200) throw new Error(`${floorUrl} answered ${floor.status}: ${await floor.text()}`);
  if ((await fetch(floorUrl)).status !== 404) throw new Error(`${floorUrl} answered without its token`);
}
