// Workshop settings over HTTP against the real MariaDB: owner only (403 for every other role, 404
// for another workshop's owner); 422 with field paths; the stage template edited (rename, reorder,
// add, remove) with a 409 naming the stage and the commissions when a stage still has work in it;
// every change in the audit log; new commissions follow the new defaults.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { CommissionSummary } from "@/lib/schemas/commission-out";
import type { WorkshopSettingsOut } from "@/lib/schemas/workshop-settings";
import { DEFAULT_BUILD_STAGES } from "@/lib/workflow/stages";
import { closeTestDb, testDb } from "../setup/test-db";
import { base, detail, move, openCommission } from "./commission-helpers";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import { commissionInBuild } from "./overview-fixture";
import { anonymous, signIn, type HttpSession } from "./session";

let ws: TestWorkshop;
let other: TestWorkshop;
let owner: HttpSession, builder: HttpSession, bookkeeper: HttpSession, client: HttpSession, outsider: HttpSession;
const url = (w: TestWorkshop = ws) => `/api/workshops/${w.slug}/settings`;

type Issues = { error: { code: string; message: string; issues?: Array<{ path: string; message: string }> } };

const patch = (body: unknown, s: HttpSession = owner) => s.json<{ settings: WorkshopSettingsOut } & Issues>(url(), { method: "PATCH", json: body });
const stored = () => testDb()("workshops").where({ id: ws.id }).first();

beforeAll(async () => {
  [ws, other] = await Promise.all([createWorkshopWithMembers(), createWorkshopWithMembers()]);
  [owner, builder, bookkeeper, client, outsider] = await Promise.all([signIn(ws.owner), signIn(ws.builder), signIn(ws.bookkeeper), signIn(ws.client), signIn(other.owner)]);
});
afterAll(closeTestDb);

describe("who may see and change settings", () => {
  it("shows the owner the settings, with the default stage template and no logo yet", async () => {
    const r = await owner.json<{ settings: WorkshopSettingsOut }>(url());
    expect(r.status).toBe(200);
    expect(r.body.settings).toEqual({
      slug: ws.slug,
      name: ws.name,
      unitPreference: "mm",
      currency: "EUR",
      depositPercent: 30,
      buildStages: DEFAULT_BUILD_STAGES,
      requireStageSignoff: false,
      emailSenderName: null,
      logoUrl: null,
    });
  });

  it("answers 403 to builder, bookkeeper and client, 404 to another workshop's owner, 401 signed out — and changes nothing", async () => {
    const before = await stored();
    const forbidden = { error: { code: "forbidden", message: "You do not have permission to do this." } };
    for (const s of [builder, bookkeeper, client]) {
      expect(await s.json(url())).toEqual({ status: 403, body: forbidden });
      expect(await patch({ name: "Taken over" }, s)).toEqual({ status: 403, body: forbidden });
    }
    const notFound = { error: { code: "not_found", message: "No such workshop." } };
    expect(await outsider.json(url())).toEqual({ status: 404, body: notFound });
    expect(await patch({ name: "Taken over" }, outsider)).toEqual({ status: 404, body: notFound });
    expect((await anonymous().fetch(url(), { method: "PATCH", json: { name: "Taken over" } })).status).toBe(401);
    expect(await stored()).toEqual(before);
  });
});

describe("validation", () => {
  it("answers 422 with the path of every bad field and stores nothing", async () => {
    const before = await stored();
    const r = await patch({
      name: "x",
      unitPreference: "cm",
      currency: "XYZ",
      depositPercent: 120,
      requireStageSignoff: "yes",
      emailSenderName: "Fernhollow <shop@example.com>",
      buildStages: [
        { key: "timber", label: "Timber" },
        { key: "timber", label: "" },
        { key: "delivered", label: "Delivered early" },
      ],
    });
    expect(r.status).toBe(422);
    expect(r.body.error.code).toBe("validation_failed");
    expect(new Set(r.body.error.issues!.map((i) => i.path))).toEqual(
      new Set(["name", "unitPreference", "currency", "depositPercent", "requireStageSignoff", "emailSenderName", "buildStages.1.key", "buildStages.1.label", "buildStages.2.key"]),
    );
    expect(r.body.error.issues).toEqual(expect.arrayContaining([{ path: "buildStages.2.key", message: '"delivered" is reserved.' }]));
    expect(await stored()).toEqual(before);
  });

  it("refuses an empty change, an empty template, more than two decimals and a body that is not JSON", async () => {
    expect((await patch({})).body.error.issues).toEqual([{ path: "", message: "Send at least one setting to change." }]);
    expect((await patch({ buildStages: [] })).body.error.issues).toEqual([{ path: "buildStages", message: "Keep at least one build stage." }]);
    expect((await patch({ depositPercent: 12.345 })).body.error.issues).toEqual([{ path: "depositPercent", message: "At most two decimals." }]);
    const raw = await owner.fetch(url(), { method: "PATCH", body: "{", headers: { "content-type": "application/json" } });
    expect(raw.status).toBe(400);
  });
});

