// The owner's overview over HTTP against the real MariaDB, on a fixture built through the API:
// workload by builder and stage, days in stage against the workshop's median (textbook median of
// the finished stays, whole UTC days), overdue and upcoming target dates, deposits outstanding,
// the cohort filter and each cohort's progress, reassigning a builder.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { addDays, daysBetween } from "@/lib/overview/stats";
import type { Overview } from "@/lib/schemas/overview";
import { closeTestDb } from "../setup/test-db";
import { approveSpec, base, move, openCommission } from "./commission-helpers";
import { addMember, createTestUser, createWorkshopWithMembers, uniqueEmail, type TestMember, type TestWorkshop } from "./fixtures";
import { backdateHistory, commissionInBuild, payDeposit, todayUtc } from "./overview-fixture";
import { anonymous, signIn, type HttpSession } from "./session";

let ws: TestWorkshop;
let other: TestWorkshop;
let b1: TestMember, b2: TestMember;
let owner: HttpSession, client: HttpSession;
let today: string;
const c = {} as Record<"c1" | "c2" | "c3" | "c4" | "c5" | "c6" | "c7", number>;

const overviewOf = async (s: HttpSession, query = "") => {
  const r = await s.json<{ overview: Overview }>(`/api/workshops/${ws.slug}/overview${query}`);
  if (r.status !== 200) throw new Error(`overview ${r.status} ${JSON.stringify(r.body)}`);
  return r.body.overview;
};

beforeAll(async () => {
  [ws, other] = await Promise.all([createWorkshopWithMembers(), createWorkshopWithMembers()]);
  b1 = ws.builder;
  b2 = await addMember(ws.id, await createTestUser({ email: uniqueEmail("builder") }), "builder");
  [owner, client] = await Promise.all([signIn(ws.owner), signIn(ws.client)]);
  today = todayUtc();

  const inBuild = (title: string, builderId: number | null, advances: number) => commissionInBuild(owner, client, ws, { title, builderId, advances });
  c.c1 = (await inBuild("Seven-string, roasted maple", b1.userId, 1)).id; // body and neck shaping
  c.c2 = (await inBuild("Short-scale bass", b1.userId, 0)).id; // timber
  c.c3 = (await inBuild("Fanned eight", b2.userId, 2)).id; // fretboard and frets
  c.c4 = (await openCommission(owner, ws, { title: "Offset in spec", builderId: b2.userId, targetDate: addDays(today, -3) })).id;
  c.c5 = (await openCommission(owner, ws, { title: "Request nobody has yet", builderId: null, targetDate: addDays(today, 10) })).id;
  c.c6 = (await openCommission(owner, ws, { title: "Cancelled archtop", builderId: b2.userId, targetDate: addDays(today, -20) })).id;
  expect((await move(owner, ws, c.c6, "cancel")).status).toBe(200);
  const c7 = await openCommission(owner, ws, { title: "Baritone waiting on deposit", builderId: b1.userId });
  c.c7 = c7.id;
  await approveSpec(owner, client, ws, c.c7);
  await payDeposit(owner, ws, c.c7, 20_000); // part of the 90 000 deposit: stays in the deposit stage
  expect((await owner.fetch(`${base(ws)}/${c.c1}`, { method: "PATCH", json: { targetDate: addDays(today, 40) } })).status).toBe(200);

  // Stays (days): spec c1 2, c2 1, c3 4, c6 3, c7 3 → median 3; deposit c1 8, c2 4, c3 6 → 6;
  // timber c1 10, c3 4 → 7; body and neck shaping c3 6 → 6; fretboard and frets: none yet.
  await backdateHistory(c.c1, today, [40, 38, 30, 20]);
  await backdateHistory(c.c2, today, [30, 29, 25]);
  await backdateHistory(c.c3, today, [50, 46, 40, 36, 30]);
  await backdateHistory(c.c4, today, [5]);
  await backdateHistory(c.c5, today, [1]);
  await backdateHistory(c.c6, today, [12, 9]);
  await backdateHistory(c.c7, today, [10, 7]);
}, 180_000);
afterAll(closeTestDb);

