// The commission workflow over HTTP against the built app and the real MariaDB: open, spec,
// approval, deposit, build stages with sign-off, delivery guard; each move's e-mail in the outbox.
import { beforeAll, describe, expect, it } from "vitest";
import { DEFAULT_BUILD_STAGES } from "@/lib/workflow/stages";
import { testDb } from "../setup/test-db";
import { approveSpec, base, detail, draftSpec, move, openCommission, outboxTemplatesFor, signInRoles, sixStringSpec } from "./commission-helpers";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import type { HttpSession } from "./session";

let ws: TestWorkshop;
let owner: HttpSession, builder: HttpSession, bookkeeper: HttpSession, client: HttpSession;

beforeAll(async () => {
  ws = await createWorkshopWithMembers();
  ({ owner, builder, bookkeeper, client } = await signInRoles(ws));
});

describe("commission workflow", () => {
  it("numbers commissions per workshop and year", async () => {
    const a = await openCommission(owner, ws);
    const b = await openCommission(owner, ws);
    const year = new Date().getUTCFullYear();
    expect(a.number).toMatch(new RegExp(`^${year}-\\d{3}$`));
    expect(Number(b.number.slice(5))).toBe(Number(a.number.slice(5)) + 1);
    expect(a.money).toEqual({ currency: "EUR", priceMinor: 300_000, depositMinor: 90_000, depositPercent: 30 });
  });

  it("lets a client open a request for themselves, without a price", async () => {
    const r = await client.json<{ commission: { client: { id: number }; money: { priceMinor: number } } }>(base(ws), {
      method: "POST",
      json: { title: "Fanned eight for recording", requestNotes: "27-fret, 25.5–27 in", priceMinor: 1, clientId: ws.owner.userId },
    });
    expect(r.status).toBe(201);
    expect(r.body.commission.client.id).toBe(ws.client.userId);
    expect(r.body.commission.money.priceMinor).toBe(0);
  });

  it("keeps the spec stage until the client approves an error-free version, then asks for the deposit", async () => {
    const c = await openCommission(owner, ws);
    const refused = await move(builder, ws, c.id, "advance");
    expect(refused.status).toBe(409);
    expect(((await refused.json()) as { error: { message: string } }).error.message).toMatch(/not approved a spec version/);

    const v = await draftSpec(builder, ws, c.id);
    // A draft is the workshop's: the client does not see it until it is sent.
    expect((await client.json<{ versions: unknown[] }>(`${base(ws)}/${c.id}/spec-versions`)).body.versions).toEqual([]);
    expect((await client.fetch(`${base(ws)}/${c.id}/spec-versions/${v.id}/approve`, { method: "POST" })).status).toBe(404);
    expect((await builder.fetch(`${base(ws)}/${c.id}/spec-versions/${v.id}/approve`, { method: "POST" })).status).toBe(403);

    expect((await builder.fetch(`${base(ws)}/${c.id}/spec-versions/${v.id}/submit`, { method: "POST", json: {} })).status).toBe(200);
    expect((await client.fetch(`${base(ws)}/${c.id}/spec-versions/${v.id}/approve`, { method: "POST" })).status).toBe(200);
    const d = await detail(owner, ws, c.id);
    expect(d.stage).toBe("deposit");
    expect(d.approvedSpecVersion).toEqual({ id: v.id, version: 1 });
    expect(await outboxTemplatesFor(ws.client.email)).toEqual(expect.arrayContaining(["spec-ready", "deposit-requested"]));
  });

  it("refuses to send or approve a version whose build math has errors", async () => {
    const c = await openCommission(owner, ws);
    const spec = sixStringSpec();
    spec.strings[0]!.note = "E5"; // an octave up on a plain 0.010: far past the wire's strength
    const v = await draftSpec(builder, ws, c.id, spec);
    expect(v.hasErrors).toBe(true);
    const r = await builder.fetch(`${base(ws)}/${c.id}/spec-versions/${v.id}/submit`, { method: "POST", json: {} });
    expect(r.status).toBe(409);
  });

  it("locks an approved version; a change is a new version with a diff and a spring note for a floating tremolo", async () => {
    const c = await openCommission(owner, ws);
    const v1 = await approveSpec(builder, client, ws, c.id);
    expect((await client.fetch(`${base(ws)}/${c.id}/spec-versions/${v1.id}/approve`, { method: "POST" })).status).toBe(409);
    const spec = sixStringSpec();
    spec.strings[5]!.gaugeIn = 0.052;
    const v2 = await draftSpec(builder, ws, c.id, spec, { bridge: "floating_tremolo" });
    const r = await client.json<{ version: { change: { againstVersion: number; changes: Array<{ path: string }>; tensionDeltaN: number; tremoloNote: string } } }>(
      `${base(ws)}/${c.id}/spec-versions/${v2.id}`,
    );
    expect(r.status).toBe(404); // not sent yet
    const own = await builder.json<{ version: { change: { againstVersion: number; changes: Array<{ path: string }>; tensionDeltaN: number; tremoloNote: string } } }>(
      `${base(ws)}/${c.id}/spec-versions/${v2.id}`,
    );
    expect(own.body.version.change.againstVersion).toBe(1);
    expect(own.body.version.change.changes.map((x) => x.path)).toEqual(["options.bridge", "spec.strings.5.gaugeIn"]);
    expect(own.body.version.change.tensionDeltaN).toBeGreaterThan(0); // heavier string at the same pitch: more tension (Mersenne)
    expect(own.body.version.change.tremoloNote).toMatch(/springs/);
  });

  it("moves from deposit to the first build stage when the deposit is recorded, by the bookkeeper", async () => {
    const c = await openCommission(owner, ws);
    await approveSpec(builder, client, ws, c.id);
    expect((await move(builder, ws, c.id, "advance")).status).toBe(409);
    const bad = await bookkeeper.fetch(`${base(ws)}/${c.id}/payments`, { method: "POST", json: { kind: "deposit", amountMinor: 0, reference: "" } });
    expect(bad.status).toBe(422);
    const paid = await bookkeeper.json<{ advanced: boolean; depositPaid: boolean }>(`${base(ws)}/${c.id}/payments`, {
      method: "POST",
      json: { kind: "deposit", amountMinor: 90_000, reference: "Bank transfer 0042" },
    });
    expect(paid.status).toBe(201);
    expect(paid.body).toMatchObject({ advanced: true, depositPaid: true });
    expect((await detail(owner, ws, c.id)).stage).toBe(DEFAULT_BUILD_STAGES[0]!.key);
    expect((await builder.fetch(`${base(ws)}/${c.id}/payments`, { method: "POST", json: { kind: "balance", amountMinor: 1, reference: "cash" } })).status).toBe(403);
    const audit = await testDb()("audit_log").where({ workshop_id: ws.id, action: "payment.recorded", entity_type: "payment" }).count({ n: "*" }).first();
    expect(Number(audit?.n)).toBeGreaterThan(0);
  });

  it("holds the client's notice until the owner signs off when the workshop asks for it", async () => {
    await testDb()("workshops").where({ id: ws.id }).update({ require_stage_signoff: true });
    try {
      const c = await openCommission(owner, ws);
      await approveSpec(builder, client, ws, c.id);
      await bookkeeper.fetch(`${base(ws)}/${c.id}/payments`, { method: "POST", json: { kind: "deposit", amountMinor: 90_000, reference: "ref 1" } });
      const before = (await outboxTemplatesFor(ws.client.email)).length;
      const r = await move(builder, ws, c.id, "advance", "Neck carved");
      expect(await r.json()).toMatchObject({ needsOwnerSignoff: true, to: DEFAULT_BUILD_STAGES[1]!.key });
      expect((await detail(client, ws, c.id)).stage).toBe(DEFAULT_BUILD_STAGES[0]!.key);
      expect((await detail(owner, ws, c.id)).awaitingSignoff).toBe(true);
      expect((await outboxTemplatesFor(ws.client.email)).length).toBe(before);

      const history = (await owner.json<{ history: Array<{ id: number; needsSignoff: boolean }> }>(`${base(ws)}/${c.id}/transitions`)).body.history;
      const pending = history.find((h) => h.needsSignoff)!;
      expect((await builder.fetch(`${base(ws)}/${c.id}/transitions/${pending.id}/signoff`, { method: "POST" })).status).toBe(403);
      expect((await owner.fetch(`${base(ws)}/${c.id}/transitions/${pending.id}/signoff`, { method: "POST" })).status).toBe(200);
      expect((await detail(client, ws, c.id)).stage).toBe(DEFAULT_BUILD_STAGES[1]!.key);
      expect((await outboxTemplatesFor(ws.client.email)).at(-1)).toBe("stage-progress");
      expect((await owner.fetch(`${base(ws)}/${c.id}/transitions/${pending.id}/signoff`, { method: "POST" })).status).toBe(409);
    } finally {
      await testDb()("workshops").where({ id: ws.id }).update({ require_stage_signoff: false });
    }
  });

  it("walks the build stages to final setup, then refuses delivery saying what is missing", async () => {
    const c = await openCommission(owner, ws);
    await approveSpec(builder, client, ws, c.id);
    await bookkeeper.fetch(`${base(ws)}/${c.id}/payments`, { method: "POST", json: { kind: "deposit", amountMinor: 90_000, reference: "ref 2" } });
    for (let i = 1; i < DEFAULT_BUILD_STAGES.length; i++) expect((await move(builder, ws, c.id, "advance")).status).toBe(200);
    expect((await move(builder, ws, c.id, "advance")).status).toBe(200);
    expect((await detail(owner, ws, c.id)).stage).toBe("final_setup");
    const r = await move(owner, ws, c.id, "advance");
    expect(r.status).toBe(409);
    const body = (await r.json()) as { error: { issues: Array<{ message: string }> } };
    expect(body.error.issues.map((i) => i.message)).toEqual(["The final setup sheet is not filled in and signed.", "The balance has not been paid."]);
    const templates = await outboxTemplatesFor(ws.client.email);
    expect(templates).toEqual(expect.arrayContaining(["build-started", "stage-progress", "final-setup"]));
  });

  it("puts on hold and resumes where it was, telling the client both times", async () => {
    const c = await openCommission(owner, ws);
    expect((await move(builder, ws, c.id, "hold", "Waiting for the client's wood choice")).status).toBe(200);
    expect((await detail(client, ws, c.id)).stage).toBe("on_hold");
    expect((await move(client, ws, c.id, "resume")).status).toBe(403);
    expect((await move(owner, ws, c.id, "resume")).status).toBe(200);
    expect((await detail(client, ws, c.id)).stage).toBe("spec");
    const t = await outboxTemplatesFor(ws.client.email);
    expect(t.slice(-2)).toEqual(["on-hold", "resumed"]);
  });

  it("answers a bad move with 422 and field paths, never a 500", async () => {
    const c = await openCommission(owner, ws);
    const r = await owner.fetch(`${base(ws)}/${c.id}/transitions`, { method: "POST", json: { action: "teleport" } });
    expect(r.status).toBe(422);
    expect(((await r.json()) as { error: { issues: Array<{ path: string }> } }).error.issues[0]!.path).toBe("action");
    expect((await owner.fetch(`${base(ws)}/${c.id}/transitions`, { method: "POST", body: "{nope", headers: { "content-type": "application/json" } })).status).toBe(400);
  });

  it("keeps comments between the client and the workshop", async () => {
    const c = await openCommission(owner, ws);
    expect((await client.fetch(`${base(ws)}/${c.id}/comments`, { method: "POST", json: { body: "Could the headstock be reversed?" } })).status).toBe(201);
    expect((await builder.fetch(`${base(ws)}/${c.id}/comments`, { method: "POST", json: { body: "Yes — no change to the scale." } })).status).toBe(201);
    expect((await client.fetch(`${base(ws)}/${c.id}/comments`, { method: "POST", json: { body: "   " } })).status).toBe(422);
    const list = (await owner.json<{ comments: Array<{ body: string; author: { role: string } }> }>(`${base(ws)}/${c.id}/comments`)).body.comments;
    expect(list.map((x) => x.author.role)).toEqual(["client", "builder"]);
  });
});
