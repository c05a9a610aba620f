// A member of workshop A can never read or change a row of workshop B through any route of this
// issue: B's ids used under A's slug are 404 and B's rows stay as they were.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "../setup/test-db";
import { base, draftSpec, openCommission, sixStringSpec } from "./commission-helpers";
import { addMember, createTestUser, createWorkshopWithMembers, uniqueEmail, type TestWorkshop } from "./fixtures";
import { linkIn, waitForEmail } from "./inbox";
import { signIn, type HttpSession } from "./session";

let a: TestWorkshop;
let b: TestWorkshop;
let ownerA: HttpSession;
let ownerB: HttpSession;
let bInvitation: { id: number; email: string };
let bFailedMessage: number;

beforeAll(async () => {
  [a, b] = await Promise.all([createWorkshopWithMembers(), createWorkshopWithMembers()]);
  [ownerA, ownerB] = await Promise.all([signIn(a.owner), signIn(b.owner)]);
  const email = uniqueEmail("iso");
  const r = await ownerB.json<{ invitation: { id: number } }>(`/api/workshops/${b.slug}/invitations`, { json: { email, role: "builder" } });
  bInvitation = { id: r.body.invitation.id, email };
  const [id] = await testDb()("email_outbox").insert({
    workshop_id: b.id,
    template: "invitation",
    to_address: uniqueEmail("iso-failed"),
    subject: "B's failed e-mail",
    props: "{}",
    idempotency_key: `iso-${b.id}-${Date.now()}`,
    status: "failed",
    attempts: 1,
  });
  bFailedMessage = Number(id);
});
afterAll(closeTestDb);

const notFound = { error: { code: "not_found", message: expect.any(String) } };

