// Course cohorts over HTTP against the real MariaDB: create, read, change, remove; validation with
// field paths; builders see only their own cohorts; a commission's cohort through PATCH …/commissions/[id];
// nothing of another workshop is reachable; every change is in the audit log.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { CohortDetail, CohortOut } from "@/lib/schemas/cohort";
import { closeTestDb, testDb } from "../setup/test-db";
import { base, openCommission } from "./commission-helpers";
import { addMember, createTestUser, createWorkshopWithMembers, uniqueEmail, type TestMember, type TestWorkshop } from "./fixtures";
import { signIn, type HttpSession } from "./session";

let ws: TestWorkshop;
let other: TestWorkshop;
let b2: TestMember;
let owner: HttpSession, builder: HttpSession, builder2: HttpSession, bookkeeper: HttpSession, client: HttpSession, outsider: HttpSession;
const cohorts = (w: TestWorkshop = ws) => `/api/workshops/${w.slug}/cohorts`;

type Issues = { error: { code: string; message: string; issues?: Array<{ path: string; message: string }> } };
const paths = (b: Issues) => (b.error.issues ?? []).map((i) => i.path).sort();

beforeAll(async () => {
  [ws, other] = await Promise.all([createWorkshopWithMembers(), createWorkshopWithMembers()]);
  b2 = await addMember(ws.id, await createTestUser({ email: uniqueEmail("builder") }), "builder");
  [owner, builder, builder2, bookkeeper, client, outsider] = await Promise.all([signIn(ws.owner), signIn(ws.builder), signIn(b2), signIn(ws.bookkeeper), signIn(ws.client), signIn(other.owner)]);
});
afterAll(closeTestDb);

async function create(body: Record<string, unknown>) {
  return owner.json<{ cohort: CohortOut } & Issues>(cohorts(), { json: body });
}

describe("creating cohorts", () => {
  it("creates a cohort with its builders and no commissions yet", async () => {
    const r = await create({ name: "  Autumn course 2027 ", startsOn: "2027-09-06", endsOn: "2028-01-28", builderIds: [ws.builder.userId] });
    expect(r.status).toBe(201);
    expect(r.body.cohort).toMatchObject({ name: "Autumn course 2027", startsOn: "2027-09-06", endsOn: "2028-01-28", builders: [{ id: ws.builder.userId, name: ws.builder.name }] });
    expect(r.body.cohort.progress).toEqual({ total: 0, open: 0, overdue: 0, delivered: 0, cancelled: 0, shareDelivered: null, byStage: [] });
    const audit = await testDb()("audit_log").where({ workshop_id: ws.id, action: "cohort.created", entity_id: String(r.body.cohort.id) }).first();
    expect(audit.actor_user_id).toBe(ws.owner.userId);
  });

  it("answers 422 with the field paths for bad input", async () => {
    const empty = await create({});
    expect(empty.status).toBe(422);
    expect(paths(empty.body)).toEqual(["endsOn", "name", "startsOn"]);

    const dates = await create({ name: "Backwards", startsOn: "2027-09-06", endsOn: "2027-09-01" });
    expect(dates.status).toBe(422);
    expect(dates.body.error.issues).toEqual([{ path: "endsOn", message: "The end date cannot be before the start date." }]);

    const notDate = await create({ name: "Typo", startsOn: "2027-02-30", endsOn: "soon" });
    expect(paths(notDate.body)).toEqual(["endsOn", "startsOn"]);

    // A client and someone of another workshop are not builders here.
    const people = await create({ name: "Wrong people", startsOn: "2027-01-01", endsOn: "2027-06-30", builderIds: [ws.builder.userId, ws.client.userId, other.builder.userId] });
    expect(people.status).toBe(422);
    expect(people.body.error.issues).toEqual([
      { path: "builderIds.1", message: "Not a builder of this workshop." },
      { path: "builderIds.2", message: "Not a builder of this workshop." },
    ]);

    const twice = await create({ name: "Twice", startsOn: "2027-01-01", endsOn: "2027-06-30", builderIds: [b2.userId, b2.userId] });
    expect(paths(twice.body)).toEqual(["builderIds"]);
  });

  it("refuses a second cohort with the same name (422 on name), and the same name in another workshop is fine", async () => {
    await create({ name: "Summer intensive", startsOn: "2027-07-01", endsOn: "2027-08-15" });
    const again = await create({ name: "Summer intensive", startsOn: "2028-07-01", endsOn: "2028-08-15" });
    expect(again.status).toBe(422);
    expect(again.body.error.issues).toEqual([{ path: "name", message: "Another cohort already has this name." }]);
    const theirs = await outsider.json(cohorts(other), { json: { name: "Summer intensive", startsOn: "2027-07-01", endsOn: "2027-08-15" } });
    expect(theirs.status).toBe(201);
  });

  it("lets only the owner create one", async () => {
    for (const s of [builder, bookkeeper, client]) {
      const r = await s.fetch(cohorts(), { method: "POST", json: { name: "Not mine", startsOn: "2027-01-01", endsOn: "2027-02-01" } });
      expect(r.status).toBe(403);
    }
    expect(await testDb()("cohorts").where({ workshop_id: ws.id, name: "Not mine" }).first()).toBeUndefined();
  });
});