describe("overview figures", () => {
  it("counts each builder's open commissions by stage, overdue ones, and the unassigned last", async () => {
    const ov = await overviewOf(owner);
    expect(ov.openTotal).toBe(6);
    const byBuilder = Object.fromEntries(ov.workload.map((w) => [w.builder?.id ?? "none", { byStage: w.byStage, open: w.open, overdue: w.overdue }]));
    expect(byBuilder).toEqual({
      [b1.userId]: { byStage: { deposit: 1, timber: 1, body_neck_shaping: 1 }, open: 3, overdue: 0 },
      [b2.userId]: { byStage: { spec: 1, fretboard_frets: 1 }, open: 2, overdue: 1 },
      none: { byStage: { spec: 1 }, open: 1, overdue: 0 },
    });
    expect(ov.workload.at(-1)!.builder).toBeNull();
    expect(ov.stages.map((s) => s.key)).toEqual(["spec", "deposit", "timber", "body_neck_shaping", "fretboard_frets", "finish", "finish_cure_level", "assembly_electronics", "final_setup", "on_hold"]);
  });

  it("compares days in stage with the workshop's median over finished stays", async () => {
    const ov = await overviewOf(owner);
    const shift = daysBetween(today, ov.asOf); // 0 unless midnight UTC passed during the test
    const times = Object.fromEntries(ov.stageTimes.map((s) => [s.stage, [s.medianDays, s.finishedStays, s.current, s.currentMedianDays]]));
    expect(times.spec).toEqual([3, 5, 2, 3 + shift]); // median of 5 and 1 days now
    expect(times.deposit).toEqual([6, 3, 1, 7 + shift]);
    expect(times.timber).toEqual([7, 2, 1, 25 + shift]);
    expect(times.body_neck_shaping).toEqual([6, 1, 1, 20 + shift]);
    expect(times.fretboard_frets).toEqual([null, 0, 1, 30 + shift]);
    expect(times.finish).toEqual([null, 0, 0, null]);

    // Longest past its median first; no median (nothing finished there yet) last.
    expect(ov.inStage.map((r) => [r.id, r.daysInStage - shift, r.stageMedianDays, r.overMedianDays === null ? null : r.overMedianDays - shift])).toEqual([
      [c.c2, 25, 7, 18],
      [c.c1, 20, 6, 14],
      [c.c4, 5, 3, 2],
      [c.c7, 7, 6, 1],
      [c.c5, 1, 3, -2],
      [c.c3, 30, null, null],
    ]);
  });

  it("lists overdue commissions and the target dates ahead (cancelled ones are never overdue)", async () => {
    const ov = await overviewOf(owner);
    const shift = daysBetween(today, ov.asOf);
    expect(ov.overdue.map((r) => [r.id, r.targetDate, r.daysOverdue])).toEqual([[c.c4, addDays(today, -3), 3 + shift]]);
    expect(ov.upcoming.map((r) => [r.id, r.daysLeft])).toEqual([[c.c5, 10 - shift]]);
    const further = await overviewOf(owner, "?upcomingDays=60");
    expect(further.upcoming.map((r) => r.id)).toEqual([c.c5, c.c1]);
  });

  it("shows deposits asked for and not paid in full, with a total per currency", async () => {
    const ov = await overviewOf(owner);
    expect(ov.depositsOutstanding!.items.map((d) => [d.id, d.currency, d.depositMinor, d.paidMinor, d.outstandingMinor])).toEqual([[c.c7, "EUR", 90_000, 20_000, 70_000]]);
    expect(ov.depositsOutstanding!.totals).toEqual([{ currency: "EUR", outstandingMinor: 70_000, commissions: 1 }]);
  });
});