describe("cross-workshop isolation", () => {
  it("never lists B's members, invitations or e-mail under A", async () => {
    const members = await ownerA.json<{ members: Array<{ email: string }> }>(`/api/workshops/${a.slug}/members`);
    expect(members.body.members.map((m) => m.email).sort()).toEqual(a.members.map((m) => m.email).sort());
    const invitations = await ownerA.json<{ invitations: Array<{ email: string }> }>(`/api/workshops/${a.slug}/invitations`);
    expect(invitations.body.invitations.map((i) => i.email)).not.toContain(bInvitation.email);
    const failed = await ownerA.json<{ messages: Array<{ id: number }> }>(`/api/workshops/${a.slug}/outbox?status=failed`);
    expect(failed.body.messages.map((m) => m.id)).not.toContain(bFailedMessage);
  });

  it("cannot change the role of B's member through A (404, unchanged)", async () => {
    const res = await ownerA.fetch(`/api/workshops/${a.slug}/members/${b.client.membershipId}`, { method: "PATCH", json: { role: "owner" } });
    expect(res.status).toBe(404);
    expect(await res.json()).toEqual(notFound);
    expect((await testDb()("memberships").where({ id: b.client.membershipId }).first("role")).role).toBe("client");
  });

  it("cannot remove B's member through A (404, still there)", async () => {
    const res = await ownerA.fetch(`/api/workshops/${a.slug}/members/${b.builder.membershipId}`, { method: "DELETE" });
    expect(res.status).toBe(404);
    expect(await testDb()("memberships").where({ id: b.builder.membershipId }).first("id")).toBeTruthy();
  });

  it("cannot revoke B's invitation through A (404, still pending)", async () => {
    const res = await ownerA.fetch(`/api/workshops/${a.slug}/invitations/${bInvitation.id}`, { method: "DELETE" });
    expect(res.status).toBe(404);
    expect((await testDb()("invitations").where({ id: bInvitation.id }).first("revoked_at")).revoked_at).toBeNull();
  });

  it("cannot requeue B's failed e-mail through A (404, still failed)", async () => {
    const res = await ownerA.fetch(`/api/workshops/${a.slug}/outbox/${bFailedMessage}/retry`, { method: "POST" });
    expect(res.status).toBe(404);
    expect((await testDb()("email_outbox").where({ id: bFailedMessage }).first("status")).status).toBe("failed");
  });

  it("answers every route of B with the same 404 as a workshop that does not exist", async () => {
    const paths: Array<[string, string, unknown?]> = [
      ["GET", `/api/workshops/${b.slug}/members`],
      ["PATCH", `/api/workshops/${b.slug}/members/${b.client.membershipId}`, { role: "owner" }],
      ["DELETE", `/api/workshops/${b.slug}/members/${b.client.membershipId}`],
      ["GET", `/api/workshops/${b.slug}/invitations`],
      ["POST", `/api/workshops/${b.slug}/invitations`, { email: uniqueEmail("iso"), role: "owner" }],
      ["DELETE", `/api/workshops/${b.slug}/invitations/${bInvitation.id}`],
      ["GET", `/api/workshops/${b.slug}/outbox`],
      ["POST", `/api/workshops/${b.slug}/outbox/${bFailedMessage}/retry`],
    ];
    for (const [method, path, json] of paths) {
      const res = await ownerA.fetch(path, { method, ...(json ? { json } : {}) });
      expect(res.status, `${method} ${path}`).toBe(404);
      expect(await res.json()).toEqual({ error: { code: "not_found", message: "No such workshop." } });
    }
    expect(await testDb()("memberships").where({ workshop_id: b.id }).count({ n: "*" }).first()).toEqual({ n: b.members.length });
  });

  it("cannot join B with B's invitation sent to someone else", async () => {
    // The token is the capability, but it only works for the invited address.
    const mail = await waitForEmail(bInvitation.email);
    const token = linkIn(mail, "/invitations/").split("/invitations/")[1]!;
    const res = await ownerA.fetch("/api/invitations/accept", { json: { token } });
    expect(res.status).toBe(403);
    expect(await testDb()("memberships").where({ workshop_id: b.id, user_id: a.owner.userId }).first("id")).toBeUndefined();
  });

  it("gives a person in both workshops each workshop's own data and role", async () => {
    const both = await createTestUser({ email: uniqueEmail("both") });
    await addMember(a.id, both, "client");
    await addMember(b.id, both, "owner");
    const s = await signIn(both);
    expect((await s.fetch(`/api/workshops/${a.slug}/members`)).status).toBe(403);
    const inB = await s.json<{ members: Array<{ email: string }> }>(`/api/workshops/${b.slug}/members`);
    expect(inB.status).toBe(200);
    expect(inB.body.members.map((m) => m.email)).not.toContain(a.owner.email);
    const me = await s.json<{ memberships: Array<{ role: string; workshop: { slug: string } }> }>("/api/me");
    expect(me.body.memberships.map((m) => [m.workshop.slug, m.role]).sort()).toEqual([[a.slug, "client"], [b.slug, "owner"]].sort());
  });

  it("makes the creator of a workshop its only owner, and refuses a taken address with the field path", async () => {
    const slug = `made-${a.id}-${Date.now() % 100000}`;
    const created = await ownerA.json<{ workshop: { slug: string }; role: string }>("/api/workshops", { json: { name: "Made Here", slug, unitPreference: "in", currency: "usd" } });
    expect(created).toEqual({ status: 201, body: { workshop: { slug, name: "Made Here" }, role: "owner" } });
    const members = await ownerA.json<{ members: Array<{ email: string; role: string }> }>(`/api/workshops/${slug}/members`);
    expect(members.body.members).toEqual([expect.objectContaining({ email: a.owner.email, role: "owner" })]);
    const taken = await ownerB.json<{ error: { issues: Array<{ path: string }> } }>("/api/workshops", { json: { name: "Copy", slug, unitPreference: "mm", currency: "EUR" } });
    expect(taken.status).toBe(409);
    expect(taken.body.error.issues.map((i) => i.path)).toEqual(["slug"]);
    // B's owner did not become a member of it by trying.
    expect((await ownerB.fetch(`/api/workshops/${slug}/members`)).status).toBe(404);
  });
});