describe("reading, changing and removing", () => {
  let mine: CohortOut; // ws.builder is in it
  let theirs: CohortOut; // only b2 is in it
  let c1: number, c2: number;

  beforeAll(async () => {
    mine = (await create({ name: "Guitar making I", startsOn: "2027-01-10", endsOn: "2027-06-20", builderIds: [ws.builder.userId] })).body.cohort;
    theirs = (await create({ name: "Bass making I", startsOn: "2027-02-01", endsOn: "2027-07-01", builderIds: [b2.userId] })).body.cohort;
    c1 = (await openCommission(owner, ws, { title: "Student build one", builderId: ws.builder.userId, targetDate: "2020-01-31" })).id;
    c2 = (await openCommission(owner, ws, { title: "Student build two", builderId: b2.userId })).id;
  });

  it("puts a commission into a cohort through the commission's PATCH, and takes it out", async () => {
    const put = await owner.fetch(`${base(ws)}/${c1}`, { method: "PATCH", json: { cohortId: mine.id } });
    expect(put.status).toBe(200);
    expect((await owner.fetch(`${base(ws)}/${c2}`, { method: "PATCH", json: { cohortId: mine.id } })).status).toBe(200);
    const d = await owner.json<{ cohort: CohortDetail }>(`${cohorts()}/${mine.id}`);
    expect(d.body.cohort.commissions.map((x) => [x.id, x.stage, x.overdue])).toEqual([
      [c1, "spec", true],
      [c2, "spec", false],
    ]);
    expect(d.body.cohort.progress).toMatchObject({ total: 2, open: 2, overdue: 1, shareDelivered: 0, byStage: [{ stage: "spec", label: "Spec", n: 2 }] });

    const out = await owner.fetch(`${base(ws)}/${c2}`, { method: "PATCH", json: { cohortId: null } });
    expect(out.status).toBe(200);
    expect((await testDb()("commissions").where({ id: c2 }).first("cohort_id")).cohort_id).toBeNull();
  });

  it("refuses a cohort of another workshop (422 on cohortId) and a builder choosing one (403)", async () => {
    const foreign = (await outsider.json<{ cohort: { id: number } }>(cohorts(other), { json: { name: "Foreign", startsOn: "2027-01-01", endsOn: "2027-01-02" } })).body.cohort.id;
    const r = await owner.json<Issues>(`${base(ws)}/${c2}`, { method: "PATCH", json: { cohortId: foreign } });
    expect(r.status).toBe(422);
    expect(r.body.error.issues).toEqual([{ path: "cohortId", message: "Not a cohort of this workshop." }]);
    const b = await builder.fetch(`${base(ws)}/${c1}`, { method: "PATCH", json: { cohortId: null } });
    expect(b.status).toBe(403);
    expect((await testDb()("commissions").where({ id: c1 }).first("cohort_id")).cohort_id).toBe(mine.id);
  });

  it("shows a builder only their own cohorts, and within them only their own commissions", async () => {
    const list = await builder.json<{ cohorts: CohortOut[] }>(cohorts());
    expect(list.status).toBe(200);
    expect(list.body.cohorts.map((x) => x.id)).toContain(mine.id);
    expect(list.body.cohorts.map((x) => x.id)).not.toContain(theirs.id);
    for (const x of list.body.cohorts) expect(x.builders.map((b) => b.id)).toContain(ws.builder.userId);
    expect((await builder.json(`${cohorts()}/${theirs.id}`)).status).toBe(404);
    // b2's commission in the builder's cohort: counted for the owner, not shown to the builder.
    expect((await owner.fetch(`${base(ws)}/${c2}`, { method: "PATCH", json: { cohortId: mine.id } })).status).toBe(200);
    const seen = await builder.json<{ cohort: CohortDetail }>(`${cohorts()}/${mine.id}`);
    expect(seen.body.cohort.commissions.map((x) => x.id)).toEqual([c1]);
    expect(seen.body.cohort.progress.total).toBe(1);
    expect((await owner.json<{ cohort: CohortDetail }>(`${cohorts()}/${mine.id}`)).body.cohort.progress.total).toBe(2);
    const two = await builder2.json<{ cohorts: CohortOut[] }>(cohorts());
    expect(two.body.cohorts.map((x) => x.id)).toEqual([theirs.id]);
    // The bookkeeper sees every cohort; a client none.
    const all = await bookkeeper.json<{ cohorts: CohortOut[] }>(cohorts());
    expect(all.body.cohorts.map((x) => x.id)).toEqual(expect.arrayContaining([mine.id, theirs.id]));
    expect((await client.fetch(cohorts())).status).toBe(403);
  });

  it("changes name, dates and builders, checking the dates against what is stored", async () => {
    const r = await owner.json<{ cohort: CohortOut }>(`${cohorts()}/${mine.id}`, { method: "PATCH", json: { name: "Guitar making I (2027)", builderIds: [ws.builder.userId, b2.userId] } });
    expect(r.status).toBe(200);
    expect(r.body.cohort.name).toBe("Guitar making I (2027)");
    expect(r.body.cohort.builders.map((b) => b.id).sort()).toEqual([ws.builder.userId, b2.userId].sort());

    const early = await owner.json<Issues>(`${cohorts()}/${mine.id}`, { method: "PATCH", json: { endsOn: "2026-12-31" } });
    expect(early.status).toBe(422);
    expect(early.body.error.issues).toEqual([{ path: "endsOn", message: "The end date cannot be before the start date." }]);
    expect((await owner.json<Issues>(`${cohorts()}/${mine.id}`, { method: "PATCH", json: {} })).status).toBe(422);
    expect((await owner.fetch(`${cohorts()}/${mine.id}`, { method: "PATCH", body: "{not json", headers: { "content-type": "application/json" } })).status).toBe(400);
    expect((await builder.fetch(`${cohorts()}/${mine.id}`, { method: "PATCH", json: { name: "Renamed by a builder" } })).status).toBe(403);
    const stored = await testDb()("cohorts").where({ id: mine.id }).first("name", "ends_on");
    expect(stored.name).toBe("Guitar making I (2027)");
  });

  it("removes a cohort and keeps its commissions, without a cohort", async () => {
    const r = await owner.json<{ id: number; releasedCommissions: number }>(`${cohorts()}/${mine.id}`, { method: "DELETE" });
    expect(r).toEqual({ status: 200, body: { id: mine.id, releasedCommissions: 2 } });
    expect((await owner.fetch(`${cohorts()}/${mine.id}`)).status).toBe(404);
    expect(await testDb()("commissions").whereIn("id", [c1, c2]).pluck("cohort_id")).toEqual([null, null]);
    expect(await testDb()("cohort_builders").where({ cohort_id: mine.id }).first()).toBeUndefined();
    const actions = await testDb()("audit_log").where({ workshop_id: ws.id, entity_type: "cohort", entity_id: String(mine.id) }).orderBy("id").pluck("action");
    expect(actions).toEqual(["cohort.created", "cohort.updated", "cohort.deleted"]);
  });
});

