// The client's approval locks a spec version; a change is a new version that needs approval again,
// shown as a diff against the version last approved (with the change in total string tension and,
// for a floating tremolo, the note to rebalance its springs). Real app over HTTP, real MariaDB.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { SpecVersionDetail, SpecVersionSummary } from "@/lib/schemas/spec-version";
import { DEFAULT_BUILD_STAGES } from "@/lib/workflow/stages";
import { closeTestDb, testDb } from "../setup/test-db";
import { approveSpec, base, detail, draftSpec, move, openCommission, signInRoles, sixStringSpec } from "./commission-helpers";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import type { HttpSession } from "./session";

let ws: TestWorkshop;
let owner: HttpSession, builder: HttpSession, bookkeeper: HttpSession, client: HttpSession;

beforeAll(async () => {
  ws = await createWorkshopWithMembers();
  ({ owner, builder, bookkeeper, client } = await signInRoles(ws));
});
afterAll(closeTestDb);

const send = (id: number, v: number) => builder.fetch(`${base(ws)}/${id}/spec-versions/${v}/submit`, { method: "POST", json: {} });
const approve = (id: number, v: number) => client.fetch(`${base(ws)}/${id}/spec-versions/${v}/approve`, { method: "POST" });
const version = async (s: HttpSession, id: number, v: number) => (await s.json<{ version: SpecVersionDetail }>(`${base(ws)}/${id}/spec-versions/${v}`)).body.version;
const storedRow = (v: number) => testDb()("spec_versions").where({ id: v }).first("spec", "options", "result", "approved_at", "approved_by", "submitted_at");

describe("approval lock", () => {
  it("locks an approved version: it cannot be approved, sent or edited again, and stays as it was", async () => {
    const c = await openCommission(owner, ws);
    const v1 = await approveSpec(builder, client, ws, c.id);
    const before = await storedRow(v1.id);
    expect(before.approved_by).toBe(ws.client.userId);
    expect((await approve(c.id, v1.id)).status).toBe(409);
    expect((await send(c.id, v1.id)).status).toBe(409);
    // There is no way to edit a version in place: a change is always a new version.
    for (const method of ["PATCH", "PUT", "DELETE"]) {
      const res = await builder.fetch(`${base(ws)}/${c.id}/spec-versions/${v1.id}`, { method, json: { spec: sixStringSpec() } });
      expect(res.status, method).toBeGreaterThanOrEqual(400); // no such method on this route
      expect(res.status, method).toBeLessThan(500);
    }
    await draftSpec(builder, ws, c.id, Object.assign(sixStringSpec(), { frets: 24 }));
    expect(await storedRow(v1.id)).toEqual(before);
  });

  it("asks for approval again after a change, and keeps the spec stage until it is given", async () => {
    const c = await openCommission(owner, ws);
    const v1 = await approveSpec(builder, client, ws, c.id);
    expect((await detail(owner, ws, c.id)).stage).toBe("deposit");
    // Before any money has moved the owner may take it back to the spec.
    expect((await move(owner, ws, c.id, "back")).status).toBe(200);
    const v2 = await draftSpec(builder, ws, c.id, Object.assign(sixStringSpec(), { nutWidth: 44 }));
    // A draft the client has not been sent cannot be approved (they cannot even see it).
    expect((await approve(c.id, v2.id)).status).toBe(404);
    expect((await send(c.id, v2.id)).status).toBe(200);
    const refused = await move(owner, ws, c.id, "advance");
    expect(refused.status).toBe(409);
    expect(((await refused.json()) as { error: { issues: Array<{ message: string }> } }).error.issues.map((i) => i.message)).toEqual([
      "A newer spec version is waiting for the client's approval.",
    ]);
    expect((await approve(c.id, v1.id)).status).toBe(409); // already approved, and not the latest
    expect((await approve(c.id, v2.id)).status).toBe(200);
    const d = await detail(owner, ws, c.id);
    expect(d.stage).toBe("deposit");
    expect(d.approvedSpecVersion).toEqual({ id: v2.id, version: 2 });
    expect((await storedRow(v1.id)).approved_at).not.toBeNull(); // the earlier approval stands in the record
  });

  it("re-approves a change during the build without moving the stage", async () => {
    const c = await openCommission(owner, ws);
    await approveSpec(builder, client, ws, c.id);
    await bookkeeper.fetch(`${base(ws)}/${c.id}/payments`, { method: "POST", json: { kind: "deposit", amountMinor: 90_000, reference: "Re-approval test" } });
    const v2 = await draftSpec(builder, ws, c.id, sixStringSpec(), { colour: "Oxblood" });
    expect((await send(c.id, v2.id)).status).toBe(200);
    // Only the latest version can be approved.
    const v3 = await draftSpec(builder, ws, c.id, sixStringSpec(), { colour: "Olive" });
    expect((await send(c.id, v3.id)).status).toBe(200);
    const stale = await approve(c.id, v2.id);
    expect(stale.status).toBe(409);
    expect(((await stale.json()) as { error: { message: string } }).error.message).toMatch(/newer version exists/);
    expect((await approve(c.id, v3.id)).status).toBe(200);
    const d = await detail(owner, ws, c.id);
    expect(d.stage).toBe(DEFAULT_BUILD_STAGES[0]!.key);
    expect(d.approvedSpecVersion).toEqual({ id: v3.id, version: 3 });
    expect(d.latestSpecVersion).toMatchObject({ id: v3.id, approved: true });
  });
});

