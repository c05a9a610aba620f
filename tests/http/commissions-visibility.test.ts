// Who sees which commission, and which of its fields, over HTTP: owner and bookkeeper see every
// commission of the workshop (the bookkeeper with money, specs read-only), a builder only those
// assigned to them and never money, a client only their own. A guessed id of someone else's
// commission — in this workshop or another — is the same 404 as an id that does not exist.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { CommissionDetail, CommissionPage } from "@/lib/schemas/commission-out";
import { closeTestDb, testDb } from "../setup/test-db";
import { approveSpec, base, detail, draftSpec, openCommission, sixStringSpec } from "./commission-helpers";
import { createWorkshopWithMembers, type TestMember, type TestWorkshop } from "./fixtures";
import { signIn, type HttpSession } from "./session";

let a: TestWorkshop;
let b: TestWorkshop;
let owner: HttpSession, builder1: HttpSession, builder2: HttpSession, bookkeeper: HttpSession, client1: HttpSession, client2: HttpSession, ownerB: HttpSession;
let builder2Member: TestMember, client2Member: TestMember;
const c = { mine: 0, other: 0, unassigned: 0, inB: 0 };

beforeAll(async () => {
  [a, b] = await Promise.all([createWorkshopWithMembers({ extra: { builder: 1, client: 1 } }), createWorkshopWithMembers()]);
  builder2Member = a.members.filter((m) => m.role === "builder")[1]!;
  client2Member = a.members.filter((m) => m.role === "client")[1]!;
  [owner, builder1, builder2, bookkeeper, client1, client2, ownerB] = await Promise.all([
    signIn(a.owner),
    signIn(a.builder),
    signIn(builder2Member),
    signIn(a.bookkeeper),
    signIn(a.client),
    signIn(client2Member),
    signIn(b.owner),
  ]);
  c.mine = (await openCommission(owner, a, { title: "Client one, builder one" })).id;
  c.other = (await openCommission(owner, a, { title: "Client two, builder two", clientId: client2Member.userId, builderId: builder2Member.userId })).id;
  c.unassigned = (await openCommission(owner, a, { title: "Client one, no builder yet", builderId: null })).id;
  c.inB = (await openCommission(ownerB, b, { title: "In workshop B" })).id;
  await approveSpec(builder1, client1, a, c.mine);
});
afterAll(closeTestDb);

const list = async (s: HttpSession, ws = a) => {
  const r = await s.json<CommissionPage>(`${base(ws)}?pageSize=200`);
  expect(r.status).toBe(200);
  return r.body;
};
const idsOf = (p: CommissionPage) => p.items.map((i) => i.id).sort((x, y) => x - y);
const NOT_FOUND = { error: { code: "not_found", message: "No such commission." } };