// The commission routes: B's commission, its versions, history and comments are out of reach from
// A, by id under A's address (404, as for no such commission) and under B's address (404, as for
// no such workshop), and stay exactly as they were.
describe("cross-workshop isolation of commissions", () => {
  let cB: number;
  let vB: number;
  let hB: number;
  const bState = async () => ({
    commission: await testDb()("commissions").where({ id: cB }).first("title", "stage", "price_minor", "builder_user_id", "updated_at"),
    versions: await testDb()("spec_versions").where({ commission_id: cB }).select("id", "submitted_at", "approved_at"),
    comments: await testDb()("commission_comments").where({ commission_id: cB }).count({ n: "*" }).first(),
    payments: await testDb()("payments").where({ commission_id: cB }).count({ n: "*" }).first(),
    history: await testDb()("stage_history").where({ commission_id: cB }).select("id", "signed_off_at"),
  });

  beforeAll(async () => {
    cB = (await openCommission(ownerB, b, { title: "B's own commission" })).id;
    vB = (await draftSpec(ownerB, b, cB)).id;
    hB = Number((await testDb()("stage_history").where({ commission_id: cB }).first("id")).id);
    await ownerB.fetch(`${base(b)}/${cB}/comments`, { json: { body: "B's private note" } });
  });

  it("never lists B's commissions under A", async () => {
    const list = await ownerA.json<{ items: Array<{ id: number }>; total: number }>(`${base(a)}?pageSize=200`);
    expect(list.status).toBe(200);
    expect(list.body.items.map((i) => i.id)).not.toContain(cB);
    expect((await ownerA.json<{ items: unknown[] }>(`${base(a)}?q=${encodeURIComponent("B's own")}`)).body.items).toEqual([]);
  });

  it("answers B's commission ids under A's address with 404 on every route, and changes nothing", async () => {
    const before = await bState();
    const paths: Array<[string, string, unknown?]> = [
      ["GET", `${base(a)}/${cB}`],
      ["PATCH", `${base(a)}/${cB}`, { title: "Taken over" }],
      ["GET", `${base(a)}/${cB}/transitions`],
      ["POST", `${base(a)}/${cB}/transitions`, { action: "cancel" }],
      ["POST", `${base(a)}/${cB}/transitions/${hB}/signoff`],
      ["GET", `${base(a)}/${cB}/spec-versions`],
      ["POST", `${base(a)}/${cB}/spec-versions`, { spec: sixStringSpec(), options: {} }],
      ["GET", `${base(a)}/${cB}/spec-versions/${vB}`],
      ["POST", `${base(a)}/${cB}/spec-versions/${vB}/submit`, {}],
      ["GET", `${base(a)}/${cB}/comments`],
      ["POST", `${base(a)}/${cB}/comments`, { body: "Hello from A" }],
      ["POST", `${base(a)}/${cB}/payments`, { kind: "deposit", amountMinor: 1000, reference: "From A" }],
    ];
    for (const [method, path, json] of paths) {
      const res = await ownerA.fetch(path, { method, ...(json !== undefined ? { json } : {}) });
      expect(res.status, `${method} ${path}`).toBe(404);
      expect(await res.json()).toEqual(notFound);
    }
    expect(await bState()).toEqual(before);
  });

  it("answers every commission route of B with the same 404 as a workshop that does not exist", async () => {
    const before = await bState();
    const paths: Array<[string, string, unknown?]> = [
      ["GET", base(b)],
      ["POST", base(b), { title: "Sneaked in", clientId: b.client.userId }],
      ["GET", `${base(b)}/${cB}`],
      ["PATCH", `${base(b)}/${cB}`, { title: "Taken over" }],
      ["GET", `${base(b)}/${cB}/transitions`],
      ["POST", `${base(b)}/${cB}/transitions`, { action: "cancel" }],
      ["POST", `${base(b)}/${cB}/transitions/${hB}/signoff`],
      ["GET", `${base(b)}/${cB}/spec-versions`],
      ["POST", `${base(b)}/${cB}/spec-versions`, { spec: sixStringSpec(), options: {} }],
      ["GET", `${base(b)}/${cB}/spec-versions/${vB}`],
      ["POST", `${base(b)}/${cB}/spec-versions/${vB}/submit`, {}],
      ["POST", `${base(b)}/${cB}/spec-versions/${vB}/approve`],
      ["GET", `${base(b)}/${cB}/comments`],
      ["POST", `${base(b)}/${cB}/comments`, { body: "Hello from A" }],
      ["POST", `${base(b)}/${cB}/payments`, { kind: "deposit", amountMinor: 1000, reference: "From A" }],
      ["GET", `/api/workshops/${b.slug}/commission-people`],
    ];
    for (const [method, path, json] of paths) {
      const res = await ownerA.fetch(path, { method, ...(json !== undefined ? { json } : {}) });
      expect(res.status, `${method} ${path}`).toBe(404);
      expect(await res.json()).toEqual({ error: { code: "not_found", message: "No such workshop." } });
    }
    expect(await bState()).toEqual(before);
    expect(await testDb()("commissions").where({ workshop_id: b.id }).count({ n: "*" }).first()).toEqual({ n: 1 });
  });
});