describe("cohort filter and progress", () => {
  let cohortId: number;

  beforeAll(async () => {
    const r = await owner.json<{ cohort: { id: number } }>(`/api/workshops/${ws.slug}/cohorts`, {
      json: { name: "Spring production course", startsOn: addDays(today, -60), endsOn: addDays(today, 60), builderIds: [b1.userId] },
    });
    expect(r.status).toBe(201);
    cohortId = r.body.cohort.id;
    for (const id of [c.c1, c.c7]) expect((await owner.fetch(`${base(ws)}/${id}`, { method: "PATCH", json: { cohortId } })).status).toBe(200);
  });

  it("narrows every figure to the cohort but keeps the workshop's medians", async () => {
    const ov = await overviewOf(owner, `?cohort=${cohortId}`);
    expect(ov.cohort).toEqual({ id: cohortId, name: "Spring production course" });
    expect(ov.openTotal).toBe(2);
    expect(ov.workload.map((w) => [w.builder?.id ?? "none", w.byStage, w.open])).toEqual(
      expect.arrayContaining([
        [b1.userId, { deposit: 1, body_neck_shaping: 1 }, 2],
        [b2.userId, {}, 0],
      ]),
    );
    expect(ov.workload.some((w) => w.builder === null)).toBe(false);
    expect(ov.overdue).toEqual([]);
    expect(ov.depositsOutstanding!.items.map((d) => d.id)).toEqual([c.c7]);
    expect(ov.stageTimes.find((s) => s.stage === "spec")!.medianDays).toBe(3);
  });

  it("shows each cohort's progress by stage and the share delivered", async () => {
    const ov = await overviewOf(owner);
    const cohort = ov.cohorts.find((x) => x.id === cohortId)!;
    expect(cohort.builders.map((b) => b.id)).toEqual([b1.userId]);
    expect(cohort.progress).toEqual({
      total: 2,
      open: 2,
      overdue: 0,
      delivered: 0,
      cancelled: 0,
      shareDelivered: 0,
      byStage: [
        { stage: "deposit", label: "Deposit", n: 1 },
        { stage: "body_neck_shaping", label: "Body and neck shaping", n: 1 },
      ],
    });
  });

  it("gives the commissions table the same filter (the list API's cohort query)", async () => {
    const r = await owner.json<{ items: Array<{ id: number }>; total: number }>(`${base(ws)}?cohort=${cohortId}&pageSize=50`);
    expect(r.status).toBe(200);
    expect(r.body.items.map((i) => i.id).sort((a, b) => a - b)).toEqual([c.c1, c.c7].sort((a, b) => a - b));
    const none = await owner.json<{ total: number }>(`${base(ws)}?cohort=${cohortId}&builder=${b2.userId}`);
    expect(none.body.total).toBe(0);
  });

  it("answers 404 for a cohort of another workshop and 422 for a malformed filter", async () => {
    const theirs = await signIn(other.owner);
    const r = await theirs.json<{ cohort: { id: number } }>(`/api/workshops/${other.slug}/cohorts`, { json: { name: "Their course", startsOn: today, endsOn: today } });
    const res = await owner.json(`/api/workshops/${ws.slug}/overview?cohort=${r.body.cohort.id}`);
    expect(res).toEqual({ status: 404, body: { error: { code: "not_found", message: "No such cohort." } } });
    const bad = await owner.json<{ error: { issues: Array<{ path: string }> } }>(`/api/workshops/${ws.slug}/overview?cohort=abc&upcomingDays=0`);
    expect(bad.status).toBe(422);
    expect(bad.body.error.issues.map((i) => i.path).sort()).toEqual(["cohort", "upcomingDays"]);
  });
});

describe("reassigning a builder", () => {
  it("moves the commission to the other builder's workload", async () => {
    const res = await owner.fetch(`${base(ws)}/${c.c2}`, { method: "PATCH", json: { builderId: b2.userId } });
    expect(res.status).toBe(200);
    const ov = await overviewOf(owner);
    const open = Object.fromEntries(ov.workload.map((w) => [w.builder?.id ?? "none", w.open]));
    expect(open).toEqual({ [b1.userId]: 2, [b2.userId]: 3, none: 1 });
    expect(ov.inStage.find((r) => r.id === c.c2)!.builder).toEqual({ id: b2.userId, name: b2.name });
  });
});

describe("who may see the overview", () => {
  it("shows the bookkeeper the same figures, money included", async () => {
    const ov = await overviewOf(await signIn(ws.bookkeeper));
    expect(ov.openTotal).toBe(6);
    expect(ov.depositsOutstanding!.totals).toEqual([{ currency: "EUR", outstandingMinor: 70_000, commissions: 1 }]);
  });

  it("refuses builders and clients (403), outsiders (404) and the signed-out (401)", async () => {
    const path = `/api/workshops/${ws.slug}/overview`;
    const forbidden = { error: { code: "forbidden", message: "You do not have permission to do this." } };
    expect(await (await signIn(b1)).json(path)).toEqual({ status: 403, body: forbidden });
    expect(await client.json(path)).toEqual({ status: 403, body: forbidden });
    expect(await (await signIn(other.owner)).json(path)).toEqual({ status: 404, body: { error: { code: "not_found", message: "No such workshop." } } });
    expect((await anonymous().fetch(path)).status).toBe(401);
  });
});