describe("commission visibility by role", () => {
  it("lists every commission of the workshop to the owner and the bookkeeper, with money", async () => {
    for (const s of [owner, bookkeeper]) {
      const page = await list(s);
      expect(idsOf(page)).toEqual([c.mine, c.other, c.unassigned].sort((x, y) => x - y));
      expect(page.total).toBe(3);
      for (const item of page.items) expect(item.money).toEqual({ currency: "EUR", priceMinor: 300_000, depositMinor: 90_000, depositPercent: 30 });
    }
  });

  it("lists to a builder only the commissions assigned to them, without money", async () => {
    const one = await list(builder1);
    expect(idsOf(one)).toEqual([c.mine]);
    expect(one.items[0]!.money).toBeNull();
    expect(idsOf(await list(builder2))).toEqual([c.other]);
    const d = await detail(builder1, a, c.mine);
    expect(d.money).toBeNull();
    expect(d.payments).toBeNull();
  });

  it("lists to a client only their own commissions", async () => {
    expect(idsOf(await list(client1))).toEqual([c.mine, c.unassigned].sort((x, y) => x - y));
    expect(idsOf(await list(client2))).toEqual([c.other]);
    // Filters cannot widen it: asking for another client's commissions gives nothing.
    const asked = await client1.json<CommissionPage>(`${base(a)}?client=${client2Member.userId}`);
    expect(asked.body).toMatchObject({ items: [], total: 0 });
  });

  it("answers a client's guess at another client's commission with the plain 404, on every route", async () => {
    const missing = 2_000_000_000;
    for (const id of [c.other, c.inB, missing]) {
      for (const [method, path, json] of [
        ["GET", `${base(a)}/${id}`],
        ["PATCH", `${base(a)}/${id}`, { title: "Mine now" }],
        ["GET", `${base(a)}/${id}/transitions`],
        ["POST", `${base(a)}/${id}/transitions`, { action: "cancel" }],
        ["GET", `${base(a)}/${id}/spec-versions`],
        ["GET", `${base(a)}/${id}/comments`],
        ["POST", `${base(a)}/${id}/comments`, { body: "Hello?" }],
      ] as Array<[string, string, unknown?]>) {
        const res = await client1.fetch(path, { method, ...(json ? { json } : {}) });
        // PATCH is refused by permission before any row is looked at.
        const want = method === "PATCH" ? 403 : 404;
        expect(res.status, `${method} ${path}`).toBe(want);
        if (want === 404) expect(await res.json()).toEqual(NOT_FOUND);
      }
    }
    expect(await testDb()("commission_comments").whereIn("commission_id", [c.other, c.inB]).first("id")).toBeUndefined();
    expect((await testDb()("commissions").where({ id: c.other }).first("stage")).stage).toBe("spec");
  });

  it("answers a builder's guess at a commission not assigned to them with 404", async () => {
    for (const id of [c.other, c.unassigned, c.inB]) {
      const res = await builder1.fetch(`${base(a)}/${id}`);
      expect(res.status).toBe(404);
      expect(await res.json()).toEqual(NOT_FOUND);
      const draft = await builder1.fetch(`${base(a)}/${id}/spec-versions`, { method: "POST", json: { spec: sixStringSpec(), options: {} } });
      expect(draft.status).toBe(404);
    }
    expect(await testDb()("spec_versions").whereIn("commission_id", [c.other, c.unassigned, c.inB]).first("id")).toBeUndefined();
  });

  it("lets the bookkeeper see money and payments and read specs, but not draft, send or change them", async () => {
    const d: CommissionDetail = await detail(bookkeeper, a, c.mine);
    expect(d.money).toMatchObject({ priceMinor: 300_000 });
    expect(d.payments).toMatchObject({ depositPaid: false, paidMinor: 0 });
    const versions = await bookkeeper.json<{ versions: Array<{ id: number }> }>(`${base(a)}/${c.mine}/spec-versions`);
    expect(versions.status).toBe(200);
    expect(versions.body.versions).toHaveLength(1);
    const v = versions.body.versions[0]!.id;
    expect((await bookkeeper.json(`${base(a)}/${c.mine}/spec-versions/${v}`)).status).toBe(200);
    expect((await bookkeeper.fetch(`${base(a)}/${c.mine}/spec-versions`, { method: "POST", json: { spec: sixStringSpec(), options: {} } })).status).toBe(403);
    expect((await bookkeeper.fetch(`${base(a)}/${c.mine}/spec-versions/${v}/submit`, { method: "POST", json: {} })).status).toBe(403);
    expect((await bookkeeper.fetch(`${base(a)}/${c.mine}`, { method: "PATCH", json: { priceMinor: 1 } })).status).toBe(403);
    expect(await testDb()("spec_versions").where({ commission_id: c.mine }).count({ n: "*" }).first()).toEqual({ n: 1 });
  });

  it("keeps a builder from money: no prices, no payments, and no recording them", async () => {
    const page = await list(builder1);
    expect(JSON.stringify(page)).not.toMatch(/priceMinor|depositMinor|paidMinor/);
    const res = await builder1.fetch(`${base(a)}/${c.mine}/payments`, { method: "POST", json: { kind: "deposit", amountMinor: 90_000, reference: "Builder's try" } });
    expect(res.status).toBe(403);
    expect(await testDb()("payments").where({ commission_id: c.mine }).first("id")).toBeUndefined();
    // The owner alone sets the price.
    expect((await builder1.fetch(`${base(a)}/${c.mine}`, { method: "PATCH", json: { priceMinor: 1 } })).status).toBe(403);
  });

  it("shows a client only the versions sent to them", async () => {
    const draft = await draftSpec(builder1, a, c.mine);
    const seen = await client1.json<{ versions: Array<{ id: number }> }>(`${base(a)}/${c.mine}/spec-versions`);
    expect(seen.body.versions.map((v) => v.id)).not.toContain(draft.id);
    expect((await client1.fetch(`${base(a)}/${c.mine}/spec-versions/${draft.id}`)).status).toBe(404);
  });

  it("never lets workshop B's owner reach A's commission through B's address", async () => {
    const res = await ownerB.fetch(`${base(b)}/${c.mine}`);
    expect(res.status).toBe(404);
    expect(await res.json()).toEqual(NOT_FOUND);
    const page = await list(ownerB, b);
    expect(idsOf(page)).toEqual([c.inB]);
  });
});

describe("the benchmark's floor route", () => {
  it("answers 404 in normal operation, with or without a guessed token", async () => {
    const variants: Array<Record<string, string>> = [{}, { "x-bench-token": "0".repeat(48) }, { "x-bench-token": "" }];
    for (const headers of variants) {
      const res = await owner.fetch(`/api/bench/commission-list?workshopId=${a.id}`, { headers });
      expect(res.status).toBe(404);
      expect(((await res.json()) as { error: { code: string } }).error.code).toBe("not_found");
    }
  });
});