describe("another workshop's cohorts", () => {
  it("are 404 under its own slug for a non-member and unknown under ours, and stay as they were", async () => {
    const foreign = (await outsider.json<{ cohort: CohortOut }>(cohorts(other), { json: { name: "Private course", startsOn: "2027-03-01", endsOn: "2027-04-01" } })).body.cohort;
    expect((await owner.fetch(`${cohorts(other)}/${foreign.id}`)).status).toBe(404);
    for (const [method, json] of [["GET", undefined], ["PATCH", { name: "Hijacked" }], ["DELETE", undefined]] as const) {
      const r = await owner.json(`${cohorts()}/${foreign.id}`, { method, ...(json ? { json } : {}) });
      expect(r, method).toEqual({ status: 404, body: { error: { code: "not_found", message: "No such cohort." } } });
    }
    expect((await owner.json<{ cohorts: CohortOut[] }>(cohorts())).body.cohorts.map((x) => x.id)).not.toContain(foreign.id);
    expect((await testDb()("cohorts").where({ id: foreign.id }).first("name")).name).toBe("Private course");
  });
});

describe("cohort ids in the path", () => {
  it("treats a malformed cohort id in the path as not found", async () => {
    expect((await owner.fetch(`${cohorts()}/abc`)).status).toBe(404);
    expect((await owner.fetch(`${cohorts()}/0`, { method: "DELETE" })).status).toBe(404);
  });
});