describe("spec diff", () => {
  it("compares a new version with the last approved one, listing changed fields and the tension change", async () => {
    const c = await openCommission(owner, ws);
    const v1 = await approveSpec(builder, client, ws, c.id);
    expect((await version(builder, c.id, v1.id)).change).toBeNull();
    // v2 is sent but never approved; v3 is compared with v1, the last approved.
    await draftSpec(builder, ws, c.id, Object.assign(sixStringSpec(), { frets: 24 }));
    const spec3 = sixStringSpec();
    spec3.strings[5]!.gaugeIn = 0.049;
    const v3: SpecVersionSummary = await draftSpec(builder, ws, c.id, spec3, { colour: "Seafoam green" });
    const d = await version(builder, c.id, v3.id);
    expect(d.change?.againstVersion).toBe(1);
    expect(d.change?.changes).toEqual([
      { path: "options.colour", before: "", after: "Seafoam green" },
      { path: "spec.strings.5.gaugeIn", before: 0.0455, after: 0.049 },
    ]);
    // The change in total tension is exactly the difference of the two stored totals …
    expect(d.change!.tensionDeltaN).toBeCloseTo(v3.totalTensionN - v1.totalTensionN, 9);
    // … and positive: a heavier string at the same pitch and length pulls harder, T = μ(2Lf)²
    // with μ growing with the gauge (Mersenne's laws; textbook identity).
    expect(d.change!.tensionDeltaN).toBeGreaterThan(0);
    expect(d.change!.tremoloNote).toBeNull(); // a fixed bridge has no springs to rebalance
  });

  it("adds the note to rebalance the springs when the bridge is a floating tremolo", async () => {
    const c = await openCommission(owner, ws);
    await approveSpec(builder, client, ws, c.id);
    const spec = sixStringSpec();
    spec.strings[0]!.gaugeIn = 0.009;
    const v2 = await draftSpec(builder, ws, c.id, spec, { bridge: "floating_tremolo" });
    expect((await send(c.id, v2.id)).status).toBe(200);
    // The client sees the same diff once the version is sent to them.
    const seen = await version(client, c.id, v2.id);
    expect(seen.change?.changes.map((x) => x.path)).toEqual(["options.bridge", "spec.strings.0.gaugeIn"]);
    expect(seen.change!.tensionDeltaN).toBeLessThan(0); // a lighter string: less tension
    expect(seen.change!.tremoloNote).toMatch(new RegExp(`by ${seen.change!.tensionDeltaN.toFixed(1)} N: the tremolo springs must be rebalanced`));
  });
});
