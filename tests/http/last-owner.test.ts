// A workshop never loses its last owner: neither by a role change nor by removal, not even when
// two owners demote each other at the same moment.
import { afterAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "../setup/test-db";
import { createWorkshopWithMembers } from "./fixtures";
import { signIn } from "./session";

afterAll(closeTestDb);

const LAST_OWNER = { error: { code: "conflict", message: "A workshop always keeps at least one owner. Make someone else an owner first." } };
const owners = async (workshopId: number) => Number((await testDb()("memberships").where({ workshop_id: workshopId, role: "owner" }).count({ n: "*" }).first())!.n);

describe("last-owner protection", () => {
  it("refuses to demote or remove the only owner", async () => {
    const ws = await createWorkshopWithMembers();
    const owner = await signIn(ws.owner);
    const demote = await owner.fetch(`/api/workshops/${ws.slug}/members/${ws.owner.membershipId}`, { method: "PATCH", json: { role: "builder" } });
    expect(demote.status).toBe(409);
    expect(await demote.json()).toEqual(LAST_OWNER);
    const remove = await owner.fetch(`/api/workshops/${ws.slug}/members/${ws.owner.membershipId}`, { method: "DELETE" });
    expect(remove.status).toBe(409);
    expect(await owners(ws.id)).toBe(1);
  });

  it("lets one of two owners step down, then protects the other", async () => {
    const ws = await createWorkshopWithMembers({ extra: { owner: 1 } });
    const [first, second] = ws.members.filter((m) => m.role === "owner");
    const s = await signIn(first!);
    const ok = await s.json<{ member: { role: string } }>(`/api/workshops/${ws.slug}/members/${second!.membershipId}`, { method: "PATCH", json: { role: "bookkeeper" } });
    expect(ok.status).toBe(200);
    expect(ok.body.member.role).toBe("bookkeeper");
    const refused = await s.fetch(`/api/workshops/${ws.slug}/members/${first!.membershipId}`, { method: "PATCH", json: { role: "client" } });
    expect(refused.status).toBe(409);
    // Promoting someone else first makes stepping down possible.
    expect((await s.fetch(`/api/workshops/${ws.slug}/members/${ws.builder.membershipId}`, { method: "PATCH", json: { role: "owner" } })).status).toBe(200);
    expect((await s.fetch(`/api/workshops/${ws.slug}/members/${first!.membershipId}`, { method: "DELETE" })).status).toBe(204);
    expect(await owners(ws.id)).toBe(1);
  });

  it("keeps one owner when two owners demote each other at the same moment", async () => {
    for (let round = 0; round < 3; round++) {
      const ws = await createWorkshopWithMembers({ extra: { owner: 1 } });
      const [x, y] = ws.members.filter((m) => m.role === "owner");
      const [sx, sy] = await Promise.all([signIn(x!), signIn(y!)]);
      const results = await Promise.all([
        sx.fetch(`/api/workshops/${ws.slug}/members/${y!.membershipId}`, { method: "PATCH", json: { role: "builder" } }),
        sy.fetch(`/api/workshops/${ws.slug}/members/${x!.membershipId}`, { method: "DELETE" }),
      ]);
      const statuses = results.map((r) => r.status).sort();
      // One wins (200 or 204); the other finds the last owner (409) or has just lost its own access (403/404).
      expect(statuses.filter((s) => s === 200 || s === 204)).toHaveLength(1);
      expect(await owners(ws.id)).toBe(1);
    }
  });
});