describe("changing settings", () => {
  it("stores every setting, logs old and new values, and new commissions use the new defaults", async () => {
    const r = await patch({ name: "Renamed Test Workshop", unitPreference: "in", currency: "GBP", depositPercent: 40, emailSenderName: "Renamed Workshop Desk", requireStageSignoff: true });
    expect(r.status).toBe(200);
    expect(r.body.settings).toMatchObject({ name: "Renamed Test Workshop", unitPreference: "in", currency: "GBP", depositPercent: 40, emailSenderName: "Renamed Workshop Desk", requireStageSignoff: true });
    const audit = await testDb()("audit_log").where({ workshop_id: ws.id, action: "workshop.settings_changed" }).orderBy("id", "desc").first();
    expect(audit.actor_user_id).toBe(ws.owner.userId);
    expect(audit.data).toEqual({
      name: { from: ws.name, to: "Renamed Test Workshop" },
      unitPreference: { from: "mm", to: "in" },
      currency: { from: "EUR", to: "GBP" },
      depositPercent: { from: 30, to: 40 },
      emailSenderName: { from: null, to: "Renamed Workshop Desk" },
      requireStageSignoff: { from: false, to: true },
    });
    // 40 % of 250.00 GBP (rounded to the penny): 100.00.
    const c: CommissionSummary = await openCommission(owner, ws, { priceMinor: 25_000 });
    expect(c.money).toEqual({ currency: "GBP", priceMinor: 25_000, depositMinor: 10_000, depositPercent: 40 });
  });

  it("writes nothing to the log when nothing really changes", async () => {
    const count = async () => Number((await testDb()("audit_log").where({ workshop_id: ws.id, action: "workshop.settings_changed" }).count({ n: "*" }).first())!.n);
    const n = await count();
    expect((await patch({ currency: "gbp", depositPercent: 40 })).status).toBe(200);
    expect(await count()).toBe(n);
  });

  it("turns an empty sender name into none (e-mails then use the workshop's name)", async () => {
    expect((await patch({ emailSenderName: "" })).body.settings.emailSenderName).toBeNull();
  });
});

describe("the stage template", () => {
  let inTimber: CommissionSummary;
  let heldFromShaping: CommissionSummary;

  beforeAll(async () => {
    await patch({ requireStageSignoff: false, currency: "EUR", depositPercent: 30 });
    const clientSession = await signIn(ws.client);
    inTimber = await commissionInBuild(owner, clientSession, ws, { builderId: ws.builder.userId, advances: 0, title: "In timber selection" });
    heldFromShaping = await commissionInBuild(owner, clientSession, ws, { builderId: ws.builder.userId, advances: 1, title: "Held while shaping" });
    expect((await move(owner, ws, heldFromShaping.id, "hold")).status).toBe(200);
  }, 120_000);

  it("renames, reorders and adds stages; commissions keep their stage under its new name", async () => {
    const [timber, shaping, frets, finish, cure, assembly] = DEFAULT_BUILD_STAGES;
    const next = [{ ...timber!, label: "Wood choice" }, shaping!, frets!, { key: "binding_purfling", label: "Binding and purfling" }, assembly!, finish!, cure!];
    const r = await patch({ buildStages: next });
    expect(r.status).toBe(200);
    expect(r.body.settings.buildStages).toEqual(next);
    const d = await detail(owner, ws, inTimber.id);
    expect([d.stage, d.stageLabel]).toEqual(["timber", "Wood choice"]);
    expect(d.stages.map((s) => s.key)).toEqual(["spec", "deposit", ...next.map((s) => s.key), "final_setup", "delivered"]);
  });

  it("refuses (409) to remove a stage a commission is in, naming the stage and the commission", async () => {
    const before = (await stored()).build_stages;
    const r = await patch({ buildStages: DEFAULT_BUILD_STAGES.filter((s) => s.key !== "timber") });
    expect(r.status).toBe(409);
    expect(r.body.error.code).toBe("conflict");
    expect(r.body.error.message).toContain(`"Wood choice" still has 1 commission in it (${inTimber.number})`);
    expect(r.body.error.issues).toEqual([{ path: "buildStages", message: `"Wood choice" still has 1 commission in it (${inTimber.number}). Move it to another stage first.` }]);
    expect((await stored()).build_stages).toEqual(before);
  });

  it("counts a commission on hold from a stage as being in it", async () => {
    const current = (await owner.json<{ settings: WorkshopSettingsOut }>(url())).body.settings.buildStages;
    const r = await patch({ buildStages: current.filter((s) => s.key !== "body_neck_shaping") });
    expect(r.status).toBe(409);
    expect(r.body.error.message).toContain(`"Body and neck shaping" still has 1 commission in it (${heldFromShaping.number})`);
  });

  it("removes a stage no commission is in, and one whose commissions have moved on", async () => {
    let current = (await owner.json<{ settings: WorkshopSettingsOut }>(url())).body.settings.buildStages;
    const r = await patch({ buildStages: current.filter((s) => s.key !== "finish_cure_level") });
    expect(r.status).toBe(200);
    expect(r.body.settings.buildStages.map((s) => s.key)).not.toContain("finish_cure_level");

    expect((await move(owner, ws, inTimber.id, "advance")).status).toBe(200); // timber → shaping
    current = r.body.settings.buildStages;
    const again = await patch({ buildStages: current.filter((s) => s.key !== "timber") });
    expect(again.status).toBe(200);
    const history = await testDb()("audit_log").where({ workshop_id: ws.id, action: "workshop.settings_changed" }).orderBy("id", "desc").first();
    expect(Object.keys(history.data)).toEqual(["buildStages"]);
  });

  it("applies the sign-off rule to a builder's next build move", async () => {
    expect((await patch({ requireStageSignoff: true })).status).toBe(200);
    const r = await builder.json<{ needsOwnerSignoff: boolean }>(`${base(ws)}/${inTimber.id}/transitions`, { json: { action: "advance" } });
    expect(r.status).toBe(200);
    expect(r.body.needsOwnerSignoff).toBe(true);
  });
});
